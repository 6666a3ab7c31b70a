/**
 * Linear time history by modal superposition: each modal coordinate q_m obeys
 * q'' + 2 zeta omega q' + omega² q = -(Gamma_x a_gx + Gamma_y a_gy), integrated by Newmark's
 * average acceleration method (gamma = 1/2, beta = 1/4, unconditionally stable); floor
 * displacements u(t) = sum_m phi_m q_m(t). Displacements are relative to the ground.
 * @see MODELING.md "Time history"; METHODS.md §10; Newmark (1959), J. Eng. Mech. Div. ASCE 85(EM3)
 *   (citation from memory)
 */
import type { AnalysisSettings } from '@/model'
import { groundMotionFromSpec } from './groundMotion'
import type { ModalResult, Structure, TimeHistoryResult } from './results'

/** Most steps kept in the stored series; longer runs are decimated (every k-th step). */
export const MAX_OUTPUT_STEPS = 2000

/** Sub-steps per record step so that the integration step is at most T_m / 10, capped at this. */
export const MAX_SUBSTEPS = 16

export interface NewmarkOptions {
  /** initial displacement and velocity */
  readonly u0?: number
  readonly v0?: number
  readonly gamma?: number
  readonly beta?: number
  /** integration sub-steps per load step; the load is interpolated linearly between samples */
  readonly substeps?: number
}

/**
 * Newmark integration of u'' + 2 zeta omega u' + omega² u = p(t) (p per unit mass, sampled every
 * dt).
 * Returns u, v, a at the sample times. Default: average acceleration (gamma = 1/2, beta = 1/4).
 * @see METHODS.md §10 (update formulas and effective stiffness)
 */
export function newmarkSdof(
  omega: number,
  zeta: number,
  dt: number,
  load: ArrayLike<number>,
  options: NewmarkOptions = {},
): { u: Float64Array; v: Float64Array; a: Float64Array } {
  if (!(dt > 0)) throw new RangeError(`[engine] newmark: dt must be > 0 (got ${dt})`)
  const gamma = options.gamma ?? 0.5
  const beta = options.beta ?? 0.25
  const sub = Math.max(1, Math.floor(options.substeps ?? 1))
  const h = dt / sub
  const n = load.length
  const u = new Float64Array(n)
  const v = new Float64Array(n)
  const a = new Float64Array(n)
  if (n === 0) return { u, v, a }
  const k = omega * omega
  const c = 2 * zeta * omega
  let ui = options.u0 ?? 0
  let vi = options.v0 ?? 0
  let ai = load[0]! - c * vi - k * ui
  u[0] = ui
  v[0] = vi
  a[0] = ai
  // Effective stiffness for unit mass: k_hat = k + gamma/(beta h) c + 1/(beta h²).
  const kHat = k + (gamma / (beta * h)) * c + 1 / (beta * h * h)
  const a1 = 1 / (beta * h * h) + (gamma / (beta * h)) * c
  const a2 = 1 / (beta * h) + (gamma / beta - 1) * c
  const a3 = 1 / (2 * beta) - 1 + h * (gamma / (2 * beta) - 1) * c
  for (let s = 1; s < n; s++) {
    const p0 = load[s - 1]!
    const p1 = load[s]!
    for (let j = 1; j <= sub; j++) {
      const p = p0 + ((p1 - p0) * j) / sub
      const pHat = p + a1 * ui + a2 * vi + a3 * ai
      const un = pHat / kHat
      const vn =
        (gamma / (beta * h)) * (un - ui) +
        (1 - gamma / beta) * vi +
        h * (1 - gamma / (2 * beta)) * ai
      const an = (un - ui) / (beta * h * h) - vi / (beta * h) - (1 / (2 * beta) - 1) * ai
      ui = un
      vi = vn
      ai = an
    }
    u[s] = ui
    v[s] = vi
    a[s] = ai
  }
  return { u, v, a }
}

/**
 * Time history by Newmark average acceleration on all modal coordinates with modal damping
 * settings.damping (the same ratio in every mode). Ground motion: settings.groundMotion, or the
 * default generated demo motion when none is set. Peaks are taken over every integration step; the
 * stored series keeps every `outputStride`-th step so that at most MAX_OUTPUT_STEPS are kept.
 */
export function runTimeHistory(
  structure: Structure,
  modes: ModalResult,
  settings: AnalysisSettings,
): TimeHistoryResult {
  const motion = groundMotionFromSpec(settings.groundMotion)
  const zeta = settings.damping
  const steps = motion.ax.length
  const n = structure.dofCount
  const count = modes.count
  // Modal coordinates step-major (q[s * count + m]) so the reconstruction reads them in order.
  const q = new Float64Array(count * steps)
  const load = new Float64Array(steps)
  for (let m = 0; m < count; m++) {
    const w = modes.angularFrequencies[m]!
    if (!(w > 0)) continue
    const gx = modes.participation.x[m]!
    const gy = modes.participation.y[m]!
    for (let s = 0; s < steps; s++) load[s] = -(gx * motion.ax[s]! + gy * motion.ay[s]!)
    const T = (2 * Math.PI) / w
    const substeps = Math.min(MAX_SUBSTEPS, Math.max(1, Math.ceil(motion.dt / (T / 10))))
    const qm = newmarkSdof(w, zeta, motion.dt, load, { substeps }).u
    for (let s = 0; s < steps; s++) q[s * count + m] = qm[s]!
  }
  const stride = Math.max(1, Math.ceil(steps / MAX_OUTPUT_STEPS))
  const stored = Math.ceil(steps / stride)
  const displacements = new Float64Array(stored * n)
  const ugx = new Float64Array(stored)
  const ugy = new Float64Array(stored)
  const nf = structure.floorCount
  const peakX = new Float64Array(nf)
  const peakY = new Float64Array(nf)
  const peakR = new Float64Array(nf)
  const u = new Float64Array(n)
  const cmX = Float64Array.from(structure.floors, (f) => f.centreOfMass.x)
  const cmY = Float64Array.from(structure.floors, (f) => f.centreOfMass.y)
  const shapes = modes.shapes
  for (let s = 0; s < steps; s++) {
    u.fill(0)
    for (let m = 0; m < count; m++) {
      const qm = q[s * count + m]!
      if (qm === 0) continue
      const o = m * n
      for (let i = 0; i < n; i++) u[i]! += shapes[o + i]! * qm
    }
    for (let i = 0; i < nf; i++) {
      const th = u[3 * i + 2]!
      peakX[i] = Math.max(peakX[i]!, Math.abs(u[3 * i]! - th * cmY[i]!))
      peakY[i] = Math.max(peakY[i]!, Math.abs(u[3 * i + 1]! + th * cmX[i]!))
      peakR[i] = Math.max(peakR[i]!, Math.abs(th))
    }
    if (s % stride === 0) {
      const k = s / stride
      displacements.set(u, k * n)
      ugx[k] = motion.ax[s]!
      ugy[k] = motion.ay[s]!
    }
  }
  const absMax = (a: Float64Array): number => a.reduce((p, v) => Math.max(p, Math.abs(v)), 0)
  return {
    dt: motion.dt * stride,
    stepCount: stored,
    damping: zeta,
    displacements,
    dofCount: n,
    peaks: structure.floors.map((f, i) => ({
      floorId: f.id,
      x: peakX[i]!,
      y: peakY[i]!,
      rotation: peakR[i]!,
    })),
    groundMotionName: motion.name,
    synthetic: motion.synthetic,
    integrationDt: motion.dt,
    outputStride: stride,
    groundAcceleration: { x: ugx, y: ugy },
    peakGroundAcceleration: { x: absMax(motion.ax), y: absMax(motion.ay) },
  }
}
