/** Applying a plan transform to records (move, rotate). */
import type { Point, Project } from '@/model'
import type { AnyRecord, RecordKind } from '../history'
import { kindOf } from './records'

export type PointMap = (p: Point) => Point

/** The record with every plan point mapped; column angles turned by `turn` rad. */
export function transformRecord(kind: RecordKind, record: AnyRecord, f: PointMap, turn: number): AnyRecord {
  const r = record as unknown as Record<string, unknown>
  switch (kind) {
    case 'walls':
    case 'frameLines':
      return { ...r, p1: f(r.p1 as Point), p2: f(r.p2 as Point) } as unknown as AnyRecord
    case 'columns':
      return { ...r, at: f(r.at as Point), angle: normalizeAngle((r.angle as number) + turn) } as unknown as AnyRecord
    case 'pointMasses':
      return { ...r, at: f(r.at as Point) } as unknown as AnyRecord
    case 'lineMasses':
      return { ...r, points: (r.points as Point[]).map(f) } as unknown as AnyRecord
    case 'slabs':
      return {
        ...r,
        outline: (r.outline as Point[]).map(f),
        openings: (r.openings as Point[][]).map((o) => o.map(f)),
      } as unknown as AnyRecord
    case 'materials':
      return record
    default: {
      const never: never = kind
      throw new Error(`[editor] unknown record kind ${String(never)}`)
    }
  }
}

/** Angle in (-pi, pi]. */
export function normalizeAngle(a: number): number {
  let x = a % (2 * Math.PI)
  if (x <= -Math.PI) x += 2 * Math.PI
  if (x > Math.PI) x -= 2 * Math.PI
  return x
}

/** Doc with the given records transformed (materials among ids are ignored). */
export function transformIds(doc: Project, ids: readonly string[], f: PointMap, turn: number): Project {
  const maps: Partial<Record<RecordKind, Record<string, AnyRecord>>> = {}
  for (const id of new Set(ids)) {
    const kind = kindOf(doc, id)
    if (!kind || kind === 'materials') continue
    const map = (maps[kind] ??= { ...doc[kind] } as Record<string, AnyRecord>)
    map[id] = transformRecord(kind, map[id] as AnyRecord, f, turn)
  }
  return { ...doc, ...maps } as Project
}
