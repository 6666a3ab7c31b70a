/**
 * CSV export of one result table, RFC 4180 style: comma separators, CRLF line ends, a field quoted
 * when it holds a comma, a double quote, CR or LF, and a double quote inside a field doubled.
 * The file starts with one comment line (`# project | table title | CAUTION`) so the caution travels
 * with the numbers; RFC 4180 has no comments, so readers should skip the first line (docs/reports.md).
 * Text that a spreadsheet would run as a formula (first character = + - @ tab or CR) is neutralised:
 * a single quote is put in front and the field is quoted. Number cells stay plain numbers.
 * @see RFC 4180 (2005), section 2, rules 1-7
 * @see OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection)
 */
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import type { ResultTable, TableCell } from './tables'

const CRLF = '\r\n'

/** One CSV field: quoted (with inner quotes doubled) when it holds a comma, a quote, CR or LF. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text
}

/** First characters that make a spreadsheet read a cell as a formula (OWASP "CSV Injection"). */
const FORMULA_START = /^[=+\-@\t\r]/

/**
 * One CSV field for text: as csvField, except that text starting with = + - @ tab or CR gets a
 * single quote in front and is always quoted, so a spreadsheet shows it as text and runs nothing.
 * @see OWASP, "CSV Injection" (prepend a single quote, wrap the cell in double quotes)
 */
export function csvTextField(text: string): string {
  // '-inf' is how tables write a negative infinity (a number, no formula can hide in it).
  if (text === '-inf' || !FORMULA_START.test(text)) return csvField(text)
  return `"'${text.replace(/"/g, '""')}"`
}

/** A cell as CSV text: numbers at full precision (shortest round-trip form), null as empty. */
export function csvCell(cell: TableCell): string {
  if (cell === null) return ''
  if (typeof cell === 'number') return Number.isFinite(cell) ? String(cell) : ''
  return csvTextField(cell)
}

/** Header text of a column: `label (unit)`, or the label alone when the column has no unit. */
export function csvHeader(label: string, unit: string): string {
  return csvTextField(unit === '' ? label : `${label} (${unit})`)
}

/** One line of text with line breaks folded to spaces (for the comment line). */
const oneLine = (text: string): string => text.replace(/[\r\n]+/g, ' ').trim()

/**
 * The table as CSV text: a `#` comment line with the project name, the table title and CAUTION,
 * then the header row (`label (unit)`), then one record per row; every line ends with CRLF.
 * The comment line is one field (quoted when it holds a comma or a quote), so a comma in the project
 * name cannot start a new cell there.
 */
export function toCsv(table: ResultTable, project: Pick<Project, 'name'>): string {
  const comment = csvField(`# ${[oneLine(project.name) || 'Gyre project', oneLine(table.title), CAUTION].join(' | ')}`)
  const header = table.columns.map((c) => csvHeader(c.label, c.unit)).join(',')
  const records = table.rows.map((row) => table.columns.map((_, j) => csvCell(row[j] ?? null)).join(','))
  return [comment, header, ...records].map((line) => line + CRLF).join('')
}
