/** Shared by the element builders: input checks and the "left out of the analysis" warning. */
import type { Issue, IssueCode } from '../results'

/** A finite number > 0. */
export const positive = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && v > 0

/**
 * The warning for an element that cannot be built: it names the element and why, and says it is
 * left out (the solver then finds any mechanism this leaves).
 */
export function leftOutIssue(label: string, id: string, name: string, code: IssueCode, why: string): Issue {
  return {
    code,
    severity: 'warning',
    message: `[engine] ${label} ${id} (${name}): ${why}; it is left out of the analysis`,
    refs: [id],
  }
}
