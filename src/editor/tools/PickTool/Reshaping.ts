import type { PointerInput } from '../../events'
import { EMPTY_EPHEMERAL, execute } from '../../store'
import { cancelGesture } from '../shared'
import type { ToolContext, ToolStateNode } from '../types'

function reshape(ctx: ToolContext, e: PointerInput): void {
  const { vertex } = ctx.memory()
  if (!vertex) return
  const s = ctx.snap(e, [vertex.slab])
  const outcome = execute(ctx.store, 'moveSlabVertex', { slab: vertex.slab, index: vertex.index, to: s.point })
  ctx.setEphemeral({ snap: s.kind === 'none' ? null : s, pointer: e.point })
  if (!outcome.ok) cancelGesture(ctx)
}

/** Dragging one outline vertex of a selected slab (snapped); one undo step; Escape puts it back. */
export const PickReshaping: ToolStateNode = {
  id: 'reshaping',
  onPointerMove: reshape,
  onPointerUp(ctx, e) {
    reshape(ctx, e)
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: e.point })
    ctx.transition('idle', {})
  },
  onCancel: (ctx) => cancelGesture(ctx),
}
