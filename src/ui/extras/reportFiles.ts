/**
 * What the report buttons produce, as plain data (no DOM): the printable HTML and one CSV per
 * result table, each with its file name and MIME type. Tested in node.
 */
import type { AnalysisResult, BalanceResult } from '@/engine'
import type { Project, UnitSystem } from '@/model'
import { buildReportHtml, buildResultTables, csvFileName, reportFileName, toCsv } from '@/report'

export interface DownloadFile {
  readonly fileName: string
  readonly mime: string
  readonly text: string
}

/** The printable report as a file. */
export function reportFile(
  project: Project,
  result: AnalysisResult,
  unitSystem: UnitSystem,
  generatedAt: Date,
  balance?: BalanceResult,
): DownloadFile {
  const html = buildReportHtml(project, result, balance ? { unitSystem, balance, generatedAt } : { unitSystem, generatedAt })
  return { fileName: reportFileName(project), mime: 'text/html;charset=utf-8', text: html }
}

/** One CSV file per result table, in report order. */
export function csvFiles(project: Project, result: AnalysisResult, unitSystem: UnitSystem): DownloadFile[] {
  return buildResultTables(project, result, unitSystem).map((table) => ({
    fileName: csvFileName(project, table),
    mime: 'text/csv;charset=utf-8',
    text: toCsv(table, project),
  }))
}
