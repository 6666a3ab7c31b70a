/** Plan-space snapping (pure): grid intersections and lines, element ends and midpoints, slab vertices. */
import type { FloorId, Point, Project } from '@/model'
import { visibleRecords } from './visible'

/** What a snapped point landed on. */
export type SnapKind = 'endpoint' | 'vertex' | 'midpoint' | 'grid-intersection' | 'grid-line' | 'none'

export interface SnapResult {
  /** The snapped point, m (the input point when kind is 'none'). */
  readonly point: Point
  readonly kind: SnapKind
  /** Record id for endpoint/vertex/midpoint snaps. */
  readonly ref?: string
  /** Grid label(s), e.g. "B/3" for an intersection or "3" for a line. */
  readonly label?: string
}

/** Which targets to snap to and how far, m. */
export interface SnapOptions {
  /** Snap radius in plan metres (from the zoom). */
  readonly tolerance: number
  readonly grid: boolean
  readonly elements: boolean
  readonly midpoints: boolean
  readonly vertices: boolean
  /** Record ids to leave out (the ones being dragged). */
  readonly exclude?: readonly string[]
}

export const DEFAULT_SNAP: Omit<SnapOptions, 'tolerance'> = {
  grid: true,
  elements: true,
  midpoints: true,
  vertices: true,
}

/** Lower is preferred when two candidates are within tolerance. */
const RANK: Readonly<Record<SnapKind, number>> = {
  endpoint: 0,
  vertex: 0,
  midpoint: 1,
  'grid-intersection': 2,
  'grid-line': 3,
  none: 4,
}

interface Candidate {
  point: Point
  kind: SnapKind
  ref?: string
  label?: string
}

/** Point candidates (not grid lines) on a floor. */
export function snapCandidates(doc: Project, floor: FloorId, options: Omit<SnapOptions, 'tolerance'>): Candidate[] {
  const out: Candidate[] = []
  const skip = new Set(options.exclude ?? [])
  const v = visibleRecords(doc, floor)
  if (options.elements) {
    for (const e of [...v.walls, ...v.frameLines]) {
      if (skip.has(e.id)) continue
      out.push({ point: e.p1, kind: 'endpoint', ref: e.id }, { point: e.p2, kind: 'endpoint', ref: e.id })
      if (options.midpoints) out.push({ point: { x: (e.p1.x + e.p2.x) / 2, y: (e.p1.y + e.p2.y) / 2 }, kind: 'midpoint', ref: e.id })
    }
    for (const c of v.columns) if (!skip.has(c.id)) out.push({ point: c.at, kind: 'endpoint', ref: c.id })
    for (const m of v.pointMasses) if (!skip.has(m.id)) out.push({ point: m.at, kind: 'endpoint', ref: m.id })
    for (const m of v.lineMasses) {
      if (skip.has(m.id)) continue
      for (const p of m.points) out.push({ point: p, kind: 'endpoint', ref: m.id })
    }
  }
  if (options.vertices) {
    for (const s of v.slabs) {
      if (skip.has(s.id)) continue
      const rings = [s.outline, ...s.openings]
      for (const ring of rings) {
        for (let i = 0; i < ring.length; i++) {
          const a = ring[i] as Point
          out.push({ point: a, kind: 'vertex', ref: s.id })
          if (options.midpoints) {
            const b = ring[(i + 1) % ring.length] as Point
            out.push({ point: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, kind: 'midpoint', ref: s.id })
          }
        }
      }
    }
  }
  if (options.grid && doc.grid) {
    for (const gx of doc.grid.x) {
      for (const gy of doc.grid.y) {
        out.push({ point: { x: gx.at, y: gy.at }, kind: 'grid-intersection', label: `${gy.label}/${gx.label}` })
      }
    }
  }
  return out
}

/**
 * Snap p: the best point candidate within tolerance (by kind: endpoints and vertices, then midpoints,
 * then grid intersections; nearest within a kind), else the projection onto the nearest grid line
 * within tolerance, else p itself with kind 'none'.
 */
export function snapPoint(doc: Project, floor: FloorId, p: Point, options: SnapOptions): SnapResult {
  const tol = options.tolerance
  let best: Candidate | null = null
  let bestD = Infinity
  for (const c of snapCandidates(doc, floor, options)) {
    const d = Math.hypot(c.point.x - p.x, c.point.y - p.y)
    if (d > tol) continue
    if (!best || RANK[c.kind] < RANK[best.kind] || (RANK[c.kind] === RANK[best.kind] && d < bestD)) {
      best = c
      bestD = d
    }
  }
  if (best) return result(best)
  if (options.grid && doc.grid) {
    let line: Candidate | null = null
    let lineD = Infinity
    for (const gx of doc.grid.x) {
      const d = Math.abs(p.x - gx.at)
      if (d <= tol && d < lineD) {
        line = { point: { x: gx.at, y: p.y }, kind: 'grid-line', label: gx.label }
        lineD = d
      }
    }
    for (const gy of doc.grid.y) {
      const d = Math.abs(p.y - gy.at)
      if (d <= tol && d < lineD) {
        line = { point: { x: p.x, y: gy.at }, kind: 'grid-line', label: gy.label }
        lineD = d
      }
    }
    if (line) return result(line)
  }
  return { point: { x: p.x, y: p.y }, kind: 'none' }
}

function result(c: Candidate): SnapResult {
  return {
    point: { x: c.point.x, y: c.point.y },
    kind: c.kind,
    ...(c.ref === undefined ? {} : { ref: c.ref }),
    ...(c.label === undefined ? {} : { label: c.label }),
  }
}

/**
 * Constrain the direction from `from` to `to` to a multiple of `step` rad (default 15°), keeping the
 * length of the projection onto that direction.
 */
export function constrainAngle(from: Point, to: Point, step = Math.PI / 12): Point {
  const dx = to.x - from.x
  const dy = to.y - from.y
  const a = Math.round(Math.atan2(dy, dx) / step) * step
  const L = dx * Math.cos(a) + dy * Math.sin(a)
  return { x: from.x + L * Math.cos(a), y: from.y + L * Math.sin(a) }
}
