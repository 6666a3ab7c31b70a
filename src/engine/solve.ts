import type { Issue, Structure } from './results'

/** Solves K u = f for one factorization of K; floor flexibility blocks F_j (3x3 of K^-1). */
export interface StiffnessSolver {
  /** u = K^-1 f for a 3N load vector at O. */
  solve(rhs: Float64Array): Float64Array
  /** The 3x3 block of K^-1 for floor j (row-major, order u_x, u_y, theta). */
  floorFlexibility(floorIndex: number): Float64Array
}

/** Factor K once; a singular or nearly singular K is reported as a mechanism naming floor and direction. */
export function createStiffnessSolver(
  _structure: Structure,
): { ok: true; solver: StiffnessSolver } | { ok: false; issues: Issue[] } {
  throw new Error('[engine] createStiffnessSolver: not implemented yet')
}
