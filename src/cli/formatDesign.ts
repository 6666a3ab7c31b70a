/**
 * Terminal text of the design-level numbers: the ELF base shear with the period used and the system
 * factors (printed before the torsion drift table), and the design drift, stability, amplified
 * torsion, spectrum scaling, story stiffness, torsional flexibility and consequence tables after it.
 * Each block carries the caution. Built from the report's result tables so the numbers match.
 */
import type { AnalysisResult } from '@/engine'
import { CAUTION, formatNumber } from '@/model'
import type { UnitSystem } from '@/model'
import { designBaseShearTable, designDetailTables } from '@/report'
import type { ResultTable, TableCell } from '@/report'
import { formatTable } from './format'

const cellText = (c: TableCell): string => (c === null ? '-' : typeof c === 'number' ? formatNumber(c, 4) : c)

/** One result table as text: title, the table, notes. */
export function formatResultTable(t: ResultTable): string {
  // Text columns read better left-aligned; number columns stay right-aligned.
  const isText = (j: number): boolean => t.rows.some((r) => typeof r[j] === 'string')
  const columns = t.columns.map((c, j) => ({
    header: c.unit === '' ? c.label : `${c.label} (${c.unit})`,
    align: isText(j) ? ('left' as const) : ('right' as const),
  }))
  return [t.title, formatTable(columns, t.rows.map((r) => r.map(cellText))), ...t.notes.map((n) => `  note: ${n}`)].join('\n')
}

/** The base shear block (or a line saying the numbers are elastic when no seismic system is set). */
export function designLeadSection(result: AnalysisResult, units: UnitSystem): string {
  const t = designBaseShearTable(result, units)
  if (!t) {
    return 'Design level: no seismic system set (settings.seismicDesign); base shear V = Sa(T)·W with R = 1, drifts below are elastic, not design drifts.'
  }
  return `${formatResultTable(t)}\nCAUTION: ${result.caution || CAUTION}`
}

/** The design tables after the torsion check; null when no seismic system is set. */
export function designDetailSection(result: AnalysisResult, units: UnitSystem): string | null {
  const tables = designDetailTables(result, units)
  if (tables.length === 0) return null
  return [...tables.map(formatResultTable), `CAUTION: ${result.caution || CAUTION}`].join('\n\n')
}
