/**
 * Effective-stiffness (cracked-section) factors on the gross second moment I_g: the one place where the
 * default per element kind is set. The file reader, the engine and the editor all take their defaults
 * from here. Dimensionless.
 *
 * Values from ACI 318-19 Table 6.6.3.1.1(a) (the same in 318-14): columns 0.70 I_g, walls uncracked
 * 0.70 I_g, walls cracked 0.35 I_g, beams 0.35 I_g, flat plates and flat slabs 0.25 I_g.
 * Walls default to the uncracked value: a plan-torsion layout study compares elements with one another
 * at the stiffness they have before the walls are shown to crack; R6.6.3.1.1 then asks for a re-run at
 * 0.35 in the stories where a wall modelled at 0.70 is found to crack in flexure (set it per story).
 * The wall shear factor f_A has no row in that table and stays 1.0 (gross shear area; common practice).
 * @see /work/shared/METHODS.md §6 (ACI 318-19 Table 6.6.3.1.1(a) and R6.6.3.1.1)
 */
export const STIFFNESS_FACTOR_DEFAULTS = {
  /** Wall flexural factor f_I (walls, uncracked), -. */
  wallFlexure: 0.7,
  /** Wall shear factor f_A on the shear area, -. */
  wallShear: 1,
  /** Stand-alone column factor on I, -. */
  column: 0.7,
  /** Moment-frame column factor on I, -. */
  frameColumn: 0.7,
  /** Moment-frame beam factor on I, -. */
  frameBeam: 0.35,
} as const

/** The ACI 318-19 Table 6.6.3.1.1(a) values, for labels and choices in the editor, -. */
export const ACI_318_19_FACTORS = {
  columns: 0.7,
  wallsUncracked: 0.7,
  wallsCracked: 0.35,
  beams: 0.35,
  flatPlatesAndSlabs: 0.25,
} as const
