import { CAUTION, CAUTION_SHORT } from '@/model'
import type { AnalysisState } from './analysisClient'

interface Props {
  readonly analysis: AnalysisState
  readonly message: string | null
  readonly autosavedAt: string | null
  /** Short autosave problem ("FAILED"); shown instead of any earlier save time. */
  readonly autosaveProblem?: string | null
  readonly floorLabel: string
  readonly toolLabel: string
  readonly selectionCount: number
}

/**
 * One line at the bottom: tool, floor, selection, analysis state, autosave, and the screen's one
 * caution (short text, full text on hover). Panels do not repeat it; exports carry their own.
 */
export function StatusLine({ analysis, message, autosavedAt, autosaveProblem = null, floorLabel, toolLabel, selectionCount }: Props) {
  const state = analysis.error
    ? 'failed'
    : analysis.isStale && analysis.stoppedRevision !== null
      ? 'stopped'
      : analysis.isStale
      ? 'stale'
      : analysis.result
        ? 'current'
        : 'waiting'
  const text =
    state === 'failed'
      ? `Analysis failed: ${analysis.error ?? ''}`
      : state === 'stopped'
        ? 'Analysis stopped: results not current'
        : state === 'stale'
        ? 'Analysis updating…'
        : state === 'current'
          ? `Analysis current (rev ${analysis.resultRevision ?? '-'}, ${analysis.lastWorkerMs?.toFixed(0) ?? '-'} ms${analysis.inWorker ? '' : ', main thread'})` +
            (analysis.result && analysis.result.status !== 'ok' ? ` — ${analysis.result.status}, see Problems` : '')
          : 'Analysis waiting'
  return (
    <footer className="status" data-testid="status-line">
      <span data-testid="status-tool">{toolLabel}</span>
      <span>{floorLabel}</span>
      <span>{selectionCount ? `${selectionCount} selected` : 'nothing selected'}</span>
      <span className={state} data-testid="analysis-state" data-state={state}>
        {text}
      </span>
      <span data-testid="autosave-state" data-state={autosaveProblem ? 'problem' : autosavedAt ? 'saved' : 'none'} className={autosaveProblem ? 'failed' : undefined}>
        {autosaveProblem ? `autosave ${autosaveProblem}` : autosavedAt ? `autosaved ${autosavedAt.slice(11, 19)}` : 'not yet autosaved'}
      </span>
      {message ? <span data-testid="status-message">{message}</span> : null}
      <span className="caution" role="note" title={CAUTION} data-testid="screen-caution">
        {CAUTION_SHORT}
      </span>
    </footer>
  )
}
