import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import { TABLE_IDS, buildReportHtml, buildResultTables, toCsv } from '@/report'
import type { ResultTable } from '@/report'
import { generateBuilding } from '../helpers/generateBuilding'

// NIST SP 811 (2008) Appendix B.8: 1 lbf = 4.4482216152605 N exactly, so 1 kip = 4448.2216152605 N.
const KIP_N = 4448.2216152605

const base = generateBuilding({ floors: 6, seed: 4 })
const project: Project = {
  ...base,
  settings: {
    ...base.settings,
    seismicDesign: {
      code: 'asce7-16',
      riskCategory: 'III',
      designCategory: 'D',
      systemX: { preset: 'special-rc-walls-frame', R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
      systemY: { R: 8, Cd: 5.5, Omega0: 3, Ct: 0.0466, x: 0.9 },
    },
  },
}
const result = analyzeProject(project)

const get = (tables: readonly ResultTable[], id: string): ResultTable => {
  const t = tables.find((x) => x.id === id)
  if (!t) throw new Error(`no table ${id}`)
  return t
}

describe('design tables', () => {
  it('puts the base shear table before the torsion drifts and the details after, each with the caution', () => {
    const tables = buildResultTables(project, result, 'SI')
    const ids = tables.map((t) => t.id)
    expect(ids).toEqual(TABLE_IDS.filter((id) => ids.includes(id)))
    expect(ids.indexOf('design-base-shear')).toBeLessThan(ids.indexOf('torsion'))
    for (const id of ['design-drifts', 'design-stability', 'design-amplified-torsion', 'design-spectrum-scaling', 'design-spectrum-drifts', 'design-story-stiffness', 'design-torsional-flexibility', 'design-consequences']) {
      expect(ids.indexOf(id)).toBeGreaterThan(ids.indexOf('torsion'))
      expect(get(tables, id).caution).toBe(CAUTION)
    }
  })

  it('shows V, Cs, the period used and the factors in display units', () => {
    const si = get(buildResultTables(project, result, 'SI'), 'design-base-shear')
    const us = get(buildResultTables(project, result, 'US'), 'design-base-shear')
    const j = si.columns.findIndex((c) => c.key === 'baseShear')
    // kN in SI and kip in US (NIST SP 811 B.8)
    expect(si.rows[0]![j]).toBeCloseTo(result.design!.x.baseShear / 1000, 6)
    expect(us.rows[0]![j]).toBeCloseTo(result.design!.x.baseShear / KIP_N, 6)
    const R = si.columns.findIndex((c) => c.key === 'R')
    expect(si.rows.map((r) => r[R])).toEqual([6, 8])
    // risk category III: Ie = 1.25 (ASCE/SEI 7-16 Table 1.5-2, from memory)
    const Ie = si.columns.findIndex((c) => c.key === 'Ie')
    expect(si.rows[0]![Ie]).toBe(1.25)
    const why = si.columns.findIndex((c) => c.key === 'periodReason')
    expect(String(si.rows[0]![why])).toMatch(/12\.8\.2/)
  })

  it('carries the design tables in CSV and in the printed report', () => {
    const tables = buildResultTables(project, result, 'SI')
    const csv = toCsv(get(tables, 'design-drifts'), project)
    expect(csv.split('\r\n')[0]).toContain(CAUTION)
    expect(csv).toContain('design drift Delta (mm)')
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: new Date(0) })
    expect(html).toContain('id="table-design-base-shear"')
    expect(html.indexOf('table-design-base-shear')).toBeLessThan(html.indexOf('id="table-torsion"'))
  })

  it('adds no design table when no seismic system is set, and says the drifts are elastic', () => {
    const plain = analyzeProject(base)
    const tables = buildResultTables(base, plain, 'SI')
    expect(tables.some((t) => t.id.startsWith('design-'))).toBe(false)
    expect(get(tables, 'torsion').notes.some((n) => n.includes('not design drifts'))).toBe(true)
    expect(get(buildResultTables(project, result, 'SI'), 'torsion').notes.some((n) => n.includes('design drift table'))).toBe(true)
  })
})
