import type { ToolDefinition } from '../types'
import { FrameDrawing } from './Drawing'
import { FrameIdle } from './Idle'

/** Draws a frame line by two clicks (or a click and a numeric entry); it spans the whole height. */
export const frameTool: ToolDefinition = {
  id: 'frame',
  initial: 'idle',
  states: { idle: FrameIdle, drawing: FrameDrawing },
}
