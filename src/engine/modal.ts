/**
 * Modal quantities of a rigid-diaphragm building: periods, participation, effective modal mass,
 * kinetic-energy shares and a plain-words character per mode.
 * @see docs/dynamics.md
 */
import { solveEigen } from './eigen'
import type { EigenOptions } from './eigen'
import type { ModalResult, ModeCharacter, Structure } from './results'
import type { StiffnessSolver } from './solve'

/** Options of `solveModes`. */
export interface ModalOptions {
  /**
   * 'auto' (default): all modes up to AUTO_ALL_MODES_LIMIT DOFs (60 floors), else the lowest modes that
   * reach `massTarget` in X, Y and rotation. 'all': every mode. 'lowest': the lowest modes (see eigen.ts).
   */
  readonly method?: 'auto' | 'all' | 'lowest'
  /** Lowest-mode method: minimum number of modes (default 12). */
  readonly count?: number
  /** Lowest-mode method: cumulative effective mass ratio to reach in X, Y and rotation (default 0.9). */
  readonly massTarget?: number
  /** Lowest-mode method: also find every mode with a period of at least this many seconds. */
  readonly periodCutoff?: number
  /**
   * An existing factorization of K (analyzeProject's stiffness solver). The lowest-mode method then
   * reuses it for the shift-invert products instead of factoring again; results are the same.
   */
  readonly stiffnessSolver?: StiffnessSolver
}

/** Up to this many DOFs (3 per floor) `solveModes` finds all modes by default. */
export const AUTO_ALL_MODES_LIMIT = 180

/** A mode is called 'x', 'y' or 'torsion' when at least this share of its kinetic energy is that motion. */
export const CHARACTER_SHARE = 0.8

/** Load vectors at O: X, Y translation and a rigid turn about the building's centre of mass. */
export function influenceVectors(structure: Structure): { x: Float64Array; y: Float64Array; rz: Float64Array } {
  const n = structure.dofCount
  const x = new Float64Array(n)
  const y = new Float64Array(n)
  const rz = new Float64Array(n)
  const { x: Xc, y: Yc } = structure.buildingCentreOfMass
  for (let f = 0; f < structure.floorCount; f++) {
    x[3 * f] = 1
    y[3 * f + 1] = 1
    // point (x, y) moves by (-(y - Yc), x - Xc); at O that is [Yc, -Xc, 1]
    rz[3 * f] = Yc
    rz[3 * f + 1] = -Xc
    rz[3 * f + 2] = 1
  }
  return { x, y, rz }
}

function mulM(M: Float64Array, n: number, v: Float64Array): Float64Array {
  // M is block diagonal: only the 3x3 blocks are read.
  const out = new Float64Array(n)
  for (let f = 0; f < n / 3; f++) {
    const o = 3 * f
    for (let i = 0; i < 3; i++) {
      const r = (o + i) * n + o
      out[o + i] = M[r]! * v[o]! + M[r + 1]! * v[o + 1]! + M[r + 2]! * v[o + 2]!
    }
  }
  return out
}

/**
 * Modes of K phi = omega² M phi with participation and effective masses (MODELING.md, Modes).
 * Shapes are at O, mass-normalized (phi' M phi = 1), ascending, largest |component| positive.
 * @see docs/dynamics.md for the default mode count and the character thresholds.
 */
export function solveModes(structure: Structure, options: ModalOptions = {}): ModalResult {
  const n = structure.dofCount
  const M = structure.mass
  const r = influenceVectors(structure)
  const method = options.method ?? 'auto'
  const eigenOptions: EigenOptions =
    method === 'all' || (method === 'auto' && n <= AUTO_ALL_MODES_LIMIT)
      ? { method: 'all' }
      : {
          method: 'lowest',
          count: options.count ?? 12,
          massTarget: options.massTarget ?? 0.9,
          loads: [r.x, r.y, r.rz],
          ...(options.periodCutoff !== undefined ? { periodCutoff: options.periodCutoff } : {}),
          ...(options.stiffnessSolver
            ? { solveStiffness: (f: Float64Array) => options.stiffnessSolver!.solve(f) }
            : {}),
        }
  const sol = solveEigen(
    structure.stiffness,
    M,
    n,
    eigenOptions,
    structure.floors.map((f) => f.name),
  )
  const count = sol.count
  const omega = new Float64Array(count)
  const periods = new Float64Array(count)
  const hz = new Float64Array(count)
  for (let m = 0; m < count; m++) {
    // a tiny negative omega² from round-off on a (reported) near-mechanism is clamped, never NaN
    const w = Math.sqrt(Math.max(0, sol.eigenvalues[m]!))
    omega[m] = w
    periods[m] = w > 0 ? (2 * Math.PI) / w : Number.POSITIVE_INFINITY
    hz[m] = w / (2 * Math.PI)
  }
  const Mr = { x: mulM(M, n, r.x), y: mulM(M, n, r.y), rz: mulM(M, n, r.rz) }
  const dotN = (a: Float64Array, ao: number, b: Float64Array): number => {
    let s = 0
    for (let i = 0; i < n; i++) s += a[ao + i]! * b[i]!
    return s
  }
  const rMr = { x: dotN(r.x, 0, Mr.x), y: dotN(r.y, 0, Mr.y), rz: dotN(r.rz, 0, Mr.rz) }
  const part = { x: new Float64Array(count), y: new Float64Array(count), rz: new Float64Array(count) }
  const eff = { x: new Float64Array(count), y: new Float64Array(count), rz: new Float64Array(count) }
  const cum = { x: new Float64Array(count), y: new Float64Array(count), rz: new Float64Array(count) }
  const torsionShare = new Float64Array(count)
  const character: ModeCharacter[] = []
  const keys = ['x', 'y', 'rz'] as const
  const phi = sol.vectors
  for (let m = 0; m < count; m++) {
    const o = m * n
    for (const k of keys) {
      const g = dotN(phi, o, Mr[k])
      part[k][m] = g
      eff[k][m] = rMr[k] > 0 ? (g * g) / rMr[k] : 0
      cum[k][m] = (m > 0 ? cum[k][m - 1]! : 0) + eff[k][m]!
    }
    // Kinetic energy shares at each floor's centre of mass: m u_cx², m u_cy², J theta².
    let ex = 0
    let ey = 0
    let et = 0
    for (const fl of structure.floors) {
      const i = o + 3 * fl.index
      const th = phi[i + 2]!
      const ucx = phi[i]! - th * fl.centreOfMass.y
      const ucy = phi[i + 1]! + th * fl.centreOfMass.x
      ex += fl.mass * ucx * ucx
      ey += fl.mass * ucy * ucy
      et += fl.polarInertia * th * th
    }
    const total = ex + ey + et
    const sx = total > 0 ? ex / total : 0
    const sy = total > 0 ? ey / total : 0
    const st = total > 0 ? et / total : 0
    torsionShare[m] = st
    character.push(
      sx >= CHARACTER_SHARE ? 'x' : sy >= CHARACTER_SHARE ? 'y' : st >= CHARACTER_SHARE ? 'torsion' : 'coupled',
    )
  }
  const result: ModalResult = {
    count,
    dofCount: n,
    angularFrequencies: omega,
    periods,
    frequenciesHz: hz,
    shapes: phi,
    participation: part,
    effectiveMassRatio: eff,
    cumulativeMassRatio: cum,
    torsionShare,
    character,
    solver:
      sol.sturmCount !== null
        ? `${sol.solver}: ${count} of ${n} modes, Sturm count ${sol.sturmCount} below omega = ${Math.sqrt(sol.sturmShift ?? 0).toFixed(4)} rad/s`
        : sol.solver,
    complete: sol.complete,
    ...(sol.issues.length > 0 ? { issues: sol.issues } : {}),
  }
  return Object.freeze(result)
}
