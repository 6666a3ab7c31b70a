import { describe, expect, it } from 'vitest'
import { parseNumericEntry } from '@/editor'
import { normaliseNumericText } from '@/ui/numericText'

describe('normaliseNumericText', () => {
  it('reads "@6<90" as length 6, angle 90 and leaves "6, 0" alone', () => {
    expect(normaliseNumericText('@6<90')).toBe('6, 90')
    expect(normaliseNumericText(' @ 6 < 90 ')).toBe('6, 90')
    expect(normaliseNumericText('6, 0')).toBe('6, 0')
    const r = parseNumericEntry(normaliseNumericText('@6<90'), 'length-angle')
    expect(r.ok && r.event.a).toBe(6)
    // 90° = π/2 rad (closed form).
    expect(r.ok && r.event.b).toBeCloseTo(Math.PI / 2, 15)
  })
})
