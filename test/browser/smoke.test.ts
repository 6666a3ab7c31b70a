import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

describe('built app', () => {
  it('loads in headless Chromium with no console errors', async () => {
    const { page, errors, context } = await session.newPage()
    await page.goto(session.url)
    await page.waitForSelector('#root *')
    await session.screenshot(page, 'smoke-start')
    expect(errors).toEqual([])
    await context.close()
  })

  it('creates a WebGL context under software rendering', async () => {
    const { page, context } = await session.newPage()
    await page.goto(session.url)
    const hasWebGL = await page.evaluate(() => {
      const canvas = document.createElement('canvas')
      return Boolean(canvas.getContext('webgl2') ?? canvas.getContext('webgl'))
    })
    expect(hasWebGL).toBe(true)
    await context.close()
  })
})
