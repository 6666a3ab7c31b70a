/**
 * Helpers for driving the Gyre screen in browser tests: wait for a current analysis, read the centre
 * markers, and turn plan coordinates (m) into page pixels using the plan's own view attributes.
 */
import type { Page } from 'playwright-core'

export interface PlanPoint {
  readonly x: number
  readonly y: number
}

/** Open the app with empty storage (or keep it) and wait for the first current analysis. */
export async function openApp(page: Page, url: string): Promise<void> {
  // `still`: the 3D view starts paused, so software rendering does not compete with the test.
  await page.goto(`${url}?still`)
  await page.waitForSelector('[data-testid="plan-canvas"]')
  await waitForCurrentAnalysis(page)
  await waitForStablePlan(page)
}

/**
 * Wait until the plan view stops moving: panes settle and the plan refits after the first results
 * (the centres table beside the plan appears), which can land late on a loaded machine.
 */
export async function waitForStablePlan(page: Page, tries = 40): Promise<void> {
  let last = ''
  for (let i = 0; i < tries; i++) {
    const now = await page.evaluate(() => {
      const svg = document.querySelector('[data-testid="plan-canvas"]') as SVGSVGElement | null
      if (!svg) return 'none'
      const r = svg.getBoundingClientRect()
      return [r.left, r.top, r.width, r.height, svg.dataset.scale, svg.dataset.cx, svg.dataset.cy].join(',')
    })
    if (now === last) return
    last = now
    await page.waitForTimeout(120)
  }
}

/** Wait until the status line says the analysis is current (the latest revision has its answer). */
export async function waitForCurrentAnalysis(page: Page, timeout = 30000): Promise<void> {
  await page.waitForSelector('[data-testid="analysis-state"][data-state="current"]', { timeout })
}

/** The plan position (m) of a centre marker, read from its data attributes. */
export async function markerAt(page: Page, which: 'cm' | 'cr'): Promise<PlanPoint> {
  const el = page.locator(`[data-testid="marker-${which}"]`)
  const x = Number(await el.getAttribute('data-x'))
  const y = Number(await el.getAttribute('data-y'))
  return { x, y }
}

/** Page pixel coordinates of a plan point on the current plan view. */
export async function planToPage(page: Page, p: PlanPoint): Promise<{ x: number; y: number }> {
  return page.evaluate(({ x, y }) => {
    const svg = document.querySelector('[data-testid="plan-canvas"]') as SVGSVGElement
    const r = svg.getBoundingClientRect()
    const scale = Number(svg.dataset.scale)
    const cx = Number(svg.dataset.cx)
    const cy = Number(svg.dataset.cy)
    return { x: r.left + r.width / 2 + (x - cx) * scale, y: r.top + r.height / 2 - (y - cy) * scale }
  }, p)
}

/** Click at a plan point. */
export async function clickPlan(page: Page, p: PlanPoint, modifiers: { shift?: boolean } = {}): Promise<void> {
  const s = await planToPage(page, p)
  if (modifiers.shift) await page.keyboard.down('Shift')
  await page.mouse.click(s.x, s.y)
  if (modifiers.shift) await page.keyboard.up('Shift')
}

/** Press at `from`, move in `steps` to `to`, release; optional callback after each step. */
export async function dragPlan(
  page: Page,
  from: PlanPoint,
  to: PlanPoint,
  steps = 10,
  onStep?: (i: number) => Promise<void>,
): Promise<void> {
  await waitForStablePlan(page)
  const a = await planToPage(page, from)
  const b = await planToPage(page, to)
  await page.mouse.move(a.x, a.y)
  await page.mouse.down()
  for (let i = 1; i <= steps; i++) {
    await page.mouse.move(a.x + ((b.x - a.x) * i) / steps, a.y + ((b.y - a.y) * i) / steps)
    if (onStep) await onStep(i)
  }
  await page.mouse.up()
}

/** Count of records of a kind in the live document (through the test handle). */
export async function countRecords(page: Page, kind: 'walls' | 'frameLines' | 'columns' | 'slabs'): Promise<number> {
  return page.evaluate((k) => {
    const handle = (window as unknown as { __gyre: { store: { getState(): { doc: Record<string, object> } } } }).__gyre
    return Object.keys(handle.store.getState().doc[k] ?? {}).length
  }, kind)
}

/** Distance between two plan points, m. */
export function distance(a: PlanPoint, b: PlanPoint): number {
  return Math.hypot(a.x - b.x, a.y - b.y)
}
