/**
 * Torsional flexibility (first torsional period against the first translational period per
 * direction), true story stiffness under the ELF pattern at the centres of mass, the soft-story checks
 * of ASCE/SEI 7-16 Table 12.3-2 Types 1a/1b, and the consequences of irregularities by seismic design
 * category as data rows (from memory until checked).
 * @see docs/criteria.md "Torsional flexibility and soft stories"; METHODS.md §8 (Omega < 1)
 */
import type { SeismicDesignCategory } from '@/model'
import { pointDisplacement } from '../loads'
import type { ModalResult, Structure } from '../results'
import type { StiffnessSolver } from '../solve'
import type { ElfDirection, IrregularityConsequence, StoryStiffnessRow, TorsionalFlexibility } from './types'

/** A mode is mainly torsional when at least this share of its kinetic energy is rotation (common practice). */
export const TORSIONAL_SHARE = 0.5

/**
 * First mainly-torsional mode and first translational mode per direction (lowest mode with
 * torsion share below one half whose effective mass along the direction is at least that along the
 * other), their period ratio, flagged when the first mode is torsional or a ratio exceeds `limit`.
 */
export function torsionalFlexibility(modes: ModalResult, limit: number): TorsionalFlexibility {
  let tors: number | null = null
  const trans: { x: number | null; y: number | null } = { x: null, y: null }
  for (let m = 0; m < modes.count; m++) {
    const share = modes.torsionShare[m]!
    if (share >= TORSIONAL_SHARE) {
      if (tors === null) tors = m
      continue
    }
    const ex = modes.effectiveMassRatio.x[m]!
    const ey = modes.effectiveMassRatio.y[m]!
    if (trans.x === null && ex >= ey && ex > 0) trans.x = m
    if (trans.y === null && ey >= ex && ey > 0) trans.y = m
  }
  const T = (m: number | null): number | null => (m === null ? null : modes.periods[m]!)
  const ratio = (m: number | null): number | null => {
    const a = T(tors)
    const b = T(m)
    return a !== null && b !== null && b > 0 ? a / b : null
  }
  const r = { x: ratio(trans.x), y: ratio(trans.y) }
  const firstModeTorsional = modes.count > 0 && modes.torsionShare[0]! >= TORSIONAL_SHARE
  return {
    firstTorsionalMode: tors === null ? null : tors + 1,
    torsionalPeriod: T(tors),
    translationalMode: { x: trans.x === null ? null : trans.x + 1, y: trans.y === null ? null : trans.y + 1 },
    translationalPeriod: { x: T(trans.x), y: T(trans.y) },
    ratio: r,
    limit,
    firstModeTorsional,
    flagged: firstModeTorsional || (r.x !== null && r.x > limit) || (r.y !== null && r.y > limit),
  }
}

/**
 * Soft-story label from stiffnesses bottom first (index i): Type 1a when k_i < 0.70 k_(i+1) or
 * < 0.80 of the mean of the three stories above; Type 1b at 0.60 / 0.70. The mean test needs three
 * stories above.
 * @see ASCE/SEI 7-16 Table 12.3-2 Types 1a, 1b
 */
export function softStoryChecks(
  k: readonly (number | null)[],
): { ratioToAbove: number | null; ratioToAverageAbove: number | null; label: 'none' | 'Type 1a' | 'Type 1b' }[] {
  return k.map((ki, i) => {
    const above = k[i + 1] ?? null
    const ratioToAbove = ki !== null && above !== null && above > 0 ? ki / above : null
    const three = k.slice(i + 1, i + 4)
    const ratioToAverageAbove =
      ki !== null && three.length === 3 && three.every((v) => v !== null && v > 0)
        ? ki / ((three as number[]).reduce((a, b) => a + b, 0) / 3)
        : null
    const below = (r: number | null, lim: number): boolean => r !== null && r < lim
    const label = below(ratioToAbove, 0.6) || below(ratioToAverageAbove, 0.7)
      ? 'Type 1b'
      : below(ratioToAbove, 0.7) || below(ratioToAverageAbove, 0.8)
        ? 'Type 1a'
        : 'none'
    return { ratioToAbove, ratioToAverageAbove, label }
  })
}

/**
 * True story stiffness per direction: the ELF floor forces applied at the centres of mass (no
 * eccentricity), story shear divided by the drift at the story's centre of mass.
 */
export function storyStiffnessRows(
  structure: Structure,
  solver: StiffnessSolver,
  elf: { x: ElfDirection; y: ElfDirection },
): StoryStiffnessRow[] {
  const n = structure.floorCount
  const out: StoryStiffnessRow[] = []
  for (const d of ['x', 'y'] as const) {
    const F = elf[d].forces
    const rhs = new Float64Array(3 * n)
    structure.floors.forEach((f, i) => {
      const Fi = F[i] ?? 0
      if (d === 'x') {
        rhs[3 * i] = Fi
        rhs[3 * i + 2] = -f.centreOfMass.y * Fi
      } else {
        rhs[3 * i + 1] = Fi
        rhs[3 * i + 2] = f.centreOfMass.x * Fi
      }
    })
    const u = solver.solve(rhs)
    const shears = new Float64Array(n)
    let V = 0
    for (let i = n - 1; i >= 0; i--) {
      V += F[i] ?? 0
      shears[i] = V
    }
    const drifts = structure.floors.map((f, i) => {
      const cm = f.centreOfMass
      return pointDisplacement(u, i, cm, d) - pointDisplacement(u, i - 1, cm, d)
    })
    const k = drifts.map((dr, i) => (dr > 0 && shears[i]! > 0 ? shears[i]! / dr : null))
    const checks = softStoryChecks(k)
    structure.floors.forEach((f, i) => {
      out.push({
        floorId: f.id,
        direction: d,
        storyShear: shears[i]!,
        driftAtCentreOfMass: drifts[i]!,
        stiffness: k[i] ?? null,
        ...checks[i]!,
      })
    })
  }
  return out
}

const CONSEQUENCES: readonly Omit<IrregularityConsequence, 'found' | 'applies'>[] = [
  { irregularity: 'Horizontal Type 1b', clause: 'ASCE/SEI 7-16 12.3.3.1', categories: ['E', 'F'], consequence: 'not permitted', source: 'from memory' },
  { irregularity: 'Horizontal Type 1a or 1b', clause: 'ASCE/SEI 7-16 12.8.4.3', categories: ['C', 'D', 'E', 'F'], consequence: 'accidental torsion amplified by Ax', source: 'from memory' },
  { irregularity: 'Horizontal Type 1a or 1b', clause: 'ASCE/SEI 7-16 12.3.3.4', categories: ['D', 'E', 'F'], consequence: 'diaphragm connection and collector forces increased by 25 %', source: 'from memory' },
  { irregularity: 'Horizontal Type 1b', clause: 'ASCE/SEI 7-16 12.3.4.2', categories: ['D', 'E', 'F'], consequence: 'redundancy factor 1.0 not available by condition (a); rho = 1.3 unless condition (b) is met', source: 'from memory' },
  { irregularity: 'Horizontal Type 1a or 1b', clause: 'ASCE/SEI 7-16 Table 12.6-1', categories: ['D', 'E', 'F'], consequence: 'ELF not permitted: modal response spectrum or response history analysis', source: 'from memory' },
  { irregularity: 'Horizontal Type 1a or 1b', clause: 'ASCE/SEI 7-16 12.8.6', categories: ['C', 'D', 'E', 'F'], consequence: 'story drift taken as the largest difference at the edges, not at the centre of mass', source: 'from memory' },
  { irregularity: 'Vertical Type 1b', clause: 'ASCE/SEI 7-16 12.3.3.1', categories: ['E', 'F'], consequence: 'not permitted', source: 'from memory' },
  { irregularity: 'Vertical Type 1a or 1b', clause: 'ASCE/SEI 7-16 Table 12.6-1', categories: ['D', 'E', 'F'], consequence: 'ELF not permitted: modal response spectrum or response history analysis', source: 'from memory' },
]

/**
 * Consequence rows, each marked whether its irregularity was found and (with a design category)
 * whether it applies.
 */
export function irregularityConsequences(
  found: { horizontal1a: boolean; horizontal1b: boolean; vertical1a: boolean; vertical1b: boolean },
  category: SeismicDesignCategory | undefined,
): IrregularityConsequence[] {
  return CONSEQUENCES.map((c) => {
    const horizontal = c.irregularity.startsWith('Horizontal')
    const onlyB = !c.irregularity.includes('1a')
    const isFound = horizontal
      ? found.horizontal1b || (!onlyB && found.horizontal1a)
      : found.vertical1b || (!onlyB && found.vertical1a)
    return {
      ...c,
      found: isFound,
      applies: category === undefined ? null : isFound && c.categories.includes(category),
    }
  })
}
