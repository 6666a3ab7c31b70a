/**
 * Matrix diagnostics used by the engine and its tests: symmetry, mass sums, definiteness.
 * All matrices are dense row-major Float64Array of size n².
 * @see docs/mechanics.md §Checks
 */

/** Size n of a square row-major matrix; throws for a length that is not a square. */
export function squareSize(A: Float64Array): number {
  const n = Math.round(Math.sqrt(A.length))
  if (n * n !== A.length) throw new RangeError(`[engine] matrix of ${A.length} terms is not square`)
  return n
}

/**
 * Largest |A_ij - A_ji| relative to the largest |A_ij| (0 for an exactly symmetric matrix,
 * 0 for the zero matrix).
 */
export function symmetryError(A: Float64Array): number {
  const n = squareSize(A)
  let maxAbs = 0
  let maxDiff = 0
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const a = A[i * n + j] as number
      maxAbs = Math.max(maxAbs, Math.abs(a))
      if (j > i) maxDiff = Math.max(maxDiff, Math.abs(a - (A[j * n + i] as number)))
    }
  }
  return maxAbs > 0 ? maxDiff / maxAbs : 0
}

/** True when A equals its transpose term by term (exact comparison, as symmetric solvers need). */
export function isExactlySymmetric(A: Float64Array): boolean {
  const n = squareSize(A)
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) if (A[i * n + j] !== A[j * n + i]) return false
  }
  return true
}

/**
 * Translational mass of a global mass matrix along x and y: r' M r for r = unit translation of all
 * floors (r = [1, 0, 0, 1, 0, 0, ...] for x), kg. Equals the total floor mass for a correct M.
 */
export function translationalMass(M: Float64Array): { x: number; y: number } {
  const n = squareSize(M)
  if (n % 3 !== 0) throw new RangeError(`[engine] mass matrix size ${n} is not 3 per floor`)
  let x = 0
  let y = 0
  for (let i = 0; i < n; i += 3) {
    for (let j = 0; j < n; j += 3) {
      x += M[i * n + j] as number
      y += M[(i + 1) * n + j + 1] as number
    }
  }
  return { x, y }
}

/**
 * Positive definiteness by an unpivoted Cholesky attempt on a copy: returns ok and the smallest pivot
 * relative to its diagonal (the same measure the stiffness solver uses), and the first failing index.
 */
export function checkPositiveDefinite(
  A: Float64Array,
  tolerance = 1e-12,
): { ok: boolean; minPivotRatio: number; failedIndex: number } {
  const n = squareSize(A)
  const L = Float64Array.from(A)
  let minRatio = Number.POSITIVE_INFINITY
  // Non-null assertions: indices < n*n by the loop bounds.
  for (let i = 0; i < n; i++) {
    const ri = i * n
    for (let j = 0; j < i; j++) {
      const rj = j * n
      let s = L[ri + j]!
      for (let k = 0; k < j; k++) s -= L[ri + k]! * L[rj + k]!
      L[ri + j] = s / L[rj + j]!
    }
    let d = L[ri + i]!
    for (let k = 0; k < i; k++) d -= L[ri + k]! * L[ri + k]!
    const di = A[ri + i]!
    const ratio = di > 0 ? d / di : Number.NEGATIVE_INFINITY
    if (!(di > 0) || !(ratio > tolerance)) return { ok: false, minPivotRatio: Math.min(minRatio, ratio), failedIndex: i }
    minRatio = Math.min(minRatio, ratio)
    L[ri + i] = Math.sqrt(d)
  }
  return { ok: true, minPivotRatio: n > 0 ? minRatio : 1, failedIndex: -1 }
}

/** y = A x for a row-major square A. */
export function multiply(A: Float64Array, x: ArrayLike<number>): Float64Array {
  const n = squareSize(A)
  if (x.length !== n) throw new RangeError(`[engine] multiply: vector has ${x.length} terms, expected ${n}`)
  const y = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    let s = 0
    for (let j = 0; j < n; j++) s += (A[i * n + j] as number) * (x[j] as number)
    y[i] = s
  }
  return y
}
