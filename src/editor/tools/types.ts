/** Tool state machines: a tool is a set of states; events go to the current state's handlers. */
import type { KeyInput, NumericInput, PointerInput } from '../events'
import type { SnapResult } from '../geometry/snap'
import type { EditorState, EditorStore, Ephemeral, ToolId, ToolMemory } from '../store'

/** What a state handler can do. */
export interface ToolContext {
  readonly store: EditorStore
  /** Current store state (fresh on every call). */
  state(): EditorState
  memory(): ToolMemory
  /** Merge into the tool memory. */
  remember(patch: Partial<ToolMemory>): void
  /** Leave the current state (onExit), enter `to` with `memory` (onEnter). */
  transition(to: string, memory?: ToolMemory): void
  /** Pick tolerance of an event (its own, else the store's), m. */
  tolerance(e?: PointerInput): number
  /** Snap an event's point on the current floor (Alt or disabled snapping: no snap). */
  snap(e: PointerInput, exclude?: readonly string[]): SnapResult
  setEphemeral(patch: Partial<Ephemeral>): void
}

/** One state of a tool. Every state handles cancel (Escape arrives as onCancel). */
export interface ToolStateNode {
  readonly id: string
  onEnter?(ctx: ToolContext, from: string | null): void
  onExit?(ctx: ToolContext, to: string | null): void
  onPointerDown?(ctx: ToolContext, e: PointerInput): void
  onPointerMove?(ctx: ToolContext, e: PointerInput): void
  onPointerUp?(ctx: ToolContext, e: PointerInput): void
  onKey?(ctx: ToolContext, e: KeyInput): void
  onNumeric?(ctx: ToolContext, e: NumericInput): void
  onCancel(ctx: ToolContext): void
}

/** A tool: its id, the state it starts in, and its states by id. */
export interface ToolDefinition {
  readonly id: ToolId
  readonly initial: string
  readonly states: Readonly<Record<string, ToolStateNode>>
}
