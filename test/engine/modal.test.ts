import { describe, expect, it } from 'vitest'
import { buildStructure } from '@/engine/assemble'
import { solveModes } from '@/engine/modal'
import type { Structure } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding, structureFromParts } from '../helpers/generateBuilding'

/**
 * Doubly symmetric shear building, CM on the origin: X frames at y = +/-5 (k/2 each), Y frames at
 * x = +/-5 (1.7 k/2 each), J = m * 4² so X, Y and torsion never share a frequency.
 */
function symmetricShearBuilding(masses: readonly number[], kx: readonly number[]): Structure {
  const ky = kx.map((k) => 1.7 * k)
  return structureFromParts(
    masses.map((m) => ({ mass: m, J: m * 16 })),
    [
      { at: { x: 0, y: -5 }, angle: 0, storyStiffness: kx.map((k) => k / 2) },
      { at: { x: 0, y: 5 }, angle: 0, storyStiffness: kx.map((k) => k / 2) },
      { at: { x: -5, y: 0 }, angle: Math.PI / 2, storyStiffness: ky.map((k) => k / 2) },
      { at: { x: 5, y: 0 }, angle: Math.PI / 2, storyStiffness: ky.map((k) => k / 2) },
    ],
  )
}

/** METHODS.md §8 one-storey case: 20 m x 10 m, m = 100 t, k = 1e5 kN/m. */
function oneStoreyCase(): Structure {
  const m = 1e5
  const k = 1e8
  return structureFromParts(
    [{ mass: m, cm: { x: 10, y: 5 }, J: (m * (20 * 20 + 10 * 10)) / 12 }],
    [
      { at: { x: 0, y: 0 }, angle: Math.PI / 2, storyStiffness: [2 * k] },
      { at: { x: 20, y: 0 }, angle: Math.PI / 2, storyStiffness: [k] },
      { at: { x: 0, y: 0 }, angle: 0, storyStiffness: [k] },
      { at: { x: 0, y: 10 }, angle: 0, storyStiffness: [k] },
    ],
  )
}

describe('solveModes', () => {
  it('reproduces the uniform shear building closed form for N = 1, 2, 3, 5, 10', () => {
    const m = 2.5e5
    const k = 4e8
    for (const N of [1, 2, 3, 5, 10]) {
      const modes = solveModes(symmetricShearBuilding(Array(N).fill(m), Array(N).fill(k)))
      const xModes = [...Array(modes.count).keys()].filter((i) => modes.character[i] === 'x')
      expect(xModes.length).toBe(N)
      xModes.forEach((mode, i) => {
        const n = i + 1
        // METHODS.md §5: omega_n = 2 sqrt(k/m) sin((2n - 1) pi / (2 (2N + 1)))
        const expected = 2 * Math.sqrt(k / m) * Math.sin(((2 * n - 1) * Math.PI) / (2 * (2 * N + 1)))
        expectRelClose(modes.angularFrequencies[mode]!, expected, 1e-11)
      })
      if (N === 3) {
        // METHODS.md §5 tabulated omega/sqrt(k/m) for N = 3: 0.445042, 1.246980, 1.801938
        const ratios = xModes.map((i) => modes.angularFrequencies[i]! / Math.sqrt(k / m))
        expect(ratios[0]!).toBeCloseTo(0.445042, 6)
        expect(ratios[1]!).toBeCloseTo(1.24698, 6)
        expect(ratios[2]!).toBeCloseTo(1.801938, 6)
      }
      if (N === 10) {
        // METHODS.md §5: first mode 0.149460 sqrt(k/m) for N = 10
        expect(modes.angularFrequencies[xModes[0]!]! / Math.sqrt(k / m)).toBeCloseTo(0.14946, 6)
      }
    }
  })

  it('matches the quadratic roots of a two-storey frame with unequal masses and stiffnesses', () => {
    const [m1, m2, k1, k2] = [2.0e5, 1.5e5, 3.0e8, 2.0e8]
    const modes = solveModes(symmetricShearBuilding([m1, m2], [k1, k2]))
    // hand derivation: det([[k1 + k2 - l m1, -k2], [-k2, k2 - l m2]]) = 0
    // => m1 m2 l² - (m1 k2 + m2 (k1 + k2)) l + k1 k2 = 0
    const a = m1 * m2
    const b = -(m1 * k2 + m2 * (k1 + k2))
    const c = k1 * k2
    const disc = Math.sqrt(b * b - 4 * a * c)
    const roots = [(-b - disc) / (2 * a), (-b + disc) / (2 * a)]
    const xModes = [...Array(modes.count).keys()].filter((i) => modes.character[i] === 'x')
    expect(xModes.length).toBe(2)
    xModes.forEach((mode, i) => expectRelClose(modes.angularFrequencies[mode]! ** 2, roots[i]!, 1e-12))
    // periods and frequencies are consistent with omega
    for (let i = 0; i < modes.count; i++) {
      expectRelClose(modes.periods[i]!, (2 * Math.PI) / modes.angularFrequencies[i]!, 1e-14)
      expectRelClose(modes.frequenciesHz[i]!, 1 / modes.periods[i]!, 1e-14)
    }
  })

  it('reproduces the one-storey eccentric case of METHODS.md §8', () => {
    const modes = solveModes(oneStoreyCase())
    expect(modes.count).toBe(3)
    expect(modes.complete).toBe(true)
    // METHODS.md §8 [derived]: 44.7214 (pure x), 50.8638, 93.8769 rad/s
    expect(modes.angularFrequencies[0]!).toBeCloseTo(44.7214, 3)
    expect(modes.angularFrequencies[1]!).toBeCloseTo(50.8638, 3)
    expect(modes.angularFrequencies[2]!).toBeCloseTo(93.8769, 3)
    // METHODS.md §8: Meff_y = 0.93368 m and 0.06632 m; mode 1 is pure x
    expect(modes.effectiveMassRatio.x[0]!).toBeCloseTo(1, 12)
    expect(modes.effectiveMassRatio.y[1]!).toBeCloseTo(0.93368, 5)
    expect(modes.effectiveMassRatio.y[2]!).toBeCloseTo(0.06632, 5)
    expect(modes.character).toEqual(['x', 'y', 'torsion'])
    // one storey: the rotation share of mode 2 is the complement of its y mass ratio (derived)
    expect(modes.torsionShare[1]!).toBeCloseTo(0.06632, 5)
    expect(modes.torsionShare[0]!).toBeCloseTo(0, 12)
  })

  it('gives effective masses that sum to the total in X, Y and rotation when all modes are found', () => {
    // sum_m (phi_m' M r)² = r' M r for a complete M-orthonormal set (Chopra, Dynamics of Structures,
    // effective modal mass sum rule; from memory)
    for (const seed of [1, 2, 3]) {
      const built = buildStructure(generateBuilding({ floors: 12, seed }))
      const s = built.structure!
      const modes = solveModes(s, { method: 'all' })
      expect(modes.count).toBe(s.dofCount)
      for (const k of ['x', 'y', 'rz'] as const) {
        expect(modes.cumulativeMassRatio[k][modes.count - 1]!).toBeCloseTo(1, 10)
        let sum = 0
        for (let i = 0; i < modes.count; i++) sum += modes.effectiveMassRatio[k][i]!
        expect(sum).toBeCloseTo(1, 10)
      }
      // the X ratio times the total mass is the effective mass: r'Mr = total mass for r = X
      let gx2 = 0
      for (let i = 0; i < modes.count; i++) gx2 += modes.participation.x[i]! ** 2
      expectRelClose(gx2, s.totalMass, 1e-10)
    }
  })

  it('finds uncoupled modes on a symmetric plan', () => {
    const s = buildStructure(generateBuilding({ floors: 8, seed: 4, symmetric: true })).structure!
    const modes = solveModes(s)
    for (let i = 0; i < modes.count; i++) {
      const t = modes.torsionShare[i]!
      // symmetric plan: translation and torsion decouple (common practice; Chopra §9.5 from memory)
      expect(Math.min(t, 1 - t)).toBeLessThan(1e-8)
      const ex = modes.effectiveMassRatio.x[i]!
      const ey = modes.effectiveMassRatio.y[i]!
      expect(Math.min(ex, ey)).toBeLessThan(1e-10)
      if (t > 0.5) {
        expect(modes.character[i]).toBe('torsion')
        expect(ex + ey).toBeLessThan(1e-10)
      } else {
        expect(modes.effectiveMassRatio.rz[i]!).toBeLessThan(1e-10)
      }
    }
  })

  it('stops the lowest-mode method at the mass target and says how many modes it found', () => {
    const s = buildStructure(generateBuilding({ floors: 80, seed: 6 })).structure!
    const modes = solveModes(s) // auto: more than 60 floors -> lowest modes to 90%
    expect(modes.complete).toBe(false)
    expect(modes.count).toBeGreaterThanOrEqual(12)
    expect(modes.solver).toContain(`${modes.count} of ${s.dofCount} modes`)
    expect(modes.solver).toContain(`Sturm count ${modes.count}`)
    for (const k of ['x', 'y', 'rz'] as const) {
      // ASCE/SEI 7-16 12.9.1.1 exception and EN 1998-1 4.3.3.3.1: at least 90% of the mass
      expect(modes.cumulativeMassRatio[k][modes.count - 1]!).toBeGreaterThanOrEqual(0.9)
    }
    // reusing the stiffness solver's factorization gives the same modes
    const solver = createStiffnessSolver(s)
    if (!solver.ok) throw new Error('mechanism')
    const reused = solveModes(s, { stiffnessSolver: solver.solver })
    expect(reused.count).toBe(modes.count)
    const all = solveModes(s, { method: 'all' })
    for (let i = 0; i < modes.count; i++) {
      expectRelClose(reused.angularFrequencies[i]!, all.angularFrequencies[i]!, 1e-9)
      expectRelClose(modes.angularFrequencies[i]!, all.angularFrequencies[i]!, 1e-9)
      expect(modes.effectiveMassRatio.x[i]!).toBeCloseTo(all.effectiveMassRatio.x[i]!, 8)
      expect(modes.character[i]).toBe(all.character[i])
    }
  })

  it('returns no modes and an issue when a floor has no rotary inertia', () => {
    const s = structureFromParts(
      [{ mass: 1e5, J: 0 }],
      [
        { at: { x: 0, y: -5 }, angle: 0, storyStiffness: [1e8] },
        { at: { x: 0, y: 5 }, angle: 0, storyStiffness: [1e8] },
        { at: { x: -5, y: 0 }, angle: Math.PI / 2, storyStiffness: [1e8] },
      ],
    )
    const modes = solveModes(s)
    expect(modes.count).toBe(0)
    expect(modes.complete).toBe(false)
    expect(modes.issues?.[0]?.code).toBe('no-mass')
    expect(modes.issues?.[0]?.message).toContain('Floor 1')
  })
})
