import type { Column, FrameLine, LineMass, PointMass, Project, Slab, Wall } from '@/model'
import type { Patch } from './patch'
import { patchRecord } from './patch'
import { kindOf } from './records'
import type { CommandOutcome } from './result'
import { refuse } from './result'

/** A patch for any plan record; `undefined` clears an optional field. */
export type ElementPatch =
  | Patch<Wall>
  | Patch<FrameLine>
  | Patch<Column>
  | Patch<Slab>
  | Patch<LineMass>
  | Patch<PointMass>

export interface UpdateElementArgs {
  /** Id of a wall, frame line, column, slab, line mass or point mass. */
  readonly id: string
  readonly patch: ElementPatch
}

/**
 * Change fields of one element. The patched record is validated as a whole; a wrong value is refused
 * with a message naming the element, field and problem (e.g. `wall w1: thickness: must be > 0, got 0`).
 */
export function updateElement(doc: Project, args: UpdateElementArgs): CommandOutcome {
  const kind = kindOf(doc, args.id)
  if (!kind || kind === 'materials') return refuse(`id: unknown element "${args.id}"`)
  return patchRecord(doc, kind, args.id, args.patch as Readonly<Record<string, unknown>>)
}
