import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('renameFloor', () => {
  it('renames a floor, trimming spaces', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'renameFloor', { floor: 'L3' as FloorId, name: '  Roof ' }, (doc) => {
      expect(doc.floors[2]?.name).toBe('Roof')
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'renameFloor', { floor: 'L1' as FloorId, name: 'Ground' })
  })

  it('refuses an empty name', () => {
    checkRefused(createTestEditor(), 'renameFloor', { floor: 'L1' as FloorId, name: '   ' }, 'name: must be a non-empty name')
  })
})
