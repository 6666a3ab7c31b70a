import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('insertSlabVertex', () => {
  it('inserts a vertex at the given index', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'insertSlabVertex', { slab: 's1', index: 1, at: { x: 6, y: -2 } }, (doc) => {
      expect(doc.slabs.s1?.outline).toHaveLength(5)
      expect(doc.slabs.s1?.outline[1]).toEqual({ x: 6, y: -2 })
      expect(doc.slabs.s1?.outline[2]).toEqual({ x: 12, y: 0 })
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'insertSlabVertex', { slab: 's1', ring: 0, index: 4, at: { x: 1.5, y: 3 } })
  })

  it('refuses an index beyond the end', () => {
    checkRefused(createTestEditor(), 'insertSlabVertex', { slab: 's1', index: 6, at: { x: 0, y: 0 } }, 'index: must be a whole number 0..4')
  })
})
