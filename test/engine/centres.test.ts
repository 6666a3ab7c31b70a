import { describe, expect, it } from 'vitest'
import { buildStructure } from '@/engine/assemble'
import { computeCentres } from '@/engine/centres'
import type { Structure } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import { expectRelClose } from '../helpers/approx'
import { denseStiffnessSolver, generateBuilding, structureFromParts } from '../helpers/generateBuilding'
import { eccentricOneStorey } from '../helpers/projectBuilder'

const k = 1e8

function oneStoreyByHand(): Structure {
  const m = 1e5
  return structureFromParts(
    [{ mass: m, cm: { x: 10, y: 5 }, J: (m * (20 * 20 + 10 * 10)) / 12 }],
    [
      { at: { x: 0, y: 0 }, angle: Math.PI / 2, storyStiffness: [2 * k] },
      { at: { x: 20, y: 0 }, angle: Math.PI / 2, storyStiffness: [k] },
      { at: { x: 0, y: 0 }, angle: 0, storyStiffness: [k] },
      { at: { x: 0, y: 10 }, angle: 0, storyStiffness: [k] },
    ],
  )
}

function solverOf(s: Structure) {
  const r = createStiffnessSolver(s)
  if (!r.ok) throw new Error('mechanism')
  return r.solver
}

describe('computeCentres', () => {
  it('reproduces the one-storey case of METHODS.md §8 (hand-built and from the project)', () => {
    const hand = oneStoreyByHand()
    const built = buildStructure(eccentricOneStorey()).structure!
    for (const [s, solver] of [
      [hand, denseStiffnessSolver(hand)],
      [built, solverOf(built)],
    ] as const) {
      const [c] = computeCentres(s, solver)
      // METHODS.md §8 [derived]: CR = (6.6667, 5.0); e0x = 3.3333 m; K_T,CR = 316.667 k
      expect(c!.centreOfRigidity.x).toBeCloseTo(20 / 3, 9)
      expect(c!.centreOfRigidity.y).toBeCloseTo(5, 9)
      expect(c!.eccentricity.x).toBeCloseTo(-10 / 3, 9)
      expect(c!.eccentricity.y).toBeCloseTo(0, 9)
      expectRelClose(c!.torsionalStiffness, 316.6667 * k, 1e-6)
      // METHODS.md §8: r_x = 10.2740 m, r_y = 12.5831 m, l_s = 6.4550 m
      expect(c!.torsionalRadius.x).toBeCloseTo(10.274, 4)
      expect(c!.torsionalRadius.y).toBeCloseTo(12.5831, 4)
      expect(c!.radiusOfGyration).toBeCloseTo(6.455, 4)
      expectRelClose(c!.lateralStiffness.x, 2 * k, 1e-10)
      expectRelClose(c!.lateralStiffness.y, 3 * k, 1e-10)
      expect(c!.hasXYCoupling).toBe(false)
      // one storey, shear type: the classic story centre of stiffness is the same point
      expect(c!.storyCentreOfStiffness!.x).toBeCloseTo(20 / 3, 9)
      expect(c!.storyCentreOfStiffness!.y).toBeCloseTo(5, 9)
    }
  })

  it('gives the classic story centre sum(k x)/sum(k) on shear-type stories and a common vertical axis for proportional stiffness', () => {
    // three storeys, stiffnesses proportional over height: every element is k_e * [3, 2, 1]
    const p = [3, 2, 1]
    const s = structureFromParts(
      [1, 2, 3].map(() => ({ mass: 1e5, cm: { x: 8, y: 4 }, J: 2e6 })),
      [
        { at: { x: 0, y: 0 }, angle: Math.PI / 2, storyStiffness: p.map((f) => f * 3 * k) },
        { at: { x: 12, y: 0 }, angle: Math.PI / 2, storyStiffness: p.map((f) => f * 1 * k) },
        { at: { x: 0, y: 0 }, angle: 0, storyStiffness: p.map((f) => f * 2 * k) },
        { at: { x: 0, y: 9 }, angle: 0, storyStiffness: p.map((f) => f * 1 * k) },
      ],
    )
    const cs = computeCentres(s, denseStiffnessSolver(s))
    for (const c of cs) {
      // classic: x_s = sum(k_y x)/sum(k_y) = (3*0 + 1*12)/4 = 3; y_s = sum(k_x y)/sum(k_x) = 9/3 = 3
      // (common practice; EN 1998-1 4.2.3.2(7), stiffness centroid, from memory)
      expect(c.storyCentreOfStiffness!.x).toBeCloseTo(3, 9)
      expect(c.storyCentreOfStiffness!.y).toBeCloseTo(3, 9)
      // proportional systems: floor-load CRs lie on the same vertical axis (derived: K = diag-scaled
      // copy of one story pattern, so K^-1 blocks share the ratio F[theta,u]/F[theta,theta])
      expect(c.centreOfRigidity.x).toBeCloseTo(3, 8)
      expect(c.centreOfRigidity.y).toBeCloseTo(3, 8)
    }
  })

  it('places the floor-load CR where a unit force on that floor alone causes no rotation', () => {
    const s = buildStructure(generateBuilding({ floors: 6, seed: 8 })).structure!
    const solver = solverOf(s)
    const cs = computeCentres(s, solver)
    expect(cs[0]!.storyCentreOfStiffness).toBeNull() // walls are not shear type
    for (const fl of s.floors) {
      const c = cs[fl.index]!
      for (const dir of [0, 1]) {
        // force at the CR: F = e_dir, torque about O = x F_y - y F_x (MODELING.md, Centres)
        const f = new Float64Array(s.dofCount)
        f[3 * fl.index + dir] = 1
        f[3 * fl.index + 2] = dir === 1 ? c.centreOfRigidity.x : -c.centreOfRigidity.y
        const u = solver.solve(f)
        const uRef = Math.hypot(u[3 * fl.index]!, u[3 * fl.index + 1]!)
        // rotation of that floor times a plan length (20 m) is negligible beside the translation
        expect(Math.abs(u[3 * fl.index + 2]! * 20)).toBeLessThan(1e-9 * uRef)
      }
    }
  })

  it('uses the same centres with the bulk flexibility blocks and the one-floor path', () => {
    const s = buildStructure(generateBuilding({ floors: 9, seed: 12 })).structure!
    const a = computeCentres(s, solverOf(s))
    const b = computeCentres(s, denseStiffnessSolver(s))
    a.forEach((c, i) => {
      const d = b[i]!
      expect(c.centreOfRigidity.x).toBeCloseTo(d.centreOfRigidity.x, 6)
      expect(c.centreOfRigidity.y).toBeCloseTo(d.centreOfRigidity.y, 6)
      expectRelClose(c.torsionalStiffness, d.torsionalStiffness, 1e-8)
      expectRelClose(c.torsionalRadius.x, d.torsionalRadius.x, 1e-8)
    })
  })

  it('flags x-y coupling when inclined elements dominate a floor', () => {
    const s = structureFromParts(
      [{ mass: 1e5, J: 2e6 }],
      [
        { at: { x: -4, y: 0 }, angle: Math.PI / 4, storyStiffness: [3 * k] },
        { at: { x: 4, y: 0 }, angle: Math.PI / 4, storyStiffness: [3 * k] },
        { at: { x: 0, y: 3 }, angle: -Math.PI / 4, storyStiffness: [k] },
      ],
    )
    const [c] = computeCentres(s, denseStiffnessSolver(s))
    expect(c!.hasXYCoupling).toBe(true)
  })
})
