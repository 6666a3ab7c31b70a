/**
 * Which modes a response spectrum combines, and the peak response vectors of each combined mode,
 * including the residual rigid mode that carries the mass the kept modes leave out.
 * @see ASCE/SEI 7-16 12.9.1.1 (METHODS.md §1); docs/dynamics.md §8
 */
import type { AnalysisSettings, SpectrumModeRule } from '@/model'
import { influenceVectors, solveModes } from './modal'
import type { ModalResult, Structure } from './results'
import type { StiffnessSolver } from './solve'
import { GRAVITY, spectralAcceleration } from './spectra'

/** Period of the residual rigid mode and the shortest period kept as a mode of its own, s. */
export const RESIDUAL_PERIOD = 0.05

/** Mass ratio share of the 'ninety-percent' rule (ASCE/SEI 7-16 12.9.1.1 exception). */
export const NINETY_PERCENT = 0.9

/**
 * Residual mass ratios below this are treated as zero (the kept modes then carry all the mass to
 * round-off and no residual vector is formed).
 */
export const RESIDUAL_MASS_TOLERANCE = 1e-9

/** The set of response modes a spectrum analysis combines. */
export interface SpectrumModeSet {
  readonly rule: SpectrumModeRule
  /** Modes the kept indices refer to (the modal result, or all modes solved for the spectrum). */
  readonly modes: ModalResult
  /** 'modal-result': the analysis's own modes; 'all-modes': every mode, solved for the spectrum. */
  readonly source: 'modal-result' | 'all-modes'
  /** Indices into `modes` of the modes combined as modes of their own, ascending. */
  readonly kept: readonly number[]
  /** Whether one residual rigid mode follows the kept modes. */
  readonly hasResidual: boolean
  /** Response modes combined: kept.length + (hasResidual ? 1 : 0). */
  readonly count: number
  /** omega per response mode for the CQC, rad/s (the residual: 2 pi / 0.05 s). */
  readonly angularFrequencies: Float64Array
  /** Spectral acceleration per response mode, g (the residual: Sa(0.05 s)). */
  readonly saG: Float64Array
}

/** Peak responses of every response mode to excitation along one direction. */
export interface DirectionModalResponses {
  /** Peak displacement vectors at O, mode-major count x dofCount, m and rad. */
  readonly displacements: Float64Array
  /**
   * Equivalent floor loads at O producing them (K u = p), mode-major count x dofCount, N and N·m:
   * Gamma Sa g M phi for a mode, the residual load (M r - sum Gamma M phi) Sa g for the residual.
   */
  readonly loads: Float64Array
  /** Effective mass ratio of the residual mode along the excitation, - (0 without a residual). */
  readonly residualMassRatio: number
  /** Effective mass ratio of all response modes together along the excitation, -. */
  readonly totalMassRatio: number
}

/** The 'full-mass' rule needs every mode down to 0.05 s: is `modes` missing some of them? */
function lacksShortModes(modes: ModalResult): boolean {
  if (modes.complete) return false
  const last = modes.count > 0 ? modes.periods[modes.count - 1]! : Infinity
  return !(last < RESIDUAL_PERIOD)
}

/**
 * Pick the response modes for a spectrum analysis.
 * - 'full-mass' (default): every mode with T >= 0.05 s as a mode of its own, the rest of the mass in
 *   one residual rigid mode at T = 0.05 s. When the modal result stops above 0.05 s (the lowest
 *   modes of a tall building), all modes are solved again for the spectrum (`source` 'all-modes'):
 *   a residual standing in for modes of longer period than 0.05 s would add them as if fully
 *   correlated and overstate the response (docs/dynamics.md §8).
 * - 'ninety-percent': the lowest modes until the cumulative effective mass ratio reaches 90% in X
 *   and in Y (all modes given when they do not), no residual.
 * @see ASCE/SEI 7-16 12.9.1.1 (METHODS.md §1)
 */
export function selectSpectrumModes(
  structure: Structure,
  modes: ModalResult,
  settings: AnalysisSettings,
): SpectrumModeSet {
  const rule: SpectrumModeRule = settings.spectrumModes ?? 'full-mass'
  const zeta = settings.damping
  const sa = (T: number): number => (Number.isFinite(T) ? spectralAcceleration(settings.spectrum, T, zeta) : 0)
  if (rule === 'ninety-percent') {
    let last = modes.count - 1
    for (let m = 0; m < modes.count; m++) {
      const cx = modes.cumulativeMassRatio.x[m]!
      const cy = modes.cumulativeMassRatio.y[m]!
      if (cx >= NINETY_PERCENT - 1e-12 && cy >= NINETY_PERCENT - 1e-12) {
        last = m
        break
      }
    }
    const kept = Array.from({ length: last + 1 }, (_, m) => m)
    return {
      rule,
      modes,
      source: 'modal-result',
      kept,
      hasResidual: false,
      count: kept.length,
      angularFrequencies: Float64Array.from(kept, (m) => modes.angularFrequencies[m]!),
      saG: Float64Array.from(kept, (m) => sa(modes.periods[m]!)),
    }
  }
  const all = lacksShortModes(modes)
  const set = all ? solveModes(structure, { method: 'all' }) : modes
  const kept: number[] = []
  for (let m = 0; m < set.count; m++) {
    const T = set.periods[m]!
    if (T >= RESIDUAL_PERIOD && set.angularFrequencies[m]! > 0) kept.push(m)
  }
  const count = kept.length + 1
  const omega = new Float64Array(count)
  const saG = new Float64Array(count)
  kept.forEach((m, i) => {
    omega[i] = set.angularFrequencies[m]!
    saG[i] = sa(set.periods[m]!)
  })
  omega[count - 1] = (2 * Math.PI) / RESIDUAL_PERIOD
  saG[count - 1] = sa(RESIDUAL_PERIOD)
  return {
    rule,
    modes: set,
    source: all ? 'all-modes' : 'modal-result',
    kept,
    hasResidual: true,
    count,
    angularFrequencies: omega,
    saG,
  }
}

/** M v for the block-diagonal mass (3x3 blocks per floor). */
function mulMass(structure: Structure, v: ArrayLike<number>, vo = 0): Float64Array {
  const n = structure.dofCount
  const M = structure.mass
  const out = new Float64Array(n)
  for (let f = 0; f < structure.floorCount; f++) {
    const o = 3 * f
    for (let i = 0; i < 3; i++) {
      const r = (o + i) * n + o
      out[o + i] = M[r]! * v[vo + o]! + M[r + 1]! * v[vo + o + 1]! + M[r + 2]! * v[vo + o + 2]!
    }
  }
  return out
}

/**
 * Peak responses of each response mode to excitation along `direction`:
 * u_m = Gamma_m Sa_m g / omega_m² phi_m and p_m = Gamma_m Sa_m g M phi_m for the kept modes; for the
 * residual, p_r = (M r - sum_kept Gamma_m M phi_m) Sa(0.05 s) g and u_r = K^-1 p_r.
 * A residual whose effective mass ratio is below RESIDUAL_MASS_TOLERANCE is left at zero.
 * @param solver the stiffness factorization (used only when the set has a residual)
 * @see ASCE/SEI 7-16 12.9.1.1; the residual (static-correction) vector: Chopra, Dynamics of
 *   Structures, "static correction method" (section number from memory)
 */
export function directionModalResponses(
  structure: Structure,
  set: SpectrumModeSet,
  direction: 'x' | 'y',
  solver: StiffnessSolver,
): DirectionModalResponses {
  const n = structure.dofCount
  const modes = set.modes
  const u = new Float64Array(set.count * n)
  const p = new Float64Array(set.count * n)
  const r = influenceVectors(structure)[direction]
  const Mr = mulMass(structure, r)
  let rMr = 0
  for (let i = 0; i < n; i++) rMr += r[i]! * Mr[i]!
  const residualLoad = Float64Array.from(Mr)
  let keptMass = 0
  set.kept.forEach((m, k) => {
    const gamma = modes.participation[direction][m]!
    const w = modes.angularFrequencies[m]!
    const Mphi = mulMass(structure, modes.shapes, m * n)
    const A = set.saG[k]! * GRAVITY
    for (let i = 0; i < n; i++) {
      u[k * n + i] = ((gamma * A) / (w * w)) * modes.shapes[m * n + i]!
      p[k * n + i] = gamma * A * Mphi[i]!
      residualLoad[i] = residualLoad[i]! - gamma * Mphi[i]!
    }
    keptMass += gamma * gamma
  })
  let residualMassRatio = 0
  if (set.hasResidual && rMr > 0) {
    // r' (M r - sum Gamma M phi) = r'Mr - sum Gamma²: the mass the kept modes leave out.
    let missing = 0
    for (let i = 0; i < n; i++) missing += r[i]! * residualLoad[i]!
    residualMassRatio = missing / rMr
    if (residualMassRatio > RESIDUAL_MASS_TOLERANCE) {
      const k = set.count - 1
      const A = set.saG[k]! * GRAVITY
      const load = residualLoad.map((v) => v * A)
      p.set(load, k * n)
      u.set(solver.solve(load), k * n)
    } else {
      residualMassRatio = 0
    }
  }
  const totalMassRatio = rMr > 0 ? keptMass / rMr + residualMassRatio : 0
  return { displacements: u, loads: p, residualMassRatio, totalMassRatio }
}
