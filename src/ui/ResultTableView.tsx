/**
 * One result table of `src/report` (the same rows the report, the CSV and the CLI show) rendered as an
 * HTML table on screen: caption, header with units, rows, notes. The screen's caution line covers it.
 */
import type { ResultTable } from '@/report'

interface Props {
  readonly table: ResultTable
}

const cellText = (v: string | number | null): string =>
  v === null ? '—' : typeof v === 'number' ? (Number.isFinite(v) ? String(Number(v.toPrecision(4))) : '—') : v

/** A result table with its notes; numbers to four significant digits, missing values as a dash. */
export function ResultTableView({ table }: Props) {
  return (
    <table className="data" data-testid={`table-${table.id}`}>
      <caption>{table.title}</caption>
      <thead>
        <tr>
          {table.columns.map((c) => (
            <th key={c.key}>{c.unit ? `${c.label} (${c.unit})` : c.label}</th>
          ))}
        </tr>
      </thead>
      <tbody>
        {table.rows.map((row, i) => (
          <tr key={i}>
            {row.map((v, k) => (
              <td key={k}>{cellText(v)}</td>
            ))}
          </tr>
        ))}
      </tbody>
      {table.notes.length > 0 ? (
        <tfoot>
          <tr>
            <td colSpan={table.columns.length}>
              {table.notes.map((n, i) => (
                <small key={i} className="table-note">
                  {n}
                  <br />
                </small>
              ))}
            </td>
          </tr>
        </tfoot>
      ) : null}
    </table>
  )
}
