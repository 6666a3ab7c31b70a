/**
 * Balance assistant: which wall or frame line to move, lengthen, thicken or stiffen, and by how much,
 * to bring each floor's centre of rigidity towards its centre of mass.
 *
 * Score (our own choice, documented in docs/balance.md): the root mean square over floors of the
 * normalised eccentricities, S = sqrt( mean_j [ (e_x,j / r_x,j)² + (e_y,j / r_y,j)² ] ), with e = CR - CM
 * and r the torsional radii of MODELING.md. S = 0 for a plan whose centres coincide on every floor; the
 * EN 1998-1 4.2.3.2(6) rule e0 <= 0.30 r reads S_j <= 0.30 per direction. Element moves change K only
 * (elements carry no mass), so each trial re-assembles, re-factors and recomputes the centres; it
 * never touches the user's project.
 */
import { CAUTION } from '@/model'
import type { FrameLine, FrameStiffness, Point, Project, Wall } from '@/model'
import { analyzeProject } from './analyze'
import { buildStructure } from './assemble'
import { computeCentres } from './centres'
import { findWallGroups } from './elements/wallGroup'
import type { FloorCentres } from './results'
import { createStiffnessSolver } from './solve'

/** The kinds of change the assistant tries. */
export type BalanceAction = 'move' | 'lengthen-start' | 'lengthen-end' | 'thickness' | 'stiffness'

/** One suggested change, with the element record to put in place of the current one. */
export interface BalanceSuggestion {
  readonly elementId: string
  readonly elementKind: 'wall' | 'frameLine'
  readonly elementName: string
  readonly action: BalanceAction
  /** Plain-words instruction, e.g. "Move wall 'East gable' 2.40 m towards -x (to x = 27.60 m)". */
  readonly description: string
  /**
   * Size of the change: metres for moves (signed, along the element's left normal (-d_y, d_x)) and
   * lengthening, a factor for thickness and stiffness.
   */
  readonly amount: number
  readonly unit: 'm' | 'factor'
  /** The element after the change (same id): the UI applies it as one command. */
  readonly element: Wall | FrameLine
  readonly scoreBefore: number
  readonly scoreAfter: number
  /** Largest |e|/r over floors and directions, before and after. */
  readonly worstEccentricityRatioBefore: number
  readonly worstEccentricityRatioAfter: number
  /** Worst max/avg story drift ratio of the four static torsion cases (when computed), else null. */
  readonly worstDriftRatioBefore: number | null
  readonly worstDriftRatioAfter: number | null
}

export interface BalanceResult {
  /** Score of the current model (see module header), -. */
  readonly score: number
  readonly worstEccentricityRatio: number
  /** Best suggestions first (each one change on its own, not cumulative). */
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
  /** Also compute the worst drift ratio before/after for the returned suggestions (default true). */
  readonly withDriftRatios?: boolean
  /** Rounding of lengths in suggestions, m (default 0.05). */
  readonly lengthStep?: number
  /**
   * Largest move tried, as a fraction of the plan's extent across the element (default 0.25): a wall
   * is moved within its bay, not across the building.
   */
  readonly maxMoveFraction?: number
}

interface Evaluation {
  readonly score: number
  readonly worst: number
}

const FAILED: Evaluation = { score: Number.POSITIVE_INFINITY, worst: Number.POSITIVE_INFINITY }

/** Score of a set of floor centres (see module header). */
export function balanceScore(centres: readonly FloorCentres[]): Evaluation {
  if (centres.length === 0) return FAILED
  let sum = 0
  let worst = 0
  for (const c of centres) {
    const ex = c.torsionalRadius.x > 0 ? Math.abs(c.eccentricity.x) / c.torsionalRadius.x : 0
    const ey = c.torsionalRadius.y > 0 ? Math.abs(c.eccentricity.y) / c.torsionalRadius.y : 0
    sum += ex * ex + ey * ey
    worst = Math.max(worst, ex, ey)
  }
  const score = Math.sqrt(sum / centres.length)
  return Number.isFinite(score) ? { score, worst } : FAILED
}

function evaluate(project: Project): Evaluation {
  const built = buildStructure(project)
  if (!built.structure) return FAILED
  const solved = createStiffnessSolver(built.structure)
  if (!solved.ok) return FAILED
  return balanceScore(computeCentres(built.structure, solved.solver))
}

function worstDriftRatio(project: Project): number | null {
  const result = analyzeProject(project, { spectrum: false })
  if (!result.torsion) return null
  let worst = 0
  for (const c of result.torsion.cases) {
    for (const s of c.stories) if (Number.isFinite(s.driftRatio)) worst = Math.max(worst, s.driftRatio)
  }
  return worst
}

type Lateral = { kind: 'wall'; record: Wall } | { kind: 'frameLine'; record: FrameLine }

interface Trial {
  readonly action: BalanceAction
  /** Current parameter value and admissible range. */
  readonly p0: number
  readonly lo: number
  readonly hi: number
  readonly step: number
  readonly unit: 'm' | 'factor'
  apply(p: number): Wall | FrameLine | null
}

/** Plan bounding box of all slab outlines (the element must stay on the building). */
function planBox(project: Project): { minX: number; maxX: number; minY: number; maxY: number } | null {
  let minX = Infinity
  let maxX = -Infinity
  let minY = Infinity
  let maxY = -Infinity
  for (const slab of Object.values(project.slabs)) {
    for (const p of slab.outline) {
      minX = Math.min(minX, p.x)
      maxX = Math.max(maxX, p.x)
      minY = Math.min(minY, p.y)
      maxY = Math.max(maxY, p.y)
    }
  }
  return Number.isFinite(minX) ? { minX, maxX, minY, maxY } : null
}

/** Largest t >= 0 with p + t*v inside the box (Infinity if v = 0). */
function reach(p: Point, v: Point, box: { minX: number; maxX: number; minY: number; maxY: number }): number {
  let t = Infinity
  const eps = 1e-12
  if (v.x > eps) t = Math.min(t, (box.maxX - p.x) / v.x)
  if (v.x < -eps) t = Math.min(t, (box.minX - p.x) / v.x)
  if (v.y > eps) t = Math.min(t, (box.maxY - p.y) / v.y)
  if (v.y < -eps) t = Math.min(t, (box.minY - p.y) / v.y)
  return Math.max(0, t)
}

const shift = (p: Point, v: Point, t: number): Point => ({ x: p.x + v.x * t, y: p.y + v.y * t })

function scaleFrame(stiffness: FrameStiffness, f: number): FrameStiffness {
  switch (stiffness.kind) {
    case 'direct': {
      const stories = stiffness.stories
        ? Object.fromEntries(Object.entries(stiffness.stories).map(([k, v]) => [k, v * f]))
        : undefined
      return stories
        ? { ...stiffness, storyStiffness: stiffness.storyStiffness * f, stories }
        : { ...stiffness, storyStiffness: stiffness.storyStiffness * f }
    }
    case 'moment':
      return { ...stiffness, columnI: stiffness.columnI * f, beamI: stiffness.beamI * f }
    case 'braced':
      return { ...stiffness, braceArea: stiffness.braceArea * f }
    default: {
      const never: never = stiffness
      return never
    }
  }
}

function trialsFor(
  el: Lateral,
  box: { minX: number; maxX: number; minY: number; maxY: number },
  step: number,
  maxMoveFraction: number,
): Trial[] {
  const { p1, p2 } = el.record
  const L = Math.hypot(p2.x - p1.x, p2.y - p1.y)
  if (!(L > 0)) return []
  const d = { x: (p2.x - p1.x) / L, y: (p2.y - p1.y) / L }
  const n = { x: -d.y, y: d.x }
  const neg = { x: -n.x, y: -n.y }
  const trials: Trial[] = []
  const across = Math.abs(n.x) * (box.maxX - box.minX) + Math.abs(n.y) * (box.maxY - box.minY)
  const limit = maxMoveFraction * across
  const hiMove = Math.min(reach(p1, n, box), reach(p2, n, box), limit)
  const loMove = -Math.min(reach(p1, neg, box), reach(p2, neg, box), limit)
  if (hiMove - loMove > step) {
    trials.push({
      action: 'move',
      p0: 0,
      lo: loMove,
      hi: hiMove,
      step,
      unit: 'm',
      apply: (t) => ({ ...el.record, p1: shift(p1, n, t), p2: shift(p2, n, t) }),
    })
  }
  if (el.kind === 'wall') {
    const wall = el.record
    const endReach = Math.min(reach(p2, d, box), L)
    if (endReach > step) {
      trials.push({
        action: 'lengthen-end',
        p0: 0,
        lo: 0,
        hi: endReach,
        step,
        unit: 'm',
        apply: (t) => ({ ...wall, p2: shift(p2, d, t) }),
      })
    }
    const back = { x: -d.x, y: -d.y }
    const startReach = Math.min(reach(p1, back, box), L)
    if (startReach > step) {
      trials.push({
        action: 'lengthen-start',
        p0: 0,
        lo: 0,
        hi: startReach,
        step,
        unit: 'm',
        apply: (t) => ({ ...wall, p1: shift(p1, back, t) }),
      })
    }
    // Thickness between 0.5x and 3x, never below 0.1 m (common practice for cast walls, no source).
    const lo = Math.max(0.5, 0.1 / wall.thickness)
    trials.push({
      action: 'thickness',
      p0: 1,
      lo: Math.min(lo, 1),
      hi: 3,
      step: 0.025 / wall.thickness,
      unit: 'factor',
      apply: (f) => {
        const stories = wall.stories
          ? Object.fromEntries(
              Object.entries(wall.stories).map(([k, v]) => [
                k,
                v.thickness === undefined ? v : { ...v, thickness: v.thickness * f },
              ]),
            )
          : undefined
        return stories
          ? { ...wall, thickness: wall.thickness * f, stories }
          : { ...wall, thickness: wall.thickness * f }
      },
    })
  } else {
    const frame = el.record
    trials.push({
      action: 'stiffness',
      p0: 1,
      lo: 0.5,
      hi: 3,
      step: 0.05,
      unit: 'factor',
      apply: (f) => ({ ...frame, stiffness: scaleFrame(frame.stiffness, f) }),
    })
  }
  return trials
}

function withElement(project: Project, el: Lateral, record: Wall | FrameLine): Project {
  return el.kind === 'wall'
    ? { ...project, walls: { ...project.walls, [record.id]: record as Wall } }
    : { ...project, frameLines: { ...project.frameLines, [record.id]: record as FrameLine } }
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

function describe(el: Lateral, trial: Trial, amount: number, after: Wall | FrameLine): string {
  const label = `${el.kind === 'wall' ? 'wall' : 'frame line'} '${el.record.name || el.record.id}'`
  switch (trial.action) {
    case 'move': {
      const dx = after.p1.x - el.record.p1.x
      const dy = after.p1.y - el.record.p1.y
      const along = Math.abs(dx) >= Math.abs(dy) ? `${dx >= 0 ? '+' : '-'}x` : `${dy >= 0 ? '+' : '-'}y`
      const where =
        Math.abs(dx) >= Math.abs(dy)
          ? `to x = ${fmt((after.p1.x + after.p2.x) / 2)} m`
          : `to y = ${fmt((after.p1.y + after.p2.y) / 2)} m`
      return `Move ${label} ${fmt(Math.abs(amount))} m towards ${along} (${where})`
    }
    case 'lengthen-end':
      return `Lengthen ${label} by ${fmt(amount)} m at its end (${fmt(after.p2.x)}, ${fmt(after.p2.y)})`
    case 'lengthen-start':
      return `Lengthen ${label} by ${fmt(amount)} m at its start (${fmt(after.p1.x)}, ${fmt(after.p1.y)})`
    case 'thickness': {
      const t = (after as Wall).thickness
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

/**
 * Try one change at a time on every wall and frame line and rank the changes by how much they bring
 * the centres of rigidity to the centres of mass. Pure: the project passed in is never changed.
 * @see docs/balance.md
 */
export function suggestBalance(project: Project, options: BalanceOptions = {}): BalanceResult {
  const count = options.count ?? 5
  const step = options.lengthStep ?? 0.05
  let trials = 0
  const base = evaluate(project)
  trials++
  const box = planBox(project)
  const result = (suggestions: BalanceSuggestion[], message: string | null): BalanceResult => ({
    score: Number.isFinite(base.score) ? base.score : 0,
    worstEccentricityRatio: Number.isFinite(base.worst) ? base.worst : 0,
    suggestions,
    trials,
    message,
    caution: CAUTION,
  })
  if (!Number.isFinite(base.score)) {
    return result([], 'The current model cannot be analysed (mechanism or invalid model): fix that first.')
  }
  if (!box) return result([], 'The model has no slab outline to keep elements on.')
  if (base.score < 1e-3) return result([], 'The centres of rigidity already sit on the centres of mass.')

  const laterals: Lateral[] = [
    ...Object.values(project.walls).map((record): Lateral => ({ kind: 'wall', record })),
    ...Object.values(project.frameLines).map((record): Lateral => ({ kind: 'frameLine', record })),
  ]
  // A wall of a wall group (a core) is only thickened or thinned: moving or lengthening one leg would
  // tear it off its core (docs/mechanics.md §3a, docs/balance.md).
  const grouped = new Set(findWallGroups(project).groups.flatMap((g) => g.wallIds))
  const found: BalanceSuggestion[] = []
  for (const el of laterals) {
    const inGroup = el.kind === 'wall' && grouped.has(el.record.id)
    for (const trial of trialsFor(el, box, step, options.maxMoveFraction ?? 0.25)) {
      if (inGroup && trial.action !== 'thickness') continue
      const cost = (p: number): number => {
        const record = trial.apply(p)
        if (!record) return Infinity
        trials++
        return evaluate(withElement(project, el, record)).score
      }
      const best = minimise(cost, trial.lo, trial.hi, trial.p0)
      // Round to a buildable increment, then re-evaluate at the rounded value.
      const rounded = Math.min(trial.hi, Math.max(trial.lo, Math.round(best.p / trial.step) * trial.step))
      if (Math.abs(rounded - trial.p0) < trial.step / 2) continue
      const record = trial.apply(rounded)
      if (!record) continue
      const after = evaluate(withElement(project, el, record))
      trials++
      if (!(after.score < base.score * 0.98)) continue
      const amount = rounded
      found.push({
        elementId: el.record.id,
        elementKind: el.kind,
        elementName: el.record.name,
        action: trial.action,
        description: describe(el, trial, amount, record),
        amount,
        unit: trial.unit,
        element: record,
        scoreBefore: base.score,
        scoreAfter: after.score,
        worstEccentricityRatioBefore: base.worst,
        worstEccentricityRatioAfter: after.worst,
        worstDriftRatioBefore: null,
        worstDriftRatioAfter: null,
      })
    }
  }
  found.sort((a, b) => a.scoreAfter - b.scoreAfter)
  let top = found.slice(0, count)
  if (options.withDriftRatios !== false && top.length > 0) {
    const before = worstDriftRatio(project)
    top = top.map((s) => {
      const el: Lateral =
        s.elementKind === 'wall'
          ? { kind: 'wall', record: s.element as Wall }
          : { kind: 'frameLine', record: s.element as FrameLine }
      return {
        ...s,
        worstDriftRatioBefore: before,
        worstDriftRatioAfter: worstDriftRatio(withElement(project, el, s.element)),
      }
    })
  }
  return result(top, top.length === 0 ? 'No single change of one element improves the balance by 2% or more.' : null)
}
