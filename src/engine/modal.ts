import type { ModalResult, Structure } from './results'

/** All 3N modes of K phi = omega² M phi, mass-normalized, ascending, sign-normalized. */
export function solveModes(_structure: Structure): ModalResult {
  throw new Error('[engine] solveModes: not implemented yet')
}
