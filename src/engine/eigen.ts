/**
 * Generalized symmetric eigenproblem K phi = omega² M phi for rigid-diaphragm floors (3 DOF each).
 *
 * M is 3x3 block-diagonal. At each floor's centre of mass its block is diag(m, m, J), so the change of
 * variables u_O = T u_CM followed by the scaling 1/sqrt(m), 1/sqrt(J) (together: u = S z) turns the
 * problem into the standard symmetric one A z = lambda z with A = S' K S, without a Cholesky factor of a
 * dense M. Two solvers work on A:
 * - `dense`: Householder tridiagonalisation, implicit QL for the eigenvalues, inverse iteration on the
 *   tridiagonal matrix for the vectors (re-orthogonalised inside clusters), back-transformation by the
 *   stored reflectors. All modes.
 * - `lanczos`: block Lanczos on A^-1 (shift-invert at sigma = 0) with full re-orthogonalisation, started
 *   from the load vectors S' M r (X, Y, rotation). Lowest modes only; the count is then proved exact by a
 *   Sturm-sequence check: the number of negative pivots of LDL'(A - sigma I), which by Sylvester's law of
 *   inertia equals the number of eigenvalues of K phi = omega² M phi below sigma.
 * @see docs/dynamics.md for the equations and sources (Golub & Van Loan, Matrix Computations, 4th ed.,
 *   §8.3 tridiagonalisation and symmetric QR, §8.2.2/§10.3 inverse iteration and block Lanczos;
 *   Bathe, Finite Element Procedures, §11.4.3 Sturm sequence check).
 */
import type { Issue } from './results'

/** Options of `solveEigen`. */
export interface EigenOptions {
  /**
   * 'all' (default): every mode by the dense solver. 'lowest': the lowest modes by block Lanczos with a
   * Sturm check; how many is set by `count`, `massTarget` and `periodCutoff` (the largest need wins).
   */
  readonly method?: 'all' | 'lowest'
  /** Lowest-mode method: at least this many modes (default 12, capped at the DOF count). */
  readonly count?: number
  /**
   * Lowest-mode method: keep adding modes until the cumulative effective mass ratio reaches this share
   * (0..1) for every load vector given in `loads` (default 0.9).
   */
  readonly massTarget?: number
  /** Lowest-mode method: also find every mode with a period at least this long, s (default none). */
  readonly periodCutoff?: number
  /**
   * Load (influence) vectors r at O, each 3N long, used to start Lanczos and for `massTarget`.
   * Default: X and Y translation.
   */
  readonly loads?: readonly Float64Array[]
  /**
   * Lowest-mode method: u = K^-1 f from an existing factorization of K (e.g. the stiffness solver's);
   * without it the method factors A itself.
   */
  readonly solveStiffness?: (rhs: Float64Array) => Float64Array
}

/** Eigen solution at O: eigenvalues omega² ascending, vectors mode-major and M-normalized. */
export interface EigenSolution {
  readonly count: number
  readonly dofCount: number
  /** omega², (rad/s)², ascending. */
  readonly eigenvalues: Float64Array
  /** phi[m * dofCount + i], phi' M phi = 1, largest |component| positive. */
  readonly vectors: Float64Array
  /** Solver that produced the modes, in words. */
  readonly solver: string
  /** True when all dofCount modes were found. */
  readonly complete: boolean
  /**
   * For the lowest-mode method: the Sturm count (number of eigenvalues below `sturmShift`); it equals
   * `count` when no mode below the shift was missed.
   */
  readonly sturmCount: number | null
  /** omega² of the Sturm check, (rad/s)². */
  readonly sturmShift: number | null
  readonly issues: readonly Issue[]
}

// ---------------------------------------------------------------- reduction to standard form

/** Per-floor centre of mass, mass and rotary inertia read back from M, with S = T diag(1/sqrt(m), 1/sqrt(m), 1/sqrt(J)). */
export interface StandardForm {
  readonly n: number
  /** A = S' K S, row-major n². */
  readonly A: Float64Array
  /** Per floor: [s, s02, s12, s22] with S block [[s, 0, s02], [0, s, s12], [0, 0, s22]]. */
  readonly S: Float64Array
}

/**
 * Reduce K, M (row-major, 3N) to A = S'KS. Returns issues (no floor mass, no rotary inertia, M not of the
 * rigid-diaphragm form) instead of NaN; `floorNames` name the floors in messages.
 */
export function reduceToStandard(
  K: Float64Array,
  M: Float64Array,
  n: number,
  floorNames: readonly string[] = [],
): { form: StandardForm | null; issues: Issue[] } {
  if (n % 3 !== 0 || K.length !== n * n || M.length !== n * n) {
    throw new RangeError(`[engine] reduceToStandard: sizes do not match (n = ${n})`)
  }
  const nf = n / 3
  const S = new Float64Array(4 * nf)
  const issues: Issue[] = []
  for (let f = 0; f < nf; f++) {
    const o = 3 * f
    const name = floorNames[f] ?? `floor ${f + 1}`
    const m = M[o * n + o]!
    const mYY = M[(o + 1) * n + o + 1]!
    const scale = Math.abs(m) + Math.abs(mYY)
    if (!(m > 0) || !(mYY > 0)) {
      issues.push({
        code: 'no-mass',
        severity: 'error',
        message: `[engine] ${name}: floor mass is zero or negative, so its modes are undefined`,
        refs: floorNames[f] ? [floorNames[f]!] : [],
        direction: 'x/y',
      })
      continue
    }
    // M block about O: [[m, 0, -m y], [0, m, m x], [-m y, m x, J + m (x² + y²)]].
    const xm = M[(o + 1) * n + o + 2]! / m
    const ym = -M[o * n + o + 2]! / m
    const J = M[(o + 2) * n + o + 2]! - m * (xm * xm + ym * ym)
    if (Math.abs(mYY - m) > 1e-9 * scale || Math.abs(M[o * n + o + 1]!) > 1e-9 * scale) {
      throw new Error(`[engine] reduceToStandard: mass block of ${name} is not a rigid-diaphragm block`)
    }
    const Jref = M[(o + 2) * n + o + 2]!
    if (!(J > 1e-12 * Math.max(Jref, m))) {
      issues.push({
        code: 'no-mass',
        severity: 'error',
        message: `[engine] ${name}: rotary mass inertia J is zero (all mass at one point), so the torsional modes are undefined; give the floor a slab or a polar inertia`,
        refs: floorNames[f] ? [floorNames[f]!] : [],
        direction: 'rotation',
      })
      continue
    }
    const s = 1 / Math.sqrt(m)
    const sj = 1 / Math.sqrt(J)
    S[4 * f] = s
    S[4 * f + 1] = ym * sj
    S[4 * f + 2] = -xm * sj
    S[4 * f + 3] = sj
  }
  if (issues.length > 0) return { form: null, issues }
  // A = S' K S, both sides applied block by block (S is upper triangular per floor).
  const A = new Float64Array(K)
  for (let i = 0; i < n; i++) {
    const r = i * n
    for (let f = 0; f < nf; f++) {
      const c = r + 3 * f
      const s = S[4 * f]!
      const a0 = A[c]!
      const a1 = A[c + 1]!
      A[c + 2] = a0 * S[4 * f + 1]! + a1 * S[4 * f + 2]! + A[c + 2]! * S[4 * f + 3]!
      A[c] = a0 * s
      A[c + 1] = a1 * s
    }
  }
  for (let f = 0; f < nf; f++) {
    const r0 = 3 * f * n
    const r1 = r0 + n
    const r2 = r1 + n
    const s = S[4 * f]!
    const s02 = S[4 * f + 1]!
    const s12 = S[4 * f + 2]!
    const s22 = S[4 * f + 3]!
    for (let j = 0; j < n; j++) {
      const a0 = A[r0 + j]!
      const a1 = A[r1 + j]!
      A[r2 + j] = a0 * s02 + a1 * s12 + A[r2 + j]! * s22
      A[r0 + j] = a0 * s
      A[r1 + j] = a1 * s
    }
  }
  // No symmetrization pass: every consumer of A reads its lower triangle only.
  return { form: { n, A, S }, issues }
}

/** z (standard coordinates) to phi at O: phi = S z, in place on a copy. */
export function fromStandard(form: StandardForm, z: Float64Array, offset = 0): Float64Array {
  const nf = form.n / 3
  const phi = new Float64Array(form.n)
  for (let f = 0; f < nf; f++) {
    const o = offset + 3 * f
    const z2 = z[o + 2]!
    phi[3 * f] = form.S[4 * f]! * z[o]! + form.S[4 * f + 1]! * z2
    phi[3 * f + 1] = form.S[4 * f]! * z[o + 1]! + form.S[4 * f + 2]! * z2
    phi[3 * f + 2] = form.S[4 * f + 3]! * z2
  }
  return phi
}

/** b = S' v (a load M r at O to standard coordinates). */
function toStandardLoad(form: StandardForm, v: Float64Array): Float64Array {
  const nf = form.n / 3
  const b = new Float64Array(form.n)
  for (let f = 0; f < nf; f++) {
    const o = 3 * f
    b[o] = form.S[4 * f]! * v[o]!
    b[o + 1] = form.S[4 * f]! * v[o + 1]!
    b[o + 2] = form.S[4 * f + 1]! * v[o]! + form.S[4 * f + 2]! * v[o + 1]! + form.S[4 * f + 3]! * v[o + 2]!
  }
  return b
}

// ---------------------------------------------------------------- dense symmetric eigensolver

/**
 * All eigenpairs of a symmetric matrix (row-major n², not modified): values ascending, vectors
 * row-major n² with vector k in row k (unit length). Householder + implicit QL + inverse iteration.
 * Hot loops index typed arrays inside proven bounds (non-null assertions).
 */
export function symmetricEigen(
  Ain: Float64Array,
  n: number,
  wanted = n,
  overwrite = false,
): { values: Float64Array; vectors: Float64Array } {
  // with `overwrite` the input is used as the work array (it is spent afterwards)
  const A = overwrite ? Ain : new Float64Array(Ain)
  const d = new Float64Array(n)
  const e = new Float64Array(n)
  const beta = new Float64Array(n)
  tridiagonalize(A, n, d, e, beta)
  const values = tridiagonalEigenvalues(d, e, n)
  const k = Math.min(wanted, n)
  const vectors = tridiagonalEigenvectors(d, e, n, values, k)
  // Back-transform: x = H_0 H_1 ... H_{n-3} y; each H = I - beta v v', v stored in row j of A.
  // Reflector-outer order keeps v in cache while it sweeps the vectors (4 at a time).
  for (let j = n - 3; j >= 0; j--) {
    const b = beta[j]!
    if (b === 0) continue
    const r = j * n
    let m = 0
    for (; m + 3 < k; m += 4) {
      const y0 = m * n
      const y1 = y0 + n
      const y2 = y1 + n
      const y3 = y2 + n
      let s0 = 0
      let s1 = 0
      let s2 = 0
      let s3 = 0
      for (let i = j + 1; i < n; i++) {
        const v = A[r + i]!
        s0 += v * vectors[y0 + i]!
        s1 += v * vectors[y1 + i]!
        s2 += v * vectors[y2 + i]!
        s3 += v * vectors[y3 + i]!
      }
      s0 *= b
      s1 *= b
      s2 *= b
      s3 *= b
      for (let i = j + 1; i < n; i++) {
        const v = A[r + i]!
        vectors[y0 + i]! -= s0 * v
        vectors[y1 + i]! -= s1 * v
        vectors[y2 + i]! -= s2 * v
        vectors[y3 + i]! -= s3 * v
      }
    }
    for (; m < k; m++) {
      const y = m * n
      let s = 0
      for (let i = j + 1; i < n; i++) s += A[r + i]! * vectors[y + i]!
      s *= b
      for (let i = j + 1; i < n; i++) vectors[y + i]! -= s * A[r + i]!
    }
  }
  return { values: k === n ? values : values.slice(0, k), vectors }
}

/**
 * Householder reduction of symmetric A to tridiagonal T = Q' A Q (d diagonal, e[j] = T[j, j+1]).
 * Only the lower triangle is updated (half the work of a full update); the symmetric product
 * p = A22 v runs along rows, gathering the row part and scattering the column part in one contiguous
 * sweep. Reflector j (acting on entries j+1..n-1) is stored in the unused upper part of row j, with
 * its beta.
 */
function tridiagonalize(A: Float64Array, n: number, d: Float64Array, e: Float64Array, beta: Float64Array): void {
  const p = new Float64Array(n)
  const v = new Float64Array(n)
  for (let j = 0; j < n - 2; j++) {
    const r = j * n
    d[j] = A[r + j]!
    let amax = 0
    for (let i = j + 1; i < n; i++) amax = Math.max(amax, Math.abs(A[i * n + j]!))
    if (amax === 0) {
      e[j] = 0
      beta[j] = 0
      continue
    }
    let alpha2 = 0
    for (let i = j + 1; i < n; i++) {
      const x = A[i * n + j]!
      v[i] = x
      const t = x / amax
      alpha2 += t * t
    }
    const x0 = v[j + 1]!
    const alpha = -Math.sign(x0 || 1) * amax * Math.sqrt(alpha2)
    // v = x - alpha e1, beta = 1 / (alpha (alpha - x0)); H x = alpha e1.
    v[j + 1] = x0 - alpha
    const b = 1 / (alpha * (alpha - x0))
    beta[j] = b
    e[j] = alpha
    for (let i = j + 1; i < n; i++) {
      A[r + i] = v[i]!
      p[i] = 0
    }
    // p = A22 v from the lower triangle
    for (let i = j + 1; i < n; i++) {
      const ri = i * n
      const vi = v[i]!
      let s = A[ri + i]! * vi
      for (let c = j + 1; c < i; c++) {
        const a = A[ri + c]!
        s += a * v[c]!
        p[c] = p[c]! + a * vi
      }
      p[i] = p[i]! + s
    }
    let pv = 0
    for (let i = j + 1; i < n; i++) {
      p[i] = b * p[i]!
      pv += p[i]! * v[i]!
    }
    // w = p - (b/2)(p'v) v;  A22 -= v w' + w v' (lower triangle)
    const h = 0.5 * b * pv
    for (let i = j + 1; i < n; i++) p[i] = p[i]! - h * v[i]!
    for (let i = j + 1; i < n; i++) {
      const ri = i * n
      const vi = v[i]!
      const wi = p[i]!
      for (let c = j + 1; c <= i; c++) A[ri + c] = A[ri + c]! - (vi * p[c]! + wi * v[c]!)
    }
  }
  if (n >= 2) {
    d[n - 2] = A[(n - 2) * n + n - 2]!
    e[n - 2] = A[(n - 1) * n + n - 2]!
    beta[n - 2] = 0
  }
  if (n >= 1) d[n - 1] = A[n * n - 1]!
  e[n - 1] = 0
}

/** Eigenvalues of the symmetric tridiagonal (d, e) by implicit QL with Wilkinson shifts, ascending. */
function tridiagonalEigenvalues(d0: Float64Array, e0: Float64Array, n: number): Float64Array {
  const d = new Float64Array(d0)
  const e = new Float64Array(e0)
  let tst1 = 0
  let f = 0
  for (let l = 0; l < n; l++) {
    tst1 = Math.max(tst1, Math.abs(d[l]!) + Math.abs(e[l]!))
    let m = l
    while (m < n - 1 && Math.abs(e[m]!) > Number.EPSILON * tst1) m++
    if (m > l) {
      let iter = 0
      do {
        if (++iter > 60) throw new Error('[engine] symmetricEigen: QL iteration did not converge')
        let g = d[l]!
        let p = (d[l + 1]! - g) / (2 * e[l]!)
        let r = Math.hypot(p, 1)
        if (p < 0) r = -r
        d[l] = e[l]! / (p + r)
        d[l + 1] = e[l]! * (p + r)
        const dl1 = d[l + 1]!
        let h = g - d[l]!
        for (let i = l + 2; i < n; i++) d[i]! -= h
        f += h
        p = d[m]!
        let c = 1
        let c2 = 1
        let c3 = 1
        const el1 = e[l + 1]!
        let s = 0
        let s2 = 0
        for (let i = m - 1; i >= l; i--) {
          c3 = c2
          c2 = c
          s2 = s
          g = c * e[i]!
          h = c * p
          r = Math.hypot(p, e[i]!)
          e[i + 1] = s * r
          s = e[i]! / r
          c = p / r
          p = c * d[i]! - s * g
          d[i + 1] = h + s * (c * g + s * d[i]!)
        }
        p = (-s * s2 * c3 * el1 * e[l]!) / dl1
        e[l] = s * p
        d[l] = c * p
      } while (Math.abs(e[l]!) > Number.EPSILON * tst1)
    }
    d[l] = d[l]! + f
    e[l] = 0
  }
  return d.sort()
}

/**
 * Eigenvectors of the tridiagonal (d, e) for the first k sorted eigenvalues, by inverse iteration with
 * partial pivoting; vectors of clustered eigenvalues are Gram-Schmidt orthogonalised against each other
 * (as in LAPACK's stein). Row m of the result is vector m.
 */
function tridiagonalEigenvectors(
  d: Float64Array,
  e: Float64Array,
  n: number,
  values: Float64Array,
  k: number,
): Float64Array {
  const Z = new Float64Array(k * n)
  if (n === 1) {
    Z[0] = 1
    return Z
  }
  let norm = 0
  for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(d[i]!) + Math.abs(e[i]!) + Math.abs(i > 0 ? e[i - 1]! : 0))
  if (norm === 0) norm = 1
  const eps = Number.EPSILON
  // Cluster width: vectors of eigenvalues closer than this are orthogonalised against each other. The
  // error of an inverse-iteration vector along a neighbour is about eps ||T|| / gap, so 1e-5 ||T|| keeps
  // it below ~1e-11 (LAPACK stein uses 1e-3 ||T||, which lumps the whole low end of the graded
  // spectra of buildings into one cluster and costs O(n³)).
  const ortol = 1e-5 * norm
  const sep = 10 * eps * norm
  // LU of (T - lambda I) with row interchanges: rows hold (u0, u1, u2) and multipliers.
  const u0 = new Float64Array(n)
  const u1 = new Float64Array(n)
  const u2 = new Float64Array(n)
  const mult = new Float64Array(n)
  const swap = new Uint8Array(n)
  const x = new Float64Array(n)
  let clusterStart = 0
  let prev = Number.NEGATIVE_INFINITY
  let seed = 12345
  for (let m = 0; m < k; m++) {
    let lambda = values[m]!
    if (m > 0 && lambda - values[m - 1]! > ortol) clusterStart = m
    if (m > 0 && lambda - prev < sep) lambda = prev + sep
    prev = lambda
    // factor
    let a = d[0]! - lambda
    let b = e[0]!
    let cNext = 0
    for (let i = 0; i < n - 1; i++) {
      const sub = e[i]!
      const dn = d[i + 1]! - lambda
      const en = i + 1 < n - 1 ? e[i + 1]! : 0
      if (Math.abs(a) >= Math.abs(sub)) {
        swap[i] = 0
        const piv = a === 0 ? eps * norm : a
        const l = sub / piv
        mult[i] = l
        u0[i] = piv
        u1[i] = b
        u2[i] = 0
        a = dn - l * b
        b = en
      } else {
        swap[i] = 1
        const l = a / sub
        mult[i] = l
        u0[i] = sub
        u1[i] = dn
        u2[i] = en
        a = b - l * dn
        b = -l * en
      }
      cNext = b
    }
    void cNext
    u0[n - 1] = a === 0 ? eps * norm : a
    u1[n - 1] = 0
    u2[n - 1] = 0
    // start vector: deterministic pseudo-random
    for (let i = 0; i < n; i++) {
      seed = (Math.imul(seed, 1103515245) + 12345) >>> 0
      x[i] = (seed / 4294967296 - 0.5) * 2
    }
    for (let it = 0; it < 4; it++) {
      // forward: apply L^-1 with interchanges
      for (let i = 0; i < n - 1; i++) {
        if (swap[i]) {
          const t = x[i]!
          x[i] = x[i + 1]!
          x[i + 1] = t - mult[i]! * x[i]!
        } else {
          x[i + 1] = x[i + 1]! - mult[i]! * x[i]!
        }
      }
      // backward: U x = y
      for (let i = n - 1; i >= 0; i--) {
        let s = x[i]!
        if (i + 1 < n) s -= u1[i]! * x[i + 1]!
        if (i + 2 < n) s -= u2[i]! * x[i + 2]!
        let piv = u0[i]!
        if (Math.abs(piv) < eps * norm) piv = piv < 0 ? -eps * norm : eps * norm
        x[i] = s / piv
      }
      // orthogonalise against the cluster
      for (let q = clusterStart; q < m; q++) {
        const r = q * n
        let s = 0
        for (let i = 0; i < n; i++) s += Z[r + i]! * x[i]!
        for (let i = 0; i < n; i++) x[i]! -= s * Z[r + i]!
      }
      let nrm = 0
      for (let i = 0; i < n; i++) nrm = Math.max(nrm, Math.abs(x[i]!))
      let s2 = 0
      for (let i = 0; i < n; i++) {
        x[i] = x[i]! / nrm
        s2 += x[i]! * x[i]!
      }
      const inv = 1 / Math.sqrt(s2)
      for (let i = 0; i < n; i++) x[i] = x[i]! * inv
      // one extra step after the growth is large enough (the vector is then accurate)
      if (it >= 1 && nrm * Math.sqrt(s2) > 1 / (Math.sqrt(n) * 1e-12)) break
    }
    Z.set(x, m * n)
  }
  return Z
}

// ---------------------------------------------------------------- dense factorizations

/**
 * Cholesky factor L (row-major, lower) of symmetric positive definite A. Returns null with the index
 * of the first non-positive pivot when A is not positive definite.
 */
export function choleskyFactor(A: Float64Array, n: number): { L: Float64Array | null; failedAt: number } {
  const L = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    const ri = i * n
    for (let j = 0; j <= i; j++) {
      const rj = j * n
      let s = A[ri + j]!
      let k = 0
      for (; k + 3 < j; k += 4) {
        s -=
          L[ri + k]! * L[rj + k]! +
          L[ri + k + 1]! * L[rj + k + 1]! +
          L[ri + k + 2]! * L[rj + k + 2]! +
          L[ri + k + 3]! * L[rj + k + 3]!
      }
      for (; k < j; k++) s -= L[ri + k]! * L[rj + k]!
      if (j < i) {
        L[ri + j] = s / L[rj + j]!
      } else {
        if (!(s > 0)) return { L: null, failedAt: i }
        L[ri + i] = Math.sqrt(s)
      }
    }
  }
  return { L, failedAt: -1 }
}

/**
 * Solve L L' X = B in place for `count` right-hand sides stored as rows of B (each n long). The
 * right-hand sides are swept together in groups of three so each row of L is read once per group.
 */
export function choleskySolveRows(L: Float64Array, n: number, B: Float64Array, count: number): void {
  let v = 0
  for (; v + 2 < count; v += 3) {
    const o0 = v * n
    const o1 = o0 + n
    const o2 = o1 + n
    for (let i = 0; i < n; i++) {
      const ri = i * n
      let s0 = B[o0 + i]!
      let s1 = B[o1 + i]!
      let s2 = B[o2 + i]!
      for (let k = 0; k < i; k++) {
        const l = L[ri + k]!
        s0 -= l * B[o0 + k]!
        s1 -= l * B[o1 + k]!
        s2 -= l * B[o2 + k]!
      }
      const d = 1 / L[ri + i]!
      B[o0 + i] = s0 * d
      B[o1 + i] = s1 * d
      B[o2 + i] = s2 * d
    }
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * n
      const d = 1 / L[ri + i]!
      const x0 = B[o0 + i]! * d
      const x1 = B[o1 + i]! * d
      const x2 = B[o2 + i]! * d
      B[o0 + i] = x0
      B[o1 + i] = x1
      B[o2 + i] = x2
      for (let k = 0; k < i; k++) {
        const l = L[ri + k]!
        B[o0 + k]! -= x0 * l
        B[o1 + k]! -= x1 * l
        B[o2 + k]! -= x2 * l
      }
    }
  }
  for (; v < count; v++) {
    const o = v * n
    for (let i = 0; i < n; i++) {
      const ri = i * n
      let s = B[o + i]!
      for (let k = 0; k < i; k++) s -= L[ri + k]! * B[o + k]!
      B[o + i] = s / L[ri + i]!
    }
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * n
      const xi = B[o + i]! / L[ri + i]!
      B[o + i] = xi
      for (let k = 0; k < i; k++) B[o + k]! -= xi * L[ri + k]!
    }
  }
}

/**
 * Inertia count of A - sigma I by LDL' without pivoting: the number of negative pivots, i.e. the number
 * of eigenvalues of A below sigma (Sylvester's law of inertia). Only the lower triangle of A is read.
 * With `inPlace` the factor overwrites A's lower triangle (saves an n² buffer; A is then spent).
 * Returns null when a pivot is so small that the count is not reliable (the caller moves the shift).
 * Rows are factored two at a time so each row of L already computed is loaded once for both.
 */
export function sturmCount(A: Float64Array, n: number, sigma: number, inPlace = false): number | null {
  const L = inPlace ? A : new Float64Array(A)
  const D = new Float64Array(n)
  const w0 = new Float64Array(n)
  const w1 = new Float64Array(n)
  let scale = 0
  for (let i = 0; i < n; i++) scale = Math.max(scale, Math.abs(A[i * n + i]! - sigma))
  const tiny = 1e-13 * scale
  let negatives = 0
  let i = 0
  for (; i + 1 < n; i += 2) {
    const r0 = i * n
    const r1 = r0 + n
    for (let j = 0; j < i; j++) {
      const rj = j * n
      let s0 = L[r0 + j]!
      let s1 = L[r1 + j]!
      for (let k = 0; k < j; k++) {
        const l = L[rj + k]!
        s0 -= w0[k]! * l
        s1 -= w1[k]! * l
      }
      const dj = D[j]!
      w0[j] = s0
      w1[j] = s1
      L[r0 + j] = s0 / dj
      L[r1 + j] = s1 / dj
    }
    let d0 = L[r0 + i]! - sigma
    for (let k = 0; k < i; k++) d0 -= w0[k]! * L[r0 + k]!
    if (!(Math.abs(d0) > tiny)) return null
    D[i] = d0
    if (d0 < 0) negatives++
    let s = L[r1 + i]!
    for (let k = 0; k < i; k++) s -= w1[k]! * L[r0 + k]!
    w1[i] = s
    L[r1 + i] = s / d0
    let d1 = L[r1 + i + 1]! - sigma
    for (let k = 0; k <= i; k++) d1 -= w1[k]! * L[r1 + k]!
    if (!(Math.abs(d1) > tiny)) return null
    D[i + 1] = d1
    if (d1 < 0) negatives++
  }
  if (i < n) {
    const r0 = i * n
    for (let j = 0; j < i; j++) {
      const rj = j * n
      let s0 = L[r0 + j]!
      for (let k = 0; k < j; k++) s0 -= w0[k]! * L[rj + k]!
      w0[j] = s0
      L[r0 + j] = s0 / D[j]!
    }
    let d0 = L[r0 + i]! - sigma
    for (let k = 0; k < i; k++) d0 -= w0[k]! * L[r0 + k]!
    if (!(Math.abs(d0) > tiny)) return null
    if (d0 < 0) negatives++
  }
  return negatives
}

// ---------------------------------------------------------------- the two solvers

function normalizeSigns(vectors: Float64Array, n: number, count: number): void {
  for (let m = 0; m < count; m++) {
    const o = m * n
    let big = 0
    let at = 0
    for (let i = 0; i < n; i++) {
      const a = Math.abs(vectors[o + i]!)
      // a small tolerance keeps the choice stable when two components tie
      if (a > big * (1 + 1e-9)) {
        big = a
        at = i
      }
    }
    if (vectors[o + at]! < 0) for (let i = 0; i < n; i++) vectors[o + i] = -vectors[o + i]!
  }
}

/** phi = S z for each row of Z, in place (S acts within each floor's three entries). */
function backTransform(form: StandardForm, Z: Float64Array, count: number): Float64Array {
  const n = form.n
  const nf = n / 3
  const S = form.S
  for (let m = 0; m < count; m++) {
    for (let f = 0; f < nf; f++) {
      const o = m * n + 3 * f
      const z2 = Z[o + 2]!
      Z[o] = S[4 * f]! * Z[o]! + S[4 * f + 1]! * z2
      Z[o + 1] = S[4 * f]! * Z[o + 1]! + S[4 * f + 2]! * z2
      Z[o + 2] = S[4 * f + 3]! * z2
    }
  }
  normalizeSigns(Z, n, count)
  return Z
}

function matVecRowMajor(A: Float64Array, n: number, x: Float64Array, out: Float64Array): void {
  for (let i = 0; i < n; i++) {
    const r = i * n
    let s = 0
    for (let j = 0; j < n; j++) s += A[r + j]! * x[j]!
    out[i] = s
  }
}

/**
 * Eigenpairs of K phi = omega² M phi (row-major 3N, M rigid-diaphragm block-diagonal). Never returns NaN:
 * massless floors or a stiffness that is not positive definite come back as issues with no modes.
 */
export function solveEigen(
  K: Float64Array,
  M: Float64Array,
  n: number,
  options: EigenOptions = {},
  floorNames: readonly string[] = [],
): EigenSolution {
  const empty = (issues: Issue[], solver: string): EigenSolution => ({
    count: 0,
    dofCount: n,
    eigenvalues: new Float64Array(0),
    vectors: new Float64Array(0),
    solver,
    complete: false,
    sturmCount: null,
    sturmShift: null,
    issues,
  })
  const { form, issues } = reduceToStandard(K, M, n, floorNames)
  if (!form) return empty(issues, 'none')
  if ((options.method ?? 'all') === 'all') return solveAll(form)
  const rebuild = (): Float64Array => reduceToStandard(K, M, n, floorNames).form!.A
  const low = solveLowest(form, M, options, rebuild)
  if (low) return low
  // form.A may have been spent by an in-place Sturm factorization
  return solveAll(reduceToStandard(K, M, n, floorNames).form!, ' (Lanczos fallback)')
}

function solveAll(form: StandardForm, note = ''): EigenSolution {
  const n = form.n
  const { values, vectors } = symmetricEigen(form.A, n, n, true)
  return {
    count: n,
    dofCount: n,
    eigenvalues: values,
    vectors: backTransform(form, vectors, n),
    solver: `dense Householder-QL${note}`,
    complete: true,
    sturmCount: null,
    sturmShift: null,
    issues: [],
  }
}

function dot(a: Float64Array, ao: number, b: Float64Array, bo: number, n: number): number {
  let s = 0
  for (let i = 0; i < n; i++) s += a[ao + i]! * b[bo + i]!
  return s
}

/**
 * Block Lanczos on A^-1 with full re-orthogonalisation and a Sturm check. Returns null when A is not
 * positive definite or the Sturm count shows a missed mode (the caller then uses the dense solver).
 */
function solveLowest(
  form: StandardForm,
  M: Float64Array,
  options: EigenOptions,
  rebuildA: () => Float64Array,
): EigenSolution | null {
  const n = form.n
  const nf = n / 3
  const minCount = Math.min(n, Math.max(1, Math.floor(options.count ?? 12)))
  const massTarget = Math.min(1, Math.max(0, options.massTarget ?? 0.9))
  const lambdaCut =
    options.periodCutoff && options.periodCutoff > 0 ? (2 * Math.PI / options.periodCutoff) ** 2 : 0
  // Small problems: the dense solver is exact and cheaper than the bookkeeping below.
  if (n <= 3 * Math.max(minCount, 8)) return null
  let L: Float64Array | null = null
  const solveK = options.solveStiffness
  if (!solveK) {
    L = choleskyFactor(form.A, n).L
    if (!L) return null
  }
  const S = form.S
  const y = new Float64Array(n)
  /** rows <- A^-1 rows: own Cholesky of A, or S^-1 K^-1 S^-T with the given stiffness solve. */
  const applyInverse = (rows: Float64Array, count: number): void => {
    if (L) {
      choleskySolveRows(L, n, rows, count)
      return
    }
    for (let v = 0; v < count; v++) {
      const o = v * n
      for (let f = 0; f < nf; f++) {
        const i = o + 3 * f
        const sf = S[4 * f]!
        const y0 = rows[i]! / sf
        const y1 = rows[i + 1]! / sf
        y[3 * f] = y0
        y[3 * f + 1] = y1
        y[3 * f + 2] = (rows[i + 2]! - S[4 * f + 1]! * y0 - S[4 * f + 2]! * y1) / S[4 * f + 3]!
      }
      const u = solveK!(y)
      for (let f = 0; f < nf; f++) {
        const i = o + 3 * f
        const sf = S[4 * f]!
        const x2 = u[3 * f + 2]! / S[4 * f + 3]!
        rows[i] = (u[3 * f]! - S[4 * f + 1]! * x2) / sf
        rows[i + 1] = (u[3 * f + 1]! - S[4 * f + 2]! * x2) / sf
        rows[i + 2] = x2
      }
    }
  }

  // Load vectors in standard coordinates: b = S' M r.
  let loads = options.loads
  if (!loads || loads.length === 0) {
    const rx = new Float64Array(n)
    const ry = new Float64Array(n)
    for (let f = 0; f < nf; f++) {
      rx[3 * f] = 1
      ry[3 * f + 1] = 1
    }
    loads = [rx, ry]
  }
  const p = Math.max(3, loads.length)
  const bvec: Float64Array[] = []
  const rMr: number[] = []
  const tmp = new Float64Array(n)
  for (const r of loads) {
    matVecRowMajor(M, n, r, tmp)
    bvec.push(toStandardLoad(form, tmp))
    rMr.push(dot(r, 0, tmp, 0, n))
  }

  const maxDim = n
  // Lanczos vectors as rows and the projected A^-1 (symmetric, row stride hs); grown on demand so a
  // tall building does not allocate n² for a few dozen modes.
  let cap = Math.min(maxDim, Math.max(4 * p, 96))
  let Q = new Float64Array(cap * n)
  let hs = cap
  let H = new Float64Array(cap * cap)
  const ensure = (rows: number): void => {
    if (rows <= cap) return
    const next = Math.min(maxDim, Math.max(rows, 2 * cap))
    const Q2 = new Float64Array(next * n)
    Q2.set(Q.subarray(0, cap * n))
    const H2 = new Float64Array(next * next)
    for (let i = 0; i < cap; i++) H2.set(H.subarray(i * hs, i * hs + cap), i * next)
    Q = Q2
    H = H2
    hs = next
    cap = next
  }
  let dim = 0
  let seed = 2024
  const randomRow = (row: Float64Array): void => {
    for (let i = 0; i < n; i++) {
      seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0
      row[i] = seed / 4294967296 - 0.5
    }
  }
  // Orthonormalise `row` against Q[0..dim) (twice); returns the coefficients and the remaining norm.
  const orthogonalize = (row: Float64Array, coef: Float64Array | null): number => {
    for (let pass = 0; pass < 2; pass++) {
      for (let q = 0; q < dim; q++) {
        const s = dot(Q, q * n, row, 0, n)
        if (coef) coef[q] = coef[q]! + s
        const o = q * n
        for (let i = 0; i < n; i++) row[i]! -= s * Q[o + i]!
      }
    }
    return Math.sqrt(dot(row, 0, row, 0, n))
  }
  // First block: the load vectors (plus random ones if fewer than p or dependent).
  const first: Float64Array[] = bvec.map((b) => new Float64Array(b))
  while (first.length < p) {
    const r = new Float64Array(n)
    randomRow(r)
    first.push(r)
  }
  for (const v of first) {
    if (dim >= maxDim) break
    const ref = Math.sqrt(dot(v, 0, v, 0, n))
    let nrm = orthogonalize(v, null)
    if (!(nrm > 1e-10 * ref)) {
      randomRow(v)
      nrm = orthogonalize(v, null)
    }
    ensure(dim + 1)
    for (let i = 0; i < n; i++) Q[dim * n + i] = v[i]! / nrm
    dim++
  }

  let blockStart = 0
  let blockEnd = dim
  let accepted: number
  let ritzValues: Float64Array
  let ritzVectors: Float64Array
  let ritzDim: number
  const W = new Float64Array(p * n)
  const coef = new Float64Array(maxDim + 1)
  for (;;) {
    // W = A^-1 Q_block
    const bsize = blockEnd - blockStart
    W.set(Q.subarray(blockStart * n, blockEnd * n))
    applyInverse(W, bsize)
    for (let b = 0; b < bsize; b++) {
      const col = blockStart + b
      const w = W.subarray(b * n, (b + 1) * n)
      coef.fill(0, 0, dim + 1)
      const ref = Math.sqrt(dot(w, 0, w, 0, n))
      const nrm = orthogonalize(w, coef)
      for (let q = 0; q < dim; q++) {
        H[q * hs + col] = coef[q]!
        H[col * hs + q] = coef[q]!
      }
      if (dim >= maxDim) continue
      ensure(dim + 1)
      if (nrm > 1e-10 * ref) {
        for (let i = 0; i < n; i++) Q[dim * n + i] = w[i]! / nrm
        H[dim * hs + col] = nrm
        H[col * hs + dim] = nrm
      } else {
        // invariant subspace: continue with a fresh direction (coupling 0)
        const r = new Float64Array(n)
        randomRow(r)
        const rn = orthogonalize(r, null)
        for (let i = 0; i < n; i++) Q[dim * n + i] = r[i]! / rn
      }
      dim++
    }
    // Rayleigh-Ritz on the columns whose images are complete (0..blockEnd).
    const m = blockEnd
    const Hm = new Float64Array(m * m)
    for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) Hm[i * m + j] = H[i * hs + j]!
    const eig = symmetricEigen(Hm, m)
    // descending theta = ascending lambda
    const order = Array.from({ length: m }, (_, i) => m - 1 - i)
    const lam = new Float64Array(m)
    const vecs = new Float64Array(m * m)
    order.forEach((src, dst) => {
      lam[dst] = 1 / eig.values[src]!
      vecs.set(eig.vectors.subarray(src * m, (src + 1) * m), dst * m)
    })
    // Residual of a Ritz pair: || A^-1 y - theta y || = || C s ||, C the coupling to Q[m..dim).
    let conv = 0
    for (let k = 0; k < m; k++) {
      let res2 = 0
      for (let q = m; q < dim; q++) {
        let s = 0
        for (let j = blockStart; j < m; j++) s += H[q * hs + j]! * vecs[k * m + j]!
        res2 += s * s
      }
      if (!(Math.sqrt(res2) <= 1e-10 / lam[k]!) && dim < maxDim) break
      conv = k + 1
    }
    const complete = dim >= maxDim && m === n
    // Smallest count meeting every need; the first block spans the loads, so Gamma = s' (Q_1 b).
    const qb = bvec.map((b) => Array.from({ length: Math.min(m, p) }, (_, j) => dot(Q, j * n, b, 0, n)))
    const cum = new Float64Array(bvec.length)
    let need = -1
    for (let j = 0; j < conv; j++) {
      for (let l = 0; l < bvec.length; l++) {
        let g = 0
        const row = qb[l]!
        for (let i = 0; i < row.length; i++) g += vecs[j * m + i]! * row[i]!
        cum[l] = cum[l]! + (g * g) / rMr[l]!
      }
      const nextAboveCut = lambdaCut === 0 || (j + 1 < m && lam[j + 1]! > lambdaCut)
      if (j + 1 >= minCount && nextAboveCut && cum.every((c) => c >= massTarget - 1e-12)) {
        need = j + 1
        break
      }
    }
    if (need > 0) {
      // do not split a cluster of (nearly) equal eigenvalues
      while (need < conv && lam[need]! - lam[need - 1]! <= 1e-6 * lam[need]!) need++
    }
    if (complete || (need > 0 && need < conv)) {
      ritzDim = m
      ritzValues = lam
      ritzVectors = vecs
      accepted = complete ? (need > 0 ? need : m) : need
      break
    }
    blockStart = blockEnd
    blockEnd = dim
    if (blockEnd === blockStart) return null
  }

  // Sturm check between the last accepted eigenvalue and the next Ritz value.
  const count = accepted
  let sigma: number
  let sCount: number | null = null
  if (count < n) {
    const lo = ritzValues[count - 1]!
    const hi = ritzValues[count]!
    sigma = lo + 0.5 * (hi - lo)
    for (let attempt = 0; attempt < 4 && sCount === null; attempt++) {
      // factor in place in a spare n² buffer: Cholesky's when it exists, else A itself (rebuilt on retry)
      let work: Float64Array
      if (L) {
        L.set(form.A)
        work = L
      } else {
        work = attempt === 0 ? form.A : rebuildA()
      }
      sCount = sturmCount(work, n, sigma, true)
      if (sCount === null) sigma = lo + (0.3 + 0.15 * attempt) * (hi - lo)
    }
    if (sCount !== count) return null
  } else {
    sigma = ritzValues[n - 1]! * (1 + 1e-6)
    sCount = n
  }

  // Ritz vectors z = Q' s (rows), back to O.
  const Z = new Float64Array(count * n)
  for (let k = 0; k < count; k++) {
    const o = k * n
    for (let j = 0; j < ritzDim; j++) {
      const s = ritzVectors[k * ritzDim + j]!
      if (s === 0) continue
      const q = j * n
      for (let i = 0; i < n; i++) Z[o + i]! += s * Q[q + i]!
    }
    // re-normalize (Ritz vectors are unit to round-off already)
    const nrm = Math.sqrt(dot(Z, o, Z, o, n))
    for (let i = 0; i < n; i++) Z[o + i] = Z[o + i]! / nrm
  }
  return {
    count,
    dofCount: n,
    eigenvalues: ritzValues.slice(0, count),
    vectors: backTransform(form, Z, count),
    solver: 'block Lanczos (shift-invert, Sturm-checked)',
    complete: count === n,
    sturmCount: sCount,
    sturmShift: sigma,
    issues: [],
  }
}
