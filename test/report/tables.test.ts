import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import { TABLE_IDS, buildResultTables, verdictText, worstVerdict } from '@/report'
import type { ResultTable } from '@/report'
import { expectRelClose } from '../helpers/approx'
import { boxCase, demoCase } from './fixtures'

// NIST SP 811 (2008) Appendix B.8: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly;
// 1 lbf = 4.4482216152605 N exactly, so 1 kip = 4448.2216152605 N.
const FT = 0.3048
const IN = 0.0254
const KIP_N = 4448.2216152605

function get(tables: readonly ResultTable[], id: string): ResultTable {
  const t = tables.find((x) => x.id === id)
  if (!t) throw new Error(`no table ${id}`)
  return t
}

function column(table: ResultTable, key: string): number {
  const j = table.columns.findIndex((c) => c.key === key)
  if (j < 0) throw new Error(`no column ${key} in ${table.id}`)
  return j
}

function numberAt(table: ResultTable, row: number, key: string): number {
  const v = table.rows[row]?.[column(table, key)]
  if (typeof v !== 'number') throw new Error(`${table.id}[${row}].${key} is not a number (${String(v)})`)
  return v
}

describe('buildResultTables', () => {
  it('lists the tables in report order with the caution on each when every stage ran', () => {
    const { project, result } = demoCase()
    const tables = buildResultTables(project, result, 'SI')
    const ids = tables.map((t) => t.id)
    expect(ids).toEqual(TABLE_IDS.filter((id) => ids.includes(id)))
    for (const id of ['floors', 'modes', 'torsion', 'spectrum-floors', 'spectrum-base', 'time-history']) {
      expect(ids).toContain(id)
    }
    for (const t of tables) {
      expect(t.caution).toBe(CAUTION)
      for (const row of t.rows) expect(row.length).toBe(t.columns.length)
    }
  })

  it('gives the first-mode period of the result in seconds in either unit system', () => {
    const { project, result } = demoCase()
    const T1 = result.modes?.periods[0] ?? Number.NaN
    for (const units of ['SI', 'US'] as const) {
      const modes = get(buildResultTables(project, result, units), 'modes')
      expect(modes.columns[column(modes, 'period')]?.unit).toBe('s')
      expectRelClose(numberAt(modes, 0, 'period'), T1, 1e-15)
      expect(modes.rows.length).toBe(result.modes?.count)
    }
    // Sum of the effective mass ratios of all modes is 1 for a complete set (mass conservation,
    // Chopra, Dynamics of Structures, effective modal mass sum rule).
    const modes = get(buildResultTables(project, result, 'SI'), 'modes')
    const last = modes.rows.length - 1
    expectRelClose(numberAt(modes, last, 'cumX'), 1, 1e-9)
    expectRelClose(numberAt(modes, last, 'cumY'), 1, 1e-9)
  })

  it('matches the hand calculation of the eccentric box in SI units', () => {
    // Hand values from public/examples/eccentric-box.json notes; CR of shear-type elements on one
    // storey = sum(k x) / sum(k) (common practice): (200e6 * 0 + 100e6 * 10) / 300e6 = 3.333 m.
    const { project, result } = boxCase()
    const floors = get(buildResultTables(project, result, 'SI'), 'floors')
    expect(floors.columns[column(floors, 'mass')]?.unit).toBe('t')
    expectRelClose(numberAt(floors, 0, 'mass'), 36, 1e-9)
    expectRelClose(numberAt(floors, 0, 'cmX'), 5, 1e-9)
    expectRelClose(numberAt(floors, 0, 'crX'), 10 / 3, 1e-6)
    expectRelClose(numberAt(floors, 0, 'eX'), -5 / 3, 1e-6)
    expectRelClose(numberAt(floors, 0, 'rX'), 5.588, 1e-3)
    expectRelClose(numberAt(floors, 0, 'ls'), Math.sqrt((100 + 36) / 12), 1e-9)
    expect(numberAt(floors, 0, 'elements')).toBe(4)
  })

  it('converts lengths to feet and displacements to inches exactly when the system is US', () => {
    const { project, result } = demoCase()
    const si = buildResultTables(project, result, 'SI')
    const us = buildResultTables(project, result, 'US')
    const fSi = get(si, 'floors')
    const fUs = get(us, 'floors')
    expect(fUs.columns[column(fUs, 'crX')]?.unit).toBe('ft')
    const c0 = result.centres?.[0]
    expectRelClose(numberAt(fUs, 0, 'crX'), (c0?.centreOfRigidity.x ?? Number.NaN) / FT, 1e-15)
    // elevation of floor 1 is 4.5 m in the demo: 4.5 / 0.3048 = 14.763779527559... ft
    expectRelClose(numberAt(fUs, 0, 'z'), 4.5 / FT, 1e-15)
    expectRelClose(numberAt(fUs, 0, 'z'), 14.763779527559054, 1e-14)
    // SI display of a length is metres, of a displacement millimetres.
    expectRelClose(numberAt(fSi, 0, 'z'), 4.5, 1e-15)
    const tUs = get(us, 'torsion')
    const tSi = get(si, 'torsion')
    expect(tUs.columns[column(tUs, 'driftMax')]?.unit).toBe('in')
    expect(tSi.columns[column(tSi, 'driftMax')]?.unit).toBe('mm')
    const drift = result.torsion?.cases[0]?.stories[0]?.driftMax ?? Number.NaN
    expectRelClose(numberAt(tUs, 0, 'driftMax'), drift / IN, 1e-15)
    expectRelClose(numberAt(tSi, 0, 'driftMax'), drift * 1000, 1e-15)
    // mm -> in: 25.4 mm per inch exactly.
    expectRelClose(numberAt(tSi, 0, 'driftMax') / numberAt(tUs, 0, 'driftMax'), 25.4, 1e-14)
    const bUs = get(us, 'spectrum-base')
    expect(bUs.columns[column(bUs, 'cqc')]?.unit).toBe('kip')
    expectRelClose(numberAt(bUs, 0, 'cqc'), (result.spectrum?.baseShear.x.cqc ?? Number.NaN) / KIP_N, 1e-14)
  })

  it('gives one torsion row per story and static case with the ASCE 7 Type 1a verdict', () => {
    const { project, result } = demoCase()
    const torsion = get(buildResultTables(project, result, 'SI'), 'torsion')
    const cases = result.torsion?.cases ?? []
    expect(cases.length).toBe(4)
    expect(torsion.rows.length).toBe(project.floors.length * cases.length)
    const v = column(torsion, 'verdict')
    let k = 0
    for (const lc of cases) {
      for (const s of lc.stories) {
        const row = torsion.rows[k++] ?? []
        expect(row[column(torsion, 'case')]).toBe(lc.id)
        expectRelClose(row[column(torsion, 'driftRatio')] as number, s.driftRatio, 1e-15)
        // ASCE/SEI 7-16 Table 12.3-1 Type 1a: irregular when max drift > 1.2 x average drift.
        expect(row[v]).toBe(s.driftRatio > 1.2 ? 'fail' : 'pass')
      }
    }
  })

  it('leaves out the stages that did not run', () => {
    const { project, result } = demoCase()
    const trimmed = { ...result, spectrum: null, timeHistory: null, modes: null }
    const ids = buildResultTables(project, trimmed, 'SI').map((t) => t.id)
    expect(ids).not.toContain('modes')
    expect(ids).not.toContain('spectrum-base')
    expect(ids).not.toContain('time-history')
    expect(ids).toContain('floors')
  })

  it('builds the regularity table in length units when the set is EN 1998-1', () => {
    const { project } = demoCase()
    const p = { ...project, settings: { ...project.settings, criterionSet: 'en1998-1' } }
    const result = analyzeWith(p)
    const reg = get(buildResultTables(p, result, 'US'), 'regularity')
    // EN 1998-1:2004 4.2.3.2(6): two rules (Eq. 4.1a, 4.1b) per floor and direction.
    expect(reg.rows.length).toBe(4 * project.floors.length)
    expect(reg.columns[column(reg, 'value')]?.unit).toBe('ft')
    const row0 = result.regularity?.rows[0]
    expectRelClose(numberAt(reg, 0, 'value'), (row0?.value ?? Number.NaN) / FT, 1e-15)
  })
})

function analyzeWith(project: Project): ReturnType<typeof analyzeProject> {
  return analyzeProject(project, { spectrum: false })
}

describe('verdictText', () => {
  it('shows n/a for a not-applicable verdict', () => {
    expect(verdictText('not-applicable')).toBe('n/a')
    expect(verdictText('fail')).toBe('fail')
  })
})

describe('worstVerdict', () => {
  it('picks fail over pass over n/a and null for no rows', () => {
    const row = (verdict: 'pass' | 'fail' | 'not-applicable') => ({
      floorId: 'f',
      caseId: 'X+e',
      quantity: 'q',
      value: 1,
      limit: 1,
      verdict,
      clause: 'c',
      label: verdict,
    })
    expect(worstVerdict([])).toBeNull()
    expect(worstVerdict([row('not-applicable'), row('pass')])?.verdict).toBe('pass')
    expect(worstVerdict([row('pass'), row('fail'), row('not-applicable')])?.verdict).toBe('fail')
  })
})
