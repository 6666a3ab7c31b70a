import { describe, expect, it } from 'vitest'
import { STIFFNESS_FACTOR_DEFAULTS } from '@/model'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('addColumn', () => {
  it('adds a column with the default section (0.5 m square: 0.5^4/12 m^4, hand calculation)', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addColumn', { id: 'c9', at: { x: 3, y: 6 } }, (doc) => {
      expect(doc.columns.c9?.Ix).toBeCloseTo(0.0052083333, 9)
      expect(doc.columns.c9?.fixity).toBe('fixed')
      expect(doc.columns.c9?.angle).toBeCloseTo(0, 12)
      // ACI 318-19 Table 6.6.3.1.1(a): columns 0.70 Ig, the same default the file reader and engine use
      expect(doc.columns.c9?.stiffnessFactor).toBe(0.7)
      expect(doc.columns.c9?.stiffnessFactor).toBe(STIFFNESS_FACTOR_DEFAULTS.column)
    })
  })

  it('refuses a slab restraint outside (0, 1], naming the field', () => {
    const store = createTestEditor()
    checkRefused(store, 'addColumn', { at: { x: 1, y: 1 }, restraint: 1.2 }, 'restraint: must lie in (0, 1], got 1.2')
    checkRefused(store, 'addColumn', { at: { x: 1, y: 1 }, restraint: 0 }, 'restraint: must lie in (0, 1], got 0')
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addColumn', { at: { x: 1, y: 1 }, angle: 0.3 })
  })

  it('refuses Ix <= 0 and an unknown fixity', () => {
    const store = createTestEditor()
    checkRefused(store, 'addColumn', { at: { x: 1, y: 1 }, Ix: 0 }, 'Ix: must be > 0, got 0')
    checkRefused(store, 'addColumn', { at: { x: 1, y: 1 }, fixity: 'hinged' as never }, 'fixity: must be "fixed" or "pinned"')
  })
})
