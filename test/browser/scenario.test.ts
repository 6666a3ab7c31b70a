/**
 * End to end, as a new user would: a 5-storey building with an L-shaped slab, three walls, two frame
 * lines and four columns built from nothing through the screen; read where the centres sit; move the
 * stiffest wall towards the centre of mass to cut the eccentricity; undo; save; reload.
 * Expected directions follow from statics (the centre of rigidity is the stiffness-weighted centre of
 * the resisting lines; common practice), not from stored numbers.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { clickPlan, countRecords, distance, dragPlan, markerAt, openApp, waitForCurrentAnalysis } from './appDriver'
import type { PlanPoint } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const eccentricity = (cm: PlanPoint, cr: PlanPoint): number => distance(cm, cr)

describe('building a 5-storey block from scratch', () => {
  it('builds, balances, undoes, saves and reloads with no console errors', async () => {
    const { page, context, errors } = await session.newPage()
    const t0 = Date.now()
    const step = (name: string): void => {
      if (process.env.GYRE_TEST_STEPS) console.log(`[scenario] ${name} at ${Date.now() - t0} ms`)
    }
    await openApp(page, session.url)
    await page.getByTestId('action-new').click()
    await page.getByTestId('confirm-replace').click()
    await expect(page.locator('[data-floor-id]').count()).resolves.toBe(1)

    step('blank')
    // Floors first (new elements span the ground to the top floor).
    for (let i = 0; i < 4; i++) await page.getByTestId('floor-add').click()
    await expect(page.locator('[data-floor-id]').count()).resolves.toBe(5)
    await page.getByTestId('floor-1').click()

    step('floors')
    // L-shaped slab on floor 1, by clicking its corners on the 6 m grid and the first corner again.
    await page.getByTestId('action-tool-slab').click()
    const L: PlanPoint[] = [
      { x: 0, y: 0 },
      { x: 24, y: 0 },
      { x: 24, y: 12 },
      { x: 12, y: 12 },
      { x: 12, y: 24 },
      { x: 0, y: 24 },
    ]
    for (const p of L) await clickPlan(page, p)
    await clickPlan(page, L[0] as PlanPoint)
    await expect(countRecords(page, 'slabs')).resolves.toBe(1)

    step('slab')
    // Floors 2 to 5 are typical floors of floor 1 (same slab and masses).
    for (let n = 2; n <= 5; n++) {
      await page.getByTestId(`floor-${n}`).click()
      await page.getByTestId('floor-link').selectOption({ label: 'Level 1' })
    }
    await page.getByTestId('floor-1').click()

    step('links')
    // Mass but nothing to resist it yet: the problems panel names a mechanism; a click on it is safe.
    await waitForCurrentAnalysis(page)
    await page.waitForSelector('[data-testid="issue-0"][data-code="mechanism"]')
    await page.getByTestId('issue-0').click()
    await expect(page.locator('[data-testid="marker-cr"]').count()).resolves.toBe(0)

    // Three walls, all on the west side: the plan is eccentric on purpose.
    await page.getByTestId('action-tool-wall').click()
    const walls: [PlanPoint, PlanPoint][] = [
      [{ x: 0, y: 6 }, { x: 0, y: 18 }],
      [{ x: 0, y: 24 }, { x: 6, y: 24 }],
      [{ x: 12, y: 12 }, { x: 12, y: 18 }],
    ]
    for (const [a, b] of walls) {
      await clickPlan(page, a)
      await clickPlan(page, b)
    }
    await expect(countRecords(page, 'walls')).resolves.toBe(3)

    step('walls')
    // Two frame lines on the south and east faces.
    await page.getByTestId('action-tool-frame').click()
    await clickPlan(page, { x: 6, y: 0 })
    await clickPlan(page, { x: 24, y: 0 })
    await clickPlan(page, { x: 24, y: 6 })
    await clickPlan(page, { x: 24, y: 12 })
    await expect(countRecords(page, 'frameLines')).resolves.toBe(2)

    step('frames')
    // Four columns.
    await page.getByTestId('action-tool-column').click()
    for (const p of [
      { x: 6, y: 6 },
      { x: 12, y: 6 },
      { x: 18, y: 6 },
      { x: 6, y: 12 },
    ]) {
      await clickPlan(page, p)
    }
    await expect(countRecords(page, 'columns')).resolves.toBe(4)
    await page.getByTestId('action-tool-pick').click()
    await page.keyboard.press('Escape')

    step('columns')
    await waitForCurrentAnalysis(page)
    await page.waitForSelector('[data-testid="marker-cr"]')
    const cm = await markerAt(page, 'cm')
    const cr = await markerAt(page, 'cr')
    // Centre of mass of the L (0..24 x 0..12 plus 0..12 x 12..24, equal area mass): by composite areas
    // x = y = (288*12 + 144*6) / 432 = 10 m (hand calculation; Green's theorem gives the same).
    expect(cm.x).toBeCloseTo(10, 1)
    expect(cm.y).toBeCloseTo(10, 1)
    // The 12 m wall on x = 0 dominates the y stiffness: the CR lies well west of the CM.
    expect(cr.x).toBeLessThan(cm.x - 3)
    const e0 = eccentricity(cm, cr)
    await session.screenshot(page, 'scenario-built')

    step('centres')
    // Move the long west wall 6 m east, towards the centre of mass.
    await dragPlan(page, { x: 0, y: 12 }, { x: 6, y: 12 }, 10, () => page.waitForTimeout(30))
    await waitForCurrentAnalysis(page)
    const moved = await page.evaluate(() => {
      const h = (window as unknown as { __gyre: { store: { getState(): { doc: { walls: Record<string, { p1: { x: number; y: number } }> } } } } }).__gyre
      return Object.values(h.store.getState().doc.walls).map((w) => w.p1.x)
    })
    expect(moved.some((x) => Math.abs(x - 6) < 0.01)).toBe(true)
    const e1 = eccentricity(await markerAt(page, 'cm'), await markerAt(page, 'cr'))
    expect(e1).toBeLessThan(e0 - 1)
    await session.screenshot(page, 'scenario-balanced')

    step('moved')
    // Undo puts the wall and the centres back exactly.
    await page.getByTestId('action-undo').click()
    await waitForCurrentAnalysis(page)
    const crBack = await markerAt(page, 'cr')
    expect(distance(crBack, cr)).toBeLessThan(1e-9)

    step('undone')
    // Save: the download is the project file with everything in it.
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('action-save').click()])
    const stream = await download.createReadStream()
    const chunks: Buffer[] = []
    for await (const chunk of stream) chunks.push(chunk as Buffer)
    const saved = JSON.parse(Buffer.concat(chunks).toString('utf8')) as {
      floors: unknown[]
      walls: object
      frameLines: object
      columns: object
      slabs: object
    }
    expect(download.suggestedFilename()).toMatch(/\.json$/)
    expect(saved.floors.length).toBe(5)
    expect(Object.keys(saved.walls).length).toBe(3)
    expect(Object.keys(saved.frameLines).length).toBe(2)
    expect(Object.keys(saved.columns).length).toBe(4)
    expect(Object.keys(saved.slabs).length).toBe(1)

    step('saved')
    // Reload: the autosaved model is back, with the same centres.
    await page.reload()
    await page.waitForSelector('[data-testid="plan-canvas"]')
    await waitForCurrentAnalysis(page)
    await expect(countRecords(page, 'walls')).resolves.toBe(3)
    await expect(page.locator('[data-floor-id]').count()).resolves.toBe(5)
    expect(distance(await markerAt(page, 'cr'), cr)).toBeLessThan(1e-6)
    await session.screenshot(page, 'scenario-reloaded')
    expect(errors).toEqual([])
    await context.close()
  }, 300000)
})
