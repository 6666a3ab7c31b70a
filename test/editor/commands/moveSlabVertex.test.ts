import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('moveSlabVertex', () => {
  it('moves an outline vertex', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveSlabVertex', { slab: 's1', index: 2, to: { x: 14, y: 9 } }, (doc) => {
      expect(doc.slabs.s1?.outline[2]).toEqual({ x: 14, y: 9 })
      expect(doc.slabs.s1?.outline[1]).toEqual({ x: 12, y: 0 })
    })
  })

  it('moves an opening vertex when the ring is an opening index', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveSlabVertex', { slab: 's1', ring: 0, index: 0, to: { x: 1.5, y: 1.5 } }, (doc) => {
      expect(doc.slabs.s1?.openings[0]?.[0]).toEqual({ x: 1.5, y: 1.5 })
      expect(doc.slabs.s1?.outline[0]).toEqual({ x: 0, y: 0 })
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'moveSlabVertex', { slab: 's1', index: 0, to: { x: -1, y: -1 } })
  })

  it('refuses a bad index, a missing opening and a move that flattens the polygon', () => {
    const store = createTestEditor()
    checkRefused(store, 'moveSlabVertex', { slab: 's1', index: 7, to: { x: 0, y: 0 } }, 'index: must be a whole number 0..3, got 7')
    checkRefused(store, 'moveSlabVertex', { slab: 's1', ring: 3, index: 0, to: { x: 0, y: 0 } }, 'has no openings[3]')
    checkRefused(store, 'moveSlabVertex', { slab: 's1', ring: 0, index: 0, to: { x: Number.NaN, y: 0 } }, 'to.x: must be a number')
  })

  it('refuses a move that makes the outline cross the opening or itself, keeping the document', () => {
    const store = createTestEditor()
    // outline corner (12, 8) pulled to (3, 3): the outline edge now cuts through the opening (2..4, 2..4)
    checkRefused(store, 'moveSlabVertex', { slab: 's1', index: 2, to: { x: 3, y: 3 } }, 'slabs.s1.openings[0]: must lie inside the outline')
    // corner (0, 8) moved to (14, 4): edge 3-0 now crosses edge 1-2 (a bow tie)
    checkRefused(store, 'moveSlabVertex', { slab: 's1', index: 3, to: { x: 14, y: 4 } }, 'outline: edges 1-2 and 3-0 cross or touch')
  })
})
