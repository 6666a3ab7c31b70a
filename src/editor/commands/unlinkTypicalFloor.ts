import type { FloorId, Project } from '@/model'
import { contentFloorId } from '@/model'
import { copyFloorContent, dropFloorContent } from './floorContent'
import type { CommandOutcome } from './result'
import { checkFloor, refuse, withOptional } from './result'

export interface UnlinkTypicalFloorArgs {
  readonly floor: FloorId
}

/** Break a typical-floor link: the floor gets its own copies (new ids) of the content it showed. */
export function unlinkTypicalFloor(doc: Project, args: UnlinkTypicalFloorArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor)
  if (c) return refuse(c)
  const floor = doc.floors.find((f) => f.id === args.floor)
  if (!floor?.typicalOf) return refuse(`floor: "${args.floor}" is not linked to a typical floor`)
  const source = contentFloorId(doc, args.floor)
  let next = dropFloorContent(doc, args.floor)
  if (source !== args.floor) next = copyFloorContent(next, source, args.floor)
  return {
    ...next,
    floors: next.floors.map((f) => (f.id === args.floor ? withOptional(f, 'typicalOf', undefined) : f)),
  }
}
