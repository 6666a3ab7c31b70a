import type { Project } from '@/model'
import type { CommandOutcome } from './result'
import { refuse } from './result'
import { checkIndex } from './slabRings'

export interface RemoveOpeningArgs {
  readonly slab: string
  readonly index: number
}

/** Remove opening number `index` of a slab. */
export function removeOpening(doc: Project, args: RemoveOpeningArgs): CommandOutcome {
  const slab = doc.slabs[args.slab]
  if (!slab) return refuse(`slab: unknown slab "${args.slab}"`)
  const c = checkIndex('index', args.index, slab.openings.length)
  if (c) return refuse(slab.openings.length === 0 ? `index: slab "${args.slab}" has no openings` : c)
  const openings = slab.openings.filter((_, i) => i !== args.index)
  return { ...doc, slabs: { ...doc.slabs, [args.slab]: { ...slab, openings } } }
}
