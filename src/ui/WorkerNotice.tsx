/**
 * A notice strip for the analysis worker: how long the running analysis has taken with a Stop button,
 * "still analysing" once it is past its grace period, a stopped analysis (results not current), and a
 * worker that died and was restarted. Renders nothing while analyses come back quickly.
 */
import { useEffect, useState } from 'react'
import type { AnalysisClient } from './analysisClient'
import { useAnalysis } from './hooks/useAnalysis'
import './workerNotice.css'

/** Show the Stop button once an analysis has run this long, ms (shorter runs would only flicker). */
export const STOP_OFFER_MS = 1000

const clock = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

export interface WorkerNoticeProps {
  readonly client: AnalysisClient
  /** Clock of the client's timers (ms); the browser's performance clock by default. */
  readonly now?: () => number
}

export function WorkerNotice({ client, now = clock }: WorkerNoticeProps) {
  const state = useAnalysis(client)
  const [tick, setTick] = useState(0)
  const busy = state.busySince !== null
  useEffect(() => {
    if (!busy) return
    const timer = setInterval(() => setTick((n) => n + 1), 500)
    return () => clearInterval(timer)
  }, [busy])
  void tick
  const elapsedMs = state.busySince === null ? 0 : now() - state.busySince
  const seconds = Math.floor(elapsedMs / 1000)
  const showBusy = busy && (state.slow || elapsedMs >= STOP_OFFER_MS)
  const stopped = state.stoppedRevision !== null && state.isStale
  if (!showBusy && !stopped && !state.fault) return null
  return (
    <div className="worker-notice" data-testid="worker-notice">
      {showBusy ? (
        <p className={state.slow ? 'wn-slow' : 'wn-busy'} role="status" data-testid="worker-busy" data-slow={state.slow}>
          {state.slow
            ? `Still analysing (${seconds} s). A large model can take this long; if it seems stuck, stop it.`
            : `Analysing… ${seconds} s`}{' '}
          <button type="button" data-testid="analysis-stop" onClick={() => client.stop()}>
            Stop
          </button>
        </p>
      ) : null}
      {stopped ? (
        <p className="wn-stopped" role="status" data-testid="worker-stopped">
          Analysis stopped: the results shown
          {state.resultRevision !== null ? ` are from an earlier version of the model (rev ${state.resultRevision}) and` : ''} are
          not current. Any change analyses again.{' '}
          <button type="button" data-testid="analysis-retry" onClick={() => client.retryStopped()}>
            Analyse again
          </button>
        </p>
      ) : null}
      {state.fault ? (
        <p className="wn-fault" role="alert" data-testid="worker-fault">
          {state.fault.reason}.{' '}
          {state.fault.retried
            ? `A fresh worker was started and the latest change is analysed again${state.isStale ? '…' : ' (results are current again).'}`
            : 'A fresh worker was started.'}{' '}
          <button type="button" data-testid="worker-fault-close" onClick={() => client.dismissFault()}>
            Close
          </button>
        </p>
      ) : null}
    </div>
  )
}
