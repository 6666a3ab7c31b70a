/**
 * Pure motion maths of the 3D view: floor DOFs of a mode, the rigid-body motion of a floor, the
 * amplitude scale and the plan trace. No three.js here, so everything is tested in node.
 *
 * Conventions (MODELING.md): each floor has (u_x, u_y, theta) at the plan origin O; a plan point
 * (x, y) of the floor moves by (u_x - theta*y, u_y + theta*x) to first order.
 */
import type { Point } from '@/model'

/** The three DOF of one floor at O: m, m, rad. */
export interface FloorDof {
  readonly ux: number
  readonly uy: number
  readonly theta: number
}

/**
 * A planar rigid motion p' = R(angle) p + (tx, ty), stored as cos/sin so callers can apply it to many
 * points cheaply (and so an Object3D can take angle and translation directly).
 */
export interface RigidTransform {
  readonly angle: number
  readonly cos: number
  readonly sin: number
  readonly tx: number
  readonly ty: number
}

export const IDENTITY_TRANSFORM: RigidTransform = { angle: 0, cos: 1, sin: 0, tx: 0, ty: 0 }

const ZERO_DOF: FloorDof = { ux: 0, uy: 0, theta: 0 }

/**
 * DOFs of every floor in mode `mode` (0-based) of a mode-major shape array.
 * @throws RangeError when the mode or the floor count does not fit the array.
 */
export function modeFloorDofs(
  shapes: Float64Array,
  dofCount: number,
  mode: number,
  floorCount: number,
): FloorDof[] {
  if (floorCount * 3 !== dofCount) {
    throw new RangeError(`[viewer] ${floorCount} floors need ${floorCount * 3} DOF (got ${dofCount})`)
  }
  const start = mode * dofCount
  if (mode < 0 || start + dofCount > shapes.length) {
    throw new RangeError(`[viewer] mode ${mode} is outside the shape array`)
  }
  const out: FloorDof[] = []
  for (let i = 0; i < floorCount; i++) {
    out.push({
      ux: shapes[start + 3 * i] ?? 0,
      uy: shapes[start + 3 * i + 1] ?? 0,
      theta: shapes[start + 3 * i + 2] ?? 0,
    })
  }
  return out
}

/** First-order displacement of plan point (x, y) of a floor moving by `d`: (u_x - θy, u_y + θx), m. */
export function rigidDisplacement(d: FloorDof, x: number, y: number): Point {
  return { x: d.ux - d.theta * y, y: d.uy + d.theta * x }
}

/**
 * The finite rigid motion whose first-order displacement field is `d`: a turn by theta about the
 * instantaneous centre C = (-u_y/θ, u_x/θ) (pure translation when θ = 0). This is the exponential
 * map of the planar twist (u_x, u_y, θ): p' = R(θ) p + t with
 * t = (a u_x - b u_y, a u_y + b u_x), a = sin θ / θ, b = (1 - cos θ) / θ.
 * Unlike adding the linear field to the vertices, it never stretches or shears the slab, and the
 * point that the linear field holds still (the centre of the turn) stays exactly still.
 */
export function rigidTransform(d: FloorDof): RigidTransform {
  const t = d.theta
  const cos = Math.cos(t)
  const sin = Math.sin(t)
  let a: number
  let b: number
  if (Math.abs(t) < 1e-4) {
    // Series of sin(t)/t and (1-cos t)/t: avoids 0/0 and cancellation for tiny turns.
    a = 1 - (t * t) / 6
    b = t / 2 - (t * t * t) / 24
  } else {
    a = sin / t
    b = (1 - cos) / t
  }
  return { angle: t, cos, sin, tx: a * d.ux - b * d.uy, ty: a * d.uy + b * d.ux }
}

/** Apply a rigid transform to a plan point. */
export function applyTransform(tr: RigidTransform, x: number, y: number): Point {
  return { x: tr.cos * x - tr.sin * y + tr.tx, y: tr.sin * x + tr.cos * y + tr.ty }
}

/** DOFs multiplied by a factor (amplitude scale times the phase term). */
export function scaleDof(d: FloorDof, factor: number): FloorDof {
  return { ux: d.ux * factor, uy: d.uy * factor, theta: d.theta * factor }
}

/**
 * Centre of the turn of a floor moving by `d`: the plan point with zero first-order displacement,
 * (-u_y/θ, u_x/θ), m; null when the floor barely turns (|θ| * size below 1e-9 of |u|) and the
 * centre is at infinity.
 */
export function turnCentre(d: FloorDof, size = 1): Point | null {
  const u = Math.hypot(d.ux, d.uy)
  if (Math.abs(d.theta) * size <= 1e-9 * u || d.theta === 0) return null
  return { x: -d.uy / d.theta, y: d.ux / d.theta }
}

/** Largest first-order displacement over the given plan points of every floor, in the units of `dofs`. */
export function largestDisplacement(
  dofs: readonly FloorDof[],
  pointsOfFloor: readonly (readonly Point[])[],
): number {
  let max = 0
  dofs.forEach((d, i) => {
    const points = pointsOfFloor[i] ?? []
    if (points.length === 0) max = Math.max(max, Math.hypot(d.ux, d.uy))
    for (const p of points) {
      const u = rigidDisplacement(d, p.x, p.y)
      max = Math.max(max, Math.hypot(u.x, u.y))
    }
  })
  return max
}

/**
 * Amplitude scale: the factor that makes the largest floor displacement (over each floor's slab
 * corners) equal `target` metres. Returns 0 for a zero shape.
 */
export function amplitudeScale(
  dofs: readonly FloorDof[],
  pointsOfFloor: readonly (readonly Point[])[],
  target: number,
): number {
  const max = largestDisplacement(dofs, pointsOfFloor)
  return max > 0 ? target / max : 0
}

/** Plan size used for the default amplitude: the larger side of the bounding box of all points, m. */
export function planSize(points: readonly Point[]): number {
  if (points.length === 0) return 1
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  for (const p of points) {
    minX = Math.min(minX, p.x)
    minY = Math.min(minY, p.y)
    maxX = Math.max(maxX, p.x)
    maxY = Math.max(maxY, p.y)
  }
  return Math.max(maxX - minX, maxY - minY, 1e-6)
}

/** Displacement factor of a mode at a phase (rad): sin(phase); a mode is a standing oscillation. */
export function phaseFactor(phase: number): number {
  return Math.sin(phase)
}

/** Every floor's rigid transform for a mode at a phase: dofs * scale * sin(phase). */
export function modeTransforms(
  dofs: readonly FloorDof[],
  scale: number,
  phase: number,
  out: RigidTransform[] = [],
): RigidTransform[] {
  const f = scale * phaseFactor(phase)
  out.length = dofs.length
  for (let i = 0; i < dofs.length; i++) out[i] = rigidTransform(scaleDof(dofs[i] ?? ZERO_DOF, f))
  return out
}

/** Floor DOFs at time-history step `step` (clamped), scaled by `scale`. */
export function historyFloorDofs(
  displacements: Float64Array,
  dofCount: number,
  step: number,
  scale: number,
): FloorDof[] {
  const steps = Math.floor(displacements.length / dofCount)
  const s = Math.min(Math.max(0, Math.floor(step)), Math.max(0, steps - 1))
  const out: FloorDof[] = []
  for (let i = 0; i < dofCount / 3; i++) {
    const k = s * dofCount + 3 * i
    out.push({
      ux: (displacements[k] ?? 0) * scale,
      uy: (displacements[k + 1] ?? 0) * scale,
      theta: (displacements[k + 2] ?? 0) * scale,
    })
  }
  return out
}

/** Largest displacement over all steps of a time history at the given plan points per floor, m. */
export function historyLargestDisplacement(
  displacements: Float64Array,
  dofCount: number,
  pointsOfFloor: readonly (readonly Point[])[],
): number {
  const steps = Math.floor(displacements.length / dofCount)
  let max = 0
  for (let s = 0; s < steps; s++) {
    max = Math.max(max, largestDisplacement(historyFloorDofs(displacements, dofCount, s, 1), pointsOfFloor))
  }
  return max
}

/**
 * Plan paths of points of one floor over one cycle of a mode: `samples` + 1 positions per point
 * (closed), using the exact rigid motion at dofs * scale * sin(phase).
 */
export function cyclePaths(
  d: FloorDof,
  scale: number,
  points: readonly Point[],
  samples = 48,
): Point[][] {
  const paths: Point[][] = points.map(() => [])
  for (let k = 0; k <= samples; k++) {
    const tr = rigidTransform(scaleDof(d, scale * phaseFactor((2 * Math.PI * k) / samples)))
    points.forEach((p, j) => paths[j]?.push(applyTransform(tr, p.x, p.y)))
  }
  return paths
}
