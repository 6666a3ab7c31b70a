import { EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { buildWallElement, timoshenkoElementStiffness, wallStackStiffness } from '@/engine/elements/wall'
import type { WallStory } from '@/engine/elements/wall'
import type { Wall } from '@/model'
import { expectArrayRelClose, expectRelClose } from '../../helpers/approx'
import { projectBuilder } from '../../helpers/projectBuilder'

const invert = (K: Float64Array, n: number): number[][] =>
  inverse(new Matrix(Array.from({ length: n }, (_, i) => Array.from(K.subarray(i * n, i * n + n))))).to2DArray()

describe('timoshenkoElementStiffness', () => {
  it('reduces to the Euler-Bernoulli beam matrix when shear is rigid', () => {
    // METHODS.md §4: Phi = 0 gives EI/L³ [[12, 6L, -12, 6L], [6L, 4L², -6L, 2L²], ...]
    const EI = 2e9
    const h = 3
    const k = timoshenkoElementStiffness(EI, 1e300, h)
    const c = EI / h ** 3
    expectArrayRelClose(
      k,
      [12, 6 * h, -12, 6 * h, 6 * h, 4 * h * h, -6 * h, 2 * h * h, -12, -6 * h, 12, -6 * h, 6 * h, 2 * h * h, -6 * h, 4 * h * h].map(
        (v) => v * c,
      ),
      1e-14,
    )
  })

  it('gives the cantilever tip flexibility h³/(3EI) + h/(G As) once the base is fixed', () => {
    // METHODS.md §4: exact for a point load; base DOFs removed, invert the 2x2 tip block
    const EI = 5e10
    const GAs = 3e9
    const h = 4
    const k = timoshenkoElementStiffness(EI, GAs, h)
    const a = k[10]!
    const b = k[11]!
    const d = k[15]!
    const flex = d / (a * d - b * b)
    expectRelClose(flex, h ** 3 / (3 * EI) + h / GAs, 1e-13)
  })
})

describe('wallStackStiffness', () => {
  it('gives the single-story tip stiffness 1/(h³/(3EI) + h/(G As))', () => {
    // METHODS.md §4, exact for a point load
    const s: WallStory = { h: 3.5, EI: 8e10, GAs: 4e9 }
    const K = wallStackStiffness([s])
    expectRelClose(K[0]!, 1 / (s.h ** 3 / (3 * s.EI) + s.h / s.GAs), 1e-13)
  })

  it('has the cantilever closed-form flexibility for a uniform multi-story stack', () => {
    // Closed form (Euler-Bernoulli + shear, unit load at z_j, deflection at z_i <= z_j):
    // f_ij = z_i² (3 z_j - z_i) / (6 EI) + z_i / (G As)   (e.g. Gere & Timoshenko; common practice)
    const n = 8
    const h = 3.2
    const EI = 1.2e11
    const GAs = 6e9
    const K = wallStackStiffness(Array.from({ length: n }, () => ({ h, EI, GAs })))
    const F = invert(K, n)
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const zi = (Math.min(i, j) + 1) * h
        const zj = (Math.max(i, j) + 1) * h
        const f = (zi * zi * (3 * zj - zi)) / (6 * EI) + zi / GAs
        expectRelClose(F[i]![j]!, f, 1e-9)
      }
    }
  })

  it('matches the unit-load (virtual work) flexibility of a stack with varying sections', () => {
    // Virtual work: f_ij = ∫ M_i M_j / EI dz + ∫ V_i V_j / (G As) dz with M_i(z) = (z_i - z) below z_i,
    // V_i = 1 below z_i; per story ∫ (a - z)(b - z) dz = [ab z - (a+b) z²/2 + z³/3] (exact integration)
    const stories: WallStory[] = [
      { h: 4.5, EI: 2e11, GAs: 9e9 },
      { h: 3.2, EI: 1.5e11, GAs: 7e9 },
      { h: 3.2, EI: 1.5e11, GAs: 7e9 },
      { h: 3.0, EI: 0.6e11, GAs: 3e9 },
      { h: 3.0, EI: 0.3e11, GAs: 2e9 },
    ]
    const n = stories.length
    const z = [0]
    for (const s of stories) z.push(z[z.length - 1]! + s.h)
    const prim = (a: number, b: number, t: number) => a * b * t - ((a + b) * t * t) / 2 + (t * t * t) / 3
    const F = invert(wallStackStiffness(stories), n)
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const zi = z[i + 1]!
        const zj = z[j + 1]!
        let f = 0
        for (let s = 0; s <= Math.min(i, j); s++) {
          const lo = z[s]!
          const hi = z[s + 1]!
          const st = stories[s]!
          f += (prim(zi, zj, hi) - prim(zi, zj, lo)) / st.EI + (hi - lo) / st.GAs
        }
        expectRelClose(F[i]![j]!, f, 1e-9)
      }
    }
  })

  it('is exactly symmetric and positive definite', () => {
    const K = wallStackStiffness(Array.from({ length: 30 }, (_, i) => ({ h: 3, EI: 1e11 / (1 + i / 10), GAs: 5e9 })))
    for (let i = 0; i < 30; i++) for (let j = 0; j < 30; j++) expect(K[i * 30 + j]).toBe(K[j * 30 + i])
    const A = new Matrix(Array.from({ length: 30 }, (_, i) => Array.from(K.subarray(i * 30, i * 30 + 30))))
    // reference library: ml-matrix symmetric eigenvalues all > 0
    const values = new EigenvalueDecomposition(A, { assumeSymmetric: true }).realEigenvalues
    expect(Math.min(...values)).toBeGreaterThan(0)
  })
})

describe('buildWallElement', () => {
  const base = () =>
    projectBuilder({ floors: [{ height: 4 }, { height: 3 }, { height: 3 }] }).material({ id: 'c', E: 3e10, nu: 0.25 })

  it('uses I = t L³/12 f_I, A_s = 5/6 t L f_A, G = E/(2(1+nu)) and per-story overrides', () => {
    // MODELING.md §Walls
    const p = base()
      .wall({
        id: 'w',
        p1: { x: 1, y: 2 },
        p2: { x: 1 + 3, y: 2 + 4 }, // length 5, direction (0.6, 0.8)
        thickness: 0.25,
        material: 'c',
        flexureFactor: 0.7,
        shearFactor: 0.8,
        stories: { L3: { thickness: 0.2, flexureFactor: 0.35 } },
      })
      .build()
    const { element, issues } = buildWallElement(p, p.walls.w as Wall)
    expect(issues).toHaveLength(0)
    const E = 3e10
    const G = E / 2.5
    const L = 5
    const st = (h: number, t: number, fI: number, fA: number): WallStory => ({
      h,
      EI: E * ((t * L ** 3) / 12) * fI,
      GAs: G * (5 / 6) * t * L * fA,
    })
    const expected = wallStackStiffness([st(4, 0.25, 0.7, 0.8), st(3, 0.25, 0.7, 0.8), st(3, 0.2, 0.35, 0.8)])
    expectArrayRelClose(element!.stiffness, expected, 1e-14)
    expect(element!.floors).toEqual([0, 1, 2])
    expect(element!.standsOnFloor).toBe(false)
    // map row a = [d_x, d_y, x d_y - y d_x] (MODELING.md)
    expectArrayRelClose(element!.map, [0.6, 0.8, 1 * 0.8 - 2 * 0.6], 1e-15)
  })

  it('moves with the floor it stands on: rigid translation gives no force', () => {
    const p = base().wall({ id: 'w', p1: { x: 0, y: 0 }, p2: { x: 4, y: 0 }, base: 'L1' }).build()
    const { element } = buildWallElement(p, p.walls.w as Wall)
    expect(element!.floors).toEqual([0, 1, 2])
    expect(element!.standsOnFloor).toBe(true)
    const k = element!.stiffness
    for (let i = 0; i < 3; i++) {
      const row = k[3 * i]! + k[3 * i + 1]! + k[3 * i + 2]!
      expect(Math.abs(row)).toBeLessThan(1e-6 * k[4]!)
    }
    // relative stiffness over floors 2,3 equals the fixed-base stack of the two stories above L1
    const fixed = wallStackStiffness([
      { h: 3, EI: 3e10 * ((0.3 * 64) / 12), GAs: (3e10 / 2.4) * (5 / 6) * 0.3 * 4 },
      { h: 3, EI: 3e10 * ((0.3 * 64) / 12), GAs: (3e10 / 2.4) * (5 / 6) * 0.3 * 4 },
    ])
    expectArrayRelClose([k[4]!, k[5]!, k[7]!, k[8]!], fixed, 1e-14)
  })

  it('reports a zero-length wall, an unknown floor and a missing material', () => {
    const p = base()
      .wall({ id: 'z', p1: { x: 1, y: 1 }, p2: { x: 1, y: 1 } })
      .wall({ id: 'u', p1: { x: 0, y: 0 }, p2: { x: 1, y: 0 }, top: 'nowhere' })
      .wall({ id: 'm', p1: { x: 0, y: 0 }, p2: { x: 1, y: 0 }, material: 'unobtainium' })
      .build()
    expect(buildWallElement(p, p.walls.z as Wall).issues[0]?.code).toBe('zero-length')
    expect(buildWallElement(p, p.walls.u as Wall).issues[0]?.code).toBe('element-outside-floors')
    const m = buildWallElement(p, p.walls.m as Wall)
    expect(m.element).toBeNull()
    expect(m.issues[0]?.code).toBe('invalid-model')
    expect(m.issues[0]?.message).toContain('material "unobtainium" does not exist')
  })
})
