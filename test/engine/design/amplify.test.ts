import { describe, expect, it } from 'vitest'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import { resolveCriterionSet } from '@/engine/criteria'
import { AX_MAX_ITERATIONS, AX_TOLERANCE, iterateAmplification } from '@/engine/design/amplify'
import { runStaticTorsion } from '@/engine/loads'
import type { StaticLoading } from '@/engine/loads'
import { denseModes, denseSolver, oneStoreyEccentric } from '../torsionFixtures'
import { eccentricOneStorey } from '../../helpers/projectBuilder'

const settings: AnalysisSettings = {
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
}

/**
 * Closed form of the METHODS.md §8 one-storey case: with K at the CM = k[[3, -10], [-10, 350]] (y,
 * theta) and Fy at x = 10 + e, the edge displacements are (250 - 20e)/950 and (450 + 40e)/950 (F/k),
 * so the max/avg ratio is r(e) = 2 (450 + 40e) / (700 + 20e) and Ax(e) = clamp((r/1.2)², 1, 3)
 * (ASCE/SEI 7-16 Eq. 12.8-14). The consistent Ax solves Ax = Ax(sign * Ax * 1.0 m): bisection.
 */
function fixedPointAx(sign: 1 | -1): number {
  const ax = (e: number): number => Math.min(3, Math.max(1, ((2 * (450 + 40 * e)) / (700 + 20 * e) / 1.2) ** 2))
  let lo = 1
  let hi = 3
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2
    if (ax(sign * mid) - mid > 0) lo = mid
    else hi = mid
  }
  return (lo + hi) / 2
}

describe('iterateAmplification', () => {
  const s = oneStoreyEccentric()
  const solver = denseSolver(s)
  const modes = denseModes(s)
  const set = resolveCriterionSet(settings).set
  const F = Float64Array.of(1e6)
  const load = { periodUsed: 0.1, exponent: 1, coefficient: 1, baseShear: 1e6, forces: F }
  const loading: StaticLoading = { x: load, y: load }

  it('starts from Ax = 1.28654 and converges to the closed-form consistent Ax', () => {
    const first = runStaticTorsion(s, solver, modes, settings, set, loading)
    const out = iterateAmplification(s, solver, modes, settings, set, loading, first, { x: 1, y: 1 })!
    const plus = out.cases.find((c) => c.caseId === 'Y+e')!
    // METHODS.md §8 (derived): +1.0 m shift -> ratio 1.36111 -> Ax = 1.28654 with Ax = 1
    expect(plus.firstPass[0]!).toBeCloseTo(1.28654, 5)
    expect(plus.converged).toBe(true)
    expect(plus.iterations).toBeGreaterThan(1)
    expect(plus.iterations).toBeLessThan(AX_MAX_ITERATIONS)
    // closed form above (bisection), to the iteration tolerance
    expect(Math.abs(plus.final[0]! - fixedPointAx(1))).toBeLessThan(10 * AX_TOLERANCE)
    expect(fixedPointAx(1)).toBeGreaterThan(1.3)
    const minus = out.cases.find((c) => c.caseId === 'Y-e')!
    expect(Math.abs(minus.final[0]! - fixedPointAx(-1))).toBeLessThan(10 * AX_TOLERANCE)
    // the final run's load point is moved by Ax * 1.0 m
    const c = out.result.cases.find((k) => k.id === 'Y+e')!
    expect(c.loadPoints[0]!.x).toBeCloseTo(10 + plus.final[0]!, 9)
    // amplified torsion can only raise the edge ratio of the + case
    expect(plus.maxDriftRatio).toBeGreaterThan(1.36111)
  })

  it('returns null when the criterion set defines no amplification', () => {
    const en = resolveCriterionSet({ ...settings, criterionSet: 'en1998-1' }).set
    const first = runStaticTorsion(s, solver, modes, settings, en, loading)
    expect(iterateAmplification(s, solver, modes, settings, en, loading, first, { x: 1, y: 1 })).toBeNull()
  })
})

describe('amplified accidental torsion in analyzeProject', () => {
  it('reports the iterations per case and the consistent Ax of the one-storey case', () => {
    const p = eccentricOneStorey()
    const r = analyzeProject({
      ...p,
      settings: {
        ...p.settings,
        criterionSet: 'asce7-16',
        seismicDesign: {
          code: 'asce7-16',
          riskCategory: 'II',
          systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
          systemY: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
        },
      },
    }, { spectrum: false })
    const cases = r.design!.amplified!
    expect(cases.map((c) => c.caseId)).toEqual(['X+e', 'X-e', 'Y+e', 'Y-e'])
    const plus = cases.find((c) => c.caseId === 'Y+e')!
    // closed form of METHODS.md §8 (see fixedPointAx)
    expect(Math.abs(plus.final[0]! - fixedPointAx(1))).toBeLessThan(10 * AX_TOLERANCE)
    // X cases: the plan is symmetric about y = 5 (CR y = CM y), ratio < 1.2 -> Ax = 1 at once
    const x = cases.find((c) => c.caseId === 'X+e')!
    expect(x.final[0]!).toBe(1)
    expect(x.iterations).toBe(1)
  })
})
