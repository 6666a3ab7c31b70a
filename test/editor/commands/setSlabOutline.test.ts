import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L = [
  { x: 0, y: 0 },
  { x: 12, y: 0 },
  { x: 12, y: 4 },
  { x: 6, y: 4 },
  { x: 6, y: 8 },
  { x: 0, y: 8 },
]

describe('setSlabOutline', () => {
  it('replaces the outline and keeps the openings', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setSlabOutline', { slab: 's1', outline: L }, (doc) => {
      expect(doc.slabs.s1?.outline).toEqual(L)
      expect(doc.slabs.s1?.openings).toHaveLength(1)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'setSlabOutline', { slab: 's1', outline: L })
  })

  it('refuses an unknown slab and a degenerate outline', () => {
    const store = createTestEditor()
    checkRefused(store, 'setSlabOutline', { slab: 'nope', outline: L }, 'slab: unknown slab "nope"')
    checkRefused(store, 'setSlabOutline', { slab: 's1', outline: L.slice(0, 2) }, 'slab s1: outline: needs at least 3 points')
  })
})
