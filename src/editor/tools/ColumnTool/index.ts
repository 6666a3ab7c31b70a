import type { ToolDefinition } from '../types'
import { ColumnIdle } from './Idle'

/** Places columns by clicking; they span the whole height. */
export const columnTool: ToolDefinition = { id: 'column', initial: 'idle', states: { idle: ColumnIdle } }
