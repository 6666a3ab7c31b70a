import { describe, expect, it } from 'vitest'
import { formatResultJson, formatSummary } from '@/cli/format'
import { analyzeProject } from '@/engine'
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import { generateBuilding } from '../helpers/generateBuilding'

const base = generateBuilding({ floors: 5, seed: 9 })
const project: Project = {
  ...base,
  settings: {
    ...base.settings,
    seismicDesign: {
      code: 'asce7-16',
      riskCategory: 'II',
      systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
      systemY: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
    },
  },
}

describe('formatSummary with design-level numbers', () => {
  const text = formatSummary(analyzeProject(project, { spectrum: false }))

  it('prints V, the period used and the factors before the torsion drift table, with the caution', () => {
    const lead = text.indexOf('Design base shear per direction')
    const torsion = text.indexOf('Torsion check, equivalent static loads')
    expect(lead).toBeGreaterThan(0)
    expect(lead).toBeLessThan(torsion)
    const block = text.slice(lead, torsion)
    expect(block).toContain('T used (s)')
    expect(block).toContain('Cs set by')
    expect(block).toContain(`CAUTION: ${CAUTION}`)
  })

  it('prints the design drift, stability and soft-story tables after the torsion check', () => {
    const torsion = text.indexOf('Torsion check, equivalent static loads')
    for (const title of ['Design story drifts', 'P-delta stability coefficient', 'Story stiffness under the ELF pattern', 'Consequences of irregularities']) {
      expect(text.indexOf(title)).toBeGreaterThan(torsion)
    }
  })

  it('says the drifts are elastic when no seismic system is set', () => {
    const plain = formatSummary(analyzeProject(base, { spectrum: false }))
    expect(plain).toContain('Design level: no seismic system set')
    expect(plain.indexOf('Design level')).toBeLessThan(plain.indexOf('Torsion check'))
  })

  it('puts the design section in the JSON right after the regularity', () => {
    const json = JSON.parse(formatResultJson(analyzeProject(project, { spectrum: false }))) as Record<string, unknown>
    const keys = Object.keys(json)
    expect(keys.indexOf('design')).toBe(keys.indexOf('regularity') + 1)
    const design = json.design as { x: { forces: unknown } }
    expect(Array.isArray(design.x.forces)).toBe(true)
  })
})
