import type { ToolDefinition } from '../types'
import { SlabDrawing } from './Drawing'
import { SlabIdle } from './Idle'

/** Draws a slab outline vertex by vertex on the current floor (its typical floor when linked). */
export const slabTool: ToolDefinition = { id: 'slab', initial: 'idle', states: { idle: SlabIdle, drawing: SlabDrawing } }
