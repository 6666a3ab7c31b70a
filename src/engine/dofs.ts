/**
 * DOF numbering and floor-to-element maps. Each floor is a rigid diaphragm with three DOF at the plan
 * origin O: [u_x, u_y, theta] (m, m, rad); floor j (0-based) owns DOFs 3j, 3j+1, 3j+2.
 * @see MODELING.md §Degrees of freedom
 */
import type { Point } from '@/model'

/** DOFs per floor. */
export const DOFS_PER_FLOOR = 3

/** Global DOF index of component c (0 = u_x, 1 = u_y, 2 = theta) of floor j (0-based). */
export function dofIndex(floorIndex: number, component: 0 | 1 | 2): number {
  return DOFS_PER_FLOOR * floorIndex + component
}

/**
 * Floor-to-element map row a = [d_x, d_y, x d_y - y d_x] for an element acting along the unit
 * direction d through the plan point (x, y): the element's deformation is a·[u_x, u_y, theta].
 * Any point on the line gives the same row.
 * @see MODELING.md §Lateral-resisting elements
 */
export function elementMapRow(point: Point, direction: Point): [number, number, number] {
  return [direction.x, direction.y, point.x * direction.y - point.y * direction.x]
}

/** Unit direction from p1 to p2 and the length; null when the length is zero or not finite. */
export function segmentDirection(p1: Point, p2: Point): { d: Point; length: number } | null {
  const dx = p2.x - p1.x
  const dy = p2.y - p1.y
  const length = Math.hypot(dx, dy)
  if (!(length > 0) || !Number.isFinite(length)) return null
  return { d: { x: dx / length, y: dy / length }, length }
}

/**
 * Stiffness over [u_b, u_1..u_n] of an element whose base moves with a support floor b, from its
 * stiffness k (n x n, row-major) with the base held fixed. The element deforms with u_i - u_b, so the
 * result is T' k T with T = [-1 | I]: a rigid translation of the whole element gives no force.
 * @see MODELING.md §Lateral-resisting elements (an element standing on floor b moves with floor b)
 */
export function extendWithSupportFloor(k: Float64Array, n: number): Float64Array {
  if (k.length !== n * n) throw new RangeError(`[engine] extendWithSupportFloor: expected ${n * n} terms, got ${k.length}`)
  const m = n + 1
  const out = new Float64Array(m * m)
  let total = 0
  for (let i = 0; i < n; i++) {
    let row = 0
    for (let j = 0; j < n; j++) {
      const v = k[i * n + j] as number
      out[(i + 1) * m + j + 1] = v
      row += v
    }
    // Column sums equal row sums because k is symmetric; use the row sum for both to stay symmetric.
    out[(i + 1) * m] = -row
    out[i + 1] = -row
    total += row
  }
  out[0] = total
  return out
}
