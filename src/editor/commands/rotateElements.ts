import type { Point, Project } from '@/model'
import { checkIds } from './records'
import type { CommandOutcome } from './result'
import { checkFinite, checkPoint, refuse } from './result'
import { transformIds } from './transform'

export interface RotateElementsArgs {
  readonly ids: readonly string[]
  /** Centre of rotation, m. */
  readonly center: Point
  /** rad, counter-clockwise seen from above */
  readonly angle: number
}

/** Rotate elements, slabs and masses about a plan point; columns also turn their local axes. */
export function rotateElements(doc: Project, args: RotateElementsArgs): CommandOutcome {
  const c = checkIds(doc, args.ids, 'rotate') ?? checkPoint('center', args.center) ?? checkFinite('angle', args.angle)
  if (c) return refuse(c)
  if (args.angle === 0) return doc
  const cos = Math.cos(args.angle)
  const sin = Math.sin(args.angle)
  const { x: cx, y: cy } = args.center
  return transformIds(
    doc,
    args.ids,
    (p) => ({ x: cx + cos * (p.x - cx) - sin * (p.y - cy), y: cy + sin * (p.x - cx) + cos * (p.y - cy) }),
    args.angle,
  )
}
