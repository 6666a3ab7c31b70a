import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const L1 = 'L1' as FloorId

describe('addPointMass', () => {
  it('adds a lumped mass with an optional polar inertia', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addPointMass', { id: 'pm9', floor: L1, at: { x: 2, y: 6 }, mass: 5000, polarInertia: 800 }, (doc) => {
      expect(doc.pointMasses.pm9?.mass).toBeCloseTo(5000, 9)
      expect(doc.pointMasses.pm9?.polarInertia).toBeCloseTo(800, 9)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addPointMass', { floor: L1, at: { x: 2, y: 6 } })
  })

  it('refuses a negative mass', () => {
    checkRefused(createTestEditor(), 'addPointMass', { floor: L1, at: { x: 2, y: 6 }, mass: -1 }, 'mass: must be >= 0, got -1')
  })
})
