/**
 * CSV export of one result table, RFC 4180 style: comma separators, CRLF line ends, a field quoted
 * when it holds a comma, a double quote, CR or LF, and a double quote inside a field doubled.
 * The file starts with one comment line (`# project | table title | CAUTION`) so the caution travels
 * with the numbers; RFC 4180 has no comments, so readers should skip the first line (docs/reports.md).
 * @see RFC 4180 (2005), section 2, rules 1-7
 */
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import type { ResultTable, TableCell } from './tables'

const CRLF = '\r\n'

/** One CSV field: quoted (with inner quotes doubled) when it holds a comma, a quote, CR or LF. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text
}

/** A cell as CSV text: numbers at full precision (shortest round-trip form), null as empty. */
export function csvCell(cell: TableCell): string {
  if (cell === null) return ''
  if (typeof cell === 'number') return Number.isFinite(cell) ? String(cell) : ''
  return csvField(cell)
}

/** Header text of a column: `label (unit)`, or the label alone when the column has no unit. */
export function csvHeader(label: string, unit: string): string {
  return csvField(unit === '' ? label : `${label} (${unit})`)
}

/** One line of text with line breaks folded to spaces (for the comment line). */
const oneLine = (text: string): string => text.replace(/[\r\n]+/g, ' ').trim()

/**
 * The table as CSV text: a `#` comment line with the project name, the table title and CAUTION,
 * then the header row (`label (unit)`), then one record per row; every line ends with CRLF.
 */
export function toCsv(table: ResultTable, project: Pick<Project, 'name'>): string {
  const comment = `# ${[oneLine(project.name) || 'Gyre project', oneLine(table.title), CAUTION].join(' | ')}`
  const header = table.columns.map((c) => csvHeader(c.label, c.unit)).join(',')
  const records = table.rows.map((row) => table.columns.map((_, j) => csvCell(row[j] ?? null)).join(','))
  return [comment, header, ...records].map((line) => line + CRLF).join('')
}
