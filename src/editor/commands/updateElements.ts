import type { Project } from '@/model'
import type { CommandOutcome } from './result'
import { isRefusal, refuse } from './result'
import { updateElement } from './updateElement'
import type { UpdateElementArgs } from './updateElement'

export interface UpdateElementsArgs {
  /** Patches applied in order; all or none. */
  readonly items: readonly UpdateElementArgs[]
}

/**
 * Change several elements as one command (one undo step), e.g. a balance suggestion that moves a whole
 * wall group. The first refused patch refuses the whole command and names its element and field.
 */
export function updateElements(doc: Project, args: UpdateElementsArgs): CommandOutcome {
  if (!Array.isArray(args.items) || args.items.length === 0) return refuse('items: must list at least one element change')
  let next: Project = doc
  for (const item of args.items) {
    const outcome = updateElement(next, item)
    if (isRefusal(outcome)) return outcome
    next = outcome
  }
  return next
}
