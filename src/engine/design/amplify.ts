/**
 * Accidental torsion amplified by Ax (ASCE/SEI 7-16 12.8.4.3, Eq. 12.8-14): the static cases are
 * run again with each floor's accidental eccentricity multiplied by its Ax until Ax stops changing.
 * The clause computes Ax from the displacements with Ax = 1 (reported as `firstPass`); iterating to
 * a consistent Ax is a common practice refinement, reported beside it.
 * @see METHODS.md §1 "12.8.4.3"; docs/criteria.md "Amplified accidental torsion"
 */
import type { AnalysisSettings, CriterionSetSpec } from '@/model'
import { runStaticTorsion } from '../loads'
import type { StaticLoading } from '../loads'
import type { ModalResult, StaticCaseId, StaticTorsionResult, Structure } from '../results'
import type { StiffnessSolver } from '../solve'
import type { AmplifiedCase } from './types'

/** Ax iteration stops when no floor's Ax changes by more than this, -. */
export const AX_TOLERANCE = 1e-4
/** ... or after this many re-runs of the static cases. */
export const AX_MAX_ITERATIONS = 30

const axOf = (t: StaticTorsionResult, id: StaticCaseId): Float64Array =>
  Float64Array.from(t.cases.find((c) => c.id === id)?.stories ?? [], (s) => s.amplification ?? 1)

/**
 * Iterate Ax per case. `first` is the run with Ax = 1 (its amplification column gives the first Ax).
 * Returns one row per case plus the final amplified run, or null when the set defines no amplification.
 */
export function iterateAmplification(
  structure: Structure,
  solver: StiffnessSolver,
  modes: ModalResult,
  settings: AnalysisSettings,
  set: CriterionSetSpec | null,
  loading: StaticLoading,
  first: StaticTorsionResult,
  designDriftMultiplier: { x: number; y: number },
): { cases: AmplifiedCase[]; result: StaticTorsionResult } | null {
  if (!set?.amplification) return null
  const ids = first.cases.map((c) => c.id)
  const current = new Map<StaticCaseId, Float64Array>(ids.map((id) => [id, axOf(first, id)]))
  const firstPass = new Map(current)
  const iterations = new Map<StaticCaseId, number>(ids.map((id) => [id, 0]))
  const converged = new Map<StaticCaseId, boolean>(ids.map((id) => [id, false]))
  for (let it = 1; it <= AX_MAX_ITERATIONS; it++) {
    const amplifiers = Object.fromEntries(current) as Partial<Record<StaticCaseId, Float64Array>>
    const result = runStaticTorsion(structure, solver, modes, settings, set, { ...loading, amplifiers })
    let all = true
    for (const id of ids) {
      if (converged.get(id)) continue
      const next = axOf(result, id)
      const prev = current.get(id)!
      let change = 0
      next.forEach((v, i) => {
        change = Math.max(change, Math.abs(v - prev[i]!))
      })
      iterations.set(id, it)
      current.set(id, next)
      if (change <= AX_TOLERANCE) converged.set(id, true)
      else all = false
    }
    if (all) break
  }
  // One last run with the final Ax so the reported drifts match it.
  const amplifiers = Object.fromEntries(current) as Partial<Record<StaticCaseId, Float64Array>>
  const result = runStaticTorsion(structure, solver, modes, settings, set, { ...loading, amplifiers })
  const cases = result.cases.map((c) => ({
    caseId: c.id,
    iterations: iterations.get(c.id) ?? 0,
    converged: converged.get(c.id) ?? false,
    firstPass: firstPass.get(c.id)!,
    final: current.get(c.id)!,
    maxDriftRatio: c.stories.reduce((m, s) => Math.max(m, s.driftRatio), 0),
    maxDesignDrift: c.stories.reduce((m, s) => Math.max(m, s.driftMax), 0) * designDriftMultiplier[c.direction],
  }))
  return { cases, result }
}
