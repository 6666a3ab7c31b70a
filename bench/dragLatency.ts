/**
 * Analysis round trip during a wall drag in the built app (headless Chromium, software WebGL, the
 * 3D view paused): on the demo building and on a generated 30-storey building. For every answer the
 * worker sends back it records
 *   - round trip: post to the worker until its reply arrives on the UI thread, ms;
 *   - worker time: analyzeProject inside the worker, ms;
 *   - latency: a revision being asked for until its answer, including waiting behind older work, ms;
 * and the main-thread long tasks (> 50 ms) during the drag, per pointer move: the time the UI thread
 * is blocked, which decides whether the plan keeps up with the pointer. (Frame intervals in headless
 * Chromium follow the pace of the scripted input, not the app, so they are not reported.)
 * Run: npm run bench:drag (builds dist/ first).
 */
import { generateBuilding } from '../test/helpers/generateBuilding'
import { startBrowserSession } from '../test/browser/harness'
import type { Page } from 'playwright-core'
import type { Project } from '@/model'

const MOVES = 60
/** Pointer events roughly at display rate. */
const MOVE_INTERVAL_MS = 16

interface Sample {
  readonly roundTrip: number | null
  readonly worker: number | null
  readonly latency: number | null
}

const pct = (values: number[], p: number): number => {
  if (values.length === 0) return NaN
  const s = [...values].sort((a, b) => a - b)
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] as number
}
const fmt = (v: number): string => (Number.isFinite(v) ? v.toFixed(1) : '-')

async function planToPage(page: Page, x: number, y: number): Promise<{ x: number; y: number }> {
  return (await page.evaluate(`(() => {
    const svg = document.querySelector('[data-testid="plan-canvas"]')
    const r = svg.getBoundingClientRect()
    const s = Number(svg.dataset.scale), cx = Number(svg.dataset.cx), cy = Number(svg.dataset.cy)
    return { x: r.left + r.width / 2 + (${x} - cx) * s, y: r.top + r.height / 2 - (${y} - cy) * s }
  })()`)) as { x: number; y: number }
}

async function waitCurrent(page: Page): Promise<void> {
  await page.waitForSelector('[data-testid="analysis-state"][data-state="current"]', { timeout: 120000 })
}

async function measureDrag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }) {
  await waitCurrent(page)
  await page.evaluate(`(() => {
    window.__bench = { samples: [], requested0: window.__gyre.analysis.getState().requestedRevision }
    window.__bench.off = window.__gyre.analysis.subscribe(() => {
      const s = window.__gyre.analysis.getState()
      const last = window.__bench.samples[window.__bench.samples.length - 1]
      if (!last || last.answered !== s.answered) {
        window.__bench.samples.push({ answered: s.answered, roundTrip: s.lastRoundTripMs, worker: s.lastWorkerMs, latency: s.lastLatencyMs })
      }
    })
    window.__bench.longMs = 0
    window.__bench.observer = new PerformanceObserver((list) => { for (const e of list.getEntries()) window.__bench.longMs += e.duration })
    window.__bench.observer.observe({ type: 'longtask' })
  })()`)
  const a = await planToPage(page, from.x, from.y)
  const b = await planToPage(page, to.x, to.y)
  await page.mouse.move(a.x, a.y)
  await page.mouse.down()
  const t0 = Date.now()
  for (let i = 1; i <= MOVES; i++) {
    await page.mouse.move(a.x + ((b.x - a.x) * i) / MOVES, a.y + ((b.y - a.y) * i) / MOVES)
    await page.waitForTimeout(MOVE_INTERVAL_MS)
  }
  await page.mouse.up()
  const dragMs = Date.now() - t0
  await waitCurrent(page)
  const out = (await page.evaluate(`(() => {
    window.__bench.observer.disconnect()
    window.__bench.off()
    const s = window.__gyre.analysis.getState()
    return { samples: window.__bench.samples, longMs: window.__bench.longMs, revisions: s.requestedRevision - window.__bench.requested0, skipped: s.skipped, inWorker: s.inWorker }
  })()`)) as { samples: Sample[]; longMs: number; revisions: number; skipped: number; inWorker: boolean }
  return { ...out, dragMs }
}

function report(label: string, r: Awaited<ReturnType<typeof measureDrag>>): string {
  const rt = r.samples.map((s) => s.roundTrip).filter((v): v is number => v !== null)
  const wk = r.samples.map((s) => s.worker).filter((v): v is number => v !== null)
  const lt = r.samples.map((s) => s.latency).filter((v): v is number => v !== null)
  return [
    `${label}`,
    `  drag: ${MOVES} pointer moves in ${r.dragMs} ms -> ${r.revisions} document revisions, ${r.samples.length} answers (${r.inWorker ? 'Web Worker' : 'main thread'})`,
    `  round trip ms   median ${fmt(pct(rt, 50))}  p95 ${fmt(pct(rt, 95))}  max ${fmt(Math.max(...rt))}`,
    `  worker ms       median ${fmt(pct(wk, 50))}  p95 ${fmt(pct(wk, 95))}`,
    `  latency ms      median ${fmt(pct(lt, 50))}  p95 ${fmt(pct(lt, 95))}  (revision asked -> its answer shown)`,
    `  UI thread       long tasks ${fmt(r.longMs)} ms in all, ${fmt(r.longMs / MOVES)} ms per pointer move`,
  ].join('\n')
}

async function main(): Promise<void> {
  const session = await startBrowserSession()
  const lines: string[] = []
  try {
    const { page, context, errors } = await session.newPage()
    await page.goto(`${session.url}?still`)
    await page.waitForSelector('[data-testid="plan-canvas"]')
    await waitCurrent(page)
    await page.getByTestId('action-tool-pick').click()
    // Warm-up drag (JIT, first worker compile), then the measured one. The east gable wall, x = 30.
    await measureDrag(page, { x: 30, y: 5 }, { x: 27, y: 5 })
    await page.keyboard.press('Control+z')
    lines.push(report('demo building (7 floors): drag the east gable wall 6 m', await measureDrag(page, { x: 30, y: 5 }, { x: 24, y: 5 })))

    const big: Project = generateBuilding({ floors: 30, seed: 7 })
    await page.getByTestId('file-input').setInputFiles({
      name: 'generated-30.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify(big)),
    })
    await page.waitForFunction(`window.__gyre.store.getState().doc.floors.length === 30`, undefined, { timeout: 120000 })
    const first = big.floors[0]?.id
    const wall = Object.values(big.walls).find((w) => w.base === 'ground' && first !== undefined)
    if (!wall) throw new Error('[bench] generated building has no wall from the ground')
    const mid = { x: (wall.p1.x + wall.p2.x) / 2, y: (wall.p1.y + wall.p2.y) / 2 }
    const dx = wall.p2.y - wall.p1.y
    const dy = -(wall.p2.x - wall.p1.x)
    const len = Math.hypot(dx, dy) || 1
    const to = { x: mid.x + (dx / len) * 3, y: mid.y + (dy / len) * 3 }
    await measureDrag(page, mid, { x: mid.x + ((to.x - mid.x) * 1) / 3, y: mid.y + ((to.y - mid.y) * 1) / 3 })
    await page.keyboard.press('Control+z')
    lines.push(report(`generated 30 floors (${Object.keys(big.walls).length} walls, ${Object.keys(big.frameLines).length} frame lines, ${Object.keys(big.columns).length} columns): drag wall ${wall.id} 3 m`, await measureDrag(page, mid, to)))
    if (errors.length) lines.push(`console errors: ${errors.join(' | ')}`)
    await context.close()
  } finally {
    await session.close()
  }
  console.log(lines.join('\n\n'))
}

await main()
