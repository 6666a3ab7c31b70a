import { describe, expect, it } from 'vitest'
import type { Asce7SeismicDesign, En1998SeismicDesign, Project } from '@/model'
import { analyzeProject } from '@/engine'
import { allowableDriftRatio, driftLimit, stabilityRow } from '@/engine/design/drifts'
import type { ElfDirection } from '@/engine/design/types'
import { generateBuilding } from '../../helpers/generateBuilding'

const asce: Asce7SeismicDesign = {
  code: 'asce7-16',
  riskCategory: 'II',
  systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  systemY: { R: 8, Cd: 5.5, Omega0: 3, Ct: 0.0466, x: 0.9 },
}
const en: En1998SeismicDesign = { code: 'en1998-1', importanceClass: 'II', systemX: { q: 3.9 }, systemY: { q: 3 } }

const elfWith = (factors: Partial<ElfDirection['factors']>): ElfDirection =>
  ({ factors: { R: null, Cd: null, Omega0: null, Ie: null, q: null, ...factors } }) as ElfDirection

describe('allowableDriftRatio', () => {
  it('reads Table 12.12-1 by structure row and risk category', () => {
    // ASCE/SEI 7-16 Table 12.12-1 (METHODS.md §1)
    expect(allowableDriftRatio('other', 'II')).toBe(0.02)
    expect(allowableDriftRatio('other', 'III')).toBe(0.015)
    expect(allowableDriftRatio('other', 'IV')).toBe(0.01)
    expect(allowableDriftRatio('low-rise', 'I')).toBe(0.025)
    expect(allowableDriftRatio('low-rise', 'IV')).toBe(0.015)
    expect(allowableDriftRatio('masonry-cantilever', 'III')).toBe(0.01)
    expect(allowableDriftRatio('masonry-other', 'I')).toBe(0.007)
  })
  it('gives the EN 1998-1 damage limitation limit alpha h / nu', () => {
    // EN 1998-1:2004 4.4.3.2(1)a: d_r nu <= 0.005 h, nu = 0.5 (class II, recommended, from memory)
    expect(driftLimit(en, 3).limit).toBeCloseTo((0.005 * 3) / 0.5, 12)
    // 4.4.3.2(1)b ductile elements 0.0075 h; class IV nu = 0.4
    expect(driftLimit({ ...en, importanceClass: 'IV', nonStructural: 'ductile' }, 3).limit).toBeCloseTo((0.0075 * 3) / 0.4, 12)
  })
})

describe('stabilityRow', () => {
  it('computes theta = Px Delta Ie / (Vx hsx Cd) against theta_max = 0.5/(beta Cd) <= 0.25', () => {
    // ASCE/SEI 7-16 Eqs 12.8-16/12.8-17, hand case: P = 10 MN, Delta = 30 mm, Ie = 1, V = 1 MN,
    // h = 3 m, Cd = 5: theta = 1e7*0.03/(1e6*3*5) = 0.02; theta_max = 0.5/5 = 0.1
    const e = elfWith({ Cd: 5, Ie: 1 })
    const r = stabilityRow(asce, e, 'L1', 'x', 1e7, 1e6, 0.03, 3)
    expect(r.theta).toBeCloseTo(0.02, 12)
    expect(r.thetaMax).toBeCloseTo(0.1, 12)
    expect(r.verdict).toBe('pass')
    // Delta = 300 mm: theta = 0.2 > 0.1 -> fail
    expect(stabilityRow(asce, e, 'L1', 'x', 1e7, 1e6, 0.3, 3).verdict).toBe('fail')
    // Cd = 1.5: 0.5/1.5 = 0.333 capped at 0.25
    expect(stabilityRow(asce, elfWith({ Cd: 1.5, Ie: 1 }), 'L1', 'x', 1e7, 1e6, 0.03, 3).thetaMax).toBeCloseTo(0.25, 12)
  })
  it('computes theta = Ptot d_r / (Vtot h) with the 1/(1 - theta) band and the 0.3 limit', () => {
    // EN 1998-1:2004 4.4.2.2 Eq. 4.28, hand case: 1e7*0.045/(1e6*3) = 0.15 -> amplifier 1/0.85
    const e = elfWith({ q: 3 })
    const r = stabilityRow(en, e, 'L1', 'y', 1e7, 1e6, 0.045, 3)
    expect(r.theta).toBeCloseTo(0.15, 12)
    expect(r.amplifier).toBeCloseTo(1 / 0.85, 12)
    expect(r.verdict).toBe('pass')
    // 4.4.2.2(4): theta 0.31 exceeds 0.3
    expect(stabilityRow(en, e, 'L1', 'y', 1e7, 1e6, 0.093, 3).verdict).toBe('fail')
  })
})

describe('design drifts through analyzeProject', () => {
  const p = generateBuilding({ floors: 8, seed: 3 })
  const withDesign = (d: Asce7SeismicDesign | En1998SeismicDesign, spectrum?: Project['settings']['spectrum']): Project => ({
    ...p,
    settings: { ...p.settings, ...(spectrum ? { spectrum } : {}), seismicDesign: d },
  })

  it('multiplies the elastic extreme-point drifts by Cd/Ie and checks them against the table', () => {
    const r = analyzeProject(withDesign({ ...asce, riskCategory: 'IV' }), { spectrum: false })
    const d = r.design!
    expect(d.drifts.length).toBe(4 * r.floors.length)
    for (const row of d.drifts) {
      const c = r.torsion!.cases.find((k) => k.id === row.caseId)!
      const story = c.stories.find((s) => s.floorId === row.floorId)!
      const Cd = c.direction === 'x' ? 5 : 5.5
      // ASCE/SEI 7-16 Eq. 12.8-15: delta = Cd delta_e / Ie, Ie = 1.5 for risk category IV (Table 1.5-2)
      expect(row.designDrift).toBeCloseTo((Cd * story.driftMax) / 1.5, 12)
      // Table 12.12-1, risk category IV, all other structures: 0.010 hsx
      expect(row.limit).toBeCloseTo(0.01 * row.height, 12)
      expect(row.verdict).toBe(row.designDrift <= row.limit ? 'pass' : 'fail')
    }
  })

  it('gives stability coefficients that do not depend on the design drift multiplier', () => {
    // ASCE/SEI 7-16 12.8.7: theta = Px Delta Ie/(Vx h Cd) with Delta = Cd delta_e/Ie, so theta uses
    // only the elastic drift; doubling Cd leaves theta but halves theta_max
    const a = analyzeProject(withDesign(asce), { spectrum: false }).design!
    const twice = { ...asce, systemX: { ...asce.systemX, Cd: 10 } }
    const b = analyzeProject(withDesign(twice), { spectrum: false }).design!
    a.stability.forEach((row, i) => {
      expect(b.stability[i]!.theta).toBeCloseTo(row.theta, 12)
      if (row.direction === 'x') expect(b.stability[i]!.thetaMax).toBeCloseTo(row.thetaMax / 2, 12)
    })
    // top story: P = W of the top floor, V = force of the top floor (both from the design)
    const top = a.stability.filter((s) => s.direction === 'y').at(-1)!
    expect(top.storyShear).toBeCloseTo(a.y.forces.at(-1)!, 6)
  })

  it('uses d_s = q d_e and scales P by the gravity load ratio for EN 1998-1', () => {
    const spectrum = { kind: 'en1998-1' as const, ag: 0.3, ground: 'B' as const }
    const r = analyzeProject(withDesign(en, spectrum), { spectrum: false })
    const d = r.design!
    const row = d.drifts.find((x) => x.caseId === 'X+e')!
    expect(row.designDrift).toBeCloseTo(3.9 * row.elasticDrift, 12) // EN 1998-1 Eq. 4.23
    const heavier = analyzeProject(withDesign({ ...en, gravityLoadRatio: 1.5 }, spectrum), { spectrum: false }).design!
    // theta is proportional to P (Eq. 4.28)
    expect(heavier.stability[0]!.theta / d.stability[0]!.theta).toBeCloseTo(1.5, 10)
  })
})
