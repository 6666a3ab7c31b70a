import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L1 = 'L1' as FloorId
const L2 = 'L2' as FloorId

describe('setElementFloorRange', () => {
  it('sets base/top of several elements and drops overrides outside the new range', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setElementFloorRange', { ids: ['w1', 'f1'], base: L1, top: L2 }, (doc) => {
      expect(doc.walls.w1?.base).toBe('L1')
      expect(doc.walls.w1?.top).toBe('L2')
      expect(doc.walls.w1).not.toHaveProperty('stories')
      expect(doc.frameLines.f1?.top).toBe('L2')
    })
  })

  it('moves a slab or mass to the top floor of the range', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setElementFloorRange', { ids: ['pm1'], base: L1, top: L2 }, (doc) => {
      expect(doc.pointMasses.pm1?.floor).toBe('L2')
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'setElementFloorRange', { ids: ['c1'], base: 'ground', top: L1 })
  })

  it('refuses an empty selection and an empty range', () => {
    const store = createTestEditor()
    checkRefused(store, 'setElementFloorRange', { ids: [], base: 'ground', top: L1 }, 'ids: nothing to move to floors')
    checkRefused(store, 'setElementFloorRange', { ids: ['w1'], base: L1, top: L1 }, 'top: floor "L1" must be above base "L1"')
  })
})
