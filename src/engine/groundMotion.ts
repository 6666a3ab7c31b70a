/**
 * Ground motions for the time history: an imported record, or Gyre's own generated demo motion.
 * The demo motion is INVENTED for demonstrations (a windowed sum of sines with seeded random
 * phases); it is not a recorded earthquake and not a design motion.
 */
import type { GroundMotionSpec } from '@/model'
import { GRAVITY } from './spectra'

/** Ground acceleration in X and Y at a constant step. */
export interface GroundMotion {
  readonly name: string
  /** s */
  readonly dt: number
  /** m/s² */
  readonly ax: Float64Array
  /** m/s² */
  readonly ay: Float64Array
  /** True for the generated demo motion. */
  readonly synthetic: boolean
}

/** Step of the generated motion, s. */
export const DEMO_MOTION_DT = 0.01

/** Used when a time history is asked for and the project has no ground motion. */
export const DEFAULT_DEMO_MOTION: Extract<GroundMotionSpec, { kind: 'generated' }> = {
  kind: 'generated',
  pga: 0.3,
  duration: 20,
  seed: 1,
  yFactor: 0.3,
}

/** Small seeded pseudo-random generator (mulberry32, public domain); uniform on [0, 1). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

/**
 * Gyre's demo motion (our own recipe, for demonstrations only):
 * a(t) = e(t) sum_k w_k sin(2 pi f_k t + phi_k), 48 components with frequencies spread
 * log-uniformly over 0.3-12 Hz (seeded jitter), weights a bell on log frequency centred at
 * 2.5 Hz, phases uniform from the seed; e(t) rises as sin² over the first 15 % of the duration,
 * holds to 45 %, then decays exponentially to about 5 % at the end. Scaled so max |a_x| = pga g;
 * a_y = yFactor a_x (the type's "share of the X motion applied in Y").
 */
export function generateDemoMotion(
  spec: Extract<GroundMotionSpec, { kind: 'generated' }>,
  dt = DEMO_MOTION_DT,
): GroundMotion {
  if (!(spec.duration > 0)) {
    throw new RangeError(`[engine] groundMotion.duration: must be > 0 (got ${spec.duration})`)
  }
  if (!(spec.pga >= 0)) {
    throw new RangeError(`[engine] groundMotion.pga: must be >= 0 (got ${spec.pga})`)
  }
  const rand = seededRandom(spec.seed)
  const K = 48
  const fLo = 0.3
  const fHi = 12
  const comps = Array.from({ length: K }, (_, k) => {
    const f = fLo * (fHi / fLo) ** ((k + rand()) / K)
    const w = Math.exp(-0.5 * (Math.log(f / 2.5) / 0.8) ** 2)
    return { omega: 2 * Math.PI * f, w, phi: 2 * Math.PI * rand() }
  })
  const steps = Math.max(2, Math.round(spec.duration / dt) + 1)
  const T = (steps - 1) * dt
  const t1 = 0.15 * T
  const t2 = 0.45 * T
  const ax = new Float64Array(steps)
  let peak = 0
  for (let s = 0; s < steps; s++) {
    const t = s * dt
    const e =
      t < t1
        ? Math.sin((0.5 * Math.PI * t) / t1) ** 2
        : t <= t2
          ? 1
          : Math.exp((-3 * (t - t2)) / (T - t2))
    let a = 0
    for (const c of comps) a += c.w * Math.sin(c.omega * t + c.phi)
    ax[s] = e * a
    peak = Math.max(peak, Math.abs(e * a))
  }
  const scale = peak > 0 ? (spec.pga * GRAVITY) / peak : 0
  for (let s = 0; s < steps; s++) ax[s]! *= scale
  const ay = ax.map((v) => v * spec.yFactor)
  return {
    name:
      `Synthetic demo motion (invented; seed ${spec.seed}, ` +
      `PGA ${spec.pga.toFixed(2)} g, ${spec.duration} s)`,
    dt,
    ax,
    ay,
    synthetic: true,
  }
}

/**
 * The ground motion of a spec. A record's shorter component is padded with zeros to the longer one.
 * @throws RangeError for a record without a positive step (validated at file load)
 */
export function groundMotionFromSpec(spec: GroundMotionSpec | undefined): GroundMotion {
  const s = spec ?? DEFAULT_DEMO_MOTION
  if (s.kind === 'generated') return generateDemoMotion(s)
  if (!(s.dt > 0)) throw new RangeError(`[engine] groundMotion.dt: must be > 0 (got ${s.dt})`)
  const n = Math.max(s.ax.length, s.ay.length, 1)
  const ax = new Float64Array(n)
  const ay = new Float64Array(n)
  ax.set(s.ax)
  ay.set(s.ay)
  return { name: s.name, dt: s.dt, ax, ay, synthetic: false }
}
