/**
 * The working screen in headless Chromium at 1440 × 900: three layouts switched by click and key,
 * pane sizes, the layout and dragged sizes kept over a reload, and the 3D legend and plan trace kept
 * beside the building instead of over it. `GYRE_DOC_SHOTS=1` also writes docs/layout-*.png.
 */
import { resolve } from 'node:path'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { clickPlan, countRecords, openApp } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

interface Box {
  readonly x: number
  readonly y: number
  readonly width: number
  readonly height: number
}

async function box(page: Page, testId: string): Promise<Box> {
  const b = await page.locator(`[data-testid="${testId}"]`).first().boundingBox()
  if (!b) throw new Error(`[test] ${testId} has no box`)
  return b
}

const overlaps = (a: Box, b: Box): boolean =>
  a.x < b.x + b.width - 0.5 && b.x < a.x + a.width - 0.5 && a.y < b.y + b.height - 0.5 && b.y < a.y + a.height - 0.5

async function docShot(page: Page, name: string): Promise<void> {
  await session.screenshot(page, name)
  if (process.env.GYRE_DOC_SHOTS === '1') {
    await page.screenshot({ path: resolve(import.meta.dirname, '../../docs', `${name}.png`) })
  }
}

describe('working screen layouts', () => {
  it('switches layouts by click and by key and sizes the plan and 3D panes to match', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    // Fresh storage: side by side, plan and 3D at equal width (±2 px for the separator rounding).
    expect(await page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('side-by-side')
    let plan = await box(page, 'pane-plan')
    let model = await box(page, 'pane-model')
    expect(Math.abs(plan.width - model.width)).toBeLessThan(3)
    await page.waitForTimeout(300)
    await docShot(page, 'layout-split')

    await page.click('[data-testid=layout-drafting]')
    await expect.poll(() => page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('drafting')
    expect(await page.getAttribute('[data-testid=layout-drafting]', 'aria-pressed')).toBe('true')
    plan = await box(page, 'pane-plan')
    model = await box(page, 'pane-model')
    expect(plan.width).toBeGreaterThan(1.8 * model.width)
    expect(plan.width).toBeGreaterThan(560)
    await page.waitForTimeout(300)
    await docShot(page, 'layout-plan')

    await page.locator('body').click({ position: { x: 5, y: 895 } })
    await page.keyboard.press('3')
    await expect.poll(() => page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('stage')
    plan = await box(page, 'pane-plan')
    model = await box(page, 'pane-model')
    expect(model.width).toBeGreaterThan(2 * plan.width)
    // The 3D view itself (not counting legend column and toolbars) is large enough for a meeting.
    const canvas = await box(page, 'viewer-canvas-box')
    expect(canvas.width).toBeGreaterThan(560)
    expect(canvas.height).toBeGreaterThan(380)
    await page.waitForTimeout(300)
    await docShot(page, 'layout-3d')

    await page.keyboard.press('2')
    await expect.poll(() => page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('side-by-side')
    expect(errors).toEqual([])
    await context.close()
  })

  it('keeps the legend and plan trace beside the 3D canvas in every layout', async () => {
    const { page, context } = await session.newPage()
    await openApp(page, session.url)
    await page.waitForSelector('[data-testid=viewer-legend]')
    for (const id of ['drafting', 'side-by-side', 'stage']) {
      await page.click(`[data-testid=layout-${id}]`)
      await page.waitForTimeout(150)
      const canvas = await box(page, 'viewer-canvas-box')
      for (const over of ['viewer-legend', 'viewer-trace']) {
        if ((await page.locator(`[data-testid=${over}]`).count()) === 0) continue
        expect(overlaps(canvas, await box(page, over)), `${over} over the canvas in ${id}`).toBe(false)
      }
    }
    await context.close()
  })

  it('keeps the chosen layout and the dragged pane sizes over a reload', async () => {
    const { page, context } = await session.newPage()
    await openApp(page, session.url)
    await page.click('[data-testid=layout-stage]')
    await expect.poll(() => page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('stage')
    const before = await box(page, 'pane-plan')
    // Drag the separator between plan and 3D view 120 px to the right.
    const sep = page.locator('[data-testid=pane-plan] + [data-separator]')
    const s = await sep.boundingBox()
    if (!s) throw new Error('[test] separator has no box')
    await page.mouse.move(s.x + s.width / 2, s.y + s.height / 2)
    await page.mouse.down()
    await page.mouse.move(s.x + s.width / 2 + 60, s.y + s.height / 2, { steps: 4 })
    await page.mouse.move(s.x + s.width / 2 + 120, s.y + s.height / 2, { steps: 4 })
    await page.mouse.up()
    const dragged = await box(page, 'pane-plan')
    expect(dragged.width - before.width).toBeGreaterThan(100)
    await page.reload()
    await page.waitForSelector('[data-testid=workbench]')
    expect(await page.getAttribute('[data-testid=workbench]', 'data-layout')).toBe('stage')
    expect(await page.getAttribute('[data-testid=layout-stage]', 'aria-pressed')).toBe('true')
    const after = await box(page, 'pane-plan')
    expect(Math.abs(after.width - dragged.width)).toBeLessThan(3)
    // Another layout and back: the stage keeps the dragged size, the drafting layout its own.
    await page.click('[data-testid=layout-drafting]')
    await page.click('[data-testid=layout-stage]')
    await page.waitForTimeout(100)
    expect(Math.abs((await box(page, 'pane-plan')).width - dragged.width)).toBeLessThan(3)
    await context.close()
  })
})

describe('numbers where the eye is', () => {
  it('shows every floor centres beside the plan, the current floor highlighted, and a row click changes floor', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    const rows = page.locator('[data-testid=centres-table] tbody tr')
    await expect.poll(() => rows.count()).toBe(7)
    const current = page.locator('[data-testid=centres-table] tr[aria-current=true]')
    await expect.poll(() => current.count()).toBe(1)
    // The demo opens on Level 1; it is the bottom row (top floor first).
    expect(await current.first().locator('td').first().textContent()).toBe('1')
    expect(await page.locator('[data-testid=centres-table]').textContent()).not.toMatch(/NaN/)
    await rows.nth(0).click()
    await expect.poll(() => page.textContent('[data-testid=plan-floor]')).toMatch(/^Floor 7/)
    await expect.poll(() => current.first().locator('td').first().textContent()).toBe('7')
    expect(errors).toEqual([])
    await context.close()
  })

  it('labels the circles and the CM to CR arrow, shows numbers on hover, and has a key for every symbol', async () => {
    const { page, context } = await session.newPage()
    await openApp(page, session.url)
    for (const id of ['label-ls', 'label-rx', 'label-ry', 'label-ecc']) {
      expect(await page.locator(`[data-testid=${id}]`).count(), id).toBe(1)
    }
    expect(await page.textContent('[data-testid=label-ls]')).toMatch(/^l_s \d+(\.\d)? m$/)
    const cm = await page.locator('[data-testid=marker-cm] circle').first().boundingBox()
    if (!cm) throw new Error('[test] CM marker has no box')
    await page.mouse.move(cm.x + cm.width / 2, cm.y + cm.height / 2)
    await page.waitForSelector('[data-testid=tip-cm]')
    expect(await page.textContent('[data-testid=tip-cm]')).toContain('Centre of mass (CM)')
    const cr = await page.locator('[data-testid=marker-cr] path').first().boundingBox()
    if (!cr) throw new Error('[test] CR marker has no box')
    await page.mouse.move(cr.x + cr.width / 2, cr.y + cr.height * 0.7)
    await page.waitForSelector('[data-testid=tip-cr]')
    expect(await page.textContent('[data-testid=tip-cr]')).toMatch(/e_x\/r_x \d\.\d\d/)
    await page.click('[data-testid=plan-key-toggle] summary')
    expect(await page.locator('[data-testid=plan-key] li').count()).toBeGreaterThanOrEqual(18)
    await session.screenshot(page, 'plan-numbers')
    await context.close()
  })
})

async function thickness(page: Page): Promise<number> {
  return page.evaluate(() => {
    const h = (window as unknown as { __gyre: { store: { getState(): { doc: { walls: Record<string, { thickness: number }> } } } } }).__gyre
    return h.store.getState().doc.walls['gable-e']?.thickness ?? NaN
  })
}

describe('number entry with units', () => {
  it('reads a typed unit in a mm box and asks before taking a 0.25 mm wall', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    await page.getByTestId('action-tool-pick').click()
    await clickPlan(page, { x: 30, y: 5 })
    const box = page.getByTestId('field-thickness')
    await expect.poll(() => box.inputValue()).toBe('250')
    // 1 in = 0.0254 m exactly (NIST SP 811 Appendix B.8): 12 in = 0.3048 m; 1'-6" = 0.4572 m.
    await box.fill('12 in')
    await box.press('Enter')
    await expect.poll(() => thickness(page)).toBeCloseTo(0.3048, 9)
    await box.fill('0.3 m')
    await box.press('Enter')
    await expect.poll(() => thickness(page)).toBeCloseTo(0.3, 9)
    await box.fill("1'-6\"")
    await box.press('Enter')
    await expect.poll(() => thickness(page)).toBeCloseTo(0.4572, 9)
    // "0.25" in the mm box is 0.25 mm: not taken silently.
    await box.fill('0.25')
    await box.press('Enter')
    await expect.poll(() => page.getByTestId('field-thickness-warning').textContent()).toMatch(/unusual for a wall thickness/)
    expect(await thickness(page)).toBeCloseTo(0.4572, 9)
    await box.press('Enter')
    await expect.poll(() => thickness(page)).toBeCloseTo(0.00025, 12)
    expect(errors).toEqual([])
    await context.close()
  })
})

describe('keyboard', () => {
  it('sends typed numbers to the entry box while drawing, undoes from a property box, and opens the ? sheet', async () => {
    const { page, context, errors } = await session.newPage()
    await openApp(page, session.url)
    const walls = await countRecords(page, 'walls')
    await page.keyboard.press('w')
    // Away from grid lines and clear of the entry box at the lower left of the plan.
    await clickPlan(page, { x: 20.5, y: 2.5 })
    await page.keyboard.type('@6<90')
    expect(await page.getByTestId('numeric-input').inputValue()).toBe('@6<90')
    await page.keyboard.press('Enter')
    await expect.poll(() => countRecords(page, 'walls')).toBe(walls + 1)
    await page.keyboard.press('Escape')

    // Ctrl+Z with the focus in an inspector box undoes the last change (the new wall).
    await page.keyboard.press('v')
    await clickPlan(page, { x: 30, y: 5 })
    await page.getByTestId('field-thickness').focus()
    await page.keyboard.press('Control+z')
    await expect.poll(() => countRecords(page, 'walls')).toBe(walls)

    await page.locator('body').click({ position: { x: 5, y: 895 } })
    await page.keyboard.press('?')
    await page.waitForSelector('[data-testid=shortcut-sheet]')
    expect(await page.locator('[data-testid=shortcut-sheet] [data-testid=plan-key] li').count()).toBeGreaterThanOrEqual(18)
    expect(await page.textContent('[data-testid=shortcut-sheet]')).toContain('Ctrl+Z')
    await session.screenshot(page, 'shortcut-sheet')
    await page.keyboard.press('Escape')
    await expect.poll(() => page.locator('[data-testid=shortcut-sheet]').count()).toBe(0)
    expect(errors).toEqual([])
    await context.close()
  })
})
