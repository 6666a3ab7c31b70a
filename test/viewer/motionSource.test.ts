import { describe, expect, it } from 'vitest'
import { layoutBuilding } from '@/viewer/buildingLayout'
import { largestDisplacement, planSize, scaleDof } from '@/viewer/modeAnimation'
import { floorPoints, historyMotion, modeMotion, modeRows, resultFits } from '@/viewer/motionSource'
import { fixtureResult, threeFloorProject } from './fixtures'

const project = threeFloorProject()
const layout = layoutBuilding(project)
const walls = Object.values(project.walls)

describe('resultFits', () => {
  it('accepts modes of the floors on screen and refuses a result of another floor count', () => {
    expect(resultFits(fixtureResult(project), layout)).toBe(true)
    const fewer = { ...project, floors: project.floors.slice(0, 2) }
    expect(resultFits(fixtureResult(project), layoutBuilding(fewer))).toBe(false)
    expect(resultFits(null, layout)).toBe(false)
  })
})

describe('modeRows', () => {
  it('lists period, frequency, ratios and class per mode', () => {
    const rows = modeRows(fixtureResult(project).modes!)
    expect(rows).toHaveLength(6)
    expect(rows[0]!.period).toBeCloseTo(0.92, 12)
    expect(rows[0]!.frequencyHz).toBeCloseTo(1 / 0.92, 12)
    expect(rows[1]!.cumulativeX).toBeCloseTo(0.74, 12)
    expect(rows[0]!.character).toBe('torsion')
  })
})

describe('modeMotion', () => {
  it('scales so the largest floor displacement equals the plan size at amplitude 1', () => {
    const m = modeMotion(fixtureResult(project), layout, 1, walls)!
    const pts = floorPoints(layout, null)
    expect(largestDisplacement(m.dofs.map((d) => scaleDof(d, m.unitScale)), pts)).toBeCloseTo(planSize(pts.flat()), 9)
  })

  it('describes the fixture torsion mode, turning about the first wall, as turning near the core', () => {
    const m = modeMotion(fixtureResult(project), layout, 0, walls)!
    expect(m.meaning).toBe('Mode 1: mostly torsion — the plan turns about a point near the core')
    expect(m.title).toBe('Mode 1 · T = 0.920 s')
  })

  it('is null for a missing mode', () => {
    expect(modeMotion(fixtureResult(project), layout, 6)).toBeNull()
  })
})

describe('historyMotion', () => {
  it('is null without a time history and scales a history to the plan size', () => {
    const base = fixtureResult(project)
    expect(historyMotion(base, layout)).toBeNull()
    const steps = 5
    const displacements = new Float64Array(steps * 9)
    for (let s = 0; s < steps; s++) displacements[s * 9 + 6] = 0.01 * s // roof u_x grows to 0.04 m
    const r = {
      ...base,
      timeHistory: { dt: 0.1, stepCount: steps, damping: 0.05, displacements, dofCount: 9, peaks: [], groundMotionName: 'test' },
    }
    const h = historyMotion(r, layout)!
    expect(h.unitScale).toBeCloseTo(20 / 0.04, 9)
    expect(h.meaning).toContain('40.0 mm')
  })
})
