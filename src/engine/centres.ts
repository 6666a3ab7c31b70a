import type { FloorCentres, Structure } from './results'
import type { StiffnessSolver } from './solve'

/** Centres of mass and rigidity, eccentricities and radii per floor (MODELING.md, Centres). */
export function computeCentres(_structure: Structure, _solver: StiffnessSolver): FloorCentres[] {
  throw new Error('[engine] computeCentres: not implemented yet')
}
