import { describe, expect, it } from 'vitest'
import { buildStructure } from '@/engine/assemble'
import { solveModes } from '@/engine/modal'
import type { ModalResult } from '@/engine/results'
import { structureFromParts } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

// METHODS.md §5 (Euler-Bernoulli cantilever): roots of 1 + cos(bL) cosh(bL) = 0
const BETA_L = [1.8751041, 4.6940911, 7.8547574]

/** Lowest three Y-translation modes' omega, in mode order. */
function yOmegas(modes: ModalResult): number[] {
  const out: number[] = []
  for (let i = 0; i < modes.count && out.length < 3; i++) if (modes.character[i] === 'y') out.push(modes.angularFrequencies[i]!)
  return out
}

/**
 * Hand-built: N equal lumped masses m = mbar h on a uniform flexural cantilever, stiffness from the
 * exact Euler-Bernoulli flexibility f_ij = z_i² (3 z_j - z_i) / (6 EI), z_i <= z_j (Gere & Timoshenko,
 * Mechanics of Materials, cantilever deflection under a point load; from memory).
 */
function lumpedCantilever(N: number, EI: number, mbar: number, L: number): number[] {
  const h = L / N
  const z = Array.from({ length: N }, (_, i) => (i + 1) * h)
  const F = new Float64Array(N * N)
  for (let i = 0; i < N; i++) {
    for (let j = 0; j < N; j++) {
      const a = Math.min(z[i]!, z[j]!)
      const b = Math.max(z[i]!, z[j]!)
      F[i * N + j] = (a * a * (3 * b - a)) / (6 * EI)
    }
  }
  // K = F^-1 by Gauss-Jordan (small, well conditioned after scaling by EI)
  const Kc = invert(F, N)
  const half = (k: number): number[] => Array.from(Kc, (v) => v * k)
  const m = mbar * h
  const s = structureFromParts(
    z.map(() => ({ mass: m, J: m * 36 })),
    [
      { at: { x: -3, y: 0 }, angle: Math.PI / 2, matrix: half(0.5) },
      { at: { x: 3, y: 0 }, angle: Math.PI / 2, matrix: half(0.5) },
      { at: { x: 0, y: -3 }, angle: 0, matrix: half(0.65) },
      { at: { x: 0, y: 3 }, angle: 0, matrix: half(0.65) },
    ],
  )
  return yOmegas(solveModes(s, { method: 'all' }))
}

function invert(A: Float64Array, n: number): Float64Array {
  const a = new Float64Array(A)
  const inv = new Float64Array(n * n)
  for (let i = 0; i < n; i++) inv[i * n + i] = 1
  for (let c = 0; c < n; c++) {
    let p = c
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r * n + c]!) > Math.abs(a[p * n + c]!)) p = r
    for (let j = 0; j < n; j++) {
      ;[a[c * n + j], a[p * n + j]] = [a[p * n + j]!, a[c * n + j]!]
      ;[inv[c * n + j], inv[p * n + j]] = [inv[p * n + j]!, inv[c * n + j]!]
    }
    const d = a[c * n + c]!
    for (let j = 0; j < n; j++) {
      a[c * n + j] = a[c * n + j]! / d
      inv[c * n + j] = inv[c * n + j]! / d
    }
    for (let r = 0; r < n; r++) {
      if (r === c) continue
      const f = a[r * n + c]!
      if (f === 0) continue
      for (let j = 0; j < n; j++) {
        a[r * n + j] = a[r * n + j]! - f * a[c * n + j]!
        inv[r * n + j] = inv[r * n + j]! - f * inv[c * n + j]!
      }
    }
  }
  // symmetrize (F is symmetric, so is its inverse)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < i; j++) {
      const v = 0.5 * (inv[i * n + j]! + inv[j * n + i]!)
      inv[i * n + j] = v
      inv[j * n + i] = v
    }
  }
  return inv
}

describe('solveModes on a slender cantilever wall', () => {
  it('converges to the Euler-Bernoulli frequencies as the floor count grows (hand-built stiffness)', () => {
    const EI = 32e9 * 2.5
    const mbar = 8000
    const L = 90
    const exact = BETA_L.map((b) => b * b * Math.sqrt(EI / (mbar * L ** 4)))
    let previous = [Infinity, Infinity, Infinity]
    for (const N of [6, 15, 40, 90]) {
      const w = lumpedCantilever(N, EI, mbar, L)
      const err = w.map((v, i) => Math.abs(v / exact[i]! - 1))
      // the lumped model approaches the continuum monotonically (METHODS.md §5 closed form)
      err.forEach((e, i) => expect(e).toBeLessThan(previous[i]!))
      previous = err
      // lumped masses (full mass at the top floor too) approach the continuum at a rate of about 1/N
      for (const e of err) expect(e).toBeLessThan(1.05 / N)
    }
  })

  it('converges the same way for a project wall with shear deformation switched off', () => {
    const E = 32e9
    const t = 0.3
    const Lw = 6
    const H = 60
    const a = 10
    const areaMass = 600
    const errors: number[][] = []
    let at20: number[] = []
    for (const N of [5, 20, 50]) {
      const b = projectBuilder({ floors: N, height: H / N })
        .material({ id: 'c', E, nu: 0.2 })
        .rectSlab({ x: -a / 2, y: -a / 2, width: a, depth: a, areaMass })
      // two Y walls and two (thinner-looking, stiffer) X walls; huge shear factor: Phi -> 0. The Y
      // walls' ends lie on the X walls: kept apart so that each acts as its own planar cantilever.
      for (const x of [-3, 3]) b.wall({ p1: { x, y: -Lw / 2 }, p2: { x, y: Lw / 2 }, thickness: t, material: 'c', shearFactor: 1e6, joins: 'apart' })
      for (const y of [-3, 3]) b.wall({ p1: { x: -Lw / 2 * 1.2, y }, p2: { x: (Lw / 2) * 1.2, y }, thickness: t, material: 'c', shearFactor: 1e6, joins: 'apart' })
      const s = buildStructure(b.build()).structure!
      const w = yOmegas(solveModes(s, { method: 'all' }))
      const EI = 2 * (E * t * Lw ** 3) / 12
      const mbar = (areaMass * a * a) / (H / N)
      errors.push(w.map((v, i) => Math.abs(v / (BETA_L[i]! ** 2 * Math.sqrt(EI / (mbar * H ** 4))) - 1)))
      if (N === 20) {
        at20 = w
        // the condensed Timoshenko stack with Phi -> 0 equals the exact flexural flexibility inverse
        // (METHODS.md §4: the element is exact for end loads), so the hand-built model must agree
        const ref = lumpedCantilever(N, EI, mbar, H)
        ref.forEach((r, i) => expect(Math.abs(at20[i]! / r - 1)).toBeLessThan(1e-4))
      }
    }
    // METHODS.md §5 closed form; the errors shrink as the floors get denser
    for (let i = 0; i < 3; i++) {
      expect(errors[1]![i]!).toBeLessThan(errors[0]![i]!)
      expect(errors[2]![i]!).toBeLessThan(errors[1]![i]!)
    }
    // lumped masses (full mass at the top floor too) converge at about 1/N (derived from the runs above)
    expect(errors[2]![0]!).toBeLessThan(1.05 / 50)
  })
})
