/** Pure helpers about the floor stack, shared by engine, editor and UI. */
import type { BaseRef, FloorId, LineMass, PointMass, Project, Slab } from './types'

/** Elevations z_i of floors 1..N (m), cumulative story heights from the base at z = 0. */
export function computeElevations(project: Pick<Project, 'floors'>): number[] {
  const z: number[] = []
  let sum = 0
  for (const floor of project.floors) {
    sum += floor.height
    z.push(sum)
  }
  return z
}

/** Index (0-based, bottom first) of a floor id, or -1. */
export function floorIndex(project: Pick<Project, 'floors'>, id: FloorId | string): number {
  return project.floors.findIndex((f) => f.id === id)
}

/**
 * The stories an element spans as 0-based floor indices: it acts between floor `below` (-1 = ground)
 * and each floor from `first` to `last` inclusive. Returns null when the range is empty or unknown.
 */
export function elementFloorRange(
  project: Pick<Project, 'floors'>,
  element: { readonly base: BaseRef; readonly top: FloorId },
): { below: number; first: number; last: number } | null {
  const below = element.base === 'ground' ? -1 : floorIndex(project, element.base)
  if (element.base !== 'ground' && below < 0) return null
  const last = floorIndex(project, element.top)
  if (last < 0 || last <= below) return null
  return { below, first: below + 1, last }
}

/** The floor whose slabs and masses a floor uses: itself, or the floor its typical-floor link names. */
export function contentFloorId(project: Pick<Project, 'floors'>, id: FloorId): FloorId {
  let current = id
  // Follow links; a cycle or dangling link falls back to the floor's own content.
  for (let guard = 0; guard < project.floors.length; guard++) {
    const floor = project.floors.find((f) => f.id === current)
    if (!floor?.typicalOf) return current
    if (!project.floors.some((f) => f.id === floor.typicalOf)) return current
    current = floor.typicalOf
  }
  return id
}

/** Slabs, line masses and point masses that act on a floor (following its typical-floor link). */
export function floorContent(
  project: Pick<Project, 'floors' | 'slabs' | 'lineMasses' | 'pointMasses'>,
  id: FloorId,
): { slabs: Slab[]; lineMasses: LineMass[]; pointMasses: PointMass[] } {
  const source = contentFloorId(project, id)
  return {
    slabs: Object.values(project.slabs).filter((s) => s.floor === source),
    lineMasses: Object.values(project.lineMasses).filter((m) => m.floor === source),
    pointMasses: Object.values(project.pointMasses).filter((m) => m.floor === source),
  }
}
