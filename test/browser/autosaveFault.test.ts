/**
 * Autosave when browser storage refuses writes (issue #7): the test hook
 * `window.__gyre.autosave.debug.failWrites` makes the IndexedDB write (and optionally the emergency
 * copy in localStorage) fail, as a full quota would.
 */
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openApp } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const floors = (page: Page) => page.locator('[data-testid^="floor-"][data-floor-id]').count()
const failWrites = (page: Page, mode: 'database' | 'all') =>
  page.evaluate((m) => {
    const h = (window as unknown as { __gyre: { autosave: { debug: { failWrites(x: string): void } } } }).__gyre
    h.autosave.debug.failWrites(m)
  }, mode)
const waitSaved = (page: Page) =>
  page.waitForSelector('[data-testid="autosave-state"][data-state="saved"]', { timeout: 10000 })

describe('autosave with failing storage', () => {
  it('keeps the newest work when the browser database refuses writes', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.getByTestId('floor-add').click()
    await waitSaved(page)
    expect(await floors(page)).toBe(8)
    await failWrites(page, 'database')
    await page.getByTestId('floor-add').click()
    await page.waitForSelector('[data-testid="save-fallback"]', { timeout: 10000 })
    // The status line no longer shows the earlier save time as if all were fine.
    await expect(page.getByTestId('autosave-state').getAttribute('data-state')).resolves.toBe('problem')
    await session.screenshot(page, 'autosave-fallback')
    await page.reload()
    await page.waitForSelector('[data-testid="plan-canvas"]')
    expect(await floors(page)).toBe(9)
    await expect(page.getByTestId('banner-info').textContent()).resolves.toContain('emergency copy')
    expect(errors).toEqual([])
    await context.close()
  })

  it('shows a lasting warning and asks before leaving when no copy can be stored', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.getByTestId('floor-add').click()
    await waitSaved(page)
    await failWrites(page, 'all')
    await page.getByTestId('floor-add').click()
    await page.waitForSelector('[data-testid="save-failed"]', { timeout: 10000 })
    await expect(page.getByTestId('save-failed').textContent()).resolves.toContain('are not stored')
    await expect(page.getByTestId('autosave-state').textContent()).resolves.toContain('FAILED')
    // The warning stays: still there after more time and another analysis.
    await page.waitForTimeout(1500)
    expect(await page.getByTestId('save-failed').count()).toBe(1)
    const dialogs: string[] = []
    page.on('dialog', (d) => {
      dialogs.push(d.type())
      void d.accept()
    })
    await page.reload()
    await page.waitForSelector('[data-testid="plan-canvas"]')
    expect(dialogs).toEqual(['beforeunload'])
    // The older snapshot comes back, and the notice says from when.
    expect(await floors(page)).toBe(8)
    await expect(page.getByTestId('banner-info').textContent()).resolves.toMatch(/Restored your autosaved model from \d{4}-/)
    expect(errors).toEqual([])
    await context.close()
  })
})
