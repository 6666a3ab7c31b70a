/** Unit systems for display and input; the model itself is always SI. */
export type UnitSystem = 'SI' | 'US'
