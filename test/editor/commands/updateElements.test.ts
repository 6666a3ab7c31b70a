import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkDoUndoRedo, checkRefused } from './checklist'

describe('updateElements', () => {
  it('changes several walls as one undoable step', () => {
    const store = createTestEditor()
    checkDoUndoRedo(
      store,
      'updateElements',
      { items: [{ id: 'w1', patch: { thickness: 0.4 } }, { id: 'w2', patch: { locked: true } }] },
      (doc) => {
        expect(doc.walls.w1?.thickness).toBeCloseTo(0.4, 12)
        expect(doc.walls.w2?.locked).toBe(true)
      },
    )
  })

  it('refuses all when one patch is wrong, naming the element and field', () => {
    const store = createTestEditor()
    checkRefused(
      store,
      'updateElements',
      { items: [{ id: 'w1', patch: { thickness: 0.4 } }, { id: 'w2', patch: { thickness: 0 } }] },
      'wall w2: thickness: must be > 0, got 0',
    )
  })
})
