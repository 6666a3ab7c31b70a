/**
 * Report buttons: a printable HTML report (open and print, or download) and the result tables as
 * CSV files in one zip. Everything comes in by props; the component touches no store.
 */
import { useState } from 'react'
import type { AnalysisResult, BalanceResult } from '@/engine'
import type { Project, UnitSystem } from '@/model'
import { downloadFile, openAndPrint } from './download'
import { csvZipFile, reportFile } from './reportFiles'
import type { DownloadFile, SavedFile } from './reportFiles'

export interface ReportActionsProps {
  readonly project: Project
  /** The analysis to report; null disables the buttons. */
  readonly result: AnalysisResult | null
  readonly unitSystem: UnitSystem
  /** Balance suggestions to include in the report (optional). */
  readonly balance?: BalanceResult
  /** Overrides for tests or hosts: where files go and how the report is printed. */
  readonly save?: (file: SavedFile) => void
  readonly print?: (html: string) => void
  /** Clock for the report's time stamp (default: now). */
  readonly now?: () => Date
}

export function ReportActions(props: ReportActionsProps) {
  const { project, result, unitSystem, balance } = props
  const save = props.save ?? ((file: SavedFile) => downloadFile(file))
  const print = props.print ?? ((html: string) => void openAndPrint(html))
  const now = props.now ?? (() => new Date())
  const [message, setMessage] = useState<string | null>(null)
  const disabled = result === null

  const run = (what: string, action: () => string): void => {
    try {
      setMessage(action())
    } catch (error) {
      setMessage(`[report] could not ${what}: ${(error as Error).message}`)
    }
  }
  const report = (): DownloadFile | null => (result ? reportFile(project, result, unitSystem, now(), balance) : null)

  return (
    <section className="gx-panel gx-report" aria-label="Report and export" data-testid="report-actions">
      <header className="gx-head">
        <h3>Report and export</h3>
      </header>
      <div className="gx-buttons">
        <button
          type="button"
          data-testid="report-open"
          disabled={disabled}
          onClick={() =>
            run('open the report', () => {
              const file = report()
              if (!file) return 'Nothing to report yet.'
              print(file.text)
              return 'Report opened for printing.'
            })
          }
        >
          Printable report
        </button>
        <button
          type="button"
          data-testid="report-download"
          disabled={disabled}
          onClick={() =>
            run('save the report', () => {
              const file = report()
              if (!file) return 'Nothing to report yet.'
              save(file)
              return `Saved ${file.fileName}.`
            })
          }
        >
          Save report (.html)
        </button>
        <button
          type="button"
          data-testid="csv-download"
          disabled={disabled}
          onClick={() =>
            run('save the tables', () => {
              if (!result) return 'Nothing to export yet.'
              const file = csvZipFile(project, result, unitSystem, now())
              save(file)
              return `Saved ${file.fileName}.`
            })
          }
        >
          All tables (.zip of CSV)
        </button>
      </div>
      {disabled ? <p className="gx-muted">Run an analysis to enable the report.</p> : null}
      {message ? (
        <p className="gx-muted" role="status" data-testid="report-message">
          {message}
        </p>
      ) : null}
    </section>
  )
}
