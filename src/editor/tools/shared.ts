/** Helpers used by several tools' states. */
import type { Point } from '@/model'
import { contentFloorId } from '@/model'
import type { PointerInput } from '../events'
import { constrainAngle } from '../geometry/snap'
import { EMPTY_EPHEMERAL, bail } from '../store'
import type { ToolContext } from './types'

/** End the gesture: bail to its mark (if any), clear the draft, go to `to`. */
export function cancelGesture(ctx: ToolContext, to = 'idle'): void {
  const markId = ctx.memory().markId
  if (markId !== undefined) bail(ctx.store, markId)
  ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
  ctx.transition(to, {})
}

/** Snapped point of a pointer event; with Shift, the direction from `from` is held to 15° steps. */
export function drawPoint(ctx: ToolContext, e: PointerInput, from?: Point): Point {
  const s = ctx.snap(e)
  if (e.shift && from) return constrainAngle(from, s.point)
  return s.point
}

/** Show the snap target and pointer while hovering with a drawing tool. */
export function hoverSnap(ctx: ToolContext, e: PointerInput): void {
  const s = ctx.snap(e)
  ctx.setEphemeral({ snap: s.kind === 'none' ? null : s, pointer: e.point })
}

/** The floor whose slabs and masses the current floor shows (its typical floor when linked). */
export function contentFloor(ctx: ToolContext): ReturnType<typeof contentFloorId> {
  const { doc, currentFloor } = ctx.state()
  return contentFloorId(doc, currentFloor)
}

export function distance(a: Point, b: Point): number {
  return Math.hypot(a.x - b.x, a.y - b.y)
}
