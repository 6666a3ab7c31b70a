/**
 * The editor store: one vanilla zustand store per plan editor holding the document, its revision, the
 * selection, the current floor, the active tool and short-lived gesture state. Actions are module-level
 * functions taking the store (usable from tools, tests and the CLI without React).
 */
import { createStore } from 'zustand/vanilla'
import type { StoreApi } from 'zustand/vanilla'
import type { FloorId, Point, Project } from '@/model'
import { floorIndex } from '@/model'
import type { CommandArgs, CommandName } from './commands/index'
import { commands } from './commands/index'
import type { ElementDefaults } from './commands/defaults'
import { ELEMENT_DEFAULTS } from './commands/defaults'
import { kindOf } from './commands/records'
import type { CommandOutcome } from './commands/result'
import { isRefusal } from './commands/result'
import type { SnapOptions, SnapResult } from './geometry/snap'
import { DEFAULT_SNAP } from './geometry/snap'
import type { Readout } from './geometry/readout'
import type { HistoryState } from './history'
import {
  EMPTY_HISTORY,
  addedIds,
  bailStep,
  diffDocuments,
  hasRedo,
  hasUndo,
  isEmptyDiff,
  pushDiff,
  pushMark,
  redoStep,
  squashStep,
  undoStep,
} from './history'

/** Tool ids (plain words of our own). */
export const TOOL_IDS = ['pick', 'wall', 'frame', 'column', 'slab', 'opening', 'mass-point', 'mass-line'] as const
export type ToolId = (typeof TOOL_IDS)[number]

/** Private memory of the active tool's gesture (not history, not saved). */
export interface ToolMemory {
  /** Where the gesture started (pointer down, first click), m. */
  readonly origin?: Point
  /** Vertices placed so far (slab, opening, line mass), m. */
  readonly points?: readonly Point[]
  /** History mark of the gesture, for bail on cancel. */
  readonly markId?: string
  /** The record pressed on (pick tool). */
  readonly pressedId?: string
  /** Wall or frame line end being stretched. */
  readonly handle?: { readonly id: string; readonly end: 'p1' | 'p2' }
  /** Slab outline vertex being dragged (pick tool). */
  readonly vertex?: { readonly slab: string; readonly index: number }
  /** Centre of a rotation, m. */
  readonly pivot?: Point
  /** Pointer angle about the pivot when the turn started, rad. */
  readonly startAngle?: number
  /** Offset or angle applied so far in this gesture (m, m / rad). */
  readonly applied?: { readonly dx: number; readonly dy: number; readonly angle: number }
  /** Shift was held at pointer down. */
  readonly shift?: boolean
  /** Selection before a box selection started (shift-box adds to it). */
  readonly baseSelection?: readonly string[]
}

/** The active tool and the state of its state machine. */
export interface ToolState {
  readonly id: ToolId
  /** State id within the tool, e.g. 'idle', 'drawing', 'moving'. */
  readonly state: string
  readonly memory: ToolMemory
}

/** Geometry being drawn, for the plan view to render (not in the document yet). */
export type Draft =
  | { readonly kind: 'segment'; readonly tool: ToolId; readonly p1: Point; readonly p2: Point }
  | { readonly kind: 'polyline'; readonly tool: ToolId; readonly points: readonly Point[]; readonly closed: boolean }
  | { readonly kind: 'point'; readonly tool: ToolId; readonly at: Point }
  | { readonly kind: 'box'; readonly min: Point; readonly max: Point }
  | { readonly kind: 'rotate'; readonly pivot: Point; readonly angle: number }

/** Short-lived view state of the current gesture (never history). */
export interface Ephemeral {
  /** Record id under the pointer. */
  readonly hover: string | null
  /** Snap target shown under the pointer. */
  readonly snap: SnapResult | null
  readonly draft: Draft | null
  /** Live length/angle (drawing) or offset (dragging) readout. */
  readonly readout: Readout | null
  /** Last pointer position, m. */
  readonly pointer: Point | null
}

export const EMPTY_EPHEMERAL: Ephemeral = { hover: null, snap: null, draft: null, readout: null, pointer: null }

/** Snap settings kept in the store; `tolerance` is the fallback when events carry none. */
export type SnapSettings = Omit<SnapOptions, 'exclude'> & {
  /** Snapping on at all (Alt on an event suspends it for that event). */
  readonly enabled: boolean
}

export interface EditorState {
  readonly doc: Project
  /** Increments on every document change (command, undo, redo, bail, load); results key on it. */
  readonly revision: number
  /** Selected record ids. */
  readonly selection: readonly string[]
  readonly currentFloor: FloorId
  readonly tool: ToolState
  readonly ephemeral: Ephemeral
  readonly history: HistoryState
  readonly snapping: SnapSettings
  /** Property values for new elements drawn by tools. */
  readonly defaults: ElementDefaults
  /** Last refusal or entry problem, for the UI to show; cleared by the next successful change. */
  readonly message: string | null
}

export type EditorStore = StoreApi<EditorState>

/** Create a store on a project (the current floor is the first one). */
export function createEditorStore(project: Project): EditorStore {
  const first = project.floors[0]
  if (!first) throw new RangeError('[editor] createEditorStore: a project needs at least one floor')
  return createStore<EditorState>()(() => ({
    doc: project,
    revision: 0,
    selection: [],
    currentFloor: first.id,
    tool: { id: 'pick', state: 'idle', memory: {} },
    ephemeral: EMPTY_EPHEMERAL,
    history: EMPTY_HISTORY,
    snapping: { ...DEFAULT_SNAP, tolerance: 0.25, enabled: true },
    defaults: ELEMENT_DEFAULTS,
    message: null,
  }))
}

/** Outcome of `execute`. */
export type ExecuteResult =
  | { readonly ok: true; readonly changed: boolean; readonly created: readonly string[] }
  | { readonly ok: false; readonly message: string }

/** Options of `execute`. */
export interface ExecuteOptions {
  /** Select the records the command created (default false). */
  readonly select?: boolean
}

/**
 * Run a command by name and record its diff in history (merged with earlier diffs since the last
 * mark). A refusal leaves the document as it was and sets `message`.
 */
export function execute<N extends CommandName>(
  store: EditorStore,
  name: N,
  args: CommandArgs<N>,
  options: ExecuteOptions = {},
): ExecuteResult {
  const command = commands[name] as (doc: Project, a: CommandArgs<N>) => CommandOutcome
  if (!command) throw new Error(`[editor] execute: unknown command "${String(name)}"`)
  const state = store.getState()
  const outcome = command(state.doc, args)
  if (isRefusal(outcome)) {
    store.setState({ message: outcome.message })
    return { ok: false, message: outcome.message }
  }
  if (outcome === state.doc) return { ok: true, changed: false, created: [] }
  const diff = diffDocuments(state.doc, outcome)
  if (isEmptyDiff(diff)) return { ok: true, changed: false, created: [] }
  const created = addedIds(diff)
  commitDoc(store, outcome, pushDiff(state.history, diff))
  if (options.select && created.length > 0) setSelection(store, created)
  return { ok: true, changed: true, created }
}

/** Replace doc and history together, bump the revision, and repair selection and current floor. */
function commitDoc(store: EditorStore, doc: Project, history: HistoryState): void {
  const state = store.getState()
  const selection = state.selection.filter((id) => kindOf(doc, id) !== null)
  store.setState({
    doc,
    history,
    revision: state.revision + 1,
    selection: selection.length === state.selection.length ? state.selection : selection,
    currentFloor: repairFloor(state.doc, doc, state.currentFloor),
    message: null,
  })
}

function repairFloor(before: Project, after: Project, floor: FloorId): FloorId {
  if (floorIndex(after, floor) >= 0) return floor
  const old = Math.max(0, floorIndex(before, floor))
  const f = after.floors[Math.min(old, after.floors.length - 1)] ?? after.floors[0]
  return f ? f.id : floor
}

let markCounter = 0

/** Start a new undo step (call at the start of every user interaction); returns the mark id. */
export function mark(store: EditorStore, label = 'edit'): string {
  markCounter += 1
  const id = `mark${markCounter}`
  store.setState({ history: pushMark(store.getState().history, id, label) })
  return id
}

/** Undo one step. Returns false when there was nothing to undo. */
export function undo(store: EditorStore): boolean {
  const { doc, history } = store.getState()
  const step = undoStep(doc, history)
  if (!step.doc) return false
  commitDoc(store, step.doc, step.history)
  return true
}

/** Redo one step. Returns false when there was nothing to redo. */
export function redo(store: EditorStore): boolean {
  const { doc, history } = store.getState()
  const step = redoStep(doc, history)
  if (!step.doc) return false
  commitDoc(store, step.doc, step.history)
  return true
}

/** Return to mark `markId` (default: the latest mark), dropping it; nothing goes on the redo stack. */
export function bail(store: EditorStore, markId?: string): void {
  const { doc, history } = store.getState()
  const step = bailStep(doc, history, markId)
  if (step.doc) commitDoc(store, step.doc, step.history)
  else store.setState({ history: step.history })
}

/** Merge everything after mark `markId` (default: the latest) into a single undo step. */
export function squash(store: EditorStore, markId?: string): void {
  store.setState({ history: squashStep(store.getState().history, markId) })
}

/** Replace the selection (unknown ids are dropped; order kept, duplicates removed). */
export function setSelection(store: EditorStore, ids: readonly string[]): void {
  const { doc } = store.getState()
  const unique = [...new Set(ids)].filter((id) => kindOf(doc, id) !== null)
  store.setState({ selection: unique })
}

/** Switch the floor shown on the plan (not history). */
export function setCurrentFloor(store: EditorStore, floor: FloorId): void {
  const { doc } = store.getState()
  if (floorIndex(doc, floor) < 0) throw new Error(`[editor] setCurrentFloor: unknown floor "${floor}"`)
  store.setState({ currentFloor: floor, selection: [], ephemeral: EMPTY_EPHEMERAL })
}

/**
 * Replace the whole document (file open, autosave restore): history is cleared, the revision bumps,
 * selection is emptied and the current floor kept when it still exists. The project must already be
 * validated (see `parseProject`).
 */
export function loadDocument(store: EditorStore, project: Project): void {
  const first = project.floors[0]
  if (!first) throw new RangeError('[editor] loadDocument: a project needs at least one floor')
  const state = store.getState()
  store.setState({
    doc: project,
    revision: state.revision + 1,
    history: EMPTY_HISTORY,
    selection: [],
    currentFloor: floorIndex(project, state.currentFloor) >= 0 ? state.currentFloor : first.id,
    tool: { id: state.tool.id, state: 'idle', memory: {} },
    ephemeral: EMPTY_EPHEMERAL,
    message: null,
  })
}

/** Change snap settings (tolerance fallback, which targets). */
export function setSnapping(store: EditorStore, patch: Partial<SnapSettings>): void {
  store.setState({ snapping: { ...store.getState().snapping, ...patch } })
}

/** Change the property values given to new elements. */
export function setDefaults(store: EditorStore, patch: Partial<ElementDefaults>): void {
  store.setState({ defaults: { ...store.getState().defaults, ...patch } })
}

/** Clear the shown message. */
export function clearMessage(store: EditorStore): void {
  store.setState({ message: null })
}

/** Set the message (e.g. a numeric entry problem) without changing the document. */
export function setMessage(store: EditorStore, message: string): void {
  store.setState({ message })
}

export function selectCanUndo(state: EditorState): boolean {
  return hasUndo(state.history)
}

export function selectCanRedo(state: EditorState): boolean {
  return hasRedo(state.history)
}
