import { mark } from '../../store'
import { distance } from '../shared'
import type { ToolStateNode } from '../types'
import { applyMove } from './Moving'

/** Pressed on an element: a release is a click; moving past the tolerance starts a drag. */
export const PickPressing: ToolStateNode = {
  id: 'pressing',
  onPointerMove(ctx, e) {
    const { origin, pressedId } = ctx.memory()
    if (!origin || distance(origin, e.point) <= ctx.tolerance(e)) return
    const markId = mark(ctx.store, 'move')
    ctx.transition('moving', {
      origin,
      ...(pressedId === undefined ? {} : { pressedId }),
      markId,
      applied: { dx: 0, dy: 0, angle: 0 },
    })
    applyMove(ctx, e)
  },
  onPointerUp(ctx) {
    ctx.transition('idle', {})
  },
  onCancel(ctx) {
    ctx.transition('idle', {})
  },
}
