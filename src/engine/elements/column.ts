/**
 * Column: two shear-type elements along its local axes; torsional stiffness ignored. Local x lies at
 * `angle` counter-clockwise from global X; I_x (about local x) resists translation along local y,
 * I_y resists translation along local x. A pinned column is pinned at its foot only. Units: N, m, Pa, rad.
 * @see MODELING.md §Lateral-resisting elements (axis convention), docs/mechanics.md §Columns
 */
import { STIFFNESS_FACTOR_DEFAULTS, elementFloorRange } from '@/model'
import type { Column, ColumnFixity, Project } from '@/model'
import { elementMapRow, extendWithSupportFloor } from '../dofs'
import type { AssembledElement, Issue } from '../results'
import { shearChainStiffness } from './frameLine'
import { leftOutIssue, positive } from './leftOut'

/**
 * Story stiffness of a column, N/m, with f the effective stiffness factor and the ends of the story
 * restrained against rotation as follows. The top end meets a floor slab that gives the fraction r of
 * full fixity (r = 1: fixed). The bottom end is the column's foot ('fixed' or 'pinned') in its base
 * story, or another slab joint with the same r ('slab') in the stories above.
 *
 * Rotational-restraint model: each slab joint is a rotational spring of stiffness β·EI/h with
 * β = 6r/(1 - r); static condensation of the Euler-Bernoulli member with its end springs gives
 * - 'slab' (both ends r):     k = r · 12 E I f / h³  (this is what defines r),
 * - 'fixed' foot, top r:      k = 6 (1 + 5r)/(2 + r) · E I f / h³  (12 at r = 1, 3 at r -> 0),
 * - 'pinned' foot, top r:     k = 6r/(1 + r) · E I f / h³          (3 at r = 1, 0 at r -> 0).
 * At r = 1 these are the classic 12EI/h³ (fixed-fixed) and 3EI/h³ (fixed-pinned).
 * @see common practice for 12EI/h³ and 3EI/h³ (sway stiffness of a prismatic member; Gere &
 * Timoshenko, Mechanics of Materials, from memory); the spring forms are derived in
 * docs/mechanics.md §5 by slope-deflection
 */
export function columnStoryStiffness(
  E: number,
  I: number,
  h: number,
  bottom: ColumnFixity | 'slab',
  factor = 1,
  restraint = 1,
): number {
  const r = restraint
  const c = bottom === 'slab' ? 12 * r : bottom === 'fixed' ? (6 * (1 + 5 * r)) / (2 + r) : (6 * r) / (1 + r)
  return (c * E * I * factor) / (h * h * h)
}

/**
 * The two assembled-element records of a column: 'columnX' acts along local x
 * (d = (cos a, sin a), uses I_y) and 'columnY' along local y (d = (-sin a, cos a), uses I_x).
 */
export function buildColumnElements(
  project: Pick<Project, 'floors' | 'materials'>,
  column: Column,
): { elements: AssembledElement[]; issues: Issue[] } {
  const fail = (code: Issue['code'], why: string): { elements: AssembledElement[]; issues: Issue[] } => ({
    elements: [],
    issues: [leftOutIssue('column', column.id, column.name, code, why)],
  })
  const range = elementFloorRange(project, column)
  if (!range) {
    return fail(
      'element-outside-floors',
      `its floor range (base ${column.base}, top ${column.top}) is empty or names an unknown floor`,
    )
  }
  const material = project.materials[column.material]
  if (!material) return fail('invalid-model', `material "${column.material}" does not exist`)
  if (!positive(material.E)) return fail('invalid-model', `material E must be > 0 (got ${material.E})`)
  const factor = column.stiffnessFactor ?? STIFFNESS_FACTOR_DEFAULTS.column
  if (!positive(factor)) return fail('invalid-model', `stiffness factor must be > 0 (got ${factor})`)
  const restraint = column.restraint ?? 1
  if (!(positive(restraint) && restraint <= 1)) {
    return fail('invalid-model', `restraint must lie in (0, 1] (got ${restraint})`)
  }
  if (!(Number.isFinite(column.Ix) && column.Ix >= 0 && Number.isFinite(column.Iy) && column.Iy >= 0)) {
    return fail('invalid-model', `Ix and Iy must be finite and >= 0 (got ${column.Ix}, ${column.Iy})`)
  }
  if (!Number.isFinite(column.angle)) return fail('invalid-model', `angle must be finite (got ${column.angle})`)
  if (!(Number.isFinite(column.at.x) && Number.isFinite(column.at.y))) {
    return fail('invalid-model', 'its position is not finite')
  }
  const kx: number[] = []
  const ky: number[] = []
  for (let f = range.first; f <= range.last; f++) {
    const floor = project.floors[f]
    if (!floor) return fail('element-outside-floors', `floor index ${f} does not exist`)
    if (!positive(floor.height)) return fail('invalid-model', `story height of ${floor.id} must be > 0`)
    // the foot's fixity acts in the column's base story only; above it both ends meet slabs
    const bottom = f === range.first ? column.fixity : 'slab'
    kx.push(columnStoryStiffness(material.E, column.Iy, floor.height, bottom, factor, restraint))
    ky.push(columnStoryStiffness(material.E, column.Ix, floor.height, bottom, factor, restraint))
  }
  const standsOnFloor = range.below >= 0
  const floors: number[] = []
  if (standsOnFloor) floors.push(range.below)
  for (let f = range.first; f <= range.last; f++) floors.push(f)
  const c = Math.cos(column.angle)
  const s = Math.sin(column.angle)
  const make = (kind: 'columnX' | 'columnY', k: number[], d: { x: number; y: number }): AssembledElement => {
    const fixedBase = shearChainStiffness(k)
    return {
      id: column.id,
      kind,
      floors,
      map: elementMapRow(column.at, d),
      standsOnFloor,
      stiffness: standsOnFloor ? extendWithSupportFloor(fixedBase, k.length) : fixedBase,
      isShearType: true,
    }
  }
  const elements: AssembledElement[] = []
  if (column.Iy > 0) elements.push(make('columnX', kx, { x: c, y: s }))
  if (column.Ix > 0) elements.push(make('columnY', ky, { x: -s, y: c }))
  return { elements, issues: [] }
}
