/**
 * The action table: every toolbar button and keyboard shortcut comes from one list of
 * { id, label, shortcut, canRun, run }. Actions call editor functions and UI callbacks only.
 */
import { dispatch, redo, selectCanRedo, selectCanUndo, setTool, undo, execute } from '@/editor'
import type { EditorStore, ToolId } from '@/editor'

/** What actions can reach besides the store. */
export interface ActionContext {
  readonly store: EditorStore
  readonly openFile: () => void
  readonly saveFile: () => void
  readonly startFromDemo: () => void
  readonly startBlank: () => void
  readonly fit: () => void
  readonly toggleOverlays: () => void
  readonly toggleUnits: () => void
}

export type ActionGroup = 'file' | 'edit' | 'tool' | 'view'

export interface Action {
  readonly id: string
  readonly label: string
  readonly group: ActionGroup
  /** Shown on the button, e.g. "Ctrl+Z". */
  readonly shortcut?: string
  /** Key matchers; the first that matches runs the action. */
  readonly keys?: readonly KeyMatch[]
  /** For tools: the tool it activates (the button shows pressed while active). */
  readonly tool?: ToolId
  readonly canRun: (ctx: ActionContext) => boolean
  readonly run: (ctx: ActionContext) => void
}

export interface KeyMatch {
  /** KeyboardEvent.key, compared case-insensitively. */
  readonly key: string
  /** Ctrl or Cmd. */
  readonly mod?: boolean
  readonly shift?: boolean
}

const always = (): boolean => true

const toolAction = (tool: ToolId, label: string, key: string): Action => ({
  id: `tool-${tool}`,
  label,
  group: 'tool',
  shortcut: key.toUpperCase(),
  keys: [{ key }],
  tool,
  canRun: always,
  run: (ctx) => setTool(ctx.store, tool),
})

export const ACTIONS: readonly Action[] = [
  { id: 'open', label: 'Open…', group: 'file', shortcut: 'Ctrl+O', keys: [{ key: 'o', mod: true }], canRun: always, run: (c) => c.openFile() },
  { id: 'save', label: 'Save', group: 'file', shortcut: 'Ctrl+S', keys: [{ key: 's', mod: true }], canRun: always, run: (c) => c.saveFile() },
  { id: 'new', label: 'New', group: 'file', canRun: always, run: (c) => c.startBlank() },
  { id: 'demo', label: 'Start from demo', group: 'file', canRun: always, run: (c) => c.startFromDemo() },
  {
    id: 'undo',
    label: 'Undo',
    group: 'edit',
    shortcut: 'Ctrl+Z',
    keys: [{ key: 'z', mod: true, shift: false }],
    canRun: (c) => selectCanUndo(c.store.getState()),
    run: (c) => {
      cancelGesture(c.store)
      undo(c.store)
    },
  },
  {
    id: 'redo',
    label: 'Redo',
    group: 'edit',
    shortcut: 'Ctrl+Shift+Z',
    keys: [
      { key: 'z', mod: true, shift: true },
      { key: 'y', mod: true },
    ],
    canRun: (c) => selectCanRedo(c.store.getState()),
    run: (c) => {
      cancelGesture(c.store)
      redo(c.store)
    },
  },
  {
    id: 'delete',
    label: 'Delete',
    group: 'edit',
    shortcut: 'Del',
    keys: [{ key: 'Delete' }, { key: 'Backspace' }],
    canRun: (c) => c.store.getState().selection.length > 0,
    run: (c) => {
      const ids = c.store.getState().selection
      cancelGesture(c.store)
      execute(c.store, 'deleteElements', { ids })
    },
  },
  {
    id: 'cancel',
    label: 'Cancel',
    group: 'edit',
    shortcut: 'Esc',
    keys: [{ key: 'Escape' }],
    canRun: always,
    run: (c) => dispatch(c.store, { type: 'key', key: 'Escape' }),
  },
  toolAction('pick', 'Pick', 'v'),
  toolAction('wall', 'Wall', 'w'),
  toolAction('frame', 'Frame line', 'f'),
  toolAction('column', 'Column', 'c'),
  toolAction('slab', 'Slab', 's'),
  toolAction('opening', 'Opening', 'o'),
  toolAction('mass-point', 'Point mass', 'm'),
  toolAction('mass-line', 'Line mass', 'l'),
  { id: 'fit', label: 'Fit', group: 'view', shortcut: 'Home', keys: [{ key: 'Home' }], canRun: always, run: (c) => c.fit() },
  { id: 'overlays', label: 'Centres', group: 'view', shortcut: 'G', keys: [{ key: 'g' }], canRun: always, run: (c) => c.toggleOverlays() },
  { id: 'units', label: 'Units', group: 'view', shortcut: 'U', keys: [{ key: 'u' }], canRun: always, run: (c) => c.toggleUnits() },
]

/** A gesture in progress is bailed before undo, redo or delete (one undo step per gesture). */
function cancelGesture(store: EditorStore): void {
  if (store.getState().tool.state !== 'idle') dispatch(store, { type: 'cancel' })
}

/** The action a key press asks for, or null. Plain letter keys need no modifier held. */
export function actionForKey(
  e: { key: string; ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean },
  actions: readonly Action[] = ACTIONS,
): Action | null {
  const mod = e.ctrlKey || e.metaKey
  for (const action of actions) {
    for (const k of action.keys ?? []) {
      if (k.key.toLowerCase() !== e.key.toLowerCase()) continue
      if (Boolean(k.mod) !== mod) continue
      if (k.shift !== undefined && k.shift !== e.shiftKey) continue
      return action
    }
  }
  return null
}
