import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { buildStructure } from '@/engine/assemble'
import { NEAR_MECHANISM_RATIO, SOFT_DIRECTION_RATIO, symmetricEigen3 } from '@/engine/conditioning'
import type { Structure } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import { seededRandom } from '@/engine/groundMotion'
import type { Project } from '@/model'
import { demoProject } from '@/model/demo'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

const structureOf = (p: Project): Structure => {
  const r = buildStructure(p)
  if (!r.structure) throw new Error(r.issues.map((i) => i.message).join('\n'))
  return r.structure
}

/** Three 8 m walls along x at y = 1, 5, 9, turned by 0, 0.01 and 0.02 rad: their lines nearly meet far away. */
function threeWallsApart(): Project {
  const w = (angle: number, y: number) => ({
    p1: { x: 10 - 4 * Math.cos(angle), y: y - 4 * Math.sin(angle) },
    p2: { x: 10 + 4 * Math.cos(angle), y: y + 4 * Math.sin(angle) },
  })
  return projectBuilder({ floors: 1 })
    .rectSlab({ width: 20, depth: 10, areaMass: 500 })
    .wall({ id: 'a', ...w(0, 1) })
    .wall({ id: 'b', ...w(0.01, 5) })
    .wall({ id: 'c', ...w(0.02, 9) })
    .build()
}

/** Two 8 m walls along y at the ends and a 10 mm long, 1 mm thick wall as the only x resistance. */
function tinyWall(floors = 1): Project {
  return projectBuilder({ floors })
    .rectSlab({ width: 20, depth: 10, areaMass: 500 })
    .wall({ id: 'west', p1: { x: 0, y: 0 }, p2: { x: 0, y: 8 } })
    .wall({ id: 'east', p1: { x: 20, y: 0 }, p2: { x: 20, y: 8 } })
    .wall({ id: 'sliver', p1: { x: 5, y: 5 }, p2: { x: 5.01, y: 5 }, thickness: 0.001 })
    .build()
}

describe('symmetricEigen3', () => {
  it('agrees with ml-matrix on seeded random symmetric matrices', () => {
    const rnd = seededRandom(11)
    for (let trial = 0; trial < 50; trial++) {
      const a = Array.from({ length: 6 }, () => (rnd() - 0.5) * 10 ** Math.floor(rnd() * 6))
      const m = [a[0]!, a[1]!, a[2]!, a[1]!, a[3]!, a[4]!, a[2]!, a[4]!, a[5]!]
      const { values, vectors } = symmetricEigen3(m)
      // reference library: ml-matrix EigenvalueDecomposition (symmetric path)
      const ref = new EigenvalueDecomposition(new Matrix([m.slice(0, 3), m.slice(3, 6), m.slice(6, 9)]), {
        assumeSymmetric: true,
      })
      const refValues = [...ref.realEigenvalues].sort((x, y) => x - y)
      const scale = Math.max(...refValues.map(Math.abs))
      for (let k = 0; k < 3; k++) expect(Math.abs(values[k]! - refValues[k]!)).toBeLessThanOrEqual(1e-12 * scale)
      // defining relation A v = lambda v for each column
      for (let k = 0; k < 3; k++) {
        for (let r = 0; r < 3; r++) {
          let s = 0
          for (let c = 0; c < 3; c++) s += m[3 * r + c]! * vectors[3 * c + k]!
          expect(Math.abs(s - values[k]! * vectors[3 * r + k]!)).toBeLessThanOrEqual(1e-12 * scale)
        }
      }
    }
  })
})

describe('createStiffnessSolver floor stiffness ratio', () => {
  it('measures the closed-form ratio of a sliver wall to the rotational stiffness of a one-storey box', () => {
    const r = createStiffnessSolver(structureOf(tinyWall()), { nearMechanismRatio: 0, softDirectionRatio: 0 })
    expect(r.ok).toBe(true)
    if (!r.ok) return
    // Closed form (cantilever, METHODS.md §4): k = 1 / (h³/(3EI) + h/(G A_s)), E = 30 GPa, nu = 0.2, h = 3 m.
    const E = 30e9
    const G = E / 2.4
    const k = (L: number, t: number): number => 1 / (27 / (3 * E * ((t * L ** 3) / 12)) + 3 / (G * (5 / 6) * t * L))
    // Strongest: rotation about the CM (10, 5), two y walls 10 m away, scaled by l_s² = (20² + 10²)/12
    // (rectangle polar radius of gyration, handbook formula). Weakest: x translation, the sliver alone
    // (on the CM's line y = 5, so uncoupled).
    const strongest = (2 * k(8, 0.3) * 100) / ((400 + 100) / 12)
    const weakest = k(0.01, 0.001)
    expectRelClose(r.solver.minFloorStiffnessRatio, weakest / strongest, 1e-6)
  })

  it('refuses a 1 mm × 10 mm wall as the only x resistance as a mechanism along x (was: status ok, T1 ≈ 3800 s)', () => {
    const r = analyzeProject(tinyWall())
    expect(r.status).toBe('mechanism')
    const m = r.issues.find((i) => i.code === 'mechanism')
    expect(m?.floor).toBe('L1')
    expect(m?.direction).toBe('x')
    expect(m?.message).toMatch(/floor L1 \(Level 1\) has practically no resistance along x — only sliver acts along x/)
    expect(r.modes).toBeNull()
  })

  it('names every floor of a ten-storey building held along x by the sliver wall', () => {
    const r = analyzeProject(tinyWall(10))
    expect(r.status).toBe('mechanism')
    const m = r.issues.find((i) => i.code === 'mechanism')
    expect(m?.direction).toBe('x')
    expect(m?.message).toMatch(/floors L1 \(Level 1\), L2 \(Level 2\), L3 \(Level 3\), L4 \(Level 4\) and 6 more/)
  })

  it('refuses three walls 0.01 rad apart as a mechanism in rotation (was: status ok, T1 ≈ 29 000 s)', () => {
    const r = analyzeProject(threeWallsApart())
    expect(r.status).toBe('mechanism')
    const m = r.issues.find((i) => i.code === 'mechanism')
    expect(m?.floor).toBe('L1')
    expect(m?.direction).toBe('rotation')
    // the three lines meet near (-390, 1): first-order geometry, 4 m / 0.01 rad from the first wall's centre
    expect(m?.message).toMatch(/practically no resistance to rotation about \(-3\d\d\.\d, 1\.0\) — all element lines meet near one point/)
  })

  it('warns, naming floor and rotation, when one wall is turned 0.01 rad and offset (soft but not a mechanism)', () => {
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .wall({ p1: { x: 0, y: 5 }, p2: { x: 8, y: 5 } })
      .wall({ p1: { x: 10, y: 5 }, p2: { x: 10 + 8 * Math.cos(0.01), y: 5 + 8 * Math.sin(0.01) } })
      .wall({ p1: { x: 0, y: 2 }, p2: { x: 8 * Math.cos(-0.01), y: 2 + 8 * Math.sin(-0.01) } })
      .build()
    const r = analyzeProject(p)
    expect(r.status).toBe('ok')
    const w = r.issues.filter((i) => i.code === 'ill-conditioned')
    expect(w).toHaveLength(1)
    expect(w[0]!.severity).toBe('warning')
    expect(w[0]!.floor).toBe('L1')
    expect(w[0]!.direction).toBe('rotation')
    expect(w[0]!.message).toMatch(/nearly a mechanism .* floor L1 \(Level 1\) has almost no resistance to rotation/)
  })

  it('gives no conditioning warning on the demo building or on generated 10- and 60-storey buildings', () => {
    for (const p of [demoProject(), generateBuilding({ floors: 10, seed: 1 }), generateBuilding({ floors: 60, seed: 2 })]) {
      const r = createStiffnessSolver(structureOf(p))
      expect(r.ok).toBe(true)
      if (!r.ok) return
      expect(r.issues).toEqual([])
      // a healthy plan is within about one order of magnitude in every direction (measured 0.09 .. 0.25)
      expect(r.solver.minFloorStiffnessRatio).toBeGreaterThan(10 * SOFT_DIRECTION_RATIO)
    }
    expect(NEAR_MECHANISM_RATIO).toBeLessThan(SOFT_DIRECTION_RATIO)
  })
})
