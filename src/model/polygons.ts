/**
 * Robust plan-polygon tests for slab outlines and openings: self-crossing, openings that leave or
 * cross their outline, openings that overlap, nest in or cross each other. Shared by the file loader
 * (schema.ts) and the editor's commands, so both refuse the same shapes with the same words.
 *
 * Predicates: the orientation of c against the line ab, (b - a) × (c - a), is treated as zero when
 * c lies within `tol` of the line (|cross| <= tol |b - a|), with tol = POLYGON_TOLERANCE times the
 * largest coordinate magnitude of the slab (at least 1 m). Two segments *cross* when each one's ends
 * lie strictly on opposite sides of the other (a proper crossing); touching — a vertex on an edge,
 * collinear overlap, a shared edge — is allowed between an opening and its outline and between two
 * openings, because it leaves areas adding up (the net slab area stays outline minus openings).
 * Containment is point-in-polygon by ray crossing, with points within `tol` of an edge counting as on it.
 * @see docs/file-format.md "Polygons and openings"
 * @see O'Rourke, Computational Geometry in C (2nd ed.), §1.5 and §7.4 (segment intersection by
 *   orientation tests, point in polygon), from memory
 */
import type { Point } from './types'

/** Relative tolerance of the predicates (times the slab's coordinate scale, at least 1 m). */
export const POLYGON_TOLERANCE = 1e-9

/** A problem of one ring of a slab: `path` is 'outline' or 'openings[i]'. */
export interface PolygonProblem {
  readonly path: string
  readonly message: string
}

/** Signed area by the shoelace formula (Green's theorem), m²; positive counter-clockwise. */
export function polygonSignedArea(pts: readonly Point[]): number {
  let a = 0
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i]!
    const q = pts[(i + 1) % pts.length]!
    a += p.x * q.y - q.x * p.y
  }
  return a / 2
}

/** Sign of the orientation of c against ab: 1 left, -1 right, 0 within tol of the line. */
function side(a: Point, b: Point, c: Point, tol: number): -1 | 0 | 1 {
  const cross = (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x)
  const len = Math.hypot(b.x - a.x, b.y - a.y)
  if (Math.abs(cross) <= tol * len) return 0
  return cross > 0 ? 1 : -1
}

/** Whether segments ab and cd cross properly (each strictly separates the other's ends). */
export function segmentsCross(a: Point, b: Point, c: Point, d: Point, tol: number): boolean {
  const o1 = side(a, b, c, tol)
  const o2 = side(a, b, d, tol)
  if (o1 === 0 || o2 === 0 || o1 === o2) return false
  const o3 = side(c, d, a, tol)
  const o4 = side(c, d, b, tol)
  return o3 !== 0 && o4 !== 0 && o3 !== o4
}

/** Where p lies against a polygon: strictly inside, on its boundary (within tol) or outside. */
export function pointInPolygon(pts: readonly Point[], p: Point, tol: number): 'inside' | 'on' | 'outside' {
  let inside = false
  for (let i = 0, j = pts.length - 1; i < pts.length; j = i++) {
    const a = pts[i]!
    const b = pts[j]!
    const dx = b.x - a.x
    const dy = b.y - a.y
    const len2 = dx * dx + dy * dy
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2)) : 0
    if (Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy)) <= tol) return 'on'
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside
  }
  return inside ? 'inside' : 'outside'
}

/**
 * The first pair of edges (i < j, edge k from vertex k to k+1) of a closed ring for which `test` holds,
 * among pairs whose bounding boxes overlap within `tol`; null if none. A sweep along x over edges
 * sorted by their left end keeps only the edges still open, so a plain outline of n vertices costs
 * about n log n rather than n²/2 pair tests.
 */
export function findEdgePair(
  pts: readonly Point[],
  tol: number,
  test: (i: number, j: number) => boolean,
): [number, number] | null {
  const n = pts.length
  const lo = new Float64Array(n)
  const hi = new Float64Array(n)
  const ylo = new Float64Array(n)
  const yhi = new Float64Array(n)
  for (let k = 0; k < n; k++) {
    const a = pts[k]!
    const b = pts[(k + 1) % n]!
    lo[k] = Math.min(a.x, b.x) - tol
    hi[k] = Math.max(a.x, b.x) + tol
    ylo[k] = Math.min(a.y, b.y) - tol
    yhi[k] = Math.max(a.y, b.y) + tol
  }
  const order = Array.from({ length: n }, (_, k) => k).sort((a, b) => lo[a]! - lo[b]!)
  let active: number[] = []
  for (const e of order) {
    active = active.filter((k) => hi[k]! >= lo[e]!)
    for (const k of active) {
      if (ylo[k]! > yhi[e]! || ylo[e]! > yhi[k]!) continue
      const i = Math.min(k, e)
      const j = Math.max(k, e)
      if (test(i, j)) return [i, j]
    }
    active.push(e)
  }
  return null
}

/** Coordinate scale of some rings for the tolerance: the largest |x|, |y|, at least 1 m. */
export function polygonScale(rings: readonly (readonly Point[])[]): number {
  let s = 1
  for (const r of rings) for (const p of r) s = Math.max(s, Math.abs(p.x), Math.abs(p.y))
  return s
}

/**
 * Why a ring is not a simple polygon, or null: fewer than 3 vertices, a repeated vertex, no area, or
 * two edges that cross or touch (other than neighbours at their shared vertex). Pairs are found by
 * the x sweep of findEdgePair.
 */
export function simplePolygonProblem(pts: readonly Point[], tol: number): string | null {
  const n = pts.length
  if (n < 3) return `needs at least 3 vertices, got ${n}`
  for (let i = 0; i < n; i++) {
    const p = pts[i]!
    const q = pts[(i + 1) % n]!
    if (Math.hypot(p.x - q.x, p.y - q.y) <= tol) {
      return `vertices ${i} and ${(i + 1) % n} coincide (list each corner once; do not repeat the first at the end)`
    }
  }
  let minX = Infinity
  let maxX = -Infinity
  let minY = Infinity
  let maxY = -Infinity
  for (const p of pts) {
    minX = Math.min(minX, p.x)
    maxX = Math.max(maxX, p.x)
    minY = Math.min(minY, p.y)
    maxY = Math.max(maxY, p.y)
  }
  const span = Math.max(maxX - minX, maxY - minY)
  if (!(Math.abs(polygonSignedArea(pts)) > 1e-9 * Math.max(1, span * span))) {
    return 'must enclose a non-zero area (the vertices are in one line)'
  }
  let problem: string | null = null
  findEdgePair(pts, tol, (i, j) => {
    const a = pts[i]!
    const b = pts[(i + 1) % n]!
    const c = pts[j]!
    const d = pts[(j + 1) % n]!
    const adjacent = j === i + 1 || (i === 0 && j === n - 1)
    if (adjacent) {
      // Neighbours share one vertex; they may not fold back onto each other.
      const shared = j === i + 1 ? b : a
      const far = j === i + 1 ? d : c
      const other = j === i + 1 ? a : b
      const back = (far.x - shared.x) * (other.x - shared.x) + (far.y - shared.y) * (other.y - shared.y) > 0
      if (side(other, shared, far, tol) === 0 && back) {
        problem = `edges ${i}-${(i + 1) % n} and ${j}-${(j + 1) % n} fold back onto each other (an outline must not cross itself)`
        return true
      }
      return false
    }
    if (segmentsCross(a, b, c, d, tol) || touches(a, b, c, d, tol)) {
      problem = `edges ${i}-${(i + 1) % n} and ${j}-${(j + 1) % n} cross or touch (an outline must not cross itself)`
      return true
    }
    return false
  })
  return problem
}

/** Whether closed segments ab and cd share a point (an end of one within tol of the other). */
function touches(a: Point, b: Point, c: Point, d: Point, tol: number): boolean {
  const near = (p: Point, q: Point, r: Point): boolean => {
    const dx = q.x - p.x
    const dy = q.y - p.y
    const len2 = dx * dx + dy * dy
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((r.x - p.x) * dx + (r.y - p.y) * dy) / len2)) : 0
    return Math.hypot(r.x - (p.x + t * dx), r.y - (p.y + t * dy)) <= tol
  }
  return near(a, b, c) || near(a, b, d) || near(c, d, a) || near(c, d, b)
}

/** Points just inside a ring next to each edge midpoint (to find overlaps that share every vertex). */
function innerSamples(pts: readonly Point[], tol: number): Point[] {
  const ccw = polygonSignedArea(pts) > 0 ? 1 : -1
  const out: Point[] = []
  for (let i = 0; i < pts.length; i++) {
    const a = pts[i]!
    const b = pts[(i + 1) % pts.length]!
    const len = Math.hypot(b.x - a.x, b.y - a.y)
    if (!(len > 0)) continue
    // the inward normal of a counter-clockwise ring is the left normal (-dy, dx)
    const step = Math.min(1000 * tol, 0.01 * len)
    out.push({
      x: (a.x + b.x) / 2 - (ccw * step * (b.y - a.y)) / len,
      y: (a.y + b.y) / 2 + (ccw * step * (b.x - a.x)) / len,
    })
  }
  return out
}

/** The first proper crossing between the edges of two rings, as [edge of p, edge of q], or null. */
function firstCrossing(p: readonly Point[], q: readonly Point[], tol: number): [number, number] | null {
  for (let i = 0; i < p.length; i++) {
    const a = p[i]!
    const b = p[(i + 1) % p.length]!
    for (let j = 0; j < q.length; j++) {
      if (segmentsCross(a, b, q[j]!, q[(j + 1) % q.length]!, tol)) return [i, j]
    }
  }
  return null
}

/**
 * Problems of the openings of one slab against its (already simple) outline and each other: an opening
 * must be a simple polygon, lie inside the outline (touching its edge is fine), and neither overlap,
 * nest in nor cross another opening (touching is fine). One problem per opening at most, in order.
 */
export function openingProblems(outline: readonly Point[], openings: readonly (readonly Point[])[]): PolygonProblem[] {
  const tol = POLYGON_TOLERANCE * polygonScale([outline, ...openings])
  const problems: PolygonProblem[] = []
  const good: number[] = []
  openings.forEach((hole, i) => {
    const path = `openings[${i}]`
    const own = simplePolygonProblem(hole, tol)
    if (own) {
      problems.push({ path, message: own })
      return
    }
    const out = hole.findIndex((p) => pointInPolygon(outline, p, tol) === 'outside')
    if (out >= 0) {
      const p = hole[out]!
      problems.push({ path, message: `must lie inside the outline (vertex ${out} at (${p.x}, ${p.y}) is outside)` })
      return
    }
    const cross = firstCrossing(hole, outline, tol)
    const leaves = hole.findIndex((a, k) => {
      const b = hole[(k + 1) % hole.length]!
      return pointInPolygon(outline, { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, tol) === 'outside'
    })
    if (cross || leaves >= 0) {
      const edge = cross ? cross[0] : leaves
      problems.push({
        path,
        message: `must lie inside the outline (its edge ${edge}-${(edge + 1) % hole.length} ${cross ? `crosses outline edge ${cross[1]}-${(cross[1] + 1) % outline.length}` : 'runs outside it'})`,
      })
      return
    }
    for (const k of good) {
      const other = openings[k]!
      const c = firstCrossing(hole, other, tol)
      if (c) {
        problems.push({
          path,
          message: `overlaps openings[${k}] (its edge ${c[0]}-${(c[0] + 1) % hole.length} crosses edge ${c[1]}-${(c[1] + 1) % other.length} of openings[${k}]; openings must not overlap each other)`,
        })
        return
      }
      const inOther = [...hole, ...innerSamples(hole, tol)].some((p) => pointInPolygon(other, p, tol) === 'inside')
      const otherIn = [...other, ...innerSamples(other, tol)].some((p) => pointInPolygon(hole, p, tol) === 'inside')
      if (inOther || otherIn) {
        const nested = !inOther
          ? 'contains'
          : !otherIn && hole.every((p) => pointInPolygon(other, p, tol) !== 'outside')
            ? 'lies inside'
            : 'overlaps'
        problems.push({ path, message: `${nested} openings[${k}] (openings must not overlap each other)` })
        return
      }
    }
    good.push(i)
  })
  return problems
}

/**
 * Every geometry problem of a slab's rings: the outline first, then its openings (openingProblems).
 * Empty when the slab is a valid region (outline minus disjoint openings).
 */
export function slabPolygonProblems(outline: readonly Point[], openings: readonly (readonly Point[])[]): PolygonProblem[] {
  const tol = POLYGON_TOLERANCE * polygonScale([outline, ...openings])
  const own = simplePolygonProblem(outline, tol)
  if (own) return [{ path: 'outline', message: own }]
  return openingProblems(outline, openings)
}
