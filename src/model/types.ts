/**
 * What a Gyre project is: plain JSON-able data in SI units (m, kg, N, s, Pa, rad).
 * Plan axes: x right, y up the screen, z up; rotation about z positive counter-clockwise from above.
 * Floors are listed bottom to top; "ground" is the fixed base (floor 0, z = 0).
 * @see ../../docs/file-format.md for the field-by-field description of the saved file.
 */
import type {
  ColumnId,
  FloorId,
  FrameLineId,
  LineMassId,
  MaterialId,
  PointMassId,
  SlabId,
  WallId,
} from './ids'
import type { SeismicDesign } from './seismicDesign'

/** A plan point, m. */
export interface Point {
  readonly x: number
  readonly y: number
}

/** The floor an element stands on: the fixed base, or a floor (the element is fixed to it there). */
export type BaseRef = 'ground' | FloorId

/** One floor (rigid diaphragm) and the story below it. */
export interface Floor {
  readonly id: FloorId
  readonly name: string
  /** Height of the story below this floor, m (> 0). Elevations are cumulative sums from z = 0. */
  readonly height: number
  /**
   * "Typical floor" link: this floor's slabs, line masses and point masses are those of the named floor
   * (its own are ignored while linked). Lateral elements are never linked; they have floor ranges.
   */
  readonly typicalOf?: FloorId
}

/** Elastic material. */
export interface Material {
  readonly id: MaterialId
  readonly name: string
  /** Young's modulus, Pa. */
  readonly E: number
  /** Poisson ratio, -. */
  readonly nu: number
}

/** A slab region of one floor: outer outline with openings, and its uniform area mass. */
export interface Slab {
  readonly id: SlabId
  readonly floor: FloorId
  /** Outer outline vertices, m; either winding; not self-intersecting. */
  readonly outline: readonly Point[]
  /** Openings (holes) inside the outline, m. */
  readonly openings: readonly (readonly Point[])[]
  /** Area mass, kg/m² (a uniform load q in kN/m² is q*1000/g kg/m²). */
  readonly areaMass: number
}

/** A mass distributed along a polyline (facade, partition line), kg/m; thin segments. */
export interface LineMass {
  readonly id: LineMassId
  readonly floor: FloorId
  readonly points: readonly Point[]
  /** kg/m */
  readonly massPerLength: number
}

/** A lumped mass at a plan point. */
export interface PointMass {
  readonly id: PointMassId
  readonly floor: FloorId
  readonly at: Point
  /** kg */
  readonly mass: number
  /** Own polar moment of inertia about its own vertical axis, kg·m² (default 0). */
  readonly polarInertia?: number
}

/** Per-story overrides of a wall, keyed by the floor at the top of the story. */
export interface WallStoryOverride {
  /** m */
  readonly thickness?: number
  /** effective flexural stiffness factor f_I, - */
  readonly flexureFactor?: number
  /** effective shear stiffness factor f_A, - */
  readonly shearFactor?: number
}

/**
 * A shear wall acting in its own plane only: a Timoshenko cantilever stack from `base` to `top`,
 * rotations at floors condensed out.
 */
export interface Wall {
  readonly id: WallId
  readonly name: string
  readonly p1: Point
  readonly p2: Point
  /** m */
  readonly thickness: number
  readonly material: MaterialId
  /**
   * Effective flexural stiffness factor on I (cracking), - (e.g. 0.7 uncracked, 0.35 cracked; file
   * default STIFFNESS_FACTOR_DEFAULTS.wallFlexure).
   */
  readonly flexureFactor: number
  /** Effective shear stiffness factor on A_s, -. */
  readonly shearFactor: number
  readonly base: BaseRef
  readonly top: FloorId
  readonly stories?: Readonly<Record<string, WallStoryOverride>>
  /**
   * Whether the wall joins walls it touches into one composite section (a wall group, e.g. an L, C or
   * box core): 'auto' (default) joins it, 'apart' keeps it a planar wall of its own.
   * @see ../../docs/mechanics.md §Wall groups
   */
  readonly joins?: WallJoins
  /** Kept as it is by the balance assistant (default false). @see ../../docs/balance.md */
  readonly locked?: boolean
}

/** How a wall combines with walls it touches (see `Wall.joins`). */
export type WallJoins = 'auto' | 'apart'

/** How a frame line's story stiffness is obtained. */
export type FrameStiffness =
  | {
      /** Story stiffness entered directly, N/m; `stories` overrides per story (key: top floor id). */
      readonly kind: 'direct'
      readonly storyStiffness: number
      readonly stories?: Readonly<Record<string, number>>
    }
  | {
      /**
       * Moment frame from its members: a plane frame of bays + 1 column lines and beams of width
       * `bayWidth` at every floor it spans, axial deformation neglected, joint rotations condensed
       * out, giving a full lateral stiffness over its floors (docs/mechanics.md §4).
       */
      readonly kind: 'moment'
      readonly bays: number
      /** m */
      readonly bayWidth: number
      /** Column second moment in the frame's plane (gross section), m⁴ */
      readonly columnI: number
      /** Beam second moment (gross section), m⁴ */
      readonly beamI: number
      readonly material: MaterialId
      /** Column feet at the frame's base: fixed against rotation or pinned (default 'fixed'). */
      readonly baseFixity?: 'fixed' | 'pinned'
      /** Effective stiffness factor on column I, - (default STIFFNESS_FACTOR_DEFAULTS.frameColumn). */
      readonly columnFactor?: number
      /** Effective stiffness factor on beam I, - (default STIFFNESS_FACTOR_DEFAULTS.frameBeam). */
      readonly beamFactor?: number
      /**
       * Per-story overrides keyed by the floor at the top of the story: that story's column I and the
       * I of the beams at that floor, m⁴.
       */
      readonly stories?: Readonly<Record<string, MomentFrameStoryOverride>>
    }
  | {
      /**
       * Braced frame: each brace adds E·A·cos²α / L_d (axial, pin-ended); `braces` per story
       * (2 for an X or chevron bay acting together), in a bay of width `bayWidth`.
       */
      readonly kind: 'braced'
      readonly braces: number
      /** m */
      readonly bayWidth: number
      /** Brace area, m² */
      readonly braceArea: number
      readonly material: MaterialId
    }

/** Per-story member overrides of a moment frame (keyed by the floor at the top of the story). */
export interface MomentFrameStoryOverride {
  /** Column second moment in this story, m⁴ */
  readonly columnI?: number
  /** Beam second moment at the floor on top of this story, m⁴ */
  readonly beamI?: number
}

/**
 * A moment or braced frame line acting in its own vertical plane: shear-type story stiffness for
 * direct and braced frames, a condensed plane frame (full lateral stiffness) for moment frames.
 */
export interface FrameLine {
  readonly id: FrameLineId
  readonly name: string
  readonly p1: Point
  readonly p2: Point
  readonly stiffness: FrameStiffness
  readonly base: BaseRef
  readonly top: FloorId
  /** Kept as it is by the balance assistant (default false). @see ../../docs/balance.md */
  readonly locked?: boolean
}

/**
 * Fixity of a column at its foot (where it stands): fixed, or pinned (3EI/h³ in its base story only;
 * the stories above take 12EI/h³, or less with a slab `restraint` below 1).
 */
export type ColumnFixity = 'fixed' | 'pinned'

/** A column: two shear-type elements along its local axes; torsional stiffness ignored. */
export interface Column {
  readonly id: ColumnId
  readonly name: string
  readonly at: Point
  /** Local x axis angle, counter-clockwise from global X, rad. */
  readonly angle: number
  /** Second moment about local x (resists translation along local y), m⁴. */
  readonly Ix: number
  /** Second moment about local y (resists translation along local x), m⁴. */
  readonly Iy: number
  readonly material: MaterialId
  readonly fixity: ColumnFixity
  /** Effective stiffness factor on I, - (default STIFFNESS_FACTOR_DEFAULTS.column). */
  readonly stiffnessFactor?: number
  /**
   * Rotational restraint the floor slabs give the column's ends, as the fraction r of full fixity
   * (0 < r <= 1, default 1 = fully fixed): a story restrained this way at both ends has
   * k = r · 12EI/h³ (a flat slab that does not fully fix the column). docs/mechanics.md §5.
   */
  readonly restraint?: number
  readonly base: BaseRef
  readonly top: FloorId
}

/** Plan grid: named lines at given offsets (letters along one axis, numbers along the other). */
export interface Grid {
  /** Lines of constant x (labelled 1, 2, 3 ... by default), m. */
  readonly x: readonly { readonly label: string; readonly at: number }[]
  /** Lines of constant y (labelled A, B, C ... by default), m. */
  readonly y: readonly { readonly label: string; readonly at: number }[]
}

/** Design spectrum definitions; ordinates are spectral accelerations in units of g. */
export type SpectrumSpec =
  | {
      /** Two-parameter shape of ASCE/SEI 7-16 11.4.6. */
      readonly kind: 'asce7'
      /** S_DS, g */
      readonly SDS: number
      /** S_D1, g */
      readonly SD1: number
      /** long-period transition T_L, s */
      readonly TL: number
      /** Optional mapped S_1, g: enables the ELF minimum 0.5 S1/(R/Ie) when S1 >= 0.6 g (12.8.1.1). */
      readonly S1?: number
    }
  | {
      /** EN 1998-1 3.2.2.2 horizontal elastic spectrum, Type 1 recommended parameters. */
      readonly kind: 'en1998-1'
      /** design ground acceleration a_g = gamma_I a_gR, in g */
      readonly ag: number
      readonly ground: 'A' | 'B' | 'C' | 'D' | 'E'
    }
  | {
      /** Tabulated (period s, Sa g) pairs, ascending period; linear between, flat beyond the ends. */
      readonly kind: 'table'
      readonly points: readonly (readonly [number, number])[]
    }

/** Ground motion for time history: imported record or generated demo motion. */
export type GroundMotionSpec =
  | {
      readonly kind: 'record'
      readonly name: string
      /** s */
      readonly dt: number
      /** accelerations, m/s² */
      readonly ax: readonly number[]
      readonly ay: readonly number[]
    }
  | {
      /** Deterministic invented motion: windowed sum of sines with a seed, for demonstrations only. */
      readonly kind: 'generated'
      /** peak ground acceleration, g */
      readonly pga: number
      /** s */
      readonly duration: number
      readonly seed: number
      /** share of the X motion applied in Y, - */
      readonly yFactor: number
    }

/** A user-defined or built-in torsion criterion set (thresholds are data). */
export interface CriterionSetSpec {
  readonly id: string
  readonly name: string
  /** Document, edition and clause this set follows. */
  readonly source: string
  /** Max/avg story drift ratio above which the story is torsionally irregular (e.g. 1.2). */
  readonly irregularRatio?: number
  /** Ratio above which it is extremely irregular (e.g. 1.4). */
  readonly extremeRatio?: number
  /**
   * What the two ratios above are taken on: story drifts (default) or total floor displacements at
   * the extreme points (e.g. a displacement-based sensitivity ratio).
   */
  readonly ratioQuantity?: 'drift' | 'displacement'
  /** Amplification: Ax = (delta_max / (divisor * delta_avg))^power clamped to [min, max], on displacements. */
  readonly amplification?: {
    readonly divisor: number
    readonly power: number
    readonly min: number
    readonly max: number
  }
  /** e0 <= factor * r, per floor and direction. */
  readonly eccentricityToRadius?: number
  /** r >= factor * l_s, per floor and direction. */
  readonly radiusToGyration?: number
  /** Accidental eccentricity fraction of the perpendicular plan extent this set prescribes. */
  readonly accidentalEccentricity?: number
}

/** Analysis settings saved with the project. */
export interface AnalysisSettings {
  /** Id of the criterion set used for pass/fail (built-in or one of `criterionSets`). */
  readonly criterionSet: string
  /** Extra user criterion sets. */
  readonly criterionSets?: readonly CriterionSetSpec[]
  /** Accidental eccentricity as a fraction of the perpendicular plan extent, - (default 0.05). */
  readonly accidentalEccentricity: number
  /** Modal damping ratio, - (default 0.05). */
  readonly damping: number
  readonly spectrum: SpectrumSpec
  /** How the two horizontal directions are combined in response spectrum analysis. */
  readonly directionCombination: 'srss' | '100-30'
  /** Optional: scale spectrum results so the base shear equals this value in each direction, N. */
  readonly baseShearTarget?: number
  /**
   * Optional: which modes the response spectrum combines (absent: 'full-mass').
   * 'full-mass': every mode with T >= 0.05 s plus one residual rigid mode for the rest of the mass;
   * 'ninety-percent': the lowest modes until 90% of the mass in X and in Y, no residual.
   * @see ASCE/SEI 7-16 12.9.1.1 (METHODS.md §1); docs/dynamics.md §8
   */
  readonly spectrumModes?: SpectrumModeRule
  readonly groundMotion?: GroundMotionSpec
  /** Optional seismic system per direction and design-level factors (absent: elastic numbers, R = 1). */
  readonly seismicDesign?: SeismicDesign
  /** Flag torsional flexibility above this ratio of torsional to translational period, - (default 1.0). */
  readonly torsionalFlexibilityLimit?: number
}

/** Mode rule of the response spectrum (see `AnalysisSettings.spectrumModes`). */
export type SpectrumModeRule = 'full-mass' | 'ninety-percent'

/** A whole project (the document). */
export interface Project {
  readonly format: 'gyre-project'
  /** File format version; see schema.ts CURRENT_VERSION and migrations.ts. */
  readonly version: number
  readonly name: string
  readonly notes?: string
  /** Bottom to top. */
  readonly floors: readonly Floor[]
  readonly materials: Readonly<Record<string, Material>>
  readonly slabs: Readonly<Record<string, Slab>>
  readonly lineMasses: Readonly<Record<string, LineMass>>
  readonly pointMasses: Readonly<Record<string, PointMass>>
  readonly walls: Readonly<Record<string, Wall>>
  readonly frameLines: Readonly<Record<string, FrameLine>>
  readonly columns: Readonly<Record<string, Column>>
  readonly grid?: Grid
  readonly settings: AnalysisSettings
}

export type { ColumnId, FloorId, FrameLineId, LineMassId, MaterialId, PointMassId, SlabId, WallId }
