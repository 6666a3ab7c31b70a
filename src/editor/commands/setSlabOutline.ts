import type { Point, Project } from '@/model'
import type { CommandOutcome } from './result'
import { replaceRing } from './slabRings'

export interface SetSlabOutlineArgs {
  readonly slab: string
  readonly outline: readonly Point[]
}

/** Replace a slab's outer outline (at least 3 vertices, non-zero area). */
export function setSlabOutline(doc: Project, args: SetSlabOutlineArgs): CommandOutcome {
  return replaceRing(doc, args.slab, 'outline', () => [...args.outline])
}
