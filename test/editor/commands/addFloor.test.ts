import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('addFloor', () => {
  it('adds a floor on top with the height of the floor below when no index is given', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addFloor', { id: 'L4', name: 'Roof' }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L1', 'L2', 'L3', 'L4'])
      expect(doc.floors[3]?.height).toBeCloseTo(3, 12)
      expect(doc.floors[3]?.name).toBe('Roof')
    })
  })

  it('inserts in the middle and an element spanning that position covers the new floor', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addFloor', { index: 1, id: 'Lx', height: 4 }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L1', 'Lx', 'L2', 'L3'])
      // w2 runs ground..L2 by id, so it now spans L1, Lx, L2 (an element referencing floors by range)
      expect(doc.walls.w2?.top).toBe('L2')
      expect(doc.walls.w2).toBe(store.getState().doc.walls.w2)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addFloor', {})
  })

  it('refuses a height <= 0, a bad index and a duplicate id, naming the field', () => {
    const store = createTestEditor()
    checkRefused(store, 'addFloor', { height: 0 }, 'height: must be > 0, got 0')
    checkRefused(store, 'addFloor', { index: 9 }, 'index: must be a whole number 0..3')
    checkRefused(store, 'addFloor', { id: 'L2' }, 'id: floor "L2" already exists')
  })
})
