import type { PointerInput } from '../../events'
import { segmentReadout } from '../../geometry/readout'
import { constrainAngle } from '../../geometry/snap'
import { EMPTY_EPHEMERAL, execute } from '../../store'
import { cancelGesture } from '../shared'
import type { ToolContext, ToolStateNode } from '../types'

function stretch(ctx: ToolContext, e: PointerInput): void {
  const { handle } = ctx.memory()
  if (!handle) return
  const { doc } = ctx.state()
  const el = doc.walls[handle.id] ?? doc.frameLines[handle.id]
  if (!el) return
  const fixed = handle.end === 'p1' ? el.p2 : el.p1
  const s = ctx.snap(e, [handle.id])
  const to = e.shift ? constrainAngle(fixed, s.point) : s.point
  execute(ctx.store, 'moveEndpoint', { id: handle.id, end: handle.end, to })
  ctx.setEphemeral({ snap: s.kind === 'none' ? null : s, readout: segmentReadout(fixed, to) })
}

/** Dragging one end of a wall or frame line (live length/angle); Escape puts it back. */
export const PickStretching: ToolStateNode = {
  id: 'stretching',
  onPointerMove: stretch,
  onPointerUp(ctx, e) {
    stretch(ctx, e)
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: e.point })
    ctx.transition('idle', {})
  },
  onCancel: (ctx) => cancelGesture(ctx),
}
