import type { ToolDefinition } from '../types'
import { MassLineDrawing } from './Drawing'
import { MassLineIdle } from './Idle'

/** Draws a line mass (facade, partition) as a polyline on the current floor. */
export const massLineTool: ToolDefinition = {
  id: 'mass-line',
  initial: 'idle',
  states: { idle: MassLineIdle, drawing: MassLineDrawing },
}
