/** Render smoke tests in node (react-dom/server; see BalancePanel.test.tsx for why not jsdom). */
import { renderToStaticMarkup } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION, CAUTION_SHORT } from '@/model'
import { strFromU8, unzipSync } from 'fflate'
import { ReportActions, csvFiles, csvZipFile, reportFile } from '@/ui/extras'
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

describe('csvZipFile', () => {
  it('holds every CSV table byte for byte plus a README with the caution', () => {
    const project = boxProject()
    const result = analyzeProject(project)
    const zip = csvZipFile(project, result, 'SI', new Date(Date.UTC(2026, 0, 5, 9, 30)))
    expect(zip.fileName).toBe('eccentric-box-one-storey-tables.zip')
    expect(zip.mime).toBe('application/zip')
    // Local file header signature "PK\x03\x04" (PKWARE APPNOTE.TXT 4.3.7).
    expect(Array.from(zip.bytes.slice(0, 4))).toEqual([0x50, 0x4b, 0x03, 0x04])
    // Read back with fflate's own unzip (general-purpose reference library).
    const entries = unzipSync(zip.bytes)
    const tables = csvFiles(project, result, 'SI')
    expect(Object.keys(entries).sort()).toEqual(['README.txt', ...tables.map((t) => t.fileName)].sort())
    for (const t of tables) expect(strFromU8(entries[t.fileName] as Uint8Array)).toBe(t.text)
    const readme = strFromU8(entries['README.txt'] as Uint8Array)
    expect(readme).toContain(CAUTION)
    expect(readme).toContain('Eccentric box')
    for (const t of tables) expect(readme).toContain(t.fileName)
  })

  it('gives the same bytes for the same input and time, and a clock before 1980 still zips', () => {
    const project = boxProject()
    const result = analyzeProject(project)
    const at = new Date(Date.UTC(2026, 5, 1))
    expect(csvZipFile(project, result, 'US', at).bytes).toEqual(csvZipFile(project, result, 'US', at).bytes)
    const old = csvZipFile(project, result, 'US', new Date(0))
    expect(Object.keys(unzipSync(old.bytes))).toContain('README.txt')
  })
})
