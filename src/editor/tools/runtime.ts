/** Running tools: event dispatch, tool switching and the context handed to states. */
import type { EditorEvent, PointerInput } from '../events'
import { snapPoint } from '../geometry/snap'
import type { SnapResult } from '../geometry/snap'
import type { EditorStore, ToolId, ToolMemory } from '../store'
import { EMPTY_EPHEMERAL } from '../store'
import { columnTool } from './ColumnTool/index'
import { frameTool } from './FrameTool/index'
import { massLineTool } from './MassLineTool/index'
import { massPointTool } from './MassPointTool/index'
import { openingTool } from './OpeningTool/index'
import { pickTool } from './PickTool/index'
import { slabTool } from './SlabTool/index'
import type { ToolContext, ToolDefinition, ToolStateNode } from './types'
import { wallTool } from './WallTool/index'

/** All tools by id. */
export const TOOLS: Readonly<Record<ToolId, ToolDefinition>> = {
  pick: pickTool,
  wall: wallTool,
  frame: frameTool,
  column: columnTool,
  slab: slabTool,
  opening: openingTool,
  'mass-point': massPointTool,
  'mass-line': massLineTool,
}

function currentNode(store: EditorStore): ToolStateNode {
  const { tool } = store.getState()
  const def = TOOLS[tool.id]
  const node = def.states[tool.state]
  if (!node) throw new Error(`[editor] tool ${tool.id}: unknown state "${tool.state}"`)
  return node
}

/** The context a state's handlers receive. */
export function createToolContext(store: EditorStore): ToolContext {
  const ctx: ToolContext = {
    store,
    state: () => store.getState(),
    memory: () => store.getState().tool.memory,
    remember: (patch) => {
      const { tool } = store.getState()
      store.setState({ tool: { ...tool, memory: { ...tool.memory, ...patch } } })
    },
    transition: (to, memory: ToolMemory = {}) => {
      const { tool } = store.getState()
      const def = TOOLS[tool.id]
      const next = def.states[to]
      if (!next) throw new Error(`[editor] tool ${tool.id}: unknown state "${to}"`)
      const from = tool.state
      def.states[from]?.onExit?.(ctx, to)
      store.setState({ tool: { id: tool.id, state: to, memory } })
      next.onEnter?.(ctx, from)
    },
    tolerance: (e?: PointerInput) => e?.tolerance ?? store.getState().snapping.tolerance,
    snap: (e: PointerInput, exclude?: readonly string[]): SnapResult => {
      const { doc, currentFloor, snapping } = store.getState()
      if (e.alt || !snapping.enabled) return { point: { x: e.point.x, y: e.point.y }, kind: 'none' }
      return snapPoint(doc, currentFloor, e.point, {
        ...snapping,
        tolerance: ctx.tolerance(e),
        ...(exclude === undefined ? {} : { exclude }),
      })
    },
    setEphemeral: (patch) => store.setState({ ephemeral: { ...store.getState().ephemeral, ...patch } }),
  }
  return ctx
}

/**
 * Send an input event to the active tool's current state. Escape (as a key) and 'cancel' both call
 * the state's onCancel, which bails the gesture.
 */
export function dispatch(store: EditorStore, event: EditorEvent): void {
  const ctx = createToolContext(store)
  const node = currentNode(store)
  switch (event.type) {
    case 'pointerDown':
      ctx.setEphemeral({ pointer: event.point })
      node.onPointerDown?.(ctx, event)
      return
    case 'pointerMove':
      ctx.setEphemeral({ pointer: event.point })
      node.onPointerMove?.(ctx, event)
      return
    case 'pointerUp':
      ctx.setEphemeral({ pointer: event.point })
      node.onPointerUp?.(ctx, event)
      return
    case 'key':
      if (event.key === 'Escape') node.onCancel(ctx)
      else node.onKey?.(ctx, event)
      return
    case 'cancel':
      node.onCancel(ctx)
      return
    case 'numeric':
      node.onNumeric?.(ctx, event)
      return
    default: {
      const never: never = event
      throw new Error(`[editor] dispatch: unknown event ${JSON.stringify(never)}`)
    }
  }
}

/** Switch tool: a gesture in progress is cancelled (bailed) first; the new tool starts in its initial state. */
export function setTool(store: EditorStore, id: ToolId): void {
  const def = TOOLS[id]
  if (!def) throw new Error(`[editor] setTool: unknown tool "${String(id)}"`)
  const ctx = createToolContext(store)
  const { tool } = store.getState()
  const currentDef = TOOLS[tool.id]
  if (tool.state !== currentDef.initial) currentNode(store).onCancel(ctx)
  const after = store.getState().tool
  TOOLS[after.id].states[after.state]?.onExit?.(ctx, null)
  store.setState({
    tool: { id, state: def.initial, memory: {} },
    ephemeral: { ...EMPTY_EPHEMERAL, pointer: store.getState().ephemeral.pointer },
  })
  def.states[def.initial]?.onEnter?.(ctx, null)
}

/** Bring the active tool back to its initial state, cancelling any gesture (e.g. after loadDocument). */
export function resetTool(store: EditorStore): void {
  setTool(store, store.getState().tool.id)
}
