import type { ToolDefinition } from '../types'
import { OpeningDrawing } from './Drawing'
import { OpeningIdle } from './Idle'

/** Cuts an opening into the slab that holds its first vertex. */
export const openingTool: ToolDefinition = {
  id: 'opening',
  initial: 'idle',
  states: { idle: OpeningIdle, drawing: OpeningDrawing },
}
