/**
 * Shear wall (in-plane only): a stack of Timoshenko story elements, fixed at its base, with the
 * rotations at the floors condensed out. Result: a full lateral stiffness over the floors it connects.
 * Units: N, m, Pa.
 * @see METHODS.md §4 (element matrix), MODELING.md §Lateral-resisting elements, docs/mechanics.md §Walls
 */
import { elementFloorRange } from '@/model'
import type { Project, Wall } from '@/model'
import { elementMapRow, extendWithSupportFloor, segmentDirection } from '../dofs'
import type { AssembledElement, Issue } from '../results'
import { leftOutIssue, positive } from './leftOut'

/** Bending and shear rigidity of one story of a wall. */
export interface WallStory {
  /** story height, m */
  readonly h: number
  /** E I, N·m² */
  readonly EI: number
  /** G A_s, N */
  readonly GAs: number
}

/**
 * Timoshenko beam element stiffness (4x4 row-major, DOFs v1, th1, v2, th2), N/m, N, N·m:
 * EI/((1+Phi) h³) [[12, 6h, -12, 6h], [6h, (4+Phi)h², -6h, (2-Phi)h²], [-12, -6h, 12, -6h],
 * [6h, (2-Phi)h², -6h, (4+Phi)h²]] with Phi = 12 EI / (G A_s h²).
 * @see METHODS.md §4; Przemieniecki, Theory of Matrix Structural Analysis (1968) (from memory)
 */
export function timoshenkoElementStiffness(EI: number, GAs: number, h: number): Float64Array {
  const phi = (12 * EI) / (GAs * h * h)
  const c = EI / ((1 + phi) * h * h * h)
  const a = 12 * c
  const b = 6 * h * c
  const d = (4 + phi) * h * h * c
  const e = (2 - phi) * h * h * c
  return Float64Array.from([a, b, -a, b, b, d, -b, e, -a, -b, a, -b, b, e, -b, d])
}

/**
 * Lateral stiffness (n x n, row-major, N/m) of a wall stack of n stories fixed at its base
 * (translation and rotation), DOFs the lateral displacements of the n floors above the base.
 * The 2n x 2n Timoshenko assembly [Kvv Kvt; Ktv Ktt] is condensed statically:
 * K = Kvv - Kvt Ktt^-1 Ktv (floors do not restrain the wall's rotation). Ktt is tridiagonal and
 * positive definite, so it is factored once (LDL') and solved for the three-term columns of Ktv;
 * the cost is O(n²). The result is symmetrized exactly.
 * @see METHODS.md §4; static condensation (Guyan 1965, from memory); docs/mechanics.md §Walls
 */
export function wallStackStiffness(stories: readonly WallStory[]): Float64Array {
  const n = stories.length
  if (n === 0) return new Float64Array(0)
  // Per-story coefficients of the element matrix: a = 12c, b = 6hc, d = (4+Phi)h²c, e = (2-Phi)h²c.
  const a = new Float64Array(n)
  const b = new Float64Array(n)
  const d = new Float64Array(n)
  const e = new Float64Array(n)
  for (let s = 0; s < n; s++) {
    const { h, EI, GAs } = stories[s] as WallStory
    const phi = (12 * EI) / (GAs * h * h)
    const c = EI / ((1 + phi) * h * h * h)
    a[s] = 12 * c
    b[s] = 6 * h * c
    d[s] = (4 + phi) * h * h * c
    e[s] = (2 - phi) * h * h * c
  }
  // Non-null assertions below are safe: every index is in 0..n-1 by the loop bounds.
  // Kvt rows: Kvt[i][i-1] = -b_i, Kvt[i][i] = -b_i + b_{i+1}, Kvt[i][i+1] = b_{i+1}.
  const kvtL = new Float64Array(n) // [i][i-1]
  const kvtD = new Float64Array(n) // [i][i]
  const kvtU = new Float64Array(n) // [i][i+1]
  // Ktt tridiagonal: diag = d_i + d_{i+1}, off (i, i+1) = e_{i+1}.
  const tD = new Float64Array(n)
  const tO = new Float64Array(n) // tO[i] = Ktt[i][i+1]
  for (let i = 0; i < n; i++) {
    const up = i + 1 < n
    kvtL[i] = -b[i]!
    kvtD[i] = -b[i]! + (up ? b[i + 1]! : 0)
    kvtU[i] = up ? b[i + 1]! : 0
    tD[i] = d[i]! + (up ? d[i + 1]! : 0)
    tO[i] = up ? e[i + 1]! : 0
  }
  // LDL' of Ktt: D_i = tD_i - l_{i-1}² D_{i-1}, l_i = tO_i / D_i.
  const D = new Float64Array(n)
  const l = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    D[i] = tD[i]! - (i > 0 ? l[i - 1]! * l[i - 1]! * D[i - 1]! : 0)
    l[i] = tO[i]! / D[i]!
  }
  // X = Ktt^-1 Ktv, column j of Ktv = row j of Kvt: entries at rows j-1, j, j+1.
  const X = new Float64Array(n * n) // column-major: X[j*n + k]
  const w = new Float64Array(n)
  for (let j = 0; j < n; j++) {
    w.fill(0)
    if (j > 0) w[j - 1] = kvtL[j]!
    w[j] = kvtD[j]!
    if (j + 1 < n) w[j + 1] = kvtU[j]!
    const start = Math.max(j - 1, 0)
    for (let k = start + 1; k < n; k++) w[k] = w[k]! - l[k - 1]! * w[k - 1]!
    for (let k = 0; k < n; k++) w[k] = w[k]! / D[k]!
    for (let k = n - 2; k >= 0; k--) w[k] = w[k]! - l[k]! * w[k + 1]!
    X.set(w, j * n)
  }
  const K = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0
      if (i > 0) s += kvtL[i]! * X[j * n + i - 1]!
      s += kvtD[i]! * X[j * n + i]!
      if (i + 1 < n) s += kvtU[i]! * X[j * n + i + 1]!
      let kvv = 0
      if (i === j) kvv = a[i]! + (i + 1 < n ? a[i + 1]! : 0)
      else if (j === i + 1) kvv = -a[j]!
      else if (i === j + 1) kvv = -a[i]!
      K[i * n + j] = kvv - s
    }
  }
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const v = 0.5 * (K[i * n + j]! + K[j * n + i]!)
      K[i * n + j] = v
      K[j * n + i] = v
    }
  }
  return K
}

/**
 * Assembled-element record of a wall: per story I = t L³/12 f_I, A_s = (5/6) t L f_A,
 * G = E/(2(1+nu)), overrides from `wall.stories` keyed by the story's top floor id. A wall standing
 * on floor b moves with floor b (its base translation is floor b's DOF) and its rotation there is
 * fixed. Returns issues (never throws) for zero length, unknown floors, a missing material or bad
 * section values.
 */
export function buildWallElement(
  project: Pick<Project, 'floors' | 'materials'>,
  wall: Wall,
): { element: AssembledElement | null; issues: Issue[] } {
  const fail = (code: Issue['code'], why: string): { element: null; issues: Issue[] } => ({
    element: null,
    issues: [leftOutIssue('wall', wall.id, wall.name, code, why)],
  })
  const seg = segmentDirection(wall.p1, wall.p2)
  if (!seg) return fail('zero-length', 'its two end points coincide (zero length)')
  const range = elementFloorRange(project, wall)
  if (!range) {
    return fail(
      'element-outside-floors',
      `its floor range (base ${wall.base}, top ${wall.top}) is empty or names an unknown floor`,
    )
  }
  const material = project.materials[wall.material]
  if (!material) return fail('invalid-model', `material "${wall.material}" does not exist`)
  if (!positive(material.E)) return fail('invalid-model', `material E must be > 0 (got ${material.E})`)
  if (!(Number.isFinite(material.nu) && material.nu > -1 && material.nu < 0.5 + 1e-12)) {
    return fail('invalid-model', `material nu must lie in (-1, 0.5] (got ${material.nu})`)
  }
  const G = material.E / (2 * (1 + material.nu))
  const L = seg.length
  const stories: WallStory[] = []
  for (let f = range.first; f <= range.last; f++) {
    const floor = project.floors[f]
    if (!floor) return fail('element-outside-floors', `floor index ${f} does not exist`)
    const o = wall.stories?.[floor.id]
    const t = o?.thickness ?? wall.thickness
    const fI = o?.flexureFactor ?? wall.flexureFactor
    const fA = o?.shearFactor ?? wall.shearFactor
    if (!positive(floor.height)) return fail('invalid-model', `story height of ${floor.id} must be > 0`)
    if (!positive(t)) return fail('invalid-model', `thickness at story ${floor.id} must be > 0 (got ${t})`)
    if (!positive(fI) || !positive(fA)) {
      return fail('invalid-model', `stiffness factors at story ${floor.id} must be > 0 (got ${fI}, ${fA})`)
    }
    const I = ((t * L * L * L) / 12) * fI
    const As = (5 / 6) * t * L * fA
    stories.push({ h: floor.height, EI: material.E * I, GAs: G * As })
  }
  const n = stories.length
  const fixedBase = wallStackStiffness(stories)
  const standsOnFloor = range.below >= 0
  const floors: number[] = []
  if (standsOnFloor) floors.push(range.below)
  for (let f = range.first; f <= range.last; f++) floors.push(f)
  return {
    element: {
      id: wall.id,
      kind: 'wall',
      floors,
      map: elementMapRow(wall.p1, seg.d),
      standsOnFloor,
      stiffness: standsOnFloor ? extendWithSupportFloor(fixedBase, n) : fixedBase,
      isShearType: false,
    },
    issues: [],
  }
}
