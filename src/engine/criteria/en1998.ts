/**
 * EN 1998-1:2004 plan-regularity criteria 4.2.3.2(6): at every level and for each direction
 * e0x <= 0.30 r_x (Eq. 4.1a) and r_x >= l_s (Eq. 4.1b), e0x measured along x with
 * r_x = sqrt(K_T / K_y) (y analogous); accidental eccentricity e_ai = ±0.05 L_i (4.3.2(1)P,
 * Eq. 4.3).
 * @see METHODS.md §2 (the exact definition wording is from memory there)
 */
import type { BuiltInCriterionSet } from './types'

export const EN1998_1: BuiltInCriterionSet = {
  spec: {
    id: 'en1998-1',
    name: 'EN 1998-1 plan regularity',
    source:
      'EN 1998-1:2004 Eurocode 8 Part 1, 4.2.3.2(6) Eqs 4.1a/4.1b (plan regularity), ' +
      '4.3.2(1)P Eq. 4.3 (accidental eccentricity 0.05 L)',
    eccentricityToRadius: 0.3,
    radiusToGyration: 1,
    accidentalEccentricity: 0.05,
  },
  clauses: {
    eccentricity: 'EN 1998-1:2004 4.2.3.2(6), Eq. 4.1a',
    radius: 'EN 1998-1:2004 4.2.3.2(6), Eq. 4.1b',
    accidental: 'EN 1998-1:2004 4.3.2(1)P, Eq. 4.3',
  },
  labels: {
    // Only condition (6) is checked, so a pass is never worded as "regular in plan"; one failed
    // condition is enough for "not regular in plan".
    regular: 'meets 4.2.3.2(6); conditions (2) to (5) not checked',
    irregular: 'not regular in plan',
    extreme: 'not regular in plan',
  },
  regularityScope: {
    checked: ['4.2.3.2(6) Eq. 4.1a: e0 <= 0.30 r at every level, both directions', '4.2.3.2(6) Eq. 4.1b: r >= l_s'],
    notChecked: [
      '4.2.3.2(2) approximate symmetry of lateral stiffness and mass in plan',
      '4.2.3.2(3) compact plan outline (re-entrant corners and recesses)',
      '4.2.3.2(4) in-plane stiffness of the floors compared with the lateral elements',
      '4.2.3.2(5) slenderness L_max/L_min <= 4',
    ],
  },
  notes: [
    'Centre of rigidity and torsional radius use the floor-load definition ' +
      '(MODELING.md "Centres"); ' +
      'for multi-storey buildings EN 1998-1 4.2.3.2(8) admits only approximate definitions.',
    'Failing Eq. 4.1b marks a torsionally flexible system (reduced q0 for concrete, 5.2.2.2); ' +
      'the behaviour factor is not evaluated here.',
    'Only condition (6) of 4.2.3.2 is checked; conditions (2) to (5) (symmetry, compactness, ' +
      'diaphragm rigidity, slenderness) are not.',
  ],
}
