/**
 * A dead or hung analysis worker (issue #7): the test hooks on `window.__gyre.analysis.debug` make the
 * real worker crash (an uncaught error inside it) or freeze (busy forever).
 */
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

interface Handle {
  store: { getState(): { revision: number } }
  analysis: {
    getState(): { resultRevision: number | null; isStale: boolean; restarts: number }
    debug: { crash(): void; freeze(): void }
  }
}

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const revisions = (page: Page) =>
  page.evaluate(() => {
    const h = (window as unknown as { __gyre: Handle }).__gyre
    const s = h.analysis.getState()
    return { doc: h.store.getState().revision, result: s.resultRevision, stale: s.isStale, restarts: s.restarts }
  })

describe('analysis worker faults', () => {
  it('shows the fault, restarts the worker and analyses the latest edit when the worker crashes', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.evaluate(() => (window as unknown as { __gyre: Handle }).__gyre.analysis.debug.crash())
    await page.getByTestId('floor-add').click()
    const t0 = Date.now()
    await page.waitForSelector('[data-testid="worker-fault"]', { timeout: 5000 })
    expect(Date.now() - t0).toBeLessThan(5000)
    await expect(page.getByTestId('worker-fault').textContent()).resolves.toContain('the worker stopped')
    await waitForCurrentAnalysis(page)
    const r = await revisions(page)
    expect(r.result).toBe(r.doc)
    expect(r.stale).toBe(false)
    expect(r.restarts).toBe(1)
    await session.screenshot(page, 'worker-crash')
    // The only console error allowed is the crash itself, reported by the browser.
    expect(errors.filter((e) => !e.includes('worker crashed on request'))).toEqual([])
    await context.close()
  })

  it('offers Stop for a frozen worker; stopping leaves results not current and a new edit analyses again', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.evaluate(() => (window as unknown as { __gyre: Handle }).__gyre.analysis.debug.freeze())
    await page.getByTestId('floor-add').click()
    await page.waitForSelector('[data-testid="worker-busy"][data-slow="true"]', { timeout: 30000 })
    await expect(page.getByTestId('worker-busy').textContent()).resolves.toContain('Still analysing')
    await session.screenshot(page, 'worker-frozen')
    await page.getByTestId('analysis-stop').click()
    await page.waitForSelector('[data-testid="analysis-state"][data-state="stopped"]', { timeout: 5000 })
    await page.waitForSelector('[data-testid="worker-stopped"]')
    const stopped = await revisions(page)
    expect(stopped.stale).toBe(true)
    expect(stopped.result).not.toBe(stopped.doc)
    await page.getByTestId('floor-add').click()
    await waitForCurrentAnalysis(page)
    const r = await revisions(page)
    expect(r.result).toBe(r.doc)
    expect(await page.locator('[data-testid="worker-stopped"]').count()).toBe(0)
    expect(errors).toEqual([])
    await context.close()
  })
})
