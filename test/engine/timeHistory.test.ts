import { describe, expect, it } from 'vitest'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import {
  DEFAULT_DEMO_MOTION,
  generateDemoMotion,
  groundMotionFromSpec,
} from '@/engine/groundMotion'
import { GRAVITY } from '@/engine/spectra'
import { MAX_OUTPUT_STEPS, newmarkSdof, runTimeHistory } from '@/engine/timeHistory'
import { buildTestStructure, denseModes, oneStoreyEccentric, shearElement } from './torsionFixtures'
import { generateBuilding } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

const maxAbs = (a: ArrayLike<number>, from = 0): number => {
  let m = 0
  for (let i = from; i < a.length; i++) m = Math.max(m, Math.abs(a[i]!))
  return m
}

/**
 * Closed-form peak of an undamped SDOF (omega) under a half-sine ground pulse a_g = A sin(pi t/td),
 * t < td: forced phase u = -(A/omega²)/(1-b²) (sin(pi t/td) - b sin(omega t)), b = (pi/td)/omega,
 * then free vibration with amplitude sqrt(u² + (v/omega)²).
 * Chopra, Dynamics of Structures, §4.8 (from memory).
 */
function halfSinePeak(omega: number, A: number, td: number): number {
  const W = Math.PI / td
  const b = W / omega
  const ust = A / (omega * omega)
  const f = -ust / (1 - b * b)
  const u = (t: number): number => f * (Math.sin(W * t) - b * Math.sin(omega * t))
  const v = (t: number): number => f * (W * Math.cos(W * t) - b * omega * Math.cos(omega * t))
  let peak = 0
  for (let i = 0; i <= 20000; i++) peak = Math.max(peak, Math.abs(u((td * i) / 20000)))
  const free = Math.hypot(u(td), v(td) / omega)
  return Math.max(peak, free)
}

/** Half-sine pulse A sin(pi t/td) for t < td, then 0; n samples at dt. */
function halfSine(A: number, td: number, dt: number, n: number): number[] {
  return Array.from({ length: n }, (_, s) =>
    s * dt < td ? A * Math.sin((Math.PI * s * dt) / td) : 0,
  )
}

describe('newmarkSdof', () => {
  it('keeps the undamped amplitude and elongates the period as predicted', () => {
    const omega = 2 * Math.PI
    const dt = 0.1 // dt/T = 0.1
    const steps = 2001
    const r = newmarkSdof(omega, 0, dt, new Float64Array(steps), { u0: 1 })
    // METHODS.md §10: average acceleration has spectral radius 1 (no amplitude decay): the
    // amplitude sqrt(u² + (v/w)²) stays 1 after 200 periods
    expect(Math.hypot(r.u[steps - 1]!, r.v[steps - 1]! / omega)).toBeCloseTo(1, 9)
    // period elongation T_num/T = w dt / (2 arctan(w dt / 2)) = 1.032075 (METHODS.md §10)
    const wNum = (2 / dt) * Math.atan((omega * dt) / 2)
    expect(omega / wNum).toBeCloseTo(1.032075, 6)
    for (const s of [10, 137, 1999]) expect(r.u[s]!).toBeCloseTo(Math.cos(wNum * s * dt), 9)
  })

  it('follows the closed-form damped free vibration for a small step', () => {
    // closed form: u = e^{-z w t} (u0 cos wd t + (v0 + z w u0)/wd sin wd t), wd = w sqrt(1 - z²)
    const w = 5
    const z = 0.05
    const wd = w * Math.sqrt(1 - z * z)
    const dt = 0.002
    const r = newmarkSdof(w, z, dt, new Float64Array(5001), { u0: 0.02, v0: -0.1 })
    const exact = (t: number) =>
      Math.exp(-z * w * t) *
      (0.02 * Math.cos(wd * t) + ((-0.1 + z * w * 0.02) / wd) * Math.sin(wd * t))
    // tolerance 5e-6 on an amplitude of 0.02 (period error (w dt)²/12 over 8 cycles)
    for (const s of [250, 1000, 3333, 5000]) expect(r.u[s]! - exact(s * dt)).toBeCloseTo(0, 5)
  })

  it('reaches the closed-form harmonic steady-state amplitude', () => {
    // steady state of u'' + 2 z w u' + w² u = sin(W t): amplitude (1/w²)/sqrt((1-b²)² + (2 z b)²)
    // (Chopra, Dynamics of Structures, §3.2, from memory; standard closed form)
    const w = 2 * Math.PI
    const z = 0.05
    const b = 0.8
    const W = b * w
    const dt = 0.005
    const n = 12001 // 60 s: the transient decays by e^{-z w t} ~ 7e-9
    const p = Float64Array.from({ length: n }, (_, s) => Math.sin(W * s * dt))
    const r = newmarkSdof(w, z, dt, p)
    const amp = 1 / (w * w) / Math.sqrt((1 - b * b) ** 2 + (2 * z * b) ** 2)
    expect(maxAbs(r.u, n - 1000) / amp).toBeCloseTo(1, 3)
  })

  it('matches the closed-form half-sine pulse peak (shock spectrum value)', () => {
    // Chopra §4.8 closed form (see halfSinePeak), undamped, for pulses shorter and longer than T
    const omega = 2 * Math.PI
    for (const td of [0.3, 0.8, 1.7]) {
      const A = 0.4 * GRAVITY
      const dt = 0.001
      const n = Math.round((td + 3) / dt) + 1
      const ag = Float64Array.from(halfSine(A, td, dt, n))
      const r = newmarkSdof(omega, 0, dt, ag.map((v) => -v))
      expect(maxAbs(r.u) / halfSinePeak(omega, A, td)).toBeCloseTo(1, 3)
    }
  })

  it('sub-steps a coarse record with the step dt / substeps', () => {
    const w = 40 // T = 0.157 s, record dt = 0.05 s, 16 sub-steps of h = 0.003125 s
    const h = 0.05 / 16
    const r = newmarkSdof(w, 0, 0.05, new Float64Array(201), { u0: 0.01, substeps: 16 })
    // discrete closed form of average acceleration: u_n = u0 cos(n * 2 atan(w h / 2))
    // (METHODS.md §10)
    const wNum = (2 / h) * Math.atan((w * h) / 2)
    expect(r.u[200]! / 0.01).toBeCloseTo(Math.cos(wNum * 10), 8)
    // and the undivided coarse step would be far off (w dt = 2)
    const coarse = newmarkSdof(w, 0, 0.05, new Float64Array(201), { u0: 0.01 })
    expect(Math.abs(coarse.u[200]! - r.u[200]!)).toBeGreaterThan(1e-3)
  })
})

describe('generateDemoMotion', () => {
  it('is deterministic for a seed, peaks at the PGA and applies yFactor to Y', () => {
    const spec = { kind: 'generated' as const, pga: 0.25, duration: 10, seed: 42, yFactor: 0.3 }
    const a = generateDemoMotion(spec)
    const b = generateDemoMotion(spec)
    const c = generateDemoMotion({ ...spec, seed: 43 })
    expect(Array.from(a.ax)).toEqual(Array.from(b.ax))
    expect(maxAbs(a.ax.map((v, i) => v - c.ax[i]!))).toBeGreaterThan(0.1)
    expect(maxAbs(a.ax) / (0.25 * GRAVITY)).toBeCloseTo(1, 12)
    expect(a.ay[500]! / a.ax[500]!).toBeCloseTo(0.3, 12)
    expect(a.synthetic).toBe(true)
    expect(a.name).toContain('Synthetic')
    expect(a.ax.length).toBe(1001)
  })

  it('starts from rest and fades out', () => {
    const a = generateDemoMotion(DEFAULT_DEMO_MOTION)
    expect(Math.abs(a.ax[0]!)).toBeCloseTo(0, 12)
    const tail = maxAbs(a.ax, a.ax.length - 50)
    expect(tail / maxAbs(a.ax)).toBeLessThan(0.1)
  })
})

describe('groundMotionFromSpec', () => {
  it('pads the shorter record component with zeros', () => {
    const g = groundMotionFromSpec({ kind: 'record', name: 'r', dt: 0.02, ax: [1, 2, 3], ay: [4] })
    expect(Array.from(g.ay)).toEqual([4, 0, 0])
    expect(g.synthetic).toBe(false)
  })

  it('names the field when the record step is not positive', () => {
    const bad = { kind: 'record' as const, name: 'r', dt: 0, ax: [1], ay: [1] }
    expect(() => groundMotionFromSpec(bad)).toThrow('groundMotion.dt: must be > 0')
  })
})

describe('runTimeHistory', () => {
  const sym = buildTestStructure(
    [{ mass: 1e5, L: 20, B: 10, height: 3 }],
    [
      shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, [1e7]),
      shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, [1e7]),
      shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [1e7]),
      shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [1e7]),
    ],
  )

  it('gives the closed-form SDOF peak for a symmetric one-storey building under an X pulse', () => {
    const omega = Math.sqrt(2e7 / 1e5) // closed form omega = sqrt(k/m)
    const td = 0.5
    const dt = 0.002
    const A = 0.3 * GRAVITY
    const n = Math.round(4 / dt) + 1
    const ax = halfSine(A, td, dt, n)
    const r = runTimeHistory(
      sym,
      denseModes(sym),
      settings({ damping: 0, groundMotion: { kind: 'record', name: 'pulse', dt, ax, ay: [] } }),
    )
    // Chopra §4.8 closed form half-sine pulse peak (from memory), undamped
    expect(r.peaks[0]!.x / halfSinePeak(omega, A, td)).toBeCloseTo(1, 3)
    expect(r.peaks[0]!.y).toBeCloseTo(0, 9)
    expect(r.peaks[0]!.rotation).toBeCloseTo(0, 12)
    expect(r.synthetic).toBe(false)
    expect(r.damping).toBe(0)
  })

  it('stores a decimated step-major series capped in length and keeps the peaks', () => {
    const s = oneStoreyEccentric()
    const long = { kind: 'generated' as const, pga: 0.2, duration: 60, seed: 3, yFactor: 0.5 }
    const r = runTimeHistory(s, denseModes(s), settings({ groundMotion: long }))
    expect(r.stepCount).toBeLessThanOrEqual(MAX_OUTPUT_STEPS)
    expect(r.outputStride).toBe(4) // 6001 steps at 0.01 s -> every 4th
    expect(r.dt).toBeCloseTo(0.04, 12)
    expect(r.displacements.length).toBe(r.stepCount * r.dofCount)
    expect(r.groundAcceleration!.x.length).toBe(r.stepCount)
    // peaks over all steps are at least those over the stored steps
    let storedMax = 0
    for (let k = 0; k < r.stepCount; k++) {
      const u = r.displacements.subarray(k * 3, k * 3 + 3)
      storedMax = Math.max(storedMax, Math.abs(u[1]! + u[2]! * 10))
    }
    expect(r.peaks[0]!.y).toBeGreaterThanOrEqual(storedMax)
    // decimated to 0.04 s against a 0.12 s period: the stored series undersamples the peak a little
    expect(storedMax / r.peaks[0]!.y).toBeGreaterThan(0.6)
    expect(r.groundMotionName).toContain('Synthetic')
  })

  it('stays below the response-spectrum-like bound sum |Gamma| D_m for the eccentric plan', () => {
    // modal superposition bound: |u_y(CM)| <= sum_m |phi_m,CM| max|q_m| (triangle inequality)
    const s = oneStoreyEccentric()
    const modes = denseModes(s)
    const motion = { kind: 'generated' as const, pga: 0.3, duration: 15, seed: 9, yFactor: 1 }
    const r = runTimeHistory(s, modes, settings({ groundMotion: motion }))
    const g = generateDemoMotion(motion)
    let bound = 0
    for (let m = 0; m < modes.count; m++) {
      const w = modes.angularFrequencies[m]!
      const gx = modes.participation.x[m]!
      const gy = modes.participation.y[m]!
      const load = g.ax.map((v, i) => -(gx * v + gy * g.ay[i]!))
      const substeps = Math.ceil(g.dt / ((2 * Math.PI) / w / 10))
      const q = newmarkSdof(w, 0.05, g.dt, load, { substeps })
      const phi = modes.shapes.subarray(m * 3, m * 3 + 3)
      bound += Math.abs(phi[1]! + phi[2]! * 10) * maxAbs(q.u)
    }
    expect(r.peaks[0]!.y).toBeLessThanOrEqual(bound * (1 + 1e-12))
    expect(r.peaks[0]!.y).toBeGreaterThan(0.3 * bound)
  })
})

describe('runTimeHistory through analyzeProject', () => {
  it('matches the closed-form pulse peak for a symmetric one-storey project', () => {
    const k = 1e7
    const dt = 0.002
    const td = 0.4
    const A = 0.25 * GRAVITY
    const n = Math.round(4 / dt) + 1
    const ay = halfSine(A, td, dt, n)
    const p = projectBuilder({ floors: 1 })
      .rectSlab({ width: 20, depth: 10, areaMass: 500 })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 0, y: 10 }, storyStiffness: k })
      .frameLine({ p1: { x: 20, y: 0 }, p2: { x: 20, y: 10 }, storyStiffness: k })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 }, storyStiffness: k })
      .frameLine({ p1: { x: 0, y: 10 }, p2: { x: 20, y: 10 }, storyStiffness: k })
      .settings({
        damping: 0,
        groundMotion: { kind: 'record', name: 'half-sine pulse', dt, ax: [], ay },
      })
      .build()
    const r = analyzeProject(p, { spectrum: false, timeHistory: true }).timeHistory!
    // Chopra §4.8 closed form (from memory): omega = sqrt(2k/m)
    expect(r.peaks[0]!.y / halfSinePeak(Math.sqrt((2 * k) / 1e5), A, td)).toBeCloseTo(1, 3)
    expect(r.peaks[0]!.x).toBeCloseTo(0, 9)
    expect(r.groundMotionName).toBe('half-sine pulse')
  })

  it('runs the generated demo motion on a generated building deterministically', () => {
    const p = generateBuilding({ floors: 15, seed: 4 })
    const withMotion = {
      ...p,
      settings: {
        ...p.settings,
        groundMotion: {
          kind: 'generated' as const,
          pga: 0.2,
          duration: 12,
          seed: 5,
          yFactor: 0.4,
        },
      },
    }
    const a = analyzeProject(withMotion, { spectrum: false, timeHistory: true }).timeHistory!
    const b = analyzeProject(withMotion, { spectrum: false, timeHistory: true }).timeHistory!
    expect(a.synthetic).toBe(true)
    expect(a.peaks.map((f) => f.x)).toEqual(b.peaks.map((f) => f.x))
    // peaks grow up the building for a cantilever-like lateral system (common practice)
    expect(a.peaks[14]!.x).toBeGreaterThan(a.peaks[0]!.x)
    for (const f of a.peaks) expect(Number.isFinite(f.x) && Number.isFinite(f.rotation)).toBe(true)
  })
})
