import type { Point, Project } from '@/model'
import { pointInPolygon } from '../geometry/hitTest'
import type { CommandOutcome } from './result'
import { checkPolygon, checkSlabRings, refuse } from './result'

export interface AddOpeningArgs {
  readonly slab: string
  readonly points: readonly Point[]
}

/** Add an opening (hole) to a slab; every vertex must lie inside the slab outline. */
export function addOpening(doc: Project, args: AddOpeningArgs): CommandOutcome {
  const slab = doc.slabs[args.slab]
  if (!slab) return refuse(`slab: unknown slab "${args.slab}"`)
  const c = checkPolygon('points', args.points)
  if (c) return refuse(c)
  const outside = args.points.findIndex((p) => !pointInPolygon(p, slab.outline))
  if (outside >= 0) return refuse(`points[${outside}]: opening vertex lies outside slab "${args.slab}"`)
  const openings = [...slab.openings, args.points.map((p) => ({ x: p.x, y: p.y }))]
  const rings = checkSlabRings(args.slab, slab.outline, openings)
  if (rings) return refuse(rings)
  return { ...doc, slabs: { ...doc.slabs, [args.slab]: { ...slab, openings } } }
}
