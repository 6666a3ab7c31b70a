/**
 * Response spectrum analysis: modal peak responses from a design spectrum, combined over modes by
 * CQC (SRSS beside it) and over the two horizontal excitation directions by SRSS or the 100/30
 * rule.
 * Differences (story drifts at the extreme points) are formed in each mode before combining.
 * By default every mode with T >= 0.05 s plus one residual rigid mode carrying the rest of the
 * mass is combined (100% of the mass); the 90% rule is a setting. The rising branch below T0 is
 * kept; no base-shear scaling unless `settings.baseShearTarget` is given. Accidental torsion is
 * added as static storey torques (envelope of +e and -e) in separate result fields.
 * @see MODELING.md "Response spectrum"; METHODS.md §1-§3; docs/dynamics.md §8-§9
 */
import type { AnalysisSettings } from '@/model'
import { combineCqc, combineSrss, cqcMatrix } from './cqc'
import { dominantPeriod, extremePointDrifts, verticalDistributionExponent } from './loads'
import type {
  ModalResult,
  SpectrumFloorResponse,
  SpectrumResult,
  SpectrumTorsionStory,
  StaticTorsionResult,
  Structure,
} from './results'
import { createStiffnessSolver } from './solve'
import type { StiffnessSolver } from './solve'
import { directionModalResponses, selectSpectrumModes } from './spectrumModes'
import type { DirectionModalResponses, SpectrumModeSet } from './spectrumModes'
import { accidentalTorsionLoads, peakDriftRatio } from './spectrumTorsion'

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

function floorPeaks(
  structure: Structure,
  count: number,
  u: Float64Array,
  p: Float64Array,
  rho: Float64Array,
): FloorPeaks[] {
  const nf = structure.floorCount
  const n = structure.dofCount
  // Modal floor forces (x and y components per floor): omega_m² M u_m for a mode, the residual load
  // for the residual mode (both equal K u_m).
  const fx = new Float64Array(count * nf)
  const fy = new Float64Array(count * nf)
  for (let m = 0; m < count; m++) {
    for (let f = 0; f < nf; f++) {
      fx[m * nf + f] = p[m * n + 3 * f]!
      fy[m * nf + f] = p[m * n + 3 * f + 1]!
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

/** Extra inputs of a spectrum run inside `analyzeProject`. */
export interface SpectrumExtras {
  /** Factorization of K (residual mode, accidental torsion); factored here when absent. */
  readonly solver?: StiffnessSolver
  /**
   * Static torsion result: its eccentricity fraction and ELF exponents are used for the accidental
   * torsion on spectrum results. Absent: settings.accidentalEccentricity and k from the dominant
   * period of each direction.
   */
  readonly torsion?: StaticTorsionResult | null
}

/** The per-mode data behind a SpectrumResult, for element forces (never serialized). */
export interface SpectrumDetail {
  readonly result: SpectrumResult
  readonly set: SpectrumModeSet
  readonly rho: Float64Array
  /** Unscaled modal responses per excitation direction. */
  readonly responses: { readonly x: DirectionModalResponses; readonly y: DirectionModalResponses }
  /** Base-shear scale factor per excitation direction. */
  readonly scale: { readonly x: number; readonly y: number }
  readonly rule: 'srss' | '100-30'
  /** Static displacements under the +e accidental torques (already at the scaled level), or null. */
  readonly torsionDisplacements: { readonly x: Float64Array; readonly y: Float64Array } | null
  /**
   * Combined storey shears (scaled), N: storyShear[excitation][component][floor], component 0 = x,
   * 1 = y; 'both' after the direction rule.
   */
  readonly storyShear: Readonly<Record<'x' | 'y' | 'both', readonly [Float64Array, Float64Array]>>
}

function addTorsion(structure: Structure, p: FloorPeaks, u: Float64Array, f: number): FloorPeaks {
  const cm = structure.floors[f]!.centreOfMass
  const o = 3 * f
  const tx = Math.abs(u[o]! - u[o + 2]! * cm.y)
  const ty = Math.abs(u[o + 1]! + u[o + 2]! * cm.x)
  const tr = Math.abs(u[o + 2]!)
  const dx = extremePointDrifts(structure, u, f, 'x')
  const dy = extremePointDrifts(structure, u, f, 'y')
  const plus = (a: Float64Array, b: Float64Array): Float64Array => a.map((v, k) => v + Math.abs(b[k]!))
  return {
    dispCqc: [p.dispCqc[0] + tx, p.dispCqc[1] + ty, p.dispCqc[2] + tr],
    dispSrss: [p.dispSrss[0] + tx, p.dispSrss[1] + ty, p.dispSrss[2] + tr],
    driftCqc: { x: plus(p.driftCqc.x, dx), y: plus(p.driftCqc.y, dy) },
    driftSrss: { x: plus(p.driftSrss.x, dx), y: plus(p.driftSrss.y, dy) },
    // Pure torques add no storey shear along x or y.
    shearCqc: [p.shearCqc[0], p.shearCqc[1]],
  }
}

/**
 * Response spectrum analysis, CQC (equal modal damping = settings.damping) and SRSS over the
 * response modes of `selectSpectrumModes` (by default every mode with T >= 0.05 s plus one residual
 * rigid mode, so 100% of the mass), the two excitation directions combined by
 * `settings.directionCombination`.
 * Base-shear scaling (only with `settings.baseShearTarget`, N): each direction's results are scaled
 * by target / CQC base shear along that direction; `baseShear` is reported after scaling.
 * Accidental torsion (`accidentalTorsion`): static storey torques from the ELF pattern scaled to the
 * (scaled) CQC base shear, added as the envelope of +e and -e.
 * @see MODELING.md "Response spectrum"; Der Kiureghian (1981) for CQC (METHODS.md §3);
 *   ASCE/SEI 7-16 12.9.1.1 (100% of the mass, residual mode at 0.05 s)
 */
export function runSpectrum(
  structure: Structure,
  modes: ModalResult,
  settings: AnalysisSettings,
  extras: SpectrumExtras = {},
): SpectrumResult {
  return runSpectrumDetailed(structure, modes, settings, extras).result
}

/** {@link runSpectrum} with the per-mode data used for element forces. */
export function runSpectrumDetailed(
  structure: Structure,
  modes: ModalResult,
  settings: AnalysisSettings,
  extras: SpectrumExtras = {},
): SpectrumDetail {
  const zeta = settings.damping
  const set = selectSpectrumModes(structure, modes, settings)
  const count = set.count
  const modalSa = set.saG
  let solver = extras.solver ?? null
  const getSolver = (): StiffnessSolver => {
    if (!solver) {
      const made = createStiffnessSolver(structure)
      if (!made.ok) throw new Error('[engine] runSpectrum: the stiffness is singular (a mechanism)')
      solver = made.solver
    }
    return solver
  }
  const rho = cqcMatrix(set.angularFrequencies, zeta)
  const modalBaseShear = { x: new Float64Array(count), y: new Float64Array(count) }
  const peaks = {} as Record<Dir, FloorPeaks[]>
  const responses = {} as Record<Dir, DirectionModalResponses>
  for (const d of ['x', 'y'] as const) {
    const resp = directionModalResponses(structure, set, d, getSolver())
    responses[d] = resp
    // Modal base shear along the excitation: the sum of the modal floor loads along it
    // (Gamma_m² Sa_m g for a mode with mass-normalized shapes).
    const comp = d === 'x' ? 0 : 1
    const n = structure.dofCount
    for (let m = 0; m < count; m++) {
      let v = 0
      for (let f = 0; f < structure.floorCount; f++) v += resp.loads[m * n + 3 * f + comp]!
      modalBaseShear[d][m] = v
    }
    peaks[d] = floorPeaks(structure, count, resp.displacements, resp.loads, rho)
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
  const baseShear = {
    x: { cqc: baseOf('x', true) * sx, srss: baseOf('x', false) * sx },
    y: { cqc: baseOf('y', true) * sy, srss: baseOf('y', false) * sy },
  }

  // Accidental torsion: ELF pattern scaled to the CQC base shear of each direction.
  const fraction = extras.torsion?.eccentricityFraction ?? settings.accidentalEccentricity
  const exponent = extras.torsion?.exponent ?? {
    x: verticalDistributionExponent(dominantPeriod(modes, 'x')),
    y: verticalDistributionExponent(dominantPeriod(modes, 'y')),
  }
  const torsionLoads =
    fraction > 0
      ? accidentalTorsionLoads(
          structure,
          getSolver(),
          { x: baseShear.x.cqc, y: baseShear.y.cqc },
          exponent,
          fraction,
        )
      : null
  let accidentalTorsion: SpectrumResult['accidentalTorsion']
  if (torsionLoads) {
    const tu = torsionLoads.displacements
    const withX = scaled.x.map((p, f) => addTorsion(structure, p, tu.x, f))
    const withY = scaled.y.map((p, f) => addTorsion(structure, p, tu.y, f))
    // Ratios per sign of e: the spectrum peak taken along the load at every point (common
    // practice) plus the signed static torsion drift; the sign with the larger ratio governs.
    const stories = (d: Dir, list: FloorPeaks[]): SpectrumTorsionStory[] =>
      list.map((p, f) => {
        const dt = extremePointDrifts(structure, tu[d], f, d)
        const h = structure.floors[f]!.height
        let best: ReturnType<typeof peakDriftRatio> | null = null
        let sign: 1 | -1 = 1
        for (const sg of [1, -1] as const) {
          const r = peakDriftRatio(structure, f, d, p.driftCqc[d].map((v, k) => v + sg * dt[k]!))
          if (!best || r.ratio > best.ratio) {
            best = r
            sign = sg
          }
        }
        const driftMax = p.driftCqc[d].reduce((m, v, k) => Math.max(m, v + Math.abs(dt[k]!)), 0)
        return {
          floorId: ids[f]!,
          driftMax,
          driftAvg: best!.driftAvg,
          driftRatio: best!.ratio,
          driftIndex: h > 0 ? driftMax / h : 0,
          governingSign: sign,
        }
      })
    accidentalTorsion = {
      eccentricityFraction: fraction,
      forcePattern: 'elf-scaled-to-spectrum',
      exponent: { x: exponent.x, y: exponent.y },
      forces: torsionLoads.forces,
      torques: torsionLoads.torques,
      excitationX: withX.map((p, i) => toResponse(ids[i]!, p)),
      excitationY: withY.map((p, i) => toResponse(ids[i]!, p)),
      combined: withX.map((p, i) => toResponse(ids[i]!, combinePeaks(p, withY[i]!, rule))),
      stories: { x: stories('x', scaled.x), y: stories('y', scaled.y) },
    }
  }

  const totalMassRatio = { x: responses.x.totalMassRatio, y: responses.y.totalMassRatio }
  const result: SpectrumResult = {
    spectrum: settings.spectrum,
    damping: zeta,
    modalSa,
    baseShear,
    scale: Math.max(scaleByDirection.x, scaleByDirection.y),
    scaleByDirection,
    modeCount: set.kept.length,
    correlation: rho,
    modalBaseShear,
    excitationX: scaled.x.map((p, i) => toResponse(ids[i]!, p)),
    excitationY: scaled.y.map((p, i) => toResponse(ids[i]!, p)),
    combined: scaled.x.map((p, i) => toResponse(ids[i]!, combinePeaks(p, scaled.y[i]!, rule))),
    directionCombination: rule,
    modeRule: set.rule,
    modeSource: set.source,
    modePeriods: Float64Array.from(set.kept, (m) => set.modes.periods[m]!),
    residual: set.hasResidual
      ? {
          periodS: 2 * Math.PI / set.angularFrequencies[count - 1]!,
          saG: modalSa[count - 1]!,
          massRatio: { x: responses.x.residualMassRatio, y: responses.y.residualMassRatio },
        }
      : null,
    massRatio: totalMassRatio,
    ...(accidentalTorsion ? { accidentalTorsion } : {}),
  }
  const shearArrays = (list: FloorPeaks[]): [Float64Array, Float64Array] => [
    Float64Array.from(list, (p) => p.shearCqc[0]),
    Float64Array.from(list, (p) => p.shearCqc[1]),
  ]
  const both = scaled.x.map((p, i) => combinePeaks(p, scaled.y[i]!, rule))
  const torsionDisplacements = torsionLoads ? torsionLoads.displacements : null
  return {
    result,
    set,
    rho,
    responses,
    scale: scaleByDirection,
    rule,
    torsionDisplacements,
    storyShear: { x: shearArrays(scaled.x), y: shearArrays(scaled.y), both: shearArrays(both) },
  }
}
