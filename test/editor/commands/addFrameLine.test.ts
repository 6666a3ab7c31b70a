import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('addFrameLine', () => {
  it('adds a frame line with direct story stiffness by default', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addFrameLine', { id: 'f9', p1: { x: 12, y: 0 }, p2: { x: 12, y: 8 } }, (doc) => {
      const f = doc.frameLines.f9
      expect(f?.stiffness.kind).toBe('direct')
      if (f?.stiffness.kind === 'direct') expect(f.stiffness.storyStiffness).toBeCloseTo(5e7, 0)
      expect(f?.top).toBe('L3')
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addFrameLine', { p1: { x: 0, y: 0 }, p2: { x: 0, y: 8 } })
  })

  it('refuses invalid member data, naming the field', () => {
    const store = createTestEditor()
    checkRefused(
      store,
      'addFrameLine',
      {
        p1: { x: 0, y: 0 },
        p2: { x: 0, y: 8 },
        stiffness: { kind: 'moment', bays: 0, bayWidth: 4, columnI: 1e-3, beamI: 1e-3, material: 'concrete' as never },
      },
      'stiffness.bays: must be > 0, got 0',
    )
    checkRefused(
      store,
      'addFrameLine',
      { p1: { x: 0, y: 0 }, p2: { x: 0, y: 8 }, stiffness: { kind: 'direct', storyStiffness: -1 } },
      'stiffness.storyStiffness: must be > 0, got -1',
    )
  })
})
