/**
 * A tiny builder for Project objects in tests: floors, rectangular slabs, walls, frame lines, columns
 * and masses with sensible defaults (SI units). Every add method returns the builder; `build()` returns
 * a fresh plain Project. Ids default to short readable ones ('L1'.., 'w1'.., 'f1'.., 'c1'.., 's1'..).
 *
 * Defaults: floors 'L1'..'LN' named 'Level i', story height 3 m; materials 'concrete'
 * (E = 30 GPa, nu = 0.2) and 'steel' (E = 200 GPa, nu = 0.3); walls 0.3 m thick, factors 1; elements
 * from 'ground' to the top floor; columns fixed, angle 0; settings: 5% eccentricity and damping.
 *
 * @example
 * const project = projectBuilder({ floors: 3 })
 *   .rectSlab({ x: 0, y: 0, width: 20, depth: 10, areaMass: 500 })
 *   .wall({ p1: { x: 0, y: 0 }, p2: { x: 0, y: 6 } })
 *   .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 20, y: 0 }, storyStiffness: 1e8 })
 *   .build()
 */
import type {
  AnalysisSettings,
  BaseRef,
  Column,
  ColumnFixity,
  Floor,
  FloorId,
  FrameLine,
  FrameStiffness,
  LineMass,
  Material,
  Point,
  PointMass,
  Project,
  Slab,
  Wall,
  WallStoryOverride,
} from '@/model'

/** Floors: a count (equal heights) or explicit descriptions bottom to top. */
export type FloorSpec =
  | number
  | readonly { id?: string; name?: string; height?: number; typicalOf?: string }[]

export interface ProjectBuilderOptions {
  /** Number of floors (default 1) or explicit floors. */
  readonly floors?: FloorSpec
  /** Story height for generated floors, m (default 3). */
  readonly height?: number
  readonly name?: string
}

/** FrameStiffness with plain-string material ids (test convenience). */
export type LooseFrameStiffness = FrameStiffness extends infer T
  ? T extends { readonly material: unknown }
    ? Omit<T, 'material'> & { readonly material: string }
    : T
  : never

/** Which floors a slab/mass goes on: one floor id, a list, or 'all' (default 'all'). */
export type FloorTarget = string | readonly string[] | 'all'

export interface ProjectBuilder {
  /** Rectangle [x, x+width] x [y, y+depth] with optional rectangular openings. */
  rectSlab(opts: {
    x?: number
    y?: number
    width: number
    depth: number
    areaMass: number
    floor?: FloorTarget
    openings?: readonly { x: number; y: number; width: number; depth: number }[]
    id?: string
  }): ProjectBuilder
  /** A slab with an arbitrary outline (and openings as point lists). */
  slab(opts: {
    outline: readonly Point[]
    openings?: readonly (readonly Point[])[]
    areaMass: number
    floor?: FloorTarget
    id?: string
  }): ProjectBuilder
  wall(opts: {
    p1: Point
    p2: Point
    thickness?: number
    material?: string
    flexureFactor?: number
    shearFactor?: number
    base?: BaseRef | string
    top?: string
    stories?: Record<string, WallStoryOverride>
    id?: string
    name?: string
    joins?: 'auto' | 'apart'
  }): ProjectBuilder
  /** A frame line; give `storyStiffness` (direct, N/m) or a full `stiffness` description. */
  frameLine(opts: {
    p1: Point
    p2: Point
    storyStiffness?: number
    stories?: Record<string, number>
    stiffness?: LooseFrameStiffness
    base?: BaseRef | string
    top?: string
    id?: string
    name?: string
  }): ProjectBuilder
  column(opts: {
    at: Point
    Ix?: number
    Iy?: number
    angle?: number
    material?: string
    fixity?: ColumnFixity
    stiffnessFactor?: number
    base?: BaseRef | string
    top?: string
    id?: string
    name?: string
  }): ProjectBuilder
  pointMass(opts: {
    at: Point
    mass: number
    polarInertia?: number
    floor?: FloorTarget
    id?: string
  }): ProjectBuilder
  lineMass(opts: {
    points: readonly Point[]
    massPerLength: number
    floor?: FloorTarget
    id?: string
  }): ProjectBuilder
  material(m: { id: string; E: number; nu: number; name?: string }): ProjectBuilder
  /** Replace analysis settings fields. */
  settings(patch: Partial<AnalysisSettings>): ProjectBuilder
  /** Floor ids bottom to top. */
  floorIds(): string[]
  build(): Project
}

const DEFAULT_SETTINGS: AnalysisSettings = {
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
}

/** Start a test project. */
export function projectBuilder(options: ProjectBuilderOptions = {}): ProjectBuilder {
  const spec = options.floors ?? 1
  const height = options.height ?? 3
  const floors: Floor[] = (
    typeof spec === 'number'
      ? Array.from({ length: spec }, (_, i) => ({ id: `L${i + 1}`, name: `Level ${i + 1}`, height }))
      : spec.map((f, i) => ({
          id: f.id ?? `L${i + 1}`,
          name: f.name ?? `Level ${i + 1}`,
          height: f.height ?? height,
          ...(f.typicalOf !== undefined ? { typicalOf: f.typicalOf as FloorId } : {}),
        }))
  ).map((f) => f as Floor)
  const materials: Record<string, Material> = {
    concrete: { id: 'concrete', name: 'Concrete', E: 30e9, nu: 0.2 } as Material,
    steel: { id: 'steel', name: 'Steel', E: 200e9, nu: 0.3 } as Material,
  }
  const slabs: Record<string, Slab> = {}
  const lineMasses: Record<string, LineMass> = {}
  const pointMasses: Record<string, PointMass> = {}
  const walls: Record<string, Wall> = {}
  const frameLines: Record<string, FrameLine> = {}
  const columns: Record<string, Column> = {}
  let settings: AnalysisSettings = DEFAULT_SETTINGS
  const counters: Record<string, number> = {}
  const nextId = (prefix: string): string => {
    counters[prefix] = (counters[prefix] ?? 0) + 1
    return `${prefix}${counters[prefix]}`
  }
  const topId = (): string => floors[floors.length - 1]?.id ?? 'L1'
  const targets = (t: FloorTarget | undefined): string[] =>
    t === undefined || t === 'all' ? floors.map((f) => f.id) : typeof t === 'string' ? [t] : [...t]
  const rect = (x: number, y: number, w: number, d: number): Point[] => [
    { x, y },
    { x: x + w, y },
    { x: x + w, y: y + d },
    { x, y: y + d },
  ]

  const builder: ProjectBuilder = {
    rectSlab(o) {
      const x = o.x ?? 0
      const y = o.y ?? 0
      return builder.slab({
        outline: rect(x, y, o.width, o.depth),
        openings: (o.openings ?? []).map((h) => rect(h.x, h.y, h.width, h.depth)),
        areaMass: o.areaMass,
        ...(o.floor !== undefined ? { floor: o.floor } : {}),
        ...(o.id !== undefined ? { id: o.id } : {}),
      })
    },
    slab(o) {
      const list = targets(o.floor)
      for (const floor of list) {
        const id = o.id !== undefined && list.length === 1 ? o.id : nextId('s')
        slabs[id] = {
          id,
          floor: floor as FloorId,
          outline: [...o.outline],
          openings: (o.openings ?? []).map((h) => [...h]),
          areaMass: o.areaMass,
        } as unknown as Slab
      }
      return builder
    },
    wall(o) {
      const id = o.id ?? nextId('w')
      walls[id] = {
        id,
        name: o.name ?? `Wall ${id}`,
        p1: o.p1,
        p2: o.p2,
        thickness: o.thickness ?? 0.3,
        material: o.material ?? 'concrete',
        flexureFactor: o.flexureFactor ?? 1,
        shearFactor: o.shearFactor ?? 1,
        base: o.base ?? 'ground',
        top: o.top ?? topId(),
        ...(o.stories !== undefined ? { stories: o.stories } : {}),
        ...(o.joins !== undefined ? { joins: o.joins } : {}),
      } as Wall
      return builder
    },
    frameLine(o) {
      const id = o.id ?? nextId('f')
      const stiffness: FrameStiffness = (o.stiffness as FrameStiffness | undefined) ?? {
        kind: 'direct',
        storyStiffness: o.storyStiffness ?? 1e8,
        ...(o.stories !== undefined ? { stories: o.stories } : {}),
      }
      frameLines[id] = {
        id,
        name: o.name ?? `Frame ${id}`,
        p1: o.p1,
        p2: o.p2,
        stiffness,
        base: o.base ?? 'ground',
        top: o.top ?? topId(),
      } as FrameLine
      return builder
    },
    column(o) {
      const id = o.id ?? nextId('c')
      columns[id] = {
        id,
        name: o.name ?? `Column ${id}`,
        at: o.at,
        angle: o.angle ?? 0,
        Ix: o.Ix ?? 0.0052,
        Iy: o.Iy ?? 0.0052,
        material: o.material ?? 'concrete',
        fixity: o.fixity ?? 'fixed',
        ...(o.stiffnessFactor !== undefined ? { stiffnessFactor: o.stiffnessFactor } : {}),
        base: o.base ?? 'ground',
        top: o.top ?? topId(),
      } as Column
      return builder
    },
    pointMass(o) {
      const list = targets(o.floor)
      for (const floor of list) {
        const id = o.id !== undefined && list.length === 1 ? o.id : nextId('pm')
        pointMasses[id] = {
          id,
          floor: floor as FloorId,
          at: o.at,
          mass: o.mass,
          ...(o.polarInertia !== undefined ? { polarInertia: o.polarInertia } : {}),
        } as PointMass
      }
      return builder
    },
    lineMass(o) {
      const list = targets(o.floor)
      for (const floor of list) {
        const id = o.id !== undefined && list.length === 1 ? o.id : nextId('lm')
        lineMasses[id] = { id, floor: floor as FloorId, points: [...o.points], massPerLength: o.massPerLength } as unknown as LineMass
      }
      return builder
    },
    material(m) {
      materials[m.id] = { id: m.id, name: m.name ?? m.id, E: m.E, nu: m.nu } as Material
      return builder
    },
    settings(patch) {
      settings = { ...settings, ...patch } as AnalysisSettings
      return builder
    },
    floorIds() {
      return floors.map((f) => f.id)
    },
    build() {
      return structuredClone({
        format: 'gyre-project',
        version: 1,
        name: options.name ?? 'Test project',
        floors,
        materials,
        slabs,
        lineMasses,
        pointMasses,
        walls,
        frameLines,
        columns,
        settings,
      }) as Project
    },
  }
  return builder
}

/**
 * METHODS.md §8 self-derived one-storey case: plan 20 m x 10 m, m = 100 t uniform (500 kg/m²),
 * k = 1e5 kN/m; walls as direct-stiffness frame lines: y-walls 2k at x = 0 and k at x = 20, x-walls k
 * at y = 0 and y = 10. `shift` translates the whole model.
 */
export function eccentricOneStorey(shift = { x: 0, y: 0 }): Project {
  const k = 1e8 // 1e5 kN/m
  const P = (x: number, y: number) => ({ x: x + shift.x, y: y + shift.y })
  return projectBuilder({ floors: 1, height: 3 })
    .rectSlab({ x: shift.x, y: shift.y, width: 20, depth: 10, areaMass: 500 })
    .frameLine({ id: 'yw0', p1: P(0, 0), p2: P(0, 10), storyStiffness: 2 * k })
    .frameLine({ id: 'yw20', p1: P(20, 0), p2: P(20, 10), storyStiffness: k })
    .frameLine({ id: 'xw0', p1: P(0, 0), p2: P(20, 0), storyStiffness: k })
    .frameLine({ id: 'xw10', p1: P(0, 10), p2: P(20, 10), storyStiffness: k })
    .build()
}

/** A small mixed 4-floor model: walls (one standing on L2), frames of each kind, skewed columns, an opening. */
export function mixedModel(shift = { x: 0, y: 0 }): Project {
  const P = (x: number, y: number) => ({ x: x + shift.x, y: y + shift.y })
  return projectBuilder({ floors: [{ height: 4.5 }, { height: 3.2 }, { height: 3.2 }, { height: 3.0 }] })
    .rectSlab({ x: shift.x, y: shift.y, width: 24, depth: 14, areaMass: 650, openings: [{ x: 2 + shift.x, y: 9 + shift.y, width: 3, depth: 3 }] })
    .pointMass({ at: P(20, 3), mass: 8000, floor: 'L4' })
    .wall({ id: 'w1', p1: P(1, 8), p2: P(1, 13), thickness: 0.3, stories: { L4: { thickness: 0.2 } } })
    .wall({ id: 'w2', p1: P(1, 13), p2: P(7, 13), flexureFactor: 0.7 })
    .wall({ id: 'w3', p1: P(23, 2), p2: P(21, 6), base: 'L2' })
    .frameLine({
      id: 'f1',
      p1: P(0, 0),
      p2: P(24, 0),
      stiffness: { kind: 'moment', bays: 4, bayWidth: 6, columnI: 0.0108, beamI: 0.0114, material: 'concrete' },
    })
    .frameLine({
      id: 'f2',
      p1: P(24, 0),
      p2: P(24, 14),
      stiffness: { kind: 'braced', braces: 2, bayWidth: 6, braceArea: 4e-3, material: 'steel' },
      top: 'L3',
    })
    .column({ id: 'c1', at: P(12, 7), angle: 0.4, Ix: 0.008, Iy: 0.003 })
    .column({ id: 'c2', at: P(6, 4), fixity: 'pinned', stiffnessFactor: 0.7, base: 'L1', top: 'L3' })
    .build()
}
