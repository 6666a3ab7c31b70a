/**
 * A persistent warning while autosave is failing: it stays until a save reaches the browser database
 * again, says what is and is not stored, and points to saving a file.
 */
import type { SaveStatus } from './hooks/useAutosave'
import './workerNotice.css'

const clockTime = (iso: string | null): string => (iso ? `${iso.slice(11, 19)} UTC` : '')

export function SaveNotice({ status }: { readonly status: SaveStatus }) {
  if (status.kind !== 'failed' && status.kind !== 'fallback') return null
  const since = status.lastSavedAt ? `since ${clockTime(status.lastSavedAt)}` : 'made in this session'
  return (
    <div className="worker-notice" data-testid="save-notice">
      <p className={status.kind === 'failed' ? 'wn-fault' : 'wn-slow'} role="alert" data-testid={`save-${status.kind}`}>
        {status.kind === 'failed'
          ? `Autosave failed: your changes ${since} are not stored in this browser. Use Save to keep them in a file. `
          : `Autosave could not use the browser database; an emergency copy was kept in local storage at ${clockTime(status.fallbackAt)}. Use Save to keep your work in a file. `}
        <span className="wn-detail">{status.error}</span>
      </p>
    </div>
  )
}
