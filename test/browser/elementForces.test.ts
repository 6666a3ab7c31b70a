/**
 * Browser test of the element forces panel on the demo building (headless Chromium, software
 * WebGL): pick one wall, read its storey shears for a chosen case, with the caution beside them.
 * The numbers themselves are checked in test/engine/elementForces.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { clickPlan, openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

describe('element forces panel', () => {
  it('shows the picked wall storey by storey for the chosen case with the caution', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    await waitForCurrentAnalysis(page)
    await expect(page.getByTestId('element-forces').count()).resolves.toBe(0)
    await page.getByTestId('action-tool-pick').click()
    // The east gable wall of the demo runs from (30, 2) to (30, 8) on every floor (a planar wall; the
    // core's walls act as one wall group).
    await clickPlan(page, { x: 30, y: 5 })
    const panel = page.getByTestId('element-forces')
    await panel.waitFor({ state: 'visible', timeout: 10000 })
    // the screen's one caution line stays in view beside the numbers
    await expect(page.getByTestId('screen-caution').textContent()).resolves.toContain('licensed')
    const rows = page.locator('[data-testid="element-forces-table-wall"] tbody tr')
    // gable-e runs from the ground to L7: seven storeys
    await expect(rows.count()).resolves.toBe(7)
    await page.getByTestId('element-forces-case').selectOption('Y+e')
    await expect(page.getByTestId('element-forces-case').inputValue()).resolves.toBe('Y+e')
    const firstShear = await rows.first().locator('td').nth(1).textContent()
    expect(Number.isFinite(Number(firstShear))).toBe(true)
    await session.screenshot(page, 'element-forces-wall')
    expect(errors).toEqual([])
    await context.close()
  })
})
