/**
 * Hand-made modal results for viewer tests, the viewer test page and the frame-rate benchmark, so the
 * viewer can be exercised without the engine. The shapes are invented but exact by construction:
 * mode 1 turns every floor about a chosen plan point C (u_x = θ C_y, u_y = -θ C_x), mode 2 is pure
 * X, mode 3 couples Y with a turn, then three higher modes of the same kinds.
 */
import type { AnalysisResult, FloorCentres, FloorProps, ModalResult, ModeCharacter } from '@/engine'
import { CAUTION, CURRENT_VERSION, computeElevations, floorContent } from '@/model'
import type { Point, Project } from '@/model'

export interface FixtureOptions {
  /** Plan point mode 1 turns about (default: the middle of the first wall, else the plan centre). */
  readonly torsionCentre?: Point
}

function box(points: readonly Point[]) {
  return {
    minX: Math.min(...points.map((p) => p.x)),
    maxX: Math.max(...points.map((p) => p.x)),
    minY: Math.min(...points.map((p) => p.y)),
    maxY: Math.max(...points.map((p) => p.y)),
  }
}

/** A synthetic AnalysisResult with six modes for any project (all floors must have slabs). */
export function fixtureResult(project: Project, options: FixtureOptions = {}): AnalysisResult {
  const n = project.floors.length
  const dofCount = 3 * n
  const z = computeElevations(project)
  const H = z[n - 1] ?? 1
  const corners = project.floors.map((f) => floorContent(project, f.id).slabs.flatMap((s) => s.outline))
  const all = corners.flat()
  const b = box(all.length ? all : [{ x: 0, y: 0 }, { x: 1, y: 1 }])
  const size = Math.max(b.maxX - b.minX, b.maxY - b.minY)
  const centre = { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2 }
  const firstWall = Object.values(project.walls)[0]
  const C =
    options.torsionCentre ??
    (firstWall ? { x: (firstWall.p1.x + firstWall.p2.x) / 2, y: (firstWall.p1.y + firstWall.p2.y) / 2 } : centre)
  const count = 6
  const shapes = new Float64Array(count * dofCount)
  const profile = (k: number, i: number) => Math.sin(((2 * k - 1) * Math.PI * (z[i] ?? 0)) / (2 * H))
  for (let i = 0; i < n; i++) {
    for (const [m, k] of [
      [0, 1],
      [3, 2],
    ] as const) {
      const th = profile(k, i) / size
      shapes[m * dofCount + 3 * i] = th * C.y
      shapes[m * dofCount + 3 * i + 1] = -th * C.x
      shapes[m * dofCount + 3 * i + 2] = th
    }
    for (const [m, k] of [
      [1, 1],
      [4, 2],
    ] as const) {
      shapes[m * dofCount + 3 * i] = profile(k, i)
    }
    for (const [m, k] of [
      [2, 1],
      [5, 2],
    ] as const) {
      const th = (0.35 * profile(k, i)) / size
      shapes[m * dofCount + 3 * i] = th * centre.y
      shapes[m * dofCount + 3 * i + 1] = profile(k, i) - th * centre.x
      shapes[m * dofCount + 3 * i + 2] = th
    }
  }
  const periods = Float64Array.from([0.92, 0.71, 0.6, 0.31, 0.24, 0.2])
  const ratioX = Float64Array.from([0.08, 0.66, 0.02, 0.03, 0.12, 0.01])
  const ratioY = Float64Array.from([0.05, 0.0, 0.61, 0.02, 0.0, 0.13])
  const ratioRz = Float64Array.from([0.58, 0.04, 0.1, 0.12, 0.01, 0.03])
  const cum = (r: Float64Array) => {
    let s = 0
    return r.map((v) => (s += v))
  }
  const character: ModeCharacter[] = ['torsion', 'x', 'coupled', 'torsion', 'x', 'coupled']
  const modes: ModalResult = {
    count,
    dofCount,
    angularFrequencies: periods.map((T) => (2 * Math.PI) / T),
    periods,
    frequenciesHz: periods.map((T) => 1 / T),
    shapes,
    participation: { x: ratioX.map(Math.sqrt), y: ratioY.map(Math.sqrt), rz: ratioRz.map(Math.sqrt) },
    effectiveMassRatio: { x: ratioX, y: ratioY, rz: ratioRz },
    cumulativeMassRatio: { x: cum(ratioX), y: cum(ratioY), rz: cum(ratioRz) },
    torsionShare: Float64Array.from([0.86, 0.04, 0.32, 0.84, 0.05, 0.3]),
    character,
    solver: 'fixture',
    complete: false,
  }
  const floors: FloorProps[] = project.floors.map((f, i) => {
    const c = corners[i] ?? []
    const fb = c.length ? box(c) : b
    return {
      id: f.id,
      name: f.name,
      index: i,
      elevation: z[i] ?? 0,
      height: f.height,
      mass: 5e5,
      centreOfMass: { x: (fb.minX + fb.maxX) / 2, y: (fb.minY + fb.maxY) / 2 },
      polarInertia: 5e5 * 100,
      radiusOfGyration: 10,
      slabArea: 500,
      extent: fb,
      extremePoints: c,
    }
  })
  const centres: FloorCentres[] = floors.map((f) => ({
    floorId: f.id,
    centreOfMass: f.centreOfMass,
    centreOfRigidity: { x: (C.x + f.centreOfMass.x) / 2, y: (C.y + f.centreOfMass.y) / 2 },
    storyCentreOfStiffness: null,
    eccentricity: { x: (C.x - f.centreOfMass.x) / 2, y: (C.y - f.centreOfMass.y) / 2 },
    torsionalStiffness: 1e10,
    lateralStiffness: { x: 1e8, y: 1e8 },
    torsionalRadius: { x: 10, y: 10 },
    radiusOfGyration: 10,
    hasXYCoupling: false,
  }))
  return {
    status: 'ok',
    issues: [],
    projectName: project.name,
    floors,
    totalMass: 5e5 * n,
    buildingCentreOfMass: centre,
    modes,
    centres,
    torsion: null,
    spectrum: null,
    timeHistory: null,
    regularity: null,
    caution: CAUTION,
    timings: {},
  }
}

/** A tiny three-floor project: one 20 m x 12 m slab per floor, a core wall pair, a frame line. */
export function threeFloorProject(): Project {
  const outline = [
    { x: 0, y: 0 },
    { x: 20, y: 0 },
    { x: 20, y: 12 },
    { x: 0, y: 12 },
  ]
  const floors = [1, 2, 3].map((k) => ({ id: `F${k}`, name: `Floor ${k}`, height: 3.5 }))
  const slabs = Object.fromEntries(
    floors.map((f) => [
      `s${f.id}`,
      { id: `s${f.id}`, floor: f.id, outline, openings: [[{ x: 2, y: 2 }, { x: 4, y: 2 }, { x: 4, y: 4 }, { x: 2, y: 4 }]], areaMass: 800 },
    ]),
  )
  return {
    format: 'gyre-project',
    version: CURRENT_VERSION,
    name: 'Three Floor Test',
    floors,
    materials: { c: { id: 'c', name: 'Concrete', E: 30e9, nu: 0.2 } },
    slabs,
    lineMasses: {},
    pointMasses: {},
    walls: {
      w1: {
        id: 'w1', name: 'Core A', p1: { x: 2, y: 8 }, p2: { x: 6, y: 8 }, thickness: 0.3, material: 'c',
        flexureFactor: 0.7, shearFactor: 1, base: 'ground', top: 'F3',
      },
      w2: {
        id: 'w2', name: 'Gable', p1: { x: 20, y: 2 }, p2: { x: 20, y: 8 }, thickness: 0.25, material: 'c',
        flexureFactor: 0.7, shearFactor: 1, base: 'ground', top: 'F2', stories: { F2: { thickness: 0.2 } },
      },
    },
    frameLines: {
      f1: {
        id: 'f1', name: 'South frame', p1: { x: 4, y: 0 }, p2: { x: 16, y: 0 },
        stiffness: { kind: 'braced', braces: 2, bayWidth: 12, braceArea: 0.004, material: 'c' },
        base: 'ground', top: 'F3',
      },
    },
    columns: {
      c1: {
        id: 'c1', name: 'C1', at: { x: 10, y: 6 }, angle: 0.3, Ix: 0.005, Iy: 0.005, material: 'c',
        fixity: 'fixed', base: 'ground', top: 'F3',
      },
    },
    settings: {
      criterionSet: 'asce7-16',
      accidentalEccentricity: 0.05,
      damping: 0.05,
      spectrum: { kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8 },
      directionCombination: 'srss',
    },
  } as unknown as Project
}
