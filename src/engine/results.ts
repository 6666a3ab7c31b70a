/**
 * Result types of the engine: plain, serializable objects (Float64Array allowed) that a Web Worker can
 * post. All values SI (m, kg, N, s, rad) unless a name says otherwise. Displacement vectors are in the
 * global DOF order [u_x1, u_y1, theta_1, u_x2, ...] at the plan origin O.
 *
 * Ownership while the engine is being built: the "structure/modal/centres" sections belong to the
 * mechanics work, the "torsion/spectrum/time history/criteria" sections to the loads work.
 */
import type { Point, SpectrumModeRule, SpectrumSpec } from '@/model'
import type { DesignResult } from './design/types'

// ---------------------------------------------------------------- issues

export type Severity = 'error' | 'warning' | 'info'

/** Machine-readable problem codes; the message says the same in words. */
export type IssueCode =
  | 'invalid-model'
  | 'mechanism'
  | 'ill-conditioned'
  | 'no-mass'
  | 'no-floors'
  | 'zero-length'
  | 'degenerate-slab'
  | 'element-outside-floors'
  | 'unsupported-element'
  | 'eigen-incomplete'
  | 'criterion-unknown'
  | 'not-applicable'
  /** info: the floor-load centre of rigidity depends on its definition (mixed or discontinuous systems) */
  | 'centre-definition'
  | 'incomplete'

/** A user-model problem (never an exception). `refs` are ids to highlight (elements, floors). */
export interface Issue {
  readonly code: IssueCode
  readonly severity: Severity
  readonly message: string
  readonly refs: readonly string[]
  /** Floor id the issue is about, when there is one. */
  readonly floor?: string
  /** For mechanisms: the free direction ('x', 'y', 'rotation' or a plan direction in words). */
  readonly direction?: string
}

// ---------------------------------------------------------------- structure (mechanics)

/** Mass and geometry of one floor (rigid diaphragm). */
export interface FloorProps {
  readonly id: string
  readonly name: string
  /** 0-based index, bottom first (floor number = index + 1). */
  readonly index: number
  /** z of the floor, m. */
  readonly elevation: number
  /** height of the story below, m. */
  readonly height: number
  /** kg */
  readonly mass: number
  /** m */
  readonly centreOfMass: Point
  /** Polar mass moment about the centre of mass J, kg·m². */
  readonly polarInertia: number
  /** l_s = sqrt(J/m), m. */
  readonly radiusOfGyration: number
  /** Net slab area (outlines minus openings), m². */
  readonly slabArea: number
  /** Bounding box of the outer outline vertices, m. */
  readonly extent: { readonly minX: number; readonly maxX: number; readonly minY: number; readonly maxY: number }
  /** Vertices of the outer slab outlines (not openings): the extreme points for drift checks. */
  readonly extremePoints: readonly Point[]
}

/** One lateral element as assembled: its map rows and lateral stiffness over the floors it connects. */
export interface AssembledElement {
  readonly id: string
  readonly kind: 'wall' | 'frameLine' | 'columnX' | 'columnY' | 'wallGroup' | 'wallGroupTorsion'
  /** Floor indices (0-based) the element connects, bottom first; a floor it stands on comes first. */
  readonly floors: readonly number[]
  /** Row a = [d_x, d_y, x*d_y - y*d_x] (same for every floor). */
  readonly map: readonly [number, number, number]
  /** Whether the element's lowest entry in `floors` is its support floor (moves with that floor). */
  readonly standsOnFloor: boolean
  /** Lateral stiffness over `floors`, row-major n_e x n_e, N/m. */
  readonly stiffness: Float64Array
  /** True for shear-type (tridiagonal story) elements: frame lines and columns. */
  readonly isShearType: boolean
  /** Model records the element stands for when its id is not one (the walls of a wall group). */
  readonly refs?: readonly string[]
}

/** Assembled global matrices and floor data. */
export interface Structure {
  readonly floorCount: number
  readonly dofCount: number
  readonly floors: readonly FloorProps[]
  /** Global stiffness K, row-major dofCount², N/m, N, N·m/rad. Symmetric by construction. */
  readonly stiffness: Float64Array
  /** Global mass M, row-major dofCount², kg, kg·m, kg·m². Block diagonal 3x3 per floor. */
  readonly mass: Float64Array
  readonly elements: readonly AssembledElement[]
  /** True when every element is shear type (story centres of stiffness are then defined). */
  readonly allShearType: boolean
  /** Overall centre of mass of the building (X_c, Y_c), m. */
  readonly buildingCentreOfMass: Point
  readonly totalMass: number
}

// ---------------------------------------------------------------- modal (mechanics)

/** Plain-words class of a mode. */
export type ModeCharacter = 'x' | 'y' | 'torsion' | 'coupled'

/** Modal analysis results; per-mode arrays have length `count`. */
export interface ModalResult {
  readonly count: number
  readonly dofCount: number
  /** omega, rad/s, ascending. */
  readonly angularFrequencies: Float64Array
  /** s */
  readonly periods: Float64Array
  /** Hz */
  readonly frequenciesHz: Float64Array
  /** Mass-normalized shapes at O, mode-major: shapes[m * dofCount + i]; sign: largest |component| positive. */
  readonly shapes: Float64Array
  /** Participation factors Gamma = phi' M r for r = X, Y and the rotation about the building CM. */
  readonly participation: { readonly x: Float64Array; readonly y: Float64Array; readonly rz: Float64Array }
  /** (phi' M r)² / (r' M r), -. */
  readonly effectiveMassRatio: { readonly x: Float64Array; readonly y: Float64Array; readonly rz: Float64Array }
  readonly cumulativeMassRatio: { readonly x: Float64Array; readonly y: Float64Array; readonly rz: Float64Array }
  /** Share of kinetic energy in rotation about each floor's centre of mass, 0..1. */
  readonly torsionShare: Float64Array
  readonly character: readonly ModeCharacter[]
  /** Which solver produced the modes and whether all were found. */
  readonly solver: string
  readonly complete: boolean
  /** Problems met while solving (e.g. a floor without rotary mass: no modes); absent when none. */
  readonly issues?: readonly Issue[]
}

// ---------------------------------------------------------------- centres (mechanics)

/** Centres and torsional properties of one floor. */
export interface FloorCentres {
  readonly floorId: string
  readonly centreOfMass: Point
  /** Floor-load definition: a force on this floor alone through this point turns it by zero. */
  readonly centreOfRigidity: Point
  /** Classic story centre of stiffness, only when all elements are shear type. */
  readonly storyCentreOfStiffness: Point | null
  /** CR minus CM, m. */
  readonly eccentricity: { readonly x: number; readonly y: number }
  /** K_theta,CR = 1/F[theta,theta], N·m/rad. */
  readonly torsionalStiffness: number
  /** Diagonal terms of inv(F_j): K[u_x,u_x], K[u_y,u_y], N/m. */
  readonly lateralStiffness: { readonly x: number; readonly y: number }
  /** r_x = sqrt(K_theta / K_yy), r_y = sqrt(K_theta / K_xx), m. */
  readonly torsionalRadius: { readonly x: number; readonly y: number }
  /** l_s = sqrt(J/m), m. */
  readonly radiusOfGyration: number
  /** True when inclined elements couple x and y noticeably (radii then use diagonal terms only). */
  readonly hasXYCoupling: boolean
}

// ---------------------------------------------------------------- criteria (loads)

/**
 * 'not-checked': the rule applies but its number could not be computed (no movement at the extreme
 * points, a floor without plan extent across the load, a missing period); never counted as a pass.
 */
export type Verdict = 'pass' | 'fail' | 'not-applicable' | 'not-checked'

/** One check row of a criterion set. */
export interface CheckRow {
  readonly floorId: string
  /** Load case id or analysis direction ('x' / 'y'). */
  readonly caseId: string
  /** What is checked, in words, e.g. 'max/avg story drift'. */
  readonly quantity: string
  readonly value: number
  readonly limit: number
  readonly verdict: Verdict
  /** Clause of the source this row follows. */
  readonly clause: string
  /** Short classification, e.g. 'Type 1a', 'regular', 'torsionally flexible'. */
  readonly label: string
  /** How value and limit compare for a pass: '<=' (value at most limit) or '>='; absent: informative. */
  readonly comparison?: '<=' | '>='
}

/** A criterion set evaluated on a model. Carries the caution. */
export interface CriterionEvaluation {
  readonly setId: string
  readonly setName: string
  readonly source: string
  readonly rows: readonly CheckRow[]
  readonly overall: Verdict
  readonly caution: string
  /** Assumptions and limits of the set as implemented (shown with the rows). */
  readonly notes?: readonly string[]
  /**
   * Which conditions of the clause the rows check and which they do not, where the set does not check
   * all of them (a pass then holds for the checked conditions only). Absent: the rows are the whole rule.
   */
  readonly scope?: CriterionScope
}

/** Conditions of a code clause that a criterion set checks, and those it leaves to the engineer. */
export interface CriterionScope {
  readonly checked: readonly string[]
  readonly notChecked: readonly string[]
}

// ---------------------------------------------------------------- static torsion (loads)

export type StaticCaseId = 'X+e' | 'X-e' | 'Y+e' | 'Y-e'

/** Drift and displacement ratios of one story in one static case. */
export interface StoryTorsionRow {
  readonly floorId: string
  /** 0-based story index (story i lies below floor i). */
  readonly index: number
  /** Largest signed drift along the load at the extreme points, m. */
  readonly driftMax: number
  /** Mean of the drifts at the two ends across the load, m. */
  readonly driftAvg: number
  readonly driftRatio: number
  /** Same for total floor displacements (used by amplification rules), m. */
  readonly displacementMax: number
  readonly displacementAvg: number
  readonly displacementRatio: number
  /** Amplification of accidental torsion where the criterion set defines one, else null. */
  readonly amplification: number | null
  /** Largest drift divided by the story height, -. */
  readonly driftIndex: number
}

export interface StaticLoadCase {
  readonly id: StaticCaseId
  readonly direction: 'x' | 'y'
  readonly eccentricitySign: 1 | -1
  /** Floor forces along the load direction, N. */
  readonly forces: Float64Array
  /** Load point of each floor (CM moved by the accidental eccentricity), m. */
  readonly loadPoints: readonly Point[]
  /** Global displacement vector (3N) at O, m and rad. */
  readonly displacements: Float64Array
  readonly stories: readonly StoryTorsionRow[]
}

export interface StaticTorsionResult {
  /** Period used for the vertical distribution in each direction, s. */
  readonly periodUsed: { readonly x: number; readonly y: number }
  /** Exponent k of the vertical distribution in each direction. */
  readonly exponent: { readonly x: number; readonly y: number }
  /** Base shear applied in each direction, N (ratios do not depend on it). */
  readonly baseShear: { readonly x: number; readonly y: number }
  readonly eccentricityFraction: number
  /** Where the eccentricity fraction came from: the criterion set's own value or the settings. */
  readonly eccentricitySource?: 'criterion-set' | 'settings'
  /** Base-shear coefficient V / W in each direction, - (Sa(T) in g with R = 1; the design Cs or Sd(T1) with settings.seismicDesign). */
  readonly baseShearCoefficient?: { readonly x: number; readonly y: number }
  readonly cases: readonly StaticLoadCase[]
  readonly criterion: CriterionEvaluation
}

// ---------------------------------------------------------------- response spectrum (loads)

/** Peak responses from one or both directions, combined over modes. */
export interface SpectrumFloorResponse {
  readonly floorId: string
  /** Peak displacement at the CM along x and y, and rotation, m / rad (CQC). */
  readonly displacementCqc: { readonly x: number; readonly y: number; readonly rotation: number }
  readonly displacementSrss: { readonly x: number; readonly y: number; readonly rotation: number }
  /** Largest story drift at the extreme points (formed per mode, then combined), m. */
  readonly driftMaxCqc: { readonly x: number; readonly y: number }
  readonly driftMaxSrss: { readonly x: number; readonly y: number }
  /** Story shear below this floor, N (CQC). */
  readonly storyShearCqc: { readonly x: number; readonly y: number }
}

export interface SpectrumResult {
  readonly spectrum: SpectrumSpec
  readonly damping: number
  /** Spectral acceleration per mode, g. */
  readonly modalSa: Float64Array
  /** Base shear per excitation direction, CQC and SRSS, N. */
  readonly baseShear: {
    readonly x: { readonly cqc: number; readonly srss: number }
    readonly y: { readonly cqc: number; readonly srss: number }
  }
  /** Scale factor applied to all results (1 unless base-shear scaling was asked for). */
  readonly scale: number
  /** Scale factor per excitation direction (`scale` is the larger of the two). */
  readonly scaleByDirection?: { readonly x: number; readonly y: number }
  /** Number of modes combined. */
  readonly modeCount?: number
  /** CQC correlation matrix, row-major modeCount². */
  readonly correlation?: Float64Array
  /** Signed modal base shear along the excitation direction, per mode, N (before scaling). */
  readonly modalBaseShear?: { readonly x: Float64Array; readonly y: Float64Array }
  /** Responses to excitation along X, along Y, and the two combined by the chosen direction rule. */
  readonly excitationX: readonly SpectrumFloorResponse[]
  readonly excitationY: readonly SpectrumFloorResponse[]
  readonly combined: readonly SpectrumFloorResponse[]
  readonly directionCombination: 'srss' | '100-30'
  /** Mode rule used (settings.spectrumModes; absent in older results: all modes given). */
  readonly modeRule?: SpectrumModeRule
  /** 'modal-result': the analysis's modes; 'all-modes': every mode, solved again for the spectrum. */
  readonly modeSource?: 'modal-result' | 'all-modes'
  /** Periods of the modes combined as modes of their own (the residual not included), s. */
  readonly modePeriods?: Float64Array
  /**
   * The residual rigid mode ('full-mass' rule): its period (0.05 s), ordinate and effective mass
   * ratio per excitation direction; null when the rule has none. `modalSa`, `modalBaseShear` and
   * `correlation` then have one more entry (the residual, last) than `modeCount`.
   */
  readonly residual?: {
    readonly periodS: number
    readonly saG: number
    readonly massRatio: { readonly x: number; readonly y: number }
  } | null
  /** Effective mass ratio of all combined modes (residual included) per excitation direction, -. */
  readonly massRatio?: { readonly x: number; readonly y: number }
  /** Spectrum results with the accidental torsion envelope added; absent when the fraction is 0. */
  readonly accidentalTorsion?: SpectrumAccidentalTorsion
}

/** One storey's drift ratio from spectrum peaks with accidental torsion. */
export interface SpectrumTorsionStory {
  readonly floorId: string
  /** Largest enveloped drift (peak + |torsion|) over the extreme points along the excitation, m. */
  readonly driftMax: number
  /** Mean of the two ends' drifts (peak + signed torsion) for the governing sign of e, m. */
  readonly driftAvg: number
  /** Largest drift / driftAvg for the governing sign of e (capped at 1000), -. */
  readonly driftRatio: number
  /** driftMax / storey height, -. */
  readonly driftIndex: number
  /** Sign of e (+1: +e case torques, -1: -e) that gives the larger ratio. */
  readonly governingSign: 1 | -1
}

/** Accidental torsion on spectrum results: static storey torques, envelope of +e and -e. */
export interface SpectrumAccidentalTorsion {
  /** Fraction of the perpendicular plan extent, -. */
  readonly eccentricityFraction: number
  /** Floor forces: the ELF vertical distribution w z^k scaled to the spectrum's CQC base shear. */
  readonly forcePattern: 'elf-scaled-to-spectrum'
  readonly exponent: { readonly x: number; readonly y: number }
  /** Floor forces per direction, N. */
  readonly forces: { readonly x: Float64Array; readonly y: Float64Array }
  /** Floor torques of the +e case per direction, N·m (the -e case is the negative). */
  readonly torques: { readonly x: Float64Array; readonly y: Float64Array }
  /** Spectrum peaks + |static torsion response| (story shears unchanged). */
  readonly excitationX: readonly SpectrumFloorResponse[]
  readonly excitationY: readonly SpectrumFloorResponse[]
  readonly combined: readonly SpectrumFloorResponse[]
  /** Drift ratios per storey for excitation along X (drifts along x) and along Y. */
  readonly stories: {
    readonly x: readonly SpectrumTorsionStory[]
    readonly y: readonly SpectrumTorsionStory[]
  }
}

// ---------------------------------------------------------------- element forces

/** One load case of the element forces. */
export interface ElementForceCase {
  /** 'X+e', 'X-e', 'Y+e', 'Y-e', 'spectrum-x', 'spectrum-y', 'spectrum', and the same spectrum ids
   * with '+torsion' when the accidental torsion envelope is added. */
  readonly id: string
  /** Words for screens and reports. */
  readonly label: string
  readonly kind: 'static' | 'spectrum'
  /** Direction of the load the shares refer to; 'both': the element's own main axis. */
  readonly direction: 'x' | 'y' | 'both'
  readonly accidentalTorsion: boolean
}

/** Storey shears and overturning moments of one assembled element, per case (`cases` order). */
export interface ElementForceRow {
  /** Id of the model element (a column gives two rows, kinds 'columnX' and 'columnY'). */
  readonly elementId: string
  /** For a wall group's principal stack: the ids of the walls that form the group. */
  readonly refs?: readonly string[]
  readonly kind: AssembledElement['kind']
  /** Unit direction d of the element's line. */
  readonly direction: { readonly x: number; readonly y: number }
  /** The storeys the element occupies, named by the floor above each, bottom first. */
  readonly floorIds: readonly string[]
  /** Storey shear along d per case, N (signed for static cases, peak >= 0 for spectrum cases). */
  readonly shear: readonly Float64Array[]
  /** Share of the storey shear along the load per case, -. */
  readonly share: readonly Float64Array[]
  /** Overturning moment at the bottom of each storey per case, N·m. */
  readonly overturningMoment: readonly Float64Array[]
}

/** Where the storey shear goes, element by element. Carries the caution. */
export interface ElementForcesResult {
  readonly cases: readonly ElementForceCase[]
  readonly elements: readonly ElementForceRow[]
  readonly caution: string
}

// ---------------------------------------------------------------- time history (loads)

export interface TimeHistoryResult {
  /** s */
  readonly dt: number
  readonly stepCount: number
  readonly damping: number
  /** Displacement history, step-major: u[s * dofCount + i], at O. */
  readonly displacements: Float64Array
  readonly dofCount: number
  /** Peak |u_x|, |u_y| at each floor's CM and |theta|, m / rad. */
  readonly peaks: readonly {
    readonly floorId: string
    readonly x: number
    readonly y: number
    readonly rotation: number
  }[]
  readonly groundMotionName: string
  /** True for the generated demo motion (invented, not a recorded earthquake). */
  readonly synthetic?: boolean
  /** Integration step of the ground record, s (the stored series may be decimated). */
  readonly integrationDt?: number
  /** Every `outputStride`-th integration step is stored. */
  readonly outputStride?: number
  /** Ground acceleration at the stored steps, m/s². */
  readonly groundAcceleration?: { readonly x: Float64Array; readonly y: Float64Array }
  /** Peak |ground acceleration| per direction, m/s². */
  readonly peakGroundAcceleration?: { readonly x: number; readonly y: number }
}

// ---------------------------------------------------------------- whole analysis

/**
 * 'ok': every requested section computed. 'incomplete': the structure was analysed but modes, base
 * shears or verdicts are missing (an 'incomplete' issue says which and why). 'mechanism', 'invalid':
 * see docs/results-format.md.
 */
export type AnalysisStatus = 'ok' | 'incomplete' | 'invalid' | 'mechanism'

/** Options of `analyzeProject`. */
export interface AnalysisOptions {
  /** Run the response spectrum analysis (default true). */
  readonly spectrum?: boolean
  /** Run the time history (default false: it is the heaviest part). */
  readonly timeHistory?: boolean
  /** Criterion set id overriding the project's settings. */
  readonly criterionSet?: string
}

/** Everything one analysis run produces. Sections are null when they could not be computed. */
export interface AnalysisResult {
  readonly status: AnalysisStatus
  readonly issues: readonly Issue[]
  readonly projectName: string
  readonly floors: readonly FloorProps[]
  readonly totalMass: number
  readonly buildingCentreOfMass: Point | null
  readonly modes: ModalResult | null
  readonly centres: readonly FloorCentres[] | null
  readonly torsion: StaticTorsionResult | null
  readonly spectrum: SpectrumResult | null
  readonly timeHistory: TimeHistoryResult | null
  /** Criterion set evaluation of plan regularity (eccentricity / radius rules), if the set has any. */
  readonly regularity: CriterionEvaluation | null
  /** Element storey shears and overturning moments (static cases and spectrum); absent if not run. */
  readonly elementForces?: ElementForcesResult | null
  /** Design-level numbers (ELF, design drifts, ...) when settings.seismicDesign is given, else null. */
  readonly design?: DesignResult | null
  /** Always present: results are preliminary. */
  readonly caution: string
  /** Wall-clock milliseconds per stage (informative). */
  readonly timings: Readonly<Record<string, number>>
}
