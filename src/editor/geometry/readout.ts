/** Length and angle readouts while drawing or dragging. */
import type { Point } from '@/model'

/** A live readout of a segment or offset; the UI formats it in the chosen units. */
export interface Readout {
  /** m */
  readonly length: number
  /** rad, counter-clockwise from +x, in [0, 2*pi) */
  readonly angle: number
  /** m */
  readonly dx: number
  /** m */
  readonly dy: number
}

/** Readout of the segment from a to b. */
export function segmentReadout(a: Point, b: Point): Readout {
  const dx = b.x - a.x
  const dy = b.y - a.y
  let angle = Math.atan2(dy, dx)
  if (angle < 0) angle += 2 * Math.PI
  if (dx === 0 && dy === 0) angle = 0
  return { length: Math.hypot(dx, dy), angle, dx, dy }
}

/** The point at `length` m from `from` in direction `angle` rad. */
export function polarPoint(from: Point, length: number, angle: number): Point {
  return { x: from.x + length * Math.cos(angle), y: from.y + length * Math.sin(angle) }
}
