/**
 * ASCE/SEI 7-16 torsion criteria: Table 12.3-1 horizontal irregularity Types 1a and 1b (story
 * drifts with accidental torsion, Ax = 1), 12.8.4.3 amplification
 * Ax = (delta_max / (1.2 delta_avg))²,
 * 1 <= Ax <= 3 (Eq. 12.8-14, on floor displacements), 12.8.4.2 accidental eccentricity 5 %.
 * @see METHODS.md §1 for the wording and which parts are confirmed or from memory
 */
import type { BuiltInCriterionSet } from './types'

export const ASCE7_16: BuiltInCriterionSet = {
  spec: {
    id: 'asce7-16',
    name: 'ASCE/SEI 7-16 torsional irregularity',
    source:
      'ASCE/SEI 7-16 Minimum Design Loads, Table 12.3-1 Types 1a/1b, ' +
      '12.8.4.2 (accidental torsion, 5 %), ' +
      '12.8.4.3 Eq. 12.8-14 (Ax)',
    irregularRatio: 1.2,
    extremeRatio: 1.4,
    ratioQuantity: 'drift',
    amplification: { divisor: 1.2, power: 2, min: 1, max: 3 },
    accidentalEccentricity: 0.05,
  },
  clauses: {
    ratio: 'ASCE/SEI 7-16 Table 12.3-1 Type 1a',
    extreme: 'ASCE/SEI 7-16 Table 12.3-1 Type 1b',
    amplification: 'ASCE/SEI 7-16 12.8.4.3, Eq. 12.8-14',
    accidental: 'ASCE/SEI 7-16 12.8.4.2',
  },
  labels: {
    regular: 'no torsional irregularity',
    irregular: 'Type 1a torsional irregularity',
    extreme: 'Type 1b extreme torsional irregularity',
  },
  notes: [
    'Story drifts at the extreme points include accidental torsion with Ax = 1 (Table 12.3-1).',
    'Ax uses total floor displacements at the extreme points, not story drifts (12.8.4.3).',
    'Rigid diaphragms are assumed; the Type 1 irregularities apply to rigid or semirigid ' +
      'diaphragms.',
    'Consequences by seismic design category (12.3.3.1, 12.8.4.3, Table 12.6-1) are listed as data ' +
      'rows with the design-level numbers when settings.seismicDesign is given (from memory).',
  ],
}
