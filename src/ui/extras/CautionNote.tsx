/** The short caution with the full text on hover (title) and when expanded (details). */
export function CautionNote({ short, full, testId }: { short: string; full: string; testId: string }) {
  return (
    <details className="gx-caution" data-testid={testId} title={full}>
      <summary>{short}</summary>
      <p>{full}</p>
    </details>
  )
}
