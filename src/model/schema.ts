/**
 * The versioned project file: migrate, then validate every field by hand, then build a clean
 * `Project` (SI units) that holds only known fields. A file with any error is refused whole; unknown
 * fields are dropped with a warning. Error texts name the path and the problem:
 * `walls.w12.thickness: must be > 0, got -0.2`.
 * @see ../../docs/file-format.md for every field, unit, range and default.
 */
import { INPUT_BUDGET, checkDocumentBudget, checkTextBudget } from './budget'
import { findEdgePair, openingProblems } from './polygons'
import type { FloorId } from './ids'
import { migrateDocument } from './migrations'
import { STIFFNESS_FACTOR_DEFAULTS } from './stiffnessFactors'
import type { RawDocument } from './migrations'
import { readSeismicDesign } from './seismicDesign'
import type {
  AnalysisSettings,
  BaseRef,
  Column,
  CriterionSetSpec,
  Floor,
  FrameLine,
  FrameStiffness,
  Grid,
  GroundMotionSpec,
  LineMass,
  Material,
  Point,
  PointMass,
  Project,
  Slab,
  SpectrumModeRule,
  SpectrumSpec,
  Wall,
  WallStoryOverride,
} from './types'

/** Version written by this build; older files are migrated on load, newer ones refused. */
export const CURRENT_VERSION = 2

/** The `format` tag every project file carries. */
export const PROJECT_FORMAT = 'gyre-project'

/** At most this many errors (and warnings) are listed; a last line says how many more there were. */
export const MAX_MESSAGES = 50

export type ParseResult =
  | { readonly ok: true; readonly project: Project; readonly warnings: readonly string[] }
  | { readonly ok: false; readonly errors: readonly string[] }

/**
 * Sanity limits beyond the physical ones (> 0 and so on). They keep absurd values out of the engine
 * (a 1e300 m storey, a 1e-320 m wall) and are documented in docs/file-format.md.
 */
export const LIMITS = {
  coordinate: 1e4,
  storyHeightMin: 0.1,
  storyHeightMax: 200,
  floorsMax: INPUT_BUDGET.floors,
  thicknessMin: 0.001,
  thicknessMax: 10,
  modulusMin: 1e6,
  modulusMax: 1e13,
  factorMin: 0.001,
  factorMax: 10,
  /** Smallest column slab restraint r (fraction of full fixity), -. */
  restraintMin: 0.01,
  secondMomentMin: 1e-12,
  secondMomentMax: 100,
  storyStiffnessMin: 1,
  storyStiffnessMax: 1e14,
  braceAreaMin: 1e-8,
  braceAreaMax: 10,
  massMin: 1e-3,
  bayWidthMin: 0.1,
  bayWidthMax: 1000,
  countMax: 1000,
  areaMassMax: 1e5,
  massPerLengthMax: 1e6,
  pointMassMax: 1e9,
  polarInertiaMax: 1e13,
  verticesMax: INPUT_BUDGET.verticesPerPolygon,
  spectrumMax: 20,
  periodMax: 100,
  baseShearMax: 1e12,
  recordSamplesMax: INPUT_BUDGET.groundMotionSamples,
  recordDtMin: 1e-4,
  recordDtMax: 1,
  groundAccelerationMax: 1000,
  durationMax: 600,
  pgaMax: 5,
  idLength: 64,
  textLength: 10000,
} as const

/** Default settings for fields a file leaves out (documented in docs/file-format.md). */
export const DEFAULT_SETTINGS: AnalysisSettings = {
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
}

// ---------------------------------------------------------------- messages and paths

interface Ctx {
  readonly errors: string[]
  readonly warnings: string[]
}

const ID_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.:-]*$/
const RESERVED_IDS = new Set([
  'ground',
  'constructor',
  'prototype',
  'toString',
  'valueOf',
  'hasOwnProperty',
])

/** A value as it appears in a message: strings quoted, numbers as written, kinds in words. */
function show(v: unknown): string {
  if (v === undefined) return 'nothing'
  if (v === null) return 'null'
  if (typeof v === 'string') return JSON.stringify(v.length > 40 ? `${v.slice(0, 40)}...` : v)
  if (typeof v === 'number' || typeof v === 'boolean' || typeof v === 'bigint') return String(v)
  if (Array.isArray(v)) return 'a list'
  if (typeof v === 'object') return 'an object'
  return `a ${typeof v}`
}

function key(path: string, k: string): string {
  const part = /^[A-Za-z_$][A-Za-z0-9_$-]*$/.test(k) ? k : JSON.stringify(k)
  if (path === '') return part
  return part.startsWith('"') ? `${path}[${part}]` : `${path}.${part}`
}

const at = (path: string, i: number): string => `${path}[${i}]`

function fail(ctx: Ctx, path: string, problem: string): undefined {
  ctx.errors.push(`${path === '' ? '(file)' : path}: ${problem}`)
  return undefined
}

function warn(ctx: Ctx, path: string, problem: string): void {
  ctx.warnings.push(`${path === '' ? '(file)' : path}: ${problem}`)
}

function capped(messages: readonly string[], noun: string): string[] {
  if (messages.length <= MAX_MESSAGES) return [...messages]
  const rest = messages.length - MAX_MESSAGES
  return [...messages.slice(0, MAX_MESSAGES), `... and ${rest} more ${noun}${rest === 1 ? '' : 's'}`]
}

// ---------------------------------------------------------------- primitive readers

const isRecord = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v)

/** An object with only the known fields read; unknown ones give a warning. */
function object(
  ctx: Ctx,
  path: string,
  v: unknown,
  known: readonly string[],
): Record<string, unknown> | undefined {
  if (!isRecord(v)) return fail(ctx, path, `must be an object, got ${show(v)}`)
  for (const k of Object.keys(v)) {
    if (!known.includes(k)) warn(ctx, key(path, k), 'unknown field, ignored')
  }
  return v
}

interface NumberRule {
  /** inclusive lower bound */
  readonly min?: number
  /** exclusive lower bound */
  readonly gt?: number
  /** inclusive upper bound */
  readonly max?: number
  /** exclusive upper bound */
  readonly lt?: number
  readonly integer?: boolean
  /** Sanity floor for values that may be 0: 0 is fine, anything in (0, positiveMin) is refused. */
  readonly positiveMin?: number
  /** Used when the field is absent. */
  readonly fallback?: number
}

function num(ctx: Ctx, path: string, v: unknown, rule: NumberRule = {}): number | undefined {
  if (v === undefined && rule.fallback !== undefined) return rule.fallback
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    return fail(ctx, path, `must be a finite number, got ${show(v)}`)
  }
  if (rule.integer && !Number.isInteger(v)) return fail(ctx, path, `must be a whole number, got ${v}`)
  if (rule.gt !== undefined && !(v > rule.gt)) return fail(ctx, path, `must be > ${rule.gt}, got ${v}`)
  if (rule.min !== undefined && !(v >= rule.min)) {
    return fail(ctx, path, `must be >= ${rule.min}, got ${v}`)
  }
  if (rule.lt !== undefined && !(v < rule.lt)) return fail(ctx, path, `must be < ${rule.lt}, got ${v}`)
  if (rule.max !== undefined && !(v <= rule.max)) {
    return fail(ctx, path, `must be <= ${rule.max}, got ${v}`)
  }
  if (rule.positiveMin !== undefined && v > 0 && v < rule.positiveMin) {
    return fail(ctx, path, `must be 0 or >= ${rule.positiveMin}, got ${v}`)
  }
  // -0 would not survive a save (JSON writes it as 0); store the value the file will hold.
  return v === 0 ? 0 : v
}

function str(ctx: Ctx, path: string, v: unknown, fallback?: string): string | undefined {
  if (v === undefined && fallback !== undefined) return fallback
  if (typeof v !== 'string') return fail(ctx, path, `must be a string, got ${show(v)}`)
  if (v.length > LIMITS.textLength) {
    return fail(ctx, path, `must be at most ${LIMITS.textLength} characters, got ${v.length}`)
  }
  return v
}

function oneOf<T extends string>(
  ctx: Ctx,
  path: string,
  v: unknown,
  options: readonly T[],
  fallback?: T,
): T | undefined {
  if (v === undefined && fallback !== undefined) return fallback
  if (typeof v === 'string' && (options as readonly string[]).includes(v)) return v as T
  return fail(ctx, path, `must be one of ${options.map((o) => `"${o}"`).join(', ')}, got ${show(v)}`)
}

function idString(ctx: Ctx, path: string, v: unknown): string | undefined {
  if (typeof v !== 'string') return fail(ctx, path, `must be an id string, got ${show(v)}`)
  if (v.length === 0 || v.length > LIMITS.idLength || !ID_PATTERN.test(v)) {
    return fail(
      ctx,
      path,
      `must be 1 to ${LIMITS.idLength} letters, digits or _ . : - (starting with a letter or digit), got ${show(v)}`,
    )
  }
  if (RESERVED_IDS.has(v)) return fail(ctx, path, `${show(v)} is a reserved name, choose another id`)
  return v
}

function point(ctx: Ctx, path: string, v: unknown): Point | undefined {
  const o = object(ctx, path, v, ['x', 'y'])
  if (!o) return undefined
  const lim = { min: -LIMITS.coordinate, max: LIMITS.coordinate }
  const x = num(ctx, key(path, 'x'), o.x, lim)
  const y = num(ctx, key(path, 'y'), o.y, lim)
  return x === undefined || y === undefined ? undefined : { x, y }
}

function list(ctx: Ctx, path: string, v: unknown, fallback?: readonly unknown[]): unknown[] | undefined {
  if (v === undefined && fallback !== undefined) return [...fallback]
  if (!Array.isArray(v)) return fail(ctx, path, `must be a list, got ${show(v)}`)
  return v
}

// ---------------------------------------------------------------- geometry

/** Signed area by the shoelace formula (Green's theorem), m²; positive counter-clockwise. */
function signedArea(pts: readonly Point[]): number {
  let a = 0
  for (let i = 0; i < pts.length; i++) {
    const p = pts[i] as Point
    const q = pts[(i + 1) % pts.length] as Point
    a += p.x * q.y - q.x * p.y
  }
  return a / 2
}

function orient(a: Point, b: Point, c: Point): number {
  return (b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x)
}

function onSegment(a: Point, b: Point, p: Point): boolean {
  return (
    Math.min(a.x, b.x) <= p.x &&
    p.x <= Math.max(a.x, b.x) &&
    Math.min(a.y, b.y) <= p.y &&
    p.y <= Math.max(a.y, b.y)
  )
}

/** Whether closed segments ab and cd share a point (exact predicates on the input coordinates). */
function segmentsTouch(a: Point, b: Point, c: Point, d: Point): boolean {
  const o1 = orient(a, b, c)
  const o2 = orient(a, b, d)
  const o3 = orient(c, d, a)
  const o4 = orient(c, d, b)
  if (((o1 > 0 && o2 < 0) || (o1 < 0 && o2 > 0)) && ((o3 > 0 && o4 < 0) || (o3 < 0 && o4 > 0))) {
    return true
  }
  return (
    (o1 === 0 && onSegment(a, b, c)) ||
    (o2 === 0 && onSegment(a, b, d)) ||
    (o3 === 0 && onSegment(c, d, a)) ||
    (o4 === 0 && onSegment(c, d, b))
  )
}

function polygon(ctx: Ctx, path: string, v: unknown): Point[] | undefined {
  const raw = list(ctx, path, v)
  if (!raw) return undefined
  if (raw.length < 3) return fail(ctx, path, `needs at least 3 vertices, got ${raw.length}`)
  if (raw.length > LIMITS.verticesMax) {
    return fail(ctx, path, `has more than ${LIMITS.verticesMax} vertices (${raw.length})`)
  }
  const pts: Point[] = []
  const before = ctx.errors.length
  raw.forEach((r, i) => {
    const p = point(ctx, at(path, i), r)
    if (p) pts.push(p)
  })
  if (ctx.errors.length > before) return undefined
  const n = pts.length
  for (let i = 0; i < n; i++) {
    const p = pts[i] as Point
    const q = pts[(i + 1) % n] as Point
    if (p.x === q.x && p.y === q.y) {
      return fail(
        ctx,
        path,
        `vertices ${i} and ${(i + 1) % n} coincide (list each corner once; do not repeat the first at the end)`,
      )
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
  if (!(Math.abs(signedArea(pts)) > 1e-9 * Math.max(1, span * span))) {
    return fail(ctx, path, 'must enclose a non-zero area (the vertices are in one line)')
  }
  // Exact predicates on the input; candidate pairs from the x sweep (bounding boxes overlap).
  const pair = findEdgePair(pts, 0, (i, j) => {
    // Adjacent edges share a vertex by construction; skip them (and the wrap-around pair).
    if (j === i + 1 || (i === 0 && j === n - 1)) return false
    return segmentsTouch(pts[i] as Point, pts[(i + 1) % n] as Point, pts[j] as Point, pts[(j + 1) % n] as Point)
  })
  if (pair) {
    const [i, j] = pair
    return fail(
      ctx,
      path,
      `edges ${i}-${(i + 1) % n} and ${j}-${(j + 1) % n} cross or touch (an outline must not cross itself)`,
    )
  }
  return pts
}

// ---------------------------------------------------------------- records

/**
 * A map of records keyed by id. A record without `id` takes its key; one whose id differs from its
 * key is an error. Lookups elsewhere use Sets, never `in`, so names like `constructor` are harmless.
 */
function records<T>(
  ctx: Ctx,
  path: string,
  v: unknown,
  read: (p: string, id: string, o: Record<string, unknown>) => T | undefined,
  known: readonly string[],
): Record<string, T> {
  const out: [string, T][] = []
  if (v === undefined) return {}
  if (!isRecord(v)) {
    fail(ctx, path, `must be an object of records keyed by id, got ${show(v)}`)
    return {}
  }
  for (const k of Object.keys(v)) {
    const p = key(path, k)
    if (idString(ctx, p, k) === undefined) continue
    const o = object(ctx, p, v[k], ['id', ...known])
    if (!o) continue
    if (o.id !== undefined && o.id !== k) {
      fail(ctx, key(p, 'id'), `must equal its key ${show(k)}, got ${show(o.id)}`)
      continue
    }
    const r = read(p, k, o)
    if (r !== undefined) out.push([k, r])
  }
  return Object.fromEntries(out)
}

interface Refs {
  readonly floorIds: readonly string[]
  readonly floorSet: ReadonlySet<string>
  readonly materialSet: ReadonlySet<string>
}

function floorRef(ctx: Ctx, path: string, v: unknown, refs: Refs): FloorId | undefined {
  if (typeof v !== 'string') return fail(ctx, path, `must be a floor id, got ${show(v)}`)
  if (!refs.floorSet.has(v)) return fail(ctx, path, `no floor ${show(v)}`)
  return v as FloorId
}

function materialRef(ctx: Ctx, path: string, v: unknown, refs: Refs): Material['id'] | undefined {
  if (typeof v !== 'string') return fail(ctx, path, `must be a material id, got ${show(v)}`)
  if (!refs.materialSet.has(v)) return fail(ctx, path, `no material ${show(v)}`)
  return v as Material['id']
}

/** base ('ground' or a floor) and top, with base strictly below top. */
function floorRange(
  ctx: Ctx,
  path: string,
  o: Record<string, unknown>,
  refs: Refs,
): { base: BaseRef; top: FloorId; below: number; last: number } | undefined {
  const base: BaseRef | undefined =
    o.base === undefined || o.base === 'ground'
      ? 'ground'
      : floorRef(ctx, key(path, 'base'), o.base, refs)
  const top = floorRef(ctx, key(path, 'top'), o.top, refs)
  if (base === undefined || top === undefined) return undefined
  const below = base === 'ground' ? -1 : refs.floorIds.indexOf(base)
  const last = refs.floorIds.indexOf(top)
  if (last <= below) {
    return fail(ctx, key(path, 'top'), `must be above its base ${show(base)}, got ${show(top)}`)
  }
  return { base, top, below, last }
}

/** Per-story overrides keyed by the floor at the top of the story, within (base, top]. */
function storyKeys<T>(
  ctx: Ctx,
  path: string,
  v: unknown,
  refs: Refs,
  range: { below: number; last: number } | undefined,
  read: (p: string, value: unknown) => T | undefined,
): Record<string, T> | undefined {
  if (v === undefined) return undefined
  if (!isRecord(v)) return fail(ctx, path, `must be an object keyed by floor id, got ${show(v)}`)
  const out: [string, T][] = []
  for (const k of Object.keys(v)) {
    const p = key(path, k)
    const i = refs.floorIds.indexOf(k)
    if (i < 0) {
      fail(ctx, p, `no floor ${show(k)}`)
      continue
    }
    if (range && (i <= range.below || i > range.last)) {
      fail(ctx, p, `floor ${show(k)} is outside the element's stories`)
      continue
    }
    const r = read(p, v[k])
    if (r !== undefined) out.push([k, r])
  }
  return Object.fromEntries(out)
}

// ---------------------------------------------------------------- sections

const FLOOR_FIELDS = ['id', 'name', 'height', 'typicalOf'] as const

/**
 * The floor list, and the id at each position (a placeholder no reference can match where the id is
 * bad) so that references can still be checked while a floor has other errors.
 */
function readFloors(ctx: Ctx, v: unknown): { floors: Floor[] | undefined; ids: string[] } {
  const raw = list(ctx, 'floors', v)
  if (!raw) return { floors: undefined, ids: [] }
  if (raw.length > LIMITS.floorsMax) {
    fail(ctx, 'floors', `at most ${LIMITS.floorsMax} floors, got ${raw.length}`)
    return { floors: undefined, ids: [] }
  }
  const ids = raw.map((r, i) => {
    const id = isRecord(r) ? r.id : undefined
    return typeof id === 'string' && ID_PATTERN.test(id) && !RESERVED_IDS.has(id) ? id : `\u0000${i}`
  })
  const floors: Floor[] = []
  const firstIndex = new Map<string, number>()
  const before = ctx.errors.length
  raw.forEach((r, i) => {
    const p = at('floors', i)
    const o = object(ctx, p, r, FLOOR_FIELDS)
    if (!o) return
    const id = idString(ctx, key(p, 'id'), o.id)
    if (id !== undefined) {
      const seen = firstIndex.get(id)
      if (seen !== undefined) fail(ctx, key(p, 'id'), `duplicate floor id ${show(id)} (also floors[${seen}])`)
      else firstIndex.set(id, i)
    }
    const name = str(ctx, key(p, 'name'), o.name, id ?? '')
    const height = num(ctx, key(p, 'height'), o.height, {
      gt: 0,
      min: LIMITS.storyHeightMin,
      max: LIMITS.storyHeightMax,
    })
    let typicalOf: string | undefined
    if (o.typicalOf !== undefined) {
      typicalOf = typeof o.typicalOf === 'string' ? o.typicalOf : undefined
      if (typicalOf === undefined) fail(ctx, key(p, 'typicalOf'), `must be a floor id, got ${show(o.typicalOf)}`)
    }
    if (id === undefined || name === undefined || height === undefined) return
    floors.push({
      id: id as FloorId,
      name,
      height,
      ...(typicalOf !== undefined ? { typicalOf: typicalOf as FloorId } : {}),
    })
  })
  // Typical-floor links: to another existing floor, and no cycles (checked even when other floor
  // fields have errors, from the ids and links that could be read).
  const links = new Map<string, string | undefined>()
  raw.forEach((r, i) => {
    const id = ids[i] as string
    if (!links.has(id)) links.set(id, isRecord(r) && typeof r.typicalOf === 'string' ? r.typicalOf : undefined)
  })
  let linkErrors = false
  raw.forEach((r, i) => {
    const link = isRecord(r) && typeof r.typicalOf === 'string' ? r.typicalOf : undefined
    if (link === undefined) return
    const p = key(at('floors', i), 'typicalOf')
    if (link === ids[i]) {
      fail(ctx, p, `must name another floor, got its own id ${show(link)}`)
      linkErrors = true
    } else if (!links.has(link)) {
      fail(ctx, p, `no floor ${show(link)}`)
      linkErrors = true
    }
  })
  if (!linkErrors) {
    const reported = new Set<string>()
    ids.forEach((id, i) => {
      const chain: string[] = [id]
      let current = links.get(id)
      while (current !== undefined) {
        if (chain.includes(current)) {
          const cycle = chain.slice(chain.indexOf(current))
          const cycleKey = [...cycle].sort().join(' ')
          if (current === id && !reported.has(cycleKey)) {
            reported.add(cycleKey)
            fail(ctx, key(at('floors', i), 'typicalOf'), `links form a cycle ${[...cycle, current].join(' -> ')}`)
          }
          break
        }
        chain.push(current)
        current = links.get(current)
      }
    })
  }
  return { floors: ctx.errors.length > before ? undefined : floors, ids }
}

function readMaterial(ctx: Ctx, p: string, id: string, o: Record<string, unknown>): Material | undefined {
  const name = str(ctx, key(p, 'name'), o.name, id)
  const E = num(ctx, key(p, 'E'), o.E, { gt: 0, min: LIMITS.modulusMin, max: LIMITS.modulusMax })
  const nu = num(ctx, key(p, 'nu'), o.nu, { min: 0, lt: 0.5 })
  if (name === undefined || E === undefined || nu === undefined) return undefined
  return { id: id as Material['id'], name, E, nu }
}

function readSlab(ctx: Ctx, p: string, id: string, o: Record<string, unknown>, refs: Refs): Slab | undefined {
  const floor = floorRef(ctx, key(p, 'floor'), o.floor, refs)
  const outline = polygon(ctx, key(p, 'outline'), o.outline)
  const rawOpenings = list(ctx, key(p, 'openings'), o.openings, [])
  const areaMass = num(ctx, key(p, 'areaMass'), o.areaMass, {
    min: 0,
    positiveMin: LIMITS.massMin,
    max: LIMITS.areaMassMax,
  })
  const openings: Point[][] = []
  let openingsOk = rawOpenings !== undefined
  rawOpenings?.forEach((r, i) => {
    const hole = polygon(ctx, at(key(p, 'openings'), i), r)
    if (!hole) {
      openingsOk = false
      return
    }
    openings.push(hole)
  })
  if (outline && openingsOk) {
    // Inside the outline, not crossing it, not overlapping, nesting in or crossing each other (polygons.ts).
    for (const problem of openingProblems(outline, openings)) {
      fail(ctx, `${p}.${problem.path}`, problem.message)
      openingsOk = false
    }
  }
  if (outline && openingsOk) {
    const net = Math.abs(signedArea(outline)) - openings.reduce((s, h) => s + Math.abs(signedArea(h)), 0)
    if (!(net > 1e-9 * Math.abs(signedArea(outline)))) {
      fail(ctx, key(p, 'openings'), 'cover the whole outline (openings must not overlap each other)')
      openingsOk = false
    }
  }
  if (floor === undefined || !outline || !openingsOk || areaMass === undefined) return undefined
  return { id: id as Slab['id'], floor, outline, openings, areaMass }
}

function readLineMass(
  ctx: Ctx,
  p: string,
  id: string,
  o: Record<string, unknown>,
  refs: Refs,
): LineMass | undefined {
  const floor = floorRef(ctx, key(p, 'floor'), o.floor, refs)
  const raw = list(ctx, key(p, 'points'), o.points)
  const massPerLength = num(ctx, key(p, 'massPerLength'), o.massPerLength, {
    min: 0,
    positiveMin: LIMITS.massMin,
    max: LIMITS.massPerLengthMax,
  })
  let points: Point[] | undefined
  if (raw) {
    if (raw.length < 2) fail(ctx, key(p, 'points'), `needs at least 2 points, got ${raw.length}`)
    else if (raw.length > LIMITS.verticesMax) {
      fail(ctx, key(p, 'points'), `has more than ${LIMITS.verticesMax} points (${raw.length})`)
    } else {
      const pts = raw.map((r, i) => point(ctx, at(key(p, 'points'), i), r))
      if (pts.every((q): q is Point => q !== undefined)) points = pts
    }
  }
  if (floor === undefined || !points || massPerLength === undefined) return undefined
  return { id: id as LineMass['id'], floor, points, massPerLength }
}

function readPointMass(
  ctx: Ctx,
  p: string,
  id: string,
  o: Record<string, unknown>,
  refs: Refs,
): PointMass | undefined {
  const floor = floorRef(ctx, key(p, 'floor'), o.floor, refs)
  const where = point(ctx, key(p, 'at'), o.at)
  const mass = num(ctx, key(p, 'mass'), o.mass, {
    min: 0,
    positiveMin: LIMITS.massMin,
    max: LIMITS.pointMassMax,
  })
  const polarInertia =
    o.polarInertia === undefined
      ? undefined
      : num(ctx, key(p, 'polarInertia'), o.polarInertia, {
          min: 0,
          positiveMin: LIMITS.massMin,
          max: LIMITS.polarInertiaMax,
        })
  if (floor === undefined || !where || mass === undefined) return undefined
  if (o.polarInertia !== undefined && polarInertia === undefined) return undefined
  return {
    id: id as PointMass['id'],
    floor,
    at: where,
    mass,
    ...(polarInertia !== undefined ? { polarInertia } : {}),
  }
}

const factorRule = { gt: 0, min: LIMITS.factorMin, max: LIMITS.factorMax }
const thicknessRule = { gt: 0, min: LIMITS.thicknessMin, max: LIMITS.thicknessMax }

function readWall(ctx: Ctx, p: string, id: string, o: Record<string, unknown>, refs: Refs): Wall | undefined {
  const before = ctx.errors.length
  const name = str(ctx, key(p, 'name'), o.name, id)
  const p1 = point(ctx, key(p, 'p1'), o.p1)
  const p2 = point(ctx, key(p, 'p2'), o.p2)
  const thickness = num(ctx, key(p, 'thickness'), o.thickness, thicknessRule)
  const material = materialRef(ctx, key(p, 'material'), o.material, refs)
  const flexureFactor = num(ctx, key(p, 'flexureFactor'), o.flexureFactor, {
    ...factorRule,
    fallback: STIFFNESS_FACTOR_DEFAULTS.wallFlexure,
  })
  const shearFactor = num(ctx, key(p, 'shearFactor'), o.shearFactor, {
    ...factorRule,
    fallback: STIFFNESS_FACTOR_DEFAULTS.wallShear,
  })
  const joins = o.joins === undefined ? undefined : oneOf(ctx, key(p, 'joins'), o.joins, ['auto', 'apart'] as const, 'auto')
  const locked = lockFlag(ctx, key(p, 'locked'), o.locked)
  const range = floorRange(ctx, p, o, refs)
  const stories = storyKeys(ctx, key(p, 'stories'), o.stories, refs, range, (sp, sv) => {
    const so = object(ctx, sp, sv, ['thickness', 'flexureFactor', 'shearFactor'])
    if (!so) return undefined
    const out: { thickness?: number; flexureFactor?: number; shearFactor?: number } = {}
    if (so.thickness !== undefined) {
      const t = num(ctx, key(sp, 'thickness'), so.thickness, thicknessRule)
      if (t !== undefined) out.thickness = t
    }
    if (so.flexureFactor !== undefined) {
      const f = num(ctx, key(sp, 'flexureFactor'), so.flexureFactor, factorRule)
      if (f !== undefined) out.flexureFactor = f
    }
    if (so.shearFactor !== undefined) {
      const f = num(ctx, key(sp, 'shearFactor'), so.shearFactor, factorRule)
      if (f !== undefined) out.shearFactor = f
    }
    return out as WallStoryOverride
  })
  if (ctx.errors.length > before) return undefined
  if (p1 && p2 && p1.x === p2.x && p1.y === p2.y) {
    warn(ctx, p, 'p1 and p2 coincide: a wall of zero length carries nothing')
  }
  return {
    id: id as Wall['id'],
    name: name as string,
    p1: p1 as Point,
    p2: p2 as Point,
    thickness: thickness as number,
    material: material as Material['id'],
    flexureFactor: flexureFactor as number,
    shearFactor: shearFactor as number,
    base: range!.base,
    top: range!.top,
    ...(stories !== undefined ? { stories } : {}),
    ...(joins !== undefined ? { joins } : {}),
    ...(locked ? { locked } : {}),
  }
}

/** Optional `locked` flag of walls and frame lines (absent = false). */
function lockFlag(ctx: Ctx, path: string, v: unknown): true | undefined {
  if (v === undefined || v === false) return undefined
  if (v === true) return true
  return fail(ctx, path, `must be true or false, got ${show(v)}`)
}

function readFrameStiffness(
  ctx: Ctx,
  p: string,
  v: unknown,
  refs: Refs,
  range: { below: number; last: number } | undefined,
): FrameStiffness | undefined {
  if (!isRecord(v)) return fail(ctx, p, `must be an object, got ${show(v)}`)
  const kind = oneOf(ctx, key(p, 'kind'), v.kind, ['direct', 'moment', 'braced'] as const)
  if (kind === undefined) return undefined
  const before = ctx.errors.length
  const kRule = { gt: 0, min: LIMITS.storyStiffnessMin, max: LIMITS.storyStiffnessMax }
  const bayRule = { gt: 0, min: LIMITS.bayWidthMin, max: LIMITS.bayWidthMax }
  const iRule = { gt: 0, min: LIMITS.secondMomentMin, max: LIMITS.secondMomentMax }
  switch (kind) {
    case 'direct': {
      const o = object(ctx, p, v, ['kind', 'storyStiffness', 'stories'])!
      const storyStiffness = num(ctx, key(p, 'storyStiffness'), o.storyStiffness, kRule)
      const stories = storyKeys(ctx, key(p, 'stories'), o.stories, refs, range, (sp, sv) =>
        num(ctx, sp, sv, kRule),
      )
      if (ctx.errors.length > before) return undefined
      return {
        kind,
        storyStiffness: storyStiffness as number,
        ...(stories !== undefined ? { stories } : {}),
      }
    }
    case 'moment': {
      const o = object(ctx, p, v, [
        'kind',
        'bays',
        'bayWidth',
        'columnI',
        'beamI',
        'material',
        'baseFixity',
        'columnFactor',
        'beamFactor',
        'stories',
      ])!
      const bays = num(ctx, key(p, 'bays'), o.bays, { integer: true, min: 1, max: LIMITS.countMax })
      const bayWidth = num(ctx, key(p, 'bayWidth'), o.bayWidth, bayRule)
      const columnI = num(ctx, key(p, 'columnI'), o.columnI, iRule)
      const beamI = num(ctx, key(p, 'beamI'), o.beamI, iRule)
      const material = materialRef(ctx, key(p, 'material'), o.material, refs)
      const optional = (f: 'columnFactor' | 'beamFactor'): number | undefined =>
        o[f] === undefined ? undefined : num(ctx, key(p, f), o[f], factorRule)
      const baseFixity =
        o.baseFixity === undefined
          ? undefined
          : oneOf(ctx, key(p, 'baseFixity'), o.baseFixity, ['fixed', 'pinned'] as const)
      const columnFactor = optional('columnFactor')
      const beamFactor = optional('beamFactor')
      const stories = storyKeys(ctx, key(p, 'stories'), o.stories, refs, range, (sp, sv) => {
        const so = object(ctx, sp, sv, ['columnI', 'beamI'])
        if (!so) return undefined
        const out: { columnI?: number; beamI?: number } = {}
        for (const f of ['columnI', 'beamI'] as const) {
          if (so[f] === undefined) continue
          const x = num(ctx, key(sp, f), so[f], iRule)
          if (x !== undefined) out[f] = x
        }
        return out
      })
      if (ctx.errors.length > before) return undefined
      return {
        kind,
        bays: bays as number,
        bayWidth: bayWidth as number,
        columnI: columnI as number,
        beamI: beamI as number,
        material: material as Material['id'],
        ...(baseFixity !== undefined ? { baseFixity } : {}),
        ...(columnFactor !== undefined ? { columnFactor } : {}),
        ...(beamFactor !== undefined ? { beamFactor } : {}),
        ...(stories !== undefined ? { stories } : {}),
      }
    }
    case 'braced': {
      const o = object(ctx, p, v, ['kind', 'braces', 'bayWidth', 'braceArea', 'material'])!
      const braces = num(ctx, key(p, 'braces'), o.braces, { integer: true, min: 1, max: LIMITS.countMax })
      const bayWidth = num(ctx, key(p, 'bayWidth'), o.bayWidth, bayRule)
      const braceArea = num(ctx, key(p, 'braceArea'), o.braceArea, {
        gt: 0,
        min: LIMITS.braceAreaMin,
        max: LIMITS.braceAreaMax,
      })
      const material = materialRef(ctx, key(p, 'material'), o.material, refs)
      if (ctx.errors.length > before) return undefined
      return {
        kind,
        braces: braces as number,
        bayWidth: bayWidth as number,
        braceArea: braceArea as number,
        material: material as Material['id'],
      }
    }
    default: {
      const never: never = kind
      throw new Error(`[file] unhandled frame stiffness kind ${String(never)}`)
    }
  }
}

function readFrameLine(
  ctx: Ctx,
  p: string,
  id: string,
  o: Record<string, unknown>,
  refs: Refs,
): FrameLine | undefined {
  const before = ctx.errors.length
  const name = str(ctx, key(p, 'name'), o.name, id)
  const p1 = point(ctx, key(p, 'p1'), o.p1)
  const p2 = point(ctx, key(p, 'p2'), o.p2)
  const range = floorRange(ctx, p, o, refs)
  const stiffness = readFrameStiffness(ctx, key(p, 'stiffness'), o.stiffness, refs, range)
  const locked = lockFlag(ctx, key(p, 'locked'), o.locked)
  if (ctx.errors.length > before || !range || !stiffness) return undefined
  if (p1 && p2 && p1.x === p2.x && p1.y === p2.y) {
    warn(ctx, p, 'p1 and p2 coincide: a frame line needs a direction')
  }
  return {
    id: id as FrameLine['id'],
    name: name as string,
    p1: p1 as Point,
    p2: p2 as Point,
    stiffness,
    base: range.base,
    top: range.top,
    ...(locked ? { locked } : {}),
  }
}

function readColumn(ctx: Ctx, p: string, id: string, o: Record<string, unknown>, refs: Refs): Column | undefined {
  const before = ctx.errors.length
  const name = str(ctx, key(p, 'name'), o.name, id)
  const where = point(ctx, key(p, 'at'), o.at)
  const angle = num(ctx, key(p, 'angle'), o.angle, { min: -1000, max: 1000, fallback: 0 })
  const iRule = { min: 0, positiveMin: LIMITS.secondMomentMin, max: LIMITS.secondMomentMax }
  const Ix = num(ctx, key(p, 'Ix'), o.Ix, iRule)
  const Iy = num(ctx, key(p, 'Iy'), o.Iy, iRule)
  const material = materialRef(ctx, key(p, 'material'), o.material, refs)
  const fixity = oneOf(ctx, key(p, 'fixity'), o.fixity, ['fixed', 'pinned'] as const, 'fixed')
  const stiffnessFactor =
    o.stiffnessFactor === undefined ? undefined : num(ctx, key(p, 'stiffnessFactor'), o.stiffnessFactor, factorRule)
  const restraint =
    o.restraint === undefined
      ? undefined
      : num(ctx, key(p, 'restraint'), o.restraint, { gt: 0, min: LIMITS.restraintMin, max: 1 })
  const range = floorRange(ctx, p, o, refs)
  if (ctx.errors.length > before || !range) return undefined
  if (Ix === 0 && Iy === 0) warn(ctx, p, 'Ix and Iy are both 0: the column carries nothing')
  return {
    id: id as Column['id'],
    name: name as string,
    at: where as Point,
    angle: angle as number,
    Ix: Ix as number,
    Iy: Iy as number,
    material: material as Material['id'],
    fixity: fixity as Column['fixity'],
    ...(stiffnessFactor !== undefined ? { stiffnessFactor } : {}),
    ...(restraint !== undefined ? { restraint } : {}),
    base: range.base,
    top: range.top,
  }
}

function readGrid(ctx: Ctx, v: unknown): Grid | undefined {
  const o = object(ctx, 'grid', v, ['x', 'y'])
  if (!o) return undefined
  const lines = (axis: 'x' | 'y'): { label: string; at: number }[] | undefined => {
    const p = key('grid', axis)
    const raw = list(ctx, p, o[axis], [])
    if (!raw) return undefined
    const out: { label: string; at: number }[] = []
    raw.forEach((r, i) => {
      const lp = at(p, i)
      const lo = object(ctx, lp, r, ['label', 'at'])
      if (!lo) return
      const label = str(ctx, key(lp, 'label'), lo.label)
      const pos = num(ctx, key(lp, 'at'), lo.at, { min: -LIMITS.coordinate, max: LIMITS.coordinate })
      if (label !== undefined && pos !== undefined) out.push({ label, at: pos })
    })
    return out.length === raw.length ? out : undefined
  }
  const x = lines('x')
  const y = lines('y')
  return x && y ? { x, y } : undefined
}

function readSpectrum(ctx: Ctx, p: string, v: unknown): SpectrumSpec | undefined {
  if (!isRecord(v)) return fail(ctx, p, `must be an object, got ${show(v)}`)
  const kind = oneOf(ctx, key(p, 'kind'), v.kind, ['asce7', 'en1998-1', 'table'] as const)
  if (kind === undefined) return undefined
  const before = ctx.errors.length
  const gRule = { gt: 0, max: LIMITS.spectrumMax }
  switch (kind) {
    case 'asce7': {
      const o = object(ctx, p, v, ['kind', 'SDS', 'SD1', 'TL', 'S1'])!
      const SDS = num(ctx, key(p, 'SDS'), o.SDS, gRule)
      const SD1 = num(ctx, key(p, 'SD1'), o.SD1, gRule)
      const TL = num(ctx, key(p, 'TL'), o.TL, { gt: 0, max: LIMITS.periodMax })
      const S1 = o.S1 === undefined ? undefined : num(ctx, key(p, 'S1'), o.S1, { min: 0, max: LIMITS.spectrumMax })
      if (ctx.errors.length > before) return undefined
      return { kind, SDS: SDS as number, SD1: SD1 as number, TL: TL as number, ...(S1 !== undefined ? { S1 } : {}) }
    }
    case 'en1998-1': {
      const o = object(ctx, p, v, ['kind', 'ag', 'ground'])!
      const ag = num(ctx, key(p, 'ag'), o.ag, { gt: 0, max: LIMITS.pgaMax })
      const ground = oneOf(ctx, key(p, 'ground'), o.ground, ['A', 'B', 'C', 'D', 'E'] as const)
      if (ctx.errors.length > before) return undefined
      return { kind, ag: ag as number, ground: ground as 'A' }
    }
    case 'table': {
      const o = object(ctx, p, v, ['kind', 'points'])!
      const pp = key(p, 'points')
      const raw = list(ctx, pp, o.points)
      if (!raw) return undefined
      if (raw.length < 1) return fail(ctx, pp, 'needs at least 1 (period, Sa) pair')
      if (raw.length > LIMITS.verticesMax) return fail(ctx, pp, `has more than ${LIMITS.verticesMax} pairs`)
      const points: [number, number][] = []
      raw.forEach((r, i) => {
        const ip = at(pp, i)
        if (!Array.isArray(r) || r.length !== 2) {
          fail(ctx, ip, `must be a [period s, Sa g] pair, got ${show(r)}`)
          return
        }
        const T = num(ctx, at(ip, 0), r[0], { min: 0, max: LIMITS.periodMax })
        const Sa = num(ctx, at(ip, 1), r[1], { min: 0, max: LIMITS.spectrumMax })
        if (T === undefined || Sa === undefined) return
        const prev = points[points.length - 1]
        if (prev && !(T > prev[0])) {
          fail(ctx, at(ip, 0), `periods must be strictly ascending, got ${T} after ${prev[0]}`)
          return
        }
        points.push([T, Sa])
      })
      if (ctx.errors.length > before) return undefined
      if (points.every(([, Sa]) => Sa === 0)) return fail(ctx, pp, 'all ordinates are 0')
      return { kind, points }
    }
    default: {
      const never: never = kind
      throw new Error(`[file] unhandled spectrum kind ${String(never)}`)
    }
  }
}

function readGroundMotion(ctx: Ctx, p: string, v: unknown): GroundMotionSpec | undefined {
  if (!isRecord(v)) return fail(ctx, p, `must be an object, got ${show(v)}`)
  const kind = oneOf(ctx, key(p, 'kind'), v.kind, ['record', 'generated'] as const)
  if (kind === undefined) return undefined
  const before = ctx.errors.length
  if (kind === 'record') {
    const o = object(ctx, p, v, ['kind', 'name', 'dt', 'ax', 'ay'])!
    const name = str(ctx, key(p, 'name'), o.name, 'record')
    const dt = num(ctx, key(p, 'dt'), o.dt, { gt: 0, min: LIMITS.recordDtMin, max: LIMITS.recordDtMax })
    const series = (axis: 'ax' | 'ay'): number[] | undefined => {
      const sp = key(p, axis)
      const raw = list(ctx, sp, o[axis])
      if (!raw) return undefined
      if (raw.length < 2 || raw.length > LIMITS.recordSamplesMax) {
        return fail(ctx, sp, `needs 2 to ${LIMITS.recordSamplesMax} samples, got ${raw.length}`)
      }
      // One message for a bad sample is enough: a record can hold thousands.
      const bad = raw.findIndex(
        (a) => typeof a !== 'number' || !Number.isFinite(a) || Math.abs(a) > LIMITS.groundAccelerationMax,
      )
      if (bad >= 0) {
        return fail(
          ctx,
          at(sp, bad),
          `must be a finite number within +/-${LIMITS.groundAccelerationMax} m/s², got ${show(raw[bad])}`,
        )
      }
      return raw as number[]
    }
    const ax = series('ax')
    const ay = series('ay')
    if (ax && ay && ax.length !== ay.length) {
      fail(ctx, key(p, 'ay'), `must have as many samples as ax (${ax.length}), got ${ay.length}`)
    }
    if (ctx.errors.length > before) return undefined
    return { kind, name: name as string, dt: dt as number, ax: ax as number[], ay: ay as number[] }
  }
  const o = object(ctx, p, v, ['kind', 'pga', 'duration', 'seed', 'yFactor'])!
  const pga = num(ctx, key(p, 'pga'), o.pga, { gt: 0, max: LIMITS.pgaMax })
  const duration = num(ctx, key(p, 'duration'), o.duration, { gt: 0, max: LIMITS.durationMax })
  const seed = num(ctx, key(p, 'seed'), o.seed, { integer: true, min: 0, max: 2 ** 32 - 1, fallback: 1 })
  const yFactor = num(ctx, key(p, 'yFactor'), o.yFactor, { min: 0, max: 1, fallback: 0.3 })
  if (ctx.errors.length > before) return undefined
  return { kind, pga: pga as number, duration: duration as number, seed: seed as number, yFactor: yFactor as number }
}

const CRITERION_FIELDS = [
  'id',
  'name',
  'source',
  'irregularRatio',
  'extremeRatio',
  'ratioQuantity',
  'amplification',
  'eccentricityToRadius',
  'radiusToGyration',
  'accidentalEccentricity',
] as const

function readCriterionSet(ctx: Ctx, p: string, v: unknown): CriterionSetSpec | undefined {
  const o = object(ctx, p, v, CRITERION_FIELDS)
  if (!o) return undefined
  const before = ctx.errors.length
  const id = idString(ctx, key(p, 'id'), o.id)
  const name = str(ctx, key(p, 'name'), o.name, id ?? '')
  const source = str(ctx, key(p, 'source'), o.source)
  const out: Record<string, unknown> = { id, name, source }
  const ratio = { gt: 0, max: 10 }
  for (const f of ['irregularRatio', 'extremeRatio', 'eccentricityToRadius', 'radiusToGyration'] as const) {
    if (o[f] !== undefined) out[f] = num(ctx, key(p, f), o[f], ratio)
  }
  if (o.ratioQuantity !== undefined) {
    const quantities = ['drift', 'displacement'] as const
    out.ratioQuantity = oneOf(ctx, key(p, 'ratioQuantity'), o.ratioQuantity, quantities)
  }
  if (o.accidentalEccentricity !== undefined) {
    out.accidentalEccentricity = num(ctx, key(p, 'accidentalEccentricity'), o.accidentalEccentricity, {
      min: 0,
      max: 0.5,
    })
  }
  if (
    typeof out.irregularRatio === 'number' &&
    typeof out.extremeRatio === 'number' &&
    out.extremeRatio < out.irregularRatio
  ) {
    fail(ctx, key(p, 'extremeRatio'), `must be >= irregularRatio (${out.irregularRatio}), got ${out.extremeRatio}`)
  }
  if (o.amplification !== undefined) {
    const ap = key(p, 'amplification')
    const ao = object(ctx, ap, o.amplification, ['divisor', 'power', 'min', 'max'])
    if (ao) {
      const divisor = num(ctx, key(ap, 'divisor'), ao.divisor, { gt: 0, max: 10 })
      const power = num(ctx, key(ap, 'power'), ao.power, { min: 0, max: 10 })
      const min = num(ctx, key(ap, 'min'), ao.min, { gt: 0, max: 100 })
      const max = num(ctx, key(ap, 'max'), ao.max, { gt: 0, max: 100 })
      if (min !== undefined && max !== undefined && max < min) {
        fail(ctx, key(ap, 'max'), `must be >= min (${min}), got ${max}`)
      }
      out.amplification = { divisor, power, min, max }
    }
  }
  if (ctx.errors.length > before) return undefined
  for (const k of Object.keys(out)) if (out[k] === undefined) delete out[k]
  return out as unknown as CriterionSetSpec
}

const SETTINGS_FIELDS = [
  'criterionSet',
  'criterionSets',
  'accidentalEccentricity',
  'damping',
  'spectrum',
  'directionCombination',
  'baseShearTarget',
  'spectrumModes',
  'groundMotion',
  'seismicDesign',
  'torsionalFlexibilityLimit',
] as const

function readSettings(ctx: Ctx, v: unknown): AnalysisSettings | undefined {
  if (v === undefined) {
    warn(ctx, 'settings', 'missing: using the defaults and a placeholder spectrum; set your site spectrum')
    return DEFAULT_SETTINGS
  }
  const o = object(ctx, 'settings', v, SETTINGS_FIELDS)
  if (!o) return undefined
  const before = ctx.errors.length
  const d = DEFAULT_SETTINGS
  // '' or 'none' selects no set (ratios are still computed; see docs/criteria.md).
  const criterionSet = str(ctx, 'settings.criterionSet', o.criterionSet, d.criterionSet)
  let criterionSets: CriterionSetSpec[] | undefined
  if (o.criterionSets !== undefined) {
    const raw = list(ctx, 'settings.criterionSets', o.criterionSets)
    if (raw) {
      criterionSets = []
      const seen = new Map<string, number>()
      raw.forEach((r, i) => {
        const p = at('settings.criterionSets', i)
        const set = readCriterionSet(ctx, p, r)
        const rawId = isRecord(r) && typeof r.id === 'string' ? r.id : undefined
        if (rawId !== undefined) {
          const dup = seen.get(rawId)
          if (dup !== undefined) {
            fail(ctx, key(p, 'id'), `duplicate criterion set id ${show(rawId)} (also settings.criterionSets[${dup}])`)
            return
          }
          seen.set(rawId, i)
        }
        if (set) criterionSets?.push(set)
      })
    }
  }
  const accidentalEccentricity = num(ctx, 'settings.accidentalEccentricity', o.accidentalEccentricity, {
    min: 0,
    max: 0.5,
    fallback: d.accidentalEccentricity,
  })
  const damping = num(ctx, 'settings.damping', o.damping, { gt: 0, lt: 1, fallback: d.damping })
  let spectrum: SpectrumSpec | undefined
  if (o.spectrum === undefined) {
    warn(ctx, 'settings.spectrum', 'missing: using a placeholder ASCE 7 shape (SDS 1.0 g, SD1 0.6 g, TL 8 s); set your site spectrum')
    spectrum = d.spectrum
  } else {
    spectrum = readSpectrum(ctx, 'settings.spectrum', o.spectrum)
  }
  const directionCombination = oneOf(
    ctx,
    'settings.directionCombination',
    o.directionCombination,
    ['srss', '100-30'] as const,
    d.directionCombination,
  )
  const baseShearTarget =
    o.baseShearTarget === undefined
      ? undefined
      : num(ctx, 'settings.baseShearTarget', o.baseShearTarget, { gt: 0, max: LIMITS.baseShearMax })
  const spectrumModes =
    o.spectrumModes === undefined
      ? undefined
      : oneOf(ctx, 'settings.spectrumModes', o.spectrumModes, ['full-mass', 'ninety-percent'] as const, 'full-mass')
  const groundMotion =
    o.groundMotion === undefined ? undefined : readGroundMotion(ctx, 'settings.groundMotion', o.groundMotion)
  const seismicDesign =
    o.seismicDesign === undefined ? undefined : readSeismicDesign(o.seismicDesign, 'settings.seismicDesign', ctx)
  const torsionalFlexibilityLimit =
    o.torsionalFlexibilityLimit === undefined
      ? undefined
      : num(ctx, 'settings.torsionalFlexibilityLimit', o.torsionalFlexibilityLimit, { gt: 0, max: 10 })
  if (ctx.errors.length > before) return undefined
  return {
    criterionSet: criterionSet as string,
    ...(criterionSets !== undefined ? { criterionSets } : {}),
    accidentalEccentricity: accidentalEccentricity as number,
    damping: damping as number,
    spectrum: spectrum as SpectrumSpec,
    directionCombination: directionCombination as 'srss',
    ...(baseShearTarget !== undefined ? { baseShearTarget } : {}),
    ...(spectrumModes !== undefined ? { spectrumModes: spectrumModes as SpectrumModeRule } : {}),
    ...(groundMotion !== undefined ? { groundMotion } : {}),
    ...(seismicDesign !== undefined ? { seismicDesign } : {}),
    ...(torsionalFlexibilityLimit !== undefined ? { torsionalFlexibilityLimit } : {}),
  }
}

const PROJECT_FIELDS = [
  'format',
  'version',
  'name',
  'notes',
  'floors',
  'materials',
  'slabs',
  'lineMasses',
  'pointMasses',
  'walls',
  'frameLines',
  'columns',
  'grid',
  'settings',
] as const

function validate(ctx: Ctx, doc: RawDocument): Project | undefined {
  object(ctx, '', doc, PROJECT_FIELDS)
  const name = str(ctx, 'name', doc.name, 'Untitled project')
  const notes = doc.notes === undefined ? undefined : str(ctx, 'notes', doc.notes)
  const { floors, ids: floorIds } = readFloors(ctx, doc.floors)
  const materials = records(ctx, 'materials', doc.materials, (p, id, o) => readMaterial(ctx, p, id, o), [
    'name',
    'E',
    'nu',
  ])
  // Materials with errors still count as existing, so a bad E is reported once, not at every use.
  const materialIds = isRecord(doc.materials) ? Object.keys(doc.materials) : []
  const refs: Refs = {
    floorIds,
    floorSet: new Set(floorIds),
    materialSet: new Set(materialIds),
  }
  const slabs = records(ctx, 'slabs', doc.slabs, (p, id, o) => readSlab(ctx, p, id, o, refs), [
    'floor',
    'outline',
    'openings',
    'areaMass',
  ])
  const lineMasses = records(ctx, 'lineMasses', doc.lineMasses, (p, id, o) => readLineMass(ctx, p, id, o, refs), [
    'floor',
    'points',
    'massPerLength',
  ])
  const pointMasses = records(
    ctx,
    'pointMasses',
    doc.pointMasses,
    (p, id, o) => readPointMass(ctx, p, id, o, refs),
    ['floor', 'at', 'mass', 'polarInertia'],
  )
  const walls = records(ctx, 'walls', doc.walls, (p, id, o) => readWall(ctx, p, id, o, refs), [
    'name',
    'p1',
    'p2',
    'thickness',
    'material',
    'flexureFactor',
    'shearFactor',
    'base',
    'top',
    'stories',
    'joins',
    'locked',
  ])
  const frameLines = records(ctx, 'frameLines', doc.frameLines, (p, id, o) => readFrameLine(ctx, p, id, o, refs), [
    'name',
    'p1',
    'p2',
    'stiffness',
    'base',
    'top',
    'locked',
  ])
  const columns = records(ctx, 'columns', doc.columns, (p, id, o) => readColumn(ctx, p, id, o, refs), [
    'name',
    'at',
    'angle',
    'Ix',
    'Iy',
    'material',
    'fixity',
    'stiffnessFactor',
    'restraint',
    'base',
    'top',
  ])
  const grid = doc.grid === undefined ? undefined : readGrid(ctx, doc.grid)
  const settings = readSettings(ctx, doc.settings)

  if (!floors) return undefined
  // Floors linked to a typical floor ignore their own content: say so rather than drop it silently.
  const linked = new Set(floors.filter((f) => f.typicalOf !== undefined).map((f) => f.id as string))
  for (const [section, recs] of [
    ['slabs', slabs],
    ['lineMasses', lineMasses],
    ['pointMasses', pointMasses],
  ] as const) {
    for (const r of Object.values(recs)) {
      if (linked.has(r.floor)) {
        warn(ctx, key(section, r.id), `floor ${show(r.floor)} uses a typical floor, so this is ignored`)
      }
    }
  }

  if (ctx.errors.length > 0 || name === undefined || !settings) return undefined
  if (doc.notes !== undefined && notes === undefined) return undefined
  return {
    format: PROJECT_FORMAT,
    version: CURRENT_VERSION,
    name,
    ...(notes !== undefined ? { notes } : {}),
    floors,
    materials,
    slabs,
    lineMasses,
    pointMasses,
    walls,
    frameLines,
    columns,
    ...(grid !== undefined ? { grid } : {}),
    settings,
  }
}

// ---------------------------------------------------------------- public API

/**
 * Migrate and validate parsed JSON. Errors name the path and the problem,
 * e.g. `walls.w12.thickness: must be > 0, got -0.2`. An invalid file is refused whole; the result
 * never shares objects with the input. Never throws for any input.
 */
export function parseProject(input: unknown): ParseResult {
  if (!isRecord(input)) {
    return { ok: false, errors: [`(file): must be a JSON object (a Gyre project), got ${show(input)}`] }
  }
  if (input.format !== PROJECT_FORMAT) {
    return {
      ok: false,
      errors: [`format: must be "${PROJECT_FORMAT}" (this is not a Gyre project file), got ${show(input.format)}`],
    }
  }
  const version = input.version
  if (typeof version === 'number' && Number.isInteger(version) && version > CURRENT_VERSION) {
    return {
      ok: false,
      errors: [`version ${version} is newer than this Gyre (reads up to ${CURRENT_VERSION}): update Gyre`],
    }
  }
  // Size first, on counts only: an absurd file is refused before any per-field work.
  const overBudget = checkDocumentBudget(input)
  if (overBudget.length > 0) return { ok: false, errors: overBudget }
  const migrated = migrateDocument(input, CURRENT_VERSION)
  if (!migrated.ok) return { ok: false, errors: migrated.errors }
  const ctx: Ctx = { errors: [], warnings: [] }
  const project = validate(ctx, migrated.doc)
  if (ctx.errors.length > 0 || !project) {
    const errors = ctx.errors.length > 0 ? ctx.errors : ['(file): invalid project']
    return { ok: false, errors: capped(errors, 'error') }
  }
  return { ok: true, project, warnings: capped([...migrated.applied, ...ctx.warnings], 'warning') }
}

/** Parse the text of a project file (JSON), then as `parseProject`. Never throws. */
export function parseProjectText(text: string): ParseResult {
  const tooLong = checkTextBudget(text.length)
  if (tooLong) return { ok: false, errors: [tooLong] }
  let data: unknown
  try {
    data = JSON.parse(text)
  } catch (error) {
    return { ok: false, errors: [`(file): not valid JSON: ${(error as Error).message}`] }
  }
  return parseProject(data)
}

/** Field order in saved files; fields not listed follow in alphabetical order. */
const KEY_ORDER = [
  'format',
  'version',
  'id',
  'name',
  'kind',
  'label',
  'notes',
  'floor',
  'height',
  'typicalOf',
  'E',
  'nu',
  'outline',
  'openings',
  'areaMass',
  'points',
  'massPerLength',
  'at',
  'mass',
  'polarInertia',
  'p1',
  'p2',
  'x',
  'y',
  'thickness',
  'material',
  'flexureFactor',
  'shearFactor',
  'stiffness',
  'storyStiffness',
  'bays',
  'bayWidth',
  'columnI',
  'beamI',
  'braces',
  'braceArea',
  'angle',
  'Ix',
  'Iy',
  'fixity',
  'stiffnessFactor',
  'base',
  'top',
  'stories',
  'floors',
  'materials',
  'slabs',
  'lineMasses',
  'pointMasses',
  'walls',
  'frameLines',
  'columns',
  'grid',
  'settings',
  'criterionSet',
  'criterionSets',
  'source',
  'irregularRatio',
  'extremeRatio',
  'ratioQuantity',
  'amplification',
  'divisor',
  'power',
  'min',
  'max',
  'eccentricityToRadius',
  'radiusToGyration',
  'accidentalEccentricity',
  'damping',
  'spectrum',
  'directionCombination',
  'baseShearTarget',
  'spectrumModes',
  'groundMotion',
]
const RANK = new Map(KEY_ORDER.map((k, i) => [k, i]))
/** Objects whose keys are ids: their entries keep the document's order. */
const MAP_FIELDS = new Set(['materials', 'slabs', 'lineMasses', 'pointMasses', 'walls', 'frameLines', 'columns', 'stories'])

function ordered(value: unknown, isMap: boolean): unknown {
  if (Array.isArray(value)) return value.map((v) => ordered(v, false))
  if (!isRecord(value)) return value
  const keys = Object.keys(value).filter((k) => value[k] !== undefined)
  if (!isMap) {
    keys.sort((a, b) => {
      const ra = RANK.get(a) ?? Infinity
      const rb = RANK.get(b) ?? Infinity
      return ra !== rb ? ra - rb : a < b ? -1 : a > b ? 1 : 0
    })
  }
  return Object.fromEntries(keys.map((k) => [k, ordered(value[k], !isMap && MAP_FIELDS.has(k))]))
}

/**
 * The project as file text: 2-space JSON with a stable field order (see KEY_ORDER) and a final
 * newline; records keep their order. Round-trips through `parseProject`.
 */
export function serializeProject(project: Project): string {
  return `${JSON.stringify(ordered(project, false), null, 2)}\n`
}
