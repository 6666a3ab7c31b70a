import type { Issue } from '@/engine'

interface Props {
  readonly issues: readonly Issue[]
  /** Error of the analysis itself (worker or engine failure), shown first. */
  readonly analysisError: string | null
  /** Messages about files and autosave. */
  readonly notices: readonly string[]
  readonly onPick: (issue: Issue) => void
  /** The name the engineer gave an element or floor id (the id itself when it has none). */
  readonly nameOf?: (id: string) => string
}

/** Engine issues (mechanisms, missing mass, ...) and analysis errors; clicking selects the elements. */
export function ProblemsPanel({ issues, analysisError, notices, onPick, nameOf = (id) => id }: Props) {
  const count = issues.length + (analysisError ? 1 : 0)
  return (
    <section className="problems" aria-label="Problems" data-testid="problems-panel">
      <h2>
        Problems <span className="count">{count}</span>
      </h2>
      {count === 0 ? <p className="muted">None found in the latest analysis.</p> : null}
      <ul>
        {analysisError ? (
          <li className="sev-error" data-testid="analysis-error">
            {analysisError}
          </li>
        ) : null}
        {issues.map((issue, i) => (
          <li key={i} className={`sev-${issue.severity}`}>
            <button
              type="button"
              className="issue"
              data-testid={`issue-${i}`}
              data-code={issue.code}
              onClick={() => onPick(issue)}
              title={issue.refs.length ? 'Select the elements involved' : undefined}
            >
              <span className="sev">{issue.severity}</span> {issue.message}
              {issue.refs.length ? <span className="refs"> ({issue.refs.map(nameOf).join(', ')})</span> : null}
            </button>
          </li>
        ))}
        {notices.map((n, i) => (
          <li key={`n${i}`} className="sev-info">
            {n}
          </li>
        ))}
      </ul>
    </section>
  )
}
