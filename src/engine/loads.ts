import type { AnalysisSettings, CriterionSetSpec } from '@/model'
import type { ModalResult, StaticTorsionResult, Structure } from './results'
import type { StiffnessSolver } from './solve'

/** The four equivalent static cases with accidental torsion, drift ratios and criterion checks. */
export function runStaticTorsion(
  _structure: Structure,
  _solver: StiffnessSolver,
  _modes: ModalResult,
  _settings: AnalysisSettings,
  _set: CriterionSetSpec | null,
): StaticTorsionResult {
  throw new Error('[engine] runStaticTorsion: not implemented yet')
}
