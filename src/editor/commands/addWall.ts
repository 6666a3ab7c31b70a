import type { BaseRef, FloorId, MaterialId, Point, Project, Wall, WallId } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import { nextName, pickMaterial, pickRange } from './newElement'
import type { CommandOutcome } from './result'
import { checkName, checkPoint, checkPositive, checkSegment, refuse } from './result'

export interface AddWallArgs {
  readonly p1: Point
  readonly p2: Point
  /** m */
  readonly thickness?: number
  readonly material?: string
  readonly flexureFactor?: number
  readonly shearFactor?: number
  /** Default: from the ground ... */
  readonly base?: BaseRef
  /** ... to the top floor. */
  readonly top?: FloorId
  readonly name?: string
  readonly id?: string
}

/** Add a shear wall from p1 to p2. */
export function addWall(doc: Project, args: AddWallArgs): CommandOutcome {
  const thickness = args.thickness ?? ELEMENT_DEFAULTS.wallThickness
  const flexureFactor = args.flexureFactor ?? ELEMENT_DEFAULTS.flexureFactor
  const shearFactor = args.shearFactor ?? ELEMENT_DEFAULTS.shearFactor
  const c =
    checkPoint('p1', args.p1) ??
    checkPoint('p2', args.p2) ??
    checkSegment(args.p1, args.p2) ??
    checkPositive('thickness', thickness) ??
    checkPositive('flexureFactor', flexureFactor) ??
    checkPositive('shearFactor', shearFactor)
  if (c) return refuse(c)
  const material = pickMaterial(doc, args.material)
  if (typeof material !== 'string') return refuse(material.message)
  const range = pickRange(doc, args.base, args.top)
  if ('message' in range) return refuse(range.message)
  const name = args.name ?? nextName('Wall', doc.walls)
  const cn = checkName('name', name)
  if (cn) return refuse(cn)
  const id = (args.id ?? createId<WallId>('w')) as WallId
  if (doc.walls[id]) return refuse(`id: wall "${id}" already exists`)
  const wall: Wall = {
    id,
    name,
    p1: { x: args.p1.x, y: args.p1.y },
    p2: { x: args.p2.x, y: args.p2.y },
    thickness,
    material: material as MaterialId,
    flexureFactor,
    shearFactor,
    base: range.base,
    top: range.top,
  }
  return { ...doc, walls: { ...doc.walls, [id]: wall } }
}
