import type { FloorId, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkFloor, checkPositive, refuse } from './result'

export interface SetFloorHeightArgs {
  readonly floor: FloorId
  /** Story height below the floor, m (> 0). */
  readonly height: number
}

/** Set the height of the story below a floor. */
export function setFloorHeight(doc: Project, args: SetFloorHeightArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor) ?? checkPositive('height', args.height)
  if (c) return refuse(c)
  return {
    ...doc,
    floors: doc.floors.map((f) => (f.id === args.floor ? { ...f, height: args.height } : f)),
  }
}
