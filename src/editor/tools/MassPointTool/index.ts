import type { ToolDefinition } from '../types'
import { MassPointIdle } from './Idle'

/** Places point masses by clicking. */
export const massPointTool: ToolDefinition = { id: 'mass-point', initial: 'idle', states: { idle: MassPointIdle } }
