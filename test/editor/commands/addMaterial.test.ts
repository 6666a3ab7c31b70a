import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('addMaterial', () => {
  it('adds a material', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addMaterial', { id: 'c50', name: 'Concrete C50', E: 37e9, nu: 0.2 }, (doc) => {
      expect(doc.materials.c50?.E).toBeCloseTo(37e9, 0)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addMaterial', { name: 'Timber', E: 11e9, nu: 0.3 })
  })

  it('refuses E <= 0, nu outside (-1, 0.5) and a taken id', () => {
    const store = createTestEditor()
    checkRefused(store, 'addMaterial', { name: 'X', E: 0, nu: 0.2 }, 'E: must be > 0, got 0')
    checkRefused(store, 'addMaterial', { name: 'X', E: 1e9, nu: 0.5 }, 'nu: must be between -1 and 0.5, got 0.5')
    checkRefused(store, 'addMaterial', { id: 'steel', name: 'X', E: 1e9, nu: 0.2 }, 'id: material "steel" already exists')
  })
})
