import { describe, expect, it } from 'vitest'
import type { Asce7SeismicDesign, Project } from '@/model'
import { analyzeProject } from '@/engine'
import { scaleToElf } from '@/engine/design/spectrumScaling'
import { generateBuilding } from '../../helpers/generateBuilding'

describe('scaleToElf', () => {
  const elf = { direction: 'x' as const, baseShear: 1.2e6, coefficient: 0.044, coefficientGovernedBy: 'minimum-12.8-5', seismicWeight: 2e7 }

  it('scales forces up only to 100 % of V', () => {
    // ASCE/SEI 7-16 12.9.1.4.1: Vt = 6000 kN * Ie/R = 6000/6 = 1000 kN < V = 1200 kN -> 1.2
    const s = scaleToElf({ elasticBaseShear: 6e6, R: 6, Ie: 1, elf })
    expect(s.modalBaseShear).toBeCloseTo(1e6, 6)
    expect(s.forceScale).toBeCloseTo(1.2, 12)
    // Vt = 1500 kN >= V: no scaling down
    expect(scaleToElf({ elasticBaseShear: 9e6, R: 6, Ie: 1, elf }).forceScale).toBe(1)
  })

  it('scales drifts by Cs W / Vt only when the S1 minimum (Eq. 12.8-6) sets Cs', () => {
    // ASCE/SEI 7-16 12.9.1.4.2 (METHODS.md §1): Cs = 0.0625 by Eq. 12.8-6, W = 20 MN -> Cs W = 1250 kN,
    // Vt = 1000 kN -> drift scale 1.25
    const byS1 = { ...elf, coefficient: 0.0625, coefficientGovernedBy: 'minimum-12.8-6' }
    expect(scaleToElf({ elasticBaseShear: 6e6, R: 6, Ie: 1, elf: byS1 }).driftScale).toBeCloseTo(1.25, 12)
    // another rule governs: drifts not scaled
    expect(scaleToElf({ elasticBaseShear: 6e6, R: 6, Ie: 1, elf }).driftScale).toBe(1)
  })
})

describe('spectrum scaling through analyzeProject', () => {
  const design: Asce7SeismicDesign = {
    code: 'asce7-16',
    riskCategory: 'II',
    systemX: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
    systemY: { R: 6, Cd: 5, Omega0: 2.5, Ct: 0.0488, x: 0.75 },
  }
  const p = generateBuilding({ floors: 6, seed: 2 })
  const q: Project = { ...p, settings: { ...p.settings, seismicDesign: design } }

  it('forms spectrum design drifts as Cd/R times the elastic CQC drifts times the scales', () => {
    const r = analyzeProject(q)
    const sc = r.design!.spectrumScaling!
    expect(sc.applicable).toBe(true)
    // Vt = elastic CQC base shear * Ie/R (12.9.1.4 with the reduced spectrum Sa Ie/R)
    expect(sc.x!.modalBaseShear).toBeCloseTo(r.spectrum!.baseShear.x.cqc / 6, 3)
    expect(sc.x!.forceScale).toBeGreaterThanOrEqual(1)
    sc.drifts.forEach((row, i) => {
      const elastic = r.spectrum!.excitationX[i]!.driftMaxCqc.x
      // ASCE/SEI 7-16 Eq. 12.8-15 applied to the reduced drifts: Cd/Ie * Ie/R = 5/6
      expect(row.x).toBeCloseTo((5 / 6) * sc.x!.driftScale * elastic, 12)
    })
  })

  it('does not depend on the baseShearTarget scaling of the shown elastic results', () => {
    const a = analyzeProject(q).design!.spectrumScaling!
    const b = analyzeProject({ ...q, settings: { ...q.settings, baseShearTarget: 3e6 } }).design!.spectrumScaling!
    expect(b.x!.elasticBaseShear / a.x!.elasticBaseShear).toBeCloseTo(1, 9)
    expect(b.drifts[0]!.x / a.drifts[0]!.x).toBeCloseTo(1, 9)
  })
})
