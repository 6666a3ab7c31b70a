/**
 * Serves the viewer test page (test/viewer/page) with Vite's dev server on a free localhost port and
 * opens it in Debian's chromium with the harness flags (software WebGL). Used by the browser tests
 * and by bench/viewerFps.ts.
 */
import { resolve } from 'node:path'
import { chromium } from 'playwright-core'
import type { Browser } from 'playwright-core'
import { createServer } from 'vite'
import type { ViteDevServer } from 'vite'
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../browser/harness'

const root = resolve(import.meta.dirname, '../..')

export interface ViewerPageSession {
  readonly url: (query: string) => string
  readonly browser: Browser
  close(): Promise<void>
}

export async function startViewerPage(): Promise<ViewerPageSession> {
  const server: ViteDevServer = await createServer({
    root,
    logLevel: 'error',
    server: { port: 0, host: '127.0.0.1', strictPort: false, hmr: false },
    optimizeDeps: { include: ['react', 'react-dom/client', 'three', '@react-three/fiber', 'zustand'] },
  })
  await server.listen()
  const address = server.httpServer?.address()
  if (!address || typeof address === 'string') throw new Error('[test] viewer page server has no port')
  const base = `http://127.0.0.1:${address.port}/test/viewer/page/index.html`
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS, headless: true })
  return {
    url: (query) => `${base}${query ? `?${query}` : ''}`,
    browser,
    async close() {
      await browser.close()
      await server.close()
    },
  }
}
