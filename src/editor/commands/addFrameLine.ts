import type { BaseRef, FloorId, FrameLine, FrameLineId, FrameStiffness, Point, Project } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import { nextName, pickRange } from './newElement'
import type { CommandOutcome } from './result'
import { checkName, checkPoint, checkSegment, refuse } from './result'
import { checkFrameStiffness } from './validate'

export interface AddFrameLineArgs {
  readonly p1: Point
  readonly p2: Point
  /** Default: entered directly, ELEMENT_DEFAULTS.frameStoryStiffness N/m per story. */
  readonly stiffness?: FrameStiffness
  readonly base?: BaseRef
  readonly top?: FloorId
  readonly name?: string
  readonly id?: string
}

/** Add a moment or braced frame line from p1 to p2. */
export function addFrameLine(doc: Project, args: AddFrameLineArgs): CommandOutcome {
  const stiffness: FrameStiffness = args.stiffness ?? {
    kind: 'direct',
    storyStiffness: ELEMENT_DEFAULTS.frameStoryStiffness,
  }
  const c =
    checkPoint('p1', args.p1) ??
    checkPoint('p2', args.p2) ??
    checkSegment(args.p1, args.p2) ??
    checkFrameStiffness(doc, stiffness)
  if (c) return refuse(c)
  const range = pickRange(doc, args.base, args.top)
  if ('message' in range) return refuse(range.message)
  const name = args.name ?? nextName('Frame line', doc.frameLines)
  const cn = checkName('name', name)
  if (cn) return refuse(cn)
  const id = (args.id ?? createId<FrameLineId>('f')) as FrameLineId
  if (doc.frameLines[id]) return refuse(`id: frame line "${id}" already exists`)
  const frame: FrameLine = {
    id,
    name,
    p1: { x: args.p1.x, y: args.p1.y },
    p2: { x: args.p2.x, y: args.p2.y },
    stiffness,
    base: range.base,
    top: range.top,
  }
  return { ...doc, frameLines: { ...doc.frameLines, [id]: frame } }
}
