import type { Project } from './types'

/** Version written by this build; older files are migrated on load, newer ones refused. */
export const CURRENT_VERSION = 1

export type ParseResult =
  | { readonly ok: true; readonly project: Project; readonly warnings: readonly string[] }
  | { readonly ok: false; readonly errors: readonly string[] }

/**
 * Migrate and validate parsed JSON. Errors name the path and the problem,
 * e.g. `walls.w12.thickness: must be > 0, got -0.2`. An invalid file is refused whole.
 */
export function parseProject(_input: unknown): ParseResult {
  throw new Error('[file] parseProject: not implemented yet')
}
