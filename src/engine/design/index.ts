/**
 * Design-level numbers beside the verdicts: ELF base shear per direction, design drifts and limits,
 * stability coefficient, amplified accidental torsion, spectrum scaling to ELF, torsional flexibility,
 * story stiffness and soft-story checks. Run by analyzeProject when settings.seismicDesign is given.
 * @see docs/criteria.md "Design-level numbers"; docs/results-format.md "design"
 */
import { CAUTION, DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT } from '@/model'
import type { AnalysisSettings, CriterionSetSpec, SeismicDesign } from '@/model'
import type { StaticLoading } from '../loads'
import type { ModalResult, SpectrumResult, StaticTorsionResult, Structure } from '../results'
import type { StiffnessSolver } from '../solve'
import { iterateAmplification } from './amplify'
import { designDriftRows, driftMultiplier, stabilityRows } from './drifts'
import { irregularityConsequences, storyStiffnessRows, torsionalFlexibility } from './flexibility'
import { scaleSpectrumToElf } from './spectrumScaling'
import type { DesignResult, ElfDirection } from './types'

export { computeElf } from './elf'
export type { DesignResult } from './types'

/** The ELF loading for runStaticTorsion. */
export function elfLoading(elf: { x: ElfDirection; y: ElfDirection }): StaticLoading {
  const of = (e: ElfDirection): NonNullable<StaticLoading['x']> => ({
    periodUsed: e.periodUsed,
    exponent: e.exponent,
    // V / W (for EN this includes lambda, so it is not Sd alone).
    coefficient: e.seismicWeight > 0 ? e.baseShear / e.seismicWeight : e.coefficient,
    baseShear: e.baseShear,
    forces: e.forces,
  })
  return { x: of(elf.x), y: of(elf.y) }
}

/**
 * Everything design-level after the static cases (run with the ELF loading) and the spectrum.
 * @param torsion static cases under the ELF forces with Ax = 1
 */
export function runDesign(input: {
  structure: Structure
  solver: StiffnessSolver
  modes: ModalResult
  settings: AnalysisSettings
  set: CriterionSetSpec | null
  design: SeismicDesign
  elf: { x: ElfDirection; y: ElfDirection }
  torsion: StaticTorsionResult
  spectrum: SpectrumResult | null
}): DesignResult {
  const { structure, solver, modes, settings, set, design, elf, torsion, spectrum } = input
  const multiplier = { x: driftMultiplier(design, elf.x), y: driftMultiplier(design, elf.y) }
  const amplified = iterateAmplification(structure, solver, modes, settings, set, elfLoading(elf), torsion, multiplier)
  const storyStiffness = storyStiffnessRows(structure, solver, elf)
  const failed = (label: string): boolean =>
    torsion.criterion.rows.some((r) => r.verdict === 'fail' && r.clause.includes(label))
  const consequences =
    design.code === 'asce7-16'
      ? irregularityConsequences(
          {
            horizontal1a: failed('Type 1a'),
            horizontal1b: failed('Type 1b'),
            vertical1a: storyStiffness.some((r) => r.label !== 'none'),
            vertical1b: storyStiffness.some((r) => r.label === 'Type 1b'),
          },
          design.designCategory,
        )
      : []
  const gravityLoadRatio = design.gravityLoadRatio ?? 1
  const notes =
    design.code === 'asce7-16'
      ? [
          'Design drifts delta = Cd delta_e / Ie (12.8.6) at the extreme points of each floor, accidental torsion with Ax = 1.',
          `P for the stability coefficient: ${gravityLoadRatio} x the seismic weight on and above the story (the seismic weight is used as the gravity load unless settings.seismicDesign.gravityLoadRatio says otherwise).`,
          '12.8.6 takes drifts at the centres of mass unless Type 1a/1b applies in SDC C-F; the extreme points used here are the more demanding reading.',
          'Moment frames in SDC D-F check Delta_a / rho (12.12.1.1, from memory): not applied here.',
          'Cs limits of 12.8.1.3 (Ss cap for regular short buildings) are not applied.',
          'Preset system values (Table 12.2-1, Table 12.8-2) are from memory until checked.',
        ]
      : [
          'Design drifts d_s = q d_e (4.3.4, q_d = q) at the extreme points; damage limitation compares d_r nu with alpha h (4.4.3.2).',
          `P for the stability coefficient: ${gravityLoadRatio} x the seismic weight on and above the storey (the seismic weight is used as the gravity load unless settings.seismicDesign.gravityLoadRatio says otherwise).`,
          'The spectrum a_g already includes gamma_I; no further importance factor is applied.',
          'The lateral force method needs T1 <= min(4 TC, 2.0 s) and regularity in elevation (4.3.3.2.1); not checked here.',
        ]
  return {
    code: design.code,
    x: elf.x,
    y: elf.y,
    gravityLoadRatio,
    drifts: designDriftRows(structure, design, elf, torsion),
    driftRule:
      design.code === 'asce7-16'
        ? 'delta = Cd delta_e / Ie (ASCE/SEI 7-16 Eq. 12.8-15)'
        : 'd_s = q d_e (EN 1998-1 Eq. 4.23)',
    stability: stabilityRows(structure, design, elf, torsion),
    amplified: amplified?.cases ?? null,
    spectrumScaling: spectrum ? scaleSpectrumToElf(structure, design, elf, spectrum) : null,
    torsionalFlexibility: torsionalFlexibility(
      modes,
      settings.torsionalFlexibilityLimit ?? DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT,
    ),
    storyStiffness,
    consequences,
    notes,
    caution: CAUTION,
  }
}
