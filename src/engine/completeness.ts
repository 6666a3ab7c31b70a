/**
 * Completeness of an analysis: which requested numbers could not be computed, in words, so that a
 * result is never 'ok' (or a verdict PASS) on missing numbers.
 * @see docs/results-format.md (status values)
 */
import type { CriterionEvaluation, Issue, SpectrumResult, StaticTorsionResult, Structure } from './results'

/** The 'incomplete' error issue for one missing part. */
export function incompleteIssue(why: string): Issue {
  return { code: 'incomplete', severity: 'error', message: `[engine] results incomplete: ${why}`, refs: [] }
}

/**
 * Why no mode was found, naming the floors whose rotation carries no mass (the usual cause: all of
 * the floor's mass is point masses without `polarInertia`).
 */
export function noModesReason(structure: Structure, modalIssues: readonly Issue[]): string {
  const noRotary = structure.floors.filter((f) => !(f.polarInertia > 0))
  const tail =
    'so there are no periods, no torsion check, no base shears and no spectrum or time history'
  if (noRotary.length > 0) {
    const shown = noRotary.slice(0, 4).map((f) => `'${f.name}' (${f.id})`)
    const more = noRotary.length > 4 ? ` and ${noRotary.length - 4} more` : ''
    const one = noRotary.length === 1
    return (
      `no modes could be computed: floor${one ? '' : 's'} ${shown.join(', ')}${more} ` +
      `${one ? 'has' : 'have'} no rotational inertia (all mass in points without polarInertia): ` +
      `give the point mass a polar inertia or add a slab; ${tail}`
    )
  }
  const first = modalIssues[0]?.message
  return `no modes could be computed${first ? ` (${first})` : ''}; ${tail}`
}

const positiveFinite = (v: number): boolean => Number.isFinite(v) && v > 0

/**
 * Parts of a computed analysis that hold missing numbers: a criterion evaluation that could not
 * check every row, or base shears that are not positive and finite in both directions.
 */
export function missingResults(
  torsion: StaticTorsionResult | null,
  regularity: CriterionEvaluation | null,
  spectrum: SpectrumResult | null,
): string[] {
  const out: string[] = []
  const notChecked = (e: CriterionEvaluation, what: string): void => {
    const rows = e.rows.filter((r) => r.verdict === 'not-checked')
    if (rows.length === 0) return
    const floors = [...new Set(rows.map((r) => r.floorId))]
    const shown = floors.slice(0, 4).join(', ') + (floors.length > 4 ? ` and ${floors.length - 4} more` : '')
    const reason = rows[0]!.label.replace(/^not checked: /, '')
    out.push(
      `${what}: ${rows.length} check${rows.length === 1 ? '' : 's'} on floor${floors.length === 1 ? '' : 's'} ` +
        `${shown} could not be made (${reason}); the overall verdict is 'not checked', not a pass`,
    )
  }
  if (torsion) {
    notChecked(torsion.criterion, 'torsion check')
    const V = torsion.baseShear
    if (!positiveFinite(V.x) || !positiveFinite(V.y)) {
      out.push('the equivalent static base shear is not positive in both directions')
    }
  }
  if (regularity) notChecked(regularity, 'plan regularity')
  if (spectrum) {
    const bad = (['x', 'y'] as const).filter((d) => !positiveFinite(spectrum.baseShear[d].cqc))
    if (bad.length > 0) {
      out.push(
        `the response spectrum gives no base shear for excitation along ${bad.join(' and ')} ` +
          '(no mode moves the building in that direction)',
      )
    }
  }
  return out
}
