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
})
