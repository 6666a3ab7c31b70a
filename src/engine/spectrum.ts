import type { AnalysisSettings } from '@/model'
import type { ModalResult, SpectrumResult, Structure } from './results'

/** Response spectrum analysis, CQC and SRSS over modes, directions by the chosen rule. */
export function runSpectrum(
  _structure: Structure,
  _modes: ModalResult,
  _settings: AnalysisSettings,
): SpectrumResult {
  throw new Error('[engine] runSpectrum: not implemented yet')
}
