import { MODE_COLUMNS, modeHeaderLabel } from '@/model'
import type { Floor, UnitSystem } from '@/model'
import { scopeLine } from '@/engine'
import type { AnalysisResult, CheckRow } from '@/engine'
import { designBaseShearTable, designDetailTables } from '@/report'
import { characterWords } from '@/viewer'
import { formatNumber, formatQuantity } from './quantities'
import { ResultTableView } from './ResultTableView'
import { resultsSummary } from './resultsSummary'
import type { ResultsSummary } from './resultsSummary'

interface Props {
  readonly floors: readonly Floor[]
  readonly result: AnalysisResult | null
  readonly isStale: boolean
  readonly units: UnitSystem
}


const pct = (v: number | undefined): string => (v === undefined || !Number.isFinite(v) ? '—' : (v * 100).toFixed(1))

/**
 * The latest results, summary first (worst drift ratio per storey with case and verdict, T1–T3 with
 * their class, the torsional-to-translational period ratio), the full tables in a section below that
 * opens on request. The screen's caution line covers these numbers (status line).
 */
export function ResultsPanel({ floors, result, isStale, units }: Props) {
  const summary = resultsSummary(floors, result)
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
      {result ? <SummaryView summary={summary} units={units} /> : null}
      {result?.design ? <DesignView result={result} units={units} /> : null}
      {result ? (
        <details className="results-details" data-testid="results-details">
          <summary>All modes, torsion checks and plan regularity</summary>
        {modes && modeCount > 0 ? (
          <table className="data" data-testid="modes-table">
            <caption>Modes (lowest {modeCount} of {modes.count})</caption>
            <thead>
              <tr>
                {MODE_COLUMNS.map((c) => (
                  <th key={c.key} title={c.hint}>
                    {modeHeaderLabel(c)}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {Array.from({ length: modeCount }, (_, i) => (
                <tr key={i}>
                  <td>{i + 1}</td>
                  <td>{formatNumber(modes.periods[i] ?? NaN, 'period', units)}</td>
                  <td>{Number.isFinite(modes.frequenciesHz[i] ?? NaN) ? (modes.frequenciesHz[i] ?? 0).toFixed(3) : '—'}</td>
                  <td>{pct(modes.effectiveMassRatio.x[i])}</td>
                  <td>{pct(modes.effectiveMassRatio.y[i])}</td>
                  <td>{pct(modes.effectiveMassRatio.rz[i])}</td>
                  <td>{pct(modes.cumulativeMassRatio.x[i])}</td>
                  <td>{pct(modes.cumulativeMassRatio.y[i])}</td>
                  <td>{pct(modes.cumulativeMassRatio.rz[i])}</td>
                  <td>{pct(modes.torsionShare[i])}</td>
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
            <CheckRows rows={criterion.rows} floorName={floorName} second="Case" limitDigits={2} withLabel />
          </table>
        ) : null}
        {regularity && regularity.rows.length > 0 ? (
          <table className="data" data-testid="regularity-table">
            <caption>
              Plan regularity: {regularity.setName}
              <br />
              <small>Source: {regularity.source}</small>
              {scopeLine(regularity) ? (
                <>
                  <br />
                  <small data-testid="regularity-scope">{scopeLine(regularity)}</small>
                </>
              ) : null}
            </caption>
            <CheckRows rows={regularity.rows} floorName={floorName} second="Dir." limitDigits={3} withLabel={false} />
          </table>
        ) : null}
        </details>
      ) : null}
    </section>
  )
}

const CLASS_WORDS: Record<string, string> = { x: 'mostly X', y: 'mostly Y', torsion: 'mostly torsion', coupled: 'coupled' }

function SummaryView({ summary, units }: { summary: ResultsSummary; units: UnitSystem }) {
  const { drifts, modes, periodRatio } = summary
  return (
    <div className="results-summary" data-testid="results-summary">
      <p className="summary-modes" data-testid="summary-modes">
        {modes.map((m) => (
          <span key={m.number} data-testid={`summary-T${m.number}`}>
            <strong>
              T{m.number} {formatQuantity(m.period, 'period', units)}
            </strong>{' '}
            {CLASS_WORDS[m.character] ?? m.character}
          </span>
        ))}
        {periodRatio ? (
          <span data-testid="summary-period-ratio" title="Period of the first mostly-torsion mode over the longest mostly-translational period">
            T{periodRatio.torsionMode} / T{periodRatio.translationMode} (torsion / translation) <strong>{periodRatio.value.toFixed(2)}</strong>
          </span>
        ) : (
          <span data-testid="summary-period-ratio" className="muted">
            no mostly-torsion mode: period ratio not formed
          </span>
        )}
      </p>
      {drifts.length > 0 ? (
        <table className="data compact" data-testid="summary-drifts">
          <caption>Worst max/avg story drift ratio per storey (static cases with accidental torsion)</caption>
          <thead>
            <tr>
              <th>Storey below</th>
              <th>max/avg</th>
              <th>case</th>
              <th>verdict</th>
            </tr>
          </thead>
          <tbody>
            {drifts.map((d) => (
              <tr key={d.floorId} data-testid={`summary-drift-${d.floorId}`}>
                <td>{d.floorName}</td>
                <td>{d.ratio.toFixed(2)}</td>
                <td>{d.caseId}</td>
                <td className={d.verdict ? `verdict verdict-${d.verdict}` : ''}>
                  {d.verdict ?? '—'}
                  {d.limit !== null && Number.isFinite(d.limit) ? ` (limit ${d.limit.toFixed(2)})` : ''}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="muted">No story drift ratios in this result.</p>
      )}
    </div>
  )
}

/**
 * Design-level numbers when the project has a seismic system (settings.seismicDesign): the base shear
 * per direction (period used and why, Cs or Sd, V) first, the design drifts, stability, amplified
 * torsion, spectrum scaling and storey checks in a section that opens on request.
 */
function DesignView({ result, units }: { result: AnalysisResult; units: UnitSystem }) {
  const base = designBaseShearTable(result, units)
  const details = designDetailTables(result, units)
  return (
    <div className="design-view" data-testid="design-view">
      {base ? <ResultTableView table={base} /> : null}
      {details.length > 0 ? (
        <details data-testid="design-details">
          <summary>Design drifts, stability and storey checks</summary>
          {details.map((t) => (
            <ResultTableView key={t.id} table={t} />
          ))}
        </details>
      ) : null}
    </div>
  )
}

/** Header and rows of a check table (torsion checks or plan regularity): one layout for both. */
function CheckRows(props: {
  rows: readonly CheckRow[]
  floorName: (id: string) => string
  second: string
  limitDigits: number
  withLabel: boolean
}) {
  const { rows, floorName, second, limitDigits, withLabel } = props
  return (
    <>
      <thead>
        <tr>
          <th>Floor</th>
          <th>{second}</th>
          <th>Quantity</th>
          <th>Value</th>
          <th>Limit</th>
          <th>Verdict</th>
          <th>Clause</th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row, i) => (
          <tr key={i}>
            <td>{floorName(row.floorId)}</td>
            <td>{row.caseId}</td>
            <td>{row.quantity}</td>
            <td>{Number.isFinite(row.value) ? row.value.toFixed(3) : '—'}</td>
            <td>{Number.isFinite(row.limit) ? row.limit.toFixed(limitDigits) : '—'}</td>
            <td className={`verdict verdict-${row.verdict}`}>
              {row.verdict}
              {withLabel && row.label ? ` (${row.label})` : ''}
            </td>
            <td>{row.clause}</td>
          </tr>
        ))}
      </tbody>
    </>
  )
}
