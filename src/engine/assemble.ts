/**
 * Global stiffness K and mass M (row-major Float64Array, 3N x 3N at the plan origin O) of a project,
 * with the floor mass properties and the assembled-element records used downstream.
 * @see MODELING.md §Degrees of freedom, §Mass, §Lateral-resisting elements; docs/mechanics.md
 */
import { appendAll, computeElevations } from '@/model'
import type { Project } from '@/model'
import { DOFS_PER_FLOOR } from './dofs'
import { buildColumnElements } from './elements/column'
import { buildFrameLineElement } from './elements/frameLine'
import { buildWallElement } from './elements/wall'
import { buildWallGroupElements, findWallGroups } from './elements/wallGroup'
import { computeFloorMass, floorMassBlock } from './mass'
import type { AssembledElement, FloorProps, Issue, Structure } from './results'

/**
 * Add one element's A' k A to K (n = 3N) without forming A: for every pair of connected floors
 * (p, q) and every pair of DOF components (r, s), K[3f_p + r, 3f_q + s] += a_r a_s k_pq. K stays
 * exactly symmetric when k is, because both mirror terms get the same products in the same order.
 */
export function scatterElement(K: Float64Array, n: number, element: AssembledElement): void {
  const f = element.floors
  const ne = f.length
  const k = element.stiffness
  if (k.length !== ne * ne) {
    throw new RangeError(`[engine] element ${element.id}: stiffness has ${k.length} terms, expected ${ne * ne}`)
  }
  const [a0, a1, a2] = element.map
  const aa = [a0 * a0, a0 * a1, a0 * a2, a1 * a0, a1 * a1, a1 * a2, a2 * a0, a2 * a1, a2 * a2]
  // Non-null assertions: indices are bounded by ne and the 3x3 block layout.
  for (let p = 0; p < ne; p++) {
    const rowBase = DOFS_PER_FLOOR * f[p]!
    for (let q = 0; q < ne; q++) {
      const kpq = k[p * ne + q]!
      if (kpq === 0) continue
      const colBase = DOFS_PER_FLOOR * f[q]!
      for (let r = 0; r < 3; r++) {
        const row = (rowBase + r) * n + colBase
        K[row] = K[row]! + aa[3 * r]! * kpq
        K[row + 1] = K[row + 1]! + aa[3 * r + 1]! * kpq
        K[row + 2] = K[row + 2]! + aa[3 * r + 2]! * kpq
      }
    }
  }
}

/**
 * Floor mass properties and global K, M (row-major Float64Array) of a validated project.
 * Returns structure null (with issues) when the model cannot be assembled: no floors, a story height
 * that is not positive, or a floor without mass. Elements with problems (zero length, an empty or
 * unknown floor range, a missing material, bad section values) are left out with a warning; a
 * stiffness left singular by that is found later by the solver as a mechanism.
 * @see docs/mechanics.md §Assembly
 */
export function buildStructure(project: Project): {
  structure: Structure | null
  floors: FloorProps[]
  issues: Issue[]
} {
  const issues: Issue[] = []
  const N = project.floors.length
  if (N === 0) {
    issues.push({
      code: 'no-floors',
      severity: 'error',
      message: '[engine] the project has no floors: add at least one floor',
      refs: [],
    })
    return { structure: null, floors: [], issues }
  }
  const elevations = computeElevations(project)
  const floors: FloorProps[] = []
  let heightsOk = true
  let massOk = true
  for (let j = 0; j < N; j++) {
    const floor = project.floors[j]!
    if (!(Number.isFinite(floor.height) && floor.height > 0)) {
      heightsOk = false
      issues.push({
        code: 'invalid-model',
        severity: 'error',
        message: `[engine] floor ${floor.id} (${floor.name}): story height must be > 0 m (got ${floor.height})`,
        refs: [floor.id],
        floor: floor.id,
      })
    }
    const fm = computeFloorMass(project, floor.id)
    appendAll(issues, fm.issues)
    if (!(fm.props.mass > 0)) massOk = false
    floors.push({
      id: floor.id,
      name: floor.name,
      index: j,
      elevation: elevations[j]!,
      height: floor.height,
      mass: fm.props.mass,
      centreOfMass: fm.props.centreOfMass,
      polarInertia: fm.props.polarInertia,
      radiusOfGyration: fm.props.radiusOfGyration,
      slabArea: fm.props.slabArea,
      extent: fm.props.extent,
      extremePoints: fm.props.extremePoints,
    })
  }
  if (!heightsOk || !massOk) return { structure: null, floors, issues }

  const elements: AssembledElement[] = []
  // Joined walls act as one composite section (docs/mechanics.md §Wall groups).
  const grouping = findWallGroups(project)
  issues.push(...grouping.issues)
  const grouped = new Set<string>()
  for (const group of grouping.groups) {
    const members = group.wallIds.map((id) => project.walls[id]!)
    const r = buildWallGroupElements(project, members, group.id)
    issues.push(...r.issues)
    if (!r.elements) continue
    elements.push(...r.elements)
    for (const id of group.wallIds) grouped.add(id)
  }
  for (const wall of Object.values(project.walls)) {
    if (grouped.has(wall.id)) continue
    const r = buildWallElement(project, wall)
    appendAll(issues, r.issues)
    if (r.element) elements.push(r.element)
  }
  for (const frame of Object.values(project.frameLines)) {
    const r = buildFrameLineElement(project, frame)
    appendAll(issues, r.issues)
    if (r.element) elements.push(r.element)
  }
  for (const column of Object.values(project.columns)) {
    const r = buildColumnElements(project, column)
    appendAll(issues, r.issues)
    appendAll(elements, r.elements)
  }

  const n = DOFS_PER_FLOOR * N
  const K = new Float64Array(n * n)
  const usedElements: AssembledElement[] = []
  for (const element of elements) {
    let finite = element.map.every(Number.isFinite)
    const k = element.stiffness
    for (let i = 0; finite && i < k.length; i++) finite = Number.isFinite(k[i])
    if (!finite) {
      issues.push({
        code: 'invalid-model',
        severity: 'warning',
        message: `[engine] element ${element.id}: its stiffness is not finite; it is left out of the analysis`,
        refs: element.refs ?? [element.id],
      })
      continue
    }
    scatterElement(K, n, element)
    usedElements.push(element)
  }

  const M = new Float64Array(n * n)
  let totalMass = 0
  let sx = 0
  let sy = 0
  for (let j = 0; j < N; j++) {
    const f = floors[j]!
    const block = floorMassBlock(f.mass, f.centreOfMass, f.polarInertia)
    for (let r = 0; r < 3; r++) {
      for (let s = 0; s < 3; s++) M[(3 * j + r) * n + 3 * j + s] = block[3 * r + s]!
    }
    totalMass += f.mass
    sx += f.mass * f.centreOfMass.x
    sy += f.mass * f.centreOfMass.y
  }
  for (let j = 0; j < N; j++) {
    const f = floors[j]!
    // A floor whose mass sits in one point has no rotary inertia: M is singular in its rotation.
    const size = Math.max(f.extent.maxX - f.extent.minX, f.extent.maxY - f.extent.minY, 1)
    if (f.polarInertia <= 1e-12 * f.mass * size * size) {
      issues.push({
        code: 'no-mass',
        severity: 'warning',
        message: `[engine] floor ${f.id} (${f.name}) has no rotary inertia (all its mass is in one point): its rotation carries no mass`,
        refs: [f.id],
        floor: f.id,
      })
    }
  }

  const structure: Structure = {
    floorCount: N,
    dofCount: n,
    floors,
    stiffness: K,
    mass: M,
    elements: usedElements,
    allShearType: usedElements.every((e) => e.isShearType),
    buildingCentreOfMass: { x: sx / totalMass, y: sy / totalMass },
    totalMass,
  }
  return { structure, floors, issues }
}
