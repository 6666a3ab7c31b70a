import { describe, expect, it } from 'vitest'
import { CAUTION } from '@/model'
import { buildReportHtml, buildResultTables, toCsv } from '@/report'
import type { ResultTable } from '@/report'
import { expectRelClose } from '../helpers/approx'
import { demoCase } from './fixtures'

// NIST SP 811 (2008) Appendix B.8: 1 lbf = 4.4482216152605 N and 1 ft = 0.3048 m exactly.
const KIP_N = 4448.2216152605
const FT = 0.3048

function get(tables: readonly ResultTable[], id: string): ResultTable {
  const t = tables.find((x) => x.id === id)
  if (!t) throw new Error(`no table ${id}`)
  return t
}

const col = (t: ResultTable, key: string): number => t.columns.findIndex((c) => c.key === key)

describe('element force tables', () => {
  it('list every element, case and storey in the CSV table with forces in display units', () => {
    const { project, result } = demoCase()
    const ef = result.elementForces!
    // a wall group's torsion chain carries a torque, not a shear: the table leaves it out
    const storeys = ef.elements
      .filter((e) => e.kind !== 'wallGroupTorsion')
      .reduce((s, e) => s + e.floorIds.length, 0)
    for (const units of ['SI', 'US'] as const) {
      const t = get(buildResultTables(project, result, units), 'element-forces')
      expect(t.rows.length).toBe(ef.cases.length * storeys)
      expect(t.caution).toBe(CAUTION)
      // first row: case 0, element 0, its top storey
      const e0 = ef.elements[0]!
      const top = e0.floorIds.length - 1
      const row = t.rows[0]!
      expect(row[col(t, 'element')]).toBe(e0.elementId)
      expect(row[col(t, 'case')]).toBe(ef.cases[0]!.id)
      const kN = units === 'SI' ? 1e3 : KIP_N
      const kNm = units === 'SI' ? 1e3 : KIP_N * FT
      expectRelClose(row[col(t, 'shear')] as number, e0.shear[0]![top]! / kN, 1e-12)
      expectRelClose(row[col(t, 'moment')] as number, e0.overturningMoment[0]![top]! / kNm, 1e-12)
      expect(t.columns[col(t, 'moment')]!.unit).toBe(units === 'SI' ? 'kN·m' : 'kip·ft')
    }
    const csv = toCsv(get(buildResultTables(project, result, 'SI'), 'element-forces'), project)
    expect(csv.split('\r\n')[0]).toContain(CAUTION)
  })

  it('shows the walls in the design case in the report and keeps the long table to CSV', () => {
    const { project, result } = demoCase()
    const tables = buildResultTables(project, result, 'SI')
    const walls = get(tables, 'wall-forces')
    const ef = result.elementForces!
    const ci = ef.cases.findIndex((c) => c.id === 'spectrum+torsion')
    expect(ci).toBeGreaterThanOrEqual(0)
    const wallRows = ef.elements.filter((e) => e.kind === 'wall')
    expect(walls.rows.length).toBe(wallRows.reduce((s, e) => s + e.floorIds.length, 0))
    const w = wallRows[0]!
    // the wall's bottom storey is its last row; its moment is the largest one up the wall (statics)
    const last = walls.rows.findLastIndex((r) => r[0] === w.elementId)
    expectRelClose(walls.rows[last]![col(walls, 'moment')] as number, w.overturningMoment[ci]![0]! / 1e3, 1e-12)
    expect(Math.max(...w.overturningMoment[ci]!)).toBeCloseTo(w.overturningMoment[ci]![0]!, 6)
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: new Date('2026-12-02T04:00:00Z') })
    expect(html).toContain('data-table="wall-forces"')
    expect(html).toContain('data-table="spectrum-torsion"')
    expect(html).not.toContain('data-table="element-forces"')
  })

  it('gives the spectrum drift ratios with accidental torsion per storey', () => {
    const { project, result } = demoCase()
    const t = get(buildResultTables(project, result, 'SI'), 'spectrum-torsion')
    const at = result.spectrum!.accidentalTorsion!
    expect(t.rows.length).toBe(result.floors.length)
    at.stories.x.forEach((s, i) => {
      expectRelClose(t.rows[i]![col(t, 'ratioX')] as number, s.driftRatio, 1e-15)
      // invariant: the largest point is at least the mean of the two ends, so the ratio is >= 1
      expect(s.driftRatio).toBeGreaterThanOrEqual(1 - 1e-12)
    })
  })
})
