import type { Point } from '@/model'
import type { PointerInput } from '../../events'
import { recordPoints } from '../../geometry/bounds'
import { segmentReadout } from '../../geometry/readout'
import { constrainAngle } from '../../geometry/snap'
import { EMPTY_EPHEMERAL, execute } from '../../store'
import { cancelGesture, distance } from '../shared'
import type { ToolContext, ToolStateNode } from '../types'

/**
 * Move the selection so the pressed element's key point nearest the press follows the pointer and
 * snaps (to the grid and to other elements, never to the moving ones). Shift holds the move to 45°
 * steps. Applied as increments inside the gesture's one undo step.
 */
export function applyMove(ctx: ToolContext, e: PointerInput): void {
  const { origin, pressedId, applied } = ctx.memory()
  if (!origin) return
  const { doc, selection } = ctx.state()
  const done = applied ?? { dx: 0, dy: 0, angle: 0 }
  // Key point of the pressed record as it was at the press (undo the part already applied).
  let anchor: Point = origin
  if (pressedId !== undefined) {
    let best = Infinity
    for (const q of recordPoints(doc, pressedId)) {
      const p = { x: q.x - done.dx, y: q.y - done.dy }
      const d = distance(p, origin)
      if (d < best) {
        best = d
        anchor = p
      }
    }
  }
  const raw = { x: anchor.x + e.point.x - origin.x, y: anchor.y + e.point.y - origin.y }
  const snapped = ctx.snap({ ...e, point: raw }, selection).point
  const target = e.shift ? constrainAngle(anchor, snapped, Math.PI / 4) : snapped
  const dx = target.x - anchor.x
  const dy = target.y - anchor.y
  const result = execute(ctx.store, 'moveElements', { ids: selection, dx: dx - done.dx, dy: dy - done.dy })
  if (result.ok) ctx.remember({ applied: { dx, dy, angle: 0 } })
  const total = result.ok ? { dx, dy } : done
  ctx.setEphemeral({ readout: segmentReadout({ x: 0, y: 0 }, { x: total.dx, y: total.dy }) })
}

/** Dragging the selection; one undo step for the whole drag; Escape puts it back. */
export const PickMoving: ToolStateNode = {
  id: 'moving',
  onPointerMove: applyMove,
  onPointerUp(ctx, e) {
    applyMove(ctx, e)
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: e.point })
    ctx.transition('idle', {})
  },
  onCancel: (ctx) => cancelGesture(ctx),
}
