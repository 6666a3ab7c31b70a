import { describe, expect, it } from 'vitest'
import { buildStructure } from '@/engine/assemble'
import { computeCentres } from '@/engine/centres'
import { solveModes } from '@/engine/modal'
import type { FloorCentres, ModalResult } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import type { Project } from '@/model'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding, transformProject } from '../helpers/generateBuilding'

// MODELING.md (Degrees of freedom): nothing shown to the user may depend on where O lies, and a rigid
// turn of the whole model only turns the results (frame indifference, common practice).

function analyse(p: Project): { modes: ModalResult; centres: FloorCentres[] } {
  const s = buildStructure(p).structure!
  const solver = createStiffnessSolver(s)
  if (!solver.ok) throw new Error('mechanism')
  return { modes: solveModes(s), centres: computeCentres(s, solver.solver) }
}

describe('solveModes and computeCentres under plan moves', () => {
  const base = generateBuilding({ floors: 10, seed: 21 })
  const ref = analyse(base)

  it('are unchanged by a translation far from the origin', () => {
    const moved = analyse(transformProject(base, { dx: 2500, dy: -1800, angle: 0 }))
    for (let i = 0; i < ref.modes.count; i++) {
      expectRelClose(moved.modes.periods[i]!, ref.modes.periods[i]!, 1e-8)
      for (const k of ['x', 'y', 'rz'] as const) {
        expect(moved.modes.effectiveMassRatio[k][i]!).toBeCloseTo(ref.modes.effectiveMassRatio[k][i]!, 7)
      }
      expect(moved.modes.torsionShare[i]!).toBeCloseTo(ref.modes.torsionShare[i]!, 7)
      expect(moved.modes.character[i]).toBe(ref.modes.character[i])
    }
    ref.centres.forEach((c, j) => {
      const d = moved.centres[j]!
      expect(d.eccentricity.x).toBeCloseTo(c.eccentricity.x, 5)
      expect(d.eccentricity.y).toBeCloseTo(c.eccentricity.y, 5)
      expect(d.centreOfRigidity.x - 2500).toBeCloseTo(c.centreOfRigidity.x, 5)
      expectRelClose(d.torsionalStiffness, c.torsionalStiffness, 1e-7)
      expectRelClose(d.torsionalRadius.x, c.torsionalRadius.x, 1e-7)
      expectRelClose(d.torsionalRadius.y, c.torsionalRadius.y, 1e-7)
      expectRelClose(d.radiusOfGyration, c.radiusOfGyration, 1e-10)
    })
  })

  it('swap x and y when the plan turns by 90 degrees', () => {
    const turned = analyse(transformProject(base, { dx: 7, dy: 3, angle: Math.PI / 2 }))
    for (let i = 0; i < ref.modes.count; i++) {
      expectRelClose(turned.modes.periods[i]!, ref.modes.periods[i]!, 1e-8)
      expect(turned.modes.effectiveMassRatio.x[i]!).toBeCloseTo(ref.modes.effectiveMassRatio.y[i]!, 7)
      expect(turned.modes.effectiveMassRatio.y[i]!).toBeCloseTo(ref.modes.effectiveMassRatio.x[i]!, 7)
      expect(turned.modes.effectiveMassRatio.rz[i]!).toBeCloseTo(ref.modes.effectiveMassRatio.rz[i]!, 7)
    }
    ref.centres.forEach((c, j) => {
      const d = turned.centres[j]!
      // e' = R(90°) e = (-e_y, e_x)
      expect(d.eccentricity.x).toBeCloseTo(-c.eccentricity.y, 6)
      expect(d.eccentricity.y).toBeCloseTo(c.eccentricity.x, 6)
      expectRelClose(d.torsionalRadius.x, c.torsionalRadius.y, 1e-7)
      expectRelClose(d.torsionalRadius.y, c.torsionalRadius.x, 1e-7)
      expectRelClose(d.lateralStiffness.x, c.lateralStiffness.y, 1e-7)
    })
  })

  it('keep periods, rotation ratios and |e| under an oblique turn', () => {
    const a = 0.5236 // about 30 degrees
    const turned = analyse(transformProject(base, { dx: -40, dy: 15, angle: a }))
    for (let i = 0; i < ref.modes.count; i++) {
      expectRelClose(turned.modes.periods[i]!, ref.modes.periods[i]!, 1e-8)
      // (Gamma_x, Gamma_y) turns as a plan vector, so its length is invariant
      const r2 = ref.modes.effectiveMassRatio.x[i]! + ref.modes.effectiveMassRatio.y[i]!
      const t2 = turned.modes.effectiveMassRatio.x[i]! + turned.modes.effectiveMassRatio.y[i]!
      expect(t2).toBeCloseTo(r2, 7)
      expect(turned.modes.effectiveMassRatio.rz[i]!).toBeCloseTo(ref.modes.effectiveMassRatio.rz[i]!, 7)
      expect(turned.modes.torsionShare[i]!).toBeCloseTo(ref.modes.torsionShare[i]!, 7)
    }
    ref.centres.forEach((c, j) => {
      const d = turned.centres[j]!
      const ex = Math.cos(a) * c.eccentricity.x - Math.sin(a) * c.eccentricity.y
      const ey = Math.sin(a) * c.eccentricity.x + Math.cos(a) * c.eccentricity.y
      expect(d.eccentricity.x).toBeCloseTo(ex, 6)
      expect(d.eccentricity.y).toBeCloseTo(ey, 6)
      expectRelClose(d.torsionalStiffness, c.torsionalStiffness, 1e-7)
    })
  })
})
