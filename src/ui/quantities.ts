/**
 * Display units of the UI edge. The model is SI; each quantity kind has one display unit per unit
 * system, a factor (SI value of one display unit) and a number of decimals. Parsing a typed value
 * converts back to SI and validates it, naming the field in the message.
 */
import type { UnitSystem } from '@/model'

const G = 9.80665
const FT = 0.3048
const IN = 0.0254
const LBF = 4.4482216152605
const KIP = 1000 * LBF

export type QuantityKind =
  | 'length'
  | 'elevation'
  | 'thickness'
  | 'secondMoment'
  | 'modulus'
  | 'stiffness'
  | 'force'
  | 'mass'
  | 'areaMass'
  | 'lineMass'
  | 'rotaryInertia'
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

const UNITS: Record<QuantityKind, Record<UnitSystem, UnitDef>> = {
  length: { SI: { symbol: 'm', factor: 1, decimals: 2 }, US: { symbol: 'ft', factor: FT, decimals: 2 } },
  elevation: { SI: { symbol: 'm', factor: 1, decimals: 2 }, US: { symbol: 'ft', factor: FT, decimals: 1 } },
  thickness: { SI: { symbol: 'mm', factor: 0.001, decimals: 0 }, US: { symbol: 'in', factor: IN, decimals: 1 } },
  secondMoment: { SI: { symbol: 'm⁴', factor: 1, decimals: 5 }, US: { symbol: 'in⁴', factor: IN ** 4, decimals: 0 } },
  modulus: { SI: { symbol: 'GPa', factor: 1e9, decimals: 1 }, US: { symbol: 'ksi', factor: KIP / IN ** 2, decimals: 0 } },
  stiffness: { SI: { symbol: 'kN/m', factor: 1000, decimals: 0 }, US: { symbol: 'kip/in', factor: KIP / IN, decimals: 1 } },
  force: { SI: { symbol: 'kN', factor: 1000, decimals: 0 }, US: { symbol: 'kip', factor: KIP, decimals: 0 } },
  // Masses are shown as the weight they carry, as engineers enter them.
  mass: { SI: { symbol: 't', factor: 1000, decimals: 1 }, US: { symbol: 'kip (weight)', factor: KIP / G, decimals: 1 } },
  areaMass: { SI: { symbol: 'kN/m²', factor: 1000 / G, decimals: 2 }, US: { symbol: 'psf', factor: LBF / FT ** 2 / G, decimals: 0 } },
  lineMass: { SI: { symbol: 'kN/m', factor: 1000 / G, decimals: 2 }, US: { symbol: 'kip/ft', factor: KIP / FT / G, decimals: 3 } },
  rotaryInertia: { SI: { symbol: 't·m²', factor: 1000, decimals: 0 }, US: { symbol: 'kip·s²·ft', factor: KIP * FT, decimals: 0 } },
  area: { SI: { symbol: 'm²', factor: 1, decimals: 1 }, US: { symbol: 'ft²', factor: FT * FT, decimals: 0 } },
  angle: { SI: { symbol: '°', factor: Math.PI / 180, decimals: 1 }, US: { symbol: '°', factor: Math.PI / 180, decimals: 1 } },
  ratio: { SI: { symbol: '', factor: 1, decimals: 3 }, US: { symbol: '', factor: 1, decimals: 3 } },
  period: { SI: { symbol: 's', factor: 1, decimals: 3 }, US: { symbol: 's', factor: 1, decimals: 3 } },
}

/** The display unit symbol of a quantity. */
export function unitSymbol(kind: QuantityKind, system: UnitSystem): string {
  return UNITS[kind][system].symbol
}

/** SI value to display number. */
export function toDisplay(si: number, kind: QuantityKind, system: UnitSystem): number {
  return si / UNITS[kind][system].factor
}

/** Display number to SI value. */
export function fromDisplay(value: number, kind: QuantityKind, system: UnitSystem): number {
  return value * UNITS[kind][system].factor
}

/** A display string without the unit, rounded to the quantity's decimals. */
export function formatNumber(si: number, kind: QuantityKind, system: UnitSystem, decimals?: number): string {
  if (!Number.isFinite(si)) return '—'
  const def = UNITS[kind][system]
  const v = si / def.factor
  const d = decimals ?? def.decimals
  const text = v.toFixed(d)
  return text === '-0' || /^-0\.0+$/.test(text) ? text.slice(1) : text
}

/** A display string with its unit, e.g. "12.50 m" or "41.0 ft". */
export function formatQuantity(si: number, kind: QuantityKind, system: UnitSystem, decimals?: number): string {
  const symbol = UNITS[kind][system].symbol
  const text = formatNumber(si, kind, system, decimals)
  return symbol ? (symbol === '°' ? `${text}°` : `${text} ${symbol}`) : text
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
  const trimmed = text.trim().replace(',', '.')
  if (trimmed === '') return { ok: false, message: `${label}: a number is required` }
  const value = Number(trimmed)
  if (!Number.isFinite(value)) return { ok: false, message: `${label}: "${text.trim()}" is not a number` }
  const si = fromDisplay(value, kind, system)
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
