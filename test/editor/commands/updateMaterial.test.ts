import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('updateMaterial', () => {
  it('changes E of a material used by elements (they keep referring to it)', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'updateMaterial', { id: 'concrete', patch: { E: 34e9 } }, (doc, before) => {
      expect(doc.materials.concrete?.E).toBeCloseTo(34e9, 0)
      expect(doc.walls.w1).toBe(before.walls.w1)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'updateMaterial', { id: 'steel', patch: { name: 'S355' } })
  })

  it('refuses a wrong value and an unknown material', () => {
    const store = createTestEditor()
    checkRefused(store, 'updateMaterial', { id: 'steel', patch: { E: -1 } }, 'material steel: E: must be > 0, got -1')
    checkRefused(store, 'updateMaterial', { id: 'wood', patch: { E: 1 } }, 'id: unknown material "wood"')
  })
})
