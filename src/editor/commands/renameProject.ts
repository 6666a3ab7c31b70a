import type { Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkName, refuse } from './result'

export interface RenameProjectArgs {
  /** The new project name; surrounding spaces are dropped. */
  readonly name: string
}

/** Rename the project (the document's `name`; refused when empty). */
export function renameProject(doc: Project, args: RenameProjectArgs): CommandOutcome {
  const c = checkName('name', args.name)
  if (c) return refuse(c)
  return { ...doc, name: args.name.trim() }
}
