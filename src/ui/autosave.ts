/**
 * Autosave of the document in the browser's IndexedDB (through idb-keyval), as a ring of the last
 * SNAPSHOT_COUNT snapshots, each with its time and editor revision, and the restore after a reload or
 * crash.
 *
 * - Every write stores the snapshot and the ring index in one atomic transaction (`setMany`), into the
 *   slot of the oldest snapshot, so a failed write never damages the snapshots already there.
 * - When the database refuses a write (quota, private mode), an emergency copy goes to localStorage
 *   (FALLBACK_KEY) and the outcome says so; when that fails too the outcome is `failed`. The caller
 *   shows both as a persistent warning.
 * - Restore takes the newest valid copy among the ring, the emergency copy and the autosave of the
 *   previous version (localStorage, AUTOSAVE_KEY). The old copy is read once: it is moved into the ring
 *   and removed. Every copy passes the same validation as a file before it is used.
 */
import { createStore, get, setMany } from 'idb-keyval'
import type { Project } from '@/model'
import { readProjectText } from './projectFile'

/** localStorage key of the previous version's single autosave (read once, then removed). */
export const AUTOSAVE_KEY = 'gyre.autosave'
/** localStorage key of the emergency copy written when the database refuses a write. */
export const FALLBACK_KEY = 'gyre.autosave.fallback'
/** Snapshots kept in the ring. */
export const SNAPSHOT_COUNT = 5
const INDEX_KEY = 'index'
const slotKey = (slot: number): string => `snapshot-${slot}`

/** The small async key-value store the service needs (idb-keyval in the browser, a Map in tests). */
export interface KeyValueStore {
  get(key: string): Promise<unknown>
  /** Write all entries or none. */
  setMany(entries: [string, unknown][]): Promise<void>
}

/** The part of localStorage the service needs. */
export interface LocalStore {
  getItem(key: string): string | null
  setItem(key: string, value: string): void
  removeItem(key: string): void
}

export interface SnapshotMeta {
  readonly slot: number
  /** ISO time of the save. */
  readonly savedAt: string
  /** Editor revision of the saved document (counts from 0 in each session). */
  readonly revision: number
}

/** Ring index, newest first. */
export interface SnapshotIndex {
  readonly entries: readonly SnapshotMeta[]
}

export type RestoreSource = 'snapshot' | 'emergency copy' | 'previous version'

/** One stored copy offered to the restore choice; `data` is the stored project, not yet validated. */
export interface RestoreCandidate {
  readonly source: RestoreSource
  readonly savedAt: string
  readonly revision: number
  readonly data: unknown
}

export type RestoreResult =
  | { readonly kind: 'none' }
  | {
      readonly kind: 'restored'
      readonly project: Project
      readonly savedAt: string
      readonly source: RestoreSource
      /** Newer copies that failed validation and were passed over, with the reason. */
      readonly skipped: readonly string[]
    }
  | { readonly kind: 'refused'; readonly errors: readonly string[] }

export type SaveOutcome =
  | { readonly kind: 'saved'; readonly savedAt: string; readonly revision: number }
  /** The database refused; an emergency copy is in localStorage. */
  | { readonly kind: 'fallback'; readonly savedAt: string; readonly revision: number; readonly error: string }
  | { readonly kind: 'failed'; readonly error: string }

/** Test hook: make the database refuse writes ('database') or the emergency copy too ('all'). */
export type WriteFailure = 'none' | 'database' | 'all'

export interface AutosaveService {
  load(): Promise<RestoreResult>
  save(project: Project, revision: number): Promise<SaveOutcome>
  /** The ring, newest first (for tests and diagnostics). */
  snapshots(): Promise<readonly SnapshotMeta[]>
  readonly debug: { failWrites(mode: WriteFailure): void }
}

/** Ring index from stored data; malformed entries are dropped. */
export function readSnapshotIndex(raw: unknown, capacity = SNAPSHOT_COUNT): SnapshotIndex {
  const list = (raw as { entries?: unknown } | null | undefined)?.entries
  if (!Array.isArray(list)) return { entries: [] }
  const seen = new Set<number>()
  const entries: SnapshotMeta[] = []
  for (const e of list as unknown[]) {
    const m = e as Partial<SnapshotMeta> | null
    if (!m || typeof m.slot !== 'number' || !Number.isInteger(m.slot) || m.slot < 0 || m.slot >= capacity) continue
    if (typeof m.savedAt !== 'string' || typeof m.revision !== 'number' || seen.has(m.slot)) continue
    seen.add(m.slot)
    entries.push({ slot: m.slot, savedAt: m.savedAt, revision: m.revision })
  }
  return { entries }
}

/**
 * Where the next snapshot goes and the ring after it: a free slot while the ring is not full,
 * else the slot of the oldest snapshot. The new entry comes first.
 */
export function planSnapshotWrite(
  index: SnapshotIndex,
  meta: { readonly savedAt: string; readonly revision: number },
  capacity = SNAPSHOT_COUNT,
): { slot: number; index: SnapshotIndex } {
  const entries = index.entries.slice(0, capacity)
  const used = new Set(entries.map((e) => e.slot))
  let slot = -1
  for (let s = 0; s < capacity && slot < 0; s++) if (!used.has(s)) slot = s
  if (slot < 0) slot = (entries[entries.length - 1] as SnapshotMeta).slot
  const kept = entries.filter((e) => e.slot !== slot)
  return { slot, index: { entries: [{ slot, savedAt: meta.savedAt, revision: meta.revision }, ...kept].slice(0, capacity) } }
}

/**
 * The copy to restore: the newest (by save time, then revision) that passes validation. Newer copies
 * that fail are named in `skipped`; when none is valid the result is `refused` with every reason.
 */
export function chooseRestore(candidates: readonly RestoreCandidate[]): RestoreResult {
  if (candidates.length === 0) return { kind: 'none' }
  const ordered = [...candidates].sort((a, b) =>
    a.savedAt === b.savedAt ? b.revision - a.revision : a.savedAt < b.savedAt ? 1 : -1,
  )
  const skipped: string[] = []
  for (const c of ordered) {
    const label = `${c.source}${c.savedAt ? ` of ${c.savedAt}` : ''}`
    let text: string
    try {
      text = JSON.stringify(c.data) ?? ''
    } catch (_err) {
      skipped.push(`[autosave] ${label} cannot be read`)
      continue
    }
    const read = readProjectText(text, `autosaved copy (${label})`)
    if (read.ok) return { kind: 'restored', project: read.project, savedAt: c.savedAt, source: c.source, skipped }
    skipped.push(`[autosave] ${label}: ${read.errors[0] ?? 'invalid'}`)
  }
  return { kind: 'refused', errors: skipped }
}

const message = (err: unknown): string => (err instanceof Error ? err.message : String(err))

/** A localStorage copy ({ savedAt, revision?, project }) as a candidate, or null. */
function localCandidate(local: LocalStore | null, key: string, source: RestoreSource): RestoreCandidate | null {
  let text: string | null
  try {
    text = local?.getItem(key) ?? null
  } catch (_err) {
    return null
  }
  if (!text) return null
  try {
    const w = JSON.parse(text) as { savedAt?: unknown; revision?: unknown; project?: unknown }
    return {
      source,
      savedAt: typeof w.savedAt === 'string' ? w.savedAt : '',
      revision: typeof w.revision === 'number' ? w.revision : 0,
      data: w.project,
    }
  } catch (_err) {
    return { source, savedAt: '', revision: 0, data: null }
  }
}

export interface AutosaveServiceConfig {
  /** The database; null where IndexedDB is missing (every save then goes to the emergency copy). */
  readonly db: KeyValueStore | null
  readonly local: LocalStore | null
  readonly now?: () => Date
  readonly capacity?: number
}

export function createAutosaveService(config: AutosaveServiceConfig): AutosaveService {
  const { db, local } = config
  const capacity = config.capacity ?? SNAPSHOT_COUNT
  const now = config.now ?? (() => new Date())
  let failure: WriteFailure = 'none'
  let savedAt = ''

  const readIndex = async (): Promise<SnapshotIndex> => {
    if (!db) return { entries: [] }
    return readSnapshotIndex(await db.get(INDEX_KEY), capacity)
  }

  const writeSnapshot = async (project: unknown, meta: { savedAt: string; revision: number }): Promise<void> => {
    if (!db) throw new Error('this browser has no IndexedDB')
    if (failure !== 'none') throw new Error('[test] the database refuses writes')
    const plan = planSnapshotWrite(await readIndex(), meta, capacity)
    await db.setMany([
      [slotKey(plan.slot), { savedAt: meta.savedAt, revision: meta.revision, project }],
      [INDEX_KEY, plan.index],
    ])
  }

  /** ISO time that sorts after the previous save even when the clock did not move (or went back). */
  const stamp = (): string => {
    let t = now().toISOString()
    if (t <= savedAt) t = new Date(Date.parse(savedAt) + 1).toISOString()
    savedAt = t
    return t
  }

  return {
    async load() {
      const candidates: RestoreCandidate[] = []
      if (db) {
        try {
          const index = await readIndex()
          for (const e of index.entries) {
            const stored = (await db.get(slotKey(e.slot))) as { savedAt?: unknown; revision?: unknown; project?: unknown } | undefined
            if (!stored) continue
            // The stored copy carries its own time: it wins over the index if the two disagree.
            candidates.push({
              source: 'snapshot',
              savedAt: typeof stored.savedAt === 'string' ? stored.savedAt : e.savedAt,
              revision: typeof stored.revision === 'number' ? stored.revision : e.revision,
              data: stored.project,
            })
          }
        } catch (err) {
          console.warn('[autosave] could not read the database:', err)
        }
      }
      const emergency = localCandidate(local, FALLBACK_KEY, 'emergency copy')
      if (emergency) candidates.push(emergency)
      const previous = localCandidate(local, AUTOSAVE_KEY, 'previous version')
      if (previous) candidates.push(previous)
      const result = chooseRestore(candidates)
      if (result.kind === 'restored') savedAt = result.savedAt > savedAt ? result.savedAt : savedAt
      // The previous version's copy is read once: move it into the ring, then remove it.
      if (previous && db && chooseRestore([previous]).kind === 'restored') {
        try {
          await writeSnapshot(previous.data, { savedAt: previous.savedAt || stamp(), revision: previous.revision })
          local?.removeItem(AUTOSAVE_KEY)
        } catch (err) {
          console.warn('[autosave] could not move the old autosave into the database:', err)
        }
      }
      return result
    },

    async save(project, revision) {
      const at = stamp()
      let dbError: string
      try {
        await writeSnapshot(project, { savedAt: at, revision })
        try {
          local?.removeItem(FALLBACK_KEY)
        } catch (_err) {
          // A stale emergency copy is older than the ring and harmless.
        }
        return { kind: 'saved', savedAt: at, revision }
      } catch (err) {
        dbError = `[autosave] the browser database refused the save: ${message(err)}`
      }
      try {
        if (!local) throw new Error('local storage is not available')
        if (failure === 'all') throw new Error('[test] local storage refuses writes')
        local.setItem(FALLBACK_KEY, JSON.stringify({ savedAt: at, revision, project }))
        return { kind: 'fallback', savedAt: at, revision, error: dbError }
      } catch (err) {
        return { kind: 'failed', error: `${dbError}; the emergency copy failed too: ${message(err)}` }
      }
    },

    async snapshots() {
      return (await readIndex()).entries
    },

    debug: {
      failWrites(mode) {
        failure = mode
      },
    },
  }
}

/** The browser's service: IndexedDB database "gyre", store "autosave", plus localStorage. */
export function createBrowserAutosave(): AutosaveService {
  let db: KeyValueStore | null = null
  try {
    if (typeof indexedDB !== 'undefined') {
      const store = createStore('gyre', 'autosave')
      db = { get: (key) => get(key, store), setMany: (entries) => setMany(entries, store) }
    }
  } catch (_err) {
    db = null
  }
  let local: LocalStore | null
  try {
    local = typeof localStorage === 'undefined' ? null : localStorage
  } catch (_err) {
    local = null
  }
  return createAutosaveService({ db, local })
}

/**
 * A debounced writer: `schedule` saves after `delayMs` of quiet, `flush` saves now. One save runs at
 * a time; a change during a save is saved right after it. `onOutcome` gets every outcome.
 */
export function createAutosaver(
  delayMs: number,
  save: (project: Project, revision: number) => Promise<SaveOutcome>,
  onOutcome: (outcome: SaveOutcome) => void,
): { schedule(project: Project, revision: number): void; flush(): void; cancel(): void } {
  let timer: ReturnType<typeof setTimeout> | null = null
  let latest: { project: Project; revision: number } | null = null
  let running = false
  let again = false
  const flush = (): void => {
    if (timer) clearTimeout(timer)
    timer = null
    if (!latest) return
    if (running) {
      again = true
      return
    }
    const job = latest
    latest = null
    running = true
    void save(job.project, job.revision)
      .catch((err: unknown): SaveOutcome => ({ kind: 'failed', error: `[autosave] ${message(err)}` }))
      .then((outcome) => {
        running = false
        onOutcome(outcome)
        if (again) {
          again = false
          flush()
        }
      })
  }
  return {
    schedule(project, revision) {
      latest = { project, revision }
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
