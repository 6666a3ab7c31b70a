import { describe, expect, it } from 'vitest'
import type { Asce7SeismicDesign, Project } from '@/model'
import { analyzeProject } from '@/engine'
import {
  approximatePeriod,
  en1998DesignOrdinate,
  en1998Lambda,
  seismicResponseCoefficient,
  upperLimitCoefficient,
} from '@/engine/design/elf'
import { GRAVITY } from '@/engine/spectra'
import { generateBuilding } from '../../helpers/generateBuilding'

const asce = (over: Partial<Asce7SeismicDesign> = {}): Asce7SeismicDesign => ({
  code: 'asce7-16',
  riskCategory: 'II',
  systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  systemY: { R: 8, Cd: 5.5, Omega0: 3, Ct: 0.0466, x: 0.9 },
  ...over,
})

const withDesign = (p: Project, design: Asce7SeismicDesign | undefined): Project => ({
  ...p,
  settings: { ...p.settings, ...(design ? { seismicDesign: design } : {}) },
})

describe('seismicResponseCoefficient', () => {
  const base = { SDS: 1.0, SD1: 0.6, TL: 8, R: 6, Ie: 1 }
  it('takes SDS/(R/Ie) on the plateau when the period limit is higher', () => {
    // ASCE/SEI 7-16 Eq. 12.8-2: 1.0/6 = 0.166667; Eq. 12.8-3 limit 0.6/(0.5*6) = 0.2 does not govern
    const r = seismicResponseCoefficient({ ...base, T: 0.5 })
    expect(r.Cs).toBeCloseTo(1 / 6, 12)
    expect(r.governedBy).toBe('SDS')
  })
  it('caps Cs by SD1/(T R/Ie) when T <= TL', () => {
    // ASCE/SEI 7-16 Eq. 12.8-3: 0.6/(1.0*6) = 0.1
    const r = seismicResponseCoefficient({ ...base, T: 1.0 })
    expect(r.Cs).toBeCloseTo(0.1, 12)
    expect(r.governedBy).toBe('upper-T')
  })
  it('uses SD1 TL/(T² R/Ie) above TL and then the 0.044 SDS Ie minimum', () => {
    // ASCE/SEI 7-16 Eq. 12.8-4: 0.6*8/(81*6) = 0.0098765 < 0.01 ... Eq. 12.8-5 floor 0.044*1.0*1 = 0.044
    const r = seismicResponseCoefficient({ ...base, T: 9 })
    expect(r.Cs).toBeCloseTo(0.044, 12)
    expect(r.governedBy).toBe('minimum-12.8-5')
    // with a high S1 = 0.75 g the S1 minimum 0.5*0.75/6 = 0.0625 governs (Eq. 12.8-6)
    const s = seismicResponseCoefficient({ ...base, T: 9, S1: 0.75 })
    expect(s.Cs).toBeCloseTo(0.0625, 12)
    expect(s.governedBy).toBe('minimum-12.8-6')
    // S1 below 0.6 g: the S1 minimum does not apply (12.8.1.1)
    expect(seismicResponseCoefficient({ ...base, T: 9, S1: 0.59 }).Cs).toBeCloseTo(0.044, 12)
  })
  it('scales with Ie in the limits and the minimum', () => {
    // ASCE/SEI 7-16 12.8.1.1 with Ie = 1.5, R = 8, T = 2 s: 12.8-3 gives 0.6/(2*8/1.5) = 0.05625,
    // below the 12.8-5 floor 0.044*1.0*1.5 = 0.066
    const r = seismicResponseCoefficient({ SDS: 1.0, SD1: 0.6, TL: 8, R: 8, Ie: 1.5, T: 2 })
    expect(r.Cs).toBeCloseTo(0.066, 12)
    // the absolute floor 0.01 governs when 0.044 SDS Ie is smaller (SDS = 0.1)
    expect(seismicResponseCoefficient({ SDS: 0.1, SD1: 0.05, TL: 8, R: 8, Ie: 1, T: 5 }).Cs).toBeCloseTo(0.01, 12)
  })
})

describe('upperLimitCoefficient and approximatePeriod', () => {
  it('interpolates Cu in Table 12.8-1 by SD1', () => {
    // ASCE/SEI 7-16 Table 12.8-1 (from memory): 0.4 -> 1.4, 0.3 -> 1.4, 0.2 -> 1.5, 0.15 -> 1.6, 0.1 -> 1.7
    expect(upperLimitCoefficient(0.5)).toBeCloseTo(1.4, 12)
    expect(upperLimitCoefficient(0.3)).toBeCloseTo(1.4, 12)
    expect(upperLimitCoefficient(0.25)).toBeCloseTo(1.45, 12)
    expect(upperLimitCoefficient(0.2)).toBeCloseTo(1.5, 12)
    expect(upperLimitCoefficient(0.125)).toBeCloseTo(1.65, 12)
    expect(upperLimitCoefficient(0.05)).toBeCloseTo(1.7, 12)
  })
  it('computes Ta = Ct hn^x', () => {
    // ASCE/SEI 7-16 Eq. 12.8-7: 0.0488 * 30^0.75 = 0.0488 * 12.81861 = 0.625548 (hand calculation)
    expect(approximatePeriod(0.0488, 0.75, 30)).toBeCloseTo(0.625548, 5)
  })
})

describe('en1998DesignOrdinate and en1998Lambda', () => {
  it('follows Eqs 3.13 to 3.16 with q and the 0.2 ag lower bound', () => {
    // EN 1998-1:2004 3.2.2.5(4)P, ground C (S 1.15, TB 0.2, TC 0.6, TD 2.0), ag 0.25 g, q 3; by hand:
    expect(en1998DesignOrdinate(0.25, 'C', 3, 0)).toBeCloseTo(0.191667, 6) // ag S 2/3
    expect(en1998DesignOrdinate(0.25, 'C', 3, 0.1)).toBeCloseTo(0.215625, 6) // 0.2875*(2/3 + 0.5*(0.8333-0.6667))
    expect(en1998DesignOrdinate(0.25, 'C', 3, 0.4)).toBeCloseTo(0.239583, 6) // ag S 2.5/q
    expect(en1998DesignOrdinate(0.25, 'C', 3, 1.0)).toBeCloseTo(0.14375, 6) // * TC/T
    expect(en1998DesignOrdinate(0.25, 'C', 3, 1.5)).toBeCloseTo(0.0958333, 6)
    // beyond TD: 0.239583*0.6*2/9 = 0.031944 < beta ag = 0.05
    expect(en1998DesignOrdinate(0.25, 'C', 3, 3.0)).toBeCloseTo(0.05, 9)
  })
  it('takes lambda 0.85 only for T1 <= 2 TC and more than two storeys', () => {
    // EN 1998-1:2004 4.3.3.2.2(1)P
    expect(en1998Lambda(1.0, 0.6, 5)).toBe(0.85)
    expect(en1998Lambda(1.0, 0.6, 2)).toBe(1.0)
    expect(en1998Lambda(1.3, 0.6, 5)).toBe(1.0)
  })
})

describe('computeElf through analyzeProject', () => {
  const p = generateBuilding({ floors: 12, seed: 5 })

  it('gives V = Cs W with T capped at Cu Ta and states why', () => {
    const r = analyzeProject(withDesign(p, asce()), { spectrum: false })
    expect(r.status).toBe('ok')
    const d = r.design!
    const hn = r.floors[r.floors.length - 1]!.elevation
    const sd1 = p.settings.spectrum.kind === 'asce7' ? p.settings.spectrum.SD1 : NaN
    // ASCE/SEI 7-16 12.8.2: T used = min(modal, Cu Ta), Ta = Ct hn^x (Eq. 12.8-7)
    const Ta = 0.0488 * hn ** 0.75
    const cap = upperLimitCoefficient(sd1) * Ta
    expect(d.x.periodCap).toBeCloseTo(cap, 9)
    expect(d.x.periodUsed).toBeCloseTo(Math.min(d.x.modalPeriod, cap), 12)
    expect(d.x.periodReason).toMatch(d.x.modalPeriod > cap ? /capped at Cu·Ta/ : /modal period/)
    // ASCE/SEI 7-16 Eq. 12.8-1: V = Cs W with W = total mass g
    expect(d.x.baseShear).toBeCloseTo(d.x.coefficient * r.totalMass * GRAVITY, 3)
    expect(d.x.forces.reduce((a, b) => a + b, 0)).toBeCloseTo(d.x.baseShear, 3)
    // the static cases use this V (MODELING.md: forces w z^k scaled to V)
    expect(r.torsion!.baseShear.x).toBeCloseTo(d.x.baseShear, 6)
    expect(r.torsion!.periodUsed.y).toBeCloseTo(d.y.periodUsed, 12)
    expect(d.caution.length).toBeGreaterThan(20)
  })

  it('caps a long modal period at Cu Ta', () => {
    // a tiny Ct forces the cap: Ta = 0.001 hn^0.75 is far below any modal period here
    const design = asce({ systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.001, x: 0.75 } })
    const d = analyzeProject(withDesign(p, design), { spectrum: false }).design!
    expect(d.x.periodUsed).toBeLessThan(d.x.modalPeriod)
    expect(d.x.periodUsed).toBeCloseTo(d.x.periodCap!, 12)
    expect(d.x.periodReason).toMatch(/capped/)
  })

  it('does not change the torsion ratios or verdicts when the design V replaces the elastic one', () => {
    // MODELING.md: the absolute base shear does not change the ratios (linear elastic)
    const a = analyzeProject(p, { spectrum: false })
    const b = analyzeProject(withDesign(p, asce()), { spectrum: false })
    expect(b.torsion!.baseShear.x / a.torsion!.baseShear.x).not.toBeCloseTo(1, 2)
    a.torsion!.cases.forEach((c, ci) =>
      c.stories.forEach((row, i) => {
        const o = b.torsion!.cases[ci]!.stories[i]!
        expect(o.driftRatio).toBeCloseTo(row.driftRatio, 9)
        expect(o.displacementRatio).toBeCloseTo(row.displacementRatio, 9)
      }),
    )
    expect(b.torsion!.criterion.rows.map((w) => w.verdict)).toEqual(a.torsion!.criterion.rows.map((w) => w.verdict))
  })

  it('says the numbers are elastic when no seismic system is set', () => {
    const r = analyzeProject(p, { spectrum: false })
    expect(r.design ?? null).toBeNull()
    expect(r.issues.some((i) => i.message.includes('settings.seismicDesign not set'))).toBe(true)
  })

  it('refuses a code that does not match the spectrum kind with a message naming the fields', () => {
    const q = { ...p, settings: { ...p.settings, spectrum: { kind: 'en1998-1' as const, ag: 0.25, ground: 'C' as const } } }
    const r = analyzeProject(withDesign(q, asce()), { spectrum: false })
    expect(r.status).toBe('ok')
    expect(r.design ?? null).toBeNull()
    expect(r.issues.some((i) => i.message.includes('settings.spectrum.kind "asce7"'))).toBe(true)
  })

  it('computes the EN 1998-1 Fb = Sd(T1) m lambda with the z m distribution', () => {
    const q: Project = {
      ...p,
      settings: {
        ...p.settings,
        spectrum: { kind: 'en1998-1', ag: 0.25, ground: 'C' },
        seismicDesign: { code: 'en1998-1', importanceClass: 'II', systemX: { q: 3.9 }, systemY: { q: 3 } },
      },
    }
    const r = analyzeProject(q, { spectrum: false })
    const d = r.design!
    // EN 1998-1:2004 Eq. 4.5: Fb = Sd(T1) m lambda; Sd from Eqs 3.13-3.16
    const T1 = d.y.modalPeriod
    const Sd = en1998DesignOrdinate(0.25, 'C', 3, T1)
    const lambda = en1998Lambda(T1, 0.6, r.floors.length)
    expect(d.y.coefficient).toBeCloseTo(Sd, 12)
    expect(d.y.baseShear).toBeCloseTo(Sd * GRAVITY * r.totalMass * lambda, 3)
    // Eq. 4.11: F_i = Fb z_i m_i / sum z_j m_j
    const zm = r.floors.map((f) => f.elevation * f.mass)
    const sum = zm.reduce((a, b) => a + b, 0)
    d.y.forces.forEach((F, i) => expect(F / d.y.baseShear).toBeCloseTo(zm[i]! / sum, 12))
    // the static cases report V / W = Sd lambda (in g)
    expect(r.torsion!.baseShearCoefficient!.y).toBeCloseTo(Sd * lambda, 12)
  })
})
