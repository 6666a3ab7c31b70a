import { describe, expect, it } from 'vitest'
import {
  DEFAULT_SIZES,
  GROUP_PANELS,
  LAYOUTS,
  layoutForKey,
  parseStoredLayouts,
  sizesFor,
  validPaneSizes,
  withPaneSizes,
} from '@/ui/workbench/layouts'
import type { GroupId } from '@/ui/workbench/layouts'

const noMods = { ctrlKey: false, metaKey: false, altKey: false }

describe('workbench layouts', () => {
  it('gives every layout sizes for every panel that add up to 100 %', () => {
    for (const l of LAYOUTS) {
      for (const g of Object.keys(GROUP_PANELS) as GroupId[]) {
        expect(validPaneSizes(g, DEFAULT_SIZES[l.id][g]), `${l.id}/${g}`).not.toBeNull()
      }
    }
  })

  it('favours the plan in drafting and the 3D view on the stage', () => {
    expect(DEFAULT_SIZES.drafting.views.plan ?? 0).toBeGreaterThan(DEFAULT_SIZES.drafting.views.model ?? 100)
    expect(DEFAULT_SIZES.stage.views.model ?? 0).toBeGreaterThan(DEFAULT_SIZES.stage.views.plan ?? 100)
    expect(DEFAULT_SIZES['side-by-side'].views.plan).toBe(DEFAULT_SIZES['side-by-side'].views.model)
  })

  it('falls back to side by side and default sizes when storage holds nothing or nonsense', () => {
    for (const text of [null, '', '{', '42', '{"active":"huge","sizes":{"stage":{"views":{"plan":90}}}}']) {
      const s = parseStoredLayouts(text)
      expect(s.active).toBe('side-by-side')
      expect(sizesFor(s, 'stage')).toEqual(DEFAULT_SIZES.stage)
    }
  })

  it('keeps dragged sizes per layout and refuses sizes that do not add up', () => {
    let s = parseStoredLayouts(null)
    s = withPaneSizes(s, 'stage', 'views', { plan: 40, model: 60 })
    s = withPaneSizes(s, 'drafting', 'views', { plan: 40, model: 40 })
    const round = parseStoredLayouts(JSON.stringify({ ...s, active: 'stage' }))
    expect(round.active).toBe('stage')
    expect(sizesFor(round, 'stage').views).toEqual({ plan: 40, model: 60 })
    expect(sizesFor(round, 'stage').columns).toEqual(DEFAULT_SIZES.stage.columns)
    expect(sizesFor(round, 'drafting').views).toEqual(DEFAULT_SIZES.drafting.views)
  })

  it('maps plain 1, 2, 3 to the layouts and ignores them with a modifier', () => {
    expect(layoutForKey({ key: '1', ...noMods })).toBe('drafting')
    expect(layoutForKey({ key: '2', ...noMods })).toBe('side-by-side')
    expect(layoutForKey({ key: '3', ...noMods })).toBe('stage')
    expect(layoutForKey({ key: '3', ...noMods, ctrlKey: true })).toBeNull()
    expect(layoutForKey({ key: '4', ...noMods })).toBeNull()
  })
})
