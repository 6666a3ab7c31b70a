/**
 * Property values given to new elements when the caller leaves them out. They are starting values to
 * be edited in the inspector, not recommendations (common practice orders of magnitude).
 */
export interface ElementDefaults {
  /** Wall thickness, m. */
  readonly wallThickness: number
  /** Wall flexural stiffness factor f_I, -. */
  readonly flexureFactor: number
  /** Wall shear stiffness factor f_A, -. */
  readonly shearFactor: number
  /** Frame line story stiffness when entered directly, N/m. */
  readonly frameStoryStiffness: number
  /** Column second moments, m⁴ (0.5 m square: 0.5⁴/12). */
  readonly columnI: number
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
  flexureFactor: 0.7,
  shearFactor: 1,
  frameStoryStiffness: 5e7,
  columnI: 0.5 ** 4 / 12,
  areaMass: 600,
  massPerLength: 500,
  pointMass: 1000,
}
