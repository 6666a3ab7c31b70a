import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { INPUT_BUDGET, checkFileSizeBudget, parseProject, parseProjectText } from '@/model'
import { layoutBuilding } from '@/viewer/buildingLayout'

const circle = (n: number, R: number) =>
  Array.from({ length: n }, (_, i) => ({ x: R * Math.cos((2 * Math.PI * i) / n), y: R * Math.sin((2 * Math.PI * i) / n) }))

/** One storey on a round slab of `n` vertices with three walls. */
function roundSlab(n: number, slabs = 1): Record<string, unknown> {
  return {
    format: 'gyre-project',
    version: 1,
    floors: [{ id: 'F1', height: 3 }],
    materials: { c: { E: 3e10, nu: 0.2 } },
    slabs: Object.fromEntries(
      Array.from({ length: slabs }, (_, k) => [`s${k}`, { floor: 'F1', outline: circle(n, 20 + k), areaMass: 500 }]),
    ),
    walls: {
      a: { p1: { x: -10, y: 0 }, p2: { x: 10, y: 0 }, thickness: 0.3, material: 'c', top: 'F1' },
      b: { p1: { x: 0, y: -10 }, p2: { x: 0, y: 10 }, thickness: 0.3, material: 'c', top: 'F1' },
      c: { p1: { x: 15, y: -5 }, p2: { x: 15, y: 5 }, thickness: 0.3, material: 'c', top: 'F1' },
    },
  }
}

describe('the input size budget', () => {
  it('refuses 20 000 walls × 300 floors with one clear message naming the fields, before any per-field work', () => {
    const walls: Record<string, unknown> = {}
    for (let i = 0; i < 20000; i++) {
      walls[`w${i}`] = { p1: { x: 0, y: i * 0.001 }, p2: { x: 1, y: i * 0.001 }, thickness: 0.2, material: 'c', top: 'F300' }
    }
    const doc = {
      format: 'gyre-project',
      version: 1,
      floors: Array.from({ length: 300 }, (_, i) => ({ id: `F${i + 1}`, height: 3 })),
      walls,
    }
    const r = parseProjectText(JSON.stringify(doc))
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.errors).toEqual([
      'walls, frameLines, columns: 20000 lateral elements × 300 floors = 6000000 is more than the budget of 200000 element-floors',
      'the input size budget is in docs/file-format.md, Limits',
    ])
  })

  it('refuses 15 slabs of 10 000 vertices by the total vertex budget (was: CLI exit 3, stack overflow)', () => {
    const r = parseProject(roundSlab(10000, 15))
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.errors[0]).toBe('slabs, lineMasses: 150000 vertices in all is more than the budget of 50000')
  })

  it('refuses an outline over the per-polygon budget and a file over the byte budget', () => {
    const r = parseProject(roundSlab(10001))
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.errors[0]).toBe('slabs.s0.outline: 10001 vertices is more than the budget of 10000')
    expect(checkFileSizeBudget(INPUT_BUDGET.fileBytes + 1)).toMatch(/^\(file\): 67108865 bytes is more than the budget/)
    expect(checkFileSizeBudget(1000)).toBeNull()
  })

  it('loads, analyzes and lays out one 10 000-vertex outline with the closed-form mass', () => {
    const r = parseProject(roundSlab(10000))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    const result = analyzeProject(r.project)
    expect(result.status).toBe('ok')
    // regular n-gon inscribed in a circle of radius R: A = n/2 R² sin(2π/n) (closed form)
    const area = (10000 / 2) * 400 * Math.sin((2 * Math.PI) / 10000)
    expect(result.floors[0]!.mass / (500 * area)).toBeCloseTo(1, 9)
    const layout = layoutBuilding(r.project)
    expect(layout.box.maxX).toBeCloseTo(20, 9)
  })
})
