/**
 * Scaling of the response spectrum results to the ELF base shear, as a separate step on the spectrum
 * result (the spectrum analysis itself stays elastic): ASCE/SEI 7-16 12.9.1.4.1 forces up only to
 * 100 % of V (85 % in 7-10, from memory), 12.9.1.4.2 drifts by Cs W / Vt only when Vt < Cs W and Cs
 * is set by Eq. 12.8-6 (the S1 minimum). Design drifts: Cd/Ie times the reduced (Ie/R) drifts.
 * EN 1998-1 asks no such scaling of modal results to the lateral force (from memory).
 * @see METHODS.md §1 "12.9.1" (scaling confirmed on a secondary page); docs/dynamics.md
 */
import type { SeismicDesign } from '@/model'
import type { SpectrumResult, Structure } from '../results'
import { driftLimit } from './drifts'
import type { ElfDirection, SpectrumDesignDriftRow, SpectrumScaling, SpectrumScalingDirection } from './types'

/** Force and drift scale of one direction (exported for hand checks). */
export function scaleToElf(input: {
  elasticBaseShear: number
  R: number
  Ie: number
  elf: Pick<ElfDirection, 'baseShear' | 'coefficient' | 'coefficientGovernedBy' | 'seismicWeight' | 'direction'>
}): SpectrumScalingDirection {
  const { elasticBaseShear, R, Ie, elf } = input
  const Vt = (elasticBaseShear * Ie) / R
  const V = elf.baseShear
  const forceScale = Vt > 0 && Vt < V ? V / Vt : 1
  const CsW = elf.coefficient * elf.seismicWeight
  const byS1 = elf.coefficientGovernedBy === 'minimum-12.8-6'
  const driftScale = byS1 && Vt > 0 && Vt < CsW ? CsW / Vt : 1
  const reason =
    (forceScale > 1 ? `Vt < V: forces scaled up by V/Vt (12.9.1.4.1)` : 'Vt >= V: no force scaling (up only, 12.9.1.4.1)') +
    (driftScale > 1 ? '; Cs set by Eq. 12.8-6: drifts scaled by Cs W/Vt (12.9.1.4.2)' : '; drifts not scaled (12.9.1.4.2)')
  return { direction: elf.direction, elasticBaseShear, modalBaseShear: Vt, elfBaseShear: V, forceScale, driftScale, reason }
}

/**
 * Spectrum scaling and spectrum design drifts per story. The elastic values are taken before any
 * `settings.baseShearTarget` scaling (that option keeps scaling the shown elastic results only).
 */
export function scaleSpectrumToElf(
  structure: Structure,
  design: SeismicDesign,
  elf: { x: ElfDirection; y: ElfDirection },
  spectrum: SpectrumResult,
): SpectrumScaling {
  if (design.code !== 'asce7-16') {
    return {
      applicable: false,
      note: 'EN 1998-1 does not scale modal results to the lateral force method (from memory); spectrum results stay elastic.',
      x: null,
      y: null,
      drifts: [],
    }
  }
  const user = spectrum.scaleByDirection ?? { x: spectrum.scale, y: spectrum.scale }
  const dir = (d: 'x' | 'y'): SpectrumScalingDirection =>
    scaleToElf({
      elasticBaseShear: spectrum.baseShear[d].cqc / (user[d] > 0 ? user[d] : 1),
      R: elf[d].factors.R ?? 1,
      Ie: elf[d].factors.Ie ?? 1,
      elf: elf[d],
    })
  const x = dir('x')
  const y = dir('y')
  // delta = Cd/Ie * delta_e, delta_e = (Ie/R) * elastic * driftScale.
  const factor = (d: 'x' | 'y', s: SpectrumScalingDirection): number =>
    ((elf[d].factors.Cd ?? 1) / (elf[d].factors.R ?? 1)) * s.driftScale / (user[d] > 0 ? user[d] : 1)
  const drifts: SpectrumDesignDriftRow[] = structure.floors.map((f, i) => {
    const ex = spectrum.excitationX[i]?.driftMaxCqc.x ?? 0
    const ey = spectrum.excitationY[i]?.driftMaxCqc.y ?? 0
    const dx = factor('x', x) * ex
    const dy = factor('y', y) * ey
    const { limit } = driftLimit(design, f.height)
    return { floorId: f.id, x: dx, y: dy, limit, verdict: Math.max(dx, dy) <= limit ? 'pass' : 'fail' }
  })
  return {
    applicable: true,
    note: 'Forces scaled up only to 100 % of the ELF V (ASCE/SEI 7-16 12.9.1.4.1); drifts per 12.9.1.4.2.',
    x,
    y,
    drifts,
  }
}
