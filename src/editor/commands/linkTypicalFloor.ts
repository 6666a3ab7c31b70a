import type { FloorId, Project } from '@/model'
import { contentFloorId } from '@/model'
import { dropFloorContent } from './floorContent'
import type { CommandOutcome } from './result'
import { checkFloor, refuse } from './result'

export interface LinkTypicalFloorArgs {
  readonly floor: FloorId
  /** The floor whose slabs and masses `floor` will use. */
  readonly source: FloorId
}

/**
 * Make `floor` a typical copy of `source`: it then uses `source`'s slabs and masses. Its own slabs and
 * masses are removed (they would be ignored while linked; undo brings them back). Refused for a link to
 * itself or one that would make a loop.
 */
export function linkTypicalFloor(doc: Project, args: LinkTypicalFloorArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor) ?? checkFloor(doc, 'source', args.source)
  if (c) return refuse(c)
  if (args.floor === args.source) return refuse('source: a floor cannot be a typical copy of itself')
  if (contentFloorId(doc, args.source) === args.floor) {
    return refuse(`source: floor "${args.source}" already follows "${args.floor}"; linking would make a loop`)
  }
  const next = dropFloorContent(doc, args.floor)
  return {
    ...next,
    floors: next.floors.map((f) => (f.id === args.floor ? { ...f, typicalOf: args.source } : f)),
  }
}
