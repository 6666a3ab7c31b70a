import { describe, expect, it } from 'vitest'
import { execute, setSelection, undo } from '@/editor'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('deleteElements', () => {
  it('deletes a multiple selection across kinds', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'deleteElements', { ids: ['w1', 'c1', 's1', 'pm1'] }, (doc, before) => {
      expect(doc.walls.w1).toBeUndefined()
      expect(doc.columns.c1).toBeUndefined()
      expect(doc.slabs.s1).toBeUndefined()
      expect(doc.pointMasses.pm1).toBeUndefined()
      expect(doc.walls.w2).toBe(before.walls.w2)
    })
  })

  it('drops deleted ids from the selection and undo does not bring the selection back', () => {
    const store = createTestEditor()
    setSelection(store, ['w1', 'w2'])
    execute(store, 'deleteElements', { ids: ['w1'] })
    expect(store.getState().selection).toEqual(['w2'])
    undo(store)
    expect(store.getState().doc.walls.w1).toBeDefined()
    expect(store.getState().selection).toEqual(['w2'])
  })

  it('refuses a material still referenced by elements, naming them', () => {
    const store = createTestEditor()
    checkRefused(store, 'deleteElements', { ids: ['concrete'] }, 'ids: material "concrete" is used by 3 element(s) (w1, w2, c1)')
    checkRefused(store, 'deleteElements', { ids: ['concrete', 'w1', 'w2'] }, 'used by 1 element(s) (c1)')
  })

  it('deletes a material together with all elements that use it, or an unused one', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'deleteElements', { ids: ['concrete', 'w1', 'w2', 'c1'] }, (doc) => {
      expect(doc.materials.concrete).toBeUndefined()
    })
    checkDoUndoRedo(createTestEditor(), 'deleteElements', { ids: ['steel'] }, (doc) => {
      expect(Object.keys(doc.materials)).toEqual(['concrete'])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'deleteElements', { ids: ['f1', 'lm1'] })
  })

  it('refuses an empty selection and unknown ids', () => {
    const store = createTestEditor()
    checkRefused(store, 'deleteElements', { ids: [] }, 'ids: nothing to delete (empty selection)')
    checkRefused(store, 'deleteElements', { ids: ['q'] }, 'ids: unknown id "q"')
  })
})
