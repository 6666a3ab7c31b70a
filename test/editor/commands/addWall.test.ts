import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('addWall', () => {
  it('adds a wall over the full height with default section and the first material', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addWall', { id: 'w9', p1: { x: 6, y: 0 }, p2: { x: 6, y: 5 } }, (doc) => {
      const w = doc.walls.w9
      expect(w?.base).toBe('ground')
      expect(w?.top).toBe('L3')
      expect(w?.material).toBe('concrete')
      expect(w?.thickness).toBeCloseTo(0.25, 12)
      expect(w?.name).toBe('Wall 3')
      expect(w?.p2).toEqual({ x: 6, y: 5 })
    })
  })

  it('takes an explicit range, section and material', () => {
    const store = createTestEditor()
    checkDoUndoRedo(
      store,
      'addWall',
      { id: 'w8', p1: { x: 0, y: 1 }, p2: { x: 0, y: 7 }, base: 'L1' as FloorId, top: 'L2' as FloorId, thickness: 0.2, material: 'steel' },
      (doc) => {
        expect(doc.walls.w8?.base).toBe('L1')
        expect(doc.walls.w8?.top).toBe('L2')
        expect(doc.walls.w8?.material).toBe('steel')
      },
    )
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addWall', { p1: { x: 1, y: 1 }, p2: { x: 3, y: 1 } })
  })

  it('refuses a zero-length wall, thickness <= 0, an unknown material and an upside-down range', () => {
    const store = createTestEditor()
    checkRefused(store, 'addWall', { p1: { x: 1, y: 1 }, p2: { x: 1, y: 1 } }, 'p2: length must be > 0.001 m')
    checkRefused(store, 'addWall', { p1: { x: 1, y: 1 }, p2: { x: 3, y: 1 }, thickness: 0 }, 'thickness: must be > 0, got 0')
    checkRefused(store, 'addWall', { p1: { x: 1, y: 1 }, p2: { x: 3, y: 1 }, material: 'wood' }, 'material: unknown material "wood"')
    checkRefused(
      store,
      'addWall',
      { p1: { x: 1, y: 1 }, p2: { x: 3, y: 1 }, base: 'L2' as FloorId, top: 'L1' as FloorId },
      'top: floor "L1" must be above base "L2"',
    )
  })
})
