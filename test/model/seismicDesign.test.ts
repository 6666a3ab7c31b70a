import { describe, expect, it } from 'vitest'
import box from '../../public/examples/eccentric-box.json'
import {
  ASCE7_SYSTEM_PRESETS,
  EN1998_SYSTEM_PRESETS,
  damageLimitationNuOf,
  importanceFactorOf,
} from '@/model'
import { parseProject, serializeProject } from '@/model/schema'

type Json = Record<string, unknown>
const copy = <T>(x: T): Json => JSON.parse(JSON.stringify(x)) as Json

const asce = {
  code: 'asce7-16',
  riskCategory: 'III',
  designCategory: 'D',
  systemX: { preset: 'special-rc-walls-frame', R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  systemY: { R: 8, Cd: 5.5, Omega0: 3, Ct: 0.0466, x: 0.9 },
}

function withSettings(extra: Json): Json {
  const doc = copy(box)
  const settings = (doc.settings ?? {}) as Json
  doc.settings = { ...settings, ...extra }
  return doc
}

describe('settings.seismicDesign', () => {
  it('loads an ASCE 7 system per direction and round-trips through a save', () => {
    const r = parseProject(withSettings({ seismicDesign: asce, torsionalFlexibilityLimit: 1.2 }))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.project.settings.seismicDesign).toEqual(asce)
    expect(r.project.settings.torsionalFlexibilityLimit).toBe(1.2)
    const again = parseProject(JSON.parse(serializeProject(r.project)))
    expect(again.ok && again.project.settings.seismicDesign).toEqual(asce)
  })

  it('loads an EN 1998-1 block and the optional S1 of the ASCE spectrum', () => {
    const en = { code: 'en1998-1', importanceClass: 'II', nonStructural: 'ductile', systemX: { q: 3.9 }, systemY: { q: 3 } }
    const r = parseProject(withSettings({ seismicDesign: en, spectrum: { kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8, S1: 0.7 } }))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.project.settings.seismicDesign).toEqual(en)
    expect(r.project.settings.spectrum).toEqual({ kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8, S1: 0.7 })
  })

  it('refuses an R of 6e-300 that made the design base shear overflow (found by the fuzz test)', () => {
    // Cs = SDS / (R / Ie): a vanishing R gave an infinite floor force and NaN drifts with status ok.
    const r = parseProject(withSettings({ seismicDesign: { ...asce, systemY: { ...asce.systemY, R: 6e-300 } } }))
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.errors).toContain('settings.seismicDesign.systemY.R: must be >= 1, got 6e-300')
    const ie = parseProject(withSettings({ seismicDesign: { ...asce, Ie: 1e-9 } }))
    expect(ie.ok).toBe(false)
  })

  it('names the field and the problem when a value is wrong, and refuses the file', () => {
    const bad = { ...asce, riskCategory: 'V', systemY: { ...asce.systemY, Cd: -1 } }
    const r = parseProject(withSettings({ seismicDesign: bad }))
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.errors).toContain('settings.seismicDesign.riskCategory: must be one of "I", "II", "III", "IV", got "V"')
    expect(r.errors).toContain('settings.seismicDesign.systemY.Cd: must be >= 1, got -1')
    const noSystem = parseProject(withSettings({ seismicDesign: { code: 'en1998-1', importanceClass: 'I', systemX: { q: 0.5 } } }))
    expect(noSystem.ok).toBe(false)
    if (noSystem.ok) return
    expect(noSystem.errors).toContain('settings.seismicDesign.systemX.q: must be >= 1, got 0.5')
    expect(noSystem.errors.some((e) => e.startsWith('settings.seismicDesign.systemY: must be an object'))).toBe(true)
  })

  it('warns about unknown fields inside the block', () => {
    const r = parseProject(withSettings({ seismicDesign: { ...asce, rho: 1.3 } }))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.warnings).toContain('settings.seismicDesign.rho: unknown field, ignored')
  })
})

describe('seismic presets and defaults', () => {
  it('gives Ie by risk category and nu by importance class', () => {
    // ASCE/SEI 7-16 Table 1.5-2 (from memory): I/II 1.0, III 1.25, IV 1.5
    expect([importanceFactorOf('I'), importanceFactorOf('II'), importanceFactorOf('III'), importanceFactorOf('IV')]).toEqual([1, 1, 1.25, 1.5])
    // EN 1998-1:2004 4.4.3.2(2) recommended values (from memory): 0.5 for I/II, 0.4 for III/IV
    expect([damageLimitationNuOf('II'), damageLimitationNuOf('III')]).toEqual([0.5, 0.4])
  })
  it('keeps every preset inside the ranges the loader accepts', () => {
    // common practice: R, Cd >= 1; Ct (SI) between 0.04 and 0.08; x between 0.75 and 0.9
    for (const p of ASCE7_SYSTEM_PRESETS) {
      const v = p.values
      expect(v.R).toBeGreaterThanOrEqual(3)
      expect(v.Cd).toBeLessThanOrEqual(v.R)
      expect(v.Ct).toBeGreaterThan(0.04)
      expect(v.Ct).toBeLessThan(0.08)
      expect(v.x).toBeGreaterThanOrEqual(0.75)
      expect(v.x).toBeLessThanOrEqual(0.9)
      const r = parseProject(withSettings({ seismicDesign: { ...asce, systemX: { preset: p.id, ...v } } }))
      expect(r.ok).toBe(true)
    }
    for (const p of EN1998_SYSTEM_PRESETS) expect(p.values.q).toBeGreaterThanOrEqual(1.5)
  })
})
