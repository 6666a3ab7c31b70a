import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L2 = 'L2' as FloorId
const square = [
  { x: 20, y: 0 },
  { x: 26, y: 0 },
  { x: 26, y: 6 },
  { x: 20, y: 6 },
]

describe('addSlab', () => {
  it('adds a slab with the given outline and area mass', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addSlab', { id: 's9', floor: 'L1' as FloorId, outline: square, areaMass: 450 }, (doc) => {
      expect(doc.slabs.s9?.outline).toEqual(square)
      expect(doc.slabs.s9?.openings).toEqual([])
      expect(doc.slabs.s9?.areaMass).toBeCloseTo(450, 12)
      expect(doc.slabs.s1).toBe(store.getState().doc.slabs.s1)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addSlab', { floor: L2, outline: square })
  })

  it('refuses too few vertices, a zero-area outline, a negative mass and an unknown floor', () => {
    const store = createTestEditor()
    checkRefused(store, 'addSlab', { floor: L2, outline: square.slice(0, 2) }, 'outline: needs at least 3 points, got 2')
    checkRefused(
      store,
      'addSlab',
      { floor: L2, outline: [{ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 2, y: 2 }] },
      'outline: polygon has zero area',
    )
    checkRefused(store, 'addSlab', { floor: L2, outline: square, areaMass: -5 }, 'areaMass: must be >= 0, got -5')
    checkRefused(store, 'addSlab', { floor: 'L8' as FloorId, outline: square }, 'floor: unknown floor "L8"')
  })
})
