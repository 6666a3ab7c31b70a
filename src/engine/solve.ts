/**
 * One dense Cholesky factorization of the global stiffness, the solves and floor flexibility blocks
 * built on it, and mechanism detection from its pivots.
 *
 * The factorization works in well-scaled coordinates: per floor the translations of its centre of
 * mass and the rotation times a reference length l (the mass radius of gyration l_s), v = (u_cx, u_cy,
 * theta·l). With u_O = B v, B = [[1, 0, y_m/l], [0, 1, -x_m/l], [0, 0, 1/l]], the factored matrix is
 * K_v = B' K B, and K^-1 = B K_v^-1 B'. This keeps translational and rotational pivots comparable and
 * removes the digits lost when the plan lies far from O.
 * @see docs/mechanics.md §Factorization and mechanisms
 */
import { NEAR_MECHANISM_RATIO, SOFT_DIRECTION_RATIO, floorConditioning } from './conditioning'
import type { Issue, Structure } from './results'

/** Solves K u = f for one factorization of K; floor flexibility blocks F_j (3x3 of K^-1). */
export interface StiffnessSolver {
  /** u = K^-1 f for a 3N load vector at O (N, N·m) -> (m, rad). */
  solve(rhs: Float64Array): Float64Array
  /** The 3x3 block of K^-1 for floor j (row-major, order u_x, u_y, theta, at O; m/N, 1/N, 1/(N·m)). */
  floorFlexibility(floorIndex: number): Float64Array
  /**
   * All diagonal 3x3 blocks of K^-1 at O at once, floor-major (block j at 9j, row-major). About the
   * cost of one more factorization; computed once and cached. The returned array is shared: do not
   * modify it. Optional so that simple test doubles stay valid; createStiffnessSolver always has it.
   */
  floorFlexibilities?(): Float64Array
  /** Smallest pivot of the factorization relative to its original diagonal (1 = uncoupled). */
  readonly minPivotRatio?: number
  /**
   * Smallest over the floors of the weakest-to-strongest stiffness ratio of a floor (conditioning.ts;
   * 1 = equally stiff in every direction). Only on solvers from createStiffnessSolver.
   */
  readonly minFloorStiffnessRatio?: number
}

/** The solver createStiffnessSolver returns: every optional member of StiffnessSolver present. */
export interface FactoredStiffness extends StiffnessSolver {
  floorFlexibilities(): Float64Array
  readonly minPivotRatio: number
  readonly minFloorStiffnessRatio: number
}

/** Thresholds of the pivot test (relative to the DOF's own scaled diagonal). */
export interface SolverOptions {
  /** A pivot at or below this fraction of its diagonal is a mechanism (default 1e-10). */
  readonly mechanismTolerance?: number
  /** A pivot below this fraction (but above the mechanism one) gives an 'ill-conditioned' warning (default 1e-9). */
  readonly warningTolerance?: number
  /** A floor stiffness ratio below this is a mechanism (default NEAR_MECHANISM_RATIO, 1e-8). */
  readonly nearMechanismRatio?: number
  /** A floor stiffness ratio below this gives an 'ill-conditioned' warning (default SOFT_DIRECTION_RATIO, 1e-3). */
  readonly softDirectionRatio?: number
}

/** Most issues reported individually before the rest are summed up. */
const MAX_MECHANISM_ISSUES = 6

/**
 * Factor K once; a singular or nearly singular K is reported as a mechanism naming floor and direction.
 * `issues` on success holds at most an 'ill-conditioned' warning (pass it on to the user).
 * Never throws for a bad model and never returns NaN.
 */
export function createStiffnessSolver(
  structure: Structure,
  options: SolverOptions = {},
): { ok: true; solver: FactoredStiffness; issues: Issue[] } | { ok: false; issues: Issue[] } {
  const n = structure.dofCount
  const N = structure.floorCount
  if (n !== 3 * N || structure.stiffness.length !== n * n) {
    throw new RangeError(`[engine] createStiffnessSolver: stiffness has ${structure.stiffness.length} terms for ${n} DOF`)
  }
  const mechTol = options.mechanismTolerance ?? 1e-10
  const warnTol = options.warningTolerance ?? 1e-9
  const K0 = structure.stiffness
  for (let i = 0; i < K0.length; i++) {
    if (!Number.isFinite(K0[i])) {
      return {
        ok: false,
        issues: [
          {
            code: 'invalid-model',
            severity: 'error',
            message: '[engine] the stiffness matrix has a term that is not a finite number: check element properties',
            refs: [],
          },
        ],
      }
    }
  }

  // Per-floor transformation to (centre of mass, scaled rotation) coordinates.
  const xm = new Float64Array(N)
  const ym = new Float64Array(N)
  const len = new Float64Array(N)
  for (let j = 0; j < N; j++) {
    const f = structure.floors[j]
    if (!f) throw new RangeError(`[engine] createStiffnessSolver: floor ${j} missing`)
    xm[j] = f.centreOfMass.x
    ym[j] = f.centreOfMass.y
    len[j] = referenceLength(f)
  }
  const A = transformToScaled(K0, n, N, xm, ym, len)
  const diag = new Float64Array(n)
  let maxDiag = 0
  for (let i = 0; i < n; i++) {
    diag[i] = A[i * n + i]!
    if (diag[i]! > maxDiag) maxDiag = diag[i]!
  }

  // In-place Cholesky (lower triangle of A becomes L). Non-null assertions: all indices < n*n.
  const removed = new Uint8Array(n)
  const failures: { dof: number; shape: Float64Array }[] = []
  let minRatio = Number.POSITIVE_INFINITY
  let minRatioDof = -1
  const absTol = 1e-12 * maxDiag
  // Pivot of row r once its entries left of the diagonal are final; a failed pivot records the free
  // shape and removes the DOF (as if held) so that further, independent mechanisms are found too.
  const finishPivot = (r: number): void => {
    const rr = r * n
    let d = A[rr + r]!
    for (let k = 0; k < r; k++) d -= A[rr + k]! * A[rr + k]!
    const dr = diag[r]!
    if (!(d > mechTol * dr) || !(dr > absTol)) {
      failures.push({ dof: r, shape: nullShape(A, n, r, removed) })
      removed[r] = 1
      for (let k = 0; k < r; k++) A[rr + k] = 0
      A[rr + r] = 1
      return
    }
    const ratio = d / dr
    if (ratio < minRatio) {
      minRatio = ratio
      minRatioDof = r
    }
    A[rr + r] = Math.sqrt(d)
  }
  // Rows are processed in pairs that share every load of row j (about 1.7x faster than one row).
  for (let i = 0; i < n; i += 2) {
    const ri = i * n
    const pair = i + 1 < n
    const ri1 = pair ? ri + n : ri
    for (let j = 0; j < i; j++) {
      if (removed[j]) {
        A[ri + j] = 0
        A[ri1 + j] = 0
        continue
      }
      const rj = j * n
      let s0 = A[ri + j]!
      let s1 = A[ri1 + j]!
      for (let k = 0; k < j; k++) {
        const l = A[rj + k]!
        s0 -= A[ri + k]! * l
        s1 -= A[ri1 + k]! * l
      }
      const djj = A[rj + j]!
      A[ri + j] = s0 / djj
      if (pair) A[ri1 + j] = s1 / djj
    }
    finishPivot(i)
    if (!pair) continue
    if (removed[i]) A[ri1 + i] = 0
    else {
      let s = A[ri1 + i]!
      for (let k = 0; k < i; k++) s -= A[ri1 + k]! * A[ri + k]!
      A[ri1 + i] = s / A[ri + i]!
    }
    finishPivot(i + 1)
  }

  if (failures.length > 0) {
    return { ok: false, issues: describeMechanisms(structure, failures, xm, ym, len, 'mechanism') }
  }

  const issues: Issue[] = []
  if (minRatioDof >= 0 && minRatio < warnTol) {
    const shape = nullShape(A, n, minRatioDof, removed)
    issues.push(...describeMechanisms(structure, [{ dof: minRatioDof, shape }], xm, ym, len, 'ill-conditioned'))
  }

  const L = A
  const blocks = new Float64Array(9 * N)
  const scaledBlocks = new Float64Array(9 * N)
  const haveBlock = new Uint8Array(N)
  let allBlocks = false
  const w0 = new Float64Array(n)
  const w1 = new Float64Array(n)
  const w2 = new Float64Array(n)

  const computeBlock = (j: number): void => {
    const Fv = scaledFlexibilityBlock(L, n, j, w0, w1, w2)
    scaledBlocks.set(Fv, 9 * j)
    toOriginBlock(Fv, xm[j]!, ym[j]!, len[j]!, blocks, 9 * j)
    haveBlock[j] = 1
  }

  const ensureAllBlocks = (): void => {
    if (allBlocks) return
    for (let j = 0; j < N; j++) if (!haveBlock[j]) computeBlock(j)
    allBlocks = true
  }
  // Near-mechanisms the pivots cannot see: a direction of one floor that is independent of the others
  // (pivot ratio near 1) but held by almost nothing. Needs every floor block, which the centres of
  // rigidity need anyway (cached).
  ensureAllBlocks()
  const conditioning = floorConditioning(scaledBlocks, N)
  let weakest = conditioning[0]
  for (const c of conditioning) if (weakest && c.ratio < weakest.ratio) weakest = c
  const nearTol = options.nearMechanismRatio ?? NEAR_MECHANISM_RATIO
  const softTol = options.softDirectionRatio ?? SOFT_DIRECTION_RATIO
  if (weakest && weakest.ratio < softTol) {
    const near = weakest.ratio < nearTol
    const failing = near ? conditioning.filter((c) => c.ratio < nearTol) : [weakest]
    const found = describeMechanisms(
      structure,
      failing.map((c) => ({ dof: 3 * c.floor, shape: floorShape(n, c.floor, c.weakShape) })),
      xm,
      ym,
      len,
      near ? 'mechanism' : 'ill-conditioned',
      near ? 'practically no resistance' : 'almost no resistance',
    ).map((i) => ({ ...i, message: `${i.message} ${ratioWords(weakest.ratio)}` }))
    if (near) return { ok: false, issues: found }
    // One warning is enough: the pivot test above already named a weak shape.
    if (issues.length === 0) issues.push(...found)
  }

  const solver: FactoredStiffness = {
    minPivotRatio: Number.isFinite(minRatio) ? minRatio : 1,
    minFloorStiffnessRatio: weakest ? weakest.ratio : 1,
    solve(rhs: Float64Array): Float64Array {
      if (rhs.length !== n) throw new RangeError(`[engine] solve: rhs has ${rhs.length} terms, expected ${n}`)
      // g = B' f
      const x = new Float64Array(n)
      for (let j = 0; j < N; j++) {
        const fx = rhs[3 * j]!
        const fy = rhs[3 * j + 1]!
        const m = rhs[3 * j + 2]!
        x[3 * j] = fx
        x[3 * j + 1] = fy
        x[3 * j + 2] = (ym[j]! * fx - xm[j]! * fy + m) / len[j]!
      }
      // L y = g (row-oriented), then L' v = y (column-oriented to read rows of L).
      for (let i = 0; i < n; i++) {
        const ri = i * n
        let s = x[i]!
        for (let k = 0; k < i; k++) s -= L[ri + k]! * x[k]!
        x[i] = s / L[ri + i]!
      }
      for (let i = n - 1; i >= 0; i--) {
        const ri = i * n
        const xi = x[i]! / L[ri + i]!
        x[i] = xi
        for (let k = 0; k < i; k++) x[k] = x[k]! - L[ri + k]! * xi
      }
      // u = B v
      for (let j = 0; j < N; j++) {
        const psi = x[3 * j + 2]! / len[j]!
        x[3 * j] = x[3 * j]! + ym[j]! * psi
        x[3 * j + 1] = x[3 * j + 1]! - xm[j]! * psi
        x[3 * j + 2] = psi
      }
      return x
    },
    floorFlexibility(floorIndex: number): Float64Array {
      if (!(Number.isInteger(floorIndex) && floorIndex >= 0 && floorIndex < N)) {
        throw new RangeError(`[engine] floorFlexibility: floor index ${floorIndex} outside 0..${N - 1}`)
      }
      if (!haveBlock[floorIndex]) computeBlock(floorIndex)
      return blocks.slice(9 * floorIndex, 9 * floorIndex + 9)
    },
    floorFlexibilities(): Float64Array {
      ensureAllBlocks()
      return blocks
    },
  }
  return { ok: true, solver, issues }
}

/** A 3N shape that moves floor j only, by (t_x, t_y, psi) in scaled coordinates. */
function floorShape(n: number, j: number, s: readonly [number, number, number]): Float64Array {
  const z = new Float64Array(n)
  z[3 * j] = s[0]
  z[3 * j + 1] = s[1]
  z[3 * j + 2] = s[2]
  return z
}

/** "(weakest stiffness 2.0e-11 of the strongest at that floor)". */
function ratioWords(ratio: number): string {
  return `(its weakest stiffness is ${ratio.toExponential(1)} of its strongest; see docs/mechanics.md §7)`
}

/** Length that scales a floor's rotation: l_s, else half the plan diagonal, at least 1 m. */
function referenceLength(f: Structure['floors'][number]): number {
  if (f.radiusOfGyration > 1e-6) return f.radiusOfGyration
  const e = f.extent
  const half = 0.5 * Math.hypot(e.maxX - e.minX, e.maxY - e.minY)
  return Number.isFinite(half) && half > 1 ? half : 1
}

/** B' K B for the block-diagonal B of the module header (a fresh array). */
function transformToScaled(
  K: Float64Array,
  n: number,
  N: number,
  xm: Float64Array,
  ym: Float64Array,
  len: Float64Array,
): Float64Array {
  const A = Float64Array.from(K)
  // Columns: c2 <- (y_m c0 - x_m c1 + c2) / l.
  for (let r = 0; r < n; r++) {
    const rr = r * n
    for (let j = 0; j < N; j++) {
      const c = rr + 3 * j
      A[c + 2] = (ym[j]! * A[c]! - xm[j]! * A[c + 1]! + A[c + 2]!) / len[j]!
    }
  }
  // Rows: r2 <- (y_m r0 - x_m r1 + r2) / l.
  for (let i = 0; i < N; i++) {
    const r0 = 3 * i * n
    const r1 = r0 + n
    const r2 = r1 + n
    const a = ym[i]!
    const b = xm[i]!
    const l = len[i]!
    for (let c = 0; c < n; c++) A[r2 + c] = (a * A[r0 + c]! - b * A[r1 + c]! + A[r2 + c]!) / l
  }
  // Exact symmetry (the two passes round differently on mirror terms).
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const v = 0.5 * (A[i * n + j]! + A[j * n + i]!)
      A[i * n + j] = v
      A[j * n + i] = v
    }
  }
  return A
}

/**
 * Diagonal 3x3 block of K_v^-1 for floor j from L: with W = L^-1 (lower triangular), K_v^-1 = W'W,
 * so the block is the Gram matrix of W's columns 3j..3j+2, which are zero above their own index.
 * The three columns are found together by one forward substitution pass.
 */
function scaledFlexibilityBlock(
  L: Float64Array,
  n: number,
  j: number,
  w0: Float64Array,
  w1: Float64Array,
  w2: Float64Array,
): Float64Array {
  const c = 3 * j
  w0.fill(0, c)
  w1.fill(0, c)
  w2.fill(0, c)
  w0[c] = 1 / L[c * n + c]!
  {
    const r = c + 1
    const rr = r * n
    w0[r] = -(L[rr + c]! * w0[c]!) / L[rr + r]!
    w1[r] = 1 / L[rr + r]!
  }
  {
    const r = c + 2
    const rr = r * n
    w0[r] = -(L[rr + c]! * w0[c]! + L[rr + c + 1]! * w0[c + 1]!) / L[rr + r]!
    w1[r] = -(L[rr + c + 1]! * w1[c + 1]!) / L[rr + r]!
    w2[r] = 1 / L[rr + r]!
  }
  // Rows in pairs share the loads of w (row r+1 needs w[r] last, added after row r is finished).
  let r = c + 3
  for (; r + 1 < n; r += 2) {
    const rr = r * n
    const rr1 = rr + n
    let s0 = 0
    let s1 = 0
    let s2 = 0
    let t0 = 0
    let t1 = 0
    let t2 = 0
    for (let k = c; k < r; k++) {
      const a = w0[k]!
      const b = w1[k]!
      const e = w2[k]!
      const l = L[rr + k]!
      const m = L[rr1 + k]!
      s0 += l * a
      s1 += l * b
      s2 += l * e
      t0 += m * a
      t1 += m * b
      t2 += m * e
    }
    const d = L[rr + r]!
    const a = -s0 / d
    const b = -s1 / d
    const e = -s2 / d
    w0[r] = a
    w1[r] = b
    w2[r] = e
    const m = L[rr1 + r]!
    const d1 = L[rr1 + r + 1]!
    w0[r + 1] = -(t0 + m * a) / d1
    w1[r + 1] = -(t1 + m * b) / d1
    w2[r + 1] = -(t2 + m * e) / d1
  }
  for (; r < n; r++) {
    const rr = r * n
    let s0 = 0
    let s1 = 0
    let s2 = 0
    for (let k = c; k < r; k++) {
      const l = L[rr + k]!
      s0 += l * w0[k]!
      s1 += l * w1[k]!
      s2 += l * w2[k]!
    }
    const d = L[rr + r]!
    w0[r] = -s0 / d
    w1[r] = -s1 / d
    w2[r] = -s2 / d
  }
  let f00 = 0
  let f01 = 0
  let f02 = 0
  let f11 = 0
  let f12 = 0
  let f22 = 0
  for (let r = c; r < n; r++) {
    const a = w0[r]!
    const b = w1[r]!
    const e = w2[r]!
    f00 += a * a
    f01 += a * b
    f02 += a * e
    f11 += b * b
    f12 += b * e
    f22 += e * e
  }
  return Float64Array.from([f00, f01, f02, f01, f11, f12, f02, f12, f22])
}

/** F_O = B Fv B' for one floor, written into out at offset. */
function toOriginBlock(Fv: Float64Array, x: number, y: number, l: number, out: Float64Array, offset: number): void {
  const B = [1, 0, y / l, 0, 1, -x / l, 0, 0, 1 / l]
  const T = new Float64Array(9)
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++) {
      let s = 0
      for (let k = 0; k < 3; k++) s += B[3 * r + k]! * Fv[3 * k + c]!
      T[3 * r + c] = s
    }
  }
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++) {
      let s = 0
      for (let k = 0; k < 3; k++) s += T[3 * r + k]! * B[3 * c + k]!
      out[offset + 3 * r + c] = s
    }
  }
  // Mirror exactly.
  out[offset + 3] = out[offset + 1]!
  out[offset + 6] = out[offset + 2]!
  out[offset + 7] = out[offset + 5]!
}

/**
 * Null vector (free shape) for a failed pivot i, in scaled coordinates: z = [-A11^-1 a; 1; 0...],
 * where row i of L (entries 0..i-1) already holds L11^-1 a. One back substitution with L11' gives
 * A11^-1 a. For a positive semidefinite K, z'Kz = pivot ≈ 0 implies K z ≈ 0.
 */
function nullShape(L: Float64Array, n: number, i: number, removed: Uint8Array): Float64Array {
  const z = new Float64Array(n)
  const ri = i * n
  for (let k = 0; k < i; k++) z[k] = L[ri + k]!
  // Solve L11' y = l (column-oriented over rows of L11); removed DOFs have unit rows and zero columns.
  for (let k = i - 1; k >= 0; k--) {
    const rk = k * n
    const yk = removed[k] ? 0 : z[k]! / L[rk + k]!
    z[k] = yk
    if (yk !== 0) for (let q = 0; q < k; q++) z[q] = z[q]! - L[rk + q]! * yk
  }
  for (let k = 0; k < i; k++) z[k] = -z[k]!
  z[i] = 1
  for (let k = 0; k < n; k++) if (!Number.isFinite(z[k])) z[k] = 0
  return z
}

/** Plain-words direction of a unit plan direction: 'x', 'y' or 'the plan direction 30.0° from x'. */
function directionWords(dx: number, dy: number): { key: string; words: string } {
  let deg = (Math.atan2(dy, dx) * 180) / Math.PI
  if (deg < 0) deg += 180
  if (deg >= 180) deg -= 180
  if (deg < 0.5 || deg > 179.5) return { key: 'x', words: 'x' }
  if (Math.abs(deg - 90) < 0.5) return { key: 'y', words: 'y' }
  const a = deg.toFixed(1)
  return { key: `${a}°`, words: `the plan direction ${a}° from x` }
}

const fmt = (v: number): string => (Number.isFinite(v) ? (Math.abs(v) < 0.05 ? 0 : v).toFixed(1) : '?')

interface Finding {
  floor: number
  /** 'x' | 'y' | angle key | 'rotation' */
  directionKey: string
  /** "along y" / "to rotation about (12.0, 8.0)" */
  freeWords: string
  reasonKey: 'nothing-below' | 'parallel' | 'collinear' | 'concurrent' | 'other'
  reasonWords: string
  elementIds: string[]
}

/** Turn failed pivots (free shapes in scaled coordinates) into grouped, plain-words issues. */
function describeMechanisms(
  structure: Structure,
  failures: readonly { dof: number; shape: Float64Array }[],
  xm: Float64Array,
  ym: Float64Array,
  len: Float64Array,
  code: 'mechanism' | 'ill-conditioned',
  resistanceWords?: string,
): Issue[] {
  const N = structure.floorCount
  const findings: Finding[] = []
  for (const { shape } of failures) {
    // Floor with the largest motion (lowest on ties): translation of its CM and rotation times l.
    let best = 0
    let bestMag = -1
    const mags = new Float64Array(N)
    for (let j = 0; j < N; j++) {
      mags[j] = Math.hypot(shape[3 * j]!, shape[3 * j + 1]!, shape[3 * j + 2]!)
      if (mags[j]! > bestMag) bestMag = mags[j]!
    }
    for (let j = 0; j < N; j++) {
      if (mags[j]! >= (1 - 1e-6) * bestMag) {
        best = j
        break
      }
    }
    const tx = shape[3 * best]!
    const ty = shape[3 * best + 1]!
    const psi = shape[3 * best + 2]!
    const trans = Math.hypot(tx, ty)
    const theta = psi / len[best]!
    const supporting = structure.elements.filter((e) => {
      const at = e.floors.indexOf(best)
      return at >= 0 && !(e.standsOnFloor && at === 0)
    })
    const ids = [...new Set(supporting.flatMap((e) => e.refs ?? [e.id]))]
    // Elements acting along a plan line (a wall group's torsion chain, map [0, 0, 1], has none).
    const lines = supporting.filter((e) => e.map[0] !== 0 || e.map[1] !== 0)
    const finding: Finding = {
      floor: best,
      directionKey: '',
      freeWords: '',
      reasonKey: 'other',
      reasonWords: 'the elements connected to it cannot restrain this motion',
      elementIds: ids,
    }
    if (Math.abs(psi) < 1e-3 * trans) {
      const dir = directionWords(tx / trans, ty / trans)
      finding.directionKey = dir.key
      finding.freeWords = `along ${dir.words}`
      // Name the few elements that act noticeably along the free direction (a near-mechanism).
      const along = [...new Set(
        supporting.filter((e) => Math.abs(e.map[0] * tx + e.map[1] * ty) > 0.1 * trans).map((e) => e.id),
      )]
      if (along.length > 0 && along.length <= 3) {
        finding.reasonWords = `only ${along.join(', ')} ${along.length === 1 ? 'acts' : 'act'} along ${dir.words}`
      }
    } else {
      // The point that does not move: CM + (-t_y, t_x)/theta.
      const px = xm[best]! - ty / theta
      const py = ym[best]! + tx / theta
      finding.directionKey = `rotation@${fmt(px)},${fmt(py)}`
      finding.freeWords = `to rotation about (${fmt(px)}, ${fmt(py)})`
      const size = Math.max(len[best]!, 1)
      if (
        lines.length > 0 &&
        Number.isFinite(px) &&
        Number.isFinite(py) &&
        lines.every((e) => Math.abs(e.map[2] - (px * e.map[1] - py * e.map[0])) <= 0.05 * size)
      ) {
        finding.reasonKey = 'concurrent'
        finding.reasonWords = 'all element lines meet near one point'
      }
    }
    if (supporting.length === 0) {
      finding.reasonKey = 'nothing-below'
      finding.reasonWords = 'it has no lateral element below it'
    } else if (finding.reasonKey === 'other' && lines.length > 0) {
      const d0 = lines[0]!.map
      const parallel = lines.every((e) => Math.abs(e.map[0] * d0[1] - e.map[1] * d0[0]) < 1e-6)
      if (parallel) {
        const sgn = (e: { map: readonly [number, number, number] }): number =>
          e.map[0] * d0[0] + e.map[1] * d0[1] >= 0 ? 1 : -1
        const size = Math.max(len[best]!, 1)
        const collinear = lines.every((e) => Math.abs(sgn(e) * e.map[2] - d0[2]) <= 1e-6 * size)
        const dir = directionWords(d0[0], d0[1])
        finding.reasonKey = collinear ? 'collinear' : 'parallel'
        finding.reasonWords = collinear
          ? `all elements lie on one line (parallel to ${dir.words})`
          : `all elements are parallel to ${dir.words}`
      }
    }
    findings.push(finding)
  }

  // Group: "nothing below" per floor; otherwise by direction and reason across floors.
  const groups = new Map<string, Finding[]>()
  for (const f of findings) {
    const key = f.reasonKey === 'nothing-below' ? `below#${f.floor}` : `${f.reasonKey}#${f.directionKey}`
    const list = groups.get(key)
    if (list) {
      if (!list.some((g) => g.floor === f.floor)) list.push(f)
    } else groups.set(key, [f])
  }
  const floorLabel = (j: number): string => {
    const fl = structure.floors[j]
    return fl ? `${fl.id} (${fl.name})` : `#${j + 1}`
  }
  const issues: Issue[] = []
  const severity = code === 'mechanism' ? 'error' : 'warning'
  const lead = code === 'mechanism' ? '[engine] mechanism:' : '[engine] nearly a mechanism (ill-conditioned stiffness):'
  const what = resistanceWords ?? (code === 'mechanism' ? 'no resistance' : 'almost no resistance')
  const has = `has ${what}`
  const have = `have ${what}`
  for (const list of groups.values()) {
    list.sort((a, b) => a.floor - b.floor)
    const first = list[0]!
    const floorIds = list.map((f) => structure.floors[f.floor]?.id ?? `#${f.floor + 1}`)
    const elementIds = [...new Set(list.flatMap((f) => f.elementIds))]
    let subject: string
    if (list.length === 1) subject = `floor ${floorLabel(first.floor)}`
    else {
      const shown = list.slice(0, 4).map((f) => floorLabel(f.floor))
      const more = list.length > 4 ? ` and ${list.length - 4} more` : ''
      subject = `floors ${shown.join(', ')}${more}`
    }
    let message: string
    let direction: string
    if (first.reasonKey === 'nothing-below') {
      const keys = findings
        .filter((f) => f.floor === first.floor)
        .map((f) => (f.directionKey.startsWith('rotation') ? 'rotation' : f.directionKey))
      direction = [...new Set(keys)].join(', ')
      message = `${lead} ${subject} has no lateral element below it`
    } else {
      message = `${lead} ${subject} ${list.length === 1 ? has : have} ${first.freeWords} — ${first.reasonWords}`
      direction = first.directionKey.startsWith('rotation') ? 'rotation' : first.directionKey
    }
    issues.push({
      code,
      severity,
      message,
      refs: [...floorIds, ...elementIds],
      floor: floorIds[0]!,
      direction,
    })
  }
  if (issues.length > MAX_MECHANISM_ISSUES) {
    const rest = issues.length - MAX_MECHANISM_ISSUES + 1
    const kept = issues.slice(0, MAX_MECHANISM_ISSUES - 1)
    kept.push({
      code,
      severity,
      message: `${lead} ${rest} further free shapes were found; fix the ones above first`,
      refs: [...new Set(issues.slice(MAX_MECHANISM_ISSUES - 1).flatMap((i) => i.refs))],
    })
    return kept
  }
  return issues
}
