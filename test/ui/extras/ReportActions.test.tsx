/** Render smoke tests in node (react-dom/server; see BalancePanel.test.tsx for why not jsdom). */
import { renderToStaticMarkup } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION, CAUTION_SHORT } from '@/model'
import { ReportActions, csvFiles, reportFile } from '@/ui/extras'
import { boxProject, fakeBalance } from './fixtures'

describe('ReportActions', () => {
  it('renders the three buttons without repeating the screen caution', () => {
    const project = boxProject()
    const html = renderToStaticMarkup(
      <ReportActions project={project} result={analyzeProject(project)} unitSystem="SI" />,
    )
    for (const id of ['report-open', 'report-download', 'csv-download']) {
      expect(html).toMatch(new RegExp(`<button type="button" data-testid="${id}">`))
    }
    expect(html).not.toContain(CAUTION_SHORT)
  })

  it('disables the buttons before there is a result', () => {
    const html = renderToStaticMarkup(<ReportActions project={boxProject()} result={null} unitSystem="US" />)
    for (const id of ['report-open', 'report-download', 'csv-download']) {
      expect(html).toMatch(new RegExp(`data-testid="${id}" disabled=""`))
    }
  })
})

describe('reportFile', () => {
  it('names the file after the project and includes the balance section when given', () => {
    const project = boxProject()
    const file = reportFile(project, analyzeProject(project), 'SI', new Date(0), fakeBalance(project))
    expect(file.fileName).toBe('eccentric-box-one-storey-report.html')
    expect(file.mime).toBe('text/html;charset=utf-8')
    expect(file.text.startsWith('<!doctype html>')).toBe(true)
    expect(file.text).toContain('id="balance"')
    expect(file.text).toContain(CAUTION)
  })
})

describe('csvFiles', () => {
  it('gives one CSV per table, each starting with the caution comment line', () => {
    const project = boxProject()
    const files = csvFiles(project, analyzeProject(project), 'US')
    expect(files.map((f) => f.fileName)).toContain('eccentric-box-one-storey-floors.csv')
    for (const f of files) {
      expect(f.text.split('\r\n')[0]).toContain(CAUTION)
      expect(f.mime).toBe('text/csv;charset=utf-8')
    }
    // Hand value of the box: CR x = 10/3 m = 10.936 ft (1 ft = 0.3048 m exactly, NIST SP 811 B.8).
    const floors = files.find((f) => f.fileName.endsWith('-floors.csv'))?.text.split('\r\n') ?? []
    const header = floors[1]?.split(',') ?? []
    const row = floors[2]?.split(',') ?? []
    const crX = Number(row[header.indexOf('CR x (ft)')])
    expect(Math.abs(crX - 10 / 3 / 0.3048)).toBeLessThan(1e-5)
  })
})
