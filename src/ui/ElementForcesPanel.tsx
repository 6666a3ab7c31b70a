/**
 * Storey shears and overturning moments of the selected wall, frame line or column, up the height,
 * for one load case at a time (static torsion cases and spectrum cases), as bars and a table, with
 * the caution. Reads `result.elementForces`; shows nothing when the selection has no such rows.
 */
import { useState } from 'react'
import { formatQuantity, toDisplay, unitLabel } from '@/model'
import type { Floor, UnitSystem } from '@/model'
import type { AnalysisResult, ElementForceRow } from '@/engine'

interface Props {
  readonly floors: readonly Floor[]
  readonly result: AnalysisResult | null
  readonly selection: readonly string[]
  readonly units: UnitSystem
  readonly isStale: boolean
}

const ROW_LABEL: Record<ElementForceRow['kind'], string> = {
  wall: 'in its plane',
  frameLine: 'along the frame',
  columnX: 'along local x',
  columnY: 'along local y',
  wallGroup: 'along a principal axis of its group',
  wallGroupTorsion: 'torsion of its group (N·m)',
}

const BAR_HEIGHT = 12
const CHART_WIDTH = 220

/** Horizontal bars of |shear| per storey, top storey first; negative static values in a second tone. */
function ShearBars({ values, names }: { values: Float64Array; names: readonly string[] }) {
  let max = 0
  for (const v of values) max = Math.max(max, Math.abs(v))
  const n = values.length
  const height = n * (BAR_HEIGHT + 2)
  return (
    <svg
      className="ef-bars"
      width={CHART_WIDTH}
      height={height}
      viewBox={`0 0 ${CHART_WIDTH} ${height}`}
      role="img"
      aria-label="storey shear up the height"
    >
      {Array.from({ length: n }, (_, i) => {
        const k = n - 1 - i
        const v = values[k] ?? 0
        const w = max > 0 ? (Math.abs(v) / max) * (CHART_WIDTH - 4) : 0
        return (
          <rect
            key={k}
            x={2}
            y={i * (BAR_HEIGHT + 2)}
            width={w}
            height={BAR_HEIGHT}
            fill={v < 0 ? '#b98b6a' : '#6f8fa6'}
          >
            <title>{names[k]}</title>
          </rect>
        )
      })}
    </svg>
  )
}

/** Element forces of the selection (one element), per case. */
export function ElementForcesPanel({ floors, result, selection, units, isStale }: Props) {
  const [caseId, setCaseId] = useState<string>('spectrum+torsion')
  const ef = result?.elementForces ?? null
  if (!ef || selection.length !== 1) return null
  const id = selection[0]
  const rows = ef.elements.filter(
    (r) => r.kind !== 'wallGroupTorsion' && (r.elementId === id || (id !== undefined && r.refs?.includes(id) === true)),
  )
  if (rows.length === 0 || ef.cases.length === 0) return null
  const found = ef.cases.findIndex((c) => c.id === caseId)
  const ci = found >= 0 ? found : 0
  const current = ef.cases[ci]!
  const floorName = (fid: string): string => floors.find((f) => f.id === fid)?.name ?? fid
  const force = (v: number): string => formatQuantity(v, 'force', units)
  const moment = (v: number): string => formatQuantity(v, 'moment', units)
  return (
    <section className="element-forces" aria-label="Element storey forces" data-testid="element-forces">
      <h3>Storey shear and overturning</h3>
      {isStale ? <p className="stale-note">Updating — these numbers belong to an earlier state of the model.</p> : null}
      <label>
        Case{' '}
        <select value={current.id} onChange={(e) => setCaseId(e.target.value)} data-testid="element-forces-case">
          {ef.cases.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
      {rows.map((row) => {
        const shear = row.shear[ci] ?? new Float64Array(0)
        const share = row.share[ci] ?? new Float64Array(0)
        const otm = row.overturningMoment[ci] ?? new Float64Array(0)
        const names = row.floorIds.map(floorName)
        return (
          <div key={row.kind} className="ef-row">
            <p className="muted">
              Shear {ROW_LABEL[row.kind]}, {current.kind === 'spectrum' ? 'peak values' : 'signed'} (
              {unitLabel('force', units)}, {unitLabel('moment', units)})
            </p>
            <ShearBars values={shear} names={names} />
            <table className="data" data-testid={`element-forces-table-${row.kind}`}>
              <thead>
                <tr>
                  <th>Storey below</th>
                  <th>Shear</th>
                  <th>Share</th>
                  <th>Overturning</th>
                </tr>
              </thead>
              <tbody>
                {Array.from({ length: shear.length }, (_, i) => {
                  const k = shear.length - 1 - i
                  return (
                    <tr key={k}>
                      <td>{names[k]}</td>
                      <td title={force(shear[k] ?? NaN)}>{toDisplay(shear[k] ?? NaN, 'force', units).toFixed(0)}</td>
                      <td>{Number.isFinite(share[k]) ? `${((share[k] ?? 0) * 100).toFixed(1)}%` : '—'}</td>
                      <td title={moment(otm[k] ?? NaN)}>{toDisplay(otm[k] ?? NaN, 'moment', units).toFixed(0)}</td>
                    </tr>
                  )
                })}
              </tbody>
            </table>
          </div>
        )
      })}
      <p className="muted">
        Shear: the element&apos;s storey shear along its own line; share: of the storey shear along the load
        {current.direction === 'both' ? ' (taken along the element’s main axis)' : ''}; overturning: at the
        bottom of each storey.
      </p>
    </section>
  )
}
