import type { BaseRef, Column, ColumnFixity, ColumnId, FloorId, MaterialId, Point, Project } from '@/model'
import { createId } from '@/model'
import { ELEMENT_DEFAULTS } from './defaults'
import { nextName, pickMaterial, pickRange } from './newElement'
import { checkRestraint } from './validate'
import type { CommandOutcome } from './result'
import { checkFinite, checkName, checkPoint, checkPositive, refuse } from './result'

export interface AddColumnArgs {
  readonly at: Point
  /** rad, counter-clockwise from global X */
  readonly angle?: number
  /** m⁴ */
  readonly Ix?: number
  /** m⁴ */
  readonly Iy?: number
  readonly material?: string
  readonly fixity?: ColumnFixity
  /** Default ELEMENT_DEFAULTS.columnFactor (written into the column so the inspector shows it). */
  readonly stiffnessFactor?: number
  /** Slab restraint r in (0, 1]; absent = 1 (fully fixed ends). */
  readonly restraint?: number
  readonly base?: BaseRef
  readonly top?: FloorId
  readonly name?: string
  readonly id?: string
}

/** Add a column at a plan point. */
export function addColumn(doc: Project, args: AddColumnArgs): CommandOutcome {
  const angle = args.angle ?? 0
  const Ix = args.Ix ?? ELEMENT_DEFAULTS.columnI
  const Iy = args.Iy ?? ELEMENT_DEFAULTS.columnI
  const fixity = args.fixity ?? 'fixed'
  const stiffnessFactor = args.stiffnessFactor ?? ELEMENT_DEFAULTS.columnFactor
  const c =
    checkPoint('at', args.at) ??
    checkFinite('angle', angle) ??
    checkPositive('Ix', Ix) ??
    checkPositive('Iy', Iy) ??
    (fixity === 'fixed' || fixity === 'pinned' ? undefined : `fixity: must be "fixed" or "pinned", got "${String(fixity)}"`) ??
    checkPositive('stiffnessFactor', stiffnessFactor) ??
    checkRestraint(args.restraint)
  if (c) return refuse(c)
  const material = pickMaterial(doc, args.material)
  if (typeof material !== 'string') return refuse(material.message)
  const range = pickRange(doc, args.base, args.top)
  if ('message' in range) return refuse(range.message)
  const name = args.name ?? nextName('Column', doc.columns)
  const cn = checkName('name', name)
  if (cn) return refuse(cn)
  const id = (args.id ?? createId<ColumnId>('c')) as ColumnId
  if (doc.columns[id]) return refuse(`id: column "${id}" already exists`)
  const column: Column = {
    id,
    name,
    at: { x: args.at.x, y: args.at.y },
    angle,
    Ix,
    Iy,
    material: material as MaterialId,
    fixity,
    stiffnessFactor,
    ...(args.restraint === undefined ? {} : { restraint: args.restraint }),
    base: range.base,
    top: range.top,
  }
  return { ...doc, columns: { ...doc.columns, [id]: column } }
}
