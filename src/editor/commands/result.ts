/** Command result types and small validation helpers shared by the commands. */
import type { BaseRef, FloorId, Point, Project } from '@/model'
import { POLYGON_TOLERANCE, floorIndex, simplePolygonProblem, slabPolygonProblems } from '@/model'

/** A command's refusal: the document is unchanged; `message` names the field and the problem. */
export interface Refusal {
  readonly ok: false
  readonly message: string
}

/** What a command returns: the new document, or a refusal. */
export type CommandOutcome = Project | Refusal

/** A pure command: never mutates `doc`. */
export type Command<A> = (doc: Project, args: A) => CommandOutcome

export function refuse(message: string): Refusal {
  return { ok: false, message }
}

export function isRefusal(outcome: CommandOutcome): outcome is Refusal {
  return (outcome as Refusal).ok === false
}

/** `undefined` when fine, else a refusal message. */
export type Check = string | undefined

export function checkPositive(field: string, value: unknown): Check {
  if (typeof value !== 'number' || !Number.isFinite(value)) return `${field}: must be a number, got ${String(value)}`
  if (value <= 0) return `${field}: must be > 0, got ${value}`
  return undefined
}

export function checkNonNegative(field: string, value: unknown): Check {
  if (typeof value !== 'number' || !Number.isFinite(value)) return `${field}: must be a number, got ${String(value)}`
  if (value < 0) return `${field}: must be >= 0, got ${value}`
  return undefined
}

export function checkFinite(field: string, value: unknown): Check {
  if (typeof value !== 'number' || !Number.isFinite(value)) return `${field}: must be a number, got ${String(value)}`
  return undefined
}

export function checkName(field: string, value: unknown): Check {
  if (typeof value !== 'string' || value.trim().length === 0) return `${field}: must be a non-empty name`
  return undefined
}

export function checkPoint(field: string, p: unknown): Check {
  const q = p as Partial<Point> | null
  if (!q || typeof q !== 'object') return `${field}: must be a point {x, y}`
  return checkFinite(`${field}.x`, q.x) ?? checkFinite(`${field}.y`, q.y)
}

export function checkPoints(field: string, points: unknown, min: number): Check {
  if (!Array.isArray(points)) return `${field}: must be a list of points`
  if (points.length < min) return `${field}: needs at least ${min} points, got ${points.length}`
  for (let i = 0; i < points.length; i++) {
    const c = checkPoint(`${field}[${i}]`, points[i])
    if (c) return c
  }
  return undefined
}

export function checkFloor(doc: Project, field: string, id: unknown): Check {
  if (typeof id !== 'string' || floorIndex(doc, id) < 0) return `${field}: unknown floor "${String(id)}"`
  return undefined
}

/** base below top, both known. */
export function checkRange(doc: Project, base: unknown, top: unknown): Check {
  if (base !== 'ground') {
    const c = checkFloor(doc, 'base', base)
    if (c) return c
  }
  const c = checkFloor(doc, 'top', top)
  if (c) return c
  const b = base === 'ground' ? -1 : floorIndex(doc, base as string)
  const t = floorIndex(doc, top as string)
  if (t <= b) return `top: floor "${String(top)}" must be above base "${String(base)}"`
  return undefined
}

export function checkMaterial(doc: Project, field: string, id: unknown): Check {
  if (typeof id !== 'string' || doc.materials[id] === undefined) return `${field}: unknown material "${String(id)}"`
  return undefined
}

/** Minimum length of a wall or frame line, m (shorter is taken as a mis-click). */
export const MIN_SEGMENT_LENGTH = 1e-3

export function checkSegment(p1: Point, p2: Point): Check {
  const L = Math.hypot(p2.x - p1.x, p2.y - p1.y)
  if (!(L >= MIN_SEGMENT_LENGTH)) return `p2: length must be > ${MIN_SEGMENT_LENGTH} m, got ${L.toPrecision(3)} m`
  return undefined
}

/** Signed area of a polygon, m² (positive counter-clockwise). */
export function signedArea(points: readonly Point[]): number {
  let a = 0
  for (let i = 0; i < points.length; i++) {
    const p = points[i] as Point
    const q = points[(i + 1) % points.length] as Point
    a += p.x * q.y - q.x * p.y
  }
  return a / 2
}

export function checkPolygon(field: string, points: unknown): Check {
  const c = checkPoints(field, points, 3)
  if (c) return c
  const area = Math.abs(signedArea(points as Point[]))
  if (!(area > 1e-9)) return `${field}: polygon has zero area`
  const pts = points as Point[]
  const scale = Math.max(1, maxAbs(pts))
  const simple = simplePolygonProblem(pts, POLYGON_TOLERANCE * scale)
  return simple ? `${field}: ${simple}` : undefined
}

function maxAbs(pts: readonly Point[]): number {
  let s = 0
  for (const p of pts) s = Math.max(s, Math.abs(p.x), Math.abs(p.y))
  return s
}

/**
 * The loader's slab geometry rules (self-crossing rings, openings outside or crossing the outline,
 * overlapping, nested or crossing openings) as one refusal message with the file path, e.g.
 * `slabs.s1.openings[1]: overlaps openings[0] (openings must not overlap each other)`.
 */
export function checkSlabRings(
  slabId: string,
  outline: readonly Point[],
  openings: readonly (readonly Point[])[],
): Check {
  const first = slabPolygonProblems(outline, openings)[0]
  return first ? `slabs.${slabId}.${first.path}: ${first.message}` : undefined
}

/** The range of floors a base/top pair spans, bottom first (floor ids). */
export function floorsInRange(doc: Project, base: BaseRef, top: FloorId): FloorId[] {
  const b = base === 'ground' ? -1 : floorIndex(doc, base)
  const t = floorIndex(doc, top)
  return doc.floors.slice(b + 1, t + 1).map((f) => f.id)
}

/** Keep only keys of a per-story map whose floor is in `floors`. */
export function pickStories<V>(
  stories: Readonly<Record<string, V>> | undefined,
  floors: readonly string[],
): Readonly<Record<string, V>> | undefined {
  if (!stories) return undefined
  const out: Record<string, V> = {}
  for (const [k, v] of Object.entries(stories)) if (floors.includes(k)) out[k] = v
  return Object.keys(out).length > 0 ? out : undefined
}

/** Copy of `obj` with `key` set, or removed when `value` is undefined (exactOptionalPropertyTypes). */
export function withOptional<T extends object, K extends keyof T>(obj: T, key: K, value: T[K] | undefined): T {
  const out = { ...obj }
  if (value === undefined) delete out[key]
  else out[key] = value
  return out
}
