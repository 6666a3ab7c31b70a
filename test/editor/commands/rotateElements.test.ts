import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('rotateElements', () => {
  it('turns a wall and a column 90° about the origin (hand calculation: (x, y) -> (-y, x))', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'rotateElements', { ids: ['w1', 'c1'], center: { x: 0, y: 0 }, angle: Math.PI / 2 }, (doc) => {
      expect(doc.walls.w1?.p1.x).toBeCloseTo(0, 12)
      expect(doc.walls.w1?.p2.x).toBeCloseTo(0, 12)
      expect(doc.walls.w1?.p2.y).toBeCloseTo(4, 12)
      expect(doc.columns.c1?.at.x).toBeCloseTo(-4, 12)
      expect(doc.columns.c1?.at.y).toBeCloseTo(6, 12)
      // the column's local axes turn with it
      expect(doc.columns.c1?.angle).toBeCloseTo(Math.PI / 2, 12)
    })
  })

  it('turns a slab about its centre keeping its area (30°, centre (6, 4))', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'rotateElements', { ids: ['s1'], center: { x: 6, y: 4 }, angle: Math.PI / 6 }, (doc) => {
      const [a, b] = doc.slabs.s1?.outline ?? []
      // the 12 m edge stays 12 m long and now points at 30°
      expect(Math.hypot((b?.x ?? 0) - (a?.x ?? 0), (b?.y ?? 0) - (a?.y ?? 0))).toBeCloseTo(12, 12)
      expect(Math.atan2((b?.y ?? 0) - (a?.y ?? 0), (b?.x ?? 0) - (a?.x ?? 0))).toBeCloseTo(Math.PI / 6, 12)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'rotateElements', { ids: ['f1', 'pm1'], center: { x: 6, y: 4 }, angle: 0.1 })
  })

  it('refuses an empty selection', () => {
    checkRefused(createTestEditor(), 'rotateElements', { ids: [], center: { x: 0, y: 0 }, angle: 1 }, 'ids: nothing to rotate')
  })
})
