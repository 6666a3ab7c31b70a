/**
 * Browser tests of the balance assistant panel and the report/CSV exports on the demo building
 * (headless Chromium). The balance check is physical: applying the best suggestion must bring the
 * first floor's centre of rigidity closer to its centre of mass (docs/balance.md).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { distance, markerAt, openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

describe('balance assistant panel', () => {
  it('finds ranked changes off the main thread and applies one as a single undo step', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    const before = distance(await markerAt(page, 'cm'), await markerAt(page, 'cr'))
    await page.getByTestId('balance-find').click()
    await page.getByTestId('balance-suggestions').waitFor({ timeout: 90000 })
    // The suggestions sit under the screen's one caution line (status line), always in view.
    await expect(page.getByTestId('screen-caution').isVisible()).resolves.toBe(true)
    await expect(page.getByTestId('screen-caution').getAttribute('title')).resolves.toContain('licensed structural engineer')
    await page.getByTestId('balance-apply-0').click()
    await waitForCurrentAnalysis(page)
    const after = distance(await markerAt(page, 'cm'), await markerAt(page, 'cr'))
    expect(after).toBeLessThan(before)
    // an applied suggestion cannot be applied twice ...
    await expect(page.getByTestId('balance-apply-0').isDisabled()).resolves.toBe(true)
    await session.screenshot(page, 'balance-applied')
    // one undo restores the eccentricity of the demo (to the marker's precision)
    await page.keyboard.press('Control+z')
    await waitForCurrentAnalysis(page)
    const undone = distance(await markerAt(page, 'cm'), await markerAt(page, 'cr'))
    expect(undone).toBeCloseTo(before, 6)
    // ... and after the undo it applies again (re-validated against the current model)
    await expect(page.getByTestId('balance-apply-0').isDisabled()).resolves.toBe(false)
    expect(errors).toEqual([])
    await context.close()
  })
})

describe('report actions', () => {
  it('downloads the printable report with the caution, and all tables as CSV in one zip', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('report-download').click()])
    expect(download.suggestedFilename()).toMatch(/-report\.html$/)
    const path = await download.path()
    const { readFileSync } = await import('node:fs')
    const html = readFileSync(path, 'utf8')
    expect(html).toContain('licensed structural engineer')
    expect(html).toContain('Corner Block, Quarry Street')
    const [zipped] = await Promise.all([page.waitForEvent('download'), page.getByTestId('csv-download').click()])
    expect(zipped.suggestedFilename()).toBe('corner-block-quarry-street-tables.zip')
    // Unzipped with fflate (general-purpose reference library): README with the caution, then CSVs.
    const { strFromU8, unzipSync } = await import('fflate')
    const entries = unzipSync(new Uint8Array(readFileSync(await zipped.path())))
    expect(strFromU8(entries['README.txt'] as Uint8Array)).toContain('licensed structural engineer')
    const csvNames = Object.keys(entries).filter((n) => n.endsWith('.csv'))
    expect(csvNames).toContain('corner-block-quarry-street-modes.csv')
    const text = strFromU8(entries['corner-block-quarry-street-floors.csv'] as Uint8Array)
    // One quoted comment field: the demo's name holds a comma (docs/reports.md, CSV format).
    expect(text.split('\r\n')[0]).toMatch(/^"# Corner Block, Quarry Street \| .*licensed structural engineer.*"$/)
    await expect(page.getByTestId('report-message').textContent()).resolves.toContain('tables.zip')
    expect(errors).toEqual([])
    await context.close()
  })
})
