import { readFileSync } from 'node:fs'
import { resolve } from 'node:path'
import { describe, expect, it } from 'vitest'
import type { Project } from '@/model'
import { layoutBuilding, segmentQuad, SLAB_THICKNESS, writeAttachedPositions } from '@/viewer/buildingLayout'
import { applyTransform, IDENTITY_TRANSFORM, rigidTransform } from '@/viewer/modeAnimation'
import { threeFloorProject } from './fixtures'

const demo = JSON.parse(
  readFileSync(resolve(import.meta.dirname, '../../public/examples/corner-block.json'), 'utf8'),
) as Project

describe('segmentQuad', () => {
  it('thickens a segment to a rectangle of its real length and thickness', () => {
    const q = segmentQuad({ x: 1, y: 1 }, { x: 4, y: 5 }, 0.3)
    const d = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y)
    expect(d(q[0], q[1])).toBeCloseTo(5, 12)
    expect(d(q[1], q[2])).toBeCloseTo(0.3, 12)
    // counter-clockwise: positive shoelace area = L * t
    const area = q.reduce((s, p, i) => {
      const r = q[(i + 1) % 4]!
      return s + (p.x * r.y - r.x * p.y) / 2
    }, 0)
    expect(area).toBeCloseTo(1.5, 12)
  })
})

describe('layoutBuilding', () => {
  it('builds one prism per wall and story with per-story thickness, attached below and above', () => {
    const layout = layoutBuilding(threeFloorProject())
    // w1 spans 3 stories, w2 spans 2: 5 prisms of 24 vertices.
    expect(layout.walls.ids).toEqual(['w1', 'w1', 'w1', 'w2', 'w2'])
    expect(layout.walls.attach.length).toBe(5 * 24)
    const p = layout.walls.positions
    const xs = (k: number) => Array.from({ length: 24 }, (_, v) => p[(k * 24 + v) * 3]!)
    // w2 (x = 20) story 2 uses the override thickness 0.2: x spans 19.9..20.1
    expect(Math.max(...xs(4)) - Math.min(...xs(4))).toBeCloseTo(0.2, 5)
    expect(Math.max(...xs(3)) - Math.min(...xs(3))).toBeCloseTo(0.25, 5)
    const attach = Array.from(layout.walls.attach.slice(0, 24))
    expect(new Set(attach)).toEqual(new Set([-1, 0]))
    const zs = Array.from({ length: 24 }, (_, v) => p[v * 3 + 2]!)
    expect(Math.min(...zs)).toBeCloseTo(0, 6)
    expect(Math.max(...zs)).toBeCloseTo(3.5 - SLAB_THICKNESS, 6)
  })

  it('lays out a braced frame as verticals, a beam and two braces per story', () => {
    const layout = layoutBuilding(threeFloorProject())
    expect(layout.frames.positions.length / 6).toBe(3 * 5)
  })

  it('gives typical floors the slabs of the floor they follow (demo building)', () => {
    const layout = layoutBuilding(demo)
    expect(layout.floors).toHaveLength(7)
    expect(layout.floors[3]!.slabs.map((s) => s.id)).toEqual(['s-L2'])
    expect(layout.floors[3]!.slabs[0]!.openings).toHaveLength(1)
    expect(layout.walls.ids).toHaveLength(5 * 7)
    expect(layout.columns.ids).toHaveLength(12 * 7)
    // elevations: 4.5 + 6 * 3.2 = 23.7 m
    expect(layout.height).toBeCloseTo(23.7, 9)
    expect(layout.box).toEqual({ minX: 0, maxX: 30, minY: 0, maxY: 24 })
  })
})

describe('writeAttachedPositions', () => {
  it('moves each vertex with the rigid motion of its floor and leaves base vertices at rest', () => {
    const layout = layoutBuilding(threeFloorProject())
    const transforms = [
      rigidTransform({ ux: 0.1, uy: 0, theta: 0.001 }),
      rigidTransform({ ux: 0.2, uy: -0.1, theta: 0.004 }),
      IDENTITY_TRANSFORM,
    ]
    const out = new Float32Array(layout.walls.positions.length)
    writeAttachedPositions(layout.walls.positions, layout.walls.attach, transforms, out)
    for (let v = 0; v < layout.walls.attach.length; v++) {
      const rest = { x: layout.walls.positions[3 * v]!, y: layout.walls.positions[3 * v + 1]! }
      const tr = transforms[layout.walls.attach[v]!]
      const want = tr ? applyTransform(tr, rest.x, rest.y) : rest
      expect(out[3 * v]).toBeCloseTo(want.x, 4)
      expect(out[3 * v + 1]).toBeCloseTo(want.y, 4)
      expect(out[3 * v + 2]).toBe(layout.walls.positions[3 * v + 2])
    }
  })
})
