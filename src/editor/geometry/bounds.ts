/** Bounding boxes of records. */
import type { Point, Project } from '@/model'
import { findRecord } from '../commands/records'

/** All plan points of a record (ends, position, vertices). */
export function recordPoints(doc: Project, id: string): Point[] {
  const found = findRecord(doc, id)
  if (!found) return []
  const r = found.record as unknown as Record<string, unknown>
  switch (found.kind) {
    case 'walls':
    case 'frameLines':
      return [r.p1 as Point, r.p2 as Point]
    case 'columns':
    case 'pointMasses':
      return [r.at as Point]
    case 'lineMasses':
      return [...(r.points as Point[])]
    case 'slabs':
      return [...(r.outline as Point[])]
    case 'materials':
      return []
    default: {
      const never: never = found.kind
      throw new Error(`[editor] unknown record kind ${String(never)}`)
    }
  }
}

/** Bounding box of the given records, or null when they have no points. */
export function boundsOfIds(doc: Project, ids: readonly string[]): { min: Point; max: Point } | null {
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  for (const id of ids) {
    for (const p of recordPoints(doc, id)) {
      minX = Math.min(minX, p.x)
      minY = Math.min(minY, p.y)
      maxX = Math.max(maxX, p.x)
      maxY = Math.max(maxY, p.y)
    }
  }
  if (minX > maxX) return null
  return { min: { x: minX, y: minY }, max: { x: maxX, y: maxY } }
}
