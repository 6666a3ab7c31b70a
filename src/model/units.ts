/**
 * Units for display and input. The model and the engine are always SI base units (m, kg, N, s, Pa,
 * rad); these helpers convert only at the edges (forms, tables, reports, CLI).
 * Exact factors: 1 ft = 0.3048 m and 1 in = 0.0254 m (exact by definition), 1 lbf = 4.4482216152605 N
 * (exact, from the pound-mass and standard gravity), g = 9.80665 m/s² (exact, standard gravity).
 * @see NIST Special Publication 811 (2008), Appendix B.8 and B.9, for the factors.
 */

/** Unit systems for display and input; the model itself is always SI. */
export type UnitSystem = 'SI' | 'US'

/** The unit systems in menu order. */
export const UNIT_SYSTEMS: readonly UnitSystem[] = ['SI', 'US']

/** What a number measures; each has an SI storage unit and one display unit per system. */
export type Quantity =
  | 'length'
  | 'thickness'
  | 'displacement'
  | 'sectionArea'
  | 'force'
  | 'moment'
  | 'mass'
  | 'polarInertia'
  | 'stiffness'
  | 'rotationalStiffness'
  | 'modulus'
  | 'areaMass'
  | 'lineMass'
  | 'area'
  | 'inertia'
  | 'period'
  | 'frequency'
  | 'angularFrequency'
  | 'angle'
  | 'rotation'
  | 'acceleration'
  | 'ratio'

/** Standard acceleration of gravity, m/s² (exact). @see NIST SP 811, B.8 "standard gravity" */
export const STANDARD_GRAVITY = 9.80665
/** International foot, m (exact). @see NIST SP 811, B.8 */
export const FOOT = 0.3048
/** Inch, m (exact). @see NIST SP 811, B.8 */
export const INCH = 0.0254
/** Pound-force, N (exact: 0.45359237 kg x 9.80665 m/s²). @see NIST SP 811, B.8 */
export const POUND_FORCE = 4.4482216152605
/** Kip (1000 lbf), N. */
export const KIP = 1000 * POUND_FORCE

interface UnitDef {
  /** Display label. */
  readonly label: string
  /** SI value = display value x factor. */
  readonly factor: number
}

type Table = Readonly<Record<Quantity, { readonly storage: string; readonly SI: UnitDef; readonly US: UnitDef }>>

const RAD_PER_DEG = Math.PI / 180

/**
 * Display units. Masses in US customary are shown as kip·s²/in (the consistent unit with kip and in);
 * area and line masses are shown as the weight they exert under standard gravity (kN/m², psf, kN/m,
 * kip/ft), as engineers enter them.
 */
const UNITS: Table = {
  length: { storage: 'm', SI: { label: 'm', factor: 1 }, US: { label: 'ft', factor: FOOT } },
  thickness: { storage: 'm', SI: { label: 'mm', factor: 1e-3 }, US: { label: 'in', factor: INCH } },
  displacement: { storage: 'm', SI: { label: 'mm', factor: 1e-3 }, US: { label: 'in', factor: INCH } },
  sectionArea: { storage: 'm²', SI: { label: 'cm²', factor: 1e-4 }, US: { label: 'in²', factor: INCH * INCH } },
  force: { storage: 'N', SI: { label: 'kN', factor: 1e3 }, US: { label: 'kip', factor: KIP } },
  moment: { storage: 'N·m', SI: { label: 'kN·m', factor: 1e3 }, US: { label: 'kip·ft', factor: KIP * FOOT } },
  mass: { storage: 'kg', SI: { label: 't', factor: 1e3 }, US: { label: 'kip·s²/in', factor: KIP / INCH } },
  polarInertia: {
    storage: 'kg·m²',
    SI: { label: 't·m²', factor: 1e3 },
    US: { label: 'kip·s²·in', factor: KIP * INCH },
  },
  stiffness: { storage: 'N/m', SI: { label: 'kN/m', factor: 1e3 }, US: { label: 'kip/in', factor: KIP / INCH } },
  rotationalStiffness: {
    storage: 'N·m/rad',
    SI: { label: 'kN·m/rad', factor: 1e3 },
    US: { label: 'kip·in/rad', factor: KIP * INCH },
  },
  modulus: { storage: 'Pa', SI: { label: 'GPa', factor: 1e9 }, US: { label: 'ksi', factor: KIP / (INCH * INCH) } },
  areaMass: {
    storage: 'kg/m²',
    SI: { label: 'kN/m²', factor: 1e3 / STANDARD_GRAVITY },
    US: { label: 'psf', factor: POUND_FORCE / (FOOT * FOOT) / STANDARD_GRAVITY },
  },
  lineMass: {
    storage: 'kg/m',
    SI: { label: 'kN/m', factor: 1e3 / STANDARD_GRAVITY },
    US: { label: 'kip/ft', factor: KIP / FOOT / STANDARD_GRAVITY },
  },
  area: { storage: 'm²', SI: { label: 'm²', factor: 1 }, US: { label: 'ft²', factor: FOOT * FOOT } },
  inertia: { storage: 'm⁴', SI: { label: 'm⁴', factor: 1 }, US: { label: 'in⁴', factor: INCH ** 4 } },
  period: { storage: 's', SI: { label: 's', factor: 1 }, US: { label: 's', factor: 1 } },
  frequency: { storage: 'Hz', SI: { label: 'Hz', factor: 1 }, US: { label: 'Hz', factor: 1 } },
  angularFrequency: { storage: 'rad/s', SI: { label: 'rad/s', factor: 1 }, US: { label: 'rad/s', factor: 1 } },
  angle: { storage: 'rad', SI: { label: '°', factor: RAD_PER_DEG }, US: { label: '°', factor: RAD_PER_DEG } },
  rotation: { storage: 'rad', SI: { label: 'mrad', factor: 1e-3 }, US: { label: 'mrad', factor: 1e-3 } },
  acceleration: {
    storage: 'm/s²',
    SI: { label: 'g', factor: STANDARD_GRAVITY },
    US: { label: 'g', factor: STANDARD_GRAVITY },
  },
  ratio: { storage: '-', SI: { label: '', factor: 1 }, US: { label: '', factor: 1 } },
}

/** All quantities, for menus and tests. */
export const QUANTITIES = Object.keys(UNITS) as readonly Quantity[]

function unit(quantity: Quantity, system: UnitSystem): UnitDef {
  const entry = UNITS[quantity]
  if (!entry) throw new TypeError(`[units] unknown quantity ${String(quantity)}`)
  const def = entry[system]
  if (!def) throw new TypeError(`[units] unknown unit system ${String(system)}`)
  return def
}

/** The SI storage unit of a quantity (what the model holds), e.g. 'N/m'. */
export function storageUnit(quantity: Quantity): string {
  const entry = UNITS[quantity]
  if (!entry) throw new TypeError(`[units] unknown quantity ${String(quantity)}`)
  return entry.storage
}

/** Display value of an SI value, e.g. toDisplay(0.3048, 'length', 'US') = 1 (ft). */
export function toDisplay(valueSI: number, quantity: Quantity, system: UnitSystem): number {
  return valueSI / unit(quantity, system).factor
}

/** SI value of a display value, the inverse of toDisplay: fromDisplay(1, 'length', 'US') = 0.3048 (m). */
export function fromDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  return value * unit(quantity, system).factor
}

/** Display unit label, e.g. 'kip/in'; '' for pure ratios. */
export function unitLabel(quantity: Quantity, system: UnitSystem): string {
  return unit(quantity, system).label
}

/**
 * A number for display with `digits` significant digits (default 4), trailing zeros dropped,
 * exponent notation only below 1e-4 or from 1e9 on in magnitude. Non-finite values print as '-'.
 */
export function formatNumber(value: number, digits = 4): string {
  if (!Number.isFinite(value)) return '-'
  if (value === 0) return '0'
  const d = Math.max(1, Math.min(15, Math.round(digits)))
  const abs = Math.abs(value)
  if (abs < 1e-4 || abs >= 1e9) {
    const [mantissa, exponent] = value.toExponential(d - 1).split('e')
    return `${trimZeros(mantissa ?? '')}e${exponent ?? ''}`
  }
  const magnitude = Math.floor(Math.log10(abs))
  const decimals = Math.max(0, d - 1 - magnitude)
  const text = value.toFixed(Math.min(20, decimals))
  return text === '-0' ? '0' : trimZeros(text)
}

function trimZeros(text: string): string {
  if (!text.includes('.')) return text
  return text.replace(/\.?0+$/, '')
}

/** An SI value in a system's display unit with its label, e.g. formatQuantity(4448.2, 'force', 'US') = '1 kip'. */
export function formatQuantity(valueSI: number, quantity: Quantity, system: UnitSystem, digits = 4): string {
  const label = unitLabel(quantity, system)
  const text = formatNumber(toDisplay(valueSI, quantity, system), digits)
  if (label === '') return text
  return label === '°' ? `${text}°` : `${text} ${label}`
}

/** Length units a typed entry may carry, metres per unit (NIST SP 811 Appendix B.8; ft and in exact). */
export const LENGTH_UNITS: Readonly<Record<string, number>> = {
  mm: 0.001,
  cm: 0.01,
  m: 1,
  in: INCH,
  '"': INCH,
  ft: FOOT,
  "'": FOOT,
}

/** A typed number: `si` is set when the text named its own length unit (then in metres). */
export type TypedNumber =
  | { readonly ok: true; readonly number: number; readonly si: number | null; readonly unit: string | null }
  | { readonly ok: false; readonly message: string }

const NUM = '([-+]?(?:\\d+(?:[.,]\\d*)?|[.,]\\d+)(?:[eE][-+]?\\d+)?)'
const FEET_INCHES = new RegExp(`^${NUM}\\s*(?:'|ft)\\s*-?\\s*${NUM}\\s*(?:"|in)$`)
const WITH_UNIT = new RegExp(`^${NUM}\\s*(mm|cm|m|in|ft|"|')$`, 'i')
const PLAIN = new RegExp(`^${NUM}$`)
const toNumber = (s: string): number => Number(s.replace(',', '.'))

/**
 * Read a number typed into a box, with an optional length unit: "0.25", "300 mm", "0.3 m", "12 in",
 * "2.5 ft", "6'", "1'-6\"" or "1' 6\"" (feet and inches). A decimal comma is read as a point. Without a
 * unit the number is returned as typed (the box's own unit applies); with one, `si` is in metres.
 *
 * @see NIST Special Publication 811 (2008), Appendix B.8: 1 ft = 0.3048 m, 1 in = 0.0254 m (exact).
 */
export function parseTypedNumber(text: string): TypedNumber {
  const t = text.trim().replace(/\u2032/g, "'").replace(/\u2033/g, '"')
  if (t === '') return { ok: false, message: 'a number is required' }
  const plain = PLAIN.exec(t)
  if (plain?.[1] !== undefined) {
    const n = toNumber(plain[1])
    return Number.isFinite(n) ? { ok: true, number: n, si: null, unit: null } : { ok: false, message: `"${t}" is not a number` }
  }
  const fi = FEET_INCHES.exec(t)
  if (fi?.[1] !== undefined && fi[2] !== undefined) {
    const feet = toNumber(fi[1])
    const inches = toNumber(fi[2])
    if (!Number.isFinite(feet) || !Number.isFinite(inches) || inches < 0) return { ok: false, message: `"${t}" is not a feet-and-inches length` }
    const sign = fi[1].trim().startsWith('-') ? -1 : 1
    const si = feet * FOOT + sign * inches * INCH
    return { ok: true, number: si, si, unit: 'ft-in' }
  }
  const wu = WITH_UNIT.exec(t)
  if (wu?.[1] !== undefined && wu[2] !== undefined) {
    const unit = wu[2].toLowerCase()
    const factor = LENGTH_UNITS[unit]
    const n = toNumber(wu[1])
    if (factor === undefined || !Number.isFinite(n)) return { ok: false, message: `"${t}" is not a number with a unit` }
    return { ok: true, number: n, si: n * factor, unit }
  }
  return { ok: false, message: `"${t}" is not a number (units understood: mm, cm, m, in, ft, and 1'-6")` }
}
