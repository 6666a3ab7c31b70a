import { describe, expect, it } from 'vitest'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import { cqcCorrelationEqual } from '@/engine/cqc'
import { combineDirections, runSpectrum } from '@/engine/spectrum'
import {
  GRAVITY,
  asce7Ordinate,
  en1998DampingCorrection,
  en1998Ordinate,
  spectralAcceleration,
  tableOrdinate,
} from '@/engine/spectra'
import { generateDemoMotion } from '@/engine/groundMotion'
import { pointDisplacement } from '@/engine/loads'
import { newmarkSdof, runTimeHistory } from '@/engine/timeHistory'
import {
  buildTestStructure,
  denseModes,
  multiStoreyEccentric,
  oneStoreyEccentric,
  shearElement,
} from './torsionFixtures'
import { generateBuilding, transformProject } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

describe('asce7Ordinate', () => {
  it('matches the ASCE 7-16 11.4.6 check values including the rising branch', () => {
    // METHODS.md §1 (derived): SDS = 1.0, SD1 = 0.6, TL = 8 -> T0 = 0.12 s, Ts = 0.6 s
    const cases: [number, number][] = [
      [0, 0.4],
      [0.06, 0.7],
      [0.3, 1.0],
      [1.0, 0.6],
      [8, 0.075],
      [10, 0.048],
    ]
    for (const [T, sa] of cases) expect(asce7Ordinate(1.0, 0.6, 8, T)).toBeCloseTo(sa, 10)
  })
})

describe('en1998Ordinate', () => {
  it('matches the EN 1998-1 Type 1 ground C check values', () => {
    // METHODS.md §2 (derived): Type 1, ground C, ag = 0.25 g, eta = 1 (xi = 5 %)
    const cases: [number, number][] = [
      [0, 0.2875],
      [0.1, 0.503125],
      [0.2, 0.71875],
      [0.4, 0.71875],
      [0.6, 0.71875],
      [1.0, 0.43125],
      [2.0, 0.215625],
      [3.0, 0.0958333],
    ]
    for (const [T, se] of cases) expect(en1998Ordinate(0.25, 'C', 0.05, T)).toBeCloseTo(se, 7)
  })

  it('applies eta = sqrt(10/(5+xi)) >= 0.55', () => {
    // EN 1998-1 Eq. 3.6, METHODS.md §2: eta(10 %) = 0.816497, eta(2 %) = 1.195229
    expect(en1998DampingCorrection(0.1)).toBeCloseTo(0.816497, 6)
    expect(en1998DampingCorrection(0.02)).toBeCloseTo(1.195229, 6)
    expect(en1998DampingCorrection(0.5)).toBeCloseTo(0.55, 12)
    // plateau 2.5 ag S eta at 10 %
    expect(en1998Ordinate(0.25, 'C', 0.1, 0.4)).toBeCloseTo(0.71875 * 0.816497, 6)
  })
})

describe('tableOrdinate', () => {
  it('interpolates linearly and stays flat beyond the ends', () => {
    const pts: [number, number][] = [
      [0.1, 0.5],
      [0.5, 1.0],
      [2.0, 0.25],
    ]
    expect(tableOrdinate(pts, 0)).toBeCloseTo(0.5, 12)
    expect(tableOrdinate(pts, 0.3)).toBeCloseTo(0.75, 12)
    expect(tableOrdinate(pts, 1.25)).toBeCloseTo(0.625, 12)
    expect(tableOrdinate(pts, 9)).toBeCloseTo(0.25, 12)
    expect(spectralAcceleration({ kind: 'table', points: pts }, 0.3, 0.05)).toBeCloseTo(0.75, 12)
  })
})

describe('combineDirections', () => {
  it('applies SRSS or the 100/30 rule', () => {
    expect(combineDirections(3, 4, 'srss')).toBeCloseTo(5, 12)
    // 100/30: max(3 + 1.2, 0.9 + 4) = 4.9 (common practice)
    expect(combineDirections(3, 4, '100-30')).toBeCloseTo(4.9, 12)
  })
})

describe('runSpectrum', () => {
  it('gives base shear m Sa g for a pure translational mode on the rising branch', () => {
    const s = oneStoreyEccentric()
    const modes = denseModes(s)
    // SD1 = 1.2 puts T0 = 0.24 s above the x period, so the rising branch is used (kept by default)
    const steep = settings({ spectrum: { kind: 'asce7', SDS: 1, SD1: 1.2, TL: 8 } })
    const r = runSpectrum(s, modes, steep)
    // METHODS.md §8: the x mode is pure (omega = 44.7214 rad/s, Meff_x = m); ASCE 7-16 11.4.6
    const T = (2 * Math.PI) / 44.7214
    const sa = 0.4 + (0.6 * T) / 0.24
    expect(r.baseShear.x.cqc / (1e5 * sa * GRAVITY)).toBeCloseTo(1, 5)
    expect(r.baseShear.x.srss / (1e5 * sa * GRAVITY)).toBeCloseTo(1, 5)
  })

  it('combines the two coupled y-torsion modes by CQC', () => {
    const s = oneStoreyEccentric()
    const modes = denseModes(s)
    const r = runSpectrum(s, modes, settings())
    // METHODS.md §8 (derived): omega 50.8638 and 93.8769 rad/s, Meff_y = 0.93368 m and 0.06632 m
    const w = [50.8638, 93.8769]
    const meff = [0.93368, 0.06632]
    const V = w.map(
      (wi, i) => meff[i]! * 1e5 * asce7Ordinate(1, 0.6, 8, (2 * Math.PI) / wi) * GRAVITY,
    )
    const rho = cqcCorrelationEqual(w[1]! / w[0]!, 0.05)
    const cqc = Math.sqrt(V[0]! ** 2 + V[1]! ** 2 + 2 * rho * V[0]! * V[1]!)
    expect(r.baseShear.y.cqc / cqc).toBeCloseTo(1, 4)
    expect(r.baseShear.y.srss / Math.hypot(V[0]!, V[1]!)).toBeCloseTo(1, 4)
  })

  it('forms drifts per mode before combining', () => {
    const s = multiStoreyEccentric([3e8, 2e8, 1e8])
    const modes = denseModes(s)
    const r = runSpectrum(s, modes, settings())
    // Independent reconstruction of story 2 under X excitation: modal drifts at each corner,
    // SRSS per corner, largest corner (MODELING.md "Response spectrum")
    const n = s.dofCount
    const corners = [
      { x: 0, y: 0 },
      { x: 20, y: 0 },
      { x: 20, y: 10 },
      { x: 0, y: 10 },
    ]
    const sums = corners.map(() => 0)
    for (let m = 0; m < modes.count; m++) {
      const w = modes.angularFrequencies[m]!
      const sa = asce7Ordinate(1, 0.6, 8, modes.periods[m]!)
      const D = (modes.participation.x[m]! * sa * GRAVITY) / w ** 2
      const u = modes.shapes.subarray(m * n, (m + 1) * n).map((v) => v * D)
      corners.forEach((p, k) => {
        const d = pointDisplacement(u, 1, p, 'x') - pointDisplacement(u, 0, p, 'x')
        sums[k]! += d * d
      })
    }
    const expected = Math.sqrt(Math.max(...sums))
    const story2 = r.excitationX[1]!
    expect(story2.driftMaxSrss.x / expected).toBeCloseTo(1, 12)
    // The difference of combined floor displacements is a different (wrong) number.
    const naive = r.excitationX[1]!.displacementSrss.x - r.excitationX[0]!.displacementSrss.x
    expect(Math.abs(story2.driftMaxSrss.x - naive) / story2.driftMaxSrss.x).toBeGreaterThan(1e-3)
  })

  it('scales to the base-shear target only when one is given', () => {
    const s = multiStoreyEccentric([3e8, 2e8, 1e8])
    const modes = denseModes(s)
    const a = runSpectrum(s, modes, settings())
    expect(a.scale).toBeCloseTo(1, 14)
    const b = runSpectrum(s, modes, settings({ baseShearTarget: 5e6 }))
    expect(b.baseShear.x.cqc).toBeCloseTo(5e6, 3)
    expect(b.baseShear.y.cqc).toBeCloseTo(5e6, 3)
    const fx = b.scaleByDirection!.x
    expect(b.excitationX[2]!.driftMaxCqc.x / a.excitationX[2]!.driftMaxCqc.x).toBeCloseTo(fx, 10)
  })

  it('combines directions by the chosen rule', () => {
    const s = multiStoreyEccentric([3e8, 2e8, 1e8])
    const modes = denseModes(s)
    const srss = runSpectrum(s, modes, settings())
    const r13 = runSpectrum(s, modes, settings({ directionCombination: '100-30' }))
    const x = srss.excitationX[2]!.displacementCqc.y
    const y = srss.excitationY[2]!.displacementCqc.y
    expect(srss.combined[2]!.displacementCqc.y).toBeCloseTo(Math.hypot(x, y), 14)
    expect(r13.combined[2]!.displacementCqc.y).toBeCloseTo(Math.max(x + 0.3 * y, 0.3 * x + y), 14)
  })

  it('gives story shears that grow down the building and equal the base shear at the base', () => {
    const s = multiStoreyEccentric([3e8, 2e8, 1e8])
    const r = runSpectrum(s, denseModes(s), settings())
    const v = r.excitationX.map((f) => f.storyShearCqc.x)
    expect(v[0]!).toBeCloseTo(r.baseShear.x.cqc, 6)
    expect(v[0]!).toBeGreaterThan(v[1]!)
    expect(v[1]!).toBeGreaterThan(v[2]!)
  })

  it('does not depend on where the plan origin lies', () => {
    // MODELING.md: results at the CM and at plan points do not depend on O
    const build = (dx: number, dy: number) =>
      buildTestStructure(
        [0, 1].map(() => ({ mass: 1e5, x0: dx, y0: dy, L: 20, B: 10, height: 3.5 })),
        [
          shearElement({ x: dx, y: dy }, { x: 0, y: 1 }, [4e8, 3e8]),
          shearElement({ x: dx + 20, y: dy }, { x: 0, y: 1 }, [2e8, 1e8]),
          shearElement({ x: dx, y: dy }, { x: 1, y: 0 }, [2e8, 1e8]),
          shearElement({ x: dx, y: dy + 10 }, { x: 1, y: 0 }, [2e8, 1e8]),
        ],
      )
    const s1 = build(0, 0)
    const s2 = build(-70, 33)
    const r1 = runSpectrum(s1, denseModes(s1), settings())
    const r2 = runSpectrum(s2, denseModes(s2), settings())
    for (let i = 0; i < 2; i++) {
      const a = r1.combined[i]!
      const b = r2.combined[i]!
      expect(b.displacementCqc.x / a.displacementCqc.x).toBeCloseTo(1, 7)
      expect(b.driftMaxCqc.y / a.driftMaxCqc.y).toBeCloseTo(1, 7)
    }
  })
})

describe('runSpectrum through analyzeProject', () => {
  it('reproduces the CQC base shear of the one-storey eccentric project', () => {
    const k = 1e8
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, storyStiffness: 2 * k })
      .frameLine({ p1: { x: 20, y: 0 }, p2: { x: 20, y: 10 }, storyStiffness: k })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 }, storyStiffness: k })
      .frameLine({ p1: { x: 0, y: 10 }, p2: { x: 20, y: 10 }, storyStiffness: k })
      .build()
    const r = analyzeProject(p).spectrum!
    // METHODS.md §8 modes (derived) with ASCE 7-16 11.4.6 ordinates and the Der Kiureghian rho
    const w = [50.8638, 93.8769]
    const meff = [0.93368, 0.06632]
    const V = w.map(
      (wi, i) => meff[i]! * 1e5 * asce7Ordinate(1, 0.6, 8, (2 * Math.PI) / wi) * GRAVITY,
    )
    const rho = cqcCorrelationEqual(w[1]! / w[0]!, 0.05)
    const cqc = Math.sqrt(V[0]! ** 2 + V[1]! ** 2 + 2 * rho * V[0]! * V[1]!)
    expect(r.baseShear.y.cqc / cqc).toBeCloseTo(1, 4)
  })

  it('scales linearly with the spectrum and does not depend on the plan origin', () => {
    const g = generateBuilding({ floors: 10, seed: 21 })
    const base = { kind: 'asce7' as const, SDS: 1, SD1: 0.6, TL: 8 }
    const p = { ...g, settings: { ...g.settings, spectrum: base } }
    const a = analyzeProject(p).spectrum!
    // same shape, doubled ordinates (SDS 2, SD1 1.2 keep T0 and Ts): responses double (linearity)
    const doubled = analyzeProject({
      ...p,
      settings: { ...p.settings, spectrum: { kind: 'asce7', SDS: 2.0, SD1: 1.2, TL: 8 } },
    }).spectrum!
    expect(doubled.baseShear.x.cqc / a.baseShear.x.cqc).toBeCloseTo(2, 9)
    expect(doubled.combined[4]!.driftMaxCqc.y / a.combined[4]!.driftMaxCqc.y).toBeCloseTo(2, 9)
    const flat: [number, number][] = [
      [0, 0],
      [100, 0],
    ]
    const zeroSpectrum = { kind: 'table' as const, points: flat }
    const zero = { ...p, settings: { ...p.settings, spectrum: zeroSpectrum } }
    // a zero spectrum gives zero response (closed form)
    expect(analyzeProject(zero).spectrum!.baseShear.x.cqc).toBeCloseTo(0, 9)
    const moved = analyzeProject(transformProject(p, { dx: -40, dy: 75, angle: 0 })).spectrum!
    a.combined.forEach((f, i) => {
      const g = moved.combined[i]!
      expect(g.driftMaxCqc.x / f.driftMaxCqc.x).toBeCloseTo(1, 6)
      expect(g.displacementCqc.y / f.displacementCqc.y).toBeCloseTo(1, 6)
      expect(g.storyShearCqc.x / f.storyShearCqc.x).toBeCloseTo(1, 6)
    })
  })
})

describe('runSpectrum against a time history', () => {
  it('equals the time-history peak for one mode with the own spectrum of the motion', () => {
    // A linear SDOF's peak is by definition its response-spectrum ordinate D = Sa / omega²
    // (Chopra, Dynamics of Structures, §6.6, from memory). Build the 5 % pseudo-acceleration
    // spectrum of the demo motion at the building's x period, then compare both analyses.
    const k = 1e7
    const s = buildTestStructure(
      [{ mass: 1e5, L: 20, B: 10, height: 3 }],
      [
        shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, [k]),
        shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, [k]),
        shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [k]),
        shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [k]),
      ],
    )
    const modes = denseModes(s)
    const motion = { kind: 'generated' as const, pga: 0.3, duration: 20, seed: 12, yFactor: 0 }
    const th = runTimeHistory(s, modes, settings({ groundMotion: motion }))
    const omega = Math.sqrt((2 * k) / 1e5)
    const T = (2 * Math.PI) / omega
    const g = generateDemoMotion(motion)
    const substeps = Math.ceil(g.dt / (T / 10))
    const D = maxAbsOf(newmarkSdof(omega, 0.05, g.dt, g.ax.map((v) => -v), { substeps }).u)
    const saG = (omega * omega * D) / GRAVITY
    const points: [number, number][] = [
      [T * 0.999, saG],
      [T * 1.001, saG],
    ]
    const rs = runSpectrum(s, modes, settings({ spectrum: { kind: 'table', points } }))
    expect(rs.excitationX[0]!.displacementCqc.x / th.peaks[0]!.x).toBeCloseTo(1, 6)
  })
})

function maxAbsOf(a: ArrayLike<number>): number {
  let m = 0
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i]!))
  return m
}
