/**
 * Accidental torsion for response spectrum results: static floor torques T_i = F_i e_i, with F_i the
 * ELF vertical distribution (w_i z_i^k) scaled to the spectrum's base shear in that direction and
 * e_i = fraction x the floor's plan extent perpendicular to the load; the static response to them is
 * added to the spectrum peaks as the envelope of +e and -e (peak + |static|).
 * @see ASCE/SEI 7-16 12.9.1.5 and 12.8.4.2 (from memory; METHODS.md §1); EN 1998-1 4.3.3.3.3
 *   (static storey torques in modal analysis, from memory); docs/dynamics.md §9
 */
import { endPointGroups, TORSION_RATIO_CAP, verticalDistribution } from './loads'
import type { Structure } from './results'
import type { StiffnessSolver } from './solve'

/** Static accidental-torsion response per load direction (the +e sign). */
export interface AccidentalTorsionLoads {
  /** Floor forces of the pattern, N (sum = the spectrum base shear along the direction). */
  readonly forces: { readonly x: Float64Array; readonly y: Float64Array }
  /** Floor torques of the +e case, N·m (counter-clockwise positive). */
  readonly torques: { readonly x: Float64Array; readonly y: Float64Array }
  /** Displacements under the torques alone, global order at O, m and rad. */
  readonly displacements: { readonly x: Float64Array; readonly y: Float64Array }
}

/**
 * Floor torques of the +e case and the displacements they cause. A force F along x moved by
 * +e towards +y gives the torque -e F; along y moved by +e towards +x it gives +e F (the same
 * convention as the static cases X+e, Y+e).
 * @param baseShear spectrum base shear per direction, N
 * @param exponent k of the ELF distribution per direction (ASCE/SEI 7-16 12.8.3)
 * @param fraction accidental eccentricity as a fraction of the perpendicular plan extent, -
 */
export function accidentalTorsionLoads(
  structure: Structure,
  solver: StiffnessSolver,
  baseShear: { readonly x: number; readonly y: number },
  exponent: { readonly x: number; readonly y: number },
  fraction: number,
): AccidentalTorsionLoads {
  const n = structure.dofCount
  const one = (d: 'x' | 'y') => {
    const forces = verticalDistribution(structure, baseShear[d], exponent[d])
    const torques = new Float64Array(structure.floorCount)
    const rhs = new Float64Array(n)
    structure.floors.forEach((f, i) => {
      const e = f.extent
      const t =
        d === 'x'
          ? -fraction * (e.maxY - e.minY) * forces[i]!
          : fraction * (e.maxX - e.minX) * forces[i]!
      torques[i] = t
      rhs[3 * i + 2] = t
    })
    return { forces, torques, displacements: solver.solve(rhs) }
  }
  const x = one('x')
  const y = one('y')
  return {
    forces: { x: x.forces, y: y.forces },
    torques: { x: x.torques, y: y.torques },
    displacements: { x: x.displacements, y: y.displacements },
  }
}

/** Drift ratio of one storey from peak drifts at the extreme points (all >= 0). */
export interface PeakDriftRatio {
  /** Largest peak drift over the extreme points, m. */
  readonly driftMax: number
  /** Mean of the two ends' mean peak drifts, m. */
  readonly driftAvg: number
  /** driftMax / driftAvg, capped at TORSION_RATIO_CAP; 1 when all drifts are 0. */
  readonly ratio: number
}

/** Max/avg ratio of peak drifts at the extreme points of a floor along `direction`. */
export function peakDriftRatio(
  structure: Structure,
  floorIndex: number,
  direction: 'x' | 'y',
  drifts: ArrayLike<number>,
): PeakDriftRatio {
  const floor = structure.floors[floorIndex]!
  const ends = endPointGroups(floor, direction)
  let max = 0
  for (let k = 0; k < drifts.length; k++) max = Math.max(max, drifts[k]!)
  if (max === 0 || ends.low.length === 0) return { driftMax: max, driftAvg: 0, ratio: 1 }
  const mean = (idx: number[]): number => idx.reduce((s, k) => s + drifts[k]!, 0) / idx.length
  const avg = (mean(ends.low) + mean(ends.high)) / 2
  const ratio = avg > 0 ? Math.min(TORSION_RATIO_CAP, max / avg) : TORSION_RATIO_CAP
  return { driftMax: max, driftAvg: avg, ratio }
}
