import type { Project } from '@/model'
import type { AnyRecord, RecordKind } from '../history'
import { checkIds, kindOf } from './records'
import type { CommandOutcome } from './result'
import { refuse } from './result'

export interface DeleteElementsArgs {
  readonly ids: readonly string[]
}

/** Ids of records that use material `id` (walls, columns, member-based frame lines). */
export function materialUsers(doc: Project, id: string): string[] {
  const users: string[] = []
  for (const w of Object.values(doc.walls)) if (w.material === id) users.push(w.id)
  for (const c of Object.values(doc.columns)) if (c.material === id) users.push(c.id)
  for (const f of Object.values(doc.frameLines)) {
    if (f.stiffness.kind !== 'direct' && f.stiffness.material === id) users.push(f.id)
  }
  return users
}

/**
 * Delete elements, slabs, masses or materials. A material still used by an element that stays is
 * refused, naming the users; deleting it together with all its users is fine.
 */
export function deleteElements(doc: Project, args: DeleteElementsArgs): CommandOutcome {
  const c = checkIds(doc, args.ids, 'delete')
  if (c) return refuse(c)
  const ids = new Set(args.ids)
  for (const id of ids) {
    if (kindOf(doc, id) !== 'materials') continue
    const users = materialUsers(doc, id).filter((u) => !ids.has(u))
    if (users.length > 0) {
      const shown = users.slice(0, 5).join(', ') + (users.length > 5 ? ', ...' : '')
      return refuse(`ids: material "${id}" is used by ${users.length} element(s) (${shown}); change or delete them first`)
    }
  }
  const maps: Partial<Record<RecordKind, Record<string, AnyRecord>>> = {}
  for (const id of ids) {
    const kind = kindOf(doc, id) as RecordKind
    const map = (maps[kind] ??= { ...doc[kind] } as Record<string, AnyRecord>)
    delete map[id]
  }
  return { ...doc, ...maps } as Project
}
