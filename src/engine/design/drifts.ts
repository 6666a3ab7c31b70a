/**
 * Design drifts and their limits, and the P-delta stability coefficient per story:
 * ASCE/SEI 7-16 12.8.6 (delta = Cd delta_e / Ie), Table 12.12-1 (allowable drift by risk category),
 * 12.8.7 (theta = Px Delta Ie / (Vx hsx Cd) <= theta_max = 0.5/(beta Cd) <= 0.25);
 * EN 1998-1 4.3.4 (d_s = q d_e), 4.4.3.2 (d_r nu <= 0.005 h / 0.0075 h / 0.010 h),
 * 4.4.2.2 (theta = Ptot d_r / (Vtot h); <= 0.1 ignore, 0.1..0.2 amplify by 1/(1 - theta), <= 0.3).
 * @see METHODS.md §1 (Table 12.12-1 and 12.8.6), docs/criteria.md "Design-level numbers"
 */
import type { Asce7DriftRow, RiskCategory, SeismicDesign } from '@/model'
import { damageLimitationNuOf } from '@/model'
import { pointDisplacement } from '../loads'
import type { StaticTorsionResult, Structure } from '../results'
import { GRAVITY } from '../spectra'
import type { DesignDriftRow, ElfDirection, StabilityRow } from './types'

/**
 * Allowable story drift ratio Delta_a / hsx of ASCE/SEI 7-16 Table 12.12-1 by structure row and
 * risk category (METHODS.md §1).
 */
export function allowableDriftRatio(row: Asce7DriftRow, category: RiskCategory): number {
  const col = category === 'IV' ? 2 : category === 'III' ? 1 : 0
  const table: Record<Asce7DriftRow, readonly [number, number, number]> = {
    other: [0.02, 0.015, 0.01],
    'low-rise': [0.025, 0.02, 0.015],
    'masonry-cantilever': [0.01, 0.01, 0.01],
    'masonry-other': [0.007, 0.007, 0.007],
  }
  return table[row][col]
}

/** EN 1998-1 4.4.3.2(1) limit factor alpha of d_r nu <= alpha h by non-structural type. */
export function damageLimitationFactor(kind: 'brittle' | 'ductile' | 'none'): number {
  return kind === 'brittle' ? 0.005 : kind === 'ductile' ? 0.0075 : 0.01
}

/** Design drift multiplier on elastic drifts in one direction: Cd/Ie (ASCE) or q (EN). */
export function driftMultiplier(design: SeismicDesign, elf: ElfDirection): number {
  if (design.code === 'asce7-16') return (elf.factors.Cd ?? 1) / (elf.factors.Ie ?? 1)
  return elf.factors.q ?? 1
}

/** Design drift limit of a story of height h, m, and the clause. */
export function driftLimit(design: SeismicDesign, h: number): { limit: number; clause: string } {
  if (design.code === 'asce7-16') {
    const ratio = allowableDriftRatio(design.driftRow ?? 'other', design.riskCategory)
    return { limit: ratio * h, clause: `ASCE/SEI 7-16 12.8.6, Table 12.12-1 (${ratio} hsx)` }
  }
  const alpha = damageLimitationFactor(design.nonStructural ?? 'brittle')
  const nu = design.nu ?? damageLimitationNuOf(design.importanceClass)
  return { limit: (alpha * h) / nu, clause: `EN 1998-1 4.4.3.2 (d_r·${nu} <= ${alpha} h)` }
}

/**
 * Design drift rows of every story in every static case, from the drifts at the extreme points under
 * the design ELF forces (accidental torsion with Ax = 1).
 */
export function designDriftRows(
  structure: Structure,
  design: SeismicDesign,
  elf: { x: ElfDirection; y: ElfDirection },
  torsion: StaticTorsionResult,
): DesignDriftRow[] {
  return torsion.cases.flatMap((c) =>
    c.stories.map((row) => {
      const h = structure.floors[row.index]!.height
      const designDrift = driftMultiplier(design, elf[c.direction]) * row.driftMax
      const { limit, clause } = driftLimit(design, h)
      return {
        floorId: row.floorId,
        caseId: c.id,
        elasticDrift: row.driftMax,
        designDrift,
        height: h,
        driftIndex: h > 0 ? designDrift / h : 0,
        limit,
        verdict: designDrift <= limit ? ('pass' as const) : ('fail' as const),
        clause,
      }
    }),
  )
}

/**
 * Stability coefficient per story and direction, the larger of the two eccentric cases. P is the
 * gravity load on and above the story, taken as `gravityLoadRatio` times the seismic weight above
 * (1 unless the user gives another ratio); V the ELF story shear; the drift is the design drift at
 * the story's centre of mass.
 */
export function stabilityRows(
  structure: Structure,
  design: SeismicDesign,
  elf: { x: ElfDirection; y: ElfDirection },
  torsion: StaticTorsionResult,
): StabilityRow[] {
  const ratio = design.gravityLoadRatio ?? 1
  const n = structure.floorCount
  const out: StabilityRow[] = []
  for (const d of ['x', 'y'] as const) {
    const forces = elf[d].forces
    const mult = driftMultiplier(design, elf[d])
    const cases = torsion.cases.filter((c) => c.direction === d)
    let P = 0
    let V = 0
    const rows: StabilityRow[] = []
    for (let i = n - 1; i >= 0; i--) {
      const floor = structure.floors[i]!
      P += ratio * floor.mass * GRAVITY
      V += forces[i] ?? 0
      const cm = floor.centreOfMass
      let elastic = 0
      for (const c of cases) {
        const u = c.displacements
        elastic = Math.max(elastic, Math.abs(pointDisplacement(u, i, cm, d) - pointDisplacement(u, i - 1, cm, d)))
      }
      const h = floor.height
      const designDrift = mult * elastic
      rows.push(stabilityRow(design, elf[d], floor.id, d, P, V, designDrift, h))
    }
    out.push(...rows.reverse())
  }
  return out
}

/** One stability row from its inputs (exported for hand checks). */
export function stabilityRow(
  design: SeismicDesign,
  elf: ElfDirection,
  floorId: string,
  direction: 'x' | 'y',
  P: number,
  V: number,
  designDrift: number,
  h: number,
): StabilityRow {
  const base = { floorId, direction, gravityLoad: P, storyShear: V, designDrift, height: h }
  if (design.code === 'asce7-16') {
    const Cd = elf.factors.Cd ?? 1
    const Ie = elf.factors.Ie ?? 1
    const beta = design.stabilityBeta ?? 1
    const theta = V > 0 && h > 0 ? (P * designDrift * Ie) / (V * h * Cd) : 0
    const thetaMax = Math.min(0.25, 0.5 / (beta * Cd))
    const ok = theta <= thetaMax
    return {
      ...base,
      theta,
      thetaMax,
      amplifier: theta > 0.1 && theta < 1 ? 1 / (1 - theta) : 1,
      verdict: ok ? 'pass' : 'fail',
      note: !ok
        ? 'theta > theta_max: potentially unstable, redesign (12.8.7)'
        : theta <= 0.1
          ? 'theta <= 0.10: P-delta effects need not be considered (12.8.7)'
          : 'theta > 0.10: increase drifts and element forces by 1/(1 - theta) (12.8.7)',
      clause: `ASCE/SEI 7-16 12.8.7, Eqs 12.8-16/12.8-17 (beta = ${beta})`,
    }
  }
  const theta = V > 0 && h > 0 ? (P * designDrift) / (V * h) : 0
  const ok = theta <= 0.3
  return {
    ...base,
    theta,
    thetaMax: 0.3,
    amplifier: theta > 0.1 && theta <= 0.2 ? 1 / (1 - theta) : 1,
    verdict: ok ? 'pass' : 'fail',
    note: !ok
      ? 'theta > 0.3: not permitted (4.4.2.2(4))'
      : theta <= 0.1
        ? 'theta <= 0.10: second-order effects need not be taken into account (4.4.2.2(2))'
        : theta <= 0.2
          ? '0.1 < theta <= 0.2: multiply seismic action effects by 1/(1 - theta) (4.4.2.2(3))'
          : '0.2 < theta <= 0.3: a second-order analysis is needed (from memory)',
    clause: 'EN 1998-1:2004 4.4.2.2, Eq. 4.28',
  }
}
