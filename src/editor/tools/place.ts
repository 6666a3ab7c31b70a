/** The single state of tools that place something at a click (column, point mass). */
import type { Point } from '@/model'
import type { ExecuteResult, ToolId } from '../store'
import { EMPTY_EPHEMERAL, bail, mark } from '../store'
import { drawPoint } from './shared'
import type { ToolContext, ToolStateNode } from './types'

export function placeIdle(
  tool: ToolId,
  label: string,
  place: (ctx: ToolContext, at: Point) => ExecuteResult,
): ToolStateNode {
  return {
    id: 'idle',
    onPointerMove(ctx, e) {
      const s = ctx.snap(e)
      ctx.setEphemeral({ snap: s.kind === 'none' ? null : s, draft: { kind: 'point', tool, at: s.point } })
    },
    onPointerDown(ctx, e) {
      const at = drawPoint(ctx, e)
      const markId = mark(ctx.store, label)
      const result = place(ctx, at)
      if (!result.ok) bail(ctx.store, markId)
    },
    onCancel(ctx) {
      ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    },
  }
}
