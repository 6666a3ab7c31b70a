import type { FloorId, LineMass, LineMassId, Point, Project } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import type { CommandOutcome } from './result'
import { checkFloor, checkNonNegative, checkPoints, refuse } from './result'

export interface AddLineMassArgs {
  readonly floor: FloorId
  /** Polyline, at least 2 points, m. */
  readonly points: readonly Point[]
  /** kg/m */
  readonly massPerLength?: number
  readonly id?: string
}

/** Add a mass distributed along a polyline on a floor. */
export function addLineMass(doc: Project, args: AddLineMassArgs): CommandOutcome {
  const massPerLength = args.massPerLength ?? ELEMENT_DEFAULTS.massPerLength
  const c =
    checkFloor(doc, 'floor', args.floor) ??
    checkPoints('points', args.points, 2) ??
    checkNonNegative('massPerLength', massPerLength)
  if (c) return refuse(c)
  let length = 0
  for (let i = 1; i < args.points.length; i++) {
    const p = args.points[i - 1] as Point
    const q = args.points[i] as Point
    length += Math.hypot(q.x - p.x, q.y - p.y)
  }
  if (!(length > 1e-3)) return refuse(`points: polyline length must be > 0.001 m, got ${length.toPrecision(3)} m`)
  const id = (args.id ?? createId<LineMassId>('lm')) as LineMassId
  if (doc.lineMasses[id]) return refuse(`id: line mass "${id}" already exists`)
  const mass: LineMass = { id, floor: args.floor, points: args.points.map((p) => ({ x: p.x, y: p.y })), massPerLength }
  return { ...doc, lineMasses: { ...doc.lineMasses, [id]: mass } }
}
