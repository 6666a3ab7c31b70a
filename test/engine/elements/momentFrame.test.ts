import { Matrix, inverse, solve } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import { scaleFrame } from '@/engine/balance'
import { buildFrameLineElement } from '@/engine/elements/frameLine'
import { momentFrameStiffness } from '@/engine/elements/momentFrame'
import type { MomentFrameStory } from '@/engine/elements/momentFrame'
import type { FrameLine } from '@/model'
import { expectArrayRelClose, expectRelClose } from '../../helpers/approx'
import { projectBuilder } from '../../helpers/projectBuilder'

const toMatrix = (K: Float64Array, n: number): Matrix =>
  new Matrix(Array.from({ length: n }, (_, i) => Array.from(K.subarray(n * i, n * i + n))))

/**
 * Independent reference: the full plane frame with 3 DOFs per joint (u horizontal, w vertical, θ),
 * every member the 6x6 Euler-Bernoulli frame element WITH its axial term EA/L, rotated to global
 * axes, assembled and solved by ml-matrix. EA is taken very large so axial strains vanish; the lateral
 * flexibility at the left joint of each floor is then compared with the inverse of the condensed
 * matrix. @see McGuire, Gallagher & Ziemian, Matrix Structural Analysis (2000), plane-frame element
 * (from memory); ml-matrix as the reference solver.
 */
function fullFrameFlexibility(
  stories: readonly MomentFrameStory[],
  bays: number,
  L: number,
  baseFixity: 'fixed' | 'pinned',
): Matrix {
  const n = stories.length
  const m = bays + 1
  const node = (level: number, j: number): number => level * m + j
  const ndof = 3 * (n + 1) * m
  const K = Matrix.zeros(ndof, ndof)
  const z = [0]
  for (const s of stories) z.push(z[z.length - 1]! + s.h)
  const member = (a: number, b: number, xa: number, za: number, xb: number, zb: number, EI: number): void => {
    const len = Math.hypot(xb - xa, zb - za)
    const c = (xb - xa) / len
    const s = (zb - za) / len
    const EA = (EI / (len * len)) * 1e8
    const k = EI / len ** 3
    const local = new Matrix([
      [EA / len, 0, 0, -EA / len, 0, 0],
      [0, 12 * k, 6 * k * len, 0, -12 * k, 6 * k * len],
      [0, 6 * k * len, 4 * k * len * len, 0, -6 * k * len, 2 * k * len * len],
      [-EA / len, 0, 0, EA / len, 0, 0],
      [0, -12 * k, -6 * k * len, 0, 12 * k, -6 * k * len],
      [0, 6 * k * len, 2 * k * len * len, 0, -6 * k * len, 4 * k * len * len],
    ])
    const T = Matrix.zeros(6, 6)
    for (const o of [0, 3]) {
      T.set(o, o, c)
      T.set(o, o + 1, s)
      T.set(o + 1, o, -s)
      T.set(o + 1, o + 1, c)
      T.set(o + 2, o + 2, 1)
    }
    const g = T.transpose().mmul(local).mmul(T)
    const dofs = [3 * a, 3 * a + 1, 3 * a + 2, 3 * b, 3 * b + 1, 3 * b + 2]
    for (let i = 0; i < 6; i++) {
      for (let j = 0; j < 6; j++) K.set(dofs[i]!, dofs[j]!, K.get(dofs[i]!, dofs[j]!) + g.get(i, j))
    }
  }
  stories.forEach((s, i) => {
    for (let j = 0; j < m; j++) member(node(i, j), node(i + 1, j), j * L, z[i]!, j * L, z[i + 1]!, s.EIc)
    for (let j = 0; j < bays; j++) member(node(i + 1, j), node(i + 1, j + 1), j * L, z[i + 1]!, (j + 1) * L, z[i + 1]!, s.EIb)
  })
  // supports: base joints fixed in u and w, and in θ for a fixed base
  const free: number[] = []
  for (let d = 0; d < ndof; d++) {
    const isBase = d < 3 * m
    if (isBase && (d % 3 !== 2 || baseFixity === 'fixed')) continue
    free.push(d)
  }
  const Kff = new Matrix(free.map((i) => free.map((j) => K.get(i, j))))
  const F = new Matrix(n, n)
  for (let load = 0; load < n; load++) {
    const rhs = Matrix.zeros(free.length, 1)
    rhs.set(free.indexOf(3 * node(load + 1, 0)), 0, 1)
    const x = solve(Kff, rhs)
    for (let f = 0; f < n; f++) F.set(f, load, x.get(free.indexOf(3 * node(f + 1, 0)), 0))
  }
  return F
}

describe('momentFrameStiffness', () => {
  const E = 30e9

  it('gives 24EI/h³ (fixed) and 6EI/h³ (pinned) for a one-bay portal with a rigid beam', () => {
    // closed form: two fixed-fixed columns 2·12EI/h³; two fixed-pinned columns 2·3EI/h³ (common practice)
    const EI = E * 0.0054
    const h = 3.6
    const rigid = [{ h, EIc: EI, EIb: EI * 1e9 }]
    expectRelClose(momentFrameStiffness(rigid, 1, 6)![0]!, (24 * EI) / h ** 3, 1e-7)
    expectRelClose(momentFrameStiffness(rigid, 1, 6, 'pinned')![0]!, (6 * EI) / h ** 3, 1e-7)
  })

  it('matches the portal closed forms with a flexible beam', () => {
    // closed form (slope-deflection, written out in docs/mechanics.md §4), ρ = (Ib/L)/(Ic/h):
    // fixed feet k = 24EIc/h³ · (1 + 6ρ)/(4 + 6ρ); pinned feet k = 6EIc/h³ · 2ρ/(1 + 2ρ)
    const h = 4
    const L = 7
    const EIc = E * 0.0054
    const EIb = E * 0.0081
    const rho = EIb / L / (EIc / h)
    const fixed = momentFrameStiffness([{ h, EIc, EIb }], 1, L)![0]!
    const pinned = momentFrameStiffness([{ h, EIc, EIb }], 1, L, 'pinned')![0]!
    expectRelClose(fixed, ((24 * EIc) / h ** 3) * ((1 + 6 * rho) / (4 + 6 * rho)), 1e-12)
    expectRelClose(pinned, ((6 * EIc) / h ** 3) * ((2 * rho) / (1 + 2 * rho)), 1e-12)
    // and the fixed-base form against the independent full frame
    expectRelClose(1 / fullFrameFlexibility([{ h, EIc, EIb }], 1, L, 'fixed').get(0, 0), fixed, 1e-6)
  })

  it.each(['fixed', 'pinned'] as const)(
    'equals an independent full plane frame with axial terms (ml-matrix), %s feet',
    (fixity) => {
      // reference: full frame assembled and solved by ml-matrix, EA = 1e8·EI/L² (axially near-rigid)
      const stories: MomentFrameStory[] = [
        { h: 4.5, EIc: E * 0.0108, EIb: E * 0.0125 },
        { h: 3.4, EIc: E * 0.0108, EIb: E * 0.0125 },
        { h: 3.4, EIc: E * 0.0085, EIb: E * 0.0104 },
        { h: 3.4, EIc: E * 0.0085, EIb: E * 0.0104 },
        { h: 3.4, EIc: E * 0.0054, EIb: E * 0.0081 },
      ]
      const K = momentFrameStiffness(stories, 3, 6.5, fixity)!
      const F = inverse(toMatrix(K, 5))
      const ref = fullFrameFlexibility(stories, 3, 6.5, fixity)
      expectArrayRelClose(F.to1DArray(), ref.to1DArray(), 2e-6)
    },
  )

  it('orders rotations either way (more bays than levels) with the same answer as the full frame', () => {
    // reference: full frame by ml-matrix (as above); 6 bays over 2 stories runs the other band order
    const stories: MomentFrameStory[] = [
      { h: 3.8, EIc: E * 0.004, EIb: E * 0.006 },
      { h: 3.2, EIc: E * 0.004, EIb: E * 0.006 },
    ]
    const F = inverse(toMatrix(momentFrameStiffness(stories, 6, 5)!, 2))
    expectArrayRelClose(F.to1DArray(), fullFrameFlexibility(stories, 6, 5, 'fixed').to1DArray(), 2e-6)
  })

  it('is much stiffer at the first story than the equal-joint-rotation formula says', () => {
    // closed form comparison: 5 equal stories, fixed feet; story stiffness at story 1 from the
    // condensed frame under an inverted-triangle load vs 12E/(h²(1/ΣKc + 1/ΣKb)) (docs/mechanics.md §4)
    const h = 3.5
    const L = 6
    const EIc = E * 0.0054
    const EIb = E * 0.0054
    const stories = Array.from({ length: 5 }, () => ({ h, EIc, EIb }))
    const K = toMatrix(momentFrameStiffness(stories, 3, L)!, 5)
    const load = Matrix.columnVector([1, 2, 3, 4, 5])
    const u = solve(K, load)
    const k1 = 15 / u.get(0, 0)
    const sumKc = (4 * EIc) / h
    const sumKb = (3 * EIb) / L
    const formula = (12 * 1) / (h * h * (1 / sumKc + 1 / sumKb))
    expect(k1 / formula).toBeGreaterThan(1.2)
  })
})

describe('buildFrameLineElement (moment frame)', () => {
  it('applies the column and beam factors and per-story overrides to E·I', () => {
    // reference: momentFrameStiffness with hand-multiplied E·f·I (E = 30 GPa, concrete in the builder)
    const p = projectBuilder({ floors: [{ height: 4.5 }, { height: 3.2 }] })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 24, y: 0 },
        stiffness: {
          kind: 'moment',
          bays: 4,
          bayWidth: 6,
          columnI: 0.0108,
          beamI: 0.01143,
          material: 'concrete',
          columnFactor: 0.6,
          beamFactor: 0.3,
          stories: { L2: { columnI: 0.0085 } },
        },
      })
      .build()
    const { element, issues } = buildFrameLineElement(p, p.frameLines.m as FrameLine)
    expect(issues).toHaveLength(0)
    const expected = momentFrameStiffness(
      [
        { h: 4.5, EIc: 30e9 * 0.6 * 0.0108, EIb: 30e9 * 0.3 * 0.01143 },
        { h: 3.2, EIc: 30e9 * 0.6 * 0.0085, EIb: 30e9 * 0.3 * 0.01143 },
      ],
      4,
      6,
    )!
    expectArrayRelClose(element!.stiffness, expected, 1e-14)
    expect(element!.isShearType).toBe(false)
  })

  it('uses the ACI 318-19 factors 0.70 (columns) and 0.35 (beams) when none are given', () => {
    // ACI 318-19 Table 6.6.3.1.1(a): columns 0.70 Ig, beams 0.35 Ig (METHODS.md §6)
    const p = projectBuilder({ floors: 1, height: 4 })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 6, y: 0 },
        stiffness: { kind: 'moment', bays: 1, bayWidth: 6, columnI: 0.0054, beamI: 0.0081, material: 'concrete' },
      })
      .build()
    const k = buildFrameLineElement(p, p.frameLines.m as FrameLine).element!.stiffness[0]!
    const EIc = 30e9 * 0.7 * 0.0054
    const rho = (30e9 * 0.35 * 0.0081) / 6 / (EIc / 4)
    // portal closed form with fixed feet (docs/mechanics.md §4)
    expectRelClose(k, ((24 * EIc) / 64) * ((1 + 6 * rho) / (4 + 6 * rho)), 1e-12)
  })

  it('reports a bad per-story value by floor instead of building', () => {
    const p = projectBuilder({ floors: 2 })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 6, y: 0 },
        stiffness: {
          kind: 'moment',
          bays: 1,
          bayWidth: 6,
          columnI: 0.0054,
          beamI: 0.0081,
          material: 'concrete',
          stories: { L2: { beamI: 0 } },
        },
      })
      .build()
    const { element, issues } = buildFrameLineElement(p, p.frameLines.m as FrameLine)
    expect(element).toBeNull()
    expect(issues[0]?.message).toContain('L2')
  })
})

describe('scaleFrame (balance assistant) on a moment frame', () => {
  it('scales per-story overrides too, so the condensed stiffness scales by exactly f', () => {
    // linear algebra: K_uu - K_uθ K_θθ⁻¹ K_θu is homogeneous of degree 1 in the member E·I
    const p = projectBuilder({ floors: 3 })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 12, y: 0 },
        stiffness: {
          kind: 'moment',
          bays: 2,
          bayWidth: 6,
          columnI: 0.0054,
          beamI: 0.0081,
          material: 'concrete',
          stories: { L3: { columnI: 0.003, beamI: 0.004 } },
        },
      })
      .build()
    const frame = p.frameLines.m as FrameLine
    const K = buildFrameLineElement(p, frame).element!.stiffness
    const scaled = { ...frame, stiffness: scaleFrame(frame.stiffness, 1.5) }
    const K2 = buildFrameLineElement(p, scaled).element!.stiffness
    expectArrayRelClose(K2, Array.from(K, (v) => 1.5 * v), 1e-12)
  })
})
