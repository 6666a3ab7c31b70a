/**
 * Centres of mass and rigidity, eccentricities and torsional radii per floor (MODELING.md, Centres).
 * @see docs/dynamics.md §Centres for the definitions and sources.
 */
import type { Point } from '@/model'
import type { FloorCentres, Structure } from './results'
import type { StiffnessSolver } from './solve'

/** x-y coupling of inv(F_j) is reported when |K_xy| exceeds this share of sqrt(K_xx K_yy). */
export const XY_COUPLING_SHARE = 0.05

/** Inverse of a symmetric 3x3 (row-major); null when singular. */
function invert3(F: ArrayLike<number>): Float64Array | null {
  const a = F[0]!
  const b = F[1]!
  const c = F[2]!
  const d = F[3]!
  const e = F[4]!
  const f = F[5]!
  const g = F[6]!
  const h = F[7]!
  const i = F[8]!
  const A = e * i - f * h
  const B = -(d * i - f * g)
  const C = d * h - e * g
  const det = a * A + b * B + c * C
  const scale = Math.abs(a * e * i) + Math.abs(b * f * g) + Math.abs(c * d * h) + 1e-300
  if (!(Math.abs(det) > 1e-14 * scale)) return null
  const inv = new Float64Array([
    A,
    -(b * i - c * h),
    b * f - c * e,
    B,
    a * i - c * g,
    -(a * f - c * d),
    C,
    -(a * h - b * g),
    a * e - b * d,
  ])
  for (let k = 0; k < 9; k++) inv[k] = inv[k]! / det
  return inv
}

/** The point where a force causes no rotation under flexibility F (3x3 at O, order u_x, u_y, theta). */
function rigidityPoint(F: ArrayLike<number>): Point {
  const ftt = F[8]!
  // x_cr = -F[theta, u_y] / F[theta, theta], y_cr = F[theta, u_x] / F[theta, theta]
  return { x: -F[7]! / ftt, y: F[6]! / ftt }
}

/**
 * Classic story centre of stiffness of the story below each floor, from the story stiffnesses of the
 * shear-type elements that cross it: K_s = sum k_e a' a (a = [d_x, d_y, x d_y - y d_x]), centre as for
 * the floor-load CR but with K_s^-1. Null for a story whose K_s is singular.
 */
function storyCentres(structure: Structure): (Point | null)[] {
  const nf = structure.floorCount
  const Ks = Array.from({ length: nf }, () => new Float64Array(9))
  for (const el of structure.elements) {
    const ne = el.floors.length
    const k = el.stiffness
    const add = (floor: number, ks: number): void => {
      const target = Ks[floor]
      if (!target) return
      for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) target[3 * i + j]! += ks * el.map[i]! * el.map[j]!
    }
    // Story between floors[a-1] and floors[a]: k = -K_e[a-1, a]; the first story of a ground-based
    // element is the row sum of its first row (k_1 + k_2 - k_2).
    if (!el.standsOnFloor && ne > 0) {
      let rowSum = 0
      for (let j = 0; j < ne; j++) rowSum += k[j]!
      add(el.floors[0]!, rowSum)
    }
    for (let a = 1; a < ne; a++) add(el.floors[a]!, -k[(a - 1) * ne + a]!)
  }
  return Ks.map((K) => {
    const F = invert3(K)
    return F ? rigidityPoint(F) : null
  })
}

/**
 * Per floor: centre of mass, centre of rigidity by floor loads, classic story centre of stiffness (all
 * elements shear type only), eccentricity CR - CM, K_theta,CR, lateral stiffness, torsional radii and l_s.
 * Units: m, N/m, N·m/rad.
 * @see MODELING.md (Centres); EN 1998-1 4.2.3.2(6) for r and l_s.
 */
export function computeCentres(structure: Structure, solver: StiffnessSolver): FloorCentres[] {
  let flex: ArrayLike<number>[]
  if (solver.floorFlexibilities) {
    const all = solver.floorFlexibilities()
    flex = structure.floors.map((f) => all.subarray(9 * f.index, 9 * f.index + 9))
  } else {
    flex = structure.floors.map((f) => solver.floorFlexibility(f.index))
  }
  const story = structure.allShearType ? storyCentres(structure) : null
  return structure.floors.map((fl) => {
    const F = flex[fl.index]!
    const cr = rigidityPoint(F)
    const ftt = F[8]!
    // K_j = inv(F_j): its u_x/u_y terms do not depend on the reference point, so invert F moved to the
    // CR (where it has no theta-u coupling) instead of F at O, which is ill-conditioned far from O.
    const px = cr.x
    const py = cr.y
    const a = F[0]! - 2 * py * F[2]! + py * py * ftt
    const b = F[4]! + 2 * px * F[5]! + px * px * ftt
    const c = F[1]! + px * F[2]! - py * F[5]! - px * py * ftt
    const det = a * b - c * c
    const kTheta = 1 / ftt
    const kxx = b / det
    const kyy = a / det
    const kxy = -c / det
    return {
      floorId: fl.id,
      centreOfMass: fl.centreOfMass,
      centreOfRigidity: cr,
      storyCentreOfStiffness: story ? (story[fl.index] ?? null) : null,
      eccentricity: { x: cr.x - fl.centreOfMass.x, y: cr.y - fl.centreOfMass.y },
      torsionalStiffness: kTheta,
      lateralStiffness: { x: kxx, y: kyy },
      torsionalRadius: { x: Math.sqrt(kTheta / kyy), y: Math.sqrt(kTheta / kxx) },
      radiusOfGyration: fl.radiusOfGyration,
      hasXYCoupling: Math.abs(kxy) > XY_COUPLING_SHARE * Math.sqrt(Math.abs(kxx * kyy)),
    }
  })
}
