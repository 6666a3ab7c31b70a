import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { DEFAULT_SNAP, constrainAngle, snapPoint } from '@/editor'
import { smallFixture } from '../../helpers/createTestEditor'

const L1 = 'L1' as FloorId
const doc = smallFixture()
const all = { ...DEFAULT_SNAP, tolerance: 0.2 }
const gridOnly = { ...all, elements: false, vertices: false, midpoints: false }

describe('snapPoint', () => {
  it('snaps to a grid intersection within tolerance and labels it', () => {
    const s = snapPoint(doc, L1, { x: 6.1, y: 7.9 }, gridOnly)
    expect(s.kind).toBe('grid-intersection')
    expect(s.point).toEqual({ x: 6, y: 8 })
    expect(s.label).toBe('B/2')
  })

  it('projects onto the nearest grid line when no intersection is near', () => {
    const s = snapPoint(doc, L1, { x: 3, y: 7.9 }, gridOnly)
    expect(s.kind).toBe('grid-line')
    expect(s.point.x).toBeCloseTo(3, 12)
    expect(s.point.y).toBeCloseTo(8, 12)
    expect(s.label).toBe('B')
  })

  it('prefers an element end over a grid intersection at the same spot', () => {
    const s = snapPoint(doc, L1, { x: 0.05, y: 0.05 }, all)
    expect(s.kind).toBe('endpoint')
    expect(s.point).toEqual({ x: 0, y: 0 })
  })

  it('snaps to a wall midpoint, (0,0)-(4,0) -> (2,0)', () => {
    const s = snapPoint(doc, L1, { x: 2.1, y: 0.1 }, all)
    expect(s.kind).toBe('midpoint')
    expect(s.ref).toBe('w1')
    expect(s.point).toEqual({ x: 2, y: 0 })
  })

  it('snaps to slab vertices including opening corners', () => {
    const s = snapPoint(doc, L1, { x: 4.1, y: 3.9 }, all)
    expect(s.kind).toBe('vertex')
    expect(s.ref).toBe('s1')
    expect(s.point).toEqual({ x: 4, y: 4 })
  })

  it('does not snap beyond the tolerance (0.3 m away with 0.2 m tolerance)', () => {
    const s = snapPoint(doc, L1, { x: 6.3, y: 5 }, all)
    expect(s.kind).toBe('none')
    expect(s.point).toEqual({ x: 6.3, y: 5 })
    expect(snapPoint(doc, L1, { x: 6.3, y: 5 }, { ...all, tolerance: 0.35 }).kind).toBe('grid-line')
  })

  it('leaves out excluded records', () => {
    const s = snapPoint(doc, L1, { x: 2.1, y: 0.1 }, { ...all, exclude: ['w1', 's1', 'lm1'] })
    expect(s.kind).toBe('grid-line')
    expect(s.point.y).toBeCloseTo(0, 12)
  })
})

describe('constrainAngle', () => {
  it('rounds a nearly horizontal direction to 0°, keeping the projected length', () => {
    const p = constrainAngle({ x: 0, y: 0 }, { x: 10, y: 1 })
    expect(p.x).toBeCloseTo(10, 12)
    expect(p.y).toBeCloseTo(0, 12)
  })

  it('rounds to 45°: (1, 1.1) -> length (1 + 1.1)/sqrt(2) along 45°', () => {
    const p = constrainAngle({ x: 0, y: 0 }, { x: 1, y: 1.1 })
    expect(p.x).toBeCloseTo(1.05, 12)
    expect(p.y).toBeCloseTo(1.05, 12)
  })
})
