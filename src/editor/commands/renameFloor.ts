import type { FloorId, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkFloor, checkName, refuse } from './result'

export interface RenameFloorArgs {
  readonly floor: FloorId
  readonly name: string
}

/** Rename a floor. */
export function renameFloor(doc: Project, args: RenameFloorArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor) ?? checkName('name', args.name)
  if (c) return refuse(c)
  return {
    ...doc,
    floors: doc.floors.map((f) => (f.id === args.floor ? { ...f, name: args.name.trim() } : f)),
  }
}
