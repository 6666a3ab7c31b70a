import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import type { FloorId } from '@/model'
import { execute, setCurrentFloor, undo } from '@/editor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('removeFloor', () => {
  it('moves element tops down and drops per-story overrides of the removed floor', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'removeFloor', { floor: 'L3' as FloorId }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L1', 'L2'])
      expect(doc.walls.w1?.top).toBe('L2')
      expect(doc.walls.w1?.stories).toBeUndefined()
      expect(doc.frameLines.f1?.top).toBe('L2')
      expect(doc.columns.c1?.top).toBe('L2')
      expect(doc.walls.w2?.top).toBe('L2')
    })
  })

  it('gives floors linked to the removed floor their own copy of its content', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'removeFloor', { floor: 'L1' as FloorId }, (doc) => {
      expect(doc.floors.map((f) => f.id)).toEqual(['L2', 'L3'])
      expect(doc.floors.every((f) => f.typicalOf === undefined)).toBe(true)
      const slabs = Object.values(doc.slabs)
      expect(slabs.map((s) => s.floor).sort()).toEqual(['L2', 'L3'])
      expect(slabs[0]?.openings).toHaveLength(1)
      expect(Object.values(doc.pointMasses).map((m) => m.floor).sort()).toEqual(['L2', 'L3'])
      expect(Object.values(doc.lineMasses)).toHaveLength(2)
      // elements standing on the ground and ending above keep their range
      expect(doc.walls.w1?.base).toBe('ground')
    })
  })

  it('removes an element left with no story and moves a base standing on the floor down', () => {
    const store = createTestEditor()
    execute(store, 'addWall', { id: 'wu', p1: { x: 0, y: 1 }, p2: { x: 0, y: 5 }, base: 'L1' as FloorId, top: 'L2' as FloorId })
    execute(store, 'addWall', { id: 'wv', p1: { x: 1, y: 1 }, p2: { x: 1, y: 5 }, base: 'L1' as FloorId, top: 'L3' as FloorId })
    checkDoUndoRedo(store, 'removeFloor', { floor: 'L2' as FloorId }, (doc) => {
      expect(doc.walls.wu).toBeUndefined()
      expect(doc.walls.wv?.base).toBe('L1')
      expect(doc.walls.wv?.top).toBe('L3')
      expect(doc.walls.w2?.top).toBe('L1')
    })
    const store2 = createTestEditor()
    execute(store2, 'addWall', { id: 'wv', p1: { x: 1, y: 1 }, p2: { x: 1, y: 5 }, base: 'L1' as FloorId, top: 'L3' as FloorId })
    checkDoUndoRedo(store2, 'removeFloor', { floor: 'L1' as FloorId }, (doc) => {
      expect(doc.walls.wv?.base).toBe('ground')
    })
  })

  it('moves the current floor to a remaining one', () => {
    const store = createTestEditor()
    setCurrentFloor(store, 'L3' as FloorId)
    execute(store, 'removeFloor', { floor: 'L3' as FloorId })
    expect(store.getState().currentFloor).toBe('L2')
    undo(store)
    expect(store.getState().doc.floors).toHaveLength(3)
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'removeFloor', { floor: 'L2' as FloorId })
  })

  it('refuses removing the last floor and an unknown floor', () => {
    const store = createTestEditor()
    execute(store, 'removeFloor', { floor: 'L3' as FloorId })
    execute(store, 'removeFloor', { floor: 'L2' as FloorId })
    checkRefused(store, 'removeFloor', { floor: 'L1' as FloorId }, 'the last one cannot be removed')
    checkRefused(store, 'removeFloor', { floor: 'Lq' as FloorId }, 'floor: unknown floor "Lq"')
  })
})

describe('removeFloor on the demo building', () => {
  it('gives each floor that followed the removed typical floor its own slab and facade mass', () => {
    const store = createTestEditor('demo')
    checkDoUndoRedo(store, 'removeFloor', { floor: 'L2' as FloorId }, (doc) => {
      for (const id of ['L3', 'L4', 'L5', 'L6']) {
        expect(doc.floors.find((f) => f.id === id)?.typicalOf).toBeUndefined()
        const slabs = Object.values(doc.slabs).filter((s) => s.floor === id)
        expect(slabs).toHaveLength(1)
        expect(slabs[0]?.outline).toHaveLength(6)
        expect(Object.values(doc.lineMasses).filter((m) => m.floor === id)).toHaveLength(1)
      }
      expect(doc.slabs['s-L2']).toBeUndefined()
    })
  })
})
