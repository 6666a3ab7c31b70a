import type { Point, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkPoint } from './result'
import type { SlabRing } from './slabRings'
import { checkIndex, replaceRing } from './slabRings'

export interface MoveSlabVertexArgs {
  readonly slab: string
  /** Default 'outline'. */
  readonly ring?: SlabRing
  readonly index: number
  readonly to: Point
}

/** Move one vertex of a slab outline or opening. */
export function moveSlabVertex(doc: Project, args: MoveSlabVertexArgs): CommandOutcome {
  return replaceRing(doc, args.slab, args.ring ?? 'outline', (pts) => {
    const c = checkIndex('index', args.index, pts.length) ?? checkPoint('to', args.to)
    if (c) return c
    return pts.map((p, i) => (i === args.index ? { x: args.to.x, y: args.to.y } : p))
  })
}
