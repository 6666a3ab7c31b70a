import { describe, expect, it } from 'vitest'
import { execute } from '@/editor'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('removeSlabVertex', () => {
  it('removes a vertex of an opening', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'removeSlabVertex', { slab: 's1', ring: 0, index: 3 }, (doc) => {
      expect(doc.slabs.s1?.openings[0]).toEqual([
        { x: 2, y: 2 },
        { x: 4, y: 2 },
        { x: 4, y: 4 },
      ])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'removeSlabVertex', { slab: 's1', index: 2 })
  })

  it('refuses a cut that leaves the opening outside the outline, keeping the document (was: accepted)', () => {
    // removing corner (0, 0) of the 12 x 8 m outline leaves the triangle below y = 8 - 2x/3, which
    // misses the opening's corner (2, 2) (hand calculation)
    checkRefused(
      createTestEditor(),
      'removeSlabVertex',
      { slab: 's1', index: 0 },
      'slabs.s1.openings[0]: must lie inside the outline (vertex 0 at (2, 2) is outside)',
    )
  })

  it('refuses to leave fewer than 3 vertices', () => {
    const store = createTestEditor()
    execute(store, 'removeSlabVertex', { slab: 's1', index: 2 })
    checkRefused(store, 'removeSlabVertex', { slab: 's1', index: 0 }, 'outline: a polygon needs at least 3 vertices')
  })
})
