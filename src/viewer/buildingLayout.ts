/**
 * Pure layout of the building for the 3D view: floors with their slabs, members (walls, columns) as
 * prisms story by story, frame lines as light line members, all as plain arrays. Every vertex is
 * "attached" to the floor it moves with (-1 = the fixed base), so the frame loop can displace it with
 * that floor's rigid motion. No three.js here.
 */
import { computeElevations, elementFloorRange, floorContent, pointsExtent } from '@/model'
import type { Point, Project } from '@/model'
import type { RigidTransform } from './modeAnimation'

/** Visual slab thickness, m (the model has none: slabs are rigid diaphragms with an area mass). */
export const SLAB_THICKNESS = 0.22
/** Visual column size, m (the model gives second moments, not dimensions). */
export const COLUMN_SIZE = 0.45

export interface LayoutSlab {
  readonly id: string
  readonly outline: readonly Point[]
  readonly openings: readonly (readonly Point[])[]
}

export interface LayoutFloor {
  readonly index: number
  readonly id: string
  readonly name: string
  /** z of the top of the slab, m. */
  readonly elevation: number
  /** height of the story below, m. */
  readonly height: number
  readonly slabs: readonly LayoutSlab[]
  /** Vertices of the outer outlines of its slabs (the floor's extreme points). */
  readonly corners: readonly Point[]
}

/**
 * Baked light: brightness of a face with unit normal n under one fixed sun plus sky light, 0..1.
 * Lighting is baked once per model revision so the frame loop needs only unlit materials, which
 * software WebGL renders about twice as fast as lit ones.
 */
export function shadeOf(nx: number, ny: number, nz: number): number {
  // Sun from the lower left of the plan, high up: L = (-0.35, -0.6, 0.72) normalized.
  const lx = -0.35
  const ly = -0.6
  const lz = 0.72
  const len = Math.hypot(lx, ly, lz)
  const diffuse = Math.max(0, (nx * lx + ny * ly + nz * lz) / len)
  const sky = 0.5 + 0.5 * nz
  return Math.min(1, 0.42 + 0.4 * diffuse + 0.18 * sky)
}

/** Attached vertex data: rest positions xyz, the floor each vertex moves with, its story. */
export interface AttachedMesh {
  readonly positions: Float32Array
  readonly normals: Float32Array
  readonly indices: Uint32Array
  /** Per vertex: floor index it moves with, -1 = base. */
  readonly attach: Int32Array
  /** Per vertex: floor index at the top of its story (for colour by story). */
  readonly story: Int32Array
  /** Per vertex: baked light factor (see shadeOf). */
  readonly shade: Float32Array
  /** Element id per prism, in order (24 vertices each). */
  readonly ids: readonly string[]
}

export interface AttachedLines {
  readonly positions: Float32Array
  readonly attach: Int32Array
  readonly story: Int32Array
}

export interface BuildingLayout {
  readonly floors: readonly LayoutFloor[]
  readonly walls: AttachedMesh
  readonly columns: AttachedMesh
  readonly frames: AttachedLines
  /** Bounding box of all slab corners (and element ends), m. */
  readonly box: { minX: number; maxX: number; minY: number; maxY: number }
  /** Height of the roof, m. */
  readonly height: number
}

interface Prism {
  readonly id: string
  /** Four plan corners, counter-clockwise. */
  readonly quad: readonly [Point, Point, Point, Point]
  readonly z0: number
  readonly z1: number
  readonly below: number
  readonly top: number
}

/** Plan quad of a segment p1-p2 thickened by t (centred), counter-clockwise. */
export function segmentQuad(p1: Point, p2: Point, t: number): [Point, Point, Point, Point] {
  const dx = p2.x - p1.x
  const dy = p2.y - p1.y
  const len = Math.hypot(dx, dy) || 1
  const nx = (-dy / len) * (t / 2)
  const ny = (dx / len) * (t / 2)
  return [
    { x: p1.x - nx, y: p1.y - ny },
    { x: p2.x - nx, y: p2.y - ny },
    { x: p2.x + nx, y: p2.y + ny },
    { x: p1.x + nx, y: p1.y + ny },
  ]
}

/** Faces of a prism as (corner indices 0..7: 0-3 bottom ccw, 4-7 top ccw), outward normals by construction. */
const FACES: readonly (readonly [number, number, number, number])[] = [
  [0, 3, 2, 1],
  [4, 5, 6, 7],
  [0, 1, 5, 4],
  [1, 2, 6, 5],
  [2, 3, 7, 6],
  [3, 0, 4, 7],
]

function buildPrisms(prisms: readonly Prism[]): AttachedMesh {
  const n = prisms.length
  const positions = new Float32Array(n * 24 * 3)
  const normals = new Float32Array(n * 24 * 3)
  const indices = new Uint32Array(n * 36)
  const attach = new Int32Array(n * 24)
  const story = new Int32Array(n * 24)
  const shade = new Float32Array(n * 24)
  prisms.forEach((p, k) => {
    const corners = [
      ...p.quad.map((q) => [q.x, q.y, p.z0] as const),
      ...p.quad.map((q) => [q.x, q.y, p.z1] as const),
    ]
    FACES.forEach((face, f) => {
      const c = face.map((i) => corners[i]!)
      // Face normal from two edges (Newell-free: faces are planar quads).
      const ax = c[1]![0] - c[0]![0]
      const ay = c[1]![1] - c[0]![1]
      const az = c[1]![2] - c[0]![2]
      const bx = c[3]![0] - c[0]![0]
      const by = c[3]![1] - c[0]![1]
      const bz = c[3]![2] - c[0]![2]
      let nx = ay * bz - az * by
      let ny = az * bx - ax * bz
      let nz = ax * by - ay * bx
      const len = Math.hypot(nx, ny, nz) || 1
      nx /= len
      ny /= len
      nz /= len
      face.forEach((ci, j) => {
        const v = k * 24 + f * 4 + j
        const xyz = corners[ci]!
        positions.set(xyz, v * 3)
        normals.set([nx, ny, nz], v * 3)
        attach[v] = ci < 4 ? p.below : p.top
        story[v] = p.top
        shade[v] = shadeOf(nx, ny, nz)
      })
      const base = k * 24 + f * 4
      indices.set([base, base + 1, base + 2, base, base + 2, base + 3], k * 36 + f * 6)
    })
  })
  return { positions, normals, indices, attach, story, shade, ids: prisms.map((p) => p.id) }
}

interface Seg {
  a: Point
  za: number
  fa: number
  b: Point
  zb: number
  fb: number
  story: number
}

function buildLines(segs: readonly Seg[]): AttachedLines {
  const positions = new Float32Array(segs.length * 6)
  const attach = new Int32Array(segs.length * 2)
  const story = new Int32Array(segs.length * 2)
  segs.forEach((s, k) => {
    positions.set([s.a.x, s.a.y, s.za, s.b.x, s.b.y, s.zb], k * 6)
    attach[2 * k] = s.fa
    attach[2 * k + 1] = s.fb
    story[2 * k] = s.story
    story[2 * k + 1] = s.story
  })
  return { positions, attach, story }
}

const lerp = (a: Point, b: Point, t: number): Point => ({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t })

/** Lay out a project for the 3D view. Elements with an unknown floor range are left out. */
export function layoutBuilding(project: Project): BuildingLayout {
  const z = computeElevations(project)
  const zOf = (i: number) => (i < 0 ? 0 : (z[i] ?? 0))
  const floors: LayoutFloor[] = project.floors.map((f, index) => {
    const slabs = floorContent(project, f.id).slabs.map((s) => ({
      id: s.id,
      outline: s.outline,
      openings: s.openings,
    }))
    return {
      index,
      id: f.id,
      name: f.name,
      elevation: zOf(index),
      height: f.height,
      slabs,
      corners: slabs.flatMap((s) => s.outline),
    }
  })
  const wallPrisms: Prism[] = []
  for (const w of Object.values(project.walls)) {
    const range = elementFloorRange(project, w)
    if (!range) continue
    for (let f = range.first; f <= range.last; f++) {
      const floorId = project.floors[f]?.id ?? ''
      const t = w.stories?.[floorId]?.thickness ?? w.thickness
      wallPrisms.push({
        id: w.id,
        quad: segmentQuad(w.p1, w.p2, t),
        z0: zOf(f - 1),
        z1: zOf(f) - SLAB_THICKNESS,
        below: f - 1,
        top: f,
      })
    }
  }
  const columnPrisms: Prism[] = []
  for (const c of Object.values(project.columns)) {
    const range = elementFloorRange(project, c)
    if (!range) continue
    const half = COLUMN_SIZE / 2
    const ca = Math.cos(c.angle) * half
    const sa = Math.sin(c.angle) * half
    const p1 = { x: c.at.x - ca, y: c.at.y - sa }
    const p2 = { x: c.at.x + ca, y: c.at.y + sa }
    for (let f = range.first; f <= range.last; f++) {
      columnPrisms.push({
        id: c.id,
        quad: segmentQuad(p1, p2, COLUMN_SIZE),
        z0: zOf(f - 1),
        z1: zOf(f) - SLAB_THICKNESS,
        below: f - 1,
        top: f,
      })
    }
  }
  const segs: Seg[] = []
  for (const fl of Object.values(project.frameLines)) {
    const range = elementFloorRange(project, fl)
    if (!range) continue
    const bays = fl.stiffness.kind === 'moment' ? Math.max(1, Math.round(fl.stiffness.bays)) : 1
    for (let f = range.first; f <= range.last; f++) {
      const z0 = zOf(f - 1)
      const z1 = zOf(f) - SLAB_THICKNESS
      for (let k = 0; k <= bays; k++) {
        const p = lerp(fl.p1, fl.p2, k / bays)
        segs.push({ a: p, za: z0, fa: f - 1, b: p, zb: z1, fb: f, story: f })
      }
      segs.push({ a: fl.p1, za: z1, fa: f, b: fl.p2, zb: z1, fb: f, story: f })
      if (fl.stiffness.kind === 'braced') {
        segs.push({ a: fl.p1, za: z0, fa: f - 1, b: fl.p2, zb: z1, fb: f, story: f })
        segs.push({ a: fl.p2, za: z0, fa: f - 1, b: fl.p1, zb: z1, fb: f, story: f })
      }
    }
  }
  const all: Point[] = [
    ...floors.flatMap((f) => f.corners),
    ...Object.values(project.walls).flatMap((w) => [w.p1, w.p2]),
    ...Object.values(project.columns).map((c) => c.at),
    ...Object.values(project.frameLines).flatMap((f) => [f.p1, f.p2]),
  ]
  const box = pointsExtent(all) ?? { minX: 0, maxX: 1, minY: 0, maxY: 1 }
  return {
    floors,
    walls: buildPrisms(wallPrisms),
    columns: buildPrisms(columnPrisms),
    frames: buildLines(segs),
    box,
    height: zOf(project.floors.length - 1),
  }
}

/**
 * Write displaced positions of attached vertices: each rest vertex (x, y, z) moves with the rigid
 * transform of the floor it is attached to (none for the base, index -1 or out of range).
 */
export function writeAttachedPositions(
  rest: Float32Array,
  attach: Int32Array,
  transforms: readonly RigidTransform[],
  out: Float32Array,
): void {
  // Hot loop (every frame, every member vertex): inlined transform, no allocation.
  for (let v = 0; v < attach.length; v++) {
    const tr = transforms[attach[v]!]
    const x = rest[3 * v]!
    const y = rest[3 * v + 1]!
    if (tr) {
      out[3 * v] = tr.cos * x - tr.sin * y + tr.tx
      out[3 * v + 1] = tr.sin * x + tr.cos * y + tr.ty
    } else {
      out[3 * v] = x
      out[3 * v + 1] = y
    }
    out[3 * v + 2] = rest[3 * v + 2]!
  }
}
