/**
 * Autosave of the document to localStorage (debounced) and its restore after a reload or crash.
 * Stored with the time it was saved; restored only if it passes the same validation as a file.
 */
import type { Project } from '@/model'
import { readProjectText } from './projectFile'

export const AUTOSAVE_KEY = 'gyre.autosave'

export interface StoredAutosave {
  readonly project: Project
  /** ISO time of the save. */
  readonly savedAt: string
}

export type RestoreResult =
  | { readonly kind: 'none' }
  | { readonly kind: 'restored'; readonly project: Project; readonly savedAt: string }
  | { readonly kind: 'refused'; readonly errors: readonly string[] }

function storage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage
  } catch (_err) {
    return null
  }
}

/** The autosaved project, validated, if there is one. */
export function readAutosave(): RestoreResult {
  const store = storage()
  const text = store?.getItem(AUTOSAVE_KEY)
  if (!text) return { kind: 'none' }
  let savedAt: string
  let projectText: string
  try {
    const wrapper = JSON.parse(text) as { savedAt?: unknown; project?: unknown }
    savedAt = typeof wrapper.savedAt === 'string' ? wrapper.savedAt : ''
    projectText = JSON.stringify(wrapper.project)
  } catch (_err) {
    return { kind: 'refused', errors: ['[autosave] stored copy is not valid JSON'] }
  }
  const read = readProjectText(projectText, 'autosaved copy')
  if (!read.ok) return { kind: 'refused', errors: read.errors }
  return { kind: 'restored', project: read.project, savedAt }
}

/** Write the project now. Returns the save time, or an error text (quota, private mode). */
export function writeAutosave(project: Project): { ok: true; savedAt: string } | { ok: false; error: string } {
  const store = storage()
  if (!store) return { ok: false, error: '[autosave] browser storage is not available' }
  const savedAt = new Date().toISOString()
  try {
    store.setItem(AUTOSAVE_KEY, JSON.stringify({ savedAt, project }))
    return { ok: true, savedAt }
  } catch (err) {
    return { ok: false, error: `[autosave] could not save: ${err instanceof Error ? err.message : String(err)}` }
  }
}

export function clearAutosave(): void {
  storage()?.removeItem(AUTOSAVE_KEY)
}

/** A debounced writer: `schedule(project)` saves after `delayMs` of quiet; `flush()` saves now. */
export function createAutosaver(
  delayMs: number,
  onSaved: (result: ReturnType<typeof writeAutosave>) => void,
): { schedule(project: Project): void; flush(): void; cancel(): void } {
  let timer: ReturnType<typeof setTimeout> | null = null
  let latest: Project | null = null
  const flush = (): void => {
    if (timer) clearTimeout(timer)
    timer = null
    if (latest) onSaved(writeAutosave(latest))
    latest = null
  }
  return {
    schedule(project) {
      latest = project
      if (timer) clearTimeout(timer)
      timer = setTimeout(flush, delayMs)
    },
    flush,
    cancel() {
      if (timer) clearTimeout(timer)
      timer = null
      latest = null
    },
  }
}
