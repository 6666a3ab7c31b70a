/**
 * NBCC 2015 torsional sensitivity, Division B 4.1.8.11(9)-(10): B_x = delta_max / delta_ave of the
 * floor displacements at the extreme points under the static loads applied at ±0.10 D_nx from the
 * centre of mass; B = max B_x; B > 1.7 is torsionally sensitive.
 * FROM MEMORY in part: the symbols and the 1.7 threshold are confirmed only on secondary pages, the
 * torque form T_x = F_x (e_x ± 0.10 D_nx) is from memory (METHODS.md §7).
 */
import type { BuiltInCriterionSet } from './types'

export const NBCC_2015: BuiltInCriterionSet = {
  spec: {
    id: 'nbcc-2015',
    name: 'NBCC 2015 torsional sensitivity (partly from memory)',
    source:
      'National Building Code of Canada 2015, Division B 4.1.8.11(9)-(10) ' +
      '(B = delta_max/delta_ave, ' +
      '±0.10 Dnx); threshold 1.7 and torque form partly from memory',
    irregularRatio: 1.7,
    ratioQuantity: 'displacement',
    accidentalEccentricity: 0.1,
  },
  clauses: {
    ratio: 'NBCC 2015 4.1.8.11(9)-(10)',
    accidental: 'NBCC 2015 4.1.8.11 (±0.10 Dnx, from memory)',
  },
  labels: {
    regular: 'not torsionally sensitive (B <= 1.7)',
    irregular: 'torsionally sensitive (B > 1.7)',
    extreme: 'torsionally sensitive (B > 1.7)',
  },
  notes: [
    'B_x uses total floor displacements at the extreme points, not story drifts.',
    'When B > 1.7 and IE Fa Sa(0.2) >= 0.35 the dynamic analysis procedure is required ' +
      '(4.1.8.11(10)); the hazard condition is not evaluated here.',
    'Parts of this set are from memory and unverified; read the code before relying on it.',
  ],
}
