/**
 * Response spectrum analysis: modal peak responses from a design spectrum, combined over modes by
 * CQC (SRSS beside it) and over the two horizontal excitation directions by SRSS or the 100/30
 * rule.
 * Differences (story drifts at the extreme points) are formed in each mode before combining.
 * All modes of the modal result are combined; the rising branch below T0 is kept; no base-shear
 * scaling unless `settings.baseShearTarget` is given.
 * @see MODELING.md "Response spectrum"; METHODS.md §1-§3
 */
import type { AnalysisSettings } from '@/model'
import { combineCqc, combineSrss, cqcMatrix } from './cqc'
import { extremePointDrifts } from './loads'
import type { ModalResult, SpectrumFloorResponse, SpectrumResult, Structure } from './results'
import { GRAVITY, spectralAcceleration } from './spectra'

export { spectralAcceleration } from './spectra'

type Dir = 'x' | 'y'

/** Combined peak values of one floor under one excitation direction (directions not combined). */
interface FloorPeaks {
  readonly dispCqc: [number, number, number]
  readonly dispSrss: [number, number, number]
  /** Per extreme point, drifts along x and along y. */
  readonly driftCqc: { x: Float64Array; y: Float64Array }
  readonly driftSrss: { x: Float64Array; y: Float64Array }
  readonly shearCqc: [number, number]
}

/** Direction combination of two peak values: SRSS, or the larger of 100 % + 30 %. */
export function combineDirections(a: number, b: number, rule: 'srss' | '100-30'): number {
  return rule === 'srss' ? Math.hypot(a, b) : Math.max(a + 0.3 * b, 0.3 * a + b)
}

/**
 * Modal peak displacement vectors for excitation along one direction:
 * u_m = Gamma_m Sa_m g / omega_m² phi_m (global order at O), mode-major count x dofCount, m, rad.
 */
export function modalPeakDisplacements(
  modes: ModalResult,
  direction: Dir,
  modalSaG: ArrayLike<number>,
): Float64Array {
  const n = modes.dofCount
  const out = new Float64Array(modes.count * n)
  for (let m = 0; m < modes.count; m++) {
    const w = modes.angularFrequencies[m]!
    if (!(w > 0)) continue
    const D = (modes.participation[direction][m]! * modalSaG[m]! * GRAVITY) / (w * w)
    for (let i = 0; i < n; i++) out[m * n + i] = D * modes.shapes[m * n + i]!
  }
  return out
}

function floorPeaks(
  structure: Structure,
  modes: ModalResult,
  u: Float64Array,
  rho: Float64Array,
): FloorPeaks[] {
  const nf = structure.floorCount
  const n = structure.dofCount
  const count = modes.count
  const M = structure.mass
  // Modal floor inertia forces f_m = omega_m² M u_m (x and y components per floor).
  const fx = new Float64Array(count * nf)
  const fy = new Float64Array(count * nf)
  for (let m = 0; m < count; m++) {
    const w2 = modes.angularFrequencies[m]! ** 2
    for (let f = 0; f < nf; f++) {
      let sx = 0
      let sy = 0
      for (let j = 0; j < n; j++) {
        const uj = u[m * n + j]!
        if (uj === 0) continue
        sx += M[(3 * f) * n + j]! * uj
        sy += M[(3 * f + 1) * n + j]! * uj
      }
      fx[m * nf + f] = w2 * sx
      fy[m * nf + f] = w2 * sy
    }
  }
  const modal = new Float64Array(count)
  const both = (fill: (m: number) => number): [number, number] => {
    for (let m = 0; m < count; m++) modal[m] = fill(m)
    return [combineCqc(modal, rho), combineSrss(modal)]
  }
  return structure.floors.map((floor, f) => {
    const cm = floor.centreOfMass
    const o = 3 * f
    const dx = both((m) => u[m * n + o]! - u[m * n + o + 2]! * cm.y)
    const dy = both((m) => u[m * n + o + 1]! + u[m * n + o + 2]! * cm.x)
    const dr = both((m) => u[m * n + o + 2]!)
    const P = floor.extremePoints.length
    const driftModal = { x: new Float64Array(count * P), y: new Float64Array(count * P) }
    for (let m = 0; m < count; m++) {
      const um = u.subarray(m * n, (m + 1) * n)
      for (const d of ['x', 'y'] as const) {
        driftModal[d].set(extremePointDrifts(structure, um, f, d), m * P)
      }
    }
    const driftCqc = { x: new Float64Array(P), y: new Float64Array(P) }
    const driftSrss = { x: new Float64Array(P), y: new Float64Array(P) }
    for (const d of ['x', 'y'] as const) {
      for (let p = 0; p < P; p++) {
        const [c, s] = both((m) => driftModal[d][m * P + p]!)
        driftCqc[d][p] = c
        driftSrss[d][p] = s
      }
    }
    const shear = (F: Float64Array) =>
      both((m) => {
        let s = 0
        for (let g = f; g < nf; g++) s += F[m * nf + g]!
        return s
      })[0]
    return {
      dispCqc: [dx[0], dy[0], dr[0]],
      dispSrss: [dx[1], dy[1], dr[1]],
      driftCqc,
      driftSrss,
      shearCqc: [shear(fx), shear(fy)],
    }
  })
}

const maxOf = (a: Float64Array): number => a.reduce((s, v) => Math.max(s, v), 0)

function scalePeaks(p: FloorPeaks, s: number): FloorPeaks {
  const sc = (a: Float64Array): Float64Array => a.map((v) => v * s)
  return {
    dispCqc: [p.dispCqc[0] * s, p.dispCqc[1] * s, p.dispCqc[2] * s],
    dispSrss: [p.dispSrss[0] * s, p.dispSrss[1] * s, p.dispSrss[2] * s],
    driftCqc: { x: sc(p.driftCqc.x), y: sc(p.driftCqc.y) },
    driftSrss: { x: sc(p.driftSrss.x), y: sc(p.driftSrss.y) },
    shearCqc: [p.shearCqc[0] * s, p.shearCqc[1] * s],
  }
}

function toResponse(floorId: string, p: FloorPeaks): SpectrumFloorResponse {
  return {
    floorId,
    displacementCqc: { x: p.dispCqc[0], y: p.dispCqc[1], rotation: p.dispCqc[2] },
    displacementSrss: { x: p.dispSrss[0], y: p.dispSrss[1], rotation: p.dispSrss[2] },
    driftMaxCqc: { x: maxOf(p.driftCqc.x), y: maxOf(p.driftCqc.y) },
    driftMaxSrss: { x: maxOf(p.driftSrss.x), y: maxOf(p.driftSrss.y) },
    storyShearCqc: { x: p.shearCqc[0], y: p.shearCqc[1] },
  }
}

function combinePeaks(a: FloorPeaks, b: FloorPeaks, rule: 'srss' | '100-30'): FloorPeaks {
  const c = (x: number, y: number): number => combineDirections(x, y, rule)
  const arr = (x: Float64Array, y: Float64Array): Float64Array => x.map((v, i) => c(v, y[i]!))
  return {
    dispCqc: [
      c(a.dispCqc[0], b.dispCqc[0]),
      c(a.dispCqc[1], b.dispCqc[1]),
      c(a.dispCqc[2], b.dispCqc[2]),
    ],
    dispSrss: [
      c(a.dispSrss[0], b.dispSrss[0]),
      c(a.dispSrss[1], b.dispSrss[1]),
      c(a.dispSrss[2], b.dispSrss[2]),
    ],
    driftCqc: { x: arr(a.driftCqc.x, b.driftCqc.x), y: arr(a.driftCqc.y, b.driftCqc.y) },
    driftSrss: { x: arr(a.driftSrss.x, b.driftSrss.x), y: arr(a.driftSrss.y, b.driftSrss.y) },
    shearCqc: [c(a.shearCqc[0], b.shearCqc[0]), c(a.shearCqc[1], b.shearCqc[1])],
  }
}

/**
 * Response spectrum analysis, CQC (equal modal damping = settings.damping) and SRSS over all modes,
 * the two excitation directions combined by `settings.directionCombination`.
 * Base-shear scaling (only with `settings.baseShearTarget`, N): each direction's results are scaled
 * by target / CQC base shear along that direction; `baseShear` is reported after scaling.
 * @see MODELING.md "Response spectrum"; Der Kiureghian (1981) for CQC (METHODS.md §3)
 */
export function runSpectrum(
  structure: Structure,
  modes: ModalResult,
  settings: AnalysisSettings,
): SpectrumResult {
  const zeta = settings.damping
  const count = modes.count
  const modalSa = new Float64Array(count)
  for (let m = 0; m < count; m++) {
    const T = modes.periods[m]!
    modalSa[m] = Number.isFinite(T) ? spectralAcceleration(settings.spectrum, T, zeta) : 0
  }
  const rho = cqcMatrix(modes.angularFrequencies, zeta)
  const modalBaseShear = { x: new Float64Array(count), y: new Float64Array(count) }
  const peaks = {} as Record<Dir, FloorPeaks[]>
  for (const d of ['x', 'y'] as const) {
    // Modal base shear along the excitation: Gamma_m² Sa_m g (mass-normalized shapes).
    for (let m = 0; m < count; m++) {
      modalBaseShear[d][m] = modes.participation[d][m]! ** 2 * modalSa[m]! * GRAVITY
    }
    peaks[d] = floorPeaks(structure, modes, modalPeakDisplacements(modes, d, modalSa), rho)
  }
  const baseOf = (d: Dir, cqc: boolean): number => {
    const comp = d === 'x' ? 0 : 1
    if (cqc) return peaks[d][0]?.shearCqc[comp] ?? 0
    return combineSrss(modalBaseShear[d])
  }
  const target = settings.baseShearTarget
  const scaleFor = (d: Dir): number => {
    if (target === undefined || !(target > 0)) return 1
    const v = baseOf(d, true)
    return v > 0 ? target / v : 1
  }
  const scaleByDirection = { x: scaleFor('x'), y: scaleFor('y') }
  const scaled = {
    x: peaks.x.map((p) => scalePeaks(p, scaleByDirection.x)),
    y: peaks.y.map((p) => scalePeaks(p, scaleByDirection.y)),
  }
  const rule = settings.directionCombination
  const ids = structure.floors.map((f) => f.id)
  const sx = scaleByDirection.x
  const sy = scaleByDirection.y
  return {
    spectrum: settings.spectrum,
    damping: zeta,
    modalSa,
    baseShear: {
      x: { cqc: baseOf('x', true) * sx, srss: baseOf('x', false) * sx },
      y: { cqc: baseOf('y', true) * sy, srss: baseOf('y', false) * sy },
    },
    scale: Math.max(scaleByDirection.x, scaleByDirection.y),
    scaleByDirection,
    modeCount: count,
    correlation: rho,
    modalBaseShear,
    excitationX: scaled.x.map((p, i) => toResponse(ids[i]!, p)),
    excitationY: scaled.y.map((p, i) => toResponse(ids[i]!, p)),
    combined: scaled.x.map((p, i) => toResponse(ids[i]!, combinePeaks(p, scaled.y[i]!, rule))),
    directionCombination: rule,
  }
}
