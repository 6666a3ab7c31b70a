/**
 * What the report buttons produce, as plain data (no DOM): the printable HTML, one CSV per result
 * table, and all tables in one zip, each with its file name and MIME type. Tested in node.
 */
import { strToU8, zipSync } from 'fflate'
import type { AnalysisResult, BalanceResult } from '@/engine'
import { CAUTION } from '@/model'
import type { Project, UnitSystem } from '@/model'
import { buildReportHtml, buildResultTables, csvFileName, fileSlug, reportFileName, toCsv } from '@/report'

/** A text file to download. */
export interface DownloadFile {
  readonly fileName: string
  readonly mime: string
  readonly text: string
}

/** A binary file to download (the zip of tables). */
export interface BinaryDownloadFile {
  readonly fileName: string
  readonly mime: string
  readonly bytes: Uint8Array
}

/** Anything the report buttons hand to `save`. */
export type SavedFile = DownloadFile | BinaryDownloadFile

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

/** Name of the tables zip, e.g. 'corner-block-quarry-street-tables.zip'. */
export function csvZipFileName(project: Pick<Project, 'name'>): string {
  return `${fileSlug(project.name)}-tables.zip`
}

/** Text of the README.txt inside the zip: project, units, time, the caution and the file list. */
export function zipReadme(project: Pick<Project, 'name'>, unitSystem: UnitSystem, generatedAt: Date, names: readonly string[]): string {
  return [
    `Result tables of "${project.name}" (Gyre), units: ${unitSystem}, written ${generatedAt.toISOString()}.`,
    '',
    `CAUTION: ${CAUTION}`,
    '',
    'Each CSV starts with one comment line (project and caution); skip it when reading.',
    '',
    'Files:',
    ...names.map((n) => `  ${n}`),
    '',
  ].join('\r\n')
}

/**
 * Every result table as CSV inside one zip (fflate, deflate level 6), plus a README.txt carrying the
 * caution. Entry times are `generatedAt` so that the same input gives the same bytes.
 */
export function csvZipFile(
  project: Project,
  result: AnalysisResult,
  unitSystem: UnitSystem,
  generatedAt: Date,
): BinaryDownloadFile {
  const files = csvFiles(project, result, unitSystem)
  const entries: Record<string, Uint8Array> = {
    'README.txt': strToU8(zipReadme(project, unitSystem, generatedAt, files.map((f) => f.fileName))),
  }
  for (const f of files) entries[f.fileName] = strToU8(f.text)
  // The zip format stores DOS times from 1980 on; earlier clocks are clamped.
  const mtime = Math.max(generatedAt.getTime(), Date.UTC(1980, 0, 2))
  return {
    fileName: csvZipFileName(project),
    mime: 'application/zip',
    bytes: zipSync(entries, { level: 6, mtime }),
  }
}
