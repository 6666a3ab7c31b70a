import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import { centresRows } from '@/ui/centresRows'
import { floorOverlay } from '@/ui/floorOverlay'
import { markerTip } from '@/ui/markerTip'
import { eccentricOneStorey, projectBuilder } from '../helpers/projectBuilder'

describe('centresRows', () => {
  it('gives CM, CR, e, r, l_s and e/r of the one-storey check case', () => {
    const project = eccentricOneStorey()
    const [row] = centresRows(project.floors, analyzeProject(project))
    // Closed form, /work/shared/METHODS.md §8 self-derived one-storey case: CM (10, 5), CR (6.6667, 5.0),
    // e0x = 3.3333 m, r_x = 10.2740 m, r_y = 12.5831 m, l_s = 6.4550 m.
    expect(row?.centreOfMass?.x).toBeCloseTo(10, 3)
    expect(row?.centreOfMass?.y).toBeCloseTo(5, 3)
    expect(row?.centreOfRigidity?.x).toBeCloseTo(6.6667, 3)
    expect(row?.eccentricity?.x).toBeCloseTo(-3.3333, 3)
    expect(row?.torsionalRadius?.x).toBeCloseTo(10.274, 2)
    expect(row?.torsionalRadius?.y).toBeCloseTo(12.5831, 2)
    expect(row?.radiusOfGyration).toBeCloseTo(6.455, 2)
    // |e_x| / r_x = 3.3333 / 10.2740 = 0.3244 (same source); e_y = 0 there.
    expect(row?.eccentricityRatio?.x).toBeCloseTo(0.3244, 3)
    expect(row?.eccentricityRatio?.y).toBeCloseTo(0, 6)
  })

  it('lists the top floor first and leaves a massless floor without CM or l_s', () => {
    const project = projectBuilder({ floors: 2, height: 3 })
      .rectSlab({ x: 0, y: 0, width: 10, depth: 10, areaMass: 500, floor: 'L1' })
      .frameLine({ id: 'a', p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, storyStiffness: 1e8 })
      .frameLine({ id: 'b', p1: { x: 10, y: 0 }, p2: { x: 10, y: 10 }, storyStiffness: 1e8 })
      .frameLine({ id: 'c', p1: { x: 0, y: 0 }, p2: { x: 10, y: 0 }, storyStiffness: 1e8 })
      .frameLine({ id: 'd', p1: { x: 0, y: 10 }, p2: { x: 10, y: 10 }, storyStiffness: 1e8 })
      .build()
    const result = analyzeProject(project)
    const rows = centresRows(project.floors, result)
    expect(rows.map((r) => r.number)).toEqual([2, 1])
    const top = project.floors[1]?.id ?? ''
    expect(result.floors.find((f) => f.id === top)?.mass).toBe(0)
    expect(rows[0]?.centreOfMass).toBeNull()
    expect(rows[0]?.radiusOfGyration).toBeNull()
    expect(rows[1]?.centreOfMass).not.toBeNull()
    expect(floorOverlay(result, top).centreOfMass).toBeNull()
  })

  it('shows dashes, never NaN, before there is a result', () => {
    const project = eccentricOneStorey()
    const rows = centresRows(project.floors, null)
    expect(rows[0]?.centreOfMass).toBeNull()
    expect(rows[0]?.eccentricityRatio).toBeNull()
    const lines = markerTip('cr', floorOverlay(null as AnalysisResult | null, project.floors[0]?.id ?? ''), 'SI')
    expect(lines.join(' ')).not.toMatch(/NaN/)
    expect(lines[1]).toBe('x — · y —')
  })

  it('puts the CR numbers in the marker tooltip in display units', () => {
    const project = eccentricOneStorey()
    const result = analyzeProject(project)
    const lines = markerTip('cr', floorOverlay(result, project.floors[0]?.id ?? ''), 'SI')
    // METHODS.md §8: CR x = 6.6667 m, e_x = −3.3333 m, |e_x|/r_x = 0.32.
    expect(lines[1]).toMatch(/^x 6\.67 m/)
    expect(lines[2]).toMatch(/^e_x -3\.33 m/)
    expect(lines[4]).toMatch(/^e_x\/r_x 0\.32/)
  })
})
