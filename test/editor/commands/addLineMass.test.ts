import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L1 = 'L1' as FloorId

describe('addLineMass', () => {
  it('adds a polyline mass on a floor', () => {
    const store = createTestEditor()
    const points = [{ x: 0, y: 8 }, { x: 12, y: 8 }, { x: 12, y: 0 }]
    checkDoUndoRedo(store, 'addLineMass', { id: 'lm9', floor: L1, points, massPerLength: 300 }, (doc) => {
      expect(doc.lineMasses.lm9?.points).toEqual(points)
      expect(doc.lineMasses.lm9?.massPerLength).toBeCloseTo(300, 12)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addLineMass', { floor: L1, points: [{ x: 0, y: 1 }, { x: 2, y: 1 }] })
  })

  it('refuses a single point, a zero-length line and a negative mass', () => {
    const store = createTestEditor()
    checkRefused(store, 'addLineMass', { floor: L1, points: [{ x: 0, y: 1 }] }, 'points: needs at least 2 points, got 1')
    checkRefused(store, 'addLineMass', { floor: L1, points: [{ x: 0, y: 1 }, { x: 0, y: 1 }] }, 'points: polyline length must be > 0.001 m')
    checkRefused(
      store,
      'addLineMass',
      { floor: L1, points: [{ x: 0, y: 1 }, { x: 2, y: 1 }], massPerLength: -2 },
      'massPerLength: must be >= 0, got -2',
    )
  })
})
