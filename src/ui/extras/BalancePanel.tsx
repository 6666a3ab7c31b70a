/**
 * Balance assistant panel: finds single-element changes (move, lengthen, thicken, stiffen) that
 * bring the centres of rigidity towards the centres of mass, off the main thread, and lets the user
 * apply one. Everything comes in by props; the panel touches no store.
 */
import { useEffect, useRef, useState } from 'react'
import { suggestBalance } from '@/engine'
import type { BalanceOptions, BalanceResult, BalanceSuggestion } from '@/engine'
import { formatNumber } from '@/model'
import type { FrameLine, Project, Wall } from '@/model'
import { BalanceCancelled, createBalanceRunner, createBalanceWorker } from './balanceRunner'
import type { BalanceRunner } from './balanceRunner'

export interface BalancePanelProps {
  readonly project: Project
  /** Called with the changed element record (same id) when the user applies a suggestion. */
  readonly onApply: (element: Wall | FrameLine) => void
  /** Options of suggestBalance (default: 5 suggestions with drift ratios). */
  readonly options?: BalanceOptions
  /** Runner factory (tests, or a host that shares a worker); default: a dedicated module worker. */
  readonly createRunner?: () => BalanceRunner
}

export type BalancePhase = 'idle' | 'working' | 'done' | 'error'

export interface BalancePanelViewProps {
  readonly phase: BalancePhase
  readonly result: BalanceResult | null
  readonly error: string | null
  /** Seconds since the search started (while working). */
  readonly elapsedS: number
  /** True when the project changed since the shown suggestions were found. */
  readonly isStale: boolean
  readonly inWorker: boolean
  readonly onFind: () => void
  readonly onApply: (suggestion: BalanceSuggestion, index: number) => void
}

const n3 = (v: number | null): string => (v === null ? '–' : formatNumber(v, 3))

function BeforeAfter({ before, after }: { before: number | null; after: number | null }) {
  const better = before !== null && after !== null && after < before
  return (
    <span className="gx-ba">
      {n3(before)} <span aria-hidden="true">→</span>
      <span className="gx-visually-hidden"> to </span>{' '}
      <strong className={better ? 'gx-better' : 'gx-worse'}>{n3(after)}</strong>
    </span>
  )
}

/** The panel's markup for a given state (pure; the stateful BalancePanel wraps it). */
export function BalancePanelView(props: BalancePanelViewProps) {
  const { phase, result, error, elapsedS, isStale, inWorker, onFind, onApply } = props
  const working = phase === 'working'
  const suggestions = result?.suggestions ?? []
  return (
    <section className="gx-panel gx-balance" aria-label="Balance assistant" data-testid="balance-panel">
      <header className="gx-head">
        <h3>Balance assistant</h3>
        <button type="button" data-testid="balance-find" onClick={onFind} disabled={working}>
          {working ? 'Searching…' : result ? 'Find changes again' : 'Find changes'}
        </button>
      </header>
      <p className="gx-muted">
        Tries one change at a time on every wall and frame line and ranks the changes by the score S (root
        mean square of e/r over floors; 0 when every centre of rigidity sits on its centre of mass).
      </p>
      {working ? (
        <p className="gx-working" role="status" data-testid="balance-working">
          <progress aria-label="Searching for changes" /> Trying changes
          {inWorker ? '' : ' (on the main thread)'}… {elapsedS} s
        </p>
      ) : null}
      {phase === 'error' && error ? (
        <p className="gx-error" role="alert" data-testid="balance-error">
          {error}
        </p>
      ) : null}
      {result && !working ? (
        <>
          <p className="gx-summary" data-testid="balance-summary">
            Current score {n3(result.score)}, worst e/r {n3(result.worstEccentricityRatio)} ({result.trials} trial
            analyses).
          </p>
          {isStale ? (
            <p className="gx-stale" data-testid="balance-stale">
              The model changed since these changes were found: find changes again before applying one.
            </p>
          ) : null}
          {suggestions.length === 0 ? (
            <p className="gx-muted" data-testid="balance-empty">
              {result.message ?? 'No suggestions.'}
            </p>
          ) : (
            <ol className="gx-suggestions" data-testid="balance-suggestions">
              {suggestions.map((s, i) => (
                <li key={`${s.elementId}-${s.action}-${i}`} className="gx-suggestion">
                  <p className="gx-desc">
                    <span className="gx-rank">{i + 1}.</span> {s.description}
                  </p>
                  <dl className="gx-metrics">
                    <dt>score S</dt>
                    <dd>
                      <BeforeAfter before={s.scoreBefore} after={s.scoreAfter} />
                    </dd>
                    <dt>worst e/r</dt>
                    <dd>
                      <BeforeAfter before={s.worstEccentricityRatioBefore} after={s.worstEccentricityRatioAfter} />
                    </dd>
                    <dt>worst drift max/avg</dt>
                    <dd>
                      <BeforeAfter before={s.worstDriftRatioBefore} after={s.worstDriftRatioAfter} />
                    </dd>
                  </dl>
                  <button
                    type="button"
                    data-testid={`balance-apply-${i}`}
                    onClick={() => onApply(s, i)}
                    disabled={isStale}
                    title={isStale ? 'The model changed; find changes again first' : 'Apply this change as one undoable edit'}
                  >
                    Apply
                  </button>
                </li>
              ))}
            </ol>
          )}
        </>
      ) : null}
    </section>
  )
}

/** The stateful panel: owns the runner, the search state and the elapsed-time ticker. */
export function BalancePanel({ project, onApply, options, createRunner }: BalancePanelProps) {
  const runnerRef = useRef<BalanceRunner | null>(null)
  const factoryRef = useRef(createRunner)
  const [phase, setPhase] = useState<BalancePhase>('idle')
  const [result, setResult] = useState<BalanceResult | null>(null)
  const [error, setError] = useState<string | null>(null)
  const [ranFor, setRanFor] = useState<Project | null>(null)
  const [startedAt, setStartedAt] = useState(0)
  const [elapsedS, setElapsedS] = useState(0)
  const [inWorker, setInWorker] = useState(true)

  useEffect(() => {
    const make =
      factoryRef.current ??
      (() => createBalanceRunner({ createWorker: createBalanceWorker, suggest: suggestBalance }))
    const runner = make()
    runnerRef.current = runner
    setInWorker(runner.inWorker)
    return () => {
      runner.dispose()
      if (runnerRef.current === runner) runnerRef.current = null
    }
  }, [])

  useEffect(() => {
    if (phase !== 'working') return
    const timer = setInterval(() => setElapsedS(Math.round((Date.now() - startedAt) / 1000)), 1000)
    return () => clearInterval(timer)
  }, [phase, startedAt])

  const find = (): void => {
    const runner = runnerRef.current
    if (!runner) return
    const snapshot = project
    setPhase('working')
    setError(null)
    setStartedAt(Date.now())
    setElapsedS(0)
    runner.run(snapshot, options ?? {}).then(
      (r) => {
        setResult(r)
        setRanFor(snapshot)
        setPhase('done')
      },
      (e: unknown) => {
        if (e instanceof BalanceCancelled) return
        setError(e instanceof Error ? e.message : String(e))
        setPhase('error')
      },
    )
  }

  return (
    <BalancePanelView
      phase={phase}
      result={result}
      error={error}
      elapsedS={elapsedS}
      isStale={result !== null && ranFor !== project}
      inWorker={inWorker}
      onFind={find}
      onApply={(s) => onApply(s.element)}
    />
  )
}
