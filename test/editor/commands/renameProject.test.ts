import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('renameProject', () => {
  it('renames the project, trimming spaces', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'renameProject', { name: '  Harbour Block C ' }, (doc, before) => {
      expect(doc.name).toBe('Harbour Block C')
      expect(doc.floors).toBe(before.floors)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'renameProject', { name: 'Other' })
  })

  it('refuses an empty name and keeps the old one', () => {
    const store = createTestEditor()
    const old = store.getState().doc.name
    checkRefused(store, 'renameProject', { name: '  ' }, 'name: must be a non-empty name')
    expect(store.getState().doc.name).toBe(old)
  })
})
