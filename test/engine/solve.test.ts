import fc from 'fast-check'
import { Matrix, inverse } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { buildStructure } from '@/engine/assemble'
import { multiply } from '@/engine/checks'
import type { Structure } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import type { Project } from '@/model'
import { expectArrayRelClose, expectRelClose } from '../helpers/approx'
import { eccentricOneStorey, mixedModel, projectBuilder } from '../helpers/projectBuilder'

const structureOf = (p: Project): Structure => {
  const r = buildStructure(p)
  if (!r.structure) throw new Error(r.issues.map((i) => i.message).join('\n'))
  return r.structure
}

const solverOf = (p: Project) => {
  const r = createStiffnessSolver(structureOf(p))
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join('\n'))
  return r
}

const mechanismsOf = (p: Project) => {
  const r = createStiffnessSolver(structureOf(p))
  expect(r.ok).toBe(false)
  for (const issue of r.issues) {
    expect(issue.message).not.toMatch(/NaN|undefined|Infinity/)
    expect(issue.code).toBe('mechanism')
    expect(issue.severity).toBe('error')
  }
  return r.issues
}

describe('createStiffnessSolver', () => {
  it('solves K u = f to round-off (residual check)', () => {
    const s = structureOf(mixedModel())
    const { solver } = solverOf(mixedModel())
    const f = Float64Array.from({ length: s.dofCount }, (_, i) => Math.sin(1.7 * i + 0.3) * (i % 3 === 2 ? 1e6 : 1e5))
    const u = solver.solve(f)
    const r = multiply(s.stiffness, u)
    expectArrayRelClose(r, f, 1e-10)
  })

  it('gives floor flexibility blocks equal to those of the ml-matrix inverse', () => {
    const s = structureOf(mixedModel())
    const { solver } = solverOf(mixedModel())
    const n = s.dofCount
    // reference library: ml-matrix dense inverse
    const Kinv = inverse(new Matrix(Array.from({ length: n }, (_, i) => Array.from(s.stiffness.subarray(i * n, i * n + n)))))
    const all = solver.floorFlexibilities()
    for (let j = 0; j < s.floorCount; j++) {
      const ref = [0, 1, 2].flatMap((r) => [0, 1, 2].map((c) => Kinv.get(3 * j + r, 3 * j + c)))
      expectArrayRelClose(solver.floorFlexibility(j), ref, 1e-9)
      expectArrayRelClose(all.subarray(9 * j, 9 * j + 9), ref, 1e-9)
    }
    expect(() => solver.floorFlexibility(s.floorCount)).toThrow('outside')
  })

  it('matches the ml-matrix inverse on a taller mixed model (odd and even row pairs)', () => {
    for (const N of [7, 10]) {
      const b = projectBuilder({ floors: N, height: 3.1 }).rectSlab({ x: -5, y: 3, width: 30, depth: 18, areaMass: 600 })
      b.wall({ p1: { x: 0, y: 8 }, p2: { x: 0, y: 14 } }).wall({ p1: { x: 0, y: 14 }, p2: { x: 6, y: 14 } })
      b.wall({ p1: { x: 20, y: 5 }, p2: { x: 23, y: 9 }, base: 'L2', top: `L${N - 1}` })
      b.frameLine({ p1: { x: -5, y: 3 }, p2: { x: 25, y: 3 }, storyStiffness: 4e8 })
      b.column({ at: { x: 10, y: 10 }, angle: 0.7, Ix: 0.02, Iy: 0.004 })
      const p = b.build()
      const s = structureOf(p)
      const { solver } = solverOf(p)
      const n = s.dofCount
      // reference library: ml-matrix dense inverse
      const Kinv = inverse(new Matrix(Array.from({ length: n }, (_, i) => Array.from(s.stiffness.subarray(i * n, i * n + n)))))
      const all = solver.floorFlexibilities()
      for (let j = 0; j < N; j++) {
        const ref = [0, 1, 2].flatMap((r) => [0, 1, 2].map((c) => Kinv.get(3 * j + r, 3 * j + c)))
        expectArrayRelClose(all.subarray(9 * j, 9 * j + 9), ref, 1e-8)
      }
      const f = Float64Array.from({ length: n }, (_, i) => Math.cos(0.9 * i) * 1e5)
      expectArrayRelClose(multiply(s.stiffness, solver.solve(f)), f, 1e-9)
    }
  })

  it('finds CR = (6.667, 5.0), K_theta,CR = 316.667 k and the edge displacements of METHODS.md §8', () => {
    // METHODS.md §8 self-derived one-storey case (k = 1e8 N/m)
    const { solver } = solverOf(eccentricOneStorey())
    const F = solver.floorFlexibility(0)
    const xcr = -F[7]! / F[8]!
    const ycr = F[6]! / F[8]!
    expectRelClose(xcr, 20 / 3, 1e-12)
    expectRelClose(ycr, 5, 1e-12)
    expectRelClose(1 / F[8]!, 316.6666666666667e8, 1e-12)
    // static Fy = 1000 kN at the CM (10, 5): torque about O = x·Fy
    const u = solver.solve(Float64Array.of(0, 1e6, 10 * 1e6))
    const uyAt = (x: number) => u[1]! + u[2]! * x
    expectRelClose(uyAt(0) * 1000, 2.63158, 1e-5)
    expectRelClose(uyAt(20) * 1000, 4.73684, 1e-5)
  })

  it('gives the same centres and edge displacements when the whole model is far from O', () => {
    const D = { x: 1.5e4, y: -2.2e4 }
    const { solver } = solverOf(eccentricOneStorey(D))
    const F = solver.floorFlexibility(0)
    expectRelClose(-F[7]! / F[8]! - D.x, 20 / 3, 1e-7)
    expectRelClose(F[6]! / F[8]! - D.y, 5, 1e-7)
    expectRelClose(1 / F[8]!, 316.6666666666667e8, 1e-7)
    const cm = { x: 10 + D.x, y: 5 + D.y }
    const u = solver.solve(Float64Array.of(0, 1e6, cm.x * 1e6))
    expectRelClose((u[1]! + u[2]! * D.x) * 1000, 2.63158, 1e-5)
  })

  it('moves every centre of rigidity with the plan origin (MODELING.md: nothing depends on O)', () => {
    // CR from F_j (MODELING.md §Centres): x_cr = -F[theta,u_y]/F[theta,theta], y_cr = F[theta,u_x]/F[theta,theta]
    const D = { x: -41, y: 23 }
    const a = solverOf(mixedModel()).solver.floorFlexibilities()
    const b = solverOf(mixedModel(D)).solver.floorFlexibilities()
    for (let j = 0; j < 4; j++) {
      const o = 9 * j
      expectRelClose(-b[o + 7]! / b[o + 8]! - D.x, -a[o + 7]! / a[o + 8]!, 1e-9)
      expectRelClose(b[o + 6]! / b[o + 8]! - D.y, a[o + 6]! / a[o + 8]!, 1e-9)
      expectRelClose(b[o + 8]!, a[o + 8]!, 1e-9)
    }
  })

  it('names y when all elements are parallel to x', () => {
    const p = projectBuilder({ floors: 3 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .frameLine({ id: 'a', p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 } })
      .wall({ id: 'b', p1: { x: 2, y: 10 }, p2: { x: 8, y: 10 } })
      .build()
    const issues = mechanismsOf(p)
    expect(issues).toHaveLength(1)
    expect(issues[0]!.direction).toBe('y')
    expect(issues[0]!.floor).toBe('L1')
    expect(issues[0]!.message).toBe(
      '[engine] mechanism: floors L1 (Level 1), L2 (Level 2), L3 (Level 3) have no resistance along y — all elements are parallel to x',
    )
    expect([...issues[0]!.refs].sort()).toEqual(['L1', 'L2', 'L3', 'a', 'b'])
  })

  it('names the rotation and the point when all element lines meet in one point', () => {
    const P = { x: 12, y: 8 }
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 30, depth: 20, areaMass: 500 })
      .frameLine({ id: 'x', p1: { x: 0, y: P.y }, p2: { x: 30, y: P.y } })
      .frameLine({ id: 'y', p1: { x: P.x, y: 0 }, p2: { x: P.x, y: 20 } })
      .wall({ id: 'd', p1: { x: P.x - 3, y: P.y - 3 }, p2: { x: P.x - 6, y: P.y - 6 } })
      .build()
    const issues = mechanismsOf(p)
    expect(issues).toHaveLength(1)
    expect(issues[0]!.message).toBe(
      '[engine] mechanism: floor L1 (Level 1) has no resistance to rotation about (12.0, 8.0) — all element lines meet near one point',
    )
    expect(issues[0]!.direction).toBe('rotation')
    expect([...issues[0]!.refs].sort()).toEqual(['L1', 'd', 'x', 'y'])
  })

  it('names the floor that has no lateral element below it', () => {
    const p = projectBuilder({ floors: 5 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .wall({ id: 'w1', p1: { x: 0, y: 0 }, p2: { x: 0, y: 6 }, top: 'L3' })
      .wall({ id: 'w2', p1: { x: 0, y: 10 }, p2: { x: 6, y: 10 }, top: 'L3' })
      .frameLine({ id: 'f', p1: { x: 20, y: 0 }, p2: { x: 20, y: 10 }, top: 'L3' })
      .build()
    const issues = mechanismsOf(p)
    expect(issues.map((i) => i.message)).toEqual([
      '[engine] mechanism: floor L4 (Level 4) has no lateral element below it',
      '[engine] mechanism: floor L5 (Level 5) has no lateral element below it',
    ])
    expect(issues[0]!.floor).toBe('L4')
    expect(issues[0]!.direction).toBe('x, y, rotation')
  })

  it('names the lowest floor of a stack that stands on nothing', () => {
    // elements from L4 up stand on L3's story gap: L3 has nothing below, L4 moves with it
    const p = projectBuilder({ floors: 4 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .frameLine({ id: 'a', p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 }, top: 'L2' })
      .frameLine({ id: 'b', p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, top: 'L2' })
      .frameLine({ id: 'c', p1: { x: 20, y: 0 }, p2: { x: 20, y: 10 }, top: 'L2' })
      .frameLine({ id: 'up1', p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 }, base: 'L3', top: 'L4' })
      .frameLine({ id: 'up2', p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, base: 'L3', top: 'L4' })
      .frameLine({ id: 'up3', p1: { x: 20, y: 0 }, p2: { x: 20, y: 10 }, base: 'L3', top: 'L4' })
      .build()
    const issues = mechanismsOf(p)
    expect(issues.map((i) => i.message)).toEqual(['[engine] mechanism: floor L3 (Level 3) has no lateral element below it'])
  })

  it('names an inclined free direction', () => {
    const d = { x: Math.cos(Math.PI / 6), y: Math.sin(Math.PI / 6) }
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 20, depth: 20, areaMass: 500 })
      .frameLine({ id: 'a', p1: { x: 0, y: 0 }, p2: { x: 10 * d.x, y: 10 * d.y } })
      .frameLine({ id: 'b', p1: { x: 0, y: 10 }, p2: { x: 10 * d.x, y: 10 + 10 * d.y } })
      .build()
    const issues = mechanismsOf(p)
    expect(issues).toHaveLength(1)
    expect(issues[0]!.message).toBe(
      '[engine] mechanism: floor L1 (Level 1) has no resistance along the plan direction 120.0° from x — all elements are parallel to the plan direction 30.0° from x',
    )
  })

  it('warns (without failing) when the stiffness is nearly a mechanism', () => {
    // lines through (12, 8) except one x-frame 1 mm off: a real but tiny torsional stiffness
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 30, depth: 20, areaMass: 500 })
      .frameLine({ id: 'x1', p1: { x: 0, y: 8 }, p2: { x: 30, y: 8 } })
      .frameLine({ id: 'x2', p1: { x: 0, y: 8.001 }, p2: { x: 30, y: 8.001 } })
      .frameLine({ id: 'y', p1: { x: 12, y: 0 }, p2: { x: 12, y: 20 } })
      .build()
    // the floor stiffness ratio (about 5e-9 here) is switched off to test the pivot warning alone
    const r = createStiffnessSolver(structureOf(p), { warningTolerance: 1e-4, nearMechanismRatio: 0, softDirectionRatio: 0 })
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.solver.minPivotRatio).toBeLessThan(1e-4)
    expect(r.issues).toHaveLength(1)
    expect(r.issues[0]!.code).toBe('ill-conditioned')
    expect(r.issues[0]!.severity).toBe('warning')
    expect(r.issues[0]!.message).toMatch(/almost no resistance to rotation about \(12\.0, 8\.0\)/)
    const ok = createStiffnessSolver(structureOf(mixedModel()))
    expect(ok.ok && ok.issues.length).toBe(0)
  })

  it('never throws or prints NaN on seeded random, mostly unstable models', () => {
    const pt = fc.record({ x: fc.double({ min: -10, max: 30, noNaN: true }), y: fc.double({ min: -10, max: 30, noNaN: true }) })
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }),
        fc.array(fc.tuple(pt, pt, fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 4 })), { maxLength: 3 }),
        (floors, frames) => {
          const b = projectBuilder({ floors }).rectSlab({ x: -10, y: -10, width: 40, depth: 40, areaMass: 500 })
          for (const [p1, p2, base, top] of frames) {
            b.frameLine({ p1, p2, base: base === 0 ? 'ground' : `L${base}`, top: `L${Math.min(top, floors)}` })
          }
          const s = structureOf(b.build())
          const r = createStiffnessSolver(s)
          for (const issue of r.issues) {
            expect(issue.message).not.toMatch(/NaN|undefined|Infinity/)
            expect(issue.refs.length).toBeGreaterThan(0)
          }
          if (r.ok) {
            const u = r.solver.solve(new Float64Array(s.dofCount).fill(1e5))
            expect(u.every(Number.isFinite)).toBe(true)
          } else {
            expect(r.issues.some((i) => i.code === 'mechanism' && typeof i.floor === 'string')).toBe(true)
          }
        },
      ),
      { seed: 7, numRuns: 60 },
    )
  })

  it('reports a floor with nothing at all and never returns NaN', () => {
    const p = projectBuilder({ floors: 1 }).rectSlab({ width: 8, depth: 8, areaMass: 500 }).build()
    const issues = mechanismsOf(p)
    expect(issues.map((i) => i.message)).toEqual(['[engine] mechanism: floor L1 (Level 1) has no lateral element below it'])
  })
})
