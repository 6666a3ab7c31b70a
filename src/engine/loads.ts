/**
 * Equivalent static loads with accidental torsion: floor forces ∝ w_i z_i^k, four cases X±e,
 * Y±e, story drifts and floor displacements at the extreme points, their max/avg ratios, the drift
 * index, amplification where the criterion set defines one, and the criterion evaluation.
 * @see MODELING.md "Equivalent static loads with accidental torsion"; ASCE/SEI 7-16 12.8.3 (k)
 */
import type { AnalysisSettings, CriterionSetSpec, Point } from '@/model'
import { amplificationFactor, buildEvaluation, torsionCheckRows } from './criteria'
import type { TorsionCheckInput } from './criteria'
import type {
  FloorProps,
  ModalResult,
  StaticCaseId,
  StaticLoadCase,
  StaticTorsionResult,
  StoryTorsionRow,
  Structure,
} from './results'
import type { StiffnessSolver } from './solve'
import { GRAVITY, spectralAcceleration } from './spectra'

export type Direction = 'x' | 'y'

/**
 * Exponent k of the vertical distribution: 1 for T <= 0.5 s, 2 for T >= 2.5 s, linear between
 * (k = 1 + (T - 0.5)/2).
 * @see ASCE/SEI 7-16 12.8.3 (METHODS.md §1)
 */
export function verticalDistributionExponent(periodS: number): number {
  if (!(periodS > 0.5)) return 1
  if (periodS >= 2.5) return 2
  return 1 + (periodS - 0.5) / 2
}

/**
 * Period of the mode with the largest effective mass ratio along a direction, s (0 if no modes).
 */
export function dominantPeriod(modes: ModalResult, direction: Direction): number {
  const ratios = modes.effectiveMassRatio[direction]
  let best = -1
  let period = 0
  for (let m = 0; m < modes.count; m++) {
    const r = ratios[m]!
    if (r > best) {
      best = r
      period = modes.periods[m]!
    }
  }
  return period
}

/**
 * Displacement along `direction` of a plan point of floor `floorIndex` (0-based) from the global
 * vector at O: u_x - theta*y or u_y + theta*x, m. Floor -1 is the base (0).
 */
export function pointDisplacement(
  u: ArrayLike<number>,
  floorIndex: number,
  p: Point,
  direction: Direction,
): number {
  if (floorIndex < 0) return 0
  const o = 3 * floorIndex
  const theta = u[o + 2]!
  return direction === 'x' ? u[o]! - theta * p.y : u[o + 1]! + theta * p.x
}

/**
 * Signed story drifts of story `floorIndex` along `direction` at each extreme point of that floor:
 * the floor's displacement there minus that of the floor below at the same plan point, m.
 */
export function extremePointDrifts(
  structure: Structure,
  u: ArrayLike<number>,
  floorIndex: number,
  direction: Direction,
): Float64Array {
  const pts = structure.floors[floorIndex]!.extremePoints
  const out = new Float64Array(pts.length)
  pts.forEach((p, k) => {
    out[k] =
      pointDisplacement(u, floorIndex, p, direction) -
      pointDisplacement(u, floorIndex - 1, p, direction)
  })
  return out
}

/**
 * Indices of the extreme points at the two ends across a load along `direction`: the points of
 * least and of greatest coordinate perpendicular to it (ties within 1e-9 of the extent all belong
 * to the end).
 */
export function endPointGroups(
  floor: FloorProps,
  direction: Direction,
): { low: number[]; high: number[] } {
  const coord = (p: Point): number => (direction === 'x' ? p.y : p.x)
  const pts = floor.extremePoints
  if (pts.length === 0) return { low: [], high: [] }
  let lo = Infinity
  let hi = -Infinity
  for (const p of pts) {
    lo = Math.min(lo, coord(p))
    hi = Math.max(hi, coord(p))
  }
  const tol = 1e-9 * Math.max(1, hi - lo)
  const low: number[] = []
  const high: number[] = []
  pts.forEach((p, k) => {
    if (coord(p) <= lo + tol) low.push(k)
    if (coord(p) >= hi - tol) high.push(k)
  })
  return { low, high }
}

/**
 * Largest max/avg ratio reported. A story whose end average vanishes or reverses (it mostly twists)
 * gets this value instead of an unbounded one, so results stay finite and serializable.
 */
export const TORSION_RATIO_CAP = 1000

/** Largest value, mean of the two end means, their ratio (capped; 1 if all values are 0). */
function maxAvg(
  values: Float64Array,
  ends: { low: number[]; high: number[] },
): [number, number, number] {
  if (values.length === 0) return [0, 0, 1]
  let max = -Infinity
  let scale = 0
  for (const v of values) {
    max = Math.max(max, v)
    scale = Math.max(scale, Math.abs(v))
  }
  const mean = (idx: number[]): number => idx.reduce((s, k) => s + values[k]!, 0) / idx.length
  const avg = (mean(ends.low) + mean(ends.high)) / 2
  if (scale === 0) return [0, 0, 1]
  // A vanishing or reversed average means the story mostly twists: report the cap.
  const ratio = avg > 0 ? Math.min(TORSION_RATIO_CAP, max / avg) : TORSION_RATIO_CAP
  return [max, avg, ratio]
}

/**
 * Per-story torsion rows of one displacement vector under a load along `direction`.
 * @param set criterion set whose amplification rule (if any) is applied to the displacement ratio
 */
export function storyTorsionRows(
  structure: Structure,
  u: ArrayLike<number>,
  direction: Direction,
  set: CriterionSetSpec | null,
): StoryTorsionRow[] {
  return structure.floors.map((floor, i) => {
    const ends = endPointGroups(floor, direction)
    const drifts = extremePointDrifts(structure, u, i, direction)
    const disp = new Float64Array(floor.extremePoints.length)
    floor.extremePoints.forEach((p, k) => {
      disp[k] = pointDisplacement(u, i, p, direction)
    })
    const [driftMax, driftAvg, driftRatio] = maxAvg(drifts, ends)
    const [displacementMax, displacementAvg, displacementRatio] = maxAvg(disp, ends)
    const amplification = set?.amplification
      ? amplificationFactor(displacementRatio, set.amplification)
      : null
    return {
      floorId: floor.id,
      index: i,
      driftMax,
      driftAvg,
      driftRatio,
      displacementMax,
      displacementAvg,
      displacementRatio,
      amplification,
      driftIndex: floor.height > 0 ? driftMax / floor.height : 0,
    }
  })
}

/**
 * Accidental eccentricity fraction: the criterion set's own value when it prescribes one (its
 * checks are calibrated on it), otherwise `settings.accidentalEccentricity`.
 */
export function eccentricityFraction(
  settings: AnalysisSettings,
  set: CriterionSetSpec | null,
): { fraction: number; source: 'criterion-set' | 'settings' } {
  if (set?.accidentalEccentricity !== undefined) {
    return { fraction: set.accidentalEccentricity, source: 'criterion-set' }
  }
  return { fraction: settings.accidentalEccentricity, source: 'settings' }
}

/**
 * Why max/avg cannot be formed on a floor for a load along `direction`: its extreme points have no
 * width across the load (a single point mass, no slab outline), so "max" and "average" are one value.
 */
export function uncheckableReason(floor: FloorProps | undefined, direction: Direction): string | null {
  if (!floor || floor.extremePoints.length === 0) return 'the floor has no extreme points (no slab outline)'
  const e = floor.extent
  const width = direction === 'x' ? e.maxY - e.minY : e.maxX - e.minX
  const size = Math.max(Math.abs(e.maxX), Math.abs(e.minX), Math.abs(e.maxY), Math.abs(e.minY), 1)
  if (!(width > 1e-9 * size)) {
    return `the floor has no plan extent across a load along ${direction} (no slab outline)`
  }
  return null
}

const CASES: readonly { id: StaticCaseId; direction: Direction; sign: 1 | -1 }[] = [
  { id: 'X+e', direction: 'x', sign: 1 },
  { id: 'X-e', direction: 'x', sign: -1 },
  { id: 'Y+e', direction: 'y', sign: 1 },
  { id: 'Y-e', direction: 'y', sign: -1 },
]

/**
 * Floor forces F_i = V w_i z_i^k / sum_j w_j z_j^k along one direction, N (w_i = m_i g, z_i the
 * elevation).
 * @see ASCE/SEI 7-16 12.8.3, Eqs 12.8-11/12.8-12 (METHODS.md §1)
 */
export function verticalDistribution(
  structure: Structure,
  baseShear: number,
  exponent: number,
): Float64Array {
  const weights = structure.floors.map(
    (f) => f.mass * GRAVITY * Math.max(0, f.elevation) ** exponent,
  )
  const total = weights.reduce((a, b) => a + b, 0)
  return Float64Array.from(weights, (w) => (total > 0 ? (baseShear * w) / total : 0))
}

/**
 * Design loading that replaces the elastic default of `runStaticTorsion`: per direction the ELF base
 * shear and its floor forces, and per case optional accidental-torsion amplifiers per floor (Ax,
 * multiplying the eccentricity).
 */
export interface StaticLoading {
  readonly x?: { periodUsed: number; exponent: number; coefficient: number; baseShear: number; forces: Float64Array }
  readonly y?: { periodUsed: number; exponent: number; coefficient: number; baseShear: number; forces: Float64Array }
  readonly amplifiers?: Partial<Record<StaticCaseId, ArrayLike<number>>>
}

/**
 * The four equivalent static cases with accidental torsion, drift ratios and criterion checks.
 *
 * Base shear: V = C W with W = total weight and C = Sa(T) of the project spectrum at the dominant
 * period of that direction, with R = 1 (elastic); if that ordinate is not positive, C = 1. The
 * ratios, the drift index divided by V, and the verdicts do not depend on V. With `loading` (the
 * design ELF forces, src/engine/design) V, T, k and the forces are those given instead.
 * Load points: CM of each floor moved by ± fraction × the floor's own extent perpendicular to the
 * load (X+e towards +y, Y+e towards +x).
 */
export function runStaticTorsion(
  structure: Structure,
  solver: StiffnessSolver,
  modes: ModalResult,
  settings: AnalysisSettings,
  set: CriterionSetSpec | null,
  loading?: StaticLoading,
): StaticTorsionResult {
  const n = structure.floorCount
  const { fraction, source } = eccentricityFraction(settings, set)
  const W = structure.totalMass * GRAVITY
  type DirectionLoads = { T: number; k: number; C: number; V: number; forces: Float64Array }
  const perDir = (d: Direction): DirectionLoads => {
    const given = loading?.[d]
    if (given) return { T: given.periodUsed, k: given.exponent, C: given.coefficient, V: given.baseShear, forces: given.forces }
    const T = dominantPeriod(modes, d)
    const k = verticalDistributionExponent(T)
    const sa = spectralAcceleration(settings.spectrum, T, settings.damping)
    const C = Number.isFinite(sa) && sa > 0 ? sa : 1
    const V = C * W
    return { T, k, C, V, forces: verticalDistribution(structure, V, k) }
  }
  const dirs = { x: perDir('x'), y: perDir('y') }

  const cases: StaticLoadCase[] = CASES.map(({ id, direction, sign }) => {
    const { forces } = dirs[direction]
    const rhs = new Float64Array(3 * n)
    const amplifier = loading?.amplifiers?.[id]
    const loadPoints: Point[] = structure.floors.map((f, i) => {
      const cm = f.centreOfMass
      const e = f.extent
      const a = fraction * (amplifier?.[i] ?? 1)
      const p =
        direction === 'x'
          ? { x: cm.x, y: cm.y + sign * a * (e.maxY - e.minY) }
          : { x: cm.x + sign * a * (e.maxX - e.minX), y: cm.y }
      const F = forces[i]!
      // Force through p, moment about O: x*Fy - y*Fx.
      if (direction === 'x') {
        rhs[3 * i] = F
        rhs[3 * i + 2] = -p.y * F
      } else {
        rhs[3 * i + 1] = F
        rhs[3 * i + 2] = p.x * F
      }
      return p
    })
    const displacements = solver.solve(rhs)
    return {
      id,
      direction,
      eccentricitySign: sign,
      forces,
      loadPoints,
      displacements,
      stories: storyTorsionRows(structure, displacements, direction, set),
    }
  })

  const inputs: TorsionCheckInput[] = cases.flatMap((c) =>
    c.stories.map((row) => {
      const why = uncheckableReason(structure.floors[row.index], c.direction)
      return why ? { caseId: c.id, row, notCheckable: why } : { caseId: c.id, row }
    }),
  )
  const criterion = buildEvaluation(set, set ? torsionCheckRows(set, inputs) : [])
  return {
    periodUsed: { x: dirs.x.T, y: dirs.y.T },
    exponent: { x: dirs.x.k, y: dirs.y.k },
    baseShear: { x: dirs.x.V, y: dirs.y.V },
    eccentricityFraction: fraction,
    eccentricitySource: source,
    baseShearCoefficient: { x: dirs.x.C, y: dirs.y.C },
    cases,
    criterion,
  }
}
