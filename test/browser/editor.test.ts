/**
 * Browser tests of the plan editor on the demo building (headless Chromium, software WebGL).
 * Positions are read from the markers' data attributes (plan metres); the expected directions of
 * movement follow from statics: adding or moving a wall pulls the centre of rigidity towards it
 * (MODELING.md, Centres; common practice).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { clickPlan, countRecords, distance, dragPlan, markerAt, openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession
/** One page shared by the tests that do not need fresh storage; each starts from the demo again. */
let shared: Awaited<ReturnType<BrowserSession['newPage']>>

beforeAll(async () => {
  session = await startBrowserSession()
  shared = await session.newPage()
  await openApp(shared.page, session.url)
})
afterAll(async () => {
  await shared?.context.close()
  await session?.close()
})

/** The shared page, back on a fresh demo building (no reload), with its console errors cleared. */
async function demoPage() {
  const { page, errors } = shared
  errors.length = 0
  await page.keyboard.press('Escape')
  await page.getByTestId('action-demo').click()
  await page.getByTestId('confirm-replace').click()
  await waitForCurrentAnalysis(page)
  return shared
}

describe('plan editor on the demo building', () => {
  it('shows the centre of mass and centre of rigidity markers with no console errors', async () => {
    // The shared page was opened fresh in beforeAll: this is the first load.
    const { page, errors } = shared
    const cm = await markerAt(page, 'cm')
    const cr = await markerAt(page, 'cr')
    expect(Number.isFinite(cm.x) && Number.isFinite(cm.y)).toBe(true)
    expect(Number.isFinite(cr.x) && Number.isFinite(cr.y)).toBe(true)
    // The centres differ: the demo is deliberately eccentric (its core sits in one corner).
    expect(distance(cm, cr)).toBeGreaterThan(0.5)
    await expect(page.locator('[data-testid="ecc-vector"]').count()).resolves.toBe(1)
    // One caution line for the whole screen (status line), full text on hover.
    await expect(page.locator('[data-testid="screen-caution"]').getAttribute('title')).resolves.toContain('licensed structural engineer')
    await expect(page.locator('text=Preliminary').count()).resolves.toBe(1)
    await session.screenshot(page, 'editor-demo')
    expect(errors).toEqual([])
  })

  it('moves the centre of rigidity when a wall is drawn, and undo puts it back', async () => {
    const { page, errors } = await demoPage()
    const before = await markerAt(page, 'cr')
    const walls = await countRecords(page, 'walls')
    await page.getByTestId('action-tool-wall').click()
    // A 7 m wall along x near the south-east corner, away from grid lines so snapping leaves it alone.
    await clickPlan(page, { x: 20.5, y: 2.5 })
    await page.mouse.move(0, 0)
    await clickPlan(page, { x: 27.5, y: 2.5 })
    await expect(countRecords(page, 'walls')).resolves.toBe(walls + 1)
    await waitForCurrentAnalysis(page)
    const after = await markerAt(page, 'cr')
    // A wall acting along x in the south pulls the CR south (y down) by a clear margin.
    expect(after.y).toBeLessThan(before.y - 0.2)
    await session.screenshot(page, 'editor-wall-drawn')
    await page.keyboard.press('Control+z')
    await expect(countRecords(page, 'walls')).resolves.toBe(walls)
    await waitForCurrentAnalysis(page)
    const undone = await markerAt(page, 'cr')
    expect(distance(undone, before)).toBeLessThan(1e-9)
    await page.keyboard.press('Control+Shift+z')
    await expect(countRecords(page, 'walls')).resolves.toBe(walls + 1)
    expect(errors).toEqual([])
  })

  it('keeps the overlays following a wall drag and ends on a current analysis', async () => {
    const { page, errors } = await demoPage()
    const before = await markerAt(page, 'cr')
    const seen = new Set<string>()
    await page.getByTestId('action-tool-pick').click()
    // Drag the east gable wall (x = 30, y 2..8) 6 m west in 12 steps.
    await dragPlan(page, { x: 30, y: 5 }, { x: 24, y: 5 }, 12, async () => {
      await page.waitForTimeout(40)
      const p = await markerAt(page, 'cr')
      seen.add(`${p.x.toFixed(4)},${p.y.toFixed(4)}`)
    })
    await waitForCurrentAnalysis(page)
    const after = await markerAt(page, 'cr')
    const wall = await page.evaluate(() => {
      const h = (window as unknown as { __gyre: { store: { getState(): { doc: { walls: Record<string, { p1: { x: number } }> } } } } }).__gyre
      return h.store.getState().doc.walls['gable-e']?.p1.x ?? NaN
    })
    expect(wall).toBeCloseTo(24, 6)
    // The wall that resists y moved west, so the CR moves west.
    expect(after.x).toBeLessThan(before.x - 0.2)
    // The markers moved during the drag, not only at the end (several intermediate positions drawn).
    expect(seen.size).toBeGreaterThanOrEqual(3)
    await session.screenshot(page, 'editor-wall-dragged')
    // One undo step for the whole drag.
    await page.keyboard.press('Control+z')
    await waitForCurrentAnalysis(page)
    expect(distance(await markerAt(page, 'cr'), before)).toBeLessThan(1e-9)
    expect(errors).toEqual([])
  })

  it('converts shown values when the units change, and keeps the model in SI', async () => {
    const { page, errors } = await demoPage()
    await page.getByTestId('action-tool-pick').click()
    await clickPlan(page, { x: 30, y: 5 })
    await expect(page.getByTestId('field-thickness').inputValue()).resolves.toBe('250')
    await expect(page.getByTestId('field-p1x').inputValue()).resolves.toBe('30.00')
    await page.getByTestId('units-US').click()
    // 0.25 m = 9.84 in and 30 m = 98.43 ft (1 in = 0.0254 m, 1 ft = 0.3048 m exactly; NIST SP 811)
    await expect(page.getByTestId('field-thickness').inputValue()).resolves.toBe('9.8')
    await expect(page.getByTestId('field-p1x').inputValue()).resolves.toBe('98.43')
    await session.screenshot(page, 'editor-units-us')
    // Typing 12 in sets 0.3048 m in the model.
    await page.getByTestId('field-thickness').fill('12')
    await page.getByTestId('field-thickness').press('Enter')
    const t = await page.evaluate(() => {
      const h = (window as unknown as { __gyre: { store: { getState(): { doc: { walls: Record<string, { thickness: number }> } } } } }).__gyre
      return h.store.getState().doc.walls['gable-e']?.thickness ?? NaN
    })
    expect(t).toBeCloseTo(0.3048, 9)
    // A refused value shows the message and leaves the model alone.
    await page.getByTestId('field-thickness').fill('-3')
    await page.getByTestId('field-thickness').press('Enter')
    await expect(page.getByTestId('field-thickness-error').textContent()).resolves.toContain('Thickness')
    const t2 = await page.evaluate(() => {
      const h = (window as unknown as { __gyre: { store: { getState(): { doc: { walls: Record<string, { thickness: number }> } } } } }).__gyre
      return h.store.getState().doc.walls['gable-e']?.thickness ?? NaN
    })
    expect(t2).toBeCloseTo(0.3048, 9)
    await page.getByTestId('units-SI').click()
    await expect(page.getByTestId('field-thickness').inputValue()).resolves.toBe('305')
    expect(errors).toEqual([])
  })

  it('shows the core as one wall group and lets a wall be kept apart, undone in one step', async () => {
    const { page, errors } = await demoPage()
    const core = 'shear-centre-core-e+core-n+core-s+core-w'
    await expect(page.locator(`[data-testid="${core}"]`).count()).resolves.toBe(1)
    const before = await markerAt(page, 'cr')
    await page.getByTestId('action-tool-pick').click()
    await clickPlan(page, { x: 8, y: 20.5 }) // the core's east wall
    await expect(page.getByTestId('wall-group').textContent()).resolves.toContain('Acts with: Core north, Core south, Core west')
    await page.getByTestId('field-joins').selectOption('apart')
    await waitForCurrentAnalysis(page)
    await expect(page.getByTestId('wall-group').textContent()).resolves.toContain('Acts alone')
    await expect(page.locator('[data-testid="shear-centre-core-n+core-s+core-w"]').count()).resolves.toBe(1)
    // the rest of the core is a plain C now: its stiffness and so the centre of rigidity change (statics)
    expect(distance(await markerAt(page, 'cr'), before)).toBeGreaterThan(0.01)
    // joining it again from the same box clears the field (the core is whole again) ...
    await page.getByTestId('field-joins').selectOption('auto')
    await waitForCurrentAnalysis(page)
    await expect(page.getByTestId('wall-group').textContent()).resolves.toContain('Acts with: Core north')
    await expect(page.locator(`[data-testid="${core}"]`).count()).resolves.toBe(1)
    // ... and undoing that keeps it apart again
    await page.keyboard.press('Escape')
    await page.keyboard.press('Control+z')
    await waitForCurrentAnalysis(page)
    await expect(page.locator('[data-testid="shear-centre-core-n+core-s+core-w"]').count()).resolves.toBe(1)
    await page.keyboard.press('Control+z')
    await waitForCurrentAnalysis(page)
    await expect(page.locator(`[data-testid="${core}"]`).count()).resolves.toBe(1)
    expect(distance(await markerAt(page, 'cr'), before)).toBeLessThan(1e-9)
    expect(errors).toEqual([])
  })

  it('restores the autosaved model after a reload', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.getByTestId('floor-add').click()
    await expect(page.locator('[data-testid^="floor-"][data-floor-id]').count()).resolves.toBe(8)
    await page.waitForFunction(() => document.querySelector('[data-testid="autosave-state"]')?.textContent?.startsWith('autosaved'))
    await page.reload()
    await page.waitForSelector('[data-testid="plan-canvas"]')
    await expect(page.locator('[data-testid^="floor-"][data-floor-id]').count()).resolves.toBe(8)
    await expect(page.getByTestId('banner-info').textContent()).resolves.toContain('Restored your autosaved model')
    await session.screenshot(page, 'editor-restored')
    // Start from the demo again.
    await page.getByTestId('action-demo').click()
    await page.getByTestId('confirm-replace').click()
    await expect(page.locator('[data-testid^="floor-"][data-floor-id]').count()).resolves.toBe(7)
    expect(errors).toEqual([])
    await context.close()
  })

  it('refuses a broken or newer-version file with a readable message and keeps the model', async () => {
    const { page, errors } = await demoPage()
    const walls = await countRecords(page, 'walls')
    await page.getByTestId('file-input').setInputFiles({
      name: 'broken.json',
      mimeType: 'application/json',
      buffer: Buffer.from('{"format": "gyre-project", "version": 1, "floors": ['),
    })
    await page.waitForSelector('[data-testid="banner-error"]')
    const text1 = (await page.getByTestId('banner-error').textContent()) ?? ''
    expect(text1).toContain('broken.json')
    expect(text1).toContain('not valid JSON')
    await page.getByTestId('banner-close').click()
    await page.getByTestId('file-input').setInputFiles({
      name: 'future.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify({ format: 'gyre-project', version: 99, name: 'x', floors: [] })),
    })
    await page.waitForSelector('[data-testid="banner-error"]')
    const text2 = (await page.getByTestId('banner-error').textContent()) ?? ''
    expect(text2).toContain('future.json')
    expect(text2).toMatch(/version/i)
    await session.screenshot(page, 'editor-file-refused')
    await expect(countRecords(page, 'walls')).resolves.toBe(walls)
    await expect(page.locator('[data-testid="marker-cr"]').count()).resolves.toBe(1)
    expect(errors).toEqual([])
  })
})
