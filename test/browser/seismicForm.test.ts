import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { CAUTION_SHORT } from '@/model'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'
import { openApp, waitForCurrentAnalysis } from './appDriver'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const seismicCode = (page: import('playwright-core').Page) =>
  page.evaluate(() => {
    const handle = (window as unknown as { __gyre: { store: { getState(): { doc: { settings: { seismicDesign?: { code: string; systemX: { R: number } } } } } } } }).__gyre
    return handle.store.getState().doc.settings.seismicDesign ?? null
  })

describe('seismic system form', () => {
  it('sets ASCE 7 design rules, shows the design base shear with the caution, and keeps the model on a bad value', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    await page.click('[data-testid="seismic-form"] > summary')
    await page.selectOption('[data-testid="seismic-code"]', 'asce7-16')
    await waitForCurrentAnalysis(page)
    await page.waitForSelector('[data-testid="seismic-result"]')
    const text = await page.textContent('[data-testid="seismic-result"]')
    expect(text).toContain('T used')
    // the screen's one caution line stands beside the design numbers (issue #11: one caution, not six)
    expect(await page.textContent('[data-testid="screen-caution"]')).toContain(CAUTION_SHORT)
    const before = await seismicCode(page)
    expect(before?.code).toBe('asce7-16')
    // A refused value stays in the box with the path-naming message; the model keeps its value.
    await page.fill('[data-testid="seismic-systemX-R"]', '0')
    await page.press('[data-testid="seismic-systemX-R"]', 'Enter')
    await page.waitForSelector('[data-testid="seismic-form"] [role="alert"]')
    expect(await page.textContent('[data-testid="seismic-form"] [role="alert"]')).toContain('settings.seismicDesign.systemX.R')
    expect((await seismicCode(page))?.systemX.R).toBe(before?.systemX.R)
    await session.screenshot(page, 'seismic-form')
    expect(errors).toEqual([])
    await context.close()
  })
})
