/**
 * Display of SI values in the UI: each field kind uses a model quantity (factors and labels from
 * `@/model` units) with a fixed number of decimals, so columns of numbers line up. Parsing a typed value
 * converts back to SI and validates it, naming the field in the message.
 */
import { fromDisplay as modelFromDisplay, parseTypedNumber, unitLabel } from '@/model'
import type { Quantity, UnitSystem } from '@/model'

export type QuantityKind =
  | 'length'
  | 'elevation'
  | 'thickness'
  | 'displacement'
  | 'secondMoment'
  | 'modulus'
  | 'stiffness'
  | 'force'
  | 'mass'
  | 'areaMass'
  | 'lineMass'
  | 'rotaryInertia'
  | 'sectionArea'
  | 'area'
  | 'angle'
  | 'ratio'
  | 'period'

interface UnitDef {
  readonly symbol: string
  /** SI value of one display unit. */
  readonly factor: number
  readonly decimals: number
}

/** Which model quantity each UI field shows, and how many decimals in each system. */
const KINDS: Record<QuantityKind, { readonly quantity: Quantity; readonly decimals: Record<UnitSystem, number> }> = {
  length: { quantity: 'length', decimals: { SI: 2, US: 2 } },
  elevation: { quantity: 'length', decimals: { SI: 2, US: 1 } },
  thickness: { quantity: 'thickness', decimals: { SI: 0, US: 1 } },
  displacement: { quantity: 'displacement', decimals: { SI: 1, US: 2 } },
  secondMoment: { quantity: 'inertia', decimals: { SI: 5, US: 0 } },
  modulus: { quantity: 'modulus', decimals: { SI: 1, US: 0 } },
  stiffness: { quantity: 'stiffness', decimals: { SI: 0, US: 1 } },
  force: { quantity: 'force', decimals: { SI: 0, US: 0 } },
  mass: { quantity: 'mass', decimals: { SI: 1, US: 2 } },
  areaMass: { quantity: 'areaMass', decimals: { SI: 2, US: 0 } },
  lineMass: { quantity: 'lineMass', decimals: { SI: 2, US: 3 } },
  rotaryInertia: { quantity: 'polarInertia', decimals: { SI: 0, US: 0 } },
  sectionArea: { quantity: 'sectionArea', decimals: { SI: 1, US: 2 } },
  area: { quantity: 'area', decimals: { SI: 1, US: 0 } },
  angle: { quantity: 'angle', decimals: { SI: 1, US: 1 } },
  ratio: { quantity: 'ratio', decimals: { SI: 3, US: 3 } },
  period: { quantity: 'period', decimals: { SI: 3, US: 3 } },
}

function def(kind: QuantityKind, system: UnitSystem): UnitDef {
  const k = KINDS[kind]
  return { symbol: unitLabel(k.quantity, system), factor: modelFromDisplay(1, k.quantity, system), decimals: k.decimals[system] }
}

/** The display unit symbol of a quantity. */
export function unitSymbol(kind: QuantityKind, system: UnitSystem): string {
  return def(kind, system).symbol
}

/** SI value to display number. */
export function toDisplay(si: number, kind: QuantityKind, system: UnitSystem): number {
  return si / def(kind, system).factor
}

/** Display number to SI value. */
export function fromDisplay(value: number, kind: QuantityKind, system: UnitSystem): number {
  return value * def(kind, system).factor
}

/** A display string without the unit, rounded to the quantity's decimals. */
export function formatNumber(si: number, kind: QuantityKind, system: UnitSystem, decimals?: number): string {
  if (!Number.isFinite(si)) return '—'
  const unit = def(kind, system)
  const v = si / unit.factor
  const d = decimals ?? unit.decimals
  const text = v.toFixed(d)
  return text === '-0' || /^-0\.0+$/.test(text) ? text.slice(1) : text
}

/** A display string with its unit, e.g. "12.50 m" or "41.0 ft". */
export function formatQuantity(si: number, kind: QuantityKind, system: UnitSystem, decimals?: number): string {
  const symbol = def(kind, system).symbol
  const text = formatNumber(si, kind, system, decimals)
  return symbol ? (symbol === '°' ? `${text}°` : `${text} ${symbol}`) : text
}

/** Boxes that hold a length and so accept a typed length unit ("300 mm", "1'-6\""). */
const LENGTH_KINDS: ReadonlySet<QuantityKind> = new Set<QuantityKind>(['length', 'elevation', 'thickness', 'displacement'])

/** Usual ranges (SI) of some boxes; a value outside is asked about once before it is taken. Common practice. */
const PLAUSIBLE: Partial<Record<QuantityKind, { readonly min: number; readonly max: number; readonly what: string }>> = {
  thickness: { min: 0.05, max: 3, what: 'wall thickness' },
  length: { min: 0.01, max: 2000, what: 'length' },
}

/**
 * A warning when an accepted value lies outside the usual range of its box (e.g. a wall 0.25 mm
 * thick, typed as "0.25" in a mm box), else null. Ranges are common practice, not code limits.
 */
export function implausibility(si: number, kind: QuantityKind, system: UnitSystem): string | null {
  const p = PLAUSIBLE[kind]
  if (!p || !Number.isFinite(si) || si === 0) return null
  const a = Math.abs(si)
  if (a >= p.min && a <= p.max) return null
  return `${formatQuantity(si, kind, system, a < p.min ? 3 : undefined)} is unusual for a ${p.what} (usually ${formatQuantity(p.min, kind, system)} to ${formatQuantity(p.max, kind, system)})`
}

/** Constraint on a typed value (in SI). */
export interface FieldRule {
  readonly min?: number
  readonly max?: number
  /** true: the value must be strictly greater than `min`. */
  readonly exclusiveMin?: boolean
  readonly integer?: boolean
}

export type ParsedInput = { readonly ok: true; readonly value: number } | { readonly ok: false; readonly message: string }

/**
 * Parse a typed number in display units into SI and check it. The message names the field, the
 * problem and the limit in the same display unit, e.g. "Thickness: must be greater than 0 mm".
 */
export function parseDisplayInput(
  text: string,
  label: string,
  kind: QuantityKind,
  system: UnitSystem,
  rule: FieldRule = {},
): ParsedInput {
  const typed = parseTypedNumber(text)
  if (!typed.ok) return { ok: false, message: `${label}: ${typed.message}` }
  if (typed.si !== null && !LENGTH_KINDS.has(kind)) {
    return { ok: false, message: `${label}: a length unit (${typed.unit}) does not fit here; type the number in ${unitSymbol(kind, system) || 'plain numbers'}` }
  }
  const value = typed.si !== null ? toDisplay(typed.si, kind, system) : typed.number
  const si = typed.si ?? fromDisplay(value, kind, system)
  const limit = (x: number): string => formatQuantity(x, kind, system)
  if (rule.integer && !Number.isInteger(value)) return { ok: false, message: `${label}: must be a whole number` }
  if (rule.min !== undefined) {
    if (rule.exclusiveMin ? si <= rule.min : si < rule.min) {
      return {
        ok: false,
        message: `${label}: must be ${rule.exclusiveMin ? 'greater than' : 'at least'} ${limit(rule.min)}`,
      }
    }
  }
  if (rule.max !== undefined && si > rule.max) return { ok: false, message: `${label}: must be at most ${limit(rule.max)}` }
  return { ok: true, value: si }
}
