import type { PointerInput } from '../../events'
import { EMPTY_EPHEMERAL, execute } from '../../store'
import { cancelGesture } from '../shared'
import type { ToolContext, ToolStateNode } from '../types'

/** Shift holds the turn to multiples of this, rad (15°). */
const TURN_STEP = Math.PI / 12

function turn(ctx: ToolContext, e: PointerInput): void {
  const { pivot, startAngle, applied } = ctx.memory()
  if (!pivot || startAngle === undefined) return
  const done = applied ?? { dx: 0, dy: 0, angle: 0 }
  let angle = Math.atan2(e.point.y - pivot.y, e.point.x - pivot.x) - startAngle
  // Keep the turn continuous across the -pi/pi seam.
  while (angle - done.angle > Math.PI) angle -= 2 * Math.PI
  while (angle - done.angle < -Math.PI) angle += 2 * Math.PI
  if (e.shift) angle = Math.round(angle / TURN_STEP) * TURN_STEP
  const { selection } = ctx.state()
  const result = execute(ctx.store, 'rotateElements', { ids: selection, center: pivot, angle: angle - done.angle })
  const total = result.ok ? angle : done.angle
  if (result.ok) ctx.remember({ applied: { dx: 0, dy: 0, angle } })
  ctx.setEphemeral({
    draft: { kind: 'rotate', pivot, angle: total },
    readout: { length: 0, angle: total, dx: 0, dy: 0 },
  })
}

/** Dragging the rotation handle: the selection turns about its box centre; Escape puts it back. */
export const PickTurning: ToolStateNode = {
  id: 'turning',
  onPointerMove: turn,
  onPointerUp(ctx, e) {
    turn(ctx, e)
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: e.point })
    ctx.transition('idle', {})
  },
  onCancel: (ctx) => cancelGesture(ctx),
}
