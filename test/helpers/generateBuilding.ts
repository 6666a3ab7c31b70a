/**
 * Seeded generator of realistic (invented) Gyre projects for benchmarks, invariant and fuzz tests.
 *
 * A building has N floors over a rectangular or L-shaped slab and about 12 lateral elements per floor:
 * a stair/lift core of four walls (eccentric unless `symmetric`), two moment-frame lines and a braced
 * bay on the facades, and five columns (one inclined). All elements run from the ground to the roof
 * unless `setback` is asked for. The same seed always gives the same project. SI units throughout.
 *
 * `transformProject` moves/turns a whole project in plan (for invariance tests).
 */
import type {
  Column,
  ColumnId,
  FloorId,
  Floor,
  FrameLine,
  FrameLineId,
  LineMass,
  LineMassId,
  MaterialId,
  Point,
  PointMass,
  PointMassId,
  Project,
  Slab,
  SlabId,
  Wall,
  WallId,
  WallStoryOverride,
} from '@/model'
import { CURRENT_VERSION } from '@/model'
import { choleskyFactor, choleskySolveRows } from '@/engine/eigen'
import type { AssembledElement, FloorProps, Structure } from '@/engine/results'
import type { StiffnessSolver } from '@/engine/solve'
import { seededRandom } from '@/engine/groundMotion'

/** Options of `generateBuilding`. */
export interface GenerateBuildingOptions {
  /** Number of floors (>= 1). */
  readonly floors: number
  /** Seed of the pseudo-random sequence (default 1). */
  readonly seed?: number
  /** Plan shape (default: chosen by the seed). */
  readonly shape?: 'rect' | 'L'
  /**
   * Doubly symmetric plan about the slab centre: rectangle, centred core, paired facade frames,
   * corner columns along the axes, no inclined element, no eccentric point mass.
   */
  readonly symmetric?: boolean
  /** Let two elements stop below the roof (a setback); default false. */
  readonly setback?: boolean
  /** Link middle floors to floor 2 as typical floors (default true). */
  readonly typicalFloors?: boolean
}

/** Mulberry32: small, fast, seeded 32-bit generator; returns numbers in [0, 1) (the engine's own). */
export const createRandom = seededRandom

const round = (v: number, step = 0.05): number => Math.round(v / step) * step

/** A seeded, realistic project (see module header). */
export function generateBuilding(options: GenerateBuildingOptions): Project {
  const n = Math.floor(options.floors)
  if (!(n >= 1)) throw new RangeError(`[test] generateBuilding: floors must be >= 1 (got ${options.floors})`)
  const rnd = createRandom(options.seed ?? 1)
  const between = (lo: number, hi: number): number => lo + (hi - lo) * rnd()
  const symmetric = options.symmetric ?? false
  const shape = symmetric ? 'rect' : (options.shape ?? (rnd() < 0.5 ? 'rect' : 'L'))
  const typical = options.typicalFloors ?? true

  // Plan: Lx by Ly; an L drops the north-east quarter-ish corner.
  const Lx = round(between(24, 42), 0.5)
  const Ly = symmetric ? round(Lx * between(0.55, 0.75), 0.5) : round(between(16, 30), 0.5)
  const cutX = round(Lx * between(0.5, 0.65), 0.5)
  const cutY = round(Ly * between(0.45, 0.6), 0.5)
  const outline: Point[] =
    shape === 'L'
      ? [
          { x: 0, y: 0 },
          { x: Lx, y: 0 },
          { x: Lx, y: cutY },
          { x: cutX, y: cutY },
          { x: cutX, y: Ly },
          { x: 0, y: Ly },
        ]
      : [
          { x: 0, y: 0 },
          { x: Lx, y: 0 },
          { x: Lx, y: Ly },
          { x: 0, y: Ly },
        ]

  // Core (stair + lift): cw by ch, centred when symmetric, else pushed towards a corner.
  const cw = round(between(5, 8), 0.5)
  const ch = round(between(5, 7), 0.5)
  const cx0 = symmetric ? (Lx - cw) / 2 : round(between(1.5, Math.min(cutX, Lx) * 0.35), 0.5)
  const cy0 = symmetric ? (Ly - ch) / 2 : round(between(Ly * 0.45, Ly - ch - 1.5), 0.5)
  const opening: Point[] = [
    { x: cx0 + 0.5, y: cy0 + 0.5 },
    { x: cx0 + cw - 0.5, y: cy0 + 0.5 },
    { x: cx0 + cw - 0.5, y: cy0 + ch - 0.5 },
    { x: cx0 + 0.5, y: cy0 + ch - 0.5 },
  ]

  const floors: Floor[] = []
  const slabs: Record<string, Slab> = {}
  const lineMasses: Record<string, LineMass> = {}
  const pointMasses: Record<string, PointMass> = {}
  const fid = (i: number): FloorId => `F${i + 1}` as FloorId
  const areaTypical = round(between(650, 850), 10)
  for (let i = 0; i < n; i++) {
    const id = fid(i)
    const isTypical = typical && i >= 2 && i < n - 1
    floors.push({
      id,
      name: i === n - 1 ? `Level ${i + 1} (roof)` : `Level ${i + 1}`,
      height: i === 0 ? round(between(4, 4.8), 0.1) : round(between(3, 3.4), 0.1),
      ...(isTypical ? { typicalOf: fid(1) } : {}),
    })
    if (isTypical) continue
    const areaMass = i === 0 ? areaTypical + 120 : i === n - 1 ? areaTypical - 80 : areaTypical
    slabs[`s${i + 1}`] = {
      id: `s${i + 1}` as SlabId,
      floor: id,
      outline,
      openings: [opening],
      areaMass,
    }
    lineMasses[`fa${i + 1}`] = {
      id: `fa${i + 1}` as LineMassId,
      floor: id,
      points: [...outline, outline[0] as Point],
      massPerLength: round(between(350, 550), 10),
    }
  }
  if (!symmetric) {
    const roof = fid(n - 1)
    pointMasses.tank = {
      id: 'tank' as PointMassId,
      floor: roof,
      at: { x: round(Lx * 0.8, 0.5), y: round(cutY * 0.5, 0.5) },
      mass: round(between(15000, 40000), 1000),
    }
    pointMasses.plant = {
      id: 'plant' as PointMassId,
      floor: roof,
      at: { x: round(cutX * 0.5, 0.5), y: round(Ly * 0.7, 0.5) },
      mass: round(between(8000, 20000), 1000),
      polarInertia: 5.0e4,
    }
  }

  const concrete = 'concrete' as MaterialId
  const steel = 'steel' as MaterialId
  const top = fid(n - 1)
  const setTop = options.setback && n >= 4 ? fid(Math.floor(n * 0.6)) : top

  // Walls get thinner in the upper third (per-story overrides keyed by the top floor of the story).
  const wallT = round(between(0.25, 0.35), 0.05) + Math.min(0.4, n / 150) * 0.5
  const upper: Record<string, WallStoryOverride> = {}
  for (let i = Math.ceil((2 * n) / 3); i < n; i++) upper[fid(i)] = { thickness: round(wallT * 0.8, 0.01) }
  const wall = (id: string, name: string, p1: Point, p2: Point, t = wallT): Wall => ({
    id: id as WallId,
    name,
    p1,
    p2,
    thickness: t,
    material: concrete,
    flexureFactor: 0.7,
    shearFactor: 1,
    base: 'ground',
    top,
    ...(n >= 3 ? { stories: upper } : {}),
  })
  const walls: Record<string, Wall> = {
    cs: wall('cs', 'Core south', { x: cx0, y: cy0 }, { x: cx0 + cw, y: cy0 }),
    cn: wall('cn', 'Core north', { x: cx0, y: cy0 + ch }, { x: cx0 + cw, y: cy0 + ch }),
    cw: wall('cw', 'Core west', { x: cx0, y: cy0 }, { x: cx0, y: cy0 + ch }),
    ce: wall(
      'ce',
      'Core east',
      { x: cx0 + cw, y: cy0 + (symmetric ? 0 : 1) },
      { x: cx0 + cw, y: cy0 + ch },
    ),
  }

  const bays = Math.max(2, Math.round(Lx / 7))
  const columnI = 0.0108 * (1 + n / 40)
  const moment = (p1: Point, p2: Point, nb: number): FrameLine['stiffness'] => ({
    kind: 'moment',
    bays: nb,
    bayWidth: round(Math.hypot(p2.x - p1.x, p2.y - p1.y) / nb, 0.01),
    columnI,
    beamI: 0.0114,
    material: concrete,
  })
  const frameLines: Record<string, FrameLine> = {}
  const addFrame = (id: string, name: string, p1: Point, p2: Point, st: FrameLine['stiffness'], t = top): void => {
    frameLines[id] = { id: id as FrameLineId, name, p1, p2, stiffness: st, base: 'ground', top: t }
  }
  if (symmetric) {
    addFrame('mfs', 'South frame', { x: 0, y: 0 }, { x: Lx, y: 0 }, moment({ x: 0, y: 0 }, { x: Lx, y: 0 }, bays))
    addFrame('mfn', 'North frame', { x: 0, y: Ly }, { x: Lx, y: Ly }, moment({ x: 0, y: 0 }, { x: Lx, y: 0 }, bays))
    const yb = Math.max(2, Math.round(Ly / 7))
    addFrame('mfw', 'West frame', { x: 0, y: 0 }, { x: 0, y: Ly }, moment({ x: 0, y: 0 }, { x: 0, y: Ly }, yb))
    addFrame('mfe', 'East frame', { x: Lx, y: 0 }, { x: Lx, y: Ly }, moment({ x: 0, y: 0 }, { x: 0, y: Ly }, yb))
  } else {
    addFrame('mfs', 'South frame', { x: 0, y: 0 }, { x: Lx, y: 0 }, moment({ x: 0, y: 0 }, { x: Lx, y: 0 }, bays))
    const eastH = shape === 'L' ? cutY : Ly
    addFrame(
      'mfe',
      'East frame',
      { x: Lx, y: 0 },
      { x: Lx, y: eastH },
      moment({ x: 0, y: 0 }, { x: 0, y: eastH }, Math.max(1, Math.round(eastH / 6))),
    )
    const bx = shape === 'L' ? cutX : Lx * 0.7
    addFrame(
      'bf',
      'Braced bay',
      { x: bx, y: Ly * 0.35 },
      { x: bx, y: Ly * 0.35 + 6 },
      { kind: 'braced', braces: 2, bayWidth: 6, braceArea: 0.004 * (1 + n / 60), material: steel },
      setTop,
    )
  }

  const colI = 0.0052 * (1 + n / 30)
  const columns: Record<string, Column> = {}
  const addColumn = (id: string, at: Point, angle: number, Ix: number, Iy: number, t = top): void => {
    columns[id] = {
      id: id as ColumnId,
      name: `Column ${id.toUpperCase()}`,
      at,
      angle,
      Ix,
      Iy,
      material: concrete,
      fixity: 'fixed',
      stiffnessFactor: 0.7,
      base: 'ground',
      top: t,
    }
  }
  if (symmetric) {
    const ax = round(Lx * 0.3, 0.5)
    const ay = round(Ly * 0.3, 0.5)
    addColumn('c1', { x: Lx / 2 - ax, y: Ly / 2 - ay }, 0, colI * 1.6, colI)
    addColumn('c2', { x: Lx / 2 + ax, y: Ly / 2 - ay }, 0, colI * 1.6, colI)
    addColumn('c3', { x: Lx / 2 - ax, y: Ly / 2 + ay }, 0, colI * 1.6, colI)
    addColumn('c4', { x: Lx / 2 + ax, y: Ly / 2 + ay }, 0, colI * 1.6, colI)
  } else {
    const spots: Point[] = [
      { x: round(Lx * 0.35, 0.5), y: round(Ly * 0.25, 0.5) },
      { x: round(Lx * 0.6, 0.5), y: round(Ly * 0.2, 0.5) },
      { x: round(cutX * 0.5, 0.5), y: round(Ly * 0.8, 0.5) },
      { x: round(Lx * 0.85, 0.5), y: round(cutY * 0.7, 0.5) },
      { x: round(cutX * 0.8, 0.5), y: round(Ly * 0.4, 0.5) },
    ]
    spots.forEach((at, k) => {
      const inclined = k === 4
      const angle = inclined ? round(between(0.3, 0.7), 0.01) : k % 2 === 0 ? 0 : Math.PI / 2
      addColumn(`c${k + 1}`, at, angle, colI * between(1, 2), colI * between(0.6, 1), k === 3 ? setTop : top)
    })
  }

  return {
    format: 'gyre-project',
    version: CURRENT_VERSION,
    name: `Generated ${n}-storey ${symmetric ? 'symmetric ' : ''}${shape === 'L' ? 'L-plan' : 'block'} (seed ${options.seed ?? 1})`,
    notes: 'Invented by the seeded test generator; not a real building.',
    floors,
    materials: {
      concrete: { id: concrete, name: 'Concrete', E: 32e9, nu: 0.2 },
      steel: { id: steel, name: 'Steel', E: 200e9, nu: 0.3 },
    },
    slabs,
    lineMasses,
    pointMasses,
    walls,
    frameLines,
    columns,
    settings: {
      criterionSet: 'asce7-16',
      accidentalEccentricity: 0.05,
      damping: 0.05,
      spectrum: { kind: 'asce7', SDS: 0.9, SD1: 0.5, TL: 8 },
      directionCombination: 'srss',
    },
  }
}

/**
 * The same project moved rigidly in plan: every point p becomes R(angle) p + (dx, dy), and every
 * column's local axis turns by `angle` (rad, counter-clockwise). Masses, stiffnesses and heights are kept.
 */
export function transformProject(
  project: Project,
  move: { readonly dx: number; readonly dy: number; readonly angle: number },
): Project {
  const c = Math.cos(move.angle)
  const s = Math.sin(move.angle)
  const tp = (p: Point): Point => ({ x: c * p.x - s * p.y + move.dx, y: s * p.x + c * p.y + move.dy })
  const mapRecord = <T>(rec: Readonly<Record<string, T>>, f: (v: T) => T): Record<string, T> =>
    Object.fromEntries(Object.entries(rec).map(([k, v]) => [k, f(v)]))
  // A plan grid has axis-parallel lines only, so it is dropped (it carries no mechanics).
  const { grid: _grid, ...rest } = project
  return {
    ...rest,
    slabs: mapRecord(project.slabs, (s0) => ({
      ...s0,
      outline: s0.outline.map(tp),
      openings: s0.openings.map((o) => o.map(tp)),
    })),
    lineMasses: mapRecord(project.lineMasses, (m) => ({ ...m, points: m.points.map(tp) })),
    pointMasses: mapRecord(project.pointMasses, (m) => ({ ...m, at: tp(m.at) })),
    walls: mapRecord(project.walls, (w) => ({ ...w, p1: tp(w.p1), p2: tp(w.p2) })),
    frameLines: mapRecord(project.frameLines, (f) => ({ ...f, p1: tp(f.p1), p2: tp(f.p2) })),
    columns: mapRecord(project.columns, (col) => ({ ...col, at: tp(col.at), angle: col.angle + move.angle })),
  }
}

// ---------------------------------------------------------------- hand-built structures (tests only)

/** One floor of a hand-built structure: mass kg, centre of mass m, polar inertia about the CM kg·m². */
export interface HandFloor {
  readonly mass: number
  readonly cm?: Point
  readonly J: number
  /** Story height below, m (default 3). */
  readonly height?: number
  /** Plan outline vertices (extreme points), default a 10 m square around the CM. */
  readonly outline?: readonly Point[]
}

/** A hand-built lateral element: map row a and its lateral stiffness over floors 0..n_e-1 of `floors`. */
export interface HandElement {
  readonly id?: string
  /** Plan point on the line and direction angle, rad (map a = [cos, sin, x sin - y cos]). */
  readonly at: Point
  readonly angle: number
  /** Shear type: story stiffness per story (story i under floor i), N/m; zeros where absent. */
  readonly storyStiffness?: readonly number[]
  /** Or a full lateral stiffness over all floors from floor 0 up, row-major, N/m. */
  readonly matrix?: readonly number[]
}

/**
 * A Structure (results.ts contract) assembled by hand: K = sum A' k_e A, M per MODELING.md (mass block
 * about O). For tests that must not depend on buildStructure.
 */
export function structureFromParts(floorsIn: readonly HandFloor[], elementsIn: readonly HandElement[]): Structure {
  const nf = floorsIn.length
  const n = 3 * nf
  const K = new Float64Array(n * n)
  const M = new Float64Array(n * n)
  let total = 0
  let sx = 0
  let sy = 0
  let z = 0
  const floors: FloorProps[] = floorsIn.map((f, i) => {
    const cm = f.cm ?? { x: 0, y: 0 }
    const h = f.height ?? 3
    z += h
    const outline = f.outline ?? [
      { x: cm.x - 5, y: cm.y - 5 },
      { x: cm.x + 5, y: cm.y - 5 },
      { x: cm.x + 5, y: cm.y + 5 },
      { x: cm.x - 5, y: cm.y + 5 },
    ]
    const o = 3 * i
    const m = f.mass
    M[o * n + o] = m
    M[(o + 1) * n + o + 1] = m
    M[o * n + o + 2] = -m * cm.y
    M[(o + 2) * n + o] = -m * cm.y
    M[(o + 1) * n + o + 2] = m * cm.x
    M[(o + 2) * n + o + 1] = m * cm.x
    M[(o + 2) * n + o + 2] = f.J + m * (cm.x * cm.x + cm.y * cm.y)
    total += m
    sx += m * cm.x
    sy += m * cm.y
    const xs = outline.map((p) => p.x)
    const ys = outline.map((p) => p.y)
    return {
      id: `F${i + 1}`,
      name: `Floor ${i + 1}`,
      index: i,
      elevation: z,
      height: h,
      mass: m,
      centreOfMass: cm,
      polarInertia: f.J,
      radiusOfGyration: Math.sqrt(f.J / m),
      slabArea: 100,
      extent: { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) },
      extremePoints: outline,
    }
  })
  const elements: AssembledElement[] = elementsIn.map((e, idx) => {
    const c = Math.cos(e.angle)
    const s = Math.sin(e.angle)
    const a: [number, number, number] = [c, s, e.at.x * s - e.at.y * c]
    const ke = new Float64Array(nf * nf)
    if (e.matrix) {
      ke.set(e.matrix)
    } else {
      const ks = e.storyStiffness ?? []
      for (let i = 0; i < nf; i++) {
        const k = ks[i] ?? 0
        ke[i * nf + i]! += k
        if (i > 0) {
          ke[(i - 1) * nf + i - 1]! += k
          ke[(i - 1) * nf + i]! -= k
          ke[i * nf + i - 1]! -= k
        }
      }
    }
    for (let i = 0; i < nf; i++) {
      for (let j = 0; j < nf; j++) {
        const k = ke[i * nf + j]!
        if (k === 0) continue
        for (let p = 0; p < 3; p++) for (let q = 0; q < 3; q++) K[(3 * i + p) * n + 3 * j + q]! += k * a[p]! * a[q]!
      }
    }
    return {
      id: e.id ?? `e${idx + 1}`,
      kind: 'frameLine',
      floors: Array.from({ length: nf }, (_, i) => i),
      map: a,
      standsOnFloor: false,
      stiffness: ke,
      isShearType: !e.matrix,
    }
  })
  return {
    floorCount: nf,
    dofCount: n,
    floors,
    stiffness: K,
    mass: M,
    elements,
    allShearType: elements.every((e) => e.isShearType),
    buildingCentreOfMass: { x: sx / total, y: sy / total },
    totalMass: total,
  }
}

/** A dense Cholesky StiffnessSolver for tests (independent of solve.ts). */
export function denseStiffnessSolver(structure: Structure): StiffnessSolver {
  const n = structure.dofCount
  const { L } = choleskyFactor(structure.stiffness, n)
  if (!L) throw new Error('[test] denseStiffnessSolver: K is not positive definite')
  const solve = (rhs: Float64Array): Float64Array => {
    const x = new Float64Array(rhs)
    choleskySolveRows(L, n, x, 1)
    return x
  }
  return {
    solve,
    floorFlexibility(j: number): Float64Array {
      const F = new Float64Array(9)
      for (let c = 0; c < 3; c++) {
        const e = new Float64Array(n)
        e[3 * j + c] = 1
        const u = solve(e)
        for (let r = 0; r < 3; r++) F[3 * r + c] = u[3 * j + r]!
      }
      return F
    },
  }
}
