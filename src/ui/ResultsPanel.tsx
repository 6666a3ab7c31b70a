import type { Floor, UnitSystem } from '@/model'
import type { AnalysisResult } from '@/engine'
import { characterWords } from '@/viewer'
import { formatNumber, formatQuantity } from './quantities'

interface Props {
  readonly floors: readonly Floor[]
  readonly result: AnalysisResult | null
  readonly isStale: boolean
  readonly units: UnitSystem
}


const pct = (v: number | undefined): string => (v === undefined || !Number.isFinite(v) ? '—' : `${(v * 100).toFixed(1)}%`)

/** Modes table and torsion check table of the latest analysis, with the full caution. */
export function ResultsPanel({ floors, result, isStale, units }: Props) {
  const floorName = (id: string): string => floors.find((f) => f.id === id)?.name ?? id
  const modes = result?.modes ?? null
  const modeCount = modes ? Math.min(modes.count, 12) : 0
  const criterion = result?.torsion?.criterion ?? null
  const regularity = result?.regularity ?? null
  return (
    <section className="results" aria-label="Results summary" data-testid="results-panel">
      {isStale && result ? (
        <p className="stale-note" data-testid="results-stale">
          Updating — these numbers belong to an earlier state of the model.
        </p>
      ) : null}
      {!result ? <p className="muted">No results yet.</p> : null}
      {result ? (
        <p className="muted">
          Total mass {formatQuantity(result.totalMass, 'mass', units)} · status {result.status}
        </p>
      ) : null}
      {modes && modeCount > 0 ? (
        <table className="data" data-testid="modes-table">
          <caption>Modes (lowest {modeCount} of {modes.count})</caption>
          <thead>
            <tr>
              <th>#</th>
              <th>Period (s)</th>
              <th>Mx</th>
              <th>My</th>
              <th>Mθ</th>
              <th>ΣMx</th>
              <th>ΣMy</th>
              <th>Class</th>
            </tr>
          </thead>
          <tbody>
            {Array.from({ length: modeCount }, (_, i) => (
              <tr key={i}>
                <td>{i + 1}</td>
                <td>{formatNumber(modes.periods[i] ?? NaN, 'period', units)}</td>
                <td>{pct(modes.effectiveMassRatio.x[i])}</td>
                <td>{pct(modes.effectiveMassRatio.y[i])}</td>
                <td>{pct(modes.effectiveMassRatio.rz[i])}</td>
                <td>{pct(modes.cumulativeMassRatio.x[i])}</td>
                <td>{pct(modes.cumulativeMassRatio.y[i])}</td>
                <td>{characterWords(modes.character[i] ?? 'coupled')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {criterion ? (
        <table className="data" data-testid="torsion-table">
          <caption>
            Torsion checks: {criterion.setName} — overall{' '}
            <span className={`verdict verdict-${criterion.overall}`}>{criterion.overall}</span>
            <br />
            <small>Source: {criterion.source}</small>
          </caption>
          <thead>
            <tr>
              <th>Floor</th>
              <th>Case</th>
              <th>Quantity</th>
              <th>Value</th>
              <th>Limit</th>
              <th>Verdict</th>
              <th>Clause</th>
            </tr>
          </thead>
          <tbody>
            {criterion.rows.map((row, i) => (
              <tr key={i}>
                <td>{floorName(row.floorId)}</td>
                <td>{row.caseId}</td>
                <td>{row.quantity}</td>
                <td>{Number.isFinite(row.value) ? row.value.toFixed(3) : '—'}</td>
                <td>{Number.isFinite(row.limit) ? row.limit.toFixed(2) : '—'}</td>
                <td className={`verdict verdict-${row.verdict}`}>
                  {row.verdict}
                  {row.label ? ` (${row.label})` : ''}
                </td>
                <td>{row.clause}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {regularity && regularity.rows.length > 0 ? (
        <table className="data" data-testid="regularity-table">
          <caption>
            Plan regularity: {regularity.setName}
            <br />
            <small>Source: {regularity.source}</small>
          </caption>
          <thead>
            <tr>
              <th>Floor</th>
              <th>Dir.</th>
              <th>Quantity</th>
              <th>Value</th>
              <th>Limit</th>
              <th>Verdict</th>
              <th>Clause</th>
            </tr>
          </thead>
          <tbody>
            {regularity.rows.map((row, i) => (
              <tr key={i}>
                <td>{floorName(row.floorId)}</td>
                <td>{row.caseId}</td>
                <td>{row.quantity}</td>
                <td>{Number.isFinite(row.value) ? row.value.toFixed(3) : '—'}</td>
                <td>{Number.isFinite(row.limit) ? row.limit.toFixed(3) : '—'}</td>
                <td className={`verdict verdict-${row.verdict}`}>{row.verdict}</td>
                <td>{row.clause}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  )
}
