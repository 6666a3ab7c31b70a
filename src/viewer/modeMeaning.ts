/**
 * Pure words about a mode: the plain class (mostly X / mostly Y / mostly torsion / coupled), where a
 * floor turns, and the one-line meaning shown in presentation mode and burnt into exports.
 */
import type { ModeCharacter } from '@/engine'
import type { Point } from '@/model'
import { turnCentre } from './modeAnimation'
import type { FloorDof } from './modeAnimation'

/** Plain words of a mode class. */
export function characterWords(character: ModeCharacter): string {
  switch (character) {
    case 'x':
      return 'mostly X'
    case 'y':
      return 'mostly Y'
    case 'torsion':
      return 'mostly torsion'
    case 'coupled':
      return 'coupled'
    default: {
      const never: never = character
      throw new TypeError(`[viewer] unknown mode class ${String(never)}`)
    }
  }
}

/**
 * Fallback class from the numbers, used when a result carries none: torsion when more than 60% of
 * the kinetic energy is rotation about the floors' centres of mass; X (Y) when rotation is below 25%
 * and the X (Y) effective mass is at least four times the other; otherwise coupled. The thresholds
 * are this viewer's own reading aid (common practice uses similar "dominant" shares), not a code rule.
 */
export function classifyMode(ratioX: number, ratioY: number, torsionShare: number): ModeCharacter {
  if (torsionShare > 0.6) return 'torsion'
  if (torsionShare < 0.25 && ratioX >= 4 * ratioY && ratioX > 0) return 'x'
  if (torsionShare < 0.25 && ratioY >= 4 * ratioX && ratioY > 0) return 'y'
  return 'coupled'
}

/** Plan bounding box, m. */
export interface PlanBox {
  readonly minX: number
  readonly maxX: number
  readonly minY: number
  readonly maxY: number
}

/** A named plan segment (a wall) that a turn centre can be "near". */
export interface NamedSegment {
  readonly name: string
  readonly p1: Point
  readonly p2: Point
}

function segmentDistance(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x
  const dy = b.y - a.y
  const len2 = dx * dx + dy * dy
  const t = len2 > 0 ? Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2)) : 0
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy))
}

const fmt = (v: number) => (v >= 10 ? v.toFixed(0) : v.toFixed(1))

/**
 * Where a point lies in words, relative to the plan as drawn (x to the right, y up the screen):
 * near a core or named wall when within 12% of the plan size of one, else a region of the plan
 * (thirds of the box), else the distance beyond the nearest edge. Null when it is farther than
 * three plan sizes (the floor then translates rather than turns).
 */
export function describePlace(
  c: Point,
  box: PlanBox,
  walls: readonly NamedSegment[] = [],
): string | null {
  const w = box.maxX - box.minX
  const h = box.maxY - box.minY
  const size = Math.max(w, h, 1e-9)
  const outX = c.x < box.minX ? box.minX - c.x : c.x > box.maxX ? c.x - box.maxX : 0
  const outY = c.y < box.minY ? box.minY - c.y : c.y > box.maxY ? c.y - box.maxY : 0
  const out = Math.hypot(outX, outY)
  if (out > 3 * size) return null
  let nearest: { name: string; d: number } | null = null
  for (const s of walls) {
    const d = segmentDistance(c, s.p1, s.p2)
    if (!nearest || d < nearest.d) nearest = { name: s.name, d }
  }
  if (nearest && nearest.d <= 0.12 * size) {
    return /core/i.test(nearest.name) ? 'near the core' : `near wall ${nearest.name}`
  }
  if (out > 0.05 * size) {
    const side =
      outX >= outY ? (c.x < box.minX ? 'left' : 'right') : c.y < box.minY ? 'bottom' : 'top'
    return `${fmt(out)} m beyond the ${side} edge of the plan`
  }
  const col = c.x < box.minX + w / 3 ? 'left' : c.x > box.maxX - w / 3 ? 'right' : 'centre'
  const row = c.y < box.minY + h / 3 ? 'bottom' : c.y > box.maxY - h / 3 ? 'top' : 'middle'
  if (col === 'centre' && row === 'middle') return 'near the centre of the plan'
  if (col === 'centre') return `near the middle of the ${row} edge`
  if (row === 'middle') return `near the middle of the ${col} edge`
  return `near the ${row}-${col} corner of the plan`
}

/** What a mode line needs to know. */
export interface ModeFacts {
  /** 1-based mode number. */
  readonly number: number
  /** s */
  readonly period: number
  readonly character: ModeCharacter
  /** Effective mass ratios, -. */
  readonly ratioX: number
  readonly ratioY: number
  /** 0..1 */
  readonly torsionShare: number
  /** DOFs of the floor the sentence is about (the top floor). */
  readonly floor: FloorDof
}

/** Short title: "Mode 1 · T = 0.82 s". */
export function modeTitle(number: number, period: number): string {
  return `Mode ${number} · T = ${period.toFixed(period < 1 ? 3 : 2)} s`
}

/**
 * One-line meaning of a mode from its numbers, e.g.
 * "Mode 1: mostly torsion — the plan turns about a point near the core".
 */
export function describeMode(facts: ModeFacts, box: PlanBox, walls: readonly NamedSegment[] = []): string {
  const size = Math.max(box.maxX - box.minX, box.maxY - box.minY, 1e-9)
  const centre = turnCentre(facts.floor, size)
  const place = centre ? describePlace(centre, box, walls) : null
  const head = `Mode ${facts.number}: ${characterWords(facts.character)}`
  const turnPct = Math.round(facts.torsionShare * 100)
  switch (facts.character) {
    case 'torsion':
      return place
        ? `${head} — the plan turns about a point ${place}`
        : `${head} — the plan turns while its centre drifts sideways`
    case 'x':
    case 'y': {
      const axis = facts.character === 'x' ? 'X' : 'Y'
      if (facts.torsionShare >= 0.1 && place) {
        return `${head} — the floors sway along ${axis} and turn a little (${turnPct}% rotation) about a point ${place}`
      }
      return `${head} — the floors sway along ${axis} with ${turnPct < 1 ? 'almost no' : 'little'} twist`
    }
    case 'coupled': {
      const ux = Math.abs(facts.floor.ux)
      const uy = Math.abs(facts.floor.uy)
      const dir =
        facts.ratioX + facts.ratioY > 0
          ? facts.ratioX >= 3 * facts.ratioY
            ? 'X'
            : facts.ratioY >= 3 * facts.ratioX
              ? 'Y'
              : 'X and Y'
          : ux >= uy
            ? 'X'
            : 'Y'
      return place
        ? `${head} — the floors sway along ${dir} while turning (${turnPct}% rotation) about a point ${place}`
        : `${head} — the floors sway along ${dir} while turning (${turnPct}% rotation)`
    }
    default: {
      const never: never = facts.character
      throw new TypeError(`[viewer] unknown mode class ${String(never)}`)
    }
  }
}
