import { Matrix, solve } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { buildColumnElements, columnStoryStiffness } from '@/engine/elements/column'
import { buildStructure } from '@/engine/assemble'
import type { Column } from '@/model'
import { expectArrayRelClose, expectRelClose } from '../../helpers/approx'
import { projectBuilder } from '../../helpers/projectBuilder'

describe('columnStoryStiffness', () => {
  it('gives 12EI/h³ fixed and 3EI/h³ pinned, times the factor', () => {
    // closed forms: sway stiffness of a fixed-fixed member 12EI/h³, fixed-pinned 3EI/h³ (common practice)
    expectRelClose(columnStoryStiffness(30e9, 0.0052, 3.5, 'fixed'), (12 * 30e9 * 0.0052) / 3.5 ** 3, 1e-15)
    expectRelClose(columnStoryStiffness(30e9, 0.0052, 3.5, 'pinned', 0.7), (3 * 30e9 * 0.0052 * 0.7) / 3.5 ** 3, 1e-15)
    expectRelClose(columnStoryStiffness(30e9, 0.0052, 3.5, 'slab'), (12 * 30e9 * 0.0052) / 3.5 ** 3, 1e-15)
  })

  /**
   * Independent reference: the 4x4 Euler-Bernoulli member (v1, θ1, v2, θ2) with rotational springs
   * β·EI/h at the restrained ends, β = 6r/(1 - r), its rotations condensed by ml-matrix (solve).
   * @see Przemieniecki, Theory of Matrix Structural Analysis (1968), beam element (from memory)
   */
  const springReference = (bottom: 'fixed' | 'pinned' | 'slab', r: number): number => {
    const EI = 1
    const h = 1
    const beta = (6 * r) / (1 - r)
    const k = new Matrix([
      [12, 6, -12, 6],
      [6, 4, -6, 2],
      [-12, -6, 12, -6],
      [6, 2, -6, 4],
    ])
    // keep v2 (top sway), θ2 (top), and θ1 unless the foot is fixed; v1 = 0
    const keep = bottom === 'fixed' ? [2, 3] : [2, 1, 3]
    const K = new Matrix(keep.map((i) => keep.map((j) => k.get(i, j))))
    const top = keep.indexOf(3)
    K.set(top, top, K.get(top, top) + beta * EI * h)
    if (bottom === 'slab') K.set(1, 1, K.get(1, 1) + beta * EI * h)
    const Ktt = K.subMatrix(1, keep.length - 1, 1, keep.length - 1)
    const Ktu = K.subMatrix(1, keep.length - 1, 0, 0)
    return K.get(0, 0) - Ktu.transpose().mmul(solve(Ktt, Ktu)).get(0, 0)
  }

  it.each([
    ['slab', 0.5],
    ['slab', 0.2],
    ['fixed', 0.5],
    ['fixed', 0.1],
    ['pinned', 0.5],
    ['pinned', 0.9],
  ] as const)('matches end springs condensed by ml-matrix, bottom %s, restraint %s', (bottom, r) => {
    // reference: springReference above (EI = h = 1, so k is the coefficient c in c·EI/h³)
    expectRelClose(columnStoryStiffness(1, 1, 1, bottom, 1, r), springReference(bottom, r), 1e-12)
  })

  it('tends to the pinned-end forms as the slab restraint vanishes', () => {
    // closed forms: fixed foot, free-to-turn top 3EI/h³; pinned foot, free-to-turn top 0 (common practice)
    expectRelClose(columnStoryStiffness(1, 1, 1, 'fixed', 1, 1e-9), 3, 1e-8)
    expect(columnStoryStiffness(1, 1, 1, 'pinned', 1, 1e-9)).toBeLessThan(1e-8)
  })
})

describe('buildColumnElements', () => {
  const make = (angle: number) =>
    projectBuilder({ floors: 1, height: 4 })
      .rectSlab({ width: 10, depth: 10, areaMass: 500 })
      .column({ id: 'c', at: { x: 2, y: 3 }, Ix: 0.01, Iy: 0.002, angle })
      .build()

  it('lets Iy resist local x and Ix resist local y (MODELING.md axis convention)', () => {
    const p = make(0)
    const { elements } = buildColumnElements(p, p.columns.c as Column)
    const ex = elements.find((e) => e.kind === 'columnX')!
    const ey = elements.find((e) => e.kind === 'columnY')!
    expectArrayRelClose(ex.map, [1, 0, -3], 1e-15)
    expectArrayRelClose(ey.map, [0, 1, 2], 1e-15)
    expectRelClose(ex.stiffness[0]!, (12 * 30e9 * 0.002) / 64, 1e-15)
    expectRelClose(ey.stiffness[0]!, (12 * 30e9 * 0.01) / 64, 1e-15)
  })

  it('swaps the Ix/Iy action in global axes when rotated by 90°', () => {
    const K0 = buildStructure(make(0)).structure!.stiffness
    const K90 = buildStructure(make(Math.PI / 2)).structure!.stiffness
    // global x stiffness at 90° is the global y stiffness at 0° and vice versa
    expectRelClose(K90[0]!, K0[4]!, 1e-12)
    expectRelClose(K90[4]!, K0[0]!, 1e-12)
    expect(Math.abs(K90[1]!)).toBeLessThan(1e-9 * K0[4]!)
  })

  it('keeps the total stiffness tensor for a skewed column: trace and determinant invariant', () => {
    // rotation of a 2x2 stiffness tensor keeps its trace and determinant (linear algebra)
    const K0 = buildStructure(make(0)).structure!.stiffness
    const K30 = buildStructure(make(Math.PI / 6)).structure!.stiffness
    expectRelClose(K30[0]! + K30[4]!, K0[0]! + K0[4]!, 1e-13)
    expectRelClose(K30[0]! * K30[4]! - K30[1]! * K30[3]!, K0[0]! * K0[4]!, 1e-12)
    // k_xy = (k_x - k_y) sin a cos a for local stiffnesses k_x (along local x), k_y
    const kx = (12 * 30e9 * 0.002) / 64
    const ky = (12 * 30e9 * 0.01) / 64
    expectRelClose(K30[1]!, (kx - ky) * Math.sin(Math.PI / 6) * Math.cos(Math.PI / 6), 1e-12)
  })

  it('reports a missing material instead of throwing', () => {
    const p = projectBuilder().column({ id: 'c', at: { x: 0, y: 0 }, material: 'nope' }).build()
    const r = buildColumnElements(p, p.columns.c as Column)
    expect(r.elements).toHaveLength(0)
    expect(r.issues[0]?.code).toBe('invalid-model')
  })

  it('pins a pinned column at its foot only: 3EI/h³ in the base story, 12EI/h³ above', () => {
    // MODELING.md §Lateral-resisting elements; closed forms 3EI/h³ (fixed-pinned), 12EI/h³ (fixed-fixed)
    const p = projectBuilder({ floors: 3, height: 3 })
      .column({ id: 'c', at: { x: 0, y: 0 }, Ix: 0.004, Iy: 0.004, fixity: 'pinned' })
      .build()
    const ex = buildColumnElements(p, p.columns.c as Column).elements.find((e) => e.kind === 'columnX')!
    const k1 = (3 * 30e9 * 0.004) / 27
    const k2 = (12 * 30e9 * 0.004) / 27
    // shear chain: K[0][0] = k1 + k2, K[1][1] = 2 k2, K[2][2] = k2
    expectArrayRelClose([ex.stiffness[0]!, ex.stiffness[4]!, ex.stiffness[8]!], [k1 + k2, 2 * k2, k2], 1e-14)
  })

  it('applies the slab restraint r as r·12EI/h³ above the foot and uses the 0.70 default factor', () => {
    // ACI 318-19 Table 6.6.3.1.1(a): columns 0.70 Ig; spring forms in docs/mechanics.md §5
    const p = projectBuilder({ floors: 2, height: 4 }).column({ id: 'c', at: { x: 0, y: 0 }, Ix: 0.004, Iy: 0.004 }).build()
    const { stiffnessFactor: _, ...bare } = p.columns.c as Column
    const c: Column = { ...bare, restraint: 0.5 }
    const ex = buildColumnElements(p, c).elements.find((e) => e.kind === 'columnX')!
    const EI = 30e9 * 0.004 * 0.7
    const foot = ((6 * (1 + 2.5)) / 2.5) * (EI / 64)
    const above = 6 * (EI / 64)
    expectArrayRelClose([ex.stiffness[0]!, ex.stiffness[3]!], [foot + above, above], 1e-14)
  })

  it('refuses a restraint outside (0, 1] naming the field', () => {
    const p = projectBuilder().column({ id: 'c', at: { x: 0, y: 0 } }).build()
    const r = buildColumnElements(p, { ...(p.columns.c as Column), restraint: 1.5 })
    expect(r.elements).toHaveLength(0)
    expect(r.issues[0]?.message).toContain('restraint')
  })
})
