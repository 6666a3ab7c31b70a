/**
 * Pure plan-view geometry: the mapping between plan coordinates (m, y up) and screen pixels
 * (y down), zoom about a point, fit to a box, and element outlines in plan.
 */
import type { Point } from '@/model'

/** The camera of the 2D plan: plan point at the centre of the canvas and pixels per metre. */
export interface PlanView {
  readonly cx: number
  readonly cy: number
  readonly scale: number
}

export interface ScreenSize {
  readonly width: number
  readonly height: number
}

export interface Box {
  readonly minX: number
  readonly minY: number
  readonly maxX: number
  readonly maxY: number
}

export const MIN_SCALE = 0.5
export const MAX_SCALE = 2000

export function toScreen(view: PlanView, size: ScreenSize, p: Point): Point {
  return { x: size.width / 2 + (p.x - view.cx) * view.scale, y: size.height / 2 - (p.y - view.cy) * view.scale }
}

export function toPlan(view: PlanView, size: ScreenSize, s: Point): Point {
  return { x: view.cx + (s.x - size.width / 2) / view.scale, y: view.cy - (s.y - size.height / 2) / view.scale }
}

/** Zoom by `factor` keeping the plan point under the screen point `s` fixed. */
export function zoomAt(view: PlanView, size: ScreenSize, s: Point, factor: number): PlanView {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, view.scale * factor))
  const anchor = toPlan(view, size, s)
  return {
    scale,
    cx: anchor.x - (s.x - size.width / 2) / scale,
    cy: anchor.y + (s.y - size.height / 2) / scale,
  }
}

/** Pan by a screen displacement (pixels). */
export function panBy(view: PlanView, dx: number, dy: number): PlanView {
  return { ...view, cx: view.cx - dx / view.scale, cy: view.cy + dy / view.scale }
}

/** A view that shows `box` with a margin (pixels) on every side. */
export function fitView(box: Box | null, size: ScreenSize, margin = 48): PlanView {
  if (!box || size.width <= 0 || size.height <= 0) return { cx: 0, cy: 0, scale: 20 }
  const w = Math.max(box.maxX - box.minX, 1)
  const h = Math.max(box.maxY - box.minY, 1)
  const scale = Math.min((size.width - 2 * margin) / w, (size.height - 2 * margin) / h)
  return {
    cx: (box.minX + box.maxX) / 2,
    cy: (box.minY + box.maxY) / 2,
    scale: Math.min(MAX_SCALE, Math.max(MIN_SCALE, scale)),
  }
}

/** Bounding box of points, or null for none. */
export function boundsOf(points: Iterable<Point>): Box | null {
  let box: Box | null = null
  for (const p of points) {
    box = box
      ? { minX: Math.min(box.minX, p.x), minY: Math.min(box.minY, p.y), maxX: Math.max(box.maxX, p.x), maxY: Math.max(box.maxY, p.y) }
      : { minX: p.x, minY: p.y, maxX: p.x, maxY: p.y }
  }
  return box
}

/** The four corners of a wall of true thickness centred on its line p1-p2 (plan, m). */
export function wallOutline(p1: Point, p2: Point, thickness: number): Point[] {
  const dx = p2.x - p1.x
  const dy = p2.y - p1.y
  const len = Math.hypot(dx, dy)
  if (len === 0) return [p1, p1, p1, p1]
  const nx = (-dy / len) * (thickness / 2)
  const ny = (dx / len) * (thickness / 2)
  return [
    { x: p1.x + nx, y: p1.y + ny },
    { x: p2.x + nx, y: p2.y + ny },
    { x: p2.x - nx, y: p2.y - ny },
    { x: p1.x - nx, y: p1.y - ny },
  ]
}

/** Length (m) and angle (rad, counter-clockwise from +x, in (-pi, pi]) of a segment. */
export function segmentMeasure(p1: Point, p2: Point): { length: number; angle: number } {
  return { length: Math.hypot(p2.x - p1.x, p2.y - p1.y), angle: Math.atan2(p2.y - p1.y, p2.x - p1.x) }
}

/** Grid line spacing (m) for a background grid that stays 20 to 100 px apart on screen. */
export function backgroundStep(scale: number): number {
  const target = 40 / scale
  const steps = [0.1, 0.25, 0.5, 1, 2, 5, 10, 20, 50, 100]
  return steps.find((s) => s >= target) ?? 100
}

/** SVG path data of a polygon in screen coordinates. */
export function polygonPath(points: readonly Point[]): string {
  if (points.length === 0) return ''
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ') + ' Z'
}
