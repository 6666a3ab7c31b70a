/**
 * The two states shared by tools that draw one straight segment (wall, frame line):
 * idle (hover with snap preview; a click starts) and drawing (live length/angle; a click, a drag end or
 * a numeric entry finishes; Escape cancels).
 */
import type { Point } from '@/model'
import { numericOffset } from '../events'
import { segmentReadout } from '../geometry/readout'
import type { ExecuteResult, ToolId } from '../store'
import { EMPTY_EPHEMERAL, mark } from '../store'
import { cancelGesture, distance, drawPoint, hoverSnap } from './shared'
import type { ToolContext, ToolStateNode } from './types'

/** Adds the element; returns execute's result. */
export type SegmentCommit = (ctx: ToolContext, p1: Point, p2: Point) => ExecuteResult

export function segmentIdle(tool: ToolId, label: string): ToolStateNode {
  return {
    id: 'idle',
    onPointerMove: hoverSnap,
    onPointerDown(ctx, e) {
      const origin = drawPoint(ctx, e)
      const markId = mark(ctx.store, label)
      ctx.transition('drawing', { origin, markId })
      ctx.setEphemeral({ draft: { kind: 'segment', tool, p1: origin, p2: origin }, readout: segmentReadout(origin, origin) })
    },
    onCancel(ctx) {
      ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    },
  }
}

export function segmentDrawing(tool: ToolId, commit: SegmentCommit): ToolStateNode {
  const finish = (ctx: ToolContext, end: Point): void => {
    const origin = ctx.memory().origin
    if (!origin) return
    const result = commit(ctx, origin, end)
    if (!result.ok) return // refused: keep drawing; the message is in the store
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    ctx.transition('idle', {})
  }
  const update = (ctx: ToolContext, end: Point): void => {
    const origin = ctx.memory().origin
    if (!origin) return
    ctx.setEphemeral({ draft: { kind: 'segment', tool, p1: origin, p2: end }, readout: segmentReadout(origin, end) })
  }
  return {
    id: 'drawing',
    onPointerMove(ctx, e) {
      const origin = ctx.memory().origin
      const p = drawPoint(ctx, e, origin)
      const s = ctx.snap(e)
      ctx.setEphemeral({ snap: s.kind === 'none' ? null : s })
      update(ctx, p)
    },
    onPointerDown(ctx, e) {
      const origin = ctx.memory().origin
      const p = drawPoint(ctx, e, origin)
      if (origin && distance(origin, p) <= ctx.tolerance(e)) return // second press on the start point
      finish(ctx, p)
    },
    onPointerUp(ctx, e) {
      // Press-drag-release draws too; a release near the start is the first click's own release.
      const origin = ctx.memory().origin
      const p = drawPoint(ctx, e, origin)
      if (origin && distance(origin, p) > ctx.tolerance(e)) finish(ctx, p)
    },
    onNumeric(ctx, e) {
      const origin = ctx.memory().origin
      if (!origin) return
      const d = numericOffset(e)
      finish(ctx, { x: origin.x + d.x, y: origin.y + d.y })
    },
    onCancel: (ctx) => cancelGesture(ctx),
  }
}
