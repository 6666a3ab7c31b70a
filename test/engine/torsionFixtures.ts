/**
 * Hand-built Structure, StiffnessSolver and ModalResult objects for the loads, spectrum, criteria
 * and time-history tests, independent of the project's assembly, factorization and eigen code:
 * a dense Gaussian solve and ml-matrix's symmetric eigen decomposition (a general-purpose library).
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import type { Point } from '@/model'
import type { AssembledElement, FloorProps, ModalResult, Structure } from '@/engine/results'
import type { StiffnessSolver } from '@/engine/solve'

export interface RectFloor {
  /** kg */
  mass: number
  /** plan rectangle [x0, x0+L] x [y0, y0+B], uniform mass; CM at its centre */
  x0?: number
  y0?: number
  L: number
  B: number
  /** story height below, m */
  height: number
  /** override of J (kg m²) */
  polarInertia?: number
  /** override of the CM */
  centreOfMass?: Point
}

export interface ElementSpec {
  /** a point on the element line and its direction */
  at: Point
  dir: Point
  /** 0-based floors connected, bottom first */
  floors: number[]
  /** n x n lateral stiffness (row-major), N/m */
  stiffness: number[]
}

/** A shear-type element over floors 0..n-1 with story stiffnesses k (N/m). */
export function shearElement(at: Point, dir: Point, k: readonly number[]): ElementSpec {
  const n = k.length
  const K = new Array<number>(n * n).fill(0)
  for (let s = 0; s < n; s++) {
    const ks = k[s]!
    // story s couples floor s-1 (base when s = 0) and floor s
    K[s * n + s]! += ks
    if (s > 0) {
      K[(s - 1) * n + (s - 1)]! += ks
      K[s * n + (s - 1)]! -= ks
      K[(s - 1) * n + s]! -= ks
    }
  }
  return { at, dir, floors: k.map((_, i) => i), stiffness: K }
}

export function buildTestStructure(
  floors: readonly RectFloor[],
  elements: readonly ElementSpec[],
): Structure {
  const n = floors.length
  const dof = 3 * n
  const K = new Float64Array(dof * dof)
  const M = new Float64Array(dof * dof)
  let z = 0
  let mt = 0
  let sx = 0
  let sy = 0
  const props: FloorProps[] = floors.map((f, i) => {
    z += f.height
    const x0 = f.x0 ?? 0
    const y0 = f.y0 ?? 0
    const cm = f.centreOfMass ?? { x: x0 + f.L / 2, y: y0 + f.B / 2 }
    const J = f.polarInertia ?? (f.mass * (f.L * f.L + f.B * f.B)) / 12
    mt += f.mass
    sx += f.mass * cm.x
    sy += f.mass * cm.y
    const o = 3 * i
    const m = f.mass
    const set = (r: number, c: number, v: number): void => {
      M[(o + r) * dof + o + c] = v
    }
    set(0, 0, m)
    set(1, 1, m)
    set(0, 2, -m * cm.y)
    set(2, 0, -m * cm.y)
    set(1, 2, m * cm.x)
    set(2, 1, m * cm.x)
    set(2, 2, J + m * (cm.x * cm.x + cm.y * cm.y))
    return {
      id: `F${i + 1}`,
      name: `Floor ${i + 1}`,
      index: i,
      elevation: z,
      height: f.height,
      mass: m,
      centreOfMass: cm,
      polarInertia: J,
      radiusOfGyration: Math.sqrt(J / m),
      slabArea: f.L * f.B,
      extent: { minX: x0, maxX: x0 + f.L, minY: y0, maxY: y0 + f.B },
      extremePoints: [
        { x: x0, y: y0 },
        { x: x0 + f.L, y: y0 },
        { x: x0 + f.L, y: y0 + f.B },
        { x: x0, y: y0 + f.B },
      ],
    }
  })
  const assembled: AssembledElement[] = elements.map((e, idx) => {
    const a: [number, number, number] = [e.dir.x, e.dir.y, e.at.x * e.dir.y - e.at.y * e.dir.x]
    const ne = e.floors.length
    for (let p = 0; p < ne; p++) {
      for (let q = 0; q < ne; q++) {
        const kpq = e.stiffness[p * ne + q]!
        for (let r = 0; r < 3; r++) {
          for (let c = 0; c < 3; c++) {
            K[(3 * e.floors[p]! + r) * dof + 3 * e.floors[q]! + c]! += a[r]! * kpq * a[c]!
          }
        }
      }
    }
    return {
      id: `e${idx + 1}`,
      kind: 'frameLine',
      floors: e.floors,
      map: a,
      standsOnFloor: false,
      stiffness: Float64Array.from(e.stiffness),
      isShearType: true,
    }
  })
  return {
    floorCount: n,
    dofCount: dof,
    floors: props,
    stiffness: K,
    mass: M,
    elements: assembled,
    allShearType: true,
    buildingCentreOfMass: { x: sx / mt, y: sy / mt },
    totalMass: mt,
  }
}

/** Dense Gaussian elimination with partial pivoting (reference solver for tests). */
export function denseSolve(A: Float64Array, b: Float64Array): Float64Array {
  const n = b.length
  const a = Float64Array.from(A)
  const x = Float64Array.from(b)
  for (let c = 0; c < n; c++) {
    let p = c
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r * n + c]!) > Math.abs(a[p * n + c]!)) p = r
    if (p !== c) {
      for (let k = 0; k < n; k++) {
        const t = a[c * n + k]!
        a[c * n + k] = a[p * n + k]!
        a[p * n + k] = t
      }
      const t = x[c]!
      x[c] = x[p]!
      x[p] = t
    }
    for (let r = c + 1; r < n; r++) {
      const f = a[r * n + c]! / a[c * n + c]!
      if (f === 0) continue
      for (let k = c; k < n; k++) a[r * n + k]! -= f * a[c * n + k]!
      x[r]! -= f * x[c]!
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r]!
    for (let k = r + 1; k < n; k++) s -= a[r * n + k]! * x[k]!
    x[r] = s / a[r * n + r]!
  }
  return x
}

export function denseSolver(structure: Structure): StiffnessSolver {
  const n = structure.dofCount
  return {
    solve: (rhs) => denseSolve(structure.stiffness, rhs),
    floorFlexibility: (j) => {
      const out = new Float64Array(9)
      for (let c = 0; c < 3; c++) {
        const e = new Float64Array(n)
        e[3 * j + c] = 1
        const col = denseSolve(structure.stiffness, e)
        for (let r = 0; r < 3; r++) out[r * 3 + c] = col[3 * j + r]!
      }
      return out
    },
  }
}

/** All modes by M^-1/2 K M^-1/2 with ml-matrix's symmetric eigen decomposition. */
export function denseModes(structure: Structure): ModalResult {
  const n = structure.dofCount
  const toM = (a: Float64Array): Matrix => {
    const m = new Matrix(n, n)
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) m.set(i, j, a[i * n + j]!)
    return m
  }
  const Mm = toM(structure.mass)
  const Km = toM(structure.stiffness)
  const me = new EigenvalueDecomposition(Mm, { assumeSymmetric: true })
  const V = me.eigenvectorMatrix
  const d = me.realEigenvalues
  const Minvh = V.mmul(Matrix.diag(d.map((x) => 1 / Math.sqrt(x)))).mmul(V.transpose())
  const A = Minvh.mmul(Km).mmul(Minvh)
  const As = A.add(A.transpose()).mul(0.5)
  const ke = new EigenvalueDecomposition(As, { assumeSymmetric: true })
  const order = ke.realEigenvalues.map((v, i) => [v, i] as const).sort((p, q) => p[0] - q[0])
  const Phi = Minvh.mmul(ke.eigenvectorMatrix)
  const count = n
  const omega = new Float64Array(count)
  const shapes = new Float64Array(count * n)
  order.forEach(([lam, col], m) => {
    omega[m] = Math.sqrt(lam)
    let big = 0
    for (let i = 0; i < n; i++) if (Math.abs(Phi.get(i, col)) > Math.abs(big)) big = Phi.get(i, col)
    const s = big < 0 ? -1 : 1
    for (let i = 0; i < n; i++) shapes[m * n + i] = s * Phi.get(i, col)
  })
  const c = structure.buildingCentreOfMass
  const infl = (kind: 'x' | 'y' | 'rz'): Float64Array => {
    const r = new Float64Array(n)
    for (let f = 0; f < n / 3; f++) {
      if (kind === 'x') r[3 * f] = 1
      else if (kind === 'y') r[3 * f + 1] = 1
      else {
        r[3 * f] = c.y
        r[3 * f + 1] = -c.x
        r[3 * f + 2] = 1
      }
    }
    return r
  }
  const Mtimes = (v: Float64Array): Float64Array => {
    const out = new Float64Array(n)
    for (let i = 0; i < n; i++) {
      let s = 0
      for (let j = 0; j < n; j++) s += structure.mass[i * n + j]! * v[j]!
      out[i] = s
    }
    return out
  }
  const triple = () => ({
    x: new Float64Array(count),
    y: new Float64Array(count),
    rz: new Float64Array(count),
  })
  const part = triple()
  const eff = triple()
  const cum = triple()
  for (const k of ['x', 'y', 'rz'] as const) {
    const r = infl(k)
    const Mr = Mtimes(r)
    const rMr = r.reduce((s, v, i) => s + v * Mr[i]!, 0)
    let acc = 0
    for (let m = 0; m < count; m++) {
      let g = 0
      for (let i = 0; i < n; i++) g += shapes[m * n + i]! * Mr[i]!
      part[k][m] = g
      eff[k][m] = (g * g) / rMr
      acc += eff[k][m]!
      cum[k][m] = acc
    }
  }
  const periods = omega.map((w) => (2 * Math.PI) / w)
  return {
    count,
    dofCount: n,
    angularFrequencies: omega,
    periods,
    frequenciesHz: omega.map((w) => w / (2 * Math.PI)),
    shapes,
    participation: part,
    effectiveMassRatio: eff,
    cumulativeMassRatio: cum,
    torsionShare: new Float64Array(count),
    character: new Array(count).fill('coupled'),
    solver: 'test dense',
    complete: true,
  }
}

/**
 * METHODS.md §8 self-derived one-storey case: 20 m x 10 m plan, m = 100 t, k = 1e5 kN/m;
 * y-walls 2k at x = 0 and k at x = 20; x-walls k at y = 0 and y = 10.
 */
export function oneStoreyEccentric(k = 1e8): Structure {
  return buildTestStructure(
    [{ mass: 1e5, L: 20, B: 10, height: 3 }],
    [
      shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, [2 * k]),
      shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, [k]),
      shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [k]),
      shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [k]),
    ],
  )
}

/** An N-storey shear building on the same plan with stiffness per story scaled by kScale[i]. */
export function multiStoreyEccentric(storyStiffness: readonly number[], height = 3.5): Structure {
  const n = storyStiffness.length
  return buildTestStructure(
    Array.from({ length: n }, () => ({ mass: 1e5, L: 20, B: 10, height })),
    [
      shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, storyStiffness.map((k) => 2 * k)),
      shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, storyStiffness),
      shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, storyStiffness),
      shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, storyStiffness),
    ],
  )
}
