/**
 * Pure colour maths of the 3D view: Gyre's own five-stop ramp, the per-floor and per-story values a
 * mode or response is coloured by, and the legend ticks.
 */
import type { Point } from '@/model'
import { rigidDisplacement } from './modeAnimation'
import type { FloorDof } from './modeAnimation'

/** What the members and slabs are coloured by. */
export type ColourBy = 'drift' | 'displacement' | 'none'

/**
 * Gyre's ramp, low to high: deep slate, sea green, straw, amber, brick. Chosen for this project;
 * ordered by lightness up to straw, then by warmth, so low and high values stay apart in greyscale.
 */
export const RAMP: readonly (readonly [number, number, number])[] = [
  [0x2b, 0x3a, 0x55],
  [0x3e, 0x8e, 0x7e],
  [0xd9, 0xc8, 0x7a],
  [0xe0, 0x8a, 0x3c],
  [0xa8, 0x32, 0x2a],
]

/** Colour (r, g, b in 0..1) of a value t in 0..1 on the ramp; t is clamped, NaN maps to the low end. */
export function rampColour(t: number): [number, number, number] {
  const v = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0
  const n = RAMP.length - 1
  const pos = v * n
  const i = Math.min(n - 1, Math.floor(pos))
  const f = pos - i
  const a = RAMP[i] ?? RAMP[0]!
  const b = RAMP[i + 1] ?? a
  return [
    (a[0] + (b[0] - a[0]) * f) / 255,
    (a[1] + (b[1] - a[1]) * f) / 255,
    (a[2] + (b[2] - a[2]) * f) / 255,
  ]
}

/** CSS hex of a ramp colour. */
export function rampHex(t: number): string {
  const [r, g, b] = rampColour(t)
  const h = (c: number) =>
    Math.round(c * 255)
      .toString(16)
      .padStart(2, '0')
  return `#${h(r)}${h(g)}${h(b)}`
}

/** CSS linear-gradient of the ramp (for the legend bar), left = low. */
export function rampGradient(): string {
  const stops = RAMP.map((c, i) => `rgb(${c[0]}, ${c[1]}, ${c[2]}) ${(i / (RAMP.length - 1)) * 100}%`)
  return `linear-gradient(to right, ${stops.join(', ')})`
}

/** Floor displacements and story drift ratios of one displaced state. */
export interface ResponseMeasures {
  /** Largest |displacement| over each floor's points, in the units of the DOFs. */
  readonly displacement: number[]
  /** Largest |drift| over the points of floor i (relative to floor i-1, 0 at the base) over h_i. */
  readonly driftRatio: number[]
}

/**
 * Per floor: largest displacement over its points; per story: largest drift over the points of the
 * floor above divided by the story height (drift at a point = its displacement minus that of the
 * floor below at the same plan point, MODELING.md "Story drift").
 */
export function responseMeasures(
  dofs: readonly FloorDof[],
  pointsOfFloor: readonly (readonly Point[])[],
  heights: readonly number[],
): ResponseMeasures {
  const displacement: number[] = []
  const driftRatio: number[] = []
  dofs.forEach((d, i) => {
    const below = i > 0 ? dofs[i - 1] : undefined
    let dMax = 0
    let driftMax = 0
    for (const p of pointsOfFloor[i] ?? []) {
      const u = rigidDisplacement(d, p.x, p.y)
      dMax = Math.max(dMax, Math.hypot(u.x, u.y))
      const w = below ? rigidDisplacement(below, p.x, p.y) : { x: 0, y: 0 }
      driftMax = Math.max(driftMax, Math.hypot(u.x - w.x, u.y - w.y))
    }
    const h = heights[i] ?? 0
    displacement.push(dMax)
    driftRatio.push(h > 0 ? driftMax / h : 0)
  })
  return { displacement, driftRatio }
}

/** Values divided by their largest absolute value (all zero stays zero). */
export function normalizeToMax(values: readonly number[]): number[] {
  const max = values.reduce((m, v) => Math.max(m, Math.abs(v)), 0)
  return values.map((v) => (max > 0 ? Math.abs(v) / max : 0))
}

/** Legend ticks: `count` evenly spaced values from 0 to `max` with their ramp position. */
export function legendTicks(max: number, count = 5): { value: number; t: number }[] {
  const out: { value: number; t: number }[] = []
  for (let k = 0; k < count; k++) {
    const t = count > 1 ? k / (count - 1) : 0
    out.push({ value: max * t, t })
  }
  return out
}
