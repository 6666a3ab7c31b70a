import type { Grid, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkFinite, refuse } from './result'

export interface SetGridArgs {
  /** The new grid, or undefined to remove it. */
  readonly grid: Grid | undefined
}

/** Replace the plan grid (labels must be unique per direction, offsets finite). */
export function setGrid(doc: Project, args: SetGridArgs): CommandOutcome {
  if (args.grid === undefined) {
    const next: Record<string, unknown> = { ...doc }
    delete next.grid
    return next as unknown as Project
  }
  for (const dir of ['x', 'y'] as const) {
    const lines = args.grid[dir]
    if (!Array.isArray(lines)) return refuse(`grid.${dir}: must be a list of lines`)
    const seen = new Set<string>()
    for (let i = 0; i < lines.length; i++) {
      const line = lines[i] as { label: string; at: number }
      const c = checkFinite(`grid.${dir}[${i}].at`, line.at)
      if (c) return refuse(c)
      if (typeof line.label !== 'string' || line.label.length === 0) return refuse(`grid.${dir}[${i}].label: must not be empty`)
      if (seen.has(line.label)) return refuse(`grid.${dir}[${i}].label: "${line.label}" is used twice`)
      seen.add(line.label)
    }
  }
  return { ...doc, grid: args.grid }
}
