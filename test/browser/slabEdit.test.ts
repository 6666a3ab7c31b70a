/**
 * Browser test of reshaping a slab by its vertex handles on the demo building. The check is
 * physical: pulling the south-east corner further east adds slab area there, so the first floor's
 * centre of mass moves east (centroid of a polygon, common practice).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { clickPlan, dragPlan, markerAt, openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

async function outlineVertex(page: import('playwright-core').Page, slab: string, i: number) {
  return page.evaluate(
    ({ slab, i }) => {
      const handle = (window as unknown as {
        __gyre: { store: { getState(): { doc: { slabs: Record<string, { outline: { x: number; y: number }[] }> } } } }
      }).__gyre
      return handle.store.getState().doc.slabs[slab]?.outline[i] ?? null
    },
    { slab, i },
  )
}

describe('slab outline editing', () => {
  it('drags a selected slab vertex, moves the centre of mass, and undoes in one step', async () => {
    const { page, errors, context } = await session.newPage()
    await openApp(page, session.url)
    const cmBefore = await markerAt(page, 'cm')
    await clickPlan(page, { x: 27, y: 4 })
    await page.getByTestId('handle-s-L1-v1').waitFor()
    await dragPlan(page, { x: 30, y: 0 }, { x: 33, y: 0 })
    await waitForCurrentAnalysis(page)
    const v = await outlineVertex(page, 's-L1', 1)
    expect(v?.x).toBeCloseTo(33, 0)
    expect(v?.y).toBeCloseTo(0, 6)
    const cmAfter = await markerAt(page, 'cm')
    expect(cmAfter.x).toBeGreaterThan(cmBefore.x + 0.05)
    await session.screenshot(page, 'slab-reshaped')
    await page.keyboard.press('Control+z')
    await waitForCurrentAnalysis(page)
    expect(await outlineVertex(page, 's-L1', 1)).toEqual({ x: 30, y: 0 })
    expect(errors).toEqual([])
    await context.close()
  })
})
