import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { markerAt, openApp } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

describe('plan editor on the demo building', () => {
  it('shows the centre of mass and centre of rigidity markers with no console errors', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.waitForSelector('[data-testid="marker-cm"]')
    await page.waitForSelector('[data-testid="marker-cr"]')
    const cm = await markerAt(page, 'cm')
    const cr = await markerAt(page, 'cr')
    expect(Number.isFinite(cm.x) && Number.isFinite(cr.x)).toBe(true)
    await session.screenshot(page, 'editor-demo')
    expect(errors).toEqual([])
    await context.close()
  })
})
