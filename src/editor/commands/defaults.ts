import { STIFFNESS_FACTOR_DEFAULTS } from '@/model'

/**
 * Property values given to new elements when the caller leaves them out. They are starting values to
 * be edited in the inspector, not recommendations (common practice orders of magnitude).
 */
export interface ElementDefaults {
  /** Wall thickness, m. */
  readonly wallThickness: number
  /** Wall flexural stiffness factor f_I, - (STIFFNESS_FACTOR_DEFAULTS.wallFlexure). */
  readonly flexureFactor: number
  /** Wall shear stiffness factor f_A, -. */
  readonly shearFactor: number
  /** Frame line story stiffness when entered directly, N/m. */
  readonly frameStoryStiffness: number
  /** Column second moments, m⁴ (0.5 m square: 0.5⁴/12). */
  readonly columnI: number
  /** Column effective stiffness factor, - (STIFFNESS_FACTOR_DEFAULTS.column). */
  readonly columnFactor: number
  /** Slab area mass, kg/m². */
  readonly areaMass: number
  /** Line mass, kg/m. */
  readonly massPerLength: number
  /** Point mass, kg. */
  readonly pointMass: number
  /** Material id for new walls and columns; the first material of the project when absent or unknown. */
  readonly material?: string
}

export const ELEMENT_DEFAULTS: ElementDefaults = {
  wallThickness: 0.25,
  flexureFactor: STIFFNESS_FACTOR_DEFAULTS.wallFlexure,
  shearFactor: STIFFNESS_FACTOR_DEFAULTS.wallShear,
  frameStoryStiffness: 5e7,
  columnI: 0.5 ** 4 / 12,
  columnFactor: STIFFNESS_FACTOR_DEFAULTS.column,
  areaMass: 600,
  massPerLength: 500,
  pointMass: 1000,
}
