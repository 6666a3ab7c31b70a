/**
 * Design spectrum ordinates (spectral acceleration in g) for the spectrum kinds of the project
 * model.
 * Pure functions; periods in s, damping ratios as fractions (0.05 = 5 %).
 */
import type { SpectrumSpec } from '@/model'

/** Standard gravity, m/s² (MODELING.md "Units and axes"). */
export const GRAVITY = 9.80665

/**
 * ASCE/SEI 7-16 11.4.6 design response spectrum, g. The rising branch below T0 is kept.
 * T0 = 0.2 SD1/SDS, Ts = SD1/SDS; Sa = SDS (0.4 + 0.6 T/T0) below T0, SDS up to Ts, SD1/T up to TL,
 * SD1 TL / T² beyond. The shape is the 5 %-damped one; no damping correction is applied.
 * @see ASCE/SEI 7-16 11.4.6 (METHODS.md §1)
 */
export function asce7Ordinate(SDS: number, SD1: number, TL: number, periodS: number): number {
  if (!(SDS > 0) || !(SD1 >= 0) || !(TL > 0)) {
    throw new RangeError(`[engine] asce7 spectrum: SDS > 0, SD1 >= 0, TL > 0 required`)
  }
  const T = Math.max(0, periodS)
  const Ts = SD1 / SDS
  const T0 = 0.2 * Ts
  if (T < T0) return SDS * (0.4 + (0.6 * T) / T0)
  if (T <= Ts) return SDS
  if (T <= TL) return SD1 / T
  return (SD1 * TL) / (T * T)
}

/** EN 1998-1 Table 3.2, Type 1 recommended ground parameters (National Annexes may differ). */
export const EN1998_TYPE1_GROUND: Readonly<
  Record<'A' | 'B' | 'C' | 'D' | 'E', { S: number; TB: number; TC: number; TD: number }>
> = {
  A: { S: 1.0, TB: 0.15, TC: 0.4, TD: 2.0 },
  B: { S: 1.2, TB: 0.15, TC: 0.5, TD: 2.0 },
  C: { S: 1.15, TB: 0.2, TC: 0.6, TD: 2.0 },
  D: { S: 1.35, TB: 0.2, TC: 0.8, TD: 2.0 },
  E: { S: 1.4, TB: 0.15, TC: 0.5, TD: 2.0 },
}

/**
 * Damping correction eta = sqrt(10 / (5 + xi)) >= 0.55, xi in percent (here given as a fraction).
 * @see EN 1998-1:2004 Eq. 3.6 (METHODS.md §2)
 */
export function en1998DampingCorrection(dampingRatio: number): number {
  const xi = dampingRatio * 100
  if (!(xi > -5)) throw new RangeError(`[engine] en1998 damping: ratio must be > -0.05`)
  return Math.max(0.55, Math.sqrt(10 / (5 + xi)))
}

/**
 * EN 1998-1 3.2.2.2 horizontal elastic response spectrum Se(T)/g, Type 1 (Eqs 3.2 to 3.5).
 * The TD-branch formula (stated up to 4 s) is continued beyond 4 s; say so where it matters.
 * @param ag design ground acceleration a_g = gamma_I a_gR, in g
 * @see EN 1998-1:2004 3.2.2.2, Table 3.2 (METHODS.md §2)
 */
export function en1998Ordinate(
  ag: number,
  ground: 'A' | 'B' | 'C' | 'D' | 'E',
  dampingRatio: number,
  periodS: number,
): number {
  const p = EN1998_TYPE1_GROUND[ground]
  const eta = en1998DampingCorrection(dampingRatio)
  const T = Math.max(0, periodS)
  const plateau = 2.5 * ag * p.S * eta
  if (T <= p.TB) return ag * p.S * (1 + (T / p.TB) * (2.5 * eta - 1))
  if (T <= p.TC) return plateau
  if (T <= p.TD) return (plateau * p.TC) / T
  return (plateau * p.TC * p.TD) / (T * T)
}

/**
 * Tabulated spectrum: linear interpolation between (period, Sa) pairs sorted by period, flat beyond
 * the first and last points. No damping correction.
 */
export function tableOrdinate(
  points: readonly (readonly [number, number])[],
  periodS: number,
): number {
  const n = points.length
  if (n === 0) throw new RangeError('[engine] table spectrum: at least one point required')
  const first = points[0]!
  const last = points[n - 1]!
  if (periodS <= first[0]) return first[1]
  if (periodS >= last[0]) return last[1]
  for (let i = 1; i < n; i++) {
    const b = points[i]!
    if (periodS <= b[0]) {
      const a = points[i - 1]!
      const span = b[0] - a[0]
      if (span <= 0) return b[1]
      return a[1] + ((b[1] - a[1]) * (periodS - a[0])) / span
    }
  }
  return last[1]
}

/**
 * Spectral acceleration of a design spectrum at a period, in g.
 * @param dampingRatio used by the EN 1998-1 shape only (eta); ASCE 7 and tables are taken as given
 */
export function spectralAcceleration(
  spec: SpectrumSpec,
  periodS: number,
  dampingRatio: number,
): number {
  switch (spec.kind) {
    case 'asce7':
      return asce7Ordinate(spec.SDS, spec.SD1, spec.TL, periodS)
    case 'en1998-1':
      return en1998Ordinate(spec.ag, spec.ground, dampingRatio, periodS)
    case 'table':
      return tableOrdinate(spec.points, periodS)
    default: {
      const never: never = spec
      throw new TypeError(`[engine] unknown spectrum kind ${(never as { kind: string }).kind}`)
    }
  }
}
