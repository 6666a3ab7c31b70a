/**
 * Debounced autosave of the editor document through an AutosaveService, its status for the screen,
 * and the guard that asks before the page is left with changes that are stored nowhere (changed since
 * the last successful autosave or file save).
 */
import { useCallback, useEffect, useMemo, useRef, useState } from 'react'
import type { EditorStore } from '@/editor'
import { createAutosaver } from '../autosave'
import type { AutosaveService, SaveOutcome } from '../autosave'
import { useEditor } from './useEditor'

/** Quiet time before an autosave, ms. */
export const AUTOSAVE_DELAY_MS = 400

export interface SaveStatus {
  /** none: nothing saved yet this session; fallback: only the emergency copy was written. */
  readonly kind: 'none' | 'saved' | 'fallback' | 'failed'
  /** ISO time of the last save that reached the database. */
  readonly lastSavedAt: string | null
  /** ISO time of the last emergency copy (fallback). */
  readonly fallbackAt: string | null
  readonly error: string | null
}

export interface AutosaveControl {
  readonly status: SaveStatus
  /** Whether the document has changes stored nowhere (no autosave, no file). */
  readonly hasUnsavedChanges: () => boolean
  /** Record that the current document was saved to a file. */
  markFileSaved(): void
}

const initialStatus: SaveStatus = { kind: 'none', lastSavedAt: null, fallbackAt: null, error: null }

export function useAutosave(store: EditorStore, service: AutosaveService | null): AutosaveControl {
  const doc = useEditor(store, (s) => s.doc)
  const revision = useEditor(store, (s) => s.revision)
  const [status, setStatus] = useState<SaveStatus>(initialStatus)
  const firstRevision = useRef(revision)
  const storedRevision = useRef(revision)

  const autosaver = useMemo(
    () =>
      service
        ? createAutosaver(AUTOSAVE_DELAY_MS, (p, r) => service.save(p, r), (outcome: SaveOutcome) => {
            if (outcome.kind !== 'failed') storedRevision.current = Math.max(storedRevision.current, outcome.revision)
            setStatus((old) =>
              outcome.kind === 'saved'
                ? { kind: 'saved', lastSavedAt: outcome.savedAt, fallbackAt: null, error: null }
                : outcome.kind === 'fallback'
                  ? { ...old, kind: 'fallback', fallbackAt: outcome.savedAt, error: outcome.error }
                  : { ...old, kind: 'failed', error: outcome.error },
            )
          })
        : null,
    [service],
  )

  useEffect(() => {
    if (autosaver && revision !== firstRevision.current) autosaver.schedule(doc, revision)
  }, [autosaver, revision, doc])

  const hasUnsavedChanges = useCallback(() => store.getState().revision !== storedRevision.current, [store])

  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent): void => {
      autosaver?.flush()
      if (!hasUnsavedChanges()) return
      // The browser shows its own question; the text is not used by current browsers.
      e.preventDefault()
      e.returnValue = ''
    }
    const onPageHide = (): void => autosaver?.flush()
    window.addEventListener('beforeunload', onBeforeUnload)
    window.addEventListener('pagehide', onPageHide)
    return () => {
      window.removeEventListener('beforeunload', onBeforeUnload)
      window.removeEventListener('pagehide', onPageHide)
      autosaver?.flush()
    }
  }, [autosaver, hasUnsavedChanges])

  const markFileSaved = useCallback(() => {
    storedRevision.current = store.getState().revision
  }, [store])

  return { status, hasUnsavedChanges, markFileSaved }
}
