/** Plan-space hit testing (pure): distances, point in polygon, picking and box selection. */
import { minOf } from '@/model'
import type { FloorId, Point, Project } from '@/model'
import type { PlanKind } from '../commands/records'
import { visibleRecords } from './visible'

/** Distance from p to segment a-b, m, and the closest point's parameter t in [0, 1]. */
export function distanceToSegment(p: Point, a: Point, b: Point): { distance: number; t: number; closest: Point } {
  const dx = b.x - a.x
  const dy = b.y - a.y
  const L2 = dx * dx + dy * dy
  let t = L2 > 0 ? ((p.x - a.x) * dx + (p.y - a.y) * dy) / L2 : 0
  t = Math.max(0, Math.min(1, t))
  const closest = { x: a.x + t * dx, y: a.y + t * dy }
  return { distance: Math.hypot(p.x - closest.x, p.y - closest.y), t, closest }
}

/** Even-odd ray test: is p strictly inside the polygon (points on the boundary may go either way)? */
export function pointInPolygon(p: Point, polygon: readonly Point[]): boolean {
  let inside = false
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[i] as Point
    const b = polygon[j] as Point
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside
  }
  return inside
}

/** Inside the outline and outside every opening. */
export function pointInSlab(p: Point, slab: { outline: readonly Point[]; openings: readonly (readonly Point[])[] }): boolean {
  return pointInPolygon(p, slab.outline) && !slab.openings.some((o) => pointInPolygon(p, o))
}

/** Distance from p to the nearest edge of a closed polygon, m. */
export function distanceToPolygonEdge(p: Point, polygon: readonly Point[]): number {
  let best = Infinity
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i] as Point
    const b = polygon[(i + 1) % polygon.length] as Point
    best = Math.min(best, distanceToSegment(p, a, b).distance)
  }
  return best
}

/** A picked record. */
export interface Hit {
  readonly id: string
  readonly kind: PlanKind
  /** Distance from the pointer, m (0 inside a slab). */
  readonly distance: number
}

/** Pick order: points first, then lines, then slab areas (small things win over what they sit on). */
const PRIORITY: Readonly<Record<PlanKind, number>> = {
  columns: 0,
  pointMasses: 0,
  walls: 1,
  frameLines: 1,
  lineMasses: 2,
  slabs: 3,
}

/**
 * What is under the pointer on a floor: the nearest record within `tolerance` (m) of the higher
 * priority group, or a slab whose area contains p (or whose edge is within tolerance). Null if none.
 */
export function hitTest(doc: Project, floor: FloorId, p: Point, tolerance: number): Hit | null {
  const hits = hitTestAll(doc, floor, p, tolerance)
  return hits[0] ?? null
}

/** All records under the pointer, best first. */
export function hitTestAll(doc: Project, floor: FloorId, p: Point, tolerance: number): Hit[] {
  const v = visibleRecords(doc, floor)
  const hits: Hit[] = []
  const near = (id: string, kind: PlanKind, d: number): void => {
    if (d <= tolerance) hits.push({ id, kind, distance: d })
  }
  for (const c of v.columns) near(c.id, 'columns', Math.hypot(p.x - c.at.x, p.y - c.at.y))
  for (const m of v.pointMasses) near(m.id, 'pointMasses', Math.hypot(p.x - m.at.x, p.y - m.at.y))
  for (const w of v.walls) near(w.id, 'walls', distanceToSegment(p, w.p1, w.p2).distance)
  for (const f of v.frameLines) near(f.id, 'frameLines', distanceToSegment(p, f.p1, f.p2).distance)
  for (const m of v.lineMasses) {
    let d = Infinity
    for (let i = 1; i < m.points.length; i++) d = Math.min(d, distanceToSegment(p, m.points[i - 1] as Point, m.points[i] as Point).distance)
    near(m.id, 'lineMasses', d)
  }
  for (const s of v.slabs) {
    if (pointInSlab(p, s)) hits.push({ id: s.id, kind: 'slabs', distance: 0 })
    else near(s.id, 'slabs', minOf(s.openings.map((o) => distanceToPolygonEdge(p, o)), distanceToPolygonEdge(p, s.outline)))
  }
  return hits.sort((a, b) => PRIORITY[a.kind] - PRIORITY[b.kind] || a.distance - b.distance)
}

/** Axis-aligned box from two corners (any order). */
export function normalizeBox(a: Point, b: Point): { min: Point; max: Point } {
  return {
    min: { x: Math.min(a.x, b.x), y: Math.min(a.y, b.y) },
    max: { x: Math.max(a.x, b.x), y: Math.max(a.y, b.y) },
  }
}

function inBox(p: Point, min: Point, max: Point): boolean {
  return p.x >= min.x && p.x <= max.x && p.y >= min.y && p.y <= max.y
}

/** Ids of the records on a floor lying wholly inside the box with corners a and b. */
export function boxSelect(doc: Project, floor: FloorId, a: Point, b: Point): string[] {
  const { min, max } = normalizeBox(a, b)
  const all = (pts: readonly Point[]): boolean => pts.every((p) => inBox(p, min, max))
  const v = visibleRecords(doc, floor)
  const ids: string[] = []
  for (const w of v.walls) if (all([w.p1, w.p2])) ids.push(w.id)
  for (const f of v.frameLines) if (all([f.p1, f.p2])) ids.push(f.id)
  for (const c of v.columns) if (inBox(c.at, min, max)) ids.push(c.id)
  for (const s of v.slabs) if (all(s.outline)) ids.push(s.id)
  for (const m of v.lineMasses) if (all(m.points)) ids.push(m.id)
  for (const m of v.pointMasses) if (inBox(m.at, min, max)) ids.push(m.id)
  return ids
}
