import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('setFloorHeight', () => {
  it('changes one story height and leaves the others', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setFloorHeight', { floor: 'L2' as FloorId, height: 4.2 }, (doc) => {
      expect(doc.floors.map((f) => f.height)).toEqual([3, 4.2, 3])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'setFloorHeight', { floor: 'L1' as FloorId, height: 5 })
  })

  it('refuses a height <= 0 or not a number and an unknown floor', () => {
    const store = createTestEditor()
    checkRefused(store, 'setFloorHeight', { floor: 'L1' as FloorId, height: -1 }, 'height: must be > 0, got -1')
    checkRefused(store, 'setFloorHeight', { floor: 'L1' as FloorId, height: Number.NaN }, 'height: must be a number')
    checkRefused(store, 'setFloorHeight', { floor: 'X' as FloorId, height: 3 }, 'floor: unknown floor "X"')
  })
})
