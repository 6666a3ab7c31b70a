import type { ToolDefinition } from '../types'
import { WallDrawing } from './Drawing'
import { WallIdle } from './Idle'

/** Draws a shear wall by two clicks (or a click and a numeric entry); it spans the whole height. */
export const wallTool: ToolDefinition = {
  id: 'wall',
  initial: 'idle',
  states: { idle: WallIdle, drawing: WallDrawing },
}
