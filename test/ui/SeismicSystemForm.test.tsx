/** Smoke tests of the seismic system form, rendered to markup in node (react-dom/server). */
import { renderToString } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION_SHORT, DEFAULT_SETTINGS } from '@/model'
import type { AnalysisSettings } from '@/model'
import { SeismicSystemFormView } from '@/ui/SeismicSystemForm'
import { eccentricOneStorey } from '../helpers/projectBuilder'

const noop = (): null => null

const asce: AnalysisSettings = {
  ...DEFAULT_SETTINGS,
  seismicDesign: {
    code: 'asce7-16',
    riskCategory: 'III',
    systemX: { preset: 'special-rc-walls-frame', R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
    systemY: { R: 7.5, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  },
}

describe('SeismicSystemFormView', () => {
  it('says the system is not set and offers the design rules', () => {
    const html = renderToString(<SeismicSystemFormView settings={DEFAULT_SETTINGS} result={null} units="SI" message={null} onDesign={noop} onLimit={noop} />)
    expect(html).toContain('Seismic system: not set')
    expect(html).toContain('none (elastic, R = 1)')
    expect(html).not.toContain('data-testid="seismic-systemX-R"')
  })

  it('shows the per-direction values, the preset and a refusal message', () => {
    const html = renderToString(<SeismicSystemFormView settings={asce} result={null} units="SI" message="settings.seismicDesign.systemX.R: must be > 0, got 0" onDesign={noop} onLimit={noop} />)
    expect(html).toContain('data-testid="seismic-systemX-R"')
    expect(html).toContain('value="7.5"')
    expect(html).toContain('Special reinforced concrete shear walls (building frame system)')
    expect(html).toContain('settings.seismicDesign.systemX.R: must be &gt; 0, got 0')
  })

  it('shows the design base shear, leaving the caution to the one screen line', () => {
    const p = eccentricOneStorey()
    const result = analyzeProject({ ...p, settings: { ...p.settings, ...asce } }, { spectrum: false })
    const html = renderToString(<SeismicSystemFormView settings={asce} result={result} units="SI" message={null} onDesign={noop} onLimit={noop} />)
    expect(html).toContain('data-testid="seismic-result"')
    expect(html).toContain('T used')
    // one caution on screen (the status line), not one per panel (issue #11)
    expect(html).not.toContain(CAUTION_SHORT)
  })
})
