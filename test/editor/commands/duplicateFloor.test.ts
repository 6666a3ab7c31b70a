import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('duplicateFloor', () => {
  it('inserts a copy above and extends elements ending there, repeating their story overrides', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'duplicateFloor', { floor: 'L3' as FloorId, id: 'L4' }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L1', 'L2', 'L3', 'L4'])
      expect(doc.floors[3]?.typicalOf).toBe('L1')
      expect(doc.floors[3]?.height).toBeCloseTo(3, 12)
      expect(doc.walls.w1?.top).toBe('L4')
      expect(doc.walls.w1?.stories?.L4?.thickness).toBeCloseTo(0.2, 12)
      expect(doc.frameLines.f1?.top).toBe('L4')
      expect(doc.columns.c1?.top).toBe('L4')
      expect(doc.walls.w2?.top).toBe('L2')
    })
  })

  it('copies the floor own slabs and masses with new ids', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'duplicateFloor', { floor: 'L1' as FloorId, id: 'L1b' }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L1', 'L1b', 'L2', 'L3'])
      const copies = Object.values(doc.slabs).filter((s) => s.floor === 'L1b')
      expect(copies).toHaveLength(1)
      expect(copies[0]?.id).not.toBe('s1')
      expect(copies[0]?.outline).toEqual(doc.slabs.s1?.outline)
      expect(Object.values(doc.pointMasses).filter((m) => m.floor === 'L1b')).toHaveLength(1)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'duplicateFloor', { floor: 'L2' as FloorId })
  })

  it('refuses an unknown floor and a taken id', () => {
    const store = createTestEditor()
    checkRefused(store, 'duplicateFloor', { floor: 'Lz' as FloorId }, 'floor: unknown floor "Lz"')
    checkRefused(store, 'duplicateFloor', { floor: 'L1' as FloorId, id: 'L3' }, 'id: floor "L3" already exists')
  })
})
