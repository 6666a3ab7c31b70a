import type { BaseRef, FloorId, Project } from '@/model'
import type { AnyRecord, RecordKind } from '../history'
import { checkIds, kindOf } from './records'
import type { CommandOutcome } from './result'
import { checkRange, floorsInRange, pickStories, refuse, withOptional } from './result'

export interface SetElementFloorRangeArgs {
  readonly ids: readonly string[]
  readonly base: BaseRef
  readonly top: FloorId
}

/**
 * Move elements to a floor range: walls, frame lines and columns get base..top (per-story overrides
 * outside the range are dropped); slabs and masses, which sit on one floor, move to `top`.
 */
export function setElementFloorRange(doc: Project, args: SetElementFloorRangeArgs): CommandOutcome {
  const c = checkIds(doc, args.ids, 'move to floors') ?? checkRange(doc, args.base, args.top)
  if (c) return refuse(c)
  const floors = floorsInRange(doc, args.base, args.top)
  const maps: Partial<Record<RecordKind, Record<string, AnyRecord>>> = {}
  for (const id of new Set(args.ids)) {
    const kind = kindOf(doc, id) as RecordKind
    if (kind === 'materials') return refuse(`ids: "${id}" is a material; materials are not on floors`)
    const r = doc[kind][id] as unknown as Record<string, unknown>
    let next: Record<string, unknown>
    if (kind === 'walls' || kind === 'frameLines' || kind === 'columns') {
      next = { ...r, base: args.base, top: args.top }
      if ('stories' in r) next = withOptional(next, 'stories', pickStories(r.stories as Record<string, unknown>, floors))
      const st = r.stiffness as { kind: string; stories?: Record<string, number> } | undefined
      if (st?.kind === 'direct' && st.stories) next = { ...next, stiffness: withOptional(st, 'stories', pickStories(st.stories, floors)) }
    } else {
      next = { ...r, floor: args.top }
    }
    const map = (maps[kind] ??= { ...doc[kind] } as Record<string, AnyRecord>)
    map[id] = next as unknown as AnyRecord
  }
  return { ...doc, ...maps } as Project
}
