/** Pure: which records of a project are drawn on the plan of one floor. */
import { appendAll, elementFloorRange, floorContent, floorIndex } from '@/model'
import type { Column, FloorId, FrameLine, LineMass, Point, PointMass, Project, Slab, Wall } from '@/model'
import { boundsOf } from './planView'
import type { Box } from './planView'

export interface PlanScene {
  readonly slabs: readonly Slab[]
  /** True when the slabs come from another floor through a typical-floor link. */
  readonly slabsLinked: boolean
  readonly walls: readonly Wall[]
  readonly frameLines: readonly FrameLine[]
  readonly columns: readonly Column[]
  readonly lineMasses: readonly LineMass[]
  readonly pointMasses: readonly PointMass[]
}

const onFloor = (project: Project, index: number) => (e: Parameters<typeof elementFloorRange>[1]) => {
  const range = elementFloorRange(project, e)
  return range !== null && index >= range.first && index <= range.last
}

/** Slabs and masses of the floor (following its link) and the lateral elements passing through it. */
export function planScene(project: Project, floorId: FloorId): PlanScene {
  const index = floorIndex(project, floorId)
  if (index < 0) {
    return { slabs: [], slabsLinked: false, walls: [], frameLines: [], columns: [], lineMasses: [], pointMasses: [] }
  }
  const content = floorContent(project, floorId)
  const on = onFloor(project, index)
  return {
    slabs: content.slabs,
    slabsLinked: content.slabs.some((s) => s.floor !== floorId),
    walls: Object.values(project.walls).filter(on),
    frameLines: Object.values(project.frameLines).filter(on),
    columns: Object.values(project.columns).filter(on),
    lineMasses: content.lineMasses,
    pointMasses: content.pointMasses,
  }
}

/** Everything drawn on the floor plus the grid, for "fit". */
export function sceneBounds(project: Project, scene: PlanScene): Box | null {
  const pts: Point[] = []
  for (const s of scene.slabs) appendAll(pts, s.outline)
  for (const w of scene.walls) pts.push(w.p1, w.p2)
  for (const f of scene.frameLines) pts.push(f.p1, f.p2)
  for (const c of scene.columns) pts.push(c.at)
  for (const m of scene.pointMasses) pts.push(m.at)
  for (const m of scene.lineMasses) appendAll(pts, m.points)
  if (pts.length === 0 && project.grid) {
    for (const gx of project.grid.x) for (const gy of project.grid.y) pts.push({ x: gx.at, y: gy.at })
  }
  return boundsOf(pts)
}
