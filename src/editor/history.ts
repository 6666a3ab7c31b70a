/**
 * Reversible document diffs and the undo/redo stacks (marks, diffs, bail, squash).
 * Everything between two marks is one undo step; a bail returns to the last mark and leaves nothing
 * on the redo stack. Only the document is recorded: selection, tool state and view are not history.
 */
import type { Project } from '@/model'

/** The record maps of a Project, diffed by id. */
export const RECORD_KINDS = [
  'materials',
  'slabs',
  'lineMasses',
  'pointMasses',
  'walls',
  'frameLines',
  'columns',
] as const

export type RecordKind = (typeof RECORD_KINDS)[number]

/** A record of any kind (structural element, slab, mass or material). */
export type AnyRecord = Project[RecordKind][string]

/** Changes to one record map, by id. */
export interface RecordDiff {
  readonly added: Readonly<Record<string, AnyRecord>>
  readonly updated: Readonly<Record<string, readonly [from: AnyRecord, to: AnyRecord]>>
  readonly removed: Readonly<Record<string, AnyRecord>>
}

/** Whole-value changes of the non-record fields (floors array, settings, grid, name, notes). */
export interface FieldDiff<T> {
  readonly from: T
  readonly to: T
}

/** A reversible change of a document. */
export interface DocDiff {
  readonly records: Partial<Record<RecordKind, RecordDiff>>
  readonly floors?: FieldDiff<Project['floors']>
  readonly settings?: FieldDiff<Project['settings']>
  readonly grid?: FieldDiff<Project['grid']>
  readonly name?: FieldDiff<Project['name']>
  readonly notes?: FieldDiff<Project['notes']>
}

/** One entry of a history stack. */
export type HistoryEntry =
  | { readonly type: 'mark'; readonly id: string; readonly label: string }
  | { readonly type: 'diff'; readonly diff: DocDiff }

/** Undo and redo stacks (bottom first). */
export interface HistoryState {
  readonly undos: readonly HistoryEntry[]
  readonly redos: readonly HistoryEntry[]
}

export const EMPTY_HISTORY: HistoryState = { undos: [], redos: [] }

type Fields = 'floors' | 'settings' | 'grid' | 'name' | 'notes'
const FIELDS: readonly Fields[] = ['floors', 'settings', 'grid', 'name', 'notes']

/** Differences from `a` to `b`, by record id (records compared by reference: commands never mutate). */
export function diffDocuments(a: Project, b: Project): DocDiff {
  const records: Partial<Record<RecordKind, RecordDiff>> = {}
  for (const kind of RECORD_KINDS) {
    const ma: Readonly<Record<string, AnyRecord>> = a[kind]
    const mb: Readonly<Record<string, AnyRecord>> = b[kind]
    if (ma === mb) continue
    const added: Record<string, AnyRecord> = {}
    const updated: Record<string, readonly [AnyRecord, AnyRecord]> = {}
    const removed: Record<string, AnyRecord> = {}
    let any = false
    for (const [id, rb] of Object.entries(mb)) {
      const ra = ma[id]
      if (ra === undefined) {
        added[id] = rb
        any = true
      } else if (ra !== rb) {
        updated[id] = [ra, rb]
        any = true
      }
    }
    for (const [id, ra] of Object.entries(ma)) {
      if (mb[id] === undefined) {
        removed[id] = ra
        any = true
      }
    }
    if (any) records[kind] = { added, updated, removed }
  }
  const diff: { -readonly [K in keyof DocDiff]: DocDiff[K] } = { records }
  for (const f of FIELDS) {
    if (a[f] !== b[f]) setField(diff, f, a[f], b[f])
  }
  return diff
}

function setField<F extends Fields>(
  diff: { -readonly [K in keyof DocDiff]: DocDiff[K] },
  f: F,
  from: Project[F],
  to: Project[F],
): void {
  ;(diff as Record<string, unknown>)[f] = { from, to }
}

/** True when the diff changes nothing. */
export function isEmptyDiff(diff: DocDiff): boolean {
  return Object.keys(diff.records).length === 0 && FIELDS.every((f) => diff[f] === undefined)
}

/** Ids of records the diff adds (all kinds). */
export function addedIds(diff: DocDiff): string[] {
  const ids: string[] = []
  for (const kind of RECORD_KINDS) {
    const r = diff.records[kind]
    if (r) for (const id of Object.keys(r.added)) ids.push(id)
  }
  return ids
}

/** The diff that undoes `diff`. */
export function invertDiff(diff: DocDiff): DocDiff {
  const records: Partial<Record<RecordKind, RecordDiff>> = {}
  for (const kind of RECORD_KINDS) {
    const r = diff.records[kind]
    if (!r) continue
    const updated: Record<string, readonly [AnyRecord, AnyRecord]> = {}
    for (const [id, [from, to]] of Object.entries(r.updated)) updated[id] = [to, from]
    records[kind] = { added: r.removed, updated, removed: r.added }
  }
  const out: { -readonly [K in keyof DocDiff]: DocDiff[K] } = { records }
  for (const f of FIELDS) {
    const d = diff[f] as FieldDiff<unknown> | undefined
    if (d) (out as Record<string, unknown>)[f] = { from: d.to, to: d.from }
  }
  return out
}

/** Apply a diff to a document (returns a new document; the input is not changed). */
export function applyDiff(doc: Project, diff: DocDiff): Project {
  const next: Record<string, unknown> = { ...doc }
  for (const kind of RECORD_KINDS) {
    const r = diff.records[kind]
    if (!r) continue
    const map: Record<string, AnyRecord> = { ...doc[kind] }
    for (const id of Object.keys(r.removed)) delete map[id]
    for (const [id, [, to]] of Object.entries(r.updated)) map[id] = to
    for (const [id, rec] of Object.entries(r.added)) map[id] = rec
    next[kind] = map
  }
  for (const f of FIELDS) {
    const d = diff[f] as FieldDiff<unknown> | undefined
    if (!d) continue
    if (d.to === undefined) delete next[f]
    else next[f] = d.to
  }
  return next as unknown as Project
}

const ABSENT = Symbol('absent')
type Slot = AnyRecord | typeof ABSENT

/** One diff with the effect of `a` followed by `b`. */
export function composeDiffs(a: DocDiff, b: DocDiff): DocDiff {
  const records: Partial<Record<RecordKind, RecordDiff>> = {}
  for (const kind of RECORD_KINDS) {
    const ra = a.records[kind]
    const rb = b.records[kind]
    if (!ra || !rb) {
      const only = ra ?? rb
      if (only) records[kind] = only
      continue
    }
    const before = new Map<string, Slot>()
    const after = new Map<string, Slot>()
    const note = (r: RecordDiff, first: boolean): void => {
      for (const [id, rec] of Object.entries(r.added)) {
        if (first || !before.has(id)) before.set(id, ABSENT)
        after.set(id, rec)
      }
      for (const [id, [from, to]] of Object.entries(r.updated)) {
        if (first || !before.has(id)) before.set(id, from)
        after.set(id, to)
      }
      for (const [id, rec] of Object.entries(r.removed)) {
        if (first || !before.has(id)) before.set(id, rec)
        after.set(id, ABSENT)
      }
    }
    note(ra, true)
    note(rb, false)
    const added: Record<string, AnyRecord> = {}
    const updated: Record<string, readonly [AnyRecord, AnyRecord]> = {}
    const removed: Record<string, AnyRecord> = {}
    let any = false
    for (const [id, from] of before) {
      const to = after.get(id) ?? ABSENT
      if (from === to) continue
      any = true
      if (from === ABSENT) added[id] = to as AnyRecord
      else if (to === ABSENT) removed[id] = from
      else updated[id] = [from, to]
    }
    if (any) records[kind] = { added, updated, removed }
  }
  const out: { -readonly [K in keyof DocDiff]: DocDiff[K] } = { records }
  for (const f of FIELDS) {
    const da = a[f] as FieldDiff<unknown> | undefined
    const db = b[f] as FieldDiff<unknown> | undefined
    if (!da && !db) continue
    const from = da ? da.from : (db as FieldDiff<unknown>).from
    const to = db ? db.to : (da as FieldDiff<unknown>).to
    if (from !== to) (out as Record<string, unknown>)[f] = { from, to }
  }
  return out
}

/** Push a diff: merged into the top diff when no mark lies between; the redo stack is cleared. */
export function pushDiff(history: HistoryState, diff: DocDiff): HistoryState {
  const top = history.undos[history.undos.length - 1]
  if (top && top.type === 'diff') {
    const merged = composeDiffs(top.diff, diff)
    const rest = history.undos.slice(0, -1)
    return { undos: isEmptyDiff(merged) ? rest : [...rest, { type: 'diff', diff: merged }], redos: [] }
  }
  return { undos: [...history.undos, { type: 'diff', diff }], redos: [] }
}

/** Push a mark: the start of a new undo step (the redo stack is kept until a change is pushed). */
export function pushMark(history: HistoryState, id: string, label: string): HistoryState {
  return { undos: [...history.undos, { type: 'mark', id, label }], redos: history.redos }
}

/** The result of stepping history: the new document (or null if nothing changed) and stacks. */
export interface HistoryStep {
  readonly doc: Project | null
  readonly history: HistoryState
}

/**
 * Undo one step: revert diffs down to and including the nearest mark that has a change after it
 * (empty marks are skipped), moving them onto the redo stack.
 */
export function undoStep(doc: Project, history: HistoryState): HistoryStep {
  const undos = [...history.undos]
  const moved: HistoryEntry[] = []
  let current = doc
  let changed = false
  while (undos.length > 0) {
    const entry = undos.pop() as HistoryEntry
    moved.push(entry)
    if (entry.type === 'diff') {
      current = applyDiff(current, invertDiff(entry.diff))
      changed = true
    } else if (changed) {
      break
    }
  }
  if (!changed) return { doc: null, history }
  return { doc: current, history: { undos, redos: [...history.redos, ...moved] } }
}

/** Redo one step: re-apply from the redo stack up to (not including) the next mark with changes. */
export function redoStep(doc: Project, history: HistoryState): HistoryStep {
  const redos = [...history.redos]
  const moved: HistoryEntry[] = []
  let current = doc
  let changed = false
  while (redos.length > 0) {
    const entry = redos[redos.length - 1] as HistoryEntry
    if (entry.type === 'mark' && changed) break
    redos.pop()
    moved.push(entry)
    if (entry.type === 'diff') {
      current = applyDiff(current, entry.diff)
      changed = true
    }
  }
  if (!changed) return { doc: null, history }
  return { doc: current, history: { undos: [...history.undos, ...moved], redos } }
}

/**
 * Revert everything after mark `id` (the latest mark when absent) and drop the mark; the redo stack
 * is not touched by the reverted changes.
 */
export function bailStep(doc: Project, history: HistoryState, id?: string): HistoryStep {
  const index = findMark(history, id)
  if (index < 0) return { doc: null, history }
  let current = doc
  let changed = false
  for (let i = history.undos.length - 1; i > index; i--) {
    const entry = history.undos[i] as HistoryEntry
    if (entry.type === 'diff') {
      current = applyDiff(current, invertDiff(entry.diff))
      changed = true
    }
  }
  return {
    doc: changed ? current : null,
    history: { undos: history.undos.slice(0, index), redos: history.redos },
  }
}

/** Merge everything after mark `id` (the latest mark when absent) into one diff, dropping inner marks. */
export function squashStep(history: HistoryState, id?: string): HistoryState {
  const index = findMark(history, id)
  if (index < 0) return history
  let merged: DocDiff | null = null
  for (let i = index + 1; i < history.undos.length; i++) {
    const entry = history.undos[i] as HistoryEntry
    if (entry.type === 'diff') merged = merged ? composeDiffs(merged, entry.diff) : entry.diff
  }
  const head = history.undos.slice(0, index + 1)
  return {
    undos: merged && !isEmptyDiff(merged) ? [...head, { type: 'diff', diff: merged }] : head,
    redos: history.redos,
  }
}

function findMark(history: HistoryState, id?: string): number {
  for (let i = history.undos.length - 1; i >= 0; i--) {
    const entry = history.undos[i] as HistoryEntry
    if (entry.type === 'mark' && (id === undefined || entry.id === id)) return i
  }
  return -1
}

/** True when an undo would change the document. */
export function hasUndo(history: HistoryState): boolean {
  return history.undos.some((e) => e.type === 'diff')
}

/** True when a redo would change the document. */
export function hasRedo(history: HistoryState): boolean {
  return history.redos.some((e) => e.type === 'diff')
}
