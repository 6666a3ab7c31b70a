/**
 * The 3D view in the built app under software WebGL (SwiftShader): it draws, animates, switches
 * modes, presents, exports, and says why when WebGL is missing. Pixels are read from Playwright
 * screenshots of the canvas element and decoded with test/viewer/pngDecode.ts.
 */
import { readFileSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { CAUTION } from '@/model'
import { BAND_COLOUR, captionLayout } from '@/viewer/exportMedia'
import { colourShare, contentShare, crop, decodePng, differenceShare, hasPngSignature } from '../viewer/pngDecode'
import { readGif } from '../viewer/gifRead'
import type { DecodedPng } from '../viewer/pngDecode'
import { startViewerPage } from '../viewer/pageServer'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const CANVAS = '[data-testid=viewer-canvas] canvas'

async function openApp(): Promise<{ page: Page; errors: string[]; close: () => Promise<void> }> {
  const { page, context, errors } = await session.newPage()
  await page.goto(session.url)
  await page.waitForSelector('[data-testid=mode-row-1]', { timeout: 60000 })
  await page.waitForSelector(CANVAS)
  await page.waitForTimeout(500)
  return { page, errors, close: () => context.close() }
}

async function shot(page: Page): Promise<DecodedPng> {
  return decodePng(new Uint8Array(await page.locator(CANVAS).screenshot()))
}

describe('3D view', () => {
  it('renders the building: the canvas holds non-blank pixels', async () => {
    const { page, errors, close } = await openApp()
    const img = await shot(page)
    await session.screenshot(page, 'viewer-app')
    // The building covers a good part of the view; a blank canvas would give ~0.
    expect(contentShare(img)).toBeGreaterThan(0.05)
    expect(errors.filter((e) => e.includes('[viewer]'))).toEqual([])
    await close()
  })

  it('animates while playing (two frames differ) and holds still when paused', async () => {
    const { page, close } = await openApp()
    const a = await shot(page)
    await page.waitForTimeout(350)
    const b = await shot(page)
    expect(differenceShare(a, b)).toBeGreaterThan(0.002)
    await page.click('[data-testid=viewer-play]')
    await expect.poll(() => page.textContent('[data-testid=viewer-play]')).toBe('Play')
    await page.waitForTimeout(200)
    const c = await shot(page)
    await page.waitForTimeout(350)
    const d = await shot(page)
    expect(differenceShare(c, d)).toBeLessThan(0.0005)
    await close()
  })

  it('shows another shape when another mode is picked', async () => {
    const { page, close } = await openApp()
    await page.click('[data-testid=viewer-peak]')
    await page.waitForTimeout(300)
    const first = await shot(page)
    await page.click('[data-testid=mode-row-3]')
    await expect.poll(() => page.getAttribute('[data-testid=viewer-pane]', 'data-mode')).toBe('3')
    expect(await page.getAttribute('[data-testid=mode-row-3]', 'aria-selected')).toBe('true')
    await page.waitForTimeout(300)
    const third = await shot(page)
    expect(differenceShare(first, third)).toBeGreaterThan(0.003)
    await session.screenshot(page, 'viewer-mode-3')
    await close()
  })

  it('opens presentation mode full window with title, meaning and caution, and closes it', async () => {
    const { page, close } = await openApp()
    const small = await page.locator('[data-testid=viewer-pane]').boundingBox()
    await page.click('[data-testid=viewer-present]')
    await expect.poll(() => page.getAttribute('[data-testid=viewer-pane]', 'data-presenting')).toBe('true')
    const big = await page.locator('[data-testid=viewer-pane]').boundingBox()
    expect(big?.width).toBeCloseTo(1440, 0)
    expect(big?.height).toBeCloseTo(900, 0)
    expect(await page.textContent('[data-testid=presentation-title]')).toMatch(/^Mode 1 · T = \d/)
    expect(await page.textContent('[data-testid=presentation-meaning]')).toMatch(
      /^Mode 1: (mostly X|mostly Y|mostly torsion|coupled) — /,
    )
    expect(await page.textContent('[data-testid=viewer-caution]')).toBe(CAUTION)
    await page.waitForTimeout(400)
    await session.screenshot(page, 'viewer-presentation')
    await page.click('[data-testid=presentation-side]')
    await page.waitForTimeout(400)
    await session.screenshot(page, 'viewer-side-by-side')
    await page.keyboard.press('Escape')
    await expect.poll(() => page.getAttribute('[data-testid=viewer-pane]', 'data-presenting')).toBe('false')
    const after = await page.locator('[data-testid=viewer-pane]').boundingBox()
    expect(after?.width).toBeCloseTo(small?.width ?? 0, 0)
    await page.click('[data-testid=viewer-present]')
    await page.click('[data-testid=presentation-close]')
    await expect.poll(() => page.getAttribute('[data-testid=viewer-pane]', 'data-presenting')).toBe('false')
    await close()
  })

  it('exports a 1920 × 1080 PNG from a smaller pane with the caption in a band below the building', async () => {
    const { page, close } = await openApp()
    await page.click('[data-testid=mode-row-2]')
    const paneSize = () =>
      page.evaluate((sel) => {
        const c = document.querySelector(sel) as HTMLCanvasElement
        return { w: c.width, h: c.height }
      }, CANVAS)
    const before = await paneSize()
    expect(before.w).toBeLessThan(1920)
    await page.selectOption('[data-testid=viewer-export-size]', '1920x1080')
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 20000 }),
      page.click('[data-testid=viewer-export-png]'),
    ])
    expect(download.suggestedFilename()).toBe('corner-block-quarry-street_mode-2.png')
    const bytes = new Uint8Array(readFileSync(await download.path()))
    // PNG specification §5.2 signature, then IHDR (§11.2.2) with the chosen size, not the pane's.
    expect(hasPngSignature(bytes)).toBe(true)
    const img = decodePng(bytes)
    expect([img.width, img.height]).toEqual([1920, 1080])
    const { scene, band } = captionLayout(1920, 1080)
    const bandPixels = crop(img, band)
    const scenePixels = crop(img, scene)
    // The band is mostly its own colour and holds text (caption lines: other pixels).
    expect(colourShare(bandPixels, BAND_COLOUR)).toBeGreaterThan(0.5)
    expect(contentShare(bandPixels)).toBeGreaterThan(0.01)
    // The building area holds the building and no band colour at all: the caption covers nothing.
    expect(contentShare(scenePixels)).toBeGreaterThan(0.03)
    expect(colourShare(scenePixels, BAND_COLOUR, 3)).toBeLessThan(0.002)
    // The pane's canvas is back at its own size after the export.
    await expect.poll(paneSize).toEqual(before)
    await close()
  })

  it('exports a looping GIF of the mode from presentation mode, scaled to fit 960 × 540', async () => {
    const { page, close } = await openApp()
    await page.click('[data-testid=viewer-present]')
    await page.selectOption('[data-testid=presentation-export-size]', '1280x720')
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 90000 }),
      page.click('[data-testid=presentation-export-gif]'),
    ])
    expect(download.suggestedFilename()).toBe('corner-block-quarry-street_mode-1.gif')
    const info = readGif(new Uint8Array(readFileSync(await download.path())))
    // GIF89a specification §17-§18: signature and logical screen size; one image block per frame.
    expect(info.signature).toBe('GIF89a')
    expect([info.width, info.height]).toEqual([960, 540])
    expect(info.frames).toBe(24)
    expect(info.loops).toBe(true)
    await expect.poll(() => page.textContent('[data-testid=viewer-status]')).toContain('Saved corner-block-quarry-street_mode-1.gif')
    await close()
  })

  it('records a short WebM named after project and mode at the chosen size', async () => {
    const { page, close } = await openApp()
    await page.selectOption('[data-testid=viewer-export-size]', '1280x720')
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 150000 }),
      page.click('[data-testid=viewer-export-webm]'),
    ])
    expect(download.suggestedFilename()).toBe('corner-block-quarry-street_mode-1.webm')
    const bytes = new Uint8Array(readFileSync(await download.path()))
    // WebM is Matroska/EBML: the file starts with the EBML magic 1A 45 DF A3 (RFC 8794 §8.1).
    expect(Array.from(bytes.subarray(0, 4))).toEqual([0x1a, 0x45, 0xdf, 0xa3])
    expect(bytes.length).toBeGreaterThan(2000)
    // DocType "webm" and the Matroska codec id "V_VP8" (RFC 9559 §5.1.4.1.21 CodecID; WebM spec).
    const ascii = Buffer.from(bytes).toString('latin1')
    expect(ascii).toContain('webm')
    expect(ascii).toContain('V_VP8')
    // Video track size: PixelWidth (ID B0) 1280 = 05 00, PixelHeight (ID BA) 720 = 02 D0, each a
    // two-byte unsigned integer with size byte 82 (RFC 9559 §5.1.4.1.28.6-7; EBML RFC 8794 §4).
    const hex = Buffer.from(bytes).toString('hex')
    expect(hex).toContain('b0820500')
    expect(hex).toContain('ba8202d0')
    await close()
  }, 200000)

  it('says why when WebGL is unavailable and keeps the rest of the app working', async () => {
    const { page, context, errors } = await session.newPage()
    await page.addInitScript(() => {
      const original = HTMLCanvasElement.prototype.getContext
      // Simulate a browser without WebGL: every WebGL context request fails.
      HTMLCanvasElement.prototype.getContext = function (this: HTMLCanvasElement, type: string, ...rest: unknown[]) {
        if (/webgl/i.test(type)) return null
        return (original as (...a: unknown[]) => unknown).call(this, type, ...rest)
      } as typeof original
    })
    await page.goto(session.url)
    await page.waitForSelector('[data-testid=viewer-unavailable]', { timeout: 60000 })
    expect(await page.textContent('[data-testid=viewer-unavailable]')).toContain('could not create a WebGL context')
    await page.waitForSelector('[data-testid=mode-row-1]', { timeout: 60000 })
    expect(await page.locator(CANVAS).count()).toBe(0)
    expect(errors.filter((e) => /pageerror|Uncaught/i.test(e))).toEqual([])
    await context.close()
  })
})

describe('3D view of a time history (viewer test page, engine results)', () => {
  it('plays the response: the source switch appears and two frames differ', async () => {
    const viewer = await startViewerPage()
    try {
      const context = await viewer.browser.newContext({ viewport: { width: 1000, height: 760 } })
      const page = await context.newPage()
      await page.goto(viewer.url('model=demo&engine=1&th=1'))
      await page.waitForSelector('[data-testid=viewer-source]', { timeout: 90000 })
      expect(await page.evaluate(() => window.__viewerPage?.source)).toBe('engine')
      await page.selectOption('[data-testid=viewer-source]', 'history')
      await page.waitForTimeout(400)
      const a = await shot(page)
      await page.waitForTimeout(500)
      const b = await shot(page)
      expect(differenceShare(a, b)).toBeGreaterThan(0.001)
      expect(await page.textContent('[data-testid=viewer-legend]')).toContain('at the peak')
      await context.close()
    } finally {
      await viewer.close()
    }
  })
})
