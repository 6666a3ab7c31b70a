/**
 * States shared by tools that place vertices one by one (slab outline, opening, line mass).
 * idle: a click places the first vertex. drawing: each click adds one; a click on the first vertex
 * (closed shapes) or Enter finishes; Backspace removes the last; a numeric entry adds a vertex at an
 * offset from the last; Escape cancels.
 */
import type { Point } from '@/model'
import { numericOffset } from '../events'
import { segmentReadout } from '../geometry/readout'
import type { ToolId } from '../store'
import { EMPTY_EPHEMERAL, mark, setMessage } from '../store'
import { cancelGesture, distance, drawPoint, hoverSnap } from './shared'
import type { ToolContext, ToolStateNode } from './types'

export interface PolylineSpec {
  readonly tool: ToolId
  readonly label: string
  /** Closed polygon (slab, opening) or open polyline (line mass). */
  readonly closed: boolean
  /** Fewest vertices to finish. */
  readonly min: number
  /** Add the record; a refusal keeps drawing (its message is in the store). */
  readonly commit: (ctx: ToolContext, points: readonly Point[]) => { readonly ok: boolean }
}

export function polylineIdle(spec: PolylineSpec): ToolStateNode {
  return {
    id: 'idle',
    onPointerMove: hoverSnap,
    onPointerDown(ctx, e) {
      const p = drawPoint(ctx, e)
      const markId = mark(ctx.store, spec.label)
      ctx.transition('drawing', { points: [p], markId })
      ctx.setEphemeral({ draft: { kind: 'polyline', tool: spec.tool, points: [p, p], closed: false } })
    },
    onCancel(ctx) {
      ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    },
  }
}

export function polylineDrawing(spec: PolylineSpec): ToolStateNode {
  const points = (ctx: ToolContext): readonly Point[] => ctx.memory().points ?? []
  const show = (ctx: ToolContext, pts: readonly Point[], cursor: Point | null): void => {
    const last = pts[pts.length - 1]
    ctx.setEphemeral({
      draft: { kind: 'polyline', tool: spec.tool, points: cursor ? [...pts, cursor] : pts, closed: false },
      readout: last && cursor ? segmentReadout(last, cursor) : null,
    })
  }
  const finish = (ctx: ToolContext): void => {
    const pts = points(ctx)
    if (pts.length < spec.min) {
      setMessage(ctx.store, `${spec.tool}: needs at least ${spec.min} points, has ${pts.length}`)
      return
    }
    if (!spec.commit(ctx, pts).ok) return
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    ctx.transition('idle', {})
  }
  const add = (ctx: ToolContext, p: Point): void => {
    const pts = [...points(ctx), p]
    ctx.remember({ points: pts })
    show(ctx, pts, p)
  }
  return {
    id: 'drawing',
    onPointerMove(ctx, e) {
      const pts = points(ctx)
      const p = drawPoint(ctx, e, pts[pts.length - 1])
      const s = ctx.snap(e)
      ctx.setEphemeral({ snap: s.kind === 'none' ? null : s })
      show(ctx, pts, p)
    },
    onPointerDown(ctx, e) {
      const pts = points(ctx)
      const tol = ctx.tolerance(e)
      const first = pts[0]
      const last = pts[pts.length - 1]
      const p = drawPoint(ctx, e, last)
      if (spec.closed && first && pts.length >= spec.min && distance(first, e.point) <= tol) {
        finish(ctx)
        return
      }
      if (last && distance(last, p) <= tol) {
        // A second press on the last vertex (double click) finishes an open polyline.
        if (!spec.closed && pts.length >= spec.min) finish(ctx)
        return
      }
      add(ctx, p)
    },
    onKey(ctx, e) {
      if (e.key === 'Enter') finish(ctx)
      else if (e.key === 'Backspace') {
        const pts = points(ctx).slice(0, -1)
        if (pts.length === 0) cancelGesture(ctx)
        else {
          ctx.remember({ points: pts })
          show(ctx, pts, ctx.state().ephemeral.pointer)
        }
      }
    },
    onNumeric(ctx, e) {
      const last = points(ctx)[points(ctx).length - 1]
      if (!last) return
      const d = numericOffset(e)
      add(ctx, { x: last.x + d.x, y: last.y + d.y })
    },
    onCancel: (ctx) => cancelGesture(ctx),
  }
}
