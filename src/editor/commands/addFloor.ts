import type { Floor, FloorId, Project } from '@/model'
import { createId } from '@/model'
import type { CommandOutcome } from './result'
import { checkName, checkPositive, refuse } from './result'

export interface AddFloorArgs {
  /** Insert position (0-based, bottom first); default on top. */
  readonly index?: number
  readonly name?: string
  /** Height of the story below the new floor, m; default: that of the floor below it (or 3 m). */
  readonly height?: number
  readonly id?: string
}

/** Add a floor (default on top). Elements keep their ranges: one spanning the new position covers it. */
export function addFloor(doc: Project, args: AddFloorArgs): CommandOutcome {
  const index = args.index ?? doc.floors.length
  if (!Number.isInteger(index) || index < 0 || index > doc.floors.length) {
    return refuse(`index: must be a whole number 0..${doc.floors.length}, got ${index}`)
  }
  const below = doc.floors[index - 1] ?? doc.floors[index]
  const height = args.height ?? below?.height ?? 3
  const c = checkPositive('height', height)
  if (c) return refuse(c)
  const id = (args.id ?? createId<FloorId>('L')) as FloorId
  if (doc.floors.some((f) => f.id === id)) return refuse(`id: floor "${id}" already exists`)
  const name = args.name ?? `Floor ${index + 1}`
  const cn = checkName('name', name)
  if (cn) return refuse(cn)
  const floor: Floor = { id, name, height }
  const floors = [...doc.floors.slice(0, index), floor, ...doc.floors.slice(index)]
  return { ...doc, floors }
}
