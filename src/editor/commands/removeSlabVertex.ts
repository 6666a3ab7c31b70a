import type { Project } from '@/model'
import type { CommandOutcome } from './result'
import type { SlabRing } from './slabRings'
import { checkIndex, replaceRing, ringField } from './slabRings'

export interface RemoveSlabVertexArgs {
  readonly slab: string
  readonly ring?: SlabRing
  readonly index: number
}

/** Remove a vertex from a slab outline or opening (refused below 3 vertices). */
export function removeSlabVertex(doc: Project, args: RemoveSlabVertexArgs): CommandOutcome {
  const ring = args.ring ?? 'outline'
  return replaceRing(doc, args.slab, ring, (pts) => {
    const c = checkIndex('index', args.index, pts.length)
    if (c) return c
    if (pts.length <= 3) return `${ringField(ring)}: a polygon needs at least 3 vertices; remove the whole ${ring === 'outline' ? 'slab' : 'opening'} instead`
    return pts.filter((_, i) => i !== args.index)
  })
}
