import type { Point, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkPoint } from './result'
import type { SlabRing } from './slabRings'
import { replaceRing } from './slabRings'

export interface InsertSlabVertexArgs {
  readonly slab: string
  readonly ring?: SlabRing
  /** The new vertex gets this index (0..n); n appends after the last. */
  readonly index: number
  readonly at: Point
}

/** Insert a vertex into a slab outline or opening. */
export function insertSlabVertex(doc: Project, args: InsertSlabVertexArgs): CommandOutcome {
  return replaceRing(doc, args.slab, args.ring ?? 'outline', (pts) => {
    if (!Number.isInteger(args.index) || args.index < 0 || args.index > pts.length) {
      return `index: must be a whole number 0..${pts.length}, got ${args.index}`
    }
    const c = checkPoint('at', args.at)
    if (c) return c
    return [...pts.slice(0, args.index), { x: args.at.x, y: args.at.y }, ...pts.slice(args.index)]
  })
}
