import type { FloorId, Point, PointMass, PointMassId, Project } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import type { CommandOutcome } from './result'
import { checkFloor, checkNonNegative, checkPoint, refuse } from './result'

export interface AddPointMassArgs {
  readonly floor: FloorId
  readonly at: Point
  /** kg */
  readonly mass?: number
  /** kg·m² */
  readonly polarInertia?: number
  readonly id?: string
}

/** Add a lumped mass at a plan point of a floor. */
export function addPointMass(doc: Project, args: AddPointMassArgs): CommandOutcome {
  const mass = args.mass ?? ELEMENT_DEFAULTS.pointMass
  const c =
    checkFloor(doc, 'floor', args.floor) ??
    checkPoint('at', args.at) ??
    checkNonNegative('mass', mass) ??
    (args.polarInertia === undefined ? undefined : checkNonNegative('polarInertia', args.polarInertia))
  if (c) return refuse(c)
  const id = (args.id ?? createId<PointMassId>('pm')) as PointMassId
  if (doc.pointMasses[id]) return refuse(`id: point mass "${id}" already exists`)
  const pm: PointMass = {
    id,
    floor: args.floor,
    at: { x: args.at.x, y: args.at.y },
    mass,
    ...(args.polarInertia === undefined ? {} : { polarInertia: args.polarInertia }),
  }
  return { ...doc, pointMasses: { ...doc.pointMasses, [id]: pm } }
}
