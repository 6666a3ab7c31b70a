import type { Project } from '@/model'
import { checkIds } from './records'
import type { CommandOutcome } from './result'
import { checkFinite, refuse } from './result'
import { transformIds } from './transform'

export interface MoveElementsArgs {
  readonly ids: readonly string[]
  /** m */
  readonly dx: number
  /** m */
  readonly dy: number
}

/** Translate elements, slabs and masses by (dx, dy). */
export function moveElements(doc: Project, args: MoveElementsArgs): CommandOutcome {
  const c = checkIds(doc, args.ids, 'move') ?? checkFinite('dx', args.dx) ?? checkFinite('dy', args.dy)
  if (c) return refuse(c)
  if (args.dx === 0 && args.dy === 0) return doc
  return transformIds(doc, args.ids, (p) => ({ x: p.x + args.dx, y: p.y + args.dy }), 0)
}
