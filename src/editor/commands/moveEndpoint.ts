import type { Point, Project } from '@/model'
import type { CommandOutcome } from './result'
import { checkPoint, checkSegment, refuse } from './result'

export interface MoveEndpointArgs {
  /** A wall or frame line. */
  readonly id: string
  readonly end: 'p1' | 'p2'
  readonly to: Point
}

/** Move one end of a wall or frame line (stretch or swing it); refused if it would have no length. */
export function moveEndpoint(doc: Project, args: MoveEndpointArgs): CommandOutcome {
  if (args.end !== 'p1' && args.end !== 'p2') return refuse(`end: must be "p1" or "p2", got "${String(args.end)}"`)
  const c = checkPoint('to', args.to)
  if (c) return refuse(c)
  const to = { x: args.to.x, y: args.to.y }
  const wall = doc.walls[args.id]
  if (wall) {
    const next = { ...wall, [args.end]: to }
    const cs = checkSegment(next.p1, next.p2)
    if (cs) return refuse(`wall ${args.id}: ${cs}`)
    return { ...doc, walls: { ...doc.walls, [args.id]: next } }
  }
  const frame = doc.frameLines[args.id]
  if (frame) {
    const next = { ...frame, [args.end]: to }
    const cs = checkSegment(next.p1, next.p2)
    if (cs) return refuse(`frame line ${args.id}: ${cs}`)
    return { ...doc, frameLines: { ...doc.frameLines, [args.id]: next } }
  }
  return refuse(`id: "${args.id}" is not a wall or frame line`)
}
