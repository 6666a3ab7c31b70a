import { describe, expect, it } from 'vitest'
import { numericOffset, parseNumericEntry } from '@/editor'

describe('parseNumericEntry', () => {
  it('reads "length,angle" with the angle in degrees', () => {
    const r = parseNumericEntry(' 5, 30 ', 'length-angle')
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.event.a).toBeCloseTo(5, 12)
    expect(r.event.b).toBeCloseTo(Math.PI / 6, 12)
    const d = numericOffset(r.event)
    expect(d.x).toBeCloseTo(5 * Math.cos(Math.PI / 6), 12)
    expect(d.y).toBeCloseTo(2.5, 12)
  })

  it('reads "dx;dy" and "dx dy" offsets, converting feet to metres (1 ft = 0.3048 m exactly)', () => {
    const r = parseNumericEntry('10 -20', 'offset', 0.3048)
    expect(r.ok && r.event.a).toBeCloseTo(3.048, 12)
    expect(r.ok && r.event.b).toBeCloseTo(-6.096, 12)
    const s = parseNumericEntry('3;4', 'offset')
    expect(s.ok && numericOffset(s.event).y).toBeCloseTo(4, 12)
  })

  it('refuses text that is not two numbers and a length <= 0, with a message', () => {
    const a = parseNumericEntry('abc', 'offset')
    expect(a.ok ? '' : a.message).toContain('expected two numbers "dx,dy"')
    const b = parseNumericEntry('x,1', 'length-angle')
    expect(b.ok ? '' : b.message).toContain('is not two numbers "length,angle"')
    const c = parseNumericEntry('0,45', 'length-angle')
    expect(c.ok ? '' : c.message).toContain('length must be > 0, got 0')
  })
})
