/**
 * A small read-mostly handle on `window.__gyre` for browser tests and the drag benchmark: the editor
 * store and the analysis client. It changes nothing by itself.
 */
import type { EditorStore } from '@/editor'
import type { AnalysisClient } from './analysisClient'

export interface DebugHandle {
  readonly store: EditorStore
  readonly analysis: AnalysisClient
}

export function exposeDebugHandle(store: EditorStore, analysis: AnalysisClient): void {
  if (typeof window === 'undefined') return
  ;(window as unknown as { __gyre?: DebugHandle }).__gyre = { store, analysis }
}
