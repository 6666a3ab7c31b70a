/**
 * Balance assistant: which wall, core or frame line to move, slide, lengthen, thicken or stiffen, and
 * by how much, to bring each floor's centre of rigidity towards its centre of mass, alone or in
 * combinations of up to three changes.
 *
 * Objectives (the user picks one; all are reported before and after, docs/balance.md):
 * - 'eccentricity': S = sqrt( mean_j [ (e_x,j / r_x,j)² + (e_y,j / r_y,j)² ] ), e = CR - CM, r the
 *   torsional radii of MODELING.md; EN 1998-1 4.2.3.2(6) limits e0 <= 0.30 r per direction;
 * - 'drift': the worst max/average story drift ratio over the static torsion cases (the quantity of
 *   ASCE/SEI 7-16 Table 12.3-1 Type 1a/1b);
 * - 'periodRatio': T_torsional / T_translational of the longest-period modes of each kind (< 1 when a
 *   translational mode comes first; METHODS.md §8, Omega > 1);
 * - 'mix': w_e S + w_d (D - 1) + w_p P (our own weighting, documented defaults 1, 1, 1).
 * Ranking rule: a change that worsens the worst drift ratio is ranked after every change that does not
 * (two tiers, then the objective), so it is never first while another change improves both.
 * Pure: the project passed in is never changed.
 */
import { CAUTION, elementFloorRange, floorContent } from '@/model'
import type { FrameLine, FrameStiffness, Point, Project, Wall } from '@/model'
import { buildStructure } from './assemble'
import { computeCentres } from './centres'
import { resolveCriterionSet } from './criteria'
import { findWallGroups } from './elements/wallGroup'
import { runStaticTorsion } from './loads'
import { solveModes } from './modal'
import type { FloorCentres } from './results'
import { createStiffnessSolver } from './solve'

/** The kinds of change the assistant tries ('move': along the element's normal, or a whole core along x or y). */
export type BalanceAction = 'move' | 'slide' | 'lengthen-start' | 'lengthen-end' | 'thickness' | 'stiffness'

/** What the search minimises (see module header). */
export type BalanceObjective = 'eccentricity' | 'drift' | 'periodRatio' | 'mix'

/** The measures shown before and after every suggestion, all -. */
export interface BalanceMetrics {
  /** RMS over floors of e/r in both directions. */
  readonly eccentricityRms: number
  /** Largest |e|/r over floors and directions. */
  readonly worstEccentricityRatio: number
  /** Worst max/avg story drift ratio over the static torsion cases; null when not computed. */
  readonly worstDriftRatio: number | null
  /** T_torsional / T_translational (longest period of each kind); null when no mode is torsion-dominated. */
  readonly periodRatio: number | null
}

/** One element record before and after a change. */
export interface BalanceEdit {
  readonly elementKind: 'wall' | 'frameLine'
  readonly before: Wall | FrameLine
  readonly after: Wall | FrameLine
}

/** One change of one element or one whole wall group (core). */
export interface BalanceStep {
  /** Element id, or the wall-group id ('w1+w2+...') for a core. */
  readonly targetId: string
  readonly action: BalanceAction
  /** Plain-words instruction, e.g. "Move wall 'East gable' 2.40 m towards -x (to x = 27.60 m)". */
  readonly description: string
  /** m for moves and lengths (signed along the trial direction), a factor for thickness and stiffness. */
  readonly amount: number
  readonly unit: 'm' | 'factor'
  readonly edits: readonly BalanceEdit[]
}

/** One suggestion: one to three steps applied together. */
export interface BalanceSuggestion {
  readonly steps: readonly BalanceStep[]
  /** All element records to replace (one per element), applied as one undoable command. */
  readonly edits: readonly BalanceEdit[]
  readonly description: string
  readonly objective: BalanceObjective
  readonly objectiveBefore: number
  readonly objectiveAfter: number
  readonly before: BalanceMetrics
  readonly after: BalanceMetrics
  /** Plain words for every measure that gets worse, e.g. "worst drift ratio worse (1.21 → 1.26)". */
  readonly worse: readonly string[]
  /** True when the worst drift ratio gets worse (the ranking's second tier). */
  readonly worsensDrift: boolean
  // Kept for the single-change view: the first step.
  readonly elementId: string
  readonly elementKind: 'wall' | 'frameLine'
  readonly elementName: string
  readonly action: BalanceAction
  readonly amount: number
  readonly unit: 'm' | 'factor'
  /** The first edited record (same id). */
  readonly element: Wall | FrameLine
  readonly scoreBefore: number
  readonly scoreAfter: number
  readonly worstEccentricityRatioBefore: number
  readonly worstEccentricityRatioAfter: number
  readonly worstDriftRatioBefore: number | null
  readonly worstDriftRatioAfter: number | null
}

export interface BalanceResult {
  /** Score S (eccentricity RMS) of the current model, -. */
  readonly score: number
  readonly worstEccentricityRatio: number
  readonly objective: BalanceObjective
  /** The current model's measures. */
  readonly metrics: BalanceMetrics | null
  /** Best suggestions first (each applies to the current model, not cumulative). */
  readonly suggestions: readonly BalanceSuggestion[]
  /** Number of trial analyses run. */
  readonly trials: number
  /** Why nothing is suggested, when nothing is. */
  readonly message: string | null
  readonly caution: string
}

export interface BalanceOptions {
  /** How many suggestions to return (default 5). */
  readonly count?: number
  /** What to minimise (default 'eccentricity'). */
  readonly objective?: BalanceObjective
  /** Weights of the 'mix' objective (defaults 1, 1, 1). */
  readonly weights?: { readonly eccentricity?: number; readonly drift?: number; readonly periodRatio?: number }
  /** Also compute drift and period measures for the returned suggestions (default true). */
  readonly withDriftRatios?: boolean
  /** Rounding of moves and lengths when no grid line applies, m (default 0.05). */
  readonly lengthStep?: number
  /** Largest move or added length, m (default 6). */
  readonly maxMove?: number
  /** Thinnest wall the assistant may propose, m (default 0.20). */
  readonly minThickness?: number
  /** Put normal moves of grid-parallel elements on grid lines when the project has a grid (default true). */
  readonly snapToGrid?: boolean
  /** Largest number of changes in one suggestion, 1 to 3 (default 3). */
  readonly maxChanges?: number
  /** Beam width of the combination search (default 3). */
  readonly beamWidth?: number
}

/** Progress of a running search. */
export interface BalanceProgress {
  readonly phase: 'single' | 'combinations' | 'ranking'
  /** 0..1 within the whole search (rough). */
  readonly fraction: number
  readonly trials: number
}

/** Default options (docs/balance.md). */
export const BALANCE_DEFAULTS = {
  count: 5,
  lengthStep: 0.05,
  maxMove: 6,
  minThickness: 0.2,
  maxChanges: 3,
  beamWidth: 3,
} as const

const FAILED_METRICS: BalanceMetrics = {
  eccentricityRms: Number.POSITIVE_INFINITY,
  worstEccentricityRatio: Number.POSITIVE_INFINITY,
  worstDriftRatio: null,
  periodRatio: null,
}

/** Score of a set of floor centres (see module header). */
export function balanceScore(centres: readonly FloorCentres[]): { score: number; worst: number } {
  if (centres.length === 0) return { score: Infinity, worst: Infinity }
  let sum = 0
  let worst = 0
  for (const c of centres) {
    const ex = c.torsionalRadius.x > 0 ? Math.abs(c.eccentricity.x) / c.torsionalRadius.x : 0
    const ey = c.torsionalRadius.y > 0 ? Math.abs(c.eccentricity.y) / c.torsionalRadius.y : 0
    sum += ex * ex + ey * ey
    worst = Math.max(worst, ex, ey)
  }
  const score = Math.sqrt(sum / centres.length)
  return Number.isFinite(score) ? { score, worst } : { score: Infinity, worst: Infinity }
}

/**
 * The balance measures of a project: centres always; drift and period ratios when `full`.
 * @see docs/balance.md
 */
export function balanceMetrics(project: Project, full = true): BalanceMetrics {
  const built = buildStructure(project)
  if (!built.structure) return FAILED_METRICS
  const solved = createStiffnessSolver(built.structure)
  if (!solved.ok) return FAILED_METRICS
  const { score, worst } = balanceScore(computeCentres(built.structure, solved.solver))
  if (!Number.isFinite(score) || !full) return { ...FAILED_METRICS, eccentricityRms: score, worstEccentricityRatio: worst }
  const modes = solveModes(built.structure, { stiffnessSolver: solved.solver })
  let periodRatio: number | null = null
  let tTors = 0
  let tTrans = 0
  for (let m = 0; m < modes.count; m++) {
    const T = modes.periods[m] ?? 0
    if ((modes.torsionShare[m] ?? 0) > 0.5) tTors = Math.max(tTors, T)
    else tTrans = Math.max(tTrans, T)
  }
  if (tTors > 0 && tTrans > 0) periodRatio = tTors / tTrans
  const criterion = resolveCriterionSet(project.settings)
  let drift: number | null = null
  if (modes.count > 0) {
    const torsion = runStaticTorsion(built.structure, solved.solver, modes, project.settings, criterion.set)
    drift = 0
    for (const c of torsion.cases) {
      for (const s of c.stories) if (Number.isFinite(s.driftRatio)) drift = Math.max(drift, s.driftRatio)
    }
  }
  return { eccentricityRms: score, worstEccentricityRatio: worst, worstDriftRatio: drift, periodRatio }
}

/** The objective value of a set of measures (lower is better; Infinity when it cannot be computed). */
export function objectiveValue(
  m: BalanceMetrics,
  objective: BalanceObjective,
  weights: BalanceOptions['weights'] = {},
): number {
  switch (objective) {
    case 'eccentricity':
      return m.eccentricityRms
    case 'drift':
      return m.worstDriftRatio ?? Infinity
    case 'periodRatio':
      return m.periodRatio ?? (Number.isFinite(m.eccentricityRms) ? 0 : Infinity)
    case 'mix': {
      if (!Number.isFinite(m.eccentricityRms) || m.worstDriftRatio === null) return Infinity
      return (
        (weights.eccentricity ?? 1) * m.eccentricityRms +
        (weights.drift ?? 1) * (m.worstDriftRatio - 1) +
        (weights.periodRatio ?? 1) * (m.periodRatio ?? 0)
      )
    }
    default: {
      const never: never = objective
      return never
    }
  }
}

type Lateral = { kind: 'wall'; record: Wall } | { kind: 'frameLine'; record: FrameLine }

/** What one trial changes: one element, or a whole wall group moved or thickened as one. */
interface Target {
  readonly id: string
  readonly label: string
  readonly members: readonly Lateral[]
}

interface Trial {
  readonly target: Target
  readonly action: BalanceAction
  /** Direction of a move or slide (unit vector), for the description. */
  readonly dir: Point | null
  readonly p0: number
  readonly lo: number
  readonly hi: number
  readonly step: number
  readonly unit: 'm' | 'factor'
  /** Discrete values to try instead of a continuous search (grid lines), when any. */
  readonly snaps: readonly number[]
  /** The changed records, or null when the change breaks a constraint (off the slab). */
  apply(p: number): Lateral[] | null
}

const EDGE_TOL = 1e-6

function onSegment(p: Point, a: Point, b: Point): boolean {
  const abx = b.x - a.x
  const aby = b.y - a.y
  const len2 = abx * abx + aby * aby
  const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * abx + (p.y - a.y) * aby) / len2)) : 0
  return Math.hypot(a.x + t * abx - p.x, a.y + t * aby - p.y) <= EDGE_TOL
}

/** Point in polygon: 'in', 'edge' (on the boundary within 1e-6 m) or 'out' (even-odd rule). */
function classify(p: Point, poly: readonly Point[]): 'in' | 'edge' | 'out' {
  let inside = false
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i]!
    const b = poly[j]!
    if (onSegment(p, a, b)) return 'edge'
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside
  }
  return inside ? 'in' : 'out'
}

/** Whether a plan point is on a slab of the given slabs (outline minus openings; edges count as on). */
function onSlab(p: Point, slabs: readonly { outline: readonly Point[]; openings: readonly (readonly Point[])[] }[]): boolean {
  return slabs.some(
    (s) => classify(p, s.outline) !== 'out' && s.openings.every((o) => classify(p, o) !== 'in'),
  )
}

/** Sample spacing along an element when checking it lies on the slab, m. */
const SAMPLE_SPACING = 0.1

/**
 * Whether the whole segment of an element lies on the slab of every floor it spans (and of the floor
 * it stands on): sampled every 0.1 m, ends included.
 */
export function elementOnSlabs(project: Project, el: { p1: Point; p2: Point; base: Wall['base']; top: Wall['top'] }): boolean {
  const range = elementFloorRange(project, el)
  if (!range) return false
  const L = Math.hypot(el.p2.x - el.p1.x, el.p2.y - el.p1.y)
  const n = Math.max(1, Math.ceil(L / SAMPLE_SPACING))
  const points: Point[] = []
  for (let i = 0; i <= n; i++) {
    points.push({ x: el.p1.x + ((el.p2.x - el.p1.x) * i) / n, y: el.p1.y + ((el.p2.y - el.p1.y) * i) / n })
  }
  for (let f = Math.max(0, range.below); f <= range.last; f++) {
    const floor = project.floors[f]
    if (!floor) return false
    const slabs = floorContent(project, floor.id).slabs
    if (!points.every((p) => onSlab(p, slabs))) return false
  }
  return true
}

const shift = (p: Point, v: Point, t: number): Point => ({ x: p.x + v.x * t, y: p.y + v.y * t })

function moved(el: Lateral, v: Point, t: number): Lateral {
  const record = { ...el.record, p1: shift(el.record.p1, v, t), p2: shift(el.record.p2, v, t) }
  return el.kind === 'wall' ? { kind: 'wall', record: record as Wall } : { kind: 'frameLine', record: record as FrameLine }
}

/**
 * A frame line's stiffness description scaled by f: direct story stiffness (with per-story values),
 * moment-frame column and beam I (with per-story overrides, so the condensed matrix scales by exactly
 * f), or brace area.
 * @see docs/balance.md (what each action changes)
 */
export function scaleFrame(stiffness: FrameStiffness, f: number): FrameStiffness {
  switch (stiffness.kind) {
    case 'direct': {
      const stories = stiffness.stories
        ? Object.fromEntries(Object.entries(stiffness.stories).map(([k, v]) => [k, v * f]))
        : undefined
      return stories
        ? { ...stiffness, storyStiffness: stiffness.storyStiffness * f, stories }
        : { ...stiffness, storyStiffness: stiffness.storyStiffness * f }
    }
    case 'moment': {
      const scaled = { ...stiffness, columnI: stiffness.columnI * f, beamI: stiffness.beamI * f }
      if (!stiffness.stories) return scaled
      const stories = Object.fromEntries(
        Object.entries(stiffness.stories).map(([k, o]) => [
          k,
          {
            ...(o.columnI !== undefined ? { columnI: o.columnI * f } : {}),
            ...(o.beamI !== undefined ? { beamI: o.beamI * f } : {}),
          },
        ]),
      )
      return { ...scaled, stories }
    }
    case 'braced':
      return { ...stiffness, braceArea: stiffness.braceArea * f }
    default: {
      const never: never = stiffness
      return never
    }
  }
}

function thickened(wall: Wall, f: number): Wall {
  const stories = wall.stories
    ? Object.fromEntries(
        Object.entries(wall.stories).map(([k, v]) => [k, v.thickness === undefined ? v : { ...v, thickness: v.thickness * f }]),
      )
    : undefined
  return stories ? { ...wall, thickness: wall.thickness * f, stories } : { ...wall, thickness: wall.thickness * f }
}

/** Thinnest thickness of a wall over its stories, m. */
function thinnest(wall: Wall): number {
  let t = wall.thickness
  for (const s of Object.values(wall.stories ?? {})) if (s.thickness !== undefined) t = Math.min(t, s.thickness)
  return t
}

interface Limits {
  readonly step: number
  readonly maxMove: number
  readonly minThickness: number
  readonly grid: Project['grid'] | null
}

/** Offsets t along v (unit, axis-parallel) that put a line through `p` on a grid line, within [lo, hi]. */
function gridSnaps(p: Point, v: Point, lo: number, hi: number, grid: Project['grid'] | null): number[] {
  if (!grid) return []
  const lines = Math.abs(v.y) < 1e-9 ? grid.x.map((g) => (g.at - p.x) / v.x) : Math.abs(v.x) < 1e-9 ? grid.y.map((g) => (g.at - p.y) / v.y) : []
  return lines.filter((t) => t >= lo - 1e-9 && t <= hi + 1e-9 && Math.abs(t) > 1e-9)
}

function trialsFor(project: Project, target: Target, limits: Limits): Trial[] {
  const trials: Trial[] = []
  const { step, maxMove, minThickness } = limits
  const placed = (els: Lateral[]): Lateral[] | null =>
    els.every((e) => elementOnSlabs(project, e.record)) ? els : null
  const walls = target.members.filter((m): m is { kind: 'wall'; record: Wall } => m.kind === 'wall')
  if (target.members.length > 1) {
    // A wall group (core): moved as a whole along x and y, or thickened as a whole.
    for (const v of [{ x: 1, y: 0 }, { x: 0, y: 1 }]) {
      trials.push({
        target, action: 'move', dir: v, p0: 0, lo: -maxMove, hi: maxMove, step, unit: 'm', snaps: [],
        apply: (t) => placed(target.members.map((m) => moved(m, v, t))),
      })
    }
  } else {
    const el = target.members[0]
    if (!el) return []
    const { p1, p2 } = el.record
    const L = Math.hypot(p2.x - p1.x, p2.y - p1.y)
    if (!(L > 0)) return []
    const d = { x: (p2.x - p1.x) / L, y: (p2.y - p1.y) / L }
    const n = { x: -d.y, y: d.x }
    const snaps = limits.grid ? gridSnaps(p1, n, -maxMove, maxMove, limits.grid) : []
    trials.push({
      target, action: 'move', dir: n, p0: 0, lo: -maxMove, hi: maxMove, step, unit: 'm', snaps,
      apply: (t) => placed([moved(el, n, t)]),
    })
    trials.push({
      target, action: 'slide', dir: d, p0: 0, lo: -maxMove, hi: maxMove, step, unit: 'm', snaps: [],
      apply: (t) => placed([moved(el, d, t)]),
    })
    if (el.kind === 'wall') {
      const wall = el.record
      const back = { x: -d.x, y: -d.y }
      const grow = Math.min(L, maxMove)
      trials.push({
        target, action: 'lengthen-end', dir: d, p0: 0, lo: 0, hi: grow, step, unit: 'm', snaps: [],
        apply: (t) => placed([{ kind: 'wall', record: { ...wall, p2: shift(p2, d, t) } }]),
      })
      trials.push({
        target, action: 'lengthen-start', dir: back, p0: 0, lo: 0, hi: grow, step, unit: 'm', snaps: [],
        apply: (t) => placed([{ kind: 'wall', record: { ...wall, p1: shift(p1, back, t) } }]),
      })
    } else {
      const frame = el.record
      trials.push({
        target, action: 'stiffness', dir: null, p0: 1, lo: 0.5, hi: 3, step: 0.05, unit: 'factor', snaps: [],
        apply: (f) => [{ kind: 'frameLine', record: { ...frame, stiffness: scaleFrame(frame.stiffness, f) } }],
      })
    }
  }
  if (walls.length > 0 && walls.length === target.members.length) {
    // Thickness factor between 0.5x and 3x; never below the minimum thickness on any story.
    const t0 = Math.min(...walls.map((w) => thinnest(w.record)))
    const lo = Math.min(1, Math.max(0.5, minThickness / t0))
    const ref = Math.max(...walls.map((w) => w.record.thickness))
    trials.push({
      target, action: 'thickness', dir: null, p0: 1, lo, hi: 3, step: 0.025 / ref, unit: 'factor', snaps: [],
      apply: (f) => (t0 * f < minThickness - 1e-9 && f < 1 ? null : walls.map((w) => ({ kind: 'wall', record: thickened(w.record, f) }))),
    })
  }
  return trials
}

function withRecords(project: Project, els: readonly Lateral[]): Project {
  let walls = project.walls
  let frameLines = project.frameLines
  for (const e of els) {
    if (e.kind === 'wall') walls = { ...walls, [e.record.id]: e.record }
    else frameLines = { ...frameLines, [e.record.id]: e.record }
  }
  return { ...project, walls, frameLines }
}

/** Minimise f on [lo, hi]: a coarse scan, then golden-section search around the best sample. */
function minimise(f: (p: number) => number, lo: number, hi: number, p0: number): { p: number; value: number } {
  const samples = 12
  let best = { p: p0, value: f(p0) }
  const xs: number[] = []
  for (let i = 0; i <= samples; i++) xs.push(lo + ((hi - lo) * i) / samples)
  const values = xs.map((x) => f(x))
  let bi = 0
  for (let i = 1; i < values.length; i++) if ((values[i] ?? Infinity) < (values[bi] ?? Infinity)) bi = i
  if ((values[bi] ?? Infinity) < best.value) best = { p: xs[bi] ?? p0, value: values[bi] ?? Infinity }
  let a = xs[Math.max(0, bi - 1)] ?? lo
  let b = xs[Math.min(samples, bi + 1)] ?? hi
  const g = (Math.sqrt(5) - 1) / 2
  let c = b - g * (b - a)
  let d = a + g * (b - a)
  let fc = f(c)
  let fd = f(d)
  for (let it = 0; it < 12; it++) {
    if (fc < fd) {
      b = d
      d = c
      fd = fc
      c = b - g * (b - a)
      fc = f(c)
    } else {
      a = c
      c = d
      fc = fd
      d = a + g * (b - a)
      fd = f(d)
    }
  }
  if (fc < best.value) best = { p: c, value: fc }
  if (fd < best.value) best = { p: d, value: fd }
  return best
}

const fmt = (v: number, digits = 2): string => v.toFixed(digits)

function towards(v: Point, t: number): string {
  const sx = v.x * t
  const sy = v.y * t
  return Math.abs(sx) >= Math.abs(sy) ? `${sx >= 0 ? '+' : '-'}x` : `${sy >= 0 ? '+' : '-'}y`
}

function describe(trial: Trial, amount: number, after: readonly Lateral[]): string {
  const label = trial.target.label
  const first = after[0]?.record
  switch (trial.action) {
    case 'move': {
      const v = trial.dir ?? { x: 1, y: 0 }
      if (trial.target.members.length > 1 || !first) return `Move ${label} ${fmt(Math.abs(amount))} m towards ${towards(v, amount)}`
      const alongX = Math.abs(v.x * amount) >= Math.abs(v.y * amount)
      const where = alongX ? `to x = ${fmt((first.p1.x + first.p2.x) / 2)} m` : `to y = ${fmt((first.p1.y + first.p2.y) / 2)} m`
      return `Move ${label} ${fmt(Math.abs(amount))} m towards ${towards(v, amount)} (${where})`
    }
    case 'slide':
      return `Slide ${label} ${fmt(Math.abs(amount))} m along its line towards ${towards(trial.dir ?? { x: 1, y: 0 }, amount)}` +
        (first ? ` (now from (${fmt(first.p1.x)}, ${fmt(first.p1.y)}) to (${fmt(first.p2.x)}, ${fmt(first.p2.y)}))` : '')
    case 'lengthen-end':
      return `Lengthen ${label} by ${fmt(amount)} m at its end (${fmt(first?.p2.x ?? 0)}, ${fmt(first?.p2.y ?? 0)})`
    case 'lengthen-start':
      return `Lengthen ${label} by ${fmt(amount)} m at its start (${fmt(first?.p1.x ?? 0)}, ${fmt(first?.p1.y ?? 0)})`
    case 'thickness': {
      const t = first && 'thickness' in first ? first.thickness : 0
      return `${amount >= 1 ? 'Thicken' : 'Thin'} ${label} to ${fmt(t * 1000, 0)} mm (x${fmt(amount)})`
    }
    case 'stiffness':
      return `${amount >= 1 ? 'Stiffen' : 'Soften'} ${label} to x${fmt(amount)} of its story stiffness`
    default: {
      const never: never = trial.action
      return never
    }
  }
}

const isLocked = (el: Lateral): boolean => el.record.locked === true

interface Step {
  readonly trial: Trial
  readonly amount: number
  readonly records: readonly Lateral[]
}

interface State {
  readonly steps: readonly Step[]
  readonly project: Project
  readonly metrics: BalanceMetrics
  readonly j: number
}

/** Relative improvement an added change must bring to be kept (2%). */
const MIN_GAIN = 0.02
/** How many of the best single changes feed the combination search. */
const COMBINATION_SOURCES = 8

const METRIC_WORDS: readonly [keyof BalanceMetrics, string][] = [
  ['eccentricityRms', 'score S (RMS of e/r)'],
  ['worstEccentricityRatio', 'worst e/r'],
  ['worstDriftRatio', 'worst drift ratio'],
  ['periodRatio', 'period ratio T_torsion/T_translation'],
]

/** Words for each measure that gets worse (relative tolerance 1e-6). */
export function worsenedMeasures(before: BalanceMetrics, after: BalanceMetrics): string[] {
  const out: string[] = []
  for (const [key, words] of METRIC_WORDS) {
    const b = before[key]
    const a = after[key]
    if (b === null || a === null || !Number.isFinite(b)) continue
    if (a > b + 1e-6 * Math.max(1, Math.abs(b))) out.push(`${words} worse (${fmt(b, 3)} → ${fmt(a, 3)})`)
  }
  return out
}

/**
 * Search single changes and combinations of up to three changes (greedy beam search over the best
 * single changes) and rank them by the chosen objective, changes that worsen the worst drift ratio
 * last. Constraints: every moved or lengthened element stays on the slab of every floor it spans;
 * wall groups move or thicken as a whole; locked elements never change; walls stay at least
 * `minThickness` thick; moves and added lengths stay within `maxMove`. Pure.
 * @see docs/balance.md
 */
export function suggestBalance(
  project: Project,
  options: BalanceOptions = {},
  onProgress?: (progress: BalanceProgress) => void,
): BalanceResult {
  const count = options.count ?? BALANCE_DEFAULTS.count
  const objective = options.objective ?? 'eccentricity'
  const full = objective !== 'eccentricity'
  const withFull = options.withDriftRatios !== false
  const maxChanges = Math.max(1, Math.min(3, Math.round(options.maxChanges ?? BALANCE_DEFAULTS.maxChanges)))
  const beamWidth = Math.max(1, Math.round(options.beamWidth ?? BALANCE_DEFAULTS.beamWidth))
  const limits: Limits = {
    step: options.lengthStep ?? BALANCE_DEFAULTS.lengthStep,
    maxMove: options.maxMove ?? BALANCE_DEFAULTS.maxMove,
    minThickness: options.minThickness ?? BALANCE_DEFAULTS.minThickness,
    grid: options.snapToGrid === false ? null : (project.grid ?? null),
  }
  const J = (m: BalanceMetrics): number => objectiveValue(m, objective, options.weights)
  let trials = 1
  const base = balanceMetrics(project, full || withFull)
  const J0 = J(base)
  const result = (suggestions: BalanceSuggestion[], message: string | null): BalanceResult => ({
    score: Number.isFinite(base.eccentricityRms) ? base.eccentricityRms : 0,
    worstEccentricityRatio: Number.isFinite(base.worstEccentricityRatio) ? base.worstEccentricityRatio : 0,
    objective,
    metrics: Number.isFinite(base.eccentricityRms) ? base : null,
    suggestions,
    trials,
    message,
    caution: CAUTION,
  })
  if (!Number.isFinite(base.eccentricityRms)) {
    return result([], 'The current model cannot be analysed (mechanism or invalid model): fix that first.')
  }
  if (!Number.isFinite(J0)) return result([], 'The chosen objective cannot be computed for this model (no modes or no static cases).')
  const floorValue = objective === 'drift' ? 1 : 0
  if (objective !== 'mix' && J0 - floorValue < 1e-3) {
    return result([], 'The chosen objective is already at its best value: the centres of rigidity sit on the centres of mass.')
  }

  const evalP = (p: Project): BalanceMetrics => {
    trials++
    return balanceMetrics(p, full)
  }

  // Targets: whole wall groups, then single walls and frame lines; anything locked stays.
  const groups = findWallGroups(project).groups
  const grouped = new Set(groups.flatMap((g) => g.wallIds))
  const name = (r: Wall | FrameLine): string => `'${r.name || r.id}'`
  const targets: Target[] = []
  for (const g of groups) {
    const members = g.wallIds.map((id) => project.walls[id]).filter((w): w is Wall => !!w).map((record): Lateral => ({ kind: 'wall', record }))
    if (members.length === 0 || members.some(isLocked)) continue
    targets.push({ id: g.id, label: `core of walls ${members.map((m) => name(m.record)).join(', ')}`, members })
  }
  for (const record of Object.values(project.walls)) {
    const el: Lateral = { kind: 'wall', record }
    if (!grouped.has(record.id) && !isLocked(el)) targets.push({ id: record.id, label: `wall ${name(record)}`, members: [el] })
  }
  for (const record of Object.values(project.frameLines)) {
    const el: Lateral = { kind: 'frameLine', record }
    if (!isLocked(el)) targets.push({ id: record.id, label: `frame line ${name(record)}`, members: [el] })
  }

  const optimise = (trial: Trial, on: State | null): State | null => {
    const onProject = on?.project ?? project
    const jOn = on?.j ?? J0
    const cost = (p: number): number => {
      const records = trial.apply(p)
      return records ? J(evalP(withRecords(onProject, records))) : Infinity
    }
    let amount: number
    if (trial.snaps.length > 0) {
      let best = { p: trial.p0, value: Infinity }
      for (const p of trial.snaps) {
        const v = cost(p)
        if (v < best.value) best = { p, value: v }
      }
      amount = best.p
    } else {
      const best = minimise(cost, trial.lo, trial.hi, trial.p0)
      amount = Math.min(trial.hi, Math.max(trial.lo, Math.round(best.p / trial.step) * trial.step))
    }
    if (Math.abs(amount - trial.p0) < trial.step / 2) return null
    const records = trial.apply(amount)
    if (!records) return null
    const next = withRecords(onProject, records)
    const metrics = evalP(next)
    const j = J(metrics)
    if (!(j < jOn - MIN_GAIN * Math.abs(jOn))) return null
    return { steps: [...(on?.steps ?? []), { trial, amount, records }], project: next, metrics, j }
  }

  const allTrials = targets.flatMap((t) => trialsFor(project, t, limits))
  const singles: State[] = []
  allTrials.forEach((trial, i) => {
    const s = optimise(trial, null)
    if (s) singles.push(s)
    onProgress?.({ phase: 'single', fraction: (0.6 * (i + 1)) / Math.max(1, allTrials.length), trials })
  })
  singles.sort((a, b) => a.j - b.j)

  const key = (s: State): string =>
    s.steps.map((st) => `${st.trial.target.id}:${st.trial.action}:${fmt(st.amount, 4)}`).sort().join('|')
  const pool: State[] = [...singles]
  const seen = new Set(pool.map(key))
  const sources = singles.slice(0, COMBINATION_SOURCES).map((s) => s.steps[0]!.trial)
  let beam = singles.slice(0, beamWidth)
  for (let depth = 2; depth <= maxChanges && beam.length > 0; depth++) {
    const next: State[] = []
    beam.forEach((state, bi) => {
      const used = new Set(state.steps.map((st) => st.trial.target.id))
      for (const trial of sources) {
        if (used.has(trial.target.id)) continue
        const s = optimise(trial, state)
        if (s && !seen.has(key(s))) {
          seen.add(key(s))
          next.push(s)
        }
      }
      onProgress?.({ phase: 'combinations', fraction: 0.6 + (0.3 * (depth - 2 + (bi + 1) / beam.length)) / Math.max(1, maxChanges - 1), trials })
    })
    next.sort((a, b) => a.j - b.j)
    beam = next.slice(0, beamWidth)
    pool.push(...next)
  }

  // Ranking: the best by the objective, then full measures for the finalists, drift-worsening last.
  pool.sort((a, b) => a.j - b.j)
  const finalists = pool.slice(0, Math.max(count * 4, count))
  const ranked = finalists.map((s) => {
    const after = withFull && !full ? (trials++, balanceMetrics(s.project, true)) : s.metrics
    const worsensDrift =
      after.worstDriftRatio !== null && base.worstDriftRatio !== null && after.worstDriftRatio > base.worstDriftRatio + 1e-6
    return { s, after, worsensDrift }
  })
  onProgress?.({ phase: 'ranking', fraction: 1, trials })
  ranked.sort((a, b) => Number(a.worsensDrift) - Number(b.worsensDrift) || a.s.j - b.s.j || a.s.steps.length - b.s.steps.length)

  const original = (el: Lateral): Wall | FrameLine =>
    (el.kind === 'wall' ? project.walls[el.record.id] : project.frameLines[el.record.id]) ?? el.record
  const suggestions = ranked.slice(0, count).map(({ s, after, worsensDrift }): BalanceSuggestion => {
    const steps: BalanceStep[] = s.steps.map((st) => ({
      targetId: st.trial.target.id,
      action: st.trial.action,
      description: describe(st.trial, st.amount, st.records),
      amount: st.amount,
      unit: st.trial.unit,
      edits: st.records.map((r) => ({ elementKind: r.kind, before: original(r), after: r.record })),
    }))
    const edits = steps.flatMap((st) => st.edits)
    const first = steps[0]!
    const firstEdit = first.edits[0]!
    const beforeM = withFull || full ? base : { ...base, worstDriftRatio: null, periodRatio: null }
    return {
      steps,
      edits,
      description: steps.map((st) => st.description).join(', and '),
      objective,
      objectiveBefore: J0,
      objectiveAfter: s.j,
      before: beforeM,
      after,
      worse: worsenedMeasures(beforeM, after),
      worsensDrift,
      elementId: firstEdit.after.id,
      elementKind: firstEdit.elementKind,
      elementName: firstEdit.after.name,
      action: first.action,
      amount: first.amount,
      unit: first.unit,
      element: firstEdit.after,
      scoreBefore: base.eccentricityRms,
      scoreAfter: after.eccentricityRms,
      worstEccentricityRatioBefore: base.worstEccentricityRatio,
      worstEccentricityRatioAfter: after.worstEccentricityRatio,
      worstDriftRatioBefore: beforeM.worstDriftRatio,
      worstDriftRatioAfter: after.worstDriftRatio,
    }
  })
  return result(
    suggestions,
    suggestions.length === 0 ? 'No change within the limits improves the chosen objective by 2% or more.' : null,
  )
}

/**
 * Whether a suggestion still applies to a document: every element it edits is exactly as it was when
 * the suggestion was found (so after an undo it applies again, after an apply or another edit not).
 * @see docs/balance.md
 */
export function suggestionApplies(project: Project, suggestion: Pick<BalanceSuggestion, 'edits'>): boolean {
  return suggestion.edits.every((e) => {
    const current = e.elementKind === 'wall' ? project.walls[e.before.id] : project.frameLines[e.before.id]
    return current !== undefined && sameValue(current, e.before)
  })
}

/** Deep equality of plain JSON data, independent of key order. */
function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false
  if (Array.isArray(a) !== Array.isArray(b)) return false
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined)
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined)
  if (ka.length !== kb.length) return false
  return ka.every((k) => sameValue((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]))
}
