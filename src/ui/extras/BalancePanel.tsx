/**
 * Balance assistant panel: finds changes of one to three elements or cores (move, slide, lengthen,
 * thicken, stiffen) that improve the objective the user picks, off the main thread, and lets the user
 * apply one as one undoable edit. A suggestion stays applicable while the elements it edits are as
 * they were (so after apply and undo it applies again). Everything comes in by props; the panel
 * touches no store.
 */
import { useEffect, useRef, useState } from 'react'
import { BALANCE_DEFAULTS, suggestBalance, suggestionApplies } from '@/engine'
import type { BalanceMetrics, BalanceObjective, BalanceOptions, BalanceResult, BalanceSuggestion } from '@/engine'
import { formatNumber } from '@/model'
import type { Project } from '@/model'
import { BalanceCancelled, createBalanceRunner, createBalanceWorker } from './balanceRunner'
import type { BalanceRunner } from './balanceRunner'

export interface BalancePanelProps {
  readonly project: Project
  /** Called when the user applies a suggestion: replace every `edits[i].after` record (same ids) as one edit. */
  readonly onApply: (suggestion: BalanceSuggestion) => void
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
  /** Per suggestion: whether it still applies to the current model (default: !isStale for all). */
  readonly canApply?: readonly boolean[]
  /** The search settings shown above the button, and their change handler (omitted: no settings). */
  readonly settings?: BalanceSettings
  readonly onSettings?: (next: BalanceSettings) => void
  readonly inWorker: boolean
  readonly onFind: () => void
  readonly onApply: (suggestion: BalanceSuggestion, index: number) => void
  /** Stop the running search (shown beside the working state when given). */
  readonly onStop?: () => void
  /** The last worker fault, if any (the worker was restarted). */
  readonly fault?: string | null
  /** True when the search passed its grace period without an answer. */
  readonly slow?: boolean
  /** Rough share of the search done, 0..1, when the worker reported it. */
  readonly progress?: number | null
}

/** What the user sets before a search (docs/balance.md). */
export interface BalanceSettings {
  readonly objective: BalanceObjective
  /** Thinnest wall proposed, m. */
  readonly minThickness: number
  /** Largest move or added length, m. */
  readonly maxMove: number
  /** Largest number of changes in one suggestion (1 to 3). */
  readonly maxChanges: number
}

export const DEFAULT_BALANCE_SETTINGS: BalanceSettings = {
  objective: 'eccentricity',
  minThickness: BALANCE_DEFAULTS.minThickness,
  maxMove: BALANCE_DEFAULTS.maxMove,
  maxChanges: BALANCE_DEFAULTS.maxChanges,
}

const OBJECTIVES: readonly { value: BalanceObjective; label: string }[] = [
  { value: 'eccentricity', label: 'centres: RMS of e/r over floors' },
  { value: 'drift', label: 'worst drift ratio max/avg' },
  { value: 'periodRatio', label: 'period ratio torsion/translation' },
  { value: 'mix', label: 'weighted mix of the three' },
]

const MEASURES: readonly { key: keyof BalanceMetrics; label: string }[] = [
  { key: 'eccentricityRms', label: 'score S (RMS e/r)' },
  { key: 'worstEccentricityRatio', label: 'worst e/r' },
  { key: 'worstDriftRatio', label: 'worst drift max/avg' },
  { key: 'periodRatio', label: 'period ratio T_torsion/T_transl.' },
]

const n3 = (v: number | null): string => (v === null || !Number.isFinite(v) ? '–' : formatNumber(v, 3))

function BeforeAfter({ before, after }: { before: number | null; after: number | null }) {
  const known = before !== null && after !== null
  const worse = known && after > before + 1e-6 * Math.max(1, Math.abs(before))
  const better = known && after < before - 1e-6 * Math.max(1, Math.abs(before))
  return (
    <span className="gx-ba">
      {n3(before)} <span aria-hidden="true">→</span>
      <span className="gx-visually-hidden"> to </span>{' '}
      <strong className={worse ? 'gx-worse' : better ? 'gx-better' : ''}>{n3(after)}</strong>
      {worse ? <span className="gx-worse"> worse</span> : better ? ' better' : known ? ' same' : ''}
    </span>
  )
}

function SettingsForm({ settings, onSettings, disabled }: { settings: BalanceSettings; onSettings: (s: BalanceSettings) => void; disabled: boolean }) {
  const num = (label: string, value: number, unit: string, min: number, max: number, step: number, set: (v: number) => BalanceSettings, testId: string) => (
    <label className="gx-field">
      {label}{' '}
      <input
        type="number"
        data-testid={testId}
        value={value}
        min={min}
        max={max}
        step={step}
        disabled={disabled}
        onChange={(e) => {
          const v = Number(e.currentTarget.value)
          if (Number.isFinite(v) && v >= min && v <= max) onSettings(set(v))
        }}
      />{' '}
      {unit}
    </label>
  )
  return (
    <fieldset className="gx-balance-settings" data-testid="balance-settings" disabled={disabled}>
      <legend>Search</legend>
      <label className="gx-field">
        Improve{' '}
        <select
          data-testid="balance-objective"
          value={settings.objective}
          onChange={(e) => onSettings({ ...settings, objective: e.currentTarget.value as BalanceObjective })}
        >
          {OBJECTIVES.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      </label>
      {num('Thinnest wall', Math.round(settings.minThickness * 1000), 'mm', 50, 2000, 10, (v) => ({ ...settings, minThickness: v / 1000 }), 'balance-min-thickness')}
      {num('Largest move', settings.maxMove, 'm', 0.1, 100, 0.5, (v) => ({ ...settings, maxMove: v }), 'balance-max-move')}
      {num('Changes together, up to', settings.maxChanges, '', 1, 3, 1, (v) => ({ ...settings, maxChanges: Math.round(v) }), 'balance-max-changes')}
    </fieldset>
  )
}

/** The panel's markup for a given state (pure; the stateful BalancePanel wraps it). */
export function BalancePanelView(props: BalancePanelViewProps) {
  const { phase, result, error, elapsedS, isStale, inWorker, onFind, onApply, onStop, fault = null, slow = false } = props
  const { canApply, settings, onSettings, progress = null } = props
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
        Tries moves, lengths, thicknesses and stiffnesses of walls, cores and frame lines, alone and up to
        three together, keeping every element on its slab, cores in one piece and locked elements as they
        are. Changes that make the worst drift ratio worse are listed after the others.
      </p>
      {settings && onSettings ? <SettingsForm settings={settings} onSettings={onSettings} disabled={working} /> : null}
      {working ? (
        <p className="gx-working" role="status" data-testid="balance-working">
          {progress === null ? (
            <progress aria-label="Searching for changes" />
          ) : (
            <progress aria-label="Searching for changes" max={1} value={progress} data-testid="balance-progress" />
          )}{' '}
          Trying changes{progress === null ? '' : ` (${Math.round(progress * 100)}%)`}
          {inWorker ? '' : ' (on the main thread)'}… {slow ? `still searching (${elapsedS} s)` : `${elapsedS} s`}
          {onStop && inWorker ? (
            <>
              {' '}
              <button type="button" data-testid="balance-stop" onClick={onStop}>
                Stop
              </button>
            </>
          ) : null}
        </p>
      ) : null}
      {fault ? (
        <p className="gx-error" role="alert" data-testid="balance-fault">
          {fault}
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
            Current score {n3(result.score)}, worst e/r {n3(result.worstEccentricityRatio)}
            {result.metrics ? `, worst drift max/avg ${n3(result.metrics.worstDriftRatio)}, period ratio ${n3(result.metrics.periodRatio)}` : ''}{' '}
            ({result.trials} trial analyses).
          </p>
          {isStale ? (
            <p className="gx-stale" data-testid="balance-stale">
              The model changed since these changes were found: the numbers are from the earlier model. A change
              whose elements are as they were can still be applied; find changes again for fresh numbers.
            </p>
          ) : null}
          {suggestions.length === 0 ? (
            <p className="gx-muted" data-testid="balance-empty">
              {result.message ?? 'No suggestions.'}
            </p>
          ) : (
            <ol className="gx-suggestions" data-testid="balance-suggestions">
              {suggestions.map((s, i) => {
                const applies = canApply ? canApply[i] !== false : !isStale
                return (
                  <li key={`${s.elementId}-${s.action}-${i}`} className="gx-suggestion" data-testid={`balance-suggestion-${i}`}>
                    <p className="gx-desc">
                      <span className="gx-rank">{i + 1}.</span>{' '}
                      {s.steps.length > 1 ? `${s.steps.length} changes together: ` : ''}
                      {s.description}
                    </p>
                    <dl className="gx-metrics">
                      {MEASURES.map((m) => (
                        <div key={m.key}>
                          <dt>{m.label}</dt>
                          <dd>
                            <BeforeAfter before={s.before[m.key]} after={s.after[m.key]} />
                          </dd>
                        </div>
                      ))}
                    </dl>
                    {s.worse.length > 0 ? (
                      <p className="gx-worse" data-testid={`balance-worse-${i}`}>
                        Gets worse: {s.worse.join('; ')}.
                        {s.worsensDrift ? ' Ranked after the changes that do not worsen the drift ratio.' : ''}
                      </p>
                    ) : null}
                    <button
                      type="button"
                      data-testid={`balance-apply-${i}`}
                      onClick={() => onApply(s, i)}
                      disabled={!applies}
                      title={applies ? 'Apply this change as one undoable edit' : 'Already applied, or its elements changed since the search'}
                    >
                      Apply
                    </button>
                    {applies ? null : (
                      <p className="gx-muted" data-testid={`balance-not-applicable-${i}`}>
                        Applied, or its elements changed (undo makes it applicable again).
                      </p>
                    )}
                  </li>
                )
              })}
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
  const [fault, setFault] = useState<string | null>(null)
  const [slow, setSlow] = useState(false)
  const [settings, setSettings] = useState<BalanceSettings>(DEFAULT_BALANCE_SETTINGS)
  const [progress, setProgress] = useState<number | null>(null)

  useEffect(() => {
    const make =
      factoryRef.current ??
      (() =>
        createBalanceRunner({
          createWorker: createBalanceWorker,
          suggest: suggestBalance,
          onFault: (reason, retried) => setFault(retried ? `${reason}. Restarted it and searching again.` : `${reason}. Restarted it.`),
          onSlow: () => setSlow(true),
          onProgress: (p) => setProgress(p.fraction),
        }))
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
    setFault(null)
    setSlow(false)
    setProgress(null)
    setStartedAt(Date.now())
    setElapsedS(0)
    runner.run(snapshot, { ...settings, ...(options ?? {}) }).then(
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
      canApply={result ? result.suggestions.map((s) => suggestionApplies(project, s)) : []}
      settings={settings}
      onSettings={setSettings}
      inWorker={inWorker}
      onFind={find}
      onApply={(s) => {
        if (suggestionApplies(project, s)) onApply(s)
      }}
      onStop={() => {
        runnerRef.current?.stop()
        setSlow(false)
        setPhase(result ? 'done' : 'idle')
      }}
      fault={fault}
      slow={slow}
      progress={progress}
    />
  )
}
