/**
 * Smoke tests of the results panel's design-level section, rendered to markup in node (react-dom/server;
 * see App.test.tsx for why not jsdom). The numbers themselves are tested in test/engine/design and
 * test/report/designTables; here: the screen shows the same tables the report and the CSV carry.
 */
import { renderToString } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { demoProject } from '@/model'
import { designBaseShearTable } from '@/report'
import { ResultsPanel } from '@/ui/ResultsPanel'

describe('ResultsPanel design numbers', () => {
  it('shows the design base shear first and the design drift tables below when a seismic system is set', () => {
    const project = demoProject()
    const result = analyzeProject(project)
    expect(result.design).toBeTruthy()
    const html = renderToString(<ResultsPanel floors={project.floors} result={result} isStale={false} units="SI" />)
    expect(html).toContain('data-testid="table-design-base-shear"')
    expect(html).toContain('data-testid="table-design-drifts"')
    expect(html.indexOf('table-design-base-shear')).toBeLessThan(html.indexOf('table-design-drifts'))
    // the base shear V along X as the report table gives it, to four significant digits
    const table = designBaseShearTable(result, 'SI')!
    const vCol = table.columns.findIndex((c) => c.key === 'baseShear')
    expect(vCol).toBeGreaterThanOrEqual(0)
    const vX = table.rows[0]![vCol] as number
    expect(html).toContain(`<td>${String(Number(vX.toPrecision(4)))}</td>`)
  })

  it('shows no design section without a seismic system', () => {
    const p = demoProject()
    const { seismicDesign: _omit, ...settings } = p.settings
    const project = { ...p, settings }
    const html = renderToString(<ResultsPanel floors={project.floors} result={analyzeProject(project)} isStale={false} units="SI" />)
    expect(html).not.toContain('data-testid="design-view"')
  })
})
