import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L1 = 'L1' as FloorId
const L2 = 'L2' as FloorId
const L3 = 'L3' as FloorId

describe('copyElementsToFloors', () => {
  it('copies walls and columns with new ids spanning the range, keeping in-range story overrides', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'copyElementsToFloors', { ids: ['w1', 'c1'], base: L1, top: L3, dx: 0, dy: 1 }, (doc, before) => {
      const walls = Object.values(doc.walls).filter((w) => !(w.id in before.walls))
      expect(walls).toHaveLength(1)
      expect(walls[0]?.base).toBe('L1')
      expect(walls[0]?.top).toBe('L3')
      expect(walls[0]?.p1).toEqual({ x: 0, y: 1 })
      expect(walls[0]?.stories?.L3?.thickness).toBeCloseTo(0.2, 12)
      const cols = Object.values(doc.columns).filter((c) => !(c.id in before.columns))
      expect(cols).toHaveLength(1)
      expect(cols[0]?.at).toEqual({ x: 6, y: 5 })
      expect(doc.walls.w1).toBe(before.walls.w1)
    })
  })

  it('drops story overrides outside the range', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'copyElementsToFloors', { ids: ['w1'], base: 'ground', top: L2 }, (doc, before) => {
      const copy = Object.values(doc.walls).find((w) => !(w.id in before.walls))
      expect(copy).not.toHaveProperty('stories')
    })
  })

  it('copies a floor-bound mass onto each floor of the range', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'copyElementsToFloors', { ids: ['pm1'], base: L1, top: L3 }, (doc, before) => {
      const copies = Object.values(doc.pointMasses).filter((m) => !(m.id in before.pointMasses))
      expect(copies.map((m) => m.floor).sort()).toEqual(['L2', 'L3'])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'copyElementsToFloors', { ids: ['f1', 's1'], base: 'ground', top: L3 })
  })

  it('refuses an empty selection, a bad range and a material', () => {
    const store = createTestEditor()
    checkRefused(store, 'copyElementsToFloors', { ids: [], base: 'ground', top: L2 }, 'ids: nothing to copy')
    checkRefused(store, 'copyElementsToFloors', { ids: ['w1'], base: L3, top: L2 }, 'top: floor "L2" must be above base "L3"')
    checkRefused(store, 'copyElementsToFloors', { ids: ['steel'], base: 'ground', top: L2 }, 'ids: "steel" is a material')
  })
})
