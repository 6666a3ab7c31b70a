/**
 * Selection handles: wall/frame endpoints (stretch), outline vertices of selected slabs (reshape) and
 * a rotation handle above the selection.
 */
import type { FloorId, Point, Project } from '@/model'
import { contentFloorId } from '@/model'
import { boundsOfIds } from './bounds'
import { isOnFloor } from './visible'

export type Handle =
  | { readonly kind: 'endpoint'; readonly id: string; readonly end: 'p1' | 'p2'; readonly at: Point }
  | { readonly kind: 'vertex'; readonly id: string; readonly index: number; readonly at: Point }
  | { readonly kind: 'rotate'; readonly at: Point; readonly pivot: Point }

/**
 * Handles of the current selection on a floor. The rotation handle sits `offset` m above the top
 * middle of the selection's bounding box and turns about the box centre; the UI passes the same offset
 * it draws with (e.g. 4 * pick tolerance).
 */
export function selectionHandles(doc: Project, floor: FloorId, selection: readonly string[], offset: number): Handle[] {
  const handles: Handle[] = []
  for (const id of selection) {
    const e = doc.walls[id] ?? doc.frameLines[id]
    if (!e || !isOnFloor(doc, e, floor)) continue
    handles.push({ kind: 'endpoint', id, end: 'p1', at: e.p1 }, { kind: 'endpoint', id, end: 'p2', at: e.p2 })
  }
  const content = contentFloorId(doc, floor)
  for (const id of selection) {
    const slab = doc.slabs[id]
    if (!slab || slab.floor !== content) continue
    slab.outline.forEach((at, index) => handles.push({ kind: 'vertex', id, index, at }))
  }
  const box = boundsOfIds(doc, selection)
  if (box) {
    const pivot = { x: (box.min.x + box.max.x) / 2, y: (box.min.y + box.max.y) / 2 }
    handles.push({ kind: 'rotate', at: { x: pivot.x, y: box.max.y + offset }, pivot })
  }
  return handles
}

/** The handle within tolerance of p (endpoints and vertices before the rotation handle), or null. */
export function hitHandle(handles: readonly Handle[], p: Point, tolerance: number): Handle | null {
  let best: Handle | null = null
  let bestD = Infinity
  for (const h of handles) {
    const d = Math.hypot(h.at.x - p.x, h.at.y - p.y)
    if (d > tolerance) continue
    if (!best || (best.kind === 'rotate' && h.kind === 'endpoint') || (best.kind === h.kind && d < bestD)) {
      best = h
      bestD = d
    }
  }
  return best
}
