import { describe, expect, it } from 'vitest'
import { polarPoint, segmentReadout } from '@/editor'

describe('segmentReadout', () => {
  it('gives length 5 and angle atan2(4, 3) for a 3-4-5 segment', () => {
    const r = segmentReadout({ x: 1, y: 1 }, { x: 4, y: 5 })
    expect(r.length).toBeCloseTo(5, 12)
    expect(r.angle).toBeCloseTo(0.9272952180016122, 12)
    expect(r.dx).toBeCloseTo(3, 12)
    expect(r.dy).toBeCloseTo(4, 12)
  })

  it('reports angles in [0, 2*pi): straight down is 3*pi/2', () => {
    expect(segmentReadout({ x: 0, y: 0 }, { x: 0, y: -2 }).angle).toBeCloseTo((3 * Math.PI) / 2, 12)
    expect(segmentReadout({ x: 0, y: 0 }, { x: 0, y: 0 }).angle).toBeCloseTo(0, 12)
  })
})

describe('polarPoint', () => {
  it('goes 2 m at 60° to (1, sqrt(3))', () => {
    const p = polarPoint({ x: 0, y: 0 }, 2, Math.PI / 3)
    expect(p.x).toBeCloseTo(1, 12)
    expect(p.y).toBeCloseTo(Math.sqrt(3), 12)
  })
})
