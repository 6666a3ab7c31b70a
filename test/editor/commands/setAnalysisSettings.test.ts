import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('setAnalysisSettings', () => {
  it('changes damping and the spectrum', () => {
    const store = createTestEditor()
    checkDoUndoRedo(
      store,
      'setAnalysisSettings',
      { patch: { damping: 0.02, spectrum: { kind: 'en1998-1', ag: 0.25, ground: 'C' } } },
      (doc) => {
        expect(doc.settings.damping).toBeCloseTo(0.02, 12)
        expect(doc.settings.spectrum.kind).toBe('en1998-1')
        expect(doc.settings.accidentalEccentricity).toBeCloseTo(0.05, 12)
      },
    )
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'setAnalysisSettings', { patch: { directionCombination: '100-30' } })
  })

  it('refuses out-of-range values and unknown fields', () => {
    const store = createTestEditor()
    checkRefused(store, 'setAnalysisSettings', { patch: { damping: 1 } }, 'settings.damping: must be < 1, got 1')
    checkRefused(store, 'setAnalysisSettings', { patch: { accidentalEccentricity: -0.1 } }, 'settings.accidentalEccentricity: must be >= 0')
    checkRefused(store, 'setAnalysisSettings', { patch: { spectrum: { kind: 'asce7', SDS: 0, SD1: 0.4, TL: 8 } } }, 'spectrum.SDS: must be > 0')
    checkRefused(store, 'setAnalysisSettings', { patch: { colour: 1 } as never }, 'settings: unknown field "colour"')
    checkRefused(store, 'setAnalysisSettings', { patch: { damping: undefined } }, 'settings.damping: is required')
  })

  it('sets and clears the spectrum modes rule when a known rule is given', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setAnalysisSettings', { patch: { spectrumModes: 'ninety-percent' } }, (doc) => {
      expect(doc.settings.spectrumModes).toBe('ninety-percent')
    })
    checkDoUndoRedo(store, 'setAnalysisSettings', { patch: { spectrumModes: undefined } }, (doc) => {
      expect('spectrumModes' in doc.settings).toBe(false)
    })
    checkRefused(store, 'setAnalysisSettings', { patch: { spectrumModes: 'all' as never } }, 'settings.spectrumModes: must be "full-mass" or "ninety-percent"')
  })

  it('refuses a tabulated spectrum whose periods do not ascend', () => {
    const store = createTestEditor()
    checkRefused(
      store,
      'setAnalysisSettings',
      { patch: { spectrum: { kind: 'table', points: [[0, 0.4], [0.5, 1], [0.5, 0.8]] } } },
      'spectrum.points[2]: periods must ascend',
    )
  })
})
