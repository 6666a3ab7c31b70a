import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { floorContent } from '@/model'
import { execute } from '@/editor'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('linkTypicalFloor', () => {
  it('links a floor and removes its own (now hidden) content; undo brings it back', () => {
    const store = createTestEditor()
    execute(store, 'unlinkTypicalFloor', { floor: 'L2' as FloorId })
    expect(Object.values(store.getState().doc.slabs).filter((s) => s.floor === 'L2')).toHaveLength(1)
    checkDoUndoRedo(store, 'linkTypicalFloor', { floor: 'L2' as FloorId, source: 'L1' as FloorId }, (doc) => {
      expect(doc.floors[1]?.typicalOf).toBe('L1')
      expect(Object.values(doc.slabs).filter((s) => s.floor === 'L2')).toHaveLength(0)
      expect(floorContent(doc, 'L2' as FloorId).slabs.map((s) => s.id)).toEqual(['s1'])
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'linkTypicalFloor', { floor: 'L3' as FloorId, source: 'L2' as FloorId })
  })

  it('refuses a link to itself and a loop', () => {
    const store = createTestEditor()
    checkRefused(store, 'linkTypicalFloor', { floor: 'L1' as FloorId, source: 'L1' as FloorId }, 'cannot be a typical copy of itself')
    checkRefused(store, 'linkTypicalFloor', { floor: 'L1' as FloorId, source: 'L2' as FloorId }, 'would make a loop')
    checkRefused(store, 'linkTypicalFloor', { floor: 'L1' as FloorId, source: 'L9' as FloorId }, 'source: unknown floor "L9"')
  })
})
