import type { FloorId, Point, Project, Slab, SlabId } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import type { CommandOutcome } from './result'
import { checkFloor, checkNonNegative, checkPolygon, checkSlabRings, refuse } from './result'

export interface AddSlabArgs {
  readonly floor: FloorId
  readonly outline: readonly Point[]
  readonly openings?: readonly (readonly Point[])[]
  /** kg/m² */
  readonly areaMass?: number
  readonly id?: string
}

/** Add a slab region to a floor. */
export function addSlab(doc: Project, args: AddSlabArgs): CommandOutcome {
  const areaMass = args.areaMass ?? ELEMENT_DEFAULTS.areaMass
  const openings = args.openings ?? []
  const c =
    checkFloor(doc, 'floor', args.floor) ??
    checkPolygon('outline', args.outline) ??
    checkNonNegative('areaMass', areaMass) ??
    openings.map((o, i) => checkPolygon(`openings[${i}]`, o)).find((m) => m !== undefined)
  if (c) return refuse(c)
  const id = (args.id ?? createId<SlabId>('s')) as SlabId
  if (doc.slabs[id]) return refuse(`id: slab "${id}" already exists`)
  const rings = checkSlabRings(id, args.outline, openings)
  if (rings) return refuse(rings)
  const slab: Slab = { id, floor: args.floor, outline: [...args.outline], openings: openings.map((o) => [...o]), areaMass }
  return { ...doc, slabs: { ...doc.slabs, [id]: slab } }
}
