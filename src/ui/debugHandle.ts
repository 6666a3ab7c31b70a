/**
 * A small handle on `window.__gyre` for browser tests and the drag benchmark: the editor store, the
 * analysis client and the autosave service. It changes nothing by itself. Test hooks reached through
 * it: `analysis.debug.crash()` / `analysis.debug.freeze()` (workerDebug.ts) and
 * `autosave.debug.failWrites('none' | 'database' | 'all')` (autosave.ts).
 */
import type { EditorStore } from '@/editor'
import type { AnalysisClient } from './analysisClient'
import type { AutosaveService } from './autosave'

export interface DebugHandle {
  readonly store: EditorStore
  readonly analysis: AnalysisClient
  readonly autosave: AutosaveService | null
}

export function exposeDebugHandle(store: EditorStore, analysis: AnalysisClient, autosave: AutosaveService | null = null): void {
  if (typeof window === 'undefined') return
  ;(window as unknown as { __gyre?: DebugHandle }).__gyre = { store, analysis, autosave }
}
