/**
 * Criterion sets: built-in sets citing their sources (asce7.ts, en1998.ts, nbcc.ts), user sets from
 * the project settings (same data shape), and their evaluation. Thresholds are data.
 * Every evaluation carries CAUTION and the set's source text.
 */
import { CAUTION } from '@/model'
import type { AnalysisSettings, CriterionSetSpec } from '@/model'
import type {
  CheckRow,
  CriterionEvaluation,
  FloorCentres,
  Issue,
  StaticCaseId,
  StoryTorsionRow,
  Structure,
  Verdict,
} from '../results'
import { ASCE7_16 } from './asce7'
import { EN1998_1 } from './en1998'
import { NBCC_2015 } from './nbcc'
import type { BuiltInCriterionSet, CriterionClauses, CriterionLabels } from './types'

export type { BuiltInCriterionSet, CriterionClauses, CriterionLabels } from './types'

/** The built-in sets, by id. Built-in ids take precedence over user sets of the same id. */
export const BUILT_IN_CRITERION_SETS: readonly BuiltInCriterionSet[] = [
  ASCE7_16,
  EN1998_1,
  NBCC_2015,
]

/** Ids meaning "no criterion set". */
const NO_SET_IDS = new Set(['', 'none'])

const GENERIC_LABELS: CriterionLabels = {
  regular: 'within limit',
  irregular: 'irregular',
  extreme: 'extremely irregular',
}

function builtInFor(set: CriterionSetSpec): BuiltInCriterionSet | undefined {
  return BUILT_IN_CRITERION_SETS.find((b) => b.spec === set || b.spec.id === set.id)
}

/** Clause texts of a set: the built-in ones, or the set's own source text for a user set. */
export function criterionClauses(set: CriterionSetSpec): Required<CriterionClauses> {
  const b = builtInFor(set)?.clauses ?? {}
  const fallback = `${set.source} (user set)`
  return {
    ratio: b.ratio ?? fallback,
    extreme: b.extreme ?? fallback,
    amplification: b.amplification ?? fallback,
    eccentricity: b.eccentricity ?? fallback,
    radius: b.radius ?? fallback,
    accidental: b.accidental ?? fallback,
  }
}

function criterionLabels(set: CriterionSetSpec): CriterionLabels {
  return builtInFor(set)?.labels ?? GENERIC_LABELS
}

function criterionNotes(set: CriterionSetSpec): readonly string[] {
  return builtInFor(set)?.notes ?? [`User-defined set; thresholds as entered (${set.source}).`]
}

/** Problems with a user set's numbers, each naming the field; empty when the set is usable. */
export function validateCriterionSet(set: CriterionSetSpec, path: string): string[] {
  const errors: string[] = []
  const positive = (name: string, v: unknown): void => {
    if (v === undefined) return
    if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) {
      errors.push(`${path}.${name}: must be a number > 0 (got ${String(v)})`)
    }
  }
  if (typeof set.id !== 'string' || set.id.trim() === '') errors.push(`${path}.id: must be a name`)
  if (typeof set.source !== 'string' || set.source.trim() === '') {
    errors.push(`${path}.source: must state the document and clause the set follows`)
  }
  positive('irregularRatio', set.irregularRatio)
  positive('extremeRatio', set.extremeRatio)
  positive('eccentricityToRadius', set.eccentricityToRadius)
  positive('radiusToGyration', set.radiusToGyration)
  const e = set.accidentalEccentricity
  if (e !== undefined && !(typeof e === 'number' && e >= 0 && e <= 0.5)) {
    errors.push(`${path}.accidentalEccentricity: must be a number in [0, 0.5] (got ${String(e)})`)
  }
  if (
    set.ratioQuantity !== undefined &&
    set.ratioQuantity !== 'drift' &&
    set.ratioQuantity !== 'displacement'
  ) {
    errors.push(`${path}.ratioQuantity: must be 'drift' or 'displacement'`)
  }
  const a = set.amplification
  if (a) {
    positive('amplification.divisor', a.divisor)
    if (!(typeof a.power === 'number' && a.power >= 0)) {
      errors.push(`${path}.amplification.power: must be a number >= 0 (got ${String(a.power)})`)
    }
    positive('amplification.min', a.min)
    positive('amplification.max', a.max)
    if (a.min > a.max) errors.push(`${path}.amplification: min must be <= max`)
  }
  return errors
}

/**
 * The set named by the override or by `settings.criterionSet`: a built-in set, or one of
 * `settings.criterionSets`. '' and 'none' mean no set. An unknown id or an invalid user set gives a
 * warning issue and no set (never an exception).
 */
export function resolveCriterionSet(
  settings: AnalysisSettings,
  override?: string,
): { set: CriterionSetSpec | null; issues: Issue[] } {
  const id = (override ?? settings.criterionSet ?? '').trim()
  if (NO_SET_IDS.has(id)) return { set: null, issues: [] }
  const builtIn = BUILT_IN_CRITERION_SETS.find((b) => b.spec.id === id)
  if (builtIn) return { set: builtIn.spec, issues: [] }
  const userSets = settings.criterionSets ?? []
  const index = userSets.findIndex((s) => s.id === id)
  const user = userSets[index]
  if (!user) {
    const known = [...BUILT_IN_CRITERION_SETS.map((b) => b.spec.id), ...userSets.map((s) => s.id)]
    return {
      set: null,
      issues: [
        {
          code: 'criterion-unknown',
          severity: 'warning',
          message:
            `[engine] criterion set '${id}' is not known (known: ${known.join(', ')}); ` +
            'no pass/fail checks are made',
          refs: [],
        },
      ],
    }
  }
  const errors = validateCriterionSet(user, `settings.criterionSets[${index}]`)
  if (errors.length > 0) {
    return {
      set: null,
      issues: [
        {
          code: 'invalid-model',
          severity: 'warning',
          message: `[engine] criterion set '${id}' is not usable: ${errors.join('; ')}`,
          refs: [],
        },
      ],
    }
  }
  return { set: user, issues: [] }
}

/**
 * ASCE 7-style amplification (delta_max / (divisor delta_avg))^power clamped to [min, max].
 * @see ASCE/SEI 7-16 Eq. 12.8-14 (divisor 1.2, power 2, 1 <= Ax <= 3)
 */
export function amplificationFactor(
  ratio: number,
  rule: NonNullable<CriterionSetSpec['amplification']>,
): number {
  if (!Number.isFinite(ratio)) return rule.max
  const raw = (ratio / rule.divisor) ** rule.power
  return Math.min(rule.max, Math.max(rule.min, raw))
}

/**
 * Overall verdict: fail if a row fails; otherwise not-checked if a row could not be checked (a partial
 * pass is not a pass); pass if one passes; else not-applicable.
 */
export function overallVerdict(rows: readonly CheckRow[]): Verdict {
  if (rows.some((r) => r.verdict === 'fail')) return 'fail'
  if (rows.some((r) => r.verdict === 'not-checked')) return 'not-checked'
  if (rows.some((r) => r.verdict === 'pass')) return 'pass'
  return 'not-applicable'
}

/** An evaluation of `set` (or of no set) from rows; always carries CAUTION and the source text. */
export function buildEvaluation(
  set: CriterionSetSpec | null,
  rows: readonly CheckRow[],
): CriterionEvaluation {
  if (!set) {
    return {
      setId: 'none',
      setName: 'No criterion set',
      source: 'none selected: ratios are reported without pass/fail',
      rows: [],
      overall: 'not-applicable',
      caution: CAUTION,
      notes: [],
    }
  }
  return {
    setId: set.id,
    setName: set.name,
    source: set.source,
    rows,
    overall: overallVerdict(rows),
    caution: CAUTION,
    notes: criterionNotes(set),
  }
}

/** One story of one static case as the criterion rules see it. */
export interface TorsionCheckInput {
  readonly caseId: StaticCaseId
  readonly row: StoryTorsionRow
  /** Why this story cannot be checked in this case (e.g. no plan extent across the load); absent: it can. */
  readonly notCheckable?: string
}


/**
 * Check rows of the ratio and amplification rules for every story and static case:
 * ratio > irregularRatio fails (irregular), ratio > extremeRatio fails (extreme); the ratio is
 * taken on story drifts or floor displacements per `ratioQuantity`. Amplification rows are
 * informative.
 */
export function torsionCheckRows(
  set: CriterionSetSpec,
  inputs: readonly TorsionCheckInput[],
): CheckRow[] {
  const clauses = criterionClauses(set)
  const labels = criterionLabels(set)
  const onDisplacement = set.ratioQuantity === 'displacement'
  const quantity = onDisplacement
    ? 'max/avg floor displacement at extreme points'
    : 'max/avg story drift at extreme points'
  const rows: CheckRow[] = []
  for (const { caseId, row, notCheckable } of inputs) {
    const ratio = onDisplacement ? row.displacementRatio : row.driftRatio
    const classify = (): string => {
      if (missing) return `not checked: ${missing}`
      if (set.extremeRatio !== undefined && ratio > set.extremeRatio) return labels.extreme
      if (set.irregularRatio !== undefined && ratio > set.irregularRatio) return labels.irregular
      return labels.regular
    }
    // A story without extreme points (no slab outline) or without any movement has no ratio.
    const empty = onDisplacement
      ? row.displacementMax === 0 && row.displacementAvg === 0
      : row.driftMax === 0 && row.driftAvg === 0
    // A missing number is 'not-checked', never a pass.
    const missing =
      notCheckable ??
      (empty ? 'no movement at the extreme points' : !Number.isFinite(ratio) ? 'the ratio is not a number' : null)
    const verdictFor = (limit: number): Verdict => (missing ? 'not-checked' : ratio <= limit ? 'pass' : 'fail')
    if (set.irregularRatio !== undefined) {
      rows.push({
        floorId: row.floorId,
        caseId,
        quantity,
        value: ratio,
        limit: set.irregularRatio,
        verdict: verdictFor(set.irregularRatio),
        clause: clauses.ratio,
        label: classify(),
        comparison: '<=',
      })
    }
    if (set.extremeRatio !== undefined) {
      rows.push({
        floorId: row.floorId,
        caseId,
        quantity: `${quantity} (extreme)`,
        value: ratio,
        limit: set.extremeRatio,
        verdict: verdictFor(set.extremeRatio),
        clause: clauses.extreme,
        label: missing ? `not checked: ${missing}` : ratio > set.extremeRatio ? labels.extreme : `not ${labels.extreme}`,
        comparison: '<=',
      })
    }
    if (set.amplification && row.amplification !== null) {
      rows.push({
        floorId: row.floorId,
        caseId,
        quantity: 'torsional amplification Ax (floor displacements)',
        value: row.amplification,
        limit: set.amplification.max,
        verdict: 'not-applicable',
        clause: clauses.amplification,
        label:
          row.amplification > set.amplification.min
            ? `amplify accidental torque by ${row.amplification.toFixed(3)}`
            : 'no amplification',
      })
    }
  }
  return rows
}

/**
 * Plan-regularity rules of a set per floor and direction, or null when the set has none:
 * e0x <= eccentricityToRadius * r_x (e0x = |x_CR - x_CM|, measured along x, r_x = sqrt(K_T/K_y))
 * and r_x >= radiusToGyration * l_s; the same along y with r_y. Row caseId names the subscript
 * direction ('x': e0x and r_x, i.e. the analysis direction y).
 * @see EN 1998-1:2004 4.2.3.2(6), Eqs 4.1a and 4.1b (METHODS.md §2)
 */
export function evaluateRegularity(
  structure: Structure,
  centres: readonly FloorCentres[],
  set: CriterionSetSpec,
): CriterionEvaluation | null {
  if (set.eccentricityToRadius === undefined && set.radiusToGyration === undefined) return null
  const clauses = criterionClauses(set)
  const labels = criterionLabels(set)
  const rows: CheckRow[] = []
  centres.forEach((c, i) => {
    const floorId = c.floorId || structure.floors[i]?.id || String(i)
    for (const dir of ['x', 'y'] as const) {
      const e0 = Math.abs(c.eccentricity[dir])
      const r = c.torsionalRadius[dir]
      const ls = c.radiusOfGyration
      const usable = Number.isFinite(e0) && Number.isFinite(r) && r > 0
      const other = dir === 'x' ? 'y' : 'x'
      if (set.eccentricityToRadius !== undefined) {
        const limit = set.eccentricityToRadius * r
        const verdict: Verdict = usable ? (e0 <= limit ? 'pass' : 'fail') : 'not-checked'
        rows.push({
          floorId,
          caseId: dir,
          quantity:
            `eccentricity e0${dir} (along ${dir}, action along ${other}) ` +
            `vs ${set.eccentricityToRadius} r_${dir}`,
          value: e0,
          limit: usable ? limit : 0,
          verdict,
          clause: clauses.eccentricity,
          label:
            verdict === 'fail'
              ? labels.irregular
              : verdict === 'pass'
                ? labels.regular
                : 'not evaluated (torsional radius undefined)',
          comparison: '<=',
        })
      }
      if (set.radiusToGyration !== undefined) {
        const limit = set.radiusToGyration * ls
        const ok = usable && Number.isFinite(ls) && ls > 0
        const verdict: Verdict = ok ? (r >= limit ? 'pass' : 'fail') : 'not-checked'
        rows.push({
          floorId,
          caseId: dir,
          quantity: `torsional radius r_${dir} vs ${set.radiusToGyration} l_s`,
          value: r,
          limit,
          verdict,
          clause: clauses.radius,
          label:
            verdict === 'fail'
              ? 'torsionally flexible'
              : verdict === 'pass'
                ? 'torsionally stiff'
                : 'not evaluated (torsional radius undefined)',
          comparison: '>=',
        })
      }
    }
  })
  const evaluation = buildEvaluation(set, rows)
  const scope = builtInFor(set)?.regularityScope
  return scope ? { ...evaluation, scope } : evaluation
}

/**
 * One line saying which conditions an evaluation checked and which it did not, or null when its rows
 * are the whole rule. Shown beside every overall verdict of such a set (report, CLI, results panel),
 * so that a pass is read as a pass of the checked conditions only.
 */
export function scopeLine(evaluation: Pick<CriterionEvaluation, 'scope'>): string | null {
  const s = evaluation.scope
  if (!s || s.notChecked.length === 0) return null
  return `Checked: ${s.checked.join('; ')}. Not checked (the engineer's to confirm): ${s.notChecked.join('; ')}.`
}
