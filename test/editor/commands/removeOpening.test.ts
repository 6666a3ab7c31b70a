import { describe, expect, it } from 'vitest'
import { execute } from '@/editor'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('removeOpening', () => {
  it('removes the opening', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'removeOpening', { slab: 's1', index: 0 }, (doc) => {
      expect(doc.slabs.s1?.openings).toEqual([])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'removeOpening', { slab: 's1', index: 0 })
  })

  it('refuses when the slab has no such opening', () => {
    const store = createTestEditor()
    checkRefused(store, 'removeOpening', { slab: 's1', index: 1 }, 'index: must be a whole number 0..0, got 1')
    execute(store, 'removeOpening', { slab: 's1', index: 0 })
    checkRefused(store, 'removeOpening', { slab: 's1', index: 0 }, 'slab "s1" has no openings')
  })
})
