import { describe, expect, it } from 'vitest'
import { formatSummary } from '@/cli/format'
import { analyzeProject } from '@/engine'
import { buildReportHtml } from '@/report'
import { eccentricOneStorey, mixedModel } from '../helpers/projectBuilder'

describe('plan-regularity wording in the report and the CLI', () => {
  // EN 1998-1:2004 4.2.3.2 has conditions (2) to (6); the built-in set checks (6) only (METHODS.md §2)
  const p = eccentricOneStorey()
  const project = { ...p, settings: { ...p.settings, criterionSet: 'en1998-1' } }
  const result = analyzeProject(project, { spectrum: false })

  it('says the verdict holds for the conditions checked only and names those not checked', () => {
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: new Date(0) })
    expect(html).toContain('for the conditions checked only')
    expect(html).toContain('4.2.3.2(5) slenderness L_max/L_min &lt;= 4')
    expect(html).not.toContain('>regular in plan<')
    const text = formatSummary(result)
    expect(text).toContain('for the conditions checked only')
    expect(text).toContain('Not checked')
    expect(text.replace(/not regular in plan/g, '')).not.toContain('regular in plan')
    expect(html.replace(/not regular in plan/g, '')).not.toContain('regular in plan')
  })

  it('lists the centre-definition information among the issues of the report and the CLI', () => {
    // EN 1998-1:2004 4.2.3.2(8) (METHODS.md §2, from memory): dual systems have no single centre
    const m = mixedModel()
    const r = analyzeProject(m, { spectrum: false })
    const html = buildReportHtml(m, r, { unitSystem: 'SI', generatedAt: new Date(0) })
    expect(html).toContain('centre-definition')
    expect(html).toContain('mixed wall-frame system')
    expect(formatSummary(r)).toContain('mixed wall-frame system')
  })
})
