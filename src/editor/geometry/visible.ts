/** Which records show on a floor. */
import type { Column, FloorId, FrameLine, LineMass, PointMass, Project, Slab, Wall } from '@/model'
import { elementFloorRange, floorContent, floorIndex } from '@/model'

/** True when a wall, frame line or column spans floor `floor` (it acts in the story below it). */
export function isOnFloor(doc: Project, element: Wall | FrameLine | Column, floor: FloorId): boolean {
  const range = elementFloorRange(doc, element)
  const i = floorIndex(doc, floor)
  return range !== null && i >= range.first && i <= range.last
}

/** The records drawn on a floor's plan: elements whose range covers it and the floor's content. */
export interface VisibleRecords {
  readonly walls: readonly Wall[]
  readonly frameLines: readonly FrameLine[]
  readonly columns: readonly Column[]
  /** From the floor itself or the typical floor it links to. */
  readonly slabs: readonly Slab[]
  readonly lineMasses: readonly LineMass[]
  readonly pointMasses: readonly PointMass[]
}

export function visibleRecords(doc: Project, floor: FloorId): VisibleRecords {
  const content = floorContent(doc, floor)
  return {
    walls: Object.values(doc.walls).filter((w) => isOnFloor(doc, w, floor)),
    frameLines: Object.values(doc.frameLines).filter((f) => isOnFloor(doc, f, floor)),
    columns: Object.values(doc.columns).filter((c) => isOnFloor(doc, c, floor)),
    slabs: content.slabs,
    lineMasses: content.lineMasses,
    pointMasses: content.pointMasses,
  }
}
