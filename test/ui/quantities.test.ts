import { describe, expect, it } from 'vitest'
import { formatQuantity, fromDisplay, implausibility, parseDisplayInput, toDisplay } from '@/ui/quantities'

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
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.message).toMatch(/^Height: "abc" is not a number/)
  })

  it('takes a typed length unit in any length box and converts it to the box', () => {
    // NIST SP 811 Appendix B.8: 1 in = 0.0254 m, 1 ft = 0.3048 m (exact).
    expect(parseDisplayInput('300 mm', 'Thickness', 'thickness', 'SI')).toEqual({ ok: true, value: 0.3 })
    expect(parseDisplayInput('0.3 m', 'Thickness', 'thickness', 'SI')).toEqual({ ok: true, value: 0.3 })
    const inch = parseDisplayInput('12 in', 'Thickness', 'thickness', 'SI')
    expect(inch.ok && inch.value).toBeCloseTo(0.3048, 12)
    const fi = parseDisplayInput('1\'-6"', 'Length', 'length', 'US')
    expect(fi.ok && fi.value).toBeCloseTo(0.4572, 12)
    // A bare number keeps the box's unit: 250 in a mm box is 0.25 m.
    expect(parseDisplayInput('250', 'Thickness', 'thickness', 'SI')).toEqual({ ok: true, value: 0.25 })
  })

  it('refuses a length unit in a box that is not a length', () => {
    const r = parseDisplayInput('3 m', 'Mass', 'mass', 'SI')
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.message).toMatch(/^Mass: a length unit \(m\) does not fit here/)
  })
})

describe('implausibility', () => {
  it('warns of a 0.25 mm wall and accepts a 250 mm one', () => {
    // Usual wall thicknesses 50 mm to 3 m: common practice.
    expect(implausibility(0.00025, 'thickness', 'SI')).toMatch(/^0\.250 mm is unusual for a wall thickness/)
    expect(implausibility(0.25, 'thickness', 'SI')).toBeNull()
    expect(implausibility(5000, 'length', 'SI')).toMatch(/unusual for a length/)
    expect(implausibility(1e6, 'mass', 'SI')).toBeNull()
  })
})
