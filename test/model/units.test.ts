import { describe, expect, it } from 'vitest'
import {
  FOOT,
  INCH,
  KIP,
  POUND_FORCE,
  QUANTITIES,
  STANDARD_GRAVITY,
  formatNumber,
  formatQuantity,
  fromDisplay,
  parseTypedNumber,
  toDisplay,
  unitLabel,
} from '@/model/units'
import type { UnitSystem } from '@/model/units'
import { expectRelClose } from '../helpers/approx'

describe('conversion constants', () => {
  it('match the exact values of NIST SP 811 Appendix B', () => {
    // NIST SP 811 (2008) B.8: foot = 3.048 E-01 m, inch = 2.54 E-02 m (exact)
    expect(FOOT).toBe(0.3048)
    expect(INCH).toBe(0.0254)
    // NIST SP 811 B.8: pound-force = 4.448 222 E+00 N; exact value 0.45359237 kg x 9.80665 m/s²
    expectRelClose(POUND_FORCE, 0.45359237 * 9.80665, 1e-15)
    expectRelClose(POUND_FORCE, 4.4482216152605, 1e-15)
    // NIST SP 811 B.8: kip (1000 lbf) = 4.448 222 E+03 N
    expectRelClose(KIP, 4448.2216152605, 1e-15)
    // NIST SP 811 B.8: standard acceleration of gravity g_n = 9.806 65 m/s² (exact)
    expect(STANDARD_GRAVITY).toBe(9.80665)
  })
})

describe('toDisplay', () => {
  it('converts SI values to the published US factors', () => {
    // NIST SP 811 B.8 / B.9 factors:
    expectRelClose(toDisplay(0.3048, 'length', 'US'), 1, 1e-15) // 1 ft
    expectRelClose(toDisplay(0.0254, 'thickness', 'US'), 1, 1e-15) // 1 in
    expectRelClose(toDisplay(4448.2216152605, 'force', 'US'), 1, 1e-15) // 1 kip
    // ksi = 6.894 757 E+06 Pa (NIST SP 811 B.8, "kip per square inch")
    expectRelClose(toDisplay(6.894757293168e6, 'modulus', 'US'), 1, 1e-12)
    // psf = 4.788 026 E+01 Pa (NIST SP 811 B.8, "pound-force per square foot"), as mass under g_n
    expectRelClose(toDisplay(47.88025898033584 / 9.80665, 'areaMass', 'US'), 1, 1e-12)
    // kip/in = 1.751 268 E+05 N/m (NIST SP 811 B.8, "pound-force per inch" x 1000)
    expectRelClose(toDisplay(1.751268352e5, 'stiffness', 'US'), 1, 1e-9)
    // in⁴ = 4.162 314 E-07 m⁴ (NIST SP 811 B.8, "inch to the fourth power")
    expectRelClose(toDisplay(4.162314256e-7, 'inertia', 'US'), 1, 1e-9)
    // ft² = 9.290 304 E-02 m² (exact)
    expectRelClose(toDisplay(0.09290304, 'area', 'US'), 1, 1e-15)
  })

  it('converts SI values to the SI display units', () => {
    expect(toDisplay(32e9, 'modulus', 'SI')).toBeCloseTo(32, 12) // GPa
    expect(toDisplay(0.3, 'thickness', 'SI')).toBeCloseTo(300, 10) // mm
    expect(toDisplay(1000, 'mass', 'SI')).toBeCloseTo(1, 12) // t
    // 1 kN/m² of load is 1000 / g_n kg/m² of mass (definition of weight, g_n from NIST SP 811)
    expect(toDisplay(1000 / 9.80665, 'areaMass', 'SI')).toBeCloseTo(1, 12)
    expect(toDisplay(Math.PI, 'angle', 'SI')).toBeCloseTo(180, 12) // degrees
    expect(toDisplay(9.80665, 'acceleration', 'US')).toBeCloseTo(1, 14) // g
  })
})

describe('fromDisplay', () => {
  it('inverts toDisplay for every quantity and system (round trip)', () => {
    const values = [1e-9, 0.0123, 1, 3.7, 4.5e5, 2.1e11, -17.25]
    for (const q of QUANTITIES) {
      for (const system of ['SI', 'US'] as UnitSystem[]) {
        for (const v of values) {
          expectRelClose(fromDisplay(toDisplay(v, q, system), q, system), v, 1e-14)
          expectRelClose(toDisplay(fromDisplay(v, q, system), q, system), v, 1e-14)
        }
      }
    }
  })

  it('takes 12 in to 1 ft through SI (1 ft = 12 in exactly, NIST SP 811 B.8)', () => {
    const m = fromDisplay(12, 'thickness', 'US')
    expectRelClose(toDisplay(m, 'length', 'US'), 1, 1e-15)
  })

  it('throws a TypeError for an unknown quantity (a programmer error)', () => {
    expect(() => fromDisplay(1, 'speed' as never, 'SI')).toThrow('[units] unknown quantity speed')
  })
})

describe('unitLabel', () => {
  it('gives the SI and US labels', () => {
    expect(unitLabel('stiffness', 'SI')).toBe('kN/m')
    expect(unitLabel('stiffness', 'US')).toBe('kip/in')
    expect(unitLabel('areaMass', 'SI')).toBe('kN/m²')
    expect(unitLabel('areaMass', 'US')).toBe('psf')
    expect(unitLabel('modulus', 'US')).toBe('ksi')
    expect(unitLabel('ratio', 'SI')).toBe('')
    for (const q of QUANTITIES) if (q !== 'ratio') expect(unitLabel(q, 'US').length).toBeGreaterThan(0)
  })
})

describe('formatNumber', () => {
  it('rounds to significant digits and drops trailing zeros', () => {
    expect(formatNumber(3.14159, 3)).toBe('3.14')
    expect(formatNumber(32, 4)).toBe('32')
    expect(formatNumber(123456, 4)).toBe('123456')
    expect(formatNumber(0.000123456, 3)).toBe('0.000123')
    expect(formatNumber(2.5e-7, 3)).toBe('2.5e-7')
    expect(formatNumber(-0.00001, 2)).toBe('-1e-5')
    expect(formatNumber(Number.NaN)).toBe('-')
    expect(formatNumber(-0.00004, 1)).toBe('-4e-5')
  })
})

describe('formatQuantity', () => {
  it('formats with the unit of the system', () => {
    expect(formatQuantity(4448.2216152605, 'force', 'US')).toBe('1 kip')
    expect(formatQuantity(0.3048 * 12.5, 'length', 'US')).toBe('12.5 ft')
    expect(formatQuantity(0.25, 'thickness', 'SI')).toBe('250 mm')
    expect(formatQuantity(Math.PI / 6, 'angle', 'SI')).toBe('30°')
    expect(formatQuantity(1.2345, 'ratio', 'SI', 3)).toBe('1.23')
  })
})

describe('parseTypedNumber', () => {
  it('reads numbers with and without a unit into metres with the NIST SP 811 factors', () => {
    // NIST SP 811 (2008) Appendix B.8: 1 in = 0.0254 m and 1 ft = 0.3048 m exactly; mm, cm by SI prefix.
    const si = (t: string): number | null => {
      const r = parseTypedNumber(t)
      return r.ok ? r.si : Number.NaN
    }
    expect(si('300 mm')).toBeCloseTo(0.3, 15)
    expect(si('30cm')).toBeCloseTo(0.3, 15)
    expect(si('0.3 m')).toBe(0.3)
    expect(si('12 in')).toBeCloseTo(0.3048, 15)
    expect(si('12"')).toBeCloseTo(0.3048, 15)
    expect(si('2.5 ft')).toBeCloseTo(0.762, 15)
    expect(si("6'")).toBeCloseTo(1.8288, 15)
    expect(si("1'-6\"")).toBeCloseTo(0.4572, 15)
    expect(si("1' 6\"")).toBeCloseTo(0.4572, 15)
    expect(si('1 ft 6 in')).toBeCloseTo(0.4572, 15)
    expect(si('0,25 m')).toBe(0.25)
    expect(si('0.25')).toBeNull()
    const bare = parseTypedNumber(' 0,25 ')
    expect(bare.ok && bare.number).toBe(0.25)
  })

  it('refuses text that is no number or carries an unknown unit, naming what it understands', () => {
    for (const t of ['', 'abc', '3 kg', '1\'-"', '--2', '1..2 m']) {
      const r = parseTypedNumber(t)
      expect(r.ok, t).toBe(false)
    }
    const r = parseTypedNumber('3 yd')
    expect(!r.ok && r.message).toMatch(/units understood: mm, cm, m, in, ft/)
  })
})
