import { Matrix, inverse } from 'ml-matrix'
import { describe, expect, it } from 'vitest'
import {
  bracedFrameStoryStiffness,
  buildFrameLineElement,
  momentFrameStoryStiffness,
  shearChainStiffness,
} from '@/engine/elements/frameLine'
import { momentFrameStiffness } from '@/engine/elements/momentFrame'
import type { FrameLine } from '@/model'
import { expectArrayRelClose, expectRelClose } from '../../helpers/approx'
import { projectBuilder } from '../../helpers/projectBuilder'

describe('momentFrameStoryStiffness', () => {
  it('matches a hand calculation of the equal-joint-rotation formula', () => {
    // Hand calculation: E = 200 GPa, 3 bays of 6 m, Ic = 1e-4 m⁴, Ib = 2e-4 m⁴, h = 3.5 m:
    // ΣKc = 4·1e-4/3.5 = 1.142857e-4 m³, ΣKb = 3·2e-4/6 = 1.0e-4 m³,
    // k = 12·200e9 / (3.5² · (1/1.142857e-4 + 1/1.0e-4)) = 2.4e12 / (12.25 · 18750) = 1.044898e7 N/m
    expectRelClose(momentFrameStoryStiffness(200e9, 3, 6, 1e-4, 2e-4, 3.5), 2.4e12 / (12.25 * 18750), 1e-12)
  })

  it('tends to fixed-fixed columns 12 E ΣIc / h³ for rigid beams', () => {
    // closed form: a fixed-fixed column sways with 12EI/h³ (common practice)
    const k = momentFrameStoryStiffness(30e9, 4, 6, 0.0108, 1e6, 3.2)
    expectRelClose(k, (12 * 30e9 * 5 * 0.0108) / 3.2 ** 3, 1e-6)
  })
})

describe('bracedFrameStoryStiffness', () => {
  it('matches a hand calculation of braces E A cos²α / L_d', () => {
    // Hand calculation: 2 braces, E = 200 GPa, A = 4.2e-3 m², bay 6 m, h = 3.2 m:
    // L_d = sqrt(36 + 10.24) = 6.8 m, cos α = 6/6.8 = 0.882353,
    // k = 2 · 200e9 · 4.2e-3 · (36/46.24) / 6.8 = 6.048e10 / 314.432 = 1.923468e8 N/m
    expectRelClose(bracedFrameStoryStiffness(200e9, 2, 6, 4.2e-3, 3.2), 6.048e10 / 314.432, 1e-12)
  })
})

describe('shearChainStiffness', () => {
  it('has the shear-building flexibility f_ij = Σ_{s <= min(i,j)} 1/k_s', () => {
    // closed form: springs in series from the base to the lower of the two floors
    const k = [5e8, 4e8, 3e8, 2e8]
    const K = shearChainStiffness(k)
    const F = inverse(new Matrix(Array.from({ length: 4 }, (_, i) => Array.from(K.subarray(4 * i, 4 * i + 4)))))
    for (let i = 0; i < 4; i++) {
      for (let j = 0; j < 4; j++) {
        let f = 0
        for (let s = 0; s <= Math.min(i, j); s++) f += 1 / k[s]!
        expectRelClose(F.get(i, j), f, 1e-12)
      }
    }
  })
})

describe('buildFrameLineElement', () => {
  it('uses direct stiffness with per-story overrides', () => {
    const p = projectBuilder({ floors: 3 })
      .frameLine({ id: 'f', p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, storyStiffness: 2e8, stories: { L2: 1e8 } })
      .build()
    const { element, issues } = buildFrameLineElement(p, p.frameLines.f as FrameLine)
    expect(issues).toHaveLength(0)
    expectArrayRelClose(element!.stiffness, [3e8, -1e8, 0, -1e8, 3e8, -2e8, 0, -2e8, 2e8], 1e-15)
    expectArrayRelClose(element!.map, [0, 1, 0], 1e-15)
    expect(element!.isShearType).toBe(true)
  })

  it('condenses moment frames and derives braced story stiffness from the members and story heights', () => {
    const p = projectBuilder({ floors: [{ height: 4.5 }, { height: 3.2 }] })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 24, y: 0 },
        stiffness: { kind: 'moment', bays: 4, bayWidth: 6, columnI: 0.0108, beamI: 0.01143, material: 'concrete' },
      })
      .frameLine({
        id: 'b',
        p1: { x: 0, y: 0 },
        p2: { x: 0, y: 6 },
        stiffness: { kind: 'braced', braces: 2, bayWidth: 6, braceArea: 4.2e-3, material: 'steel' },
        base: 'L1',
      })
      .build()
    const m = buildFrameLineElement(p, p.frameLines.m as FrameLine).element!
    // moment frames: the condensed plane frame (checked against a full frame in momentFrame.test.ts)
    // with the default factors 0.70 columns, 0.35 beams (ACI 318-19 Table 6.6.3.1.1(a))
    const expected = momentFrameStiffness(
      [
        { h: 4.5, EIc: 30e9 * 0.7 * 0.0108, EIb: 30e9 * 0.35 * 0.01143 },
        { h: 3.2, EIc: 30e9 * 0.7 * 0.0108, EIb: 30e9 * 0.35 * 0.01143 },
      ],
      4,
      6,
    )!
    expectArrayRelClose(m.stiffness, expected, 1e-15)
    expect(m.isShearType).toBe(false)
    const b = buildFrameLineElement(p, p.frameLines.b as FrameLine).element!
    const kb = bracedFrameStoryStiffness(200e9, 2, 6, 4.2e-3, 3.2)
    expect(b.floors).toEqual([0, 1])
    expect(b.standsOnFloor).toBe(true)
    expectArrayRelClose(b.stiffness, [kb, -kb, -kb, kb], 1e-15)
  })

  it('reports a zero-length frame line and a missing material', () => {
    const p = projectBuilder({ floors: 2 })
      .frameLine({ id: 'z', p1: { x: 3, y: 3 }, p2: { x: 3, y: 3 } })
      .frameLine({
        id: 'm',
        p1: { x: 0, y: 0 },
        p2: { x: 1, y: 0 },
        stiffness: { kind: 'braced', braces: 2, bayWidth: 6, braceArea: 1e-3, material: 'nope' },
      })
      .build()
    expect(buildFrameLineElement(p, p.frameLines.z as FrameLine).issues[0]?.code).toBe('zero-length')
    expect(buildFrameLineElement(p, p.frameLines.m as FrameLine).issues[0]?.code).toBe('invalid-model')
  })
})
