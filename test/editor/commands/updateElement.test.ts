import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('updateElement', () => {
  it('patches a wall and leaves other fields and records alone', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'updateElement', { id: 'w1', patch: { thickness: 0.35, name: 'Core A' } }, (doc, before) => {
      expect(doc.walls.w1?.thickness).toBeCloseTo(0.35, 12)
      expect(doc.walls.w1?.name).toBe('Core A')
      expect(doc.walls.w1?.stories).toEqual(before.walls.w1?.stories)
      expect(doc.walls.w2).toBe(before.walls.w2)
    })
  })

  it('clears an optional field patched to undefined', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'updateElement', { id: 'w1', patch: { stories: undefined } }, (doc) => {
      expect(doc.walls.w1).not.toHaveProperty('stories')
    })
  })

  it('keeps a wall apart from touching walls and lets it join again', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'updateElement', { id: 'w1', patch: { joins: 'apart' } }, (doc) => {
      expect(doc.walls.w1?.joins).toBe('apart')
    })
    checkDoUndoRedo(store, 'updateElement', { id: 'w1', patch: { joins: undefined } }, (doc) => {
      expect(doc.walls.w1).not.toHaveProperty('joins')
    })
    checkRefused(store, 'updateElement', { id: 'w1', patch: { joins: 'never' as never } }, 'wall w1: joins: must be "auto" or "apart"')
  })

  it('patches columns, slabs and masses', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'updateElement', { id: 'c1', patch: { fixity: 'pinned', angle: 0.5 } }, (doc) => {
      expect(doc.columns.c1?.fixity).toBe('pinned')
      expect(doc.columns.c1?.angle).toBeCloseTo(0.5, 12)
    })
    checkDoUndoRedo(store, 'updateElement', { id: 's1', patch: { areaMass: 700 } }, (doc) => {
      expect(doc.slabs.s1?.areaMass).toBeCloseTo(700, 12)
    })
    checkDoUndoRedo(store, 'updateElement', { id: 'pm1', patch: { mass: 2500 } }, (doc) => {
      expect(doc.pointMasses.pm1?.mass).toBeCloseTo(2500, 12)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'updateElement', { id: 'f1', patch: { name: 'North frame' } })
  })

  it('refuses a wrong value with a message naming element, field and problem; the doc stays', () => {
    const store = createTestEditor()
    checkRefused(store, 'updateElement', { id: 'w1', patch: { thickness: 0 } }, 'wall w1: thickness: must be > 0, got 0')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { thickness: -0.2 } }, 'wall w1: thickness: must be > 0, got -0.2')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { p2: { x: 0, y: 0 } } }, 'wall w1: p2: length must be > 0.001 m')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { material: 'wood' as never } }, 'wall w1: material: unknown material "wood"')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { stories: { L3: { thickness: -1 } } } }, 'wall w1: stories.L3.thickness: must be > 0')
    checkRefused(store, 'updateElement', { id: 'w2', patch: { top: 'L1' as FloorId, base: 'L2' as FloorId } }, 'wall w2: top: floor "L1" must be above base "L2"')
    checkRefused(store, 'updateElement', { id: 'c1', patch: { Iy: Number.NaN } }, 'column c1: Iy: must be a number')
    checkRefused(store, 'updateElement', { id: 's1', patch: { areaMass: -1 } }, 'slab s1: areaMass: must be >= 0, got -1')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { colour: 'red' } as never }, 'wall w1: unknown field "colour"')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { thickness: undefined } }, 'wall w1: thickness: is required')
    checkRefused(store, 'updateElement', { id: 'w1', patch: { id: 'w7' } as never }, 'wall w1: id cannot be changed')
    checkRefused(store, 'updateElement', { id: 'nope', patch: {} }, 'id: unknown element "nope"')
    checkRefused(store, 'updateElement', { id: 'concrete', patch: {} }, 'id: unknown element "concrete"')
  })
})
