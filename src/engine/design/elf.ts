/**
 * Equivalent lateral force (ELF) base shear per direction at design level: ASCE/SEI 7-16 12.8.1
 * (Cs with its upper and lower limits, T capped at Cu·Ta) or EN 1998-1 4.3.3.2 (Fb = Sd(T1)·m·λ with
 * the design spectrum of 3.2.2.5), and the floor forces it distributes.
 * @see docs/criteria.md "Design-level numbers"; METHODS.md §1, §2
 */
import type { Asce7SeismicDesign, Asce7System, En1998SeismicDesign, SeismicDesign, SpectrumSpec } from '@/model'
import { importanceFactorOf } from '@/model'
import { dominantPeriod, verticalDistribution, verticalDistributionExponent } from '../loads'
import type { Direction } from '../loads'
import type { Issue, ModalResult, Structure } from '../results'
import { EN1998_TYPE1_GROUND, GRAVITY } from '../spectra'
import type { ElfDirection } from './types'

/**
 * Coefficient for upper limit on calculated period Cu by S_D1: 1.4 at >= 0.4 g, 1.4 at 0.3, 1.5 at
 * 0.2, 1.6 at 0.15, 1.7 at <= 0.1, linear between (Table 12.8-1; values from memory).
 * @see ASCE/SEI 7-16 Table 12.8-1
 */
export function upperLimitCoefficient(SD1: number): number {
  const table: readonly (readonly [number, number])[] = [
    [0.1, 1.7],
    [0.15, 1.6],
    [0.2, 1.5],
    [0.3, 1.4],
    [0.4, 1.4],
  ]
  if (SD1 <= 0.1) return 1.7
  if (SD1 >= 0.4) return 1.4
  for (let i = 1; i < table.length; i++) {
    const [s1, c1] = table[i]!
    const [s0, c0] = table[i - 1]!
    if (SD1 <= s1) return c0 + ((c1 - c0) * (SD1 - s0)) / (s1 - s0)
  }
  return 1.4
}

/**
 * Approximate fundamental period Ta = Ct·hn^x, s (hn in m, Ct from the SI column).
 * @see ASCE/SEI 7-16 12.8.2.1, Eq. 12.8-7
 */
export function approximatePeriod(Ct: number, x: number, hn: number): number {
  return Ct * Math.max(0, hn) ** x
}

/** Which rule set Cs. */
export type CsGovernedBy = 'SDS' | 'upper-T' | 'upper-TL' | 'minimum-12.8-5' | 'minimum-12.8-6'

/**
 * Seismic response coefficient Cs and the rule that governs it:
 * Cs = SDS/(R/Ie) (12.8-2), at most SD1/(T R/Ie) for T <= TL (12.8-3) or SD1 TL/(T² R/Ie) above
 * (12.8-4), at least max(0.044 SDS Ie, 0.01) (12.8-5) and, when S1 >= 0.6 g, 0.5 S1/(R/Ie) (12.8-6).
 * Equation numbers as in 7-16 (from memory: 12.8-5 is the 0.044 floor, 12.8-6 the S1 floor).
 * @see ASCE/SEI 7-16 12.8.1.1
 */
export function seismicResponseCoefficient(input: {
  SDS: number
  SD1: number
  TL: number
  S1?: number
  R: number
  Ie: number
  T: number
}): { Cs: number; governedBy: CsGovernedBy } {
  const { SDS, SD1, TL, R, Ie, T } = input
  const rOverI = R / Ie
  let Cs = SDS / rOverI
  let governedBy: CsGovernedBy = 'SDS'
  if (T > 0) {
    const upper = T <= TL ? SD1 / (T * rOverI) : (SD1 * TL) / (T * T * rOverI)
    if (upper < Cs) {
      Cs = upper
      governedBy = T <= TL ? 'upper-T' : 'upper-TL'
    }
  }
  const min5 = Math.max(0.044 * SDS * Ie, 0.01)
  if (Cs < min5) {
    Cs = min5
    governedBy = 'minimum-12.8-5'
  }
  if (input.S1 !== undefined && input.S1 >= 0.6) {
    const min6 = (0.5 * input.S1) / rOverI
    if (Cs < min6) {
      Cs = min6
      governedBy = 'minimum-12.8-6'
    }
  }
  return { Cs, governedBy }
}

/**
 * EN 1998-1 3.2.2.5 design spectrum Sd(T)/g (Eqs 3.13 to 3.16) for the Type 1 ground parameters,
 * with beta = 0.2 (recommended lower-bound factor):
 * T <= TB: ag S [2/3 + T/TB (2.5/q - 2/3)]; TB..TC: ag S 2.5/q; TC..TD: max(ag S 2.5/q TC/T, beta ag);
 * beyond TD: max(ag S 2.5/q TC TD/T², beta ag).
 * @param ag design ground acceleration a_g (= gamma_I a_gR), g
 * @see EN 1998-1:2004 3.2.2.5(4)P
 */
export function en1998DesignOrdinate(
  ag: number,
  ground: 'A' | 'B' | 'C' | 'D' | 'E',
  q: number,
  periodS: number,
): number {
  const p = EN1998_TYPE1_GROUND[ground]
  const beta = 0.2
  const T = Math.max(0, periodS)
  const plateau = (ag * p.S * 2.5) / q
  if (T <= p.TB) return ag * p.S * (2 / 3 + (T / p.TB) * (2.5 / q - 2 / 3))
  if (T <= p.TC) return plateau
  if (T <= p.TD) return Math.max((plateau * p.TC) / T, beta * ag)
  return Math.max((plateau * p.TC * p.TD) / (T * T), beta * ag)
}

/**
 * Correction factor lambda: 0.85 when T1 <= 2 TC and the building has more than two storeys,
 * otherwise 1.0.
 * @see EN 1998-1:2004 4.3.3.2.2(1)P
 */
export function en1998Lambda(T1: number, TC: number, storeys: number): number {
  return T1 <= 2 * TC && storeys > 2 ? 0.85 : 1.0
}

const dirs: readonly Direction[] = ['x', 'y']

function asceDirection(
  structure: Structure,
  modes: ModalResult,
  design: Asce7SeismicDesign,
  spectrum: Extract<SpectrumSpec, { kind: 'asce7' }>,
  d: Direction,
): ElfDirection {
  const system: Asce7System = d === 'x' ? design.systemX : design.systemY
  const Ie = design.Ie ?? importanceFactorOf(design.riskCategory)
  const hn = structure.floors[structure.floorCount - 1]?.elevation ?? 0
  const Ta = approximatePeriod(system.Ct, system.x, hn)
  const Cu = upperLimitCoefficient(spectrum.SD1)
  const modal = dominantPeriod(modes, d)
  let T: number
  let periodReason: string
  if (!(modal > 0)) {
    T = Ta
    periodReason = 'no modal period: Ta = Ct·hn^x (12.8.2.1)'
  } else if (modal > Cu * Ta) {
    T = Cu * Ta
    periodReason = `modal ${modal.toPrecision(4)} s capped at Cu·Ta (12.8.2)`
  } else {
    T = modal
    periodReason = 'modal period (below Cu·Ta, 12.8.2)'
  }
  const { Cs, governedBy } = seismicResponseCoefficient({
    SDS: spectrum.SDS,
    SD1: spectrum.SD1,
    TL: spectrum.TL,
    ...(spectrum.S1 !== undefined ? { S1: spectrum.S1 } : {}),
    R: system.R,
    Ie,
    T,
  })
  const W = structure.totalMass * GRAVITY
  const V = Cs * W
  const k = verticalDistributionExponent(T)
  return {
    direction: d,
    modalPeriod: modal,
    approximatePeriod: Ta,
    periodCap: Cu * Ta,
    upperLimitCoefficient: Cu,
    periodUsed: T,
    periodReason,
    coefficient: Cs,
    coefficientGovernedBy: governedBy,
    lambda: null,
    exponent: k,
    seismicWeight: W,
    baseShear: V,
    forces: verticalDistribution(structure, V, k),
    factors: { R: system.R, Cd: system.Cd, Omega0: system.Omega0, Ie, q: null, ...(system.preset ? { preset: system.preset } : {}) },
  }
}

function enDirection(
  structure: Structure,
  modes: ModalResult,
  design: En1998SeismicDesign,
  spectrum: Extract<SpectrumSpec, { kind: 'en1998-1' }>,
  d: Direction,
): ElfDirection {
  const system = d === 'x' ? design.systemX : design.systemY
  const T1 = dominantPeriod(modes, d)
  const TC = EN1998_TYPE1_GROUND[spectrum.ground].TC
  const Sd = en1998DesignOrdinate(spectrum.ag, spectrum.ground, system.q, T1)
  const lambda = en1998Lambda(T1, TC, structure.floorCount)
  const W = structure.totalMass * GRAVITY
  const V = Sd * W * lambda
  return {
    direction: d,
    modalPeriod: T1,
    approximatePeriod: null,
    periodCap: null,
    upperLimitCoefficient: null,
    periodUsed: T1,
    periodReason: 'modal period T1 of the direction (4.3.3.2.2(2))',
    coefficient: Sd,
    coefficientGovernedBy: null,
    lambda,
    exponent: 1,
    seismicWeight: W,
    baseShear: V,
    // 4.3.3.2.3(3): F_i = Fb z_i m_i / sum z_j m_j, the w z^k pattern with k = 1.
    forces: verticalDistribution(structure, V, 1),
    factors: { R: null, Cd: null, Omega0: null, Ie: null, q: system.q, ...(system.preset ? { preset: system.preset } : {}) },
  }
}

/**
 * ELF base shear and forces in X and Y for the project's seismic design settings. Returns null with
 * an issue when the spectrum kind does not match the code (ASCE needs the asce7 shape, EN the
 * en1998-1 shape).
 */
export function computeElf(
  structure: Structure,
  modes: ModalResult,
  design: SeismicDesign,
  spectrum: SpectrumSpec,
): { elf: { x: ElfDirection; y: ElfDirection } | null; issues: Issue[] } {
  if (design.code === 'asce7-16') {
    if (spectrum.kind !== 'asce7') {
      return { elf: null, issues: [mismatch('settings.seismicDesign.code "asce7-16" needs settings.spectrum.kind "asce7" (SDS, SD1, TL)')] }
    }
    const [x, y] = dirs.map((d) => asceDirection(structure, modes, design, spectrum, d)) as [ElfDirection, ElfDirection]
    return { elf: { x, y }, issues: [] }
  }
  if (spectrum.kind !== 'en1998-1') {
    return { elf: null, issues: [mismatch('settings.seismicDesign.code "en1998-1" needs settings.spectrum.kind "en1998-1" (ag, ground)')] }
  }
  const [x, y] = dirs.map((d) => enDirection(structure, modes, design, spectrum, d)) as [ElfDirection, ElfDirection]
  return { elf: { x, y }, issues: [] }
}

function mismatch(message: string): Issue {
  return {
    code: 'not-applicable',
    severity: 'warning',
    message: `[engine] ${message}: no design-level numbers; drifts stay elastic (R = 1)`,
    refs: [],
  }
}
