/** Browser test: the ground-motion switch runs the time history and lets the 3D view play it. */
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

describe('ground motion switch', () => {
  it('adds the time history to the analysis and offers it to the 3D view', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    await expect(page.getByTestId('viewer-source').count()).resolves.toBe(0)
    await page.getByTestId('toggle-motion').click()
    await expect(page.getByTestId('toggle-motion').getAttribute('aria-pressed')).resolves.toBe('true')
    await page.getByTestId('viewer-source').waitFor({ timeout: 60000 })
    const peaks = await page.evaluate(() => {
      const handle = (window as unknown as {
        __gyre: { analysis: { getState(): { result: { timeHistory: { peaks: { x: number }[] } | null } | null } } }
      }).__gyre
      return handle.analysis.getState().result?.timeHistory?.peaks.map((p) => p.x) ?? []
    })
    // 7 floors; the synthetic motion shakes every floor (peak > 0, finite)
    expect(peaks).toHaveLength(7)
    for (const p of peaks) expect(Number.isFinite(p) && p > 0).toBe(true)
    await page.getByTestId('toggle-motion').click()
    await page.getByTestId('viewer-source').waitFor({ state: 'detached', timeout: 60000 })
    expect(errors).toEqual([])
    await context.close()
  })
})
