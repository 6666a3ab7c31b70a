import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('unlinkTypicalFloor', () => {
  it('copies the linked content onto the floor with new ids so nothing is lost', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'unlinkTypicalFloor', { floor: 'L2' as FloorId }, (doc) => {
      expect(doc.floors[1]?.typicalOf).toBeUndefined()
      expect(doc.floors[2]?.typicalOf).toBe('L1')
      const own = Object.values(doc.slabs).filter((s) => s.floor === 'L2')
      expect(own).toHaveLength(1)
      expect(own[0]?.id).not.toBe('s1')
      expect(own[0]?.outline).toEqual(doc.slabs.s1?.outline)
      expect(own[0]?.openings).toEqual(doc.slabs.s1?.openings)
      expect(own[0]?.areaMass).toBeCloseTo(600, 12)
      expect(Object.values(doc.lineMasses).filter((m) => m.floor === 'L2')).toHaveLength(1)
      expect(Object.values(doc.pointMasses).filter((m) => m.floor === 'L2')).toHaveLength(1)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'unlinkTypicalFloor', { floor: 'L3' as FloorId })
  })

  it('refuses a floor that is not linked', () => {
    checkRefused(createTestEditor(), 'unlinkTypicalFloor', { floor: 'L1' as FloorId }, 'floor: "L1" is not linked')
  })
})
