import type { ToolDefinition } from '../types'
import { PickBoxing } from './Boxing'
import { PickIdle } from './Idle'
import { PickMoving } from './Moving'
import { PickPressing } from './Pressing'
import { PickReshaping } from './Reshaping'
import { PickStretching } from './Stretching'
import { PickTurning } from './Turning'

/**
 * Selecting and changing elements: click (Shift adds/removes), box from empty space, drag to move,
 * drag a wall or frame end to stretch it, drag a selected slab's vertex to reshape it, drag the rotation handle to turn the selection, Delete
 * removes it, a numeric entry moves it by an exact offset.
 */
export const pickTool: ToolDefinition = {
  id: 'pick',
  initial: 'idle',
  states: {
    idle: PickIdle,
    pressing: PickPressing,
    moving: PickMoving,
    stretching: PickStretching,
    reshaping: PickReshaping,
    turning: PickTurning,
    boxing: PickBoxing,
  },
}
