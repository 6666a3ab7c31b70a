import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import {
  boxSelect,
  distanceToPolygonEdge,
  distanceToSegment,
  hitTest,
  hitTestAll,
  pointInPolygon,
  pointInSlab,
} from '@/editor'
import { smallFixture } from '../../helpers/createTestEditor'

const L1 = 'L1' as FloorId
// An L-shaped outline: 12 x 8 with the 6 x 4 top-right corner cut away.
const L = [
  { x: 0, y: 0 },
  { x: 12, y: 0 },
  { x: 12, y: 4 },
  { x: 6, y: 4 },
  { x: 6, y: 8 },
  { x: 0, y: 8 },
]

describe('distanceToSegment', () => {
  it('measures the perpendicular distance inside the segment (hand calculation)', () => {
    const r = distanceToSegment({ x: 3, y: 4 }, { x: 0, y: 0 }, { x: 6, y: 0 })
    expect(r.distance).toBeCloseTo(4, 12)
    expect(r.t).toBeCloseTo(0.5, 12)
    expect(r.closest).toEqual({ x: 3, y: 0 })
  })

  it('measures to the nearer end beyond the segment (3-4-5 triangle)', () => {
    const r = distanceToSegment({ x: 9, y: 4 }, { x: 0, y: 0 }, { x: 6, y: 0 })
    expect(r.distance).toBeCloseTo(5, 12)
    expect(r.t).toBeCloseTo(1, 12)
  })

  it('handles an oblique segment: (0,0)-(4,4) from (4,0) is 4/sqrt(2)', () => {
    expect(distanceToSegment({ x: 4, y: 0 }, { x: 0, y: 0 }, { x: 4, y: 4 }).distance).toBeCloseTo(4 / Math.SQRT2, 12)
  })

  it('treats a zero-length segment as a point', () => {
    expect(distanceToSegment({ x: 3, y: 4 }, { x: 0, y: 0 }, { x: 0, y: 0 }).distance).toBeCloseTo(5, 12)
  })
})

describe('pointInPolygon', () => {
  it('tells inside from outside an L-shape, including the cut-away corner', () => {
    expect(pointInPolygon({ x: 3, y: 6 }, L)).toBe(true)
    expect(pointInPolygon({ x: 9, y: 2 }, L)).toBe(true)
    expect(pointInPolygon({ x: 9, y: 6 }, L)).toBe(false)
    expect(pointInPolygon({ x: -1, y: 2 }, L)).toBe(false)
    expect(pointInPolygon({ x: 13, y: 2 }, L)).toBe(false)
  })

  it('does not depend on the winding', () => {
    const cw = [...L].reverse()
    expect(pointInPolygon({ x: 3, y: 6 }, cw)).toBe(true)
    expect(pointInPolygon({ x: 9, y: 6 }, cw)).toBe(false)
  })
})

describe('pointInSlab', () => {
  it('excludes openings', () => {
    const slab = smallFixture().slabs.s1
    if (!slab) throw new Error('fixture')
    expect(pointInSlab({ x: 3, y: 3 }, slab)).toBe(false)
    expect(pointInSlab({ x: 5, y: 3 }, slab)).toBe(true)
  })
})

describe('distanceToPolygonEdge', () => {
  it('is the distance to the nearest edge, closing edge included', () => {
    expect(distanceToPolygonEdge({ x: -2, y: 4 }, L)).toBeCloseTo(2, 12)
    expect(distanceToPolygonEdge({ x: 9, y: 6 }, L)).toBeCloseTo(2, 12)
  })
})

describe('hitTest', () => {
  const doc = smallFixture()

  it('prefers a wall over the slab edge it lies on', () => {
    expect(hitTest(doc, L1, { x: 12.05, y: 4 }, 0.2)?.id).toBe('w2')
  })

  it('prefers a column over the slab it stands in', () => {
    expect(hitTest(doc, L1, { x: 6.1, y: 4.1 }, 0.2)?.id).toBe('c1')
  })

  it('picks the slab inside its area and nothing inside an opening or beyond tolerance', () => {
    expect(hitTest(doc, L1, { x: 8, y: 2 }, 0.2)?.kind).toBe('slabs')
    expect(hitTest(doc, L1, { x: 3, y: 3 }, 0.2)).toBeNull()
    expect(hitTest(doc, L1, { x: 20, y: 20 }, 0.2)).toBeNull()
  })

  it('only sees elements whose floor range covers the floor', () => {
    // w2 spans ground..L2, so it is not on L3
    expect(hitTest(doc, 'L3' as FloorId, { x: 12.05, y: 4 }, 0.2)?.id).not.toBe('w2')
    expect(hitTestAll(doc, 'L2' as FloorId, { x: 12.05, y: 4 }, 0.2)[0]?.id).toBe('w2')
  })
})

describe('boxSelect', () => {
  const doc = smallFixture()

  it('takes what lies wholly inside, whatever the corner order', () => {
    expect(boxSelect(doc, L1, { x: 5, y: 1 }, { x: -1, y: -1 })).toEqual(['w1'])
    expect(boxSelect(doc, L1, { x: -1, y: -1 }, { x: 13, y: 9 }).sort()).toEqual(['c1', 'f1', 'lm1', 'pm1', 's1', 'w1', 'w2'])
  })
})
