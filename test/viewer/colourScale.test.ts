import { describe, expect, it } from 'vitest'
import { legendTicks, normalizeToMax, RAMP, rampColour, rampHex, responseMeasures } from '@/viewer/colourScale'

const square = [
  { x: -5, y: -5 },
  { x: 5, y: -5 },
  { x: 5, y: 5 },
  { x: -5, y: 5 },
]

describe('rampColour', () => {
  it('maps 0, 0.5 and 1 onto the first, middle and last stops of the ramp', () => {
    const first = RAMP[0]!
    const mid = RAMP[2]!
    const last = RAMP[4]!
    expect(rampColour(0).map((c) => c * 255)).toEqual(first.map((c) => expect.closeTo(c, 9)))
    expect(rampColour(0.5).map((c) => c * 255)).toEqual(mid.map((c) => expect.closeTo(c, 9)))
    expect(rampColour(1).map((c) => c * 255)).toEqual(last.map((c) => expect.closeTo(c, 9)))
  })

  it('interpolates linearly between stops and clamps outside 0..1 and NaN', () => {
    const a = RAMP[0]!
    const b = RAMP[1]!
    const c = rampColour(0.125)
    expect(c[0] * 255).toBeCloseTo((a[0] + b[0]) / 2, 9)
    expect(rampColour(-3)).toEqual(rampColour(0))
    expect(rampColour(7)).toEqual(rampColour(1))
    expect(rampColour(Number.NaN)).toEqual(rampColour(0))
  })

  it('gives CSS hex of the stops', () => {
    expect(rampHex(0)).toBe('#2b3a55')
    expect(rampHex(1)).toBe('#a8322a')
  })
})

describe('responseMeasures', () => {
  it('gives displacements and story drift ratios of a translation profile', () => {
    // Hand calculation: drifts 1, 1, 1 over heights 4, 2, 1 -> ratios 0.25, 0.5, 1.
    const dofs = [1, 2, 3].map((u) => ({ ux: u, uy: 0, theta: 0 }))
    const m = responseMeasures(dofs, [square, square, square], [4, 2, 1])
    expect(m.displacement.map((v) => v)).toEqual([expect.closeTo(1, 12), expect.closeTo(2, 12), expect.closeTo(3, 12)])
    expect(m.driftRatio).toEqual([expect.closeTo(0.25, 12), expect.closeTo(0.5, 12), expect.closeTo(1, 12)])
  })

  it('takes the drift of a turning floor at its farthest corner', () => {
    // Turn about the centre by 0.01 and 0.03: corner radius 5*sqrt(2); drift of story 2 is 0.02*r.
    const dofs = [0.01, 0.03].map((t) => ({ ux: 0, uy: 0, theta: t }))
    const m = responseMeasures(dofs, [square, square], [3, 3])
    const r = 5 * Math.SQRT2
    expect(m.displacement[1]).toBeCloseTo(0.03 * r, 12)
    expect(m.driftRatio[1]).toBeCloseTo((0.02 * r) / 3, 12)
  })
})

describe('normalizeToMax', () => {
  it('divides by the largest magnitude and keeps all-zero at zero', () => {
    expect(normalizeToMax([1, -4, 2])).toEqual([0.25, 1, 0.5])
    expect(normalizeToMax([0, 0])).toEqual([0, 0])
  })
})

describe('legendTicks', () => {
  it('spreads values evenly from 0 to the maximum', () => {
    const t = legendTicks(0.004, 5)
    expect(t.map((x) => x.t)).toEqual([0, 0.25, 0.5, 0.75, 1])
    expect(t[4]!.value).toBeCloseTo(0.004, 12)
    expect(t[2]!.value).toBeCloseTo(0.002, 12)
  })
})
