import type { AnalysisSettings } from '@/model'
import type { ModalResult, Structure, TimeHistoryResult } from './results'

/** Time history by Newmark average acceleration on the modal coordinates with modal damping. */
export function runTimeHistory(
  _structure: Structure,
  _modes: ModalResult,
  _settings: AnalysisSettings,
): TimeHistoryResult {
  throw new Error('[engine] runTimeHistory: not implemented yet')
}
