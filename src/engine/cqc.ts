/**
 * Modal combination: the CQC correlation coefficient of Der Kiureghian (1981) and the CQC / SRSS
 * combination of modal peak values.
 * @see METHODS.md §3; Der Kiureghian A. (1981) EESD 9(5):419-435; Wilson, Der Kiureghian & Bayo
 *   (1981) EESD 9(2):187-194 (citations from memory)
 */

/**
 * Correlation coefficient for equal modal damping zeta and frequency ratio r = omega_j / omega_i:
 * rho = 8 zeta² (1 + r) r^1.5 / ((1 - r²)² + 4 zeta² r (1 + r)²). rho(1) = 1.
 */
export function cqcCorrelationEqual(ratio: number, damping: number): number {
  const r = ratio
  const z = damping
  if (!(r > 0)) throw new RangeError(`[engine] cqc: frequency ratio must be > 0 (got ${r})`)
  if (z === 0) return r === 1 ? 1 : 0
  const num = 8 * z * z * (1 + r) * r ** 1.5
  const den = (1 - r * r) ** 2 + 4 * z * z * r * (1 + r) ** 2
  return num / den
}

/**
 * Correlation coefficient for unequal damping, r = omega_j / omega_i, zetaI belongs to mode i:
 * rho = 8 sqrt(zi zj) (zi + r zj) r^1.5 / ((1 - r²)² + 4 zi zj r (1 + r²) + 4 (zi² + zj²) r²).
 * With zi = zj it reproduces {@link cqcCorrelationEqual}.
 */
export function cqcCorrelation(ratio: number, dampingI: number, dampingJ: number): number {
  const r = ratio
  const zi = dampingI
  const zj = dampingJ
  if (!(r > 0)) throw new RangeError(`[engine] cqc: frequency ratio must be > 0 (got ${r})`)
  const den = (1 - r * r) ** 2 + 4 * zi * zj * r * (1 + r * r) + 4 * (zi * zi + zj * zj) * r * r
  if (den === 0) return 1 // identical undamped modes: fully correlated
  return (8 * Math.sqrt(zi * zj) * (zi + r * zj) * r ** 1.5) / den
}

/**
 * Symmetric correlation matrix (row-major count²) for modes with angular frequencies omega (rad/s)
 * and damping ratios (one per mode, or one value for all).
 */
export function cqcMatrix(
  angularFrequencies: ArrayLike<number>,
  damping: number | ArrayLike<number>,
): Float64Array {
  const n = angularFrequencies.length
  const rho = new Float64Array(n * n)
  const zeta = (i: number): number => (typeof damping === 'number' ? damping : damping[i]!)
  for (let i = 0; i < n; i++) {
    rho[i * n + i] = 1
    const wi = angularFrequencies[i]!
    for (let j = i + 1; j < n; j++) {
      const wj = angularFrequencies[j]!
      const zi = zeta(i)
      const zj = zeta(j)
      const c = zi === zj ? cqcCorrelationEqual(wj / wi, zi) : cqcCorrelation(wj / wi, zi, zj)
      rho[i * n + j] = c
      rho[j * n + i] = c
    }
  }
  return rho
}

/** CQC combination sqrt(sum_i sum_j rho_ij R_i R_j) of signed modal values R (same units out). */
export function combineCqc(modal: ArrayLike<number>, rho: ArrayLike<number>): number {
  const n = modal.length
  if (rho.length !== n * n) throw new RangeError(`[engine] cqc: rho must be ${n}x${n}`)
  let s = 0
  for (let i = 0; i < n; i++) {
    const ri = modal[i]!
    if (ri === 0) continue
    s += ri * ri
    for (let j = i + 1; j < n; j++) s += 2 * rho[i * n + j]! * ri * modal[j]!
  }
  // Rounding can push a fully cancelling sum a hair below zero.
  return Math.sqrt(Math.max(0, s))
}

/** SRSS combination sqrt(sum R_i²). */
export function combineSrss(modal: ArrayLike<number>): number {
  let s = 0
  for (let i = 0; i < modal.length; i++) s += modal[i]! * modal[i]!
  return Math.sqrt(s)
}
