/** Helpers moving a floor's own slabs and masses (used by the floor commands). */
import type { FloorId, LineMass, LineMassId, PointMass, PointMassId, Project, Slab, SlabId } from '@/model'
import { createId } from '@/model'

/** Doc with copies (new ids) of `from`'s own slabs and masses placed on floor `to`. */
export function copyFloorContent(doc: Project, from: FloorId, to: FloorId): Project {
  const slabs: Record<string, Slab> = { ...doc.slabs }
  const lineMasses: Record<string, LineMass> = { ...doc.lineMasses }
  const pointMasses: Record<string, PointMass> = { ...doc.pointMasses }
  for (const s of Object.values(doc.slabs)) {
    if (s.floor !== from) continue
    const id = createId<SlabId>('s')
    slabs[id] = { ...s, id, floor: to }
  }
  for (const m of Object.values(doc.lineMasses)) {
    if (m.floor !== from) continue
    const id = createId<LineMassId>('lm')
    lineMasses[id] = { ...m, id, floor: to }
  }
  for (const m of Object.values(doc.pointMasses)) {
    if (m.floor !== from) continue
    const id = createId<PointMassId>('pm')
    pointMasses[id] = { ...m, id, floor: to }
  }
  return { ...doc, slabs, lineMasses, pointMasses }
}

/** Doc without floor `floor`'s own slabs and masses. */
export function dropFloorContent(doc: Project, floor: FloorId): Project {
  const keep = <T extends { floor: FloorId }>(m: Readonly<Record<string, T>>): Record<string, T> =>
    Object.fromEntries(Object.entries(m).filter(([, r]) => r.floor !== floor))
  const has = (m: Readonly<Record<string, { floor: FloorId }>>): boolean =>
    Object.values(m).some((r) => r.floor === floor)
  if (!has(doc.slabs) && !has(doc.lineMasses) && !has(doc.pointMasses)) return doc
  return {
    ...doc,
    slabs: has(doc.slabs) ? keep(doc.slabs) : doc.slabs,
    lineMasses: has(doc.lineMasses) ? keep(doc.lineMasses) : doc.lineMasses,
    pointMasses: has(doc.pointMasses) ? keep(doc.pointMasses) : doc.pointMasses,
  }
}
