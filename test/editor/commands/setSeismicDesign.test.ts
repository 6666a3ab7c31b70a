import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkDoUndoRedo, checkRefused } from './checklist'

const design = {
  code: 'asce7-16' as const,
  riskCategory: 'II' as const,
  systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  systemY: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
}

describe('setAnalysisSettings with a seismic system', () => {
  it('sets, undoes and clears settings.seismicDesign and the flexibility limit', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'setAnalysisSettings', { patch: { seismicDesign: design, torsionalFlexibilityLimit: 1.1 } }, (doc) => {
      expect(doc.settings.seismicDesign).toEqual(design)
      expect(doc.settings.torsionalFlexibilityLimit).toBe(1.1)
    })
    checkDoUndoRedo(store, 'setAnalysisSettings', { patch: { seismicDesign: undefined } }, (doc) => {
      expect(doc.settings.seismicDesign).toBeUndefined()
    })
  })

  it('refuses a wrong value with the loader message naming the field', () => {
    const store = createTestEditor()
    checkRefused(
      store,
      'setAnalysisSettings',
      { patch: { seismicDesign: { ...design, systemX: { ...design.systemX, R: 0 } } } },
      'settings.seismicDesign.systemX.R: must be >= 1, got 0',
    )
    checkRefused(store, 'setAnalysisSettings', { patch: { torsionalFlexibilityLimit: 0 } }, 'settings.torsionalFlexibilityLimit: must be > 0')
  })
})
