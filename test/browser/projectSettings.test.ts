import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'playwright-core'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'
import { openApp, waitForCurrentAnalysis } from './appDriver'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

interface Snapshot {
  name: string
  criterionSet: string
  damping: number
  spectrum: { kind: string; SDS?: number }
  gridX: { label: string; at: number }[]
  revision: number
  undos: number
  rsBaseShearX: number | null
}

const snapshot = (page: Page): Promise<Snapshot> =>
  page.evaluate(() => {
    type H = {
      store: { getState(): { revision: number; history: { undos: unknown[] }; doc: { name: string; grid?: { x: { label: string; at: number }[] }; settings: { criterionSet: string; damping: number; spectrum: { kind: string; SDS?: number } } } } }
      analysis: { getState(): { result: { spectrum: { baseShear: { x: { cqc: number } } } | null } | null } }
    }
    const h = (window as unknown as { __gyre: H }).__gyre
    const s = h.store.getState()
    return {
      name: s.doc.name,
      criterionSet: s.doc.settings.criterionSet,
      damping: s.doc.settings.damping,
      spectrum: s.doc.settings.spectrum,
      gridX: s.doc.grid?.x ?? [],
      revision: s.revision,
      undos: s.history.undos.length,
      rsBaseShearX: h.analysis.getState().result?.spectrum?.baseShear.x.cqc ?? null,
    }
  })

const commit = async (page: Page, testId: string, text: string): Promise<void> => {
  await page.fill(`[data-testid="${testId}"]`, text)
  await page.press(`[data-testid="${testId}"]`, 'Enter')
}

describe('project settings panel', () => {
  it('edits name, criterion set, damping, SDS and a grid line; the analysis re-runs and the values survive a reload', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    await page.click('[data-testid="project-settings"] > summary')
    const before = await snapshot(page)
    expect(before.spectrum.kind).toBe('asce7')
    expect(before.rsBaseShearX).not.toBeNull()

    await commit(page, 'settings-name', 'Quayside Tower B')
    await page.selectOption('[data-testid="settings-criterion-set"]', 'en1998-1')
    await commit(page, 'settings-damping', '0.03')
    const sds = (before.spectrum.SDS ?? 1) * 1.5
    await commit(page, 'settings-spectrum-SDS', String(sds))
    if (before.gridX.length === 0) await page.click('[data-testid="settings-grid-add-x"]')
    await commit(page, 'settings-grid-x-0-label', 'G1')
    await commit(page, 'settings-grid-x-0-at', '1.25 m')
    await waitForCurrentAnalysis(page)

    const after = await snapshot(page)
    expect(after.name).toBe('Quayside Tower B')
    expect(after.criterionSet).toBe('en1998-1')
    expect(after.damping).toBeCloseTo(0.03, 12)
    expect(after.spectrum.SDS).toBeCloseTo(sds, 12)
    expect(after.gridX[0]).toEqual({ label: 'G1', at: 1.25 })
    // A larger plateau and less damping can only raise the spectral ordinates of the short modes
    // (ASCE/SEI 7-16 11.4.6: Sa = SDS on the plateau), so the base shear must change.
    expect(after.rsBaseShearX).not.toBeNull()
    expect(Math.abs((after.rsBaseShearX ?? 0) - (before.rsBaseShearX ?? 0))).toBeGreaterThan(1e-6 * (before.rsBaseShearX ?? 1))

    // One undo step per change: undo puts back the grid line position only.
    await page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur())
    await page.keyboard.press('Control+z')
    const undone = await snapshot(page)
    expect(undone.gridX[0]?.label).toBe('G1')
    expect(undone.gridX[0]?.at).not.toBe(1.25)
    await page.keyboard.press('Control+Shift+z')
    expect((await snapshot(page)).gridX[0]?.at).toBe(1.25)

    // Snapping is a browser preference, not a document change: it survives the reload too.
    await page.uncheck('[data-testid="settings-snap-midpoints"]')
    await page.waitForFunction(() => document.querySelector('[data-testid="autosave-state"]')?.textContent?.startsWith('autosaved'))
    await page.reload()
    await page.waitForSelector('[data-testid="plan-canvas"]')
    await waitForCurrentAnalysis(page)
    const reloaded = await snapshot(page)
    expect(reloaded.name).toBe('Quayside Tower B')
    expect(reloaded.criterionSet).toBe('en1998-1')
    expect(reloaded.damping).toBeCloseTo(0.03, 12)
    expect(reloaded.spectrum.SDS).toBeCloseTo(sds, 12)
    expect(reloaded.gridX[0]).toEqual({ label: 'G1', at: 1.25 })
    await page.click('[data-testid="project-settings"] > summary')
    await expect(page.inputValue('[data-testid="settings-name"]')).resolves.toBe('Quayside Tower B')
    await expect(page.isChecked('[data-testid="settings-snap-midpoints"]')).resolves.toBe(false)
    const midpoints = await page.evaluate(
      () => (window as unknown as { __gyre: { store: { getState(): { snapping: { midpoints: boolean } } } } }).__gyre.store.getState().snapping.midpoints,
    )
    expect(midpoints).toBe(false)
    await page.check('[data-testid="settings-snap-midpoints"]')
    await session.screenshot(page, 'project-settings')

    // Start from the demo again for the other tests.
    await page.getByTestId('action-demo').click()
    await page.getByTestId('confirm-replace').click()
    expect(errors).toEqual([])
    await context.close()
  })

  it('refuses a bad damping, an empty name and removing a used material with the field named, and keeps the model', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    await page.click('[data-testid="project-settings"] > summary')
    const before = await snapshot(page)
    await commit(page, 'settings-damping', '1.2')
    await page.waitForSelector('[data-testid="project-settings"] [role="alert"]')
    expect(await page.textContent('[data-testid="project-settings"] [role="alert"]')).toContain('settings.damping')
    await commit(page, 'settings-name', '   ')
    await expect(page.locator('[data-testid="project-settings"] [role="alert"]').allTextContents()).resolves.toEqual(
      expect.arrayContaining([expect.stringContaining('name: must be a non-empty name')]),
    )
    // A material in use is not removed; the message names the elements that use it.
    const materialCount = () =>
      page.evaluate(() => Object.keys((window as unknown as { __gyre: { store: { getState(): { doc: { materials: object } } } } }).__gyre.store.getState().doc.materials).length)
    const materials = await materialCount()
    await page.locator('[data-testid^="settings-material-"][data-testid$="-remove"]').first().click()
    await expect(page.locator('[data-testid="settings-materials"] [role="alert"]').textContent()).resolves.toMatch(/is used by \d+ element\(s\) \(/)
    expect(await materialCount()).toBe(materials)
    const after = await snapshot(page)
    expect(after.damping).toBe(before.damping)
    expect(after.name).toBe(before.name)
    expect(after.revision).toBe(before.revision)
    expect(after.undos).toBe(before.undos)
    // Adding a material is one undo step.
    await page.click('[data-testid="settings-material-add"]')
    expect(await materialCount()).toBe(materials + 1)
    await page.keyboard.press('Control+z')
    expect(await materialCount()).toBe(materials)
    expect(errors).toEqual([])
    await context.close()
  })
})
