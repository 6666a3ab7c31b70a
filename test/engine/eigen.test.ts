import { CholeskyDecomposition, EigenvalueDecomposition, Matrix, QrDecomposition } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { solveEigen, sturmCount, symmetricEigen } from '@/engine/eigen'
import type { Structure } from '@/engine/results'
import { buildStructure } from '@/engine/assemble'
import { createRandom, generateBuilding, structureFromParts } from '../helpers/generateBuilding'
import type { HandElement, HandFloor } from '../helpers/generateBuilding'

/** Seeded random rigid-diaphragm building: shear-type elements in all directions, eccentric masses. */
function randomStructure(floors: number, seed: number, elements = 12): Structure {
  const rnd = createRandom(seed)
  const fl: HandFloor[] = Array.from({ length: floors }, () => {
    const m = 4e5 * (0.7 + 0.6 * rnd())
    return { mass: m, cm: { x: 10 + 8 * rnd(), y: 6 + 5 * rnd() }, J: (m * (30 * 30 + 20 * 20)) / 12 }
  })
  const el: HandElement[] = Array.from({ length: elements }, (_, e) => ({
    at: { x: 30 * rnd(), y: 20 * rnd() },
    angle: e % 3 === 0 ? 0 : e % 3 === 1 ? Math.PI / 2 : Math.PI * rnd(),
    storyStiffness: Array.from({ length: floors }, () => 2e8 * (0.5 + rnd())),
  }))
  return structureFromParts(fl, el)
}

/** The straightforward reference: ml-matrix Cholesky of M, C = L^-1 K L^-T, symmetric eigenvalues. */
function referenceEigenvalues(s: Structure): number[] {
  const n = s.dofCount
  const rows = (a: Float64Array): number[][] =>
    Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, (i + 1) * n)))
  const chol = new CholeskyDecomposition(new Matrix(rows(s.mass)))
  expect(chol.isPositiveDefinite()).toBe(true)
  const Lm = chol.lowerTriangularMatrix
  const LinvM = Matrix.eye(n)
  // L^-1 by forward substitution, column by column
  for (let c = 0; c < n; c++) {
    for (let i = 0; i < n; i++) {
      let sum = i === c ? 1 : 0
      for (let k = 0; k < i; k++) sum -= Lm.get(i, k) * LinvM.get(k, c)
      LinvM.set(i, c, sum / Lm.get(i, i))
    }
  }
  const C = LinvM.mmul(new Matrix(rows(s.stiffness))).mmul(LinvM.transpose())
  const Cs = C.add(C.transpose()).mul(0.5)
  return new EigenvalueDecomposition(Cs, { assumeSymmetric: true }).realEigenvalues.sort((a, b) => a - b)
}

function residuals(s: Structure, values: Float64Array, vectors: Float64Array, count: number) {
  const n = s.dofCount
  let res = 0
  let orth = 0
  let kNorm = 0
  for (let i = 0; i < n * n; i++) kNorm = Math.max(kNorm, Math.abs(s.stiffness[i]!))
  for (let m = 0; m < count; m++) {
    const o = m * n
    let num = 0
    let den = 0
    for (let i = 0; i < n; i++) {
      let kp = 0
      let mp = 0
      for (let j = 0; j < n; j++) {
        kp += s.stiffness[i * n + j]! * vectors[o + j]!
        mp += s.mass[i * n + j]! * vectors[o + j]!
      }
      num = Math.max(num, Math.abs(kp - values[m]! * mp))
      den = Math.max(den, Math.abs(kp))
    }
    res = Math.max(res, num / den)
    for (let l = 0; l < count; l++) {
      let g = 0
      for (let i = 0; i < n; i++) {
        let mp = 0
        for (let j = 0; j < n; j++) mp += s.mass[i * n + j]! * vectors[l * n + j]!
        g += vectors[o + i]! * mp
      }
      orth = Math.max(orth, Math.abs(g - (l === m ? 1 : 0)))
    }
  }
  return { res, orth }
}

describe('symmetricEigen', () => {
  it('matches ml-matrix eigenvalues and satisfies A v = lambda v for seeded random matrices', () => {
    for (const [n, seed] of [
      [1, 1],
      [2, 2],
      [7, 3],
      [40, 4],
      [93, 5],
    ] as const) {
      const rnd = createRandom(seed)
      const A = new Float64Array(n * n)
      for (let i = 0; i < n; i++) {
        for (let j = 0; j <= i; j++) {
          const v = rnd() - 0.5
          A[i * n + j] = v
          A[j * n + i] = v
        }
      }
      const { values, vectors } = symmetricEigen(A, n)
      const rows = Array.from({ length: n }, (_, i) => Array.from(A.subarray(i * n, (i + 1) * n)))
      // ml-matrix 6.15 EigenvalueDecomposition (independent general-purpose library)
      const ref = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }).realEigenvalues.sort(
        (a, b) => a - b,
      )
      for (let k = 0; k < n; k++) {
        expect(Math.abs(values[k]! - ref[k]!)).toBeLessThan(1e-12 * Math.max(1, Math.abs(ref[k]!)))
        if (k > 0) expect(values[k]!).toBeGreaterThanOrEqual(values[k - 1]!)
        for (let i = 0; i < n; i++) {
          let s = 0
          for (let j = 0; j < n; j++) s += A[i * n + j]! * vectors[k * n + j]!
          expect(Math.abs(s - values[k]! * vectors[k * n + i]!)).toBeLessThan(1e-12)
        }
        for (let l = 0; l <= k; l++) {
          let s = 0
          for (let i = 0; i < n; i++) s += vectors[k * n + i]! * vectors[l * n + i]!
          expect(Math.abs(s - (k === l ? 1 : 0))).toBeLessThan(1e-12)
        }
      }
    }
  })

  it('returns orthonormal vectors when eigenvalues repeat', () => {
    // diag(2, 2, 2, 5, 5, 5) turned by a fixed rotation: triple eigenvalues (common practice check)
    const n = 6
    const D = [2, 2, 2, 5, 5, 5]
    const rnd = createRandom(9)
    const Q = new Matrix(Array.from({ length: n }, () => Array.from({ length: n }, () => rnd() - 0.5)))
    const q = new QrDecomposition(Q).orthogonalMatrix
    const A = q.mmul(Matrix.diag(D)).mmul(q.transpose())
    const flat = Float64Array.from(A.to1DArray())
    for (let i = 0; i < n; i++) for (let j = 0; j < i; j++) flat[i * n + j] = flat[j * n + i]!
    const { values, vectors } = symmetricEigen(flat, n)
    for (let k = 0; k < n; k++) {
      expect(values[k]!).toBeCloseTo(D[k]!, 12)
      for (let l = 0; l < n; l++) {
        let s = 0
        for (let i = 0; i < n; i++) s += vectors[k * n + i]! * vectors[l * n + i]!
        expect(Math.abs(s - (k === l ? 1 : 0))).toBeLessThan(1e-10)
      }
    }
  })
})

describe('solveEigen', () => {
  it('agrees with the Cholesky-reduced ml-matrix solution on seeded random buildings', () => {
    for (const [floors, seed] of [
      [1, 11],
      [3, 12],
      [8, 13],
      [20, 14],
    ] as const) {
      const s = randomStructure(floors, seed)
      const sol = solveEigen(s.stiffness, s.mass, s.dofCount)
      expect(sol.complete).toBe(true)
      expect(sol.count).toBe(s.dofCount)
      const ref = referenceEigenvalues(s)
      for (let k = 0; k < sol.count; k++) {
        // same eigenvalues as ml-matrix (independent library), relative 1e-10
        expect(Math.abs(sol.eigenvalues[k]! / ref[k]! - 1)).toBeLessThan(1e-10)
        if (k > 0) expect(sol.eigenvalues[k]!).toBeGreaterThan(sol.eigenvalues[k - 1]!)
      }
      // defining relation K phi = omega² M phi and phi' M phi = I (Golub & Van Loan §8.7)
      const { res, orth } = residuals(s, sol.eigenvalues, sol.vectors, sol.count)
      expect(res).toBeLessThan(1e-10)
      expect(orth).toBeLessThan(1e-10)
    }
  })

  it('keeps modes M-orthonormal on a generated 40-storey building with a graded spectrum', () => {
    const s = buildStructure(generateBuilding({ floors: 40, seed: 3 })).structure!
    const sol = solveEigen(s.stiffness, s.mass, s.dofCount)
    // defining relation and phi' M phi = I (Golub & Van Loan §8.7); omega² spans several decades here
    expect(sol.eigenvalues[sol.count - 1]! / sol.eigenvalues[0]!).toBeGreaterThan(1e3)
    const { res, orth } = residuals(s, sol.eigenvalues, sol.vectors, sol.count)
    // The generated core acts as one composite section (wall group): its small St Venant torsion
    // next to large bending stiffness widens the spread of K, and the relative residual of a
    // backward-stable solver grows with it (Golub & Van Loan §8.7); 5e-10 still means round-off only.
    expect(res).toBeLessThan(5e-10)
    expect(orth).toBeLessThan(1e-10)
  })

  it('makes the largest component of every mode positive', () => {
    const s = randomStructure(6, 21)
    const sol = solveEigen(s.stiffness, s.mass, s.dofCount)
    const n = s.dofCount
    for (let m = 0; m < sol.count; m++) {
      let big = 0
      for (let i = 0; i < n; i++) if (Math.abs(sol.vectors[m * n + i]!) > Math.abs(big)) big = sol.vectors[m * n + i]!
      expect(big).toBeGreaterThan(0)
    }
  })

  it('reports a floor without rotary inertia as an issue, not NaN', () => {
    const s = structureFromParts(
      [
        { mass: 1e5, J: 1e6 },
        { mass: 1e5, J: 0 },
      ],
      [
        { at: { x: 0, y: -5 }, angle: 0, storyStiffness: [1e8, 1e8] },
        { at: { x: 0, y: 5 }, angle: 0, storyStiffness: [1e8, 1e8] },
        { at: { x: -5, y: 0 }, angle: Math.PI / 2, storyStiffness: [1e8, 1e8] },
        { at: { x: 5, y: 0 }, angle: Math.PI / 2, storyStiffness: [1e8, 1e8] },
      ],
    )
    const sol = solveEigen(s.stiffness, s.mass, s.dofCount, {}, ['Level 1', 'Level 2'])
    expect(sol.count).toBe(0)
    expect(sol.issues[0]?.code).toBe('no-mass')
    expect(sol.issues[0]?.direction).toBe('rotation')
    expect(sol.issues[0]?.message).toContain('Level 2')
  })

  it('finds the lowest modes by Lanczos with a correct Sturm count, equal to the full solution', () => {
    for (const [floors, seed] of [
      [30, 31],
      [70, 32],
    ] as const) {
      const s = randomStructure(floors, seed)
      const n = s.dofCount
      const full = solveEigen(s.stiffness, s.mass, n)
      const low = solveEigen(s.stiffness, s.mass, n, { method: 'lowest', count: 15, massTarget: 0.95 })
      expect(low.solver).toContain('Lanczos')
      expect(low.count).toBeGreaterThanOrEqual(15)
      expect(low.count).toBeLessThan(n)
      // Sturm-sequence check (Bathe, FE Procedures §11.4.3): eigenvalues below the shift = modes found
      expect(low.sturmCount).toBe(low.count)
      let below = 0
      for (let k = 0; k < n; k++) if (full.eigenvalues[k]! < low.sturmShift!) below++
      expect(below).toBe(low.count)
      for (let k = 0; k < low.count; k++) {
        expect(Math.abs(low.eigenvalues[k]! / full.eigenvalues[k]! - 1)).toBeLessThan(1e-9)
        let dmax = 0
        for (let i = 0; i < n; i++) dmax = Math.max(dmax, Math.abs(low.vectors[k * n + i]! - full.vectors[k * n + i]!))
        let vmax = 0
        for (let i = 0; i < n; i++) vmax = Math.max(vmax, Math.abs(full.vectors[k * n + i]!))
        expect(dmax / vmax).toBeLessThan(1e-6)
      }
      const { res, orth } = residuals(s, low.eigenvalues, low.vectors, low.count)
      expect(res).toBeLessThan(1e-8)
      expect(orth).toBeLessThan(1e-10)
    }
  })

  it('finds both modes of every repeated X/Y pair on a square symmetric plan', () => {
    // identical frames along X and Y: every X frequency is also a Y frequency (multiplicity 2)
    const floors = 70
    const ks = Array.from({ length: floors }, (_, i) => 3e8 * (1 - (0.5 * i) / floors))
    const s = structureFromParts(
      Array.from({ length: floors }, () => ({ mass: 3e5, J: 3e5 * 30 })),
      [
        { at: { x: 0, y: -6 }, angle: 0, storyStiffness: ks },
        { at: { x: 0, y: 6 }, angle: 0, storyStiffness: ks },
        { at: { x: -6, y: 0 }, angle: Math.PI / 2, storyStiffness: ks },
        { at: { x: 6, y: 0 }, angle: Math.PI / 2, storyStiffness: ks },
      ],
    )
    const n = s.dofCount
    const full = solveEigen(s.stiffness, s.mass, n)
    // pairs: full solution has equal eigenvalues two by two among the translational ones
    expect(Math.abs(full.eigenvalues[1]! / full.eigenvalues[0]! - 1)).toBeLessThan(1e-10)
    const low = solveEigen(s.stiffness, s.mass, n, { method: 'lowest', count: 10, massTarget: 0.9 })
    expect(low.solver).toContain('Lanczos')
    // Sturm count (Bathe §11.4.3) proves no copy of a repeated eigenvalue was missed
    expect(low.sturmCount).toBe(low.count)
    for (let k = 0; k < low.count; k++) {
      expect(Math.abs(low.eigenvalues[k]! / full.eigenvalues[k]! - 1)).toBeLessThan(1e-9)
    }
    const { orth } = residuals(s, low.eigenvalues, low.vectors, low.count)
    expect(orth).toBeLessThan(1e-10)
  })

  it('keeps finding modes until every mode with a period above the cutoff is in', () => {
    const s = randomStructure(40, 41)
    const n = s.dofCount
    const full = solveEigen(s.stiffness, s.mass, n)
    const cut = 0.1 // s
    const low = solveEigen(s.stiffness, s.mass, n, { method: 'lowest', count: 3, massTarget: 0, periodCutoff: cut })
    const longer = Array.from(full.eigenvalues).filter((l) => (2 * Math.PI) / Math.sqrt(l) >= cut).length
    expect(longer).toBeGreaterThan(3)
    expect(low.count).toBeGreaterThanOrEqual(longer)
    expect(low.sturmCount).toBe(low.count)
  })
})

describe('sturmCount', () => {
  it('counts the eigenvalues below a shift (Sylvester law of inertia)', () => {
    const n = 50
    const rnd = createRandom(77)
    const A = new Float64Array(n * n)
    for (let i = 0; i < n; i++) {
      for (let j = 0; j <= i; j++) {
        const v = rnd() - 0.5
        A[i * n + j] = v
        A[j * n + i] = v
      }
      A[i * n + i] = A[i * n + i]! + 4
    }
    const { values } = symmetricEigen(A, n)
    for (const k of [0, 1, 10, 25, 49]) {
      const sigma = k === 0 ? values[0]! - 1 : 0.5 * (values[k - 1]! + values[k]!)
      expect(sturmCount(A, n, sigma)).toBe(k)
    }
  })
})
