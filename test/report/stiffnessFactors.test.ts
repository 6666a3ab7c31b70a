import { describe, expect, it } from 'vitest'
import type { Column, FrameLine } from '@/model'
import { buildReportHtml, stiffnessFactorRows, stiffnessFactorsHtml } from '@/report'
import { projectBuilder } from '../helpers/projectBuilder'
import { demoCase } from './fixtures'

describe('stiffnessFactorRows', () => {
  const project = () => {
    const p = projectBuilder({ floors: 2 })
      .wall({ id: 'w', name: 'Core west', p1: { x: 0, y: 0 }, p2: { x: 0, y: 5 }, flexureFactor: 0.35, stories: { L2: { flexureFactor: 0.7 } } })
      .frameLine({
        id: 'mf',
        name: 'South frame',
        p1: { x: 0, y: 0 },
        p2: { x: 12, y: 0 },
        stiffness: { kind: 'moment', bays: 2, bayWidth: 6, columnI: 0.005, beamI: 0.006, material: 'concrete', beamFactor: 0.5, baseFixity: 'pinned' },
      })
      .frameLine({ id: 'd', p1: { x: 0, y: 9 }, p2: { x: 5, y: 9 }, storyStiffness: 1e8 })
      .column({ id: 'c', name: 'C1', at: { x: 3, y: 3 }, fixity: 'pinned' })
      .build()
    const { stiffnessFactor: _, ...bare } = p.columns.c as Column
    return { ...p, columns: { c: { ...bare, restraint: 0.6 } as Column } }
  }

  it('says which factors are the ACI 318-19 defaults and which were set', () => {
    // defaults: ACI 318-19 Table 6.6.3.1.1(a) columns 0.70, beams 0.35 (METHODS.md §6)
    const rows = stiffnessFactorRows(project())
    expect(rows.map((r) => `${r.kind}|${r.name}|${r.factors}|${r.ends}`)).toEqual([
      'wall|Core west|f_I 0.35, f_A 1; own values at L2|',
      'moment frame|South frame|columns 0.7 (default), beams 0.5|feet pinned',
      'column|C1|I 0.7 (default)|foot pinned, slab restraint r = 0.6',
    ])
    expect((project().frameLines.d as FrameLine).stiffness.kind).toBe('direct')
  })

  it('puts the factor table in the report model summary, escaped', () => {
    const html = stiffnessFactorsHtml(project())
    expect(html).toContain('id="stiffness-factors"')
    expect(html).toContain('ACI 318-19 Table 6.6.3.1.1(a)')
    const { project: demo, result } = demoCase()
    const report = buildReportHtml(demo, result, { unitSystem: 'SI', generatedAt: new Date(0) })
    expect(report).toContain('Effective-stiffness factors used')
    expect(stiffnessFactorsHtml(projectBuilder().build())).toBe('')
  })
})
