/**
 * Conditioning of the stiffness floor by floor: how much softer a floor's weakest direction is than its
 * strongest one, from the floor's 3x3 flexibility block in scaled coordinates (translations of its
 * centre of mass and rotation times the reference length l, see solve.ts). A direction held by almost
 * nothing (a 1 mm wall, walls a fraction of a degree apart) gives a ratio many orders of magnitude below
 * any real building's; the thresholds and their reasoning are in docs/mechanics.md §7.
 * @see docs/mechanics.md §7 "Near-mechanisms: floor stiffness ratio"
 */

/**
 * A floor whose weakest-to-strongest stiffness ratio is below this is refused as a mechanism: the
 * direction is held by less than a hundred-millionth of the floor's strongest stiffness, far below
 * what the model leaves out (see docs/mechanics.md §7), so no period or drift in it means anything.
 */
export const NEAR_MECHANISM_RATIO = 1e-8

/**
 * A floor whose ratio is below this (but above NEAR_MECHANISM_RATIO) gets an 'ill-conditioned'
 * warning: the weak direction is softer than the out-of-plane stiffness of walls and the column
 * torsion that the model ignores (about (t/L)² ≈ 1e-3 of a wall's in-plane stiffness).
 */
export const SOFT_DIRECTION_RATIO = 1e-3

/** Eigenvalues (ascending) and unit eigenvectors (column k at [k], [3 + k], [6 + k]) of a symmetric 3x3. */
export function symmetricEigen3(a: ArrayLike<number>): { values: Float64Array; vectors: Float64Array } {
  // Cyclic Jacobi rotations: exact to round-off for 3x3 in a handful of sweeps (Golub & Van Loan,
  // Matrix Computations, §8.5, the classical Jacobi method).
  const m = Float64Array.from({ length: 9 }, (_, k) => a[k] ?? 0)
  const v = Float64Array.from([1, 0, 0, 0, 1, 0, 0, 0, 1])
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = Math.abs(m[1]!) + Math.abs(m[2]!) + Math.abs(m[5]!)
    const scale = Math.abs(m[0]!) + Math.abs(m[4]!) + Math.abs(m[8]!)
    if (!(off > 1e-17 * scale)) break
    for (const [p, q] of [
      [0, 1],
      [0, 2],
      [1, 2],
    ] as const) {
      const apq = m[3 * p + q]!
      if (apq === 0) continue
      const app = m[3 * p + p]!
      const aqq = m[3 * q + q]!
      const theta = (aqq - app) / (2 * apq)
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1))
      const c = 1 / Math.sqrt(t * t + 1)
      const s = t * c
      for (let k = 0; k < 3; k++) {
        const mkp = m[3 * k + p]!
        const mkq = m[3 * k + q]!
        m[3 * k + p] = c * mkp - s * mkq
        m[3 * k + q] = s * mkp + c * mkq
      }
      for (let k = 0; k < 3; k++) {
        const mpk = m[3 * p + k]!
        const mqk = m[3 * q + k]!
        m[3 * p + k] = c * mpk - s * mqk
        m[3 * q + k] = s * mpk + c * mqk
      }
      for (let k = 0; k < 3; k++) {
        const vkp = v[3 * k + p]!
        const vkq = v[3 * k + q]!
        v[3 * k + p] = c * vkp - s * vkq
        v[3 * k + q] = s * vkp + c * vkq
      }
    }
  }
  const order = [0, 1, 2].sort((i, j) => m[4 * i]! - m[4 * j]!)
  const values = Float64Array.from(order, (i) => m[4 * i]!)
  const vectors = new Float64Array(9)
  order.forEach((i, k) => {
    for (let r = 0; r < 3; r++) vectors[3 * r + k] = v[3 * r + i]!
  })
  return { values, vectors }
}

/** Conditioning of one floor. */
export interface FloorConditioning {
  /** 0-based floor index. */
  readonly floor: number
  /**
   * Stiffness of the floor's weakest direction over that of its strongest (each for a load on this
   * floor alone, the other floors free), in scaled coordinates; 1 = equally stiff, 0 = free.
   */
  readonly ratio: number
  /** The weakest direction in scaled coordinates (t_x, t_y, theta·l), unit length. */
  readonly weakShape: readonly [number, number, number]
}

/**
 * Per-floor conditioning from the scaled flexibility blocks (floor-major 3x3, row-major at 9j):
 * ratio = lambda_min(F_j) / lambda_max(F_j), which equals the ratio of the extreme eigenvalues of the
 * floor's condensed stiffness F_j^-1.
 */
export function floorConditioning(scaledBlocks: Float64Array, floorCount: number): FloorConditioning[] {
  const out: FloorConditioning[] = []
  for (let j = 0; j < floorCount; j++) {
    const { values, vectors } = symmetricEigen3(scaledBlocks.subarray(9 * j, 9 * j + 9))
    const hi = values[2]!
    const lo = values[0]!
    const ratio = hi > 0 && Number.isFinite(hi) ? Math.max(0, lo) / hi : 0
    out.push({ floor: j, ratio, weakShape: [vectors[2]!, vectors[5]!, vectors[8]!] })
  }
  return out
}
