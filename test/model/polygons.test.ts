import { describe, expect, it } from 'vitest'
import type { Point } from '@/model'
import { openingProblems, pointInPolygon, segmentsCross, simplePolygonProblem, slabPolygonProblems } from '@/model/polygons'

const rect = (x0: number, y0: number, x1: number, y1: number): Point[] => [
  { x: x0, y: y0 },
  { x: x1, y: y0 },
  { x: x1, y: y1 },
  { x: x0, y: y1 },
]
const tol = 1e-9

describe('segmentsCross', () => {
  it('finds a proper crossing and ignores touching and collinear overlap', () => {
    // closed-form: the diagonals of the unit square cross at (0.5, 0.5)
    expect(segmentsCross({ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 0, y: 1 }, { x: 1, y: 0 }, tol)).toBe(true)
    // a T: the end of one segment on the other is touching, not crossing
    expect(segmentsCross({ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 1, y: 0 }, { x: 1, y: 1 }, tol)).toBe(false)
    // collinear overlapping pieces of one line
    expect(segmentsCross({ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 1, y: 0 }, { x: 3, y: 0 }, tol)).toBe(false)
    // parallel, apart
    expect(segmentsCross({ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 0, y: 1 }, { x: 2, y: 1 }, tol)).toBe(false)
  })

  it('treats an end within the tolerance of the other line as touching, far from the origin too', () => {
    const X = 1e6
    const t = 1e-9 * X
    expect(segmentsCross({ x: X, y: X }, { x: X + 2, y: X }, { x: X + 1, y: X - 0.1 * t }, { x: X + 1, y: X + 1 }, t)).toBe(false)
    expect(segmentsCross({ x: X, y: X }, { x: X + 2, y: X }, { x: X + 1, y: X - 1e-3 }, { x: X + 1, y: X + 1 }, t)).toBe(true)
  })
})

describe('pointInPolygon', () => {
  it('tells inside, on the boundary and outside of a concave L', () => {
    const L = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 3 },
      { x: 4, y: 3 },
      { x: 4, y: 6 },
      { x: 0, y: 6 },
    ]
    expect(pointInPolygon(L, { x: 2, y: 5 }, tol)).toBe('inside')
    expect(pointInPolygon(L, { x: 7, y: 3 }, tol)).toBe('on')
    expect(pointInPolygon(L, { x: 7, y: 5 }, tol)).toBe('outside')
  })
})

describe('simplePolygonProblem', () => {
  it('refuses a bow tie and an edge folding back, and accepts a rectangle', () => {
    expect(simplePolygonProblem([{ x: 0, y: 0 }, { x: 3, y: 3 }, { x: 3, y: 0 }, { x: 0, y: 2 }], tol)).toBe(
      'edges 0-1 and 2-3 cross or touch (an outline must not cross itself)',
    )
    expect(simplePolygonProblem([{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 3 }], tol)).toMatch(/fold back/)
    expect(simplePolygonProblem(rect(0, 0, 3, 2), tol)).toBeNull()
  })
})

describe('openingProblems', () => {
  const outline = rect(0, 0, 10, 6)
  it('names overlapping, nested, containing, duplicate and crossing openings', () => {
    expect(openingProblems(outline, [rect(1, 1, 4, 4), rect(3, 2, 6, 5)])[0]?.message).toMatch(/^overlaps openings\[0\] \(its edge/)
    expect(openingProblems(outline, [rect(1, 1, 4, 4), rect(2, 2, 3, 3)])[0]?.message).toBe(
      'lies inside openings[0] (openings must not overlap each other)',
    )
    expect(openingProblems(outline, [rect(2, 2, 3, 3), rect(1, 1, 4, 4)])[0]?.message).toBe(
      'contains openings[0] (openings must not overlap each other)',
    )
    expect(openingProblems(outline, [rect(1, 1, 4, 4), rect(1, 1, 4, 4)])[0]?.message).toBe(
      'overlaps openings[0] (openings must not overlap each other)',
    )
    // a plus sign: no vertex of either lies inside the other, but the edges cross
    expect(openingProblems(outline, [rect(1, 2, 9, 3), rect(4, 1, 5, 5)])).toEqual([
      { path: 'openings[1]', message: expect.stringMatching(/^overlaps openings\[0\]/) as unknown as string },
    ])
  })

  it('accepts openings that touch each other and the outline', () => {
    expect(openingProblems(outline, [rect(1, 1, 3, 3), rect(3, 1, 5, 3), rect(0, 4, 2, 6)])).toEqual([])
  })

  it('refuses an opening whose vertices are inside a concave outline but whose edge crosses the notch', () => {
    const L = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 3 },
      { x: 4, y: 3 },
      { x: 4, y: 6 },
      { x: 0, y: 6 },
    ]
    const tri = [{ x: 1, y: 1 }, { x: 9, y: 1 }, { x: 2, y: 5 }]
    expect(slabPolygonProblems(L, [tri])).toEqual([
      { path: 'openings[0]', message: 'must lie inside the outline (its edge 1-2 crosses outline edge 2-3)' },
    ])
  })
})
