import { describe, expect, it } from 'vitest'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import { buildStructure } from '@/engine/assemble'
import { cqcMatrix, combineCqc } from '@/engine/cqc'
import { solveModes } from '@/engine/modal'
import type { ModalResult, Structure } from '@/engine/results'
import { createStiffnessSolver } from '@/engine/solve'
import { GRAVITY, spectralAcceleration } from '@/engine/spectra'
import { runSpectrum } from '@/engine/spectrum'
import {
  RESIDUAL_PERIOD,
  directionModalResponses,
  selectSpectrumModes,
} from '@/engine/spectrumModes'
import type { SpectrumModeSet } from '@/engine/spectrumModes'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding } from '../helpers/generateBuilding'
import { buildTestStructure, denseModes, denseSolve, denseSolver, shearElement } from './torsionFixtures'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

/** A stiff, eccentric 10-storey shear building: several of its 30 modes have T < 0.05 s. */
function stiffTower(): Structure {
  const N = 10
  const k = (v: number) => Array.from({ length: N }, () => v)
  return buildTestStructure(
    Array.from({ length: N }, () => ({ mass: 1e5, L: 20, B: 10, height: 3 })),
    [
      shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, k(6e9)),
      shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, k(3e9)),
      shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, k(3e9)),
      shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, k(3e9)),
    ],
  )
}

/** CQC base shear over every mode, V_m = Gamma_m² Sa(T_m) g (the textbook all-modes value). */
function allModesBaseShear(modes: ModalResult, s: AnalysisSettings, d: 'x' | 'y'): number {
  const V = Float64Array.from({ length: modes.count }, (_, m) => {
    const g = modes.participation[d][m]!
    return g * g * spectralAcceleration(s.spectrum, modes.periods[m]!, s.damping) * GRAVITY
  })
  return combineCqc(V, cqcMatrix(modes.angularFrequencies, s.damping))
}

/** A hand-made response set: the first `k` modes kept, the rest in the residual. */
function truncatedSet(modes: ModalResult, k: number, saG: (T: number) => number): SpectrumModeSet {
  const kept = Array.from({ length: k }, (_, m) => m)
  return {
    rule: 'full-mass',
    modes,
    source: 'modal-result',
    kept,
    hasResidual: true,
    count: k + 1,
    angularFrequencies: Float64Array.from([...kept.map((m) => modes.angularFrequencies[m]!), 2 * Math.PI / RESIDUAL_PERIOD]),
    saG: Float64Array.from([...kept.map((m) => saG(modes.periods[m]!)), saG(RESIDUAL_PERIOD)]),
  }
}

describe('directionModalResponses', () => {
  it('makes the static part exact: kept modes plus the residual sum to K^-1 M r Sa g', () => {
    // Closed form: sum over all modes of Gamma_m phi_m / omega_m² = K^-1 M r (modal expansion of the
    // static solution, Chopra "static correction", from memory). With a flat spectrum the algebraic
    // sum of the response vectors of any k kept modes plus the residual must equal the static
    // response K^-1 M r Sa g; checked against an independent Gaussian solve.
    const s = stiffTower()
    const modes = denseModes(s)
    const flat = 0.8
    const n = s.dofCount
    for (const k of [1, 4, 12]) {
      const set = truncatedSet(modes, k, () => flat)
      for (const d of ['x', 'y'] as const) {
        const r = directionModalResponses(s, set, d, denseSolver(s))
        const sum = new Float64Array(n)
        for (let m = 0; m < set.count; m++) for (let i = 0; i < n; i++) sum[i]! += r.displacements[m * n + i]!
        const load = new Float64Array(n)
        for (let f = 0; f < s.floorCount; f++) {
          // M r for a translation along d: the mass block's column d of each floor
          for (let i = 0; i < 3; i++) load[3 * f + i] = s.mass[(3 * f + i) * n + 3 * f + (d === 'x' ? 0 : 1)]! * flat * GRAVITY
        }
        const exact = denseSolve(s.stiffness, load)
        let scale = 0
        for (const v of exact) scale = Math.max(scale, Math.abs(v))
        for (let i = 0; i < n; i++) expect(Math.abs(sum[i]! - exact[i]!) / scale).toBeLessThan(1e-9)
        // 100% of the mass: kept modes + residual (closed form sum of effective masses)
        expect(r.totalMassRatio).toBeCloseTo(1, 9)
        expect(r.residualMassRatio).toBeGreaterThan(0)
      }
    }
  })

  it('gives a residual base shear equal to the missing mass times Sa(0.05 s) g', () => {
    // Closed form: r'(M r - sum Gamma² ...) = r'Mr - sum Gamma_m² (mass-normalized shapes)
    const s = stiffTower()
    const modes = denseModes(s)
    const sa = (T: number) => spectralAcceleration(settings().spectrum, T, 0.05)
    const set = truncatedSet(modes, 3, sa)
    const r = directionModalResponses(s, set, 'y', denseSolver(s))
    let kept = 0
    for (let m = 0; m < 3; m++) kept += modes.participation.y[m]! ** 2
    const missing = s.totalMass - kept
    const n = s.dofCount
    let V = 0
    for (let f = 0; f < s.floorCount; f++) V += r.loads[3 * n + 3 * f + 1]!
    expectRelClose(V, missing * sa(RESIDUAL_PERIOD) * GRAVITY, 1e-9)
    expectRelClose(r.residualMassRatio, missing / s.totalMass, 1e-9)
  })
})

describe('selectSpectrumModes', () => {
  it('keeps every mode with T >= 0.05 s and lumps the rest into one residual', () => {
    const s = stiffTower()
    const modes = denseModes(s)
    const set = selectSpectrumModes(s, modes, settings())
    const longEnough = Array.from(modes.periods).filter((T) => T >= 0.05).length
    expect(longEnough).toBeGreaterThan(3)
    expect(longEnough).toBeLessThan(modes.count)
    expect(set.kept.length).toBe(longEnough)
    expect(set.count).toBe(longEnough + 1)
    // ASCE/SEI 7-16 12.9.1.1: the lumped rigid mode has T = 0.05 s
    expect(set.angularFrequencies[set.count - 1]!).toBeCloseTo(2 * Math.PI / 0.05, 9)
  })

  it('stops at 90% of the mass in X and in Y under the ninety-percent rule', () => {
    const s = stiffTower()
    const modes = denseModes(s)
    const set = selectSpectrumModes(s, modes, settings({ spectrumModes: 'ninety-percent' }))
    const last = set.kept[set.kept.length - 1]!
    // ASCE/SEI 7-16 12.9.1.1 exception: at least 90% of the mass in each horizontal direction
    expect(modes.cumulativeMassRatio.x[last]!).toBeGreaterThanOrEqual(0.9)
    expect(modes.cumulativeMassRatio.y[last]!).toBeGreaterThanOrEqual(0.9)
    const before = last - 1
    expect(Math.min(modes.cumulativeMassRatio.x[before]!, modes.cumulativeMassRatio.y[before]!)).toBeLessThan(0.9)
    expect(set.hasResidual).toBe(false)
  })
})

describe('runSpectrum with the residual mode', () => {
  it('matches the all-modes CQC base shear when the modes below 0.05 s are lumped', () => {
    const s = stiffTower()
    const modes = denseModes(s)
    const st = settings()
    const r = runSpectrum(s, modes, st, { solver: denseSolver(s) })
    for (const d of ['x', 'y'] as const) {
      const all = allModesBaseShear(modes, st, d)
      // Lumped modes get Sa(0.05 s) >= their own rising-branch ordinate and full correlation, so
      // the residual rule is slightly conservative: within 2% here (ASCE/SEI 7-16 12.9.1.1).
      const ratio = r.baseShear[d].cqc / all
      expect(ratio).toBeGreaterThan(0.999)
      expect(ratio).toBeLessThan(1.02)
      expect(r.massRatio![d]).toBeCloseTo(1, 9)
    }
    expect(r.residual!.massRatio.y).toBeGreaterThan(1e-4)
  })

  it('reports 100% of the mass with the residual and less under the ninety-percent rule', () => {
    const s = stiffTower()
    const modes = denseModes(s)
    const full = runSpectrum(s, modes, settings(), { solver: denseSolver(s) })
    const ninety = runSpectrum(s, modes, settings({ spectrumModes: 'ninety-percent' }))
    // closed form: the effective masses of a complete set sum to the total mass
    expect(full.massRatio!.x).toBeCloseTo(1, 9)
    expect(full.massRatio!.y).toBeCloseTo(1, 9)
    expect(ninety.massRatio!.x).toBeGreaterThanOrEqual(0.9)
    expect(ninety.massRatio!.x).toBeLessThan(1 - 1e-3)
    expect(ninety.residual).toBeNull()
    expect(ninety.baseShear.x.cqc).toBeLessThan(full.baseShear.x.cqc)
  })
})

describe('response spectrum of a 72-storey tower', () => {
  it('matches the all-modes base shear within 1% with the residual (the lowest modes alone fall short)', () => {
    const p = generateBuilding({ floors: 72, seed: 7 })
    const s = buildStructure(p).structure!
    const all = solveModes(s, { method: 'all' })
    const result = analyzeProject(p)
    const rsa = result.spectrum!
    // the modal result of a tall building keeps only the lowest modes (docs/dynamics.md §2.3)
    expect(result.modes!.complete).toBe(false)
    expect(rsa.modeSource).toBe('all-modes')
    for (const d of ['x', 'y'] as const) {
      const reference = allModesBaseShear(all, p.settings, d)
      // ASCE/SEI 7-16 12.9.1.1: modes T >= 0.05 s + residual = the all-modes value to within 1%
      expectRelClose(rsa.baseShear[d].cqc, reference, 0.01)
      expect(rsa.massRatio![d]).toBeCloseTo(1, 8)
      // the lowest modes alone (90% rule) fall short by several per cent
      const lowest = runSpectrum(s, result.modes!, { ...p.settings, spectrumModes: 'ninety-percent' })
      expect(lowest.baseShear[d].cqc / reference).toBeLessThan(0.97)
    }
    // A residual standing in for the missing modes of the lowest-mode set (periods far above
    // 0.05 s) adds them as one fully correlated mode and overstates the base shear: the reason the
    // spectrum solves all modes again (docs/dynamics.md §8).
    const low = result.modes!
    const solver = createStiffnessSolver(s)
    if (!solver.ok) throw new Error('mechanism')
    const st = p.settings
    const set = truncatedSet(low, low.count, (T) => spectralAcceleration(st.spectrum, T, st.damping))
    const resp = directionModalResponses(s, set, 'x', solver.solver)
    const n = s.dofCount
    const V = Float64Array.from({ length: set.count }, (_, m) => {
      let v = 0
      for (let f = 0; f < s.floorCount; f++) v += resp.loads[m * n + 3 * f]!
      return v
    })
    const lumped = combineCqc(V, cqcMatrix(set.angularFrequencies, st.damping))
    expect(lumped / allModesBaseShear(all, st, 'x')).toBeGreaterThan(1.05)
  })
})
