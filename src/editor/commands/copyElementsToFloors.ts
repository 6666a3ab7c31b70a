import type { BaseRef, FloorId, Project } from '@/model'
import { createId } from '@/model'
import type { AnyRecord, RecordKind } from '../history'
import { checkIds, kindOf } from './records'
import type { CommandOutcome } from './result'
import { checkRange, floorsInRange, pickStories, refuse, withOptional } from './result'

export interface CopyElementsToFloorsArgs {
  readonly ids: readonly string[]
  /** The copies stand on this floor (or the ground) ... */
  readonly base: BaseRef
  /** ... and reach this floor. */
  readonly top: FloorId
  /** Plan offset of the copies, m (default none). */
  readonly dx?: number
  readonly dy?: number
}

const PREFIX: Readonly<Record<RecordKind, string>> = {
  walls: 'w',
  frameLines: 'f',
  columns: 'c',
  slabs: 's',
  lineMasses: 'lm',
  pointMasses: 'pm',
  materials: 'm',
}

/**
 * Copy elements to a floor range with new ids. Walls, frame lines and columns become one copy spanning
 * base..top (per-story overrides kept where their floor is in the range); slabs and masses are copied
 * onto each floor of the range.
 */
export function copyElementsToFloors(doc: Project, args: CopyElementsToFloorsArgs): CommandOutcome {
  const c = checkIds(doc, args.ids, 'copy') ?? checkRange(doc, args.base, args.top)
  if (c) return refuse(c)
  const floors = floorsInRange(doc, args.base, args.top)
  const dx = args.dx ?? 0
  const dy = args.dy ?? 0
  const shift = (p: { x: number; y: number }): { x: number; y: number } => ({ x: p.x + dx, y: p.y + dy })
  const maps: Partial<Record<RecordKind, Record<string, AnyRecord>>> = {}
  const put = (kind: RecordKind, rec: Record<string, unknown>): void => {
    const map = (maps[kind] ??= { ...doc[kind] } as Record<string, AnyRecord>)
    map[rec.id as string] = rec as unknown as AnyRecord
  }
  for (const id of new Set(args.ids)) {
    const kind = kindOf(doc, id) as RecordKind
    const r = doc[kind][id] as unknown as Record<string, unknown>
    switch (kind) {
      case 'walls':
      case 'frameLines':
      case 'columns': {
        let copy: Record<string, unknown> = { ...r, id: createId(PREFIX[kind]), base: args.base, top: args.top }
        if ('p1' in r) copy = { ...copy, p1: shift(r.p1 as never), p2: shift(r.p2 as never) }
        if ('at' in r) copy = { ...copy, at: shift(r.at as never) }
        if ('stories' in r) copy = withOptional(copy, 'stories', pickStories(r.stories as Record<string, unknown>, floors))
        const st = r.stiffness as { kind: string; stories?: Record<string, number> } | undefined
        if (st?.kind === 'direct' && st.stories) {
          copy = { ...copy, stiffness: withOptional(st, 'stories', pickStories(st.stories, floors)) }
        }
        put(kind, copy)
        break
      }
      case 'slabs':
      case 'lineMasses':
      case 'pointMasses':
        for (const floor of floors) {
          const copy: Record<string, unknown> = { ...r, id: createId(PREFIX[kind]), floor }
          if ('at' in r) copy.at = shift(r.at as never)
          if ('points' in r) copy.points = (r.points as never[]).map(shift)
          if ('outline' in r) {
            copy.outline = (r.outline as never[]).map(shift)
            copy.openings = (r.openings as never[][]).map((o) => o.map(shift))
          }
          put(kind, copy)
        }
        break
      case 'materials':
        return refuse(`ids: "${id}" is a material; materials are not on floors`)
      default: {
        const never: never = kind
        throw new Error(`[editor] unknown record kind ${String(never)}`)
      }
    }
  }
  return { ...doc, ...maps } as Project
}
