/** Whole-record validation used after a patch (updateElement, updateMaterial). */
import type { Column, FrameLine, FrameStiffness, LineMass, Material, PointMass, Project, Slab, Wall } from '@/model'
import type { RecordKind } from '../history'
import type { Check } from './result'
import {
  checkFinite,
  checkFloor,
  checkMaterial,
  checkName,
  checkNonNegative,
  checkPoint,
  checkPoints,
  checkPolygon,
  checkSlabRings,
  checkPositive,
  checkRange,
  checkSegment,
} from './result'

/** Fields each record kind may have (anything else in a patch is refused). */
export const RECORD_FIELDS: Readonly<Record<RecordKind, readonly string[]>> = {
  walls: ['name', 'p1', 'p2', 'thickness', 'material', 'flexureFactor', 'shearFactor', 'base', 'top', 'stories', 'joins', 'locked'],
  frameLines: ['name', 'p1', 'p2', 'stiffness', 'base', 'top', 'locked'],
  columns: ['name', 'at', 'angle', 'Ix', 'Iy', 'material', 'fixity', 'stiffnessFactor', 'restraint', 'base', 'top'],
  slabs: ['floor', 'outline', 'openings', 'areaMass'],
  lineMasses: ['floor', 'points', 'massPerLength'],
  pointMasses: ['floor', 'at', 'mass', 'polarInertia'],
  materials: ['name', 'E', 'nu'],
}

/** Fields that may be cleared by patching them to undefined. */
export const OPTIONAL_FIELDS: readonly string[] = ['stories', 'stiffnessFactor', 'restraint', 'polarInertia', 'joins', 'locked']

/** A column's slab restraint r: absent, or in (0, 1]. */
export function checkRestraint(r: number | undefined): Check {
  if (r === undefined) return undefined
  return Number.isFinite(r) && r > 0 && r <= 1 ? undefined : `restraint: must lie in (0, 1], got ${r}`
}

function checkMomentFrameExtras(doc: Project, s: Extract<FrameStiffness, { kind: 'moment' }>): Check {
  const c =
    (s.baseFixity === undefined || s.baseFixity === 'fixed' || s.baseFixity === 'pinned'
      ? undefined
      : `stiffness.baseFixity: must be "fixed" or "pinned", got "${String(s.baseFixity)}"`) ??
    (s.columnFactor === undefined ? undefined : checkPositive('stiffness.columnFactor', s.columnFactor)) ??
    (s.beamFactor === undefined ? undefined : checkPositive('stiffness.beamFactor', s.beamFactor))
  if (c) return c
  for (const [k, o] of Object.entries(s.stories ?? {})) {
    const f = `stiffness.stories.${k}`
    const cs =
      checkFloor(doc, f, k) ??
      (o.columnI === undefined ? undefined : checkPositive(`${f}.columnI`, o.columnI)) ??
      (o.beamI === undefined ? undefined : checkPositive(`${f}.beamI`, o.beamI))
    if (cs) return cs
  }
  return undefined
}

/** Readable singular name of a kind, for messages. */
export const KIND_LABEL: Readonly<Record<RecordKind, string>> = {
  walls: 'wall',
  frameLines: 'frame line',
  columns: 'column',
  slabs: 'slab',
  lineMasses: 'line mass',
  pointMasses: 'point mass',
  materials: 'material',
}

export function checkFrameStiffness(doc: Project, s: FrameStiffness): Check {
  const st = s as Partial<Record<string, unknown>> & { kind?: unknown }
  switch (s.kind) {
    case 'direct': {
      const c = checkPositive('stiffness.storyStiffness', s.storyStiffness)
      if (c) return c
      for (const [k, v] of Object.entries(s.stories ?? {})) {
        const cf = checkFloor(doc, `stiffness.stories.${k}`, k) ?? checkPositive(`stiffness.stories.${k}`, v)
        if (cf) return cf
      }
      return undefined
    }
    case 'moment':
      return (
        checkPositive('stiffness.bays', s.bays) ??
        (Number.isInteger(s.bays) ? undefined : `stiffness.bays: must be a whole number, got ${s.bays}`) ??
        checkPositive('stiffness.bayWidth', s.bayWidth) ??
        checkPositive('stiffness.columnI', s.columnI) ??
        checkPositive('stiffness.beamI', s.beamI) ??
        checkMaterial(doc, 'stiffness.material', s.material) ??
        checkMomentFrameExtras(doc, s)
      )
    case 'braced':
      return (
        checkPositive('stiffness.braces', s.braces) ??
        checkPositive('stiffness.bayWidth', s.bayWidth) ??
        checkPositive('stiffness.braceArea', s.braceArea) ??
        checkMaterial(doc, 'stiffness.material', s.material)
      )
    default:
      return `stiffness.kind: must be "direct", "moment" or "braced", got "${String(st.kind)}"`
  }
}

function checkWall(doc: Project, w: Wall): Check {
  const c =
    checkName('name', w.name) ??
    checkPoint('p1', w.p1) ??
    checkPoint('p2', w.p2) ??
    checkSegment(w.p1, w.p2) ??
    checkPositive('thickness', w.thickness) ??
    checkMaterial(doc, 'material', w.material) ??
    checkPositive('flexureFactor', w.flexureFactor) ??
    checkPositive('shearFactor', w.shearFactor) ??
    checkRange(doc, w.base, w.top) ??
    (w.joins === undefined || w.joins === 'auto' || w.joins === 'apart'
      ? undefined
      : `joins: must be "auto" or "apart", got "${String(w.joins)}"`) ??
    checkLocked(w.locked)
  if (c) return c
  for (const [k, o] of Object.entries(w.stories ?? {})) {
    const f = `stories.${k}`
    const cs =
      checkFloor(doc, f, k) ??
      (o.thickness === undefined ? undefined : checkPositive(`${f}.thickness`, o.thickness)) ??
      (o.flexureFactor === undefined ? undefined : checkPositive(`${f}.flexureFactor`, o.flexureFactor)) ??
      (o.shearFactor === undefined ? undefined : checkPositive(`${f}.shearFactor`, o.shearFactor))
    if (cs) return cs
  }
  return undefined
}

function checkFrame(doc: Project, f: FrameLine): Check {
  return (
    checkName('name', f.name) ??
    checkPoint('p1', f.p1) ??
    checkPoint('p2', f.p2) ??
    checkSegment(f.p1, f.p2) ??
    checkFrameStiffness(doc, f.stiffness) ??
    checkRange(doc, f.base, f.top) ??
    checkLocked(f.locked)
  )
}

function checkColumn(doc: Project, c: Column): Check {
  return (
    checkName('name', c.name) ??
    checkPoint('at', c.at) ??
    checkFinite('angle', c.angle) ??
    checkPositive('Ix', c.Ix) ??
    checkPositive('Iy', c.Iy) ??
    checkMaterial(doc, 'material', c.material) ??
    (c.fixity === 'fixed' || c.fixity === 'pinned'
      ? undefined
      : `fixity: must be "fixed" or "pinned", got "${String(c.fixity)}"`) ??
    (c.stiffnessFactor === undefined ? undefined : checkPositive('stiffnessFactor', c.stiffnessFactor)) ??
    checkRestraint(c.restraint) ??
    checkRange(doc, c.base, c.top)
  )
}

function checkSlab(doc: Project, s: Slab): Check {
  if (!Array.isArray(s.openings)) return 'openings: must be a list of polygons'
  return (
    checkFloor(doc, 'floor', s.floor) ??
    checkPolygon('outline', s.outline) ??
    s.openings.map((o, i) => checkPolygon(`openings[${i}]`, o)).find((m) => m !== undefined) ??
    checkSlabRings(s.id, s.outline, s.openings) ??
    checkNonNegative('areaMass', s.areaMass)
  )
}

function checkLineMass(doc: Project, m: LineMass): Check {
  return checkFloor(doc, 'floor', m.floor) ?? checkPoints('points', m.points, 2) ?? checkNonNegative('massPerLength', m.massPerLength)
}

function checkPointMass(doc: Project, m: PointMass): Check {
  return (
    checkFloor(doc, 'floor', m.floor) ??
    checkPoint('at', m.at) ??
    checkNonNegative('mass', m.mass) ??
    (m.polarInertia === undefined ? undefined : checkNonNegative('polarInertia', m.polarInertia))
  )
}

export function checkMaterialRecord(m: Material): Check {
  return (
    checkName('name', m.name) ??
    checkPositive('E', m.E) ??
    checkFinite('nu', m.nu) ??
    (m.nu > -1 && m.nu < 0.5 ? undefined : `nu: must be between -1 and 0.5, got ${m.nu}`)
  )
}

/** Validate a whole record of a kind; the message has no entity prefix. */
export function checkRecord(doc: Project, kind: RecordKind, record: unknown): Check {
  switch (kind) {
    case 'walls':
      return checkWall(doc, record as Wall)
    case 'frameLines':
      return checkFrame(doc, record as FrameLine)
    case 'columns':
      return checkColumn(doc, record as Column)
    case 'slabs':
      return checkSlab(doc, record as Slab)
    case 'lineMasses':
      return checkLineMass(doc, record as LineMass)
    case 'pointMasses':
      return checkPointMass(doc, record as PointMass)
    case 'materials':
      return checkMaterialRecord(record as Material)
    default: {
      const never: never = kind
      throw new Error(`[editor] unknown record kind ${String(never)}`)
    }
  }
}

/** The optional balance-assistant lock: absent, true or false. */
function checkLocked(v: unknown): Check {
  return v === undefined || typeof v === 'boolean' ? undefined : `locked: must be true or false, got ${String(v)}`
}
