/** Criterion sets: built-in sets citing their sources, user sets from settings, and their evaluation. */
import type { AnalysisSettings, CriterionSetSpec } from '@/model'
import type { CriterionEvaluation, FloorCentres, Issue, Structure } from '../results'

/** The set named by the settings (or the override), from the built-ins or the project's own sets. */
export function resolveCriterionSet(
  _settings: AnalysisSettings,
  _override?: string,
): { set: CriterionSetSpec | null; issues: Issue[] } {
  throw new Error('[engine] resolveCriterionSet: not implemented yet')
}

/** Plan-regularity rules (eccentricity vs torsional radius, radius vs l_s) of a set, or null if it has none. */
export function evaluateRegularity(
  _structure: Structure,
  _centres: readonly FloorCentres[],
  _set: CriterionSetSpec,
): CriterionEvaluation | null {
  throw new Error('[engine] evaluateRegularity: not implemented yet')
}
