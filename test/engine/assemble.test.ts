import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { buildStructure, scatterElement } from '@/engine/assemble'
import { isExactlySymmetric, translationalMass } from '@/engine/checks'
import type { Structure } from '@/engine/results'
import { expectArrayRelClose, expectRelClose } from '../helpers/approx'
import { eccentricOneStorey, mixedModel, projectBuilder } from '../helpers/projectBuilder'

/** The slow way: K = Σ A' k A with dense A (n_e x 3N) per element. */
function denseReference(s: Structure): Float64Array {
  const n = s.dofCount
  const K = new Float64Array(n * n)
  for (const e of s.elements) {
    const ne = e.floors.length
    const A = new Float64Array(ne * n)
    e.floors.forEach((f, p) => {
      for (let r = 0; r < 3; r++) A[p * n + 3 * f + r] = e.map[r]!
    })
    const kA = new Float64Array(ne * n)
    for (let p = 0; p < ne; p++)
      for (let c = 0; c < n; c++) {
        let v = 0
        for (let q = 0; q < ne; q++) v += e.stiffness[p * ne + q]! * A[q * n + c]!
        kA[p * n + c] = v
      }
    for (let r = 0; r < n; r++)
      for (let c = 0; c < n; c++) {
        let v = 0
        for (let p = 0; p < ne; p++) v += A[p * n + r]! * kA[p * n + c]!
        K[r * n + c] = K[r * n + c]! + v
      }
  }
  return K
}

/** B' X B per floor block pair for u_old = B u_new, B = [[1, 0, -Dy], [0, 1, Dx], [0, 0, 1]]. */
function rigidTransform(X: Float64Array, N: number, D: { x: number; y: number }): Float64Array {
  const n = 3 * N
  const B = new Float64Array(n * n)
  for (let j = 0; j < N; j++) {
    B[(3 * j) * n + 3 * j] = 1
    B[(3 * j + 1) * n + 3 * j + 1] = 1
    B[(3 * j + 2) * n + 3 * j + 2] = 1
    B[(3 * j) * n + 3 * j + 2] = -D.y
    B[(3 * j + 1) * n + 3 * j + 2] = D.x
  }
  const XB = new Float64Array(n * n)
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      let v = 0
      for (let k = 0; k < n; k++) v += X[i * n + k]! * B[k * n + j]!
      XB[i * n + j] = v
    }
  const out = new Float64Array(n * n)
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      let v = 0
      for (let k = 0; k < n; k++) v += B[k * n + i]! * XB[k * n + j]!
      out[i * n + j] = v
    }
  return out
}

describe('buildStructure', () => {
  it('assembles K exactly symmetric and equal to the dense Σ A\' k A', () => {
    const { structure, issues } = buildStructure(mixedModel())
    expect(issues.filter((i) => i.severity !== 'info')).toHaveLength(0)
    const s = structure!
    expect(s.dofCount).toBe(12)
    expect(isExactlySymmetric(s.stiffness)).toBe(true)
    expect(isExactlySymmetric(s.mass)).toBe(true)
    // MODELING.md §Lateral-resisting elements: K = Σ A' k_e A, computed here the slow way
    expectArrayRelClose(s.stiffness, denseReference(s), 1e-13)
    expect(s.allShearType).toBe(false)
    // columns give two elements each
    expect(s.elements.filter((e) => e.id === 'c1').map((e) => e.kind)).toEqual(['columnX', 'columnY'])
    expect(s.elements.find((e) => e.id === 'w3')?.floors).toEqual([1, 2, 3])
  })

  it('puts the floor mass blocks of MODELING.md on the diagonal and sums the mass', () => {
    const { structure } = buildStructure(mixedModel())
    const s = structure!
    const n = s.dofCount
    let total = 0
    for (const f of s.floors) {
      const j = f.index
      const { x, y } = f.centreOfMass
      const m = f.mass
      const got = [0, 1, 2].flatMap((r) => [0, 1, 2].map((c) => s.mass[(3 * j + r) * n + 3 * j + c]!))
      // MODELING.md §Mass block about O
      expectArrayRelClose(got, [m, 0, -m * y, 0, m, m * x, -m * y, m * x, f.polarInertia + m * (x * x + y * y)], 1e-15)
      total += m
    }
    // hand calculation: (24·14 - 9) m² · 650 kg/m² per floor, plus 8 t on L4
    expectRelClose(s.totalMass, 4 * (24 * 14 - 9) * 650 + 8000, 1e-14)
    expectRelClose(total, s.totalMass, 1e-15)
    const tm = translationalMass(s.mass)
    expectRelClose(tm.x, s.totalMass, 1e-15)
    expectRelClose(tm.y, s.totalMass, 1e-15)
    const xc = s.floors.reduce((a, f) => a + f.mass * f.centreOfMass.x, 0) / s.totalMass
    expectRelClose(s.buildingCentreOfMass.x, xc, 1e-14)
    expect(s.floors.map((f) => f.elevation)).toEqual([4.5, 7.7, 10.9, 13.9].map((z) => expect.closeTo(z, 12)))
  })

  it('keeps K exactly symmetric and equal to the dense formula on seeded random models', () => {
    const pt = fc.record({ x: fc.double({ min: -20, max: 40, noNaN: true }), y: fc.double({ min: -20, max: 40, noNaN: true }) })
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 5 }),
        fc.array(fc.tuple(pt, pt, fc.double({ min: 0.15, max: 0.5, noNaN: true })), { maxLength: 3 }),
        fc.array(fc.tuple(pt, pt, fc.double({ min: 1e7, max: 1e9, noNaN: true })), { maxLength: 3 }),
        fc.array(fc.tuple(pt, fc.double({ min: 0, max: 3.2, noNaN: true })), { maxLength: 2 }),
        (floors, walls, frames, columns) => {
          const b = projectBuilder({ floors }).rectSlab({ x: -20, y: -20, width: 60, depth: 60, areaMass: 600 })
          for (const [p1, p2, t] of walls) b.wall({ p1, p2, thickness: t })
          for (const [p1, p2, k] of frames) b.frameLine({ p1, p2, storyStiffness: k })
          for (const [at, angle] of columns) b.column({ at, angle, Ix: 0.01, Iy: 0.003 })
          const s = buildStructure(b.build()).structure!
          expect(isExactlySymmetric(s.stiffness)).toBe(true)
          // MODELING.md: K = Σ A' k_e A (dense reference)
          expectArrayRelClose(s.stiffness, denseReference(s), 1e-12)
          expectRelClose(translationalMass(s.mass).x, s.totalMass, 1e-14)
        },
      ),
      { seed: 20261202, numRuns: 40 },
    )
  })

  it('gives K at the CM = k[[2,0,0],[0,3,-10],[0,-10,350]] for the one-storey eccentric case', () => {
    // METHODS.md §8 self-derived one-storey test case
    const s = buildStructure(eccentricOneStorey()).structure!
    expect(s.allShearType).toBe(true)
    const atCm = rigidTransform(s.stiffness, 1, { x: -10, y: -5 })
    // rigidTransform with D = O - CM moves the reference from O to the CM
    expectArrayRelClose(atCm, [2, 0, 0, 0, 3, -10, 0, -10, 350].map((v) => v * 1e8), 1e-14)
    expectRelClose(s.floors[0]!.polarInertia, (1e5 * (400 + 100)) / 12, 1e-13)
  })

  it('changes K and M only by the rigid transformation when the plan origin moves', () => {
    // MODELING.md §Degrees of freedom: u_old = B u_new for a shift D of all coordinates
    const D = { x: 37, y: -12 }
    const a = buildStructure(mixedModel()).structure!
    const b = buildStructure(mixedModel(D)).structure!
    expectArrayRelClose(b.stiffness, rigidTransform(a.stiffness, a.floorCount, D), 1e-12)
    expectArrayRelClose(b.mass, rigidTransform(a.mass, a.floorCount, D), 1e-12)
  })

  it('reports bad elements as issues and still assembles the rest', () => {
    const p = projectBuilder({ floors: 2 })
      .rectSlab({ width: 10, depth: 10, areaMass: 500 })
      .wall({ id: 'zero', p1: { x: 1, y: 1 }, p2: { x: 1, y: 1 } })
      .wall({ id: 'lost', p1: { x: 0, y: 0 }, p2: { x: 5, y: 0 }, top: 'L9' })
      .wall({ id: 'down', p1: { x: 0, y: 0 }, p2: { x: 5, y: 0 }, base: 'L2', top: 'L1' })
      .frameLine({ id: 'nomat', p1: { x: 0, y: 0 }, p2: { x: 0, y: 5 }, stiffness: { kind: 'braced', braces: 1, bayWidth: 5, braceArea: 1e-3, material: 'x' } })
      .column({ id: 'ok', at: { x: 5, y: 5 } })
      .build()
    const { structure, issues } = buildStructure(p)
    expect(structure).not.toBeNull()
    expect(issues.map((i) => [i.code, i.refs[0]])).toEqual([
      ['zero-length', 'zero'],
      ['element-outside-floors', 'lost'],
      ['element-outside-floors', 'down'],
      ['invalid-model', 'nomat'],
    ])
    expect(structure!.elements.map((e) => e.id)).toEqual(['ok', 'ok'])
  })

  it('returns no structure, with issues, for no floors or a floor without mass', () => {
    const none = buildStructure({ ...projectBuilder().build(), floors: [] })
    expect(none.structure).toBeNull()
    expect(none.issues[0]?.code).toBe('no-floors')
    const p = projectBuilder({ floors: 2 }).rectSlab({ width: 5, depth: 5, areaMass: 500, floor: 'L1' }).build()
    const r = buildStructure(p)
    expect(r.structure).toBeNull()
    expect(r.floors).toHaveLength(2)
    expect(r.issues.map((i) => [i.code, i.floor])).toEqual([['no-mass', 'L2']])
  })

  it('warns when a floor has no rotary inertia', () => {
    const p = projectBuilder().pointMass({ at: { x: 1, y: 1 }, mass: 1000 }).column({ at: { x: 0, y: 0 } }).build()
    const r = buildStructure(p)
    expect(r.structure).not.toBeNull()
    expect(r.issues.map((i) => [i.code, i.severity])).toEqual([['no-mass', 'warning']])
  })
})

describe('scatterElement', () => {
  it('adds a_p a_q k to the blocks of the connected floors', () => {
    const K = new Float64Array(36)
    scatterElement(K, 6, {
      id: 'e',
      kind: 'frameLine',
      floors: [1],
      map: [0.6, 0.8, 2],
      standsOnFloor: false,
      stiffness: Float64Array.of(10),
      isShearType: true,
    })
    expectRelClose(K[3 * 6 + 3]!, 3.6, 1e-15)
    expectRelClose(K[3 * 6 + 4]!, 4.8, 1e-15)
    expectRelClose(K[5 * 6 + 5]!, 40, 1e-15)
    expect(K[0]).toBe(0)
  })

  it('throws on a stiffness of the wrong size', () => {
    const K = new Float64Array(36)
    expect(() =>
      scatterElement(K, 6, {
        id: 'e',
        kind: 'frameLine',
        floors: [0, 1],
        map: [1, 0, 0],
        standsOnFloor: false,
        stiffness: Float64Array.of(1),
        isShearType: true,
      }),
    ).toThrow('stiffness has 1 terms, expected 4')
  })
})
