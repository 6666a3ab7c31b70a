import { describe, expect, it } from 'vitest'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import { computeElementForces } from '@/engine/elementForces'
import { runSpectrum, runSpectrumDetailed } from '@/engine/spectrum'
import { GRAVITY, spectralAcceleration } from '@/engine/spectra'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding } from '../helpers/generateBuilding'
import { buildTestStructure, denseModes, denseSolver, shearElement } from './torsionFixtures'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'none',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

const k = 1e8
const m = 1e5

/** One storey, 20 m x 10 m, uniform mass, four equal frame lines on the edges: doubly symmetric. */
function symmetricBox() {
  return buildTestStructure(
    [{ mass: m, L: 20, B: 10, height: 3 }],
    [
      shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, [k]),
      shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, [k]),
      shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [k]),
      shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [k]),
    ],
  )
}

describe('accidental torsion on spectrum results', () => {
  it('adds the static torque response of a symmetric storey in closed form', () => {
    // Closed form (hand statics): K_theta about the CM = k (10² + 10²) + k (5² + 5²) = 250 k.
    // Y excitation: one pure y mode, V = m Sa g; e = 0.05 x 20 m = 1 m, torque T = e V,
    // theta = T / (250 k). Edge drifts along y: V/(2k) +- 10 theta, so for the governing sign
    // max/avg = (V/(2k) + 10 theta) / (V/(2k)) = 1 + 20 e / 250 = 1.08 (ASCE/SEI 7-16 12.8.4.2
    // shift of 5%, from memory for its use with the spectrum: 12.9.1.5).
    const s = symmetricBox()
    const r = runSpectrum(s, denseModes(s), settings(), { solver: denseSolver(s) })
    const at = r.accidentalTorsion!
    const Ty = (2 * Math.PI) / Math.sqrt((2 * k) / m)
    const V = m * spectralAcceleration(settings().spectrum, Ty, 0.05) * GRAVITY
    expectRelClose(r.baseShear.y.cqc, V, 1e-9)
    expectRelClose(at.forces.y[0]!, V, 1e-12)
    expectRelClose(at.torques.y[0]!, 1 * V, 1e-12)
    const theta = V / (250 * k)
    // the spectrum alone has no rotation here; the envelope adds |theta|
    expect(r.excitationY[0]!.displacementCqc.rotation).toBeLessThan(1e-12 * theta)
    expectRelClose(at.excitationY[0]!.displacementCqc.rotation, theta, 1e-9)
    expectRelClose(at.excitationY[0]!.displacementCqc.y, V / (2 * k), 1e-9)
    expectRelClose(at.excitationY[0]!.driftMaxCqc.y, V / (2 * k) + 10 * theta, 1e-9)
    const row = at.stories.y[0]!
    expectRelClose(row.driftRatio, 1.08, 1e-9)
    expectRelClose(row.driftMax, V / (2 * k) + 10 * theta, 1e-9)
    expectRelClose(row.driftIndex, row.driftMax / 3, 1e-12)
    // X excitation: e = 0.05 x 10 m = 0.5 m, edge drifts V/(2k) +- 5 theta_x:
    // ratio = 1 + 5 (0.5 V / 250 k) / (V / 2k) = 1.02
    expectRelClose(at.stories.x[0]!.driftRatio, 1.02, 1e-9)
    // storey shears are unchanged by pure torques
    expectRelClose(at.excitationY[0]!.storyShearCqc.y, r.excitationY[0]!.storyShearCqc.y, 1e-12)
  })

  it('adds the torsional share to each wall: the edge frame takes V/2 + k 10 theta', () => {
    // Closed form as above: the frame at x = 20 moves V/(2k) + 10 theta, so its shear is
    // V/2 + 10 k theta = 0.54 V.
    const s = symmetricBox()
    const detail = runSpectrumDetailed(s, denseModes(s), settings(), { solver: denseSolver(s) })
    const ef = computeElementForces(s, null, detail)
    const V = detail.result.baseShear.y.cqc
    const plain = ef.cases.findIndex((c) => c.id === 'spectrum-y')
    const withE = ef.cases.findIndex((c) => c.id === 'spectrum-y+torsion')
    const east = ef.elements[1]!
    expectRelClose(east.shear[plain]![0]!, V / 2, 1e-9)
    expectRelClose(east.shear[withE]![0]!, 0.54 * V, 1e-9)
    expectRelClose(east.share[withE]![0]!, 0.54, 1e-9)
  })

  it('uses the ELF pattern scaled to the spectrum base shear and the static cases eccentricity', () => {
    const p = generateBuilding({ floors: 9, seed: 4 })
    const r = analyzeProject(p)
    const at = r.spectrum!.accidentalTorsion!
    const tor = r.torsion!
    expect(at.eccentricityFraction).toBeCloseTo(tor.eccentricityFraction, 14)
    for (const d of ['x', 'y'] as const) {
      const sum = at.forces[d].reduce((a, b) => a + b, 0)
      expectRelClose(sum, r.spectrum!.baseShear[d].cqc, 1e-12)
      // ASCE/SEI 7-16 12.8.3: the same w z^k shape as the static cases
      const shape = tor.cases.find((c) => c.direction === d)!.forces
      shape.forEach((F, i) => expectRelClose(at.forces[d][i]! / sum, F / tor.baseShear[d], 1e-9))
      // the envelope never lowers a peak
      r.spectrum!.combined.forEach((f, i) => {
        expect(at.combined[i]!.driftMaxCqc[d]).toBeGreaterThanOrEqual(f.driftMaxCqc[d])
      })
    }
    // torque = force x fraction x the plan extent across the load, floor by floor
    r.floors.forEach((f, i) => {
      const ey = tor.eccentricityFraction * (f.extent.maxY - f.extent.minY)
      expectRelClose(Math.abs(at.torques.x[i]!), at.forces.x[i]! * ey, 1e-12)
    })
  })

  it('is absent when the accidental eccentricity is zero', () => {
    const s = symmetricBox()
    const r = runSpectrum(s, denseModes(s), settings({ accidentalEccentricity: 0 }), { solver: denseSolver(s) })
    expect(r.accidentalTorsion).toBeUndefined()
  })
})
