import { describe, expect, it } from 'vitest'
import { formatQuantity, fromDisplay, parseDisplayInput, toDisplay } from '@/ui/quantities'

describe('toDisplay / fromDisplay', () => {
  it('converts lengths with the exact international foot', () => {
    // 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959; NIST SP 811 App. B)
    expect(toDisplay(0.3048, 'length', 'US')).toBeCloseTo(1, 12)
    expect(toDisplay(30, 'length', 'US')).toBeCloseTo(98.4252, 4)
    expect(fromDisplay(250, 'thickness', 'SI')).toBeCloseTo(0.25, 12)
  })

  it('converts stiffness and modulus with the exact pound-force', () => {
    // 1 lbf = 4.4482216152605 N (NIST SP 811 App. B); 1 kip/in = 175.1268 kN/m
    expect(toDisplay(175126.8, 'stiffness', 'US')).toBeCloseTo(1, 5)
    // 1 ksi = 6.894757 MPa (NIST SP 811 App. B)
    expect(toDisplay(6.894757e6, 'modulus', 'US')).toBeCloseTo(1, 5)
  })

  it('shows area masses as the weight they exert', () => {
    // standard gravity 9.80665 m/s² (CGPM 1901): 1 kN/m² of load is 1000/9.80665 kg/m²
    expect(toDisplay(1000 / 9.80665, 'areaMass', 'SI')).toBeCloseTo(1, 9)
  })
})

describe('formatQuantity', () => {
  it('writes the number with the display unit', () => {
    expect(formatQuantity(0.25, 'thickness', 'SI')).toBe('250 mm')
    expect(formatQuantity(3.048, 'length', 'US')).toBe('10.00 ft')
    expect(formatQuantity(Math.PI / 2, 'angle', 'SI')).toBe('90.0°')
  })
})

describe('parseDisplayInput', () => {
  it('converts a typed value to SI', () => {
    const r = parseDisplayInput('12', 'Thickness', 'thickness', 'US', { min: 0, exclusiveMin: true })
    expect(r.ok).toBe(true)
    if (r.ok) expect(r.value).toBeCloseTo(0.3048, 12)
  })

  it('refuses a value at or below an exclusive minimum, naming the field', () => {
    const r = parseDisplayInput('-200', 'Thickness', 'thickness', 'SI', { min: 0, exclusiveMin: true })
    expect(r).toEqual({ ok: false, message: 'Thickness: must be greater than 0 mm' })
  })

  it('refuses text that is not a number', () => {
    const r = parseDisplayInput('abc', 'Height', 'length', 'SI')
    expect(r).toEqual({ ok: false, message: 'Height: "abc" is not a number' })
  })
})
