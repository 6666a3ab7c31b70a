/**
 * Moment frame condensed from a plane frame: (bays + 1) column lines, beams of one bay width at every
 * floor the frame spans, columns of the story heights, feet fixed or pinned. Axial deformation of
 * beams and columns is neglected, so each floor has one lateral DOF shared by all its joints and the
 * joints add one rotation each; the rotations are condensed out statically. The result is the full
 * N_e x N_e lateral stiffness over the floors the frame spans, exact for that idealisation.
 * Units: N, m, Pa (E·I in N·m²).
 * @see docs/mechanics.md §4; McGuire, Gallagher & Ziemian, Matrix Structural Analysis, 2nd ed. (2000),
 * plane-frame element and static condensation (from memory)
 */

/** One story of a moment frame. */
export interface MomentFrameStory {
  /** story height, m */
  readonly h: number
  /** E·I of one column in this story (factor applied), N·m² */
  readonly EIc: number
  /** E·I of one beam at the floor on top of this story (factor applied), N·m² */
  readonly EIb: number
}

/**
 * Cholesky factor of a symmetric positive definite band matrix, in place. `a` holds the lower band
 * row by row: a[i*(b+1) + (b - (i - j))] = A[i][j] for i - b <= j <= i. Returns false when a pivot is
 * not positive (the matrix is not positive definite).
 * @see Golub & Van Loan, Matrix Computations, band Cholesky (from memory)
 */
function bandCholesky(a: Float64Array, n: number, b: number): boolean {
  const w = b + 1
  for (let i = 0; i < n; i++) {
    const j0 = Math.max(0, i - b)
    for (let j = j0; j <= i; j++) {
      let s = a[i * w + b - (i - j)]!
      const k0 = Math.max(j0, j - b)
      for (let k = k0; k < j; k++) s -= a[i * w + b - (i - k)]! * a[j * w + b - (j - k)]!
      if (j === i) {
        if (!(s > 0)) return false
        a[i * w + b] = Math.sqrt(s)
      } else {
        a[i * w + b - (i - j)] = s / a[j * w + b]!
      }
    }
  }
  return true
}

/**
 * Solve L L' x = y in place with the band factor from bandCholesky; y[0..start-1] must be zero (the
 * forward sweep starts at `start`, since L is lower triangular).
 */
function bandSolve(a: Float64Array, n: number, b: number, y: Float64Array, start = 0): void {
  const w = b + 1
  for (let i = start; i < n; i++) {
    let s = y[i]!
    for (let k = Math.max(start, i - b); k < i; k++) s -= a[i * w + b - (i - k)]! * y[k]!
    y[i] = s / a[i * w + b]!
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i]!
    for (let k = i + 1; k <= Math.min(n - 1, i + b); k++) s -= a[k * w + b - (k - i)]! * y[k]!
    y[i] = s / a[i * w + b]!
  }
}

/**
 * Lateral stiffness (n x n, row-major, N/m) of a plane moment frame of n stories standing on a rigid
 * base, DOFs the lateral displacements of its n floors, bottom first.
 *
 * Assembly (Euler-Bernoulli members, axial deformation neglected): each column of story s adds
 * EI/h³ [[12, 6h, -12, 6h], [6h, 4h², -6h, 2h²], [-12, -6h, 12, -6h], [6h, 2h², -6h, 4h²]] on
 * (u_below, θ_bottom, u_above, θ_top), with u = 0 and, for a fixed foot, θ = 0 at the base; each beam
 * of a floor adds EI/L [[4, 2], [2, 4]] on the rotations of the two joints it joins (its ends do not
 * move vertically or apart). With the lateral DOFs u and rotations θ,
 * K = K_uu - K_uθ K_θθ⁻¹ K_θu. K_θθ is banded (rotations ordered along the shorter grid direction),
 * factored once by band Cholesky. Returns null when K_θθ is not positive definite (cannot happen for
 * positive members; kept as a guard).
 * @see McGuire, Gallagher & Ziemian, Matrix Structural Analysis (2000) §4 (plane-frame element) and
 * static condensation (from memory); docs/mechanics.md §4
 */
export function momentFrameStiffness(
  stories: readonly MomentFrameStory[],
  bays: number,
  bayWidth: number,
  baseFixity: 'fixed' | 'pinned' = 'fixed',
): Float64Array | null {
  const n = stories.length
  if (n === 0) return new Float64Array(0)
  const m = bays + 1 // column lines
  const pinned = baseFixity === 'pinned'
  // rotation levels: 1..n always, level 0 (the feet) when pinned
  const firstLevel = pinned ? 0 : 1
  const levels = n + 1 - firstLevel
  const N = levels * m
  // order rotations with the shorter grid direction running fastest: band = that length
  const byLevel = m <= levels
  const band = byLevel ? m : levels
  const rot = (level: number, j: number): number =>
    byLevel ? (level - firstLevel) * m + j : j * levels + (level - firstLevel)
  const w = band + 1
  const A = new Float64Array(N * w)
  const addA = (i: number, j: number, v: number): void => {
    if (j > i) [i, j] = [j, i]
    A[i * w + band - (i - j)] = A[i * w + band - (i - j)]! + v
  }
  const Kuu = new Float64Array(n * n)
  // K_uθ as sparse lists per rotation: (floor index, value); at most 2 per column element end
  const Kut: { u: number; v: number }[][] = Array.from({ length: N }, () => [])
  // the same entries by floor: the right-hand side K_θu[:, floor] has only these non-zeros
  const byFloor: { r: number; v: number }[][] = Array.from({ length: n }, () => [])
  const link = (r: number, u: number, v: number): void => {
    Kut[r]!.push({ u, v })
    byFloor[u]!.push({ r, v })
  }
  for (let s = 0; s < n; s++) {
    const { h, EIc, EIb } = stories[s]!
    const a = (12 * EIc) / (h * h * h)
    const c = (6 * EIc) / (h * h)
    const d = (4 * EIc) / h
    const e = (2 * EIc) / h
    const below = s - 1 // floor index of u_below (-1 = base)
    const above = s
    Kuu[above * n + above] = Kuu[above * n + above]! + m * a
    if (below >= 0) {
      Kuu[below * n + below] = Kuu[below * n + below]! + m * a
      Kuu[below * n + above] = Kuu[below * n + above]! - m * a
      Kuu[above * n + below] = Kuu[above * n + below]! - m * a
    }
    for (let j = 0; j < m; j++) {
      const top = rot(s + 1, j)
      addA(top, top, d)
      link(top, above, -c)
      if (below >= 0) link(top, below, c)
      if (s > 0 || pinned) {
        const bot = rot(s, j)
        addA(bot, bot, d)
        addA(top, bot, e)
        link(bot, above, -c)
        if (below >= 0) link(bot, below, c)
      }
    }
    // beams at the floor on top of story s (level s + 1)
    const kb4 = (4 * EIb) / bayWidth
    const kb2 = (2 * EIb) / bayWidth
    for (let j = 0; j < bays; j++) {
      const p = rot(s + 1, j)
      const q = rot(s + 1, j + 1)
      addA(p, p, kb4)
      addA(q, q, kb4)
      addA(p, q, kb2)
    }
  }
  if (!bandCholesky(A, N, band)) return null
  // K = K_uu - K_uθ X with X = K_θθ⁻¹ K_θu, column by column (one column per floor)
  const K = Kuu
  const y = new Float64Array(N)
  for (let col = 0; col < n; col++) {
    y.fill(0)
    let first = N
    for (const t of byFloor[col]!) {
      y[t.r] = y[t.r]! + t.v
      first = Math.min(first, t.r)
    }
    bandSolve(A, N, band, y, first)
    for (let r = 0; r < N; r++) {
      const x = y[r]!
      if (x === 0) continue
      for (const t of Kut[r]!) K[t.u * n + col] = K[t.u * n + col]! - t.v * x
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
