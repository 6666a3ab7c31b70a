/**
 * Frames per second of the 3D mode animation in headless Chromium with software WebGL
 * (SwiftShader, no GPU), for the demo building and a generated 60-storey building.
 * Run: npm run bench:viewer. Serves test/viewer/page with Vite's dev server; counts frames the
 * viewer actually rendered (its onFrameRendered hook) over a fixed wall-clock window after warm-up.
 */
import { loadavg } from 'node:os'
import { startViewerPage } from '../test/viewer/pageServer'

const WARMUP_MS = 2500
const WINDOW_MS = 3000
const WINDOWS = 3

interface Case {
  readonly label: string
  readonly query: string
  readonly viewport: { width: number; height: number }
}

const cases: Case[] = [
  { label: 'demo building (7 floors), 1280x800', query: 'model=demo&engine=1', viewport: { width: 1280, height: 800 } },
  { label: 'generated 60 floors, 1280x800', query: 'model=gen&floors=60&engine=1', viewport: { width: 1280, height: 800 } },
  { label: 'demo building, 640x480', query: 'model=demo&engine=1', viewport: { width: 640, height: 480 } },
  { label: 'generated 60 floors, 640x480', query: 'model=gen&floors=60&engine=1', viewport: { width: 640, height: 480 } },
]

async function main() {
  console.log(`load average at start: ${loadavg().map((v) => v.toFixed(2)).join(' ')}`)
  const session = await startViewerPage()
  const rows: string[] = []
  try {
    for (const c of cases) {
      const context = await session.browser.newContext({ viewport: c.viewport, deviceScaleFactor: 1 })
      const page = await context.newPage()
      await page.goto(session.url(c.query))
      await page.waitForSelector('[data-testid=viewer-canvas] canvas', { timeout: 120000 })
      await page.waitForTimeout(WARMUP_MS)
      const info = await page.evaluate(() => window.__viewerPage)
      const rates: number[] = []
      for (let w = 0; w < WINDOWS; w++) {
        const f0 = await page.evaluate(() => ({ n: window.__viewerFrames ?? 0, t: performance.now() }))
        await page.waitForTimeout(WINDOW_MS)
        const f1 = await page.evaluate(() => ({ n: window.__viewerFrames ?? 0, t: performance.now() }))
        rates.push(((f1.n - f0.n) * 1000) / (f1.t - f0.t))
      }
      rates.sort((a, b) => a - b)
      const fps = rates[Math.floor(rates.length / 2)] ?? 0
      const best = rates[rates.length - 1] ?? 0
      const counts = await page.evaluate(() => document.querySelectorAll('[data-testid^=mode-row-]').length)
      rows.push(
        `${c.label.padEnd(40)} median ${fps.toFixed(1).padStart(5)} fps, best ${best.toFixed(1).padStart(5)}  (modes from ${info?.source ?? '?'}, ${counts} modes${info?.note ? `; ${info.note}` : ''})`,
      )
      console.log(rows[rows.length - 1])
      await context.close()
    }
  } finally {
    await session.close()
  }
  console.log('\nHeadless Chromium, software WebGL (SwiftShader), deviceScaleFactor 1.')
}

main().catch((e) => {
  console.error('[bench]', e)
  process.exitCode = 1
})
