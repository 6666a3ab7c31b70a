/**
 * Browser-test harness: serves the built app (dist/, built by `npm run test:browser` before the
 * tests) on a free localhost port with Vite's preview server and drives Debian's /usr/bin/chromium
 * through playwright-core. Screenshots go to artifacts/screenshots/ (git-ignored, kept by CI).
 * Software WebGL (SwiftShader): no GPU is needed.
 */
import { mkdirSync } from 'node:fs'
import { resolve } from 'node:path'
import { chromium } from 'playwright-core'
import type { Browser, BrowserContext, ConsoleMessage, Page } from 'playwright-core'
import { preview } from 'vite'
import type { PreviewServer } from 'vite'

export const CHROMIUM_PATH = process.env.GYRE_CHROMIUM || '/usr/bin/chromium'
export const CHROMIUM_ARGS = [
  '--headless=new',
  '--no-sandbox',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
]

const root = resolve(import.meta.dirname, '../..')
export const SCREENSHOT_DIR = resolve(root, 'artifacts/screenshots')

export interface BrowserSession {
  readonly url: string
  readonly browser: Browser
  /** A fresh context (own storage) and page; console errors are collected in `errors`. */
  newPage(): Promise<{ page: Page; context: BrowserContext; errors: string[] }>
  screenshot(page: Page, name: string): Promise<string>
  close(): Promise<void>
}

/** Start the preview server and the browser. Call in beforeAll; call close() in afterAll. */
export async function startBrowserSession(): Promise<BrowserSession> {
  const server: PreviewServer = await preview({
    root,
    logLevel: 'error',
    preview: { port: 0, host: '127.0.0.1', strictPort: false, open: false },
  })
  const address = server.httpServer.address()
  if (!address || typeof address === 'string') throw new Error('[test] preview server has no port')
  const url = `http://127.0.0.1:${address.port}/`
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    headless: true,
  })
  mkdirSync(SCREENSHOT_DIR, { recursive: true })
  return {
    url,
    browser,
    async newPage() {
      const context = await browser.newContext({ viewport: { width: 1440, height: 900 } })
      const page = await context.newPage()
      const errors: string[] = []
      page.on('console', (msg: ConsoleMessage) => {
        if (msg.type() === 'error') errors.push(msg.text())
      })
      page.on('pageerror', (err) => errors.push(String(err)))
      return { page, context, errors }
    },
    async screenshot(page, name) {
      const file = resolve(SCREENSHOT_DIR, `${name}.png`)
      await page.screenshot({ path: file })
      return file
    },
    async close() {
      await browser.close()
      await new Promise<void>((done) => server.httpServer.close(() => done()))
    },
  }
}
