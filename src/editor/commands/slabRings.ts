/** Editing one ring (the outline or an opening) of a slab. */
import type { Point, Project, Slab } from '@/model'
import type { CommandOutcome } from './result'
import { checkPolygon, checkSlabRings, refuse } from './result'

/** Which ring of a slab: its outer outline, or opening number n (0-based). */
export type SlabRing = 'outline' | number

export function ringPoints(slab: Slab, ring: SlabRing): readonly Point[] | undefined {
  return ring === 'outline' ? slab.outline : slab.openings[ring]
}

export function ringField(ring: SlabRing): string {
  return ring === 'outline' ? 'outline' : `openings[${ring}]`
}

/** Replace one ring after validating it as a polygon. */
export function replaceRing(
  doc: Project,
  slabId: string,
  ring: SlabRing,
  edit: (points: readonly Point[]) => readonly Point[] | string,
): CommandOutcome {
  const slab = doc.slabs[slabId]
  if (!slab) return refuse(`slab: unknown slab "${slabId}"`)
  const points = ringPoints(slab, ring)
  if (!points) return refuse(`ring: slab "${slabId}" has no ${ringField(ring)}`)
  const edited = edit(points)
  if (typeof edited === 'string') return refuse(edited)
  const c = checkPolygon(ringField(ring), edited)
  if (c) return refuse(`slab ${slabId}: ${c}`)
  const next: Slab =
    ring === 'outline'
      ? { ...slab, outline: edited }
      : { ...slab, openings: slab.openings.map((o, i) => (i === ring ? edited : o)) }
  const rings = checkSlabRings(slabId, next.outline, next.openings)
  if (rings) return refuse(rings)
  return { ...doc, slabs: { ...doc.slabs, [slabId]: next } }
}

export function checkIndex(field: string, index: number, length: number): string | undefined {
  if (!Number.isInteger(index) || index < 0 || index >= length) {
    return `${field}: must be a whole number 0..${length - 1}, got ${index}`
  }
  return undefined
}
