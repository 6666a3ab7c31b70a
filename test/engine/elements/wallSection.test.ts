import { describe, expect, it } from 'vitest'
import { buildSectionGraph, compositeSection, legsJoin } from '@/engine/elements/wallSection'
import type { SectionLeg } from '@/engine/elements/wallSection'
import { expectRelClose } from '../../helpers/approx'

const leg = (x1: number, y1: number, x2: number, y2: number, t: number): SectionLeg => ({
  p1: { x: x1, y: y1 },
  p2: { x: x2, y: y2 },
  t,
})

/** Channel: web on x = 0 from -h/2 to h/2, flanges of width b towards +x, one thickness. */
const channel = (h: number, b: number, t: number): SectionLeg[] => [
  leg(0, -h / 2, 0, h / 2, t),
  leg(0, h / 2, b, h / 2, t),
  leg(0, -h / 2, b, -h / 2, t),
]

/** Closed rectangular box B x H (centre-lines) from (x0, y0), one thickness. */
const box = (B: number, H: number, t: number, x0 = 0, y0 = 0): SectionLeg[] => [
  leg(x0, y0, x0 + B, y0, t),
  leg(x0 + B, y0, x0 + B, y0 + H, t),
  leg(x0 + B, y0 + H, x0, y0 + H, t),
  leg(x0, y0 + H, x0, y0, t),
]

const turn = (legs: SectionLeg[], angle: number, dx: number, dy: number): SectionLeg[] => {
  const c = Math.cos(angle)
  const s = Math.sin(angle)
  const tp = (p: { x: number; y: number }) => ({ x: c * p.x - s * p.y + dx, y: s * p.x + c * p.y + dy })
  return legs.map((l) => ({ ...l, p1: tp(l.p1), p2: tp(l.p2) }))
}

describe('compositeSection', () => {
  it('gives a single rectangle its in-plane I, shear area and open torsion constant', () => {
    const L = 6
    const t = 0.3
    const s = compositeSection([leg(1, 2, 1 + L, 2, t)])
    // closed form for a rectangle: A = t L, I = t L³/12 in its plane, A_s = 5/6 t L (common practice
    // shear coefficient of a rectangle), J = L t³/3 for a thin strip (Timoshenko & Goodier, from memory)
    expectRelClose(s.area, t * L, 1e-14)
    expectRelClose(s.I1, (t * L ** 3) / 12, 1e-12)
    expect(s.I2).toBeLessThan(1e-12 * s.I1) // thin-walled: no out-of-plane I (as the planar wall)
    expectRelClose(Math.abs(s.d1.x), 1, 1e-12)
    expectRelClose(s.As1, (5 / 6) * t * L, 1e-12)
    expect(s.As2).toBeLessThan(1e-12)
    expectRelClose(s.J, (L * t ** 3) / 3, 1e-12)
    expect(s.shearCentreMethod).toBe('single-line')
    expectRelClose(s.shearCentre.x, 1 + L / 2, 1e-12)
  })

  it('gives an equal-leg angle its principal second moments t a³/3 and t a³/12 at 45° and its shear centre at the corner', () => {
    const a = 3
    const t = 0.2
    const s = compositeSection([leg(0, 0, a, 0, t), leg(0, 0, 0, a, t)])
    // parallel-axis theorem by hand: centroid (a/4, a/4), ∫x² = ∫y² = 5 t a³/24, ∫xy = -t a³/8,
    // principal values 5/24 ± 1/8 → t a³/3 and t a³/12 (hand calculation)
    expectRelClose(s.centroid.x, a / 4, 1e-12)
    expectRelClose(s.Sxx, (5 * t * a ** 3) / 24, 1e-12)
    expectRelClose(s.Sxy, (-t * a ** 3) / 8, 1e-12)
    expectRelClose(s.I1, (t * a ** 3) / 3, 1e-12)
    expectRelClose(s.I2, (t * a ** 3) / 12, 1e-12)
    expectRelClose(Math.abs(s.d1.x), Math.SQRT1_2, 1e-12)
    expect(s.d1.x * s.d1.y).toBeLessThan(0) // the strong direction runs along the diagonal x = -y
    // sections of straight legs meeting in one point shear about that point (standard thin-walled result,
    // e.g. Timoshenko & Gere, Mechanics of Materials, from memory)
    expect(Math.abs(s.shearCentre.x)).toBeLessThan(1e-9)
    expect(Math.abs(s.shearCentre.y)).toBeLessThan(1e-9)
    expectRelClose(s.J, (2 * a * t ** 3) / 3, 1e-12) // Σ b t³/3 for an open section (closed form)
  })

  it('puts a T section shear centre at the junction of web and flange', () => {
    const s = compositeSection([leg(-2, 0, 2, 0, 0.25), leg(0, 0, 0, -3, 0.25)])
    // standard thin-walled result (from memory): legs meeting in one point shear about that point
    expect(Math.hypot(s.shearCentre.x, s.shearCentre.y)).toBeLessThan(1e-9)
    expect(buildSectionGraph([leg(-2, 0, 2, 0, 0.25), leg(0, 0, 0, -3, 0.25)]).pieces).toHaveLength(3)
  })

  it('finds the channel shear centre e = 3b²/(h + 6b) behind the web', () => {
    for (const [h, b] of [
      [1, 0.5],
      [6, 2],
      [4, 4],
    ] as const) {
      const t = 0.02 * h
      const s = compositeSection(channel(h, b, t))
      // channel of one thickness: e = 3 b² / (h + 6 b) from the web centre-line, away from the flanges
      // (Timoshenko & Gere, Mechanics of Materials, shear centre of a channel; from memory)
      expectRelClose(s.shearCentre.x, (-3 * b * b) / (h + 6 * b), 1e-10)
      expect(Math.abs(s.shearCentre.y)).toBeLessThan(1e-10 * h)
      // parallel-axis theorem: I about the strong axis = t h³/12 + 2 b t (h/2)² (hand calculation)
      expectRelClose(s.Syy, (t * h ** 3) / 12 + 2 * b * t * (h / 2) ** 2, 1e-12)
      // Σ b t³/3 for an open section (closed form)
      expectRelClose(s.J, ((h + 2 * b) * t ** 3) / 3, 1e-12)
      expect(s.cells).toBe(0)
    }
  })

  it('moves and turns the channel shear centre with the section', () => {
    const h = 6
    const b = 2
    const e = (3 * b * b) / (h + 6 * b)
    const angle = 0.5
    const s = compositeSection(turn(channel(h, b, 0.2), angle, 10, -4))
    // rigid motion of the section (closed form): the point (-e, 0) goes to R(-e, 0) + (10, -4)
    expectRelClose(s.shearCentre.x, -e * Math.cos(angle) + 10, 1e-10)
    expectRelClose(s.shearCentre.y, -e * Math.sin(angle) - 4, 1e-10)
  })

  it("gives a closed box Bredt's J = 4A²/∮ds/t and its shear centre at the centroid", () => {
    const B = 6
    const H = 4
    const t = 0.3
    for (const legs of [box(B, H, t, 2, 16), turn(box(B, H, t), 0.7, 3, 1)]) {
      const s = compositeSection(legs)
      expect(s.cells).toBe(1)
      expectRelClose(s.cellArea, B * H, 1e-12)
      // Bredt (any mechanics-of-materials text): J = 4 A² / ∮ ds/t with A the enclosed area
      expectRelClose(s.J, (4 * (B * H) ** 2) / ((2 * (B + H)) / t), 1e-12)
      // doubly symmetric closed section: shear centre = centroid (symmetry)
      expect(Math.hypot(s.shearCentre.x - s.centroid.x, s.shearCentre.y - s.centroid.y)).toBeLessThan(1e-9)
    }
    // parallel-axis theorem by hand: I along x = 2 t H³/12 ... for the walls along y plus flanges
    const s = compositeSection(box(B, H, t))
    expectRelClose(s.Sxx, 2 * ((t * B ** 3) / 12) + 2 * t * H * (B / 2) ** 2, 1e-12)
    expectRelClose(s.Syy, 2 * ((t * H ** 3) / 12) + 2 * t * B * (H / 2) ** 2, 1e-12)
  })

  it('finds the cell of a box whose corner is a T joint and adds the open stub', () => {
    const t = 0.25
    // the west wall runs past the south-west corner by 2 m; the box still closes
    const legs = [leg(0, 0, 5, 0, t), leg(5, 0, 5, 3, t), leg(5, 3, 0, 3, t), leg(0, 3, 0, -2, t)]
    const s = compositeSection(legs)
    expect(s.cells).toBe(1)
    // Bredt for the 5 x 3 cell plus Σ b t³/3 for the 2 m stub (closed forms)
    expectRelClose(s.J, (4 * 15 ** 2) / (16 / t) + (2 * t ** 3) / 3, 1e-12)
  })

  it('counts two cells when a middle wall splits a box, and then says the shear centre is the centroid', () => {
    const t = 0.2
    const s = compositeSection([...box(8, 4, t), leg(4, 0, 4, 4, t)])
    expect(s.cells).toBe(2)
    expect(s.shearCentreMethod).toBe('multi-cell-centroid')
    // only one cell counts: Bredt for a 4 x 4 cell (both are equal here) plus the rest as open legs
    expectRelClose(s.J, (4 * 16 ** 2) / (16 / t) + (12 * t ** 3) / 3, 1e-12)
  })

  it('weights the section by the flexure and shear factors', () => {
    const legs = channel(6, 2, 0.3)
    const plain = compositeSection(legs)
    const cracked = compositeSection(legs.map((l) => ({ ...l, flexureFactor: 0.35, shearFactor: 0.5 })))
    // uniform factors scale I and A_s and leave the geometry alone (definition of the factors)
    expectRelClose(cracked.I1, 0.35 * plain.I1, 1e-12)
    expectRelClose(cracked.As1, 0.5 * plain.As1, 1e-12)
    expectRelClose(cracked.J, 0.5 * plain.J, 1e-12)
    expectRelClose(cracked.shearCentre.x, plain.shearCentre.x, 1e-12)
  })
})

describe('legsJoin', () => {
  it('joins ends within half the larger thickness and not beyond', () => {
    const a = leg(0, 0, 5, 0, 0.3)
    expect(legsJoin(a, leg(5.1, 0.1, 5.1, 4, 0.3))).toBe(true) // 0.14 m from the end
    expect(legsJoin(a, leg(5.2, 0.2, 5.2, 4, 0.3))).toBe(false) // 0.28 m > 0.15 m
    expect(legsJoin(a, leg(2, 0.1, 2, 4, 0.3))).toBe(true) // T joint on the line
    expect(legsJoin(a, leg(2, -2, 2, 2, 0.3))).toBe(false) // crossing without an end there
  })
})
