/**
 * Result types of the design-level numbers (ELF base shear, design drifts and limits, stability
 * coefficient, amplified accidental torsion, spectrum scaling, torsional flexibility and soft-storey
 * checks). Plain, serializable; SI units unless a name says otherwise.
 * @see docs/results-format.md "design"
 */
import type { StaticCaseId, Verdict } from '../results'

/** System factors used in one direction (null where the code does not use the factor). */
export interface DesignFactors {
  readonly preset?: string
  readonly R: number | null
  readonly Cd: number | null
  readonly Omega0: number | null
  readonly Ie: number | null
  readonly q: number | null
}

/** ELF base shear of one direction and how it was obtained. */
export interface ElfDirection {
  readonly direction: 'x' | 'y'
  /** Period of the mode with the largest effective mass along the direction, s (0: none). */
  readonly modalPeriod: number
  /** ASCE: Ta = Ct hn^x, s; EN: null. */
  readonly approximatePeriod: number | null
  /** ASCE: Cu·Ta, s; EN: null. */
  readonly periodCap: number | null
  readonly upperLimitCoefficient: number | null
  /** Period used for the base shear and the vertical distribution, s. */
  readonly periodUsed: number
  /** Why this period (modal, capped at Cu·Ta, ...), in words with the clause. */
  readonly periodReason: string
  /** ASCE: Cs, -; EN: Sd(T1) in g. */
  readonly coefficient: number
  /** ASCE: the rule that governs Cs; EN: null. */
  readonly coefficientGovernedBy: string | null
  /** EN: correction factor lambda; ASCE: null. */
  readonly lambda: number | null
  /** Exponent k of the vertical distribution (EN: 1, heights times masses). */
  readonly exponent: number
  /** Seismic weight W = total mass · g, N. */
  readonly seismicWeight: number
  /** Design base shear V (ASCE) or Fb (EN), N. */
  readonly baseShear: number
  /** Floor forces, bottom first, N. */
  readonly forces: Float64Array
  readonly factors: DesignFactors
}

/** Design drift of one story in one static case, with its limit. */
export interface DesignDriftRow {
  readonly floorId: string
  readonly caseId: StaticCaseId
  /** Elastic drift at the extreme points under the design ELF forces (delta_xe or d_e), m. */
  readonly elasticDrift: number
  /** Design drift: Cd·delta_e/Ie (ASCE 12.8-15) or q·d_e (EN 4.23), m. */
  readonly designDrift: number
  /** Story height, m. */
  readonly height: number
  /** Design drift / height, -. */
  readonly driftIndex: number
  /** ASCE: allowable drift Delta_a; EN: damage limitation limit alpha·h / nu (compared to d_r), m. */
  readonly limit: number
  readonly verdict: Verdict
  readonly clause: string
}

/** Stability coefficient of one story in one direction (largest over the two eccentric cases). */
export interface StabilityRow {
  readonly floorId: string
  readonly direction: 'x' | 'y'
  /** Gravity load on and above the story, N. */
  readonly gravityLoad: number
  /** Story shear, N. */
  readonly storyShear: number
  /** Design story drift at the centre of mass (Delta or d_r), m. */
  readonly designDrift: number
  readonly height: number
  readonly theta: number
  /** ASCE theta_max or EN 0.3, -. */
  readonly thetaMax: number
  /** EN: 1/(1 - theta) when 0.1 < theta <= 0.2 (else 1); ASCE: 1/(1 - theta) shown when theta > 0.1. */
  readonly amplifier: number
  readonly verdict: Verdict
  readonly note: string
  readonly clause: string
}

/** Ax iteration of one static case. */
export interface AmplifiedCase {
  readonly caseId: StaticCaseId
  readonly iterations: number
  readonly converged: boolean
  /** Ax per floor from the displacements with Ax = 1 (first pass, the clause's literal reading). */
  readonly firstPass: Float64Array
  /** Ax per floor at convergence (or after the last iteration). */
  readonly final: Float64Array
  /** Largest max/avg drift ratio of the case after amplification. */
  readonly maxDriftRatio: number
  /** Largest design drift of the case with the amplified torsion, m. */
  readonly maxDesignDrift: number
}

/** Scaling of the spectrum results to the ELF base shear in one direction. */
export interface SpectrumScalingDirection {
  readonly direction: 'x' | 'y'
  /** Elastic CQC base shear of the spectrum (before any baseShearTarget scaling), N. */
  readonly elasticBaseShear: number
  /** Vt = elastic · Ie / R, N. */
  readonly modalBaseShear: number
  readonly elfBaseShear: number
  /** Force scale V / Vt when Vt < V, else 1 (up only). */
  readonly forceScale: number
  /** Drift scale Cs W / Vt when Vt < Cs W and the 12.8-6 minimum governs Cs, else 1. */
  readonly driftScale: number
  readonly reason: string
}

/** Spectrum design drift of one story (X and Y excitation), m. */
export interface SpectrumDesignDriftRow {
  readonly floorId: string
  /** Cd/Ie · driftScale · Ie/R · elastic CQC drift at the extreme points, m. */
  readonly x: number
  readonly y: number
  readonly limit: number
  readonly verdict: Verdict
}

export interface SpectrumScaling {
  readonly applicable: boolean
  readonly note: string
  readonly x: SpectrumScalingDirection | null
  readonly y: SpectrumScalingDirection | null
  readonly drifts: readonly SpectrumDesignDriftRow[]
}

/** Torsional flexibility: first torsional vs first translational period. */
export interface TorsionalFlexibility {
  /** 1-based mode numbers; null when no such mode. */
  readonly firstTorsionalMode: number | null
  readonly torsionalPeriod: number | null
  readonly translationalMode: { readonly x: number | null; readonly y: number | null }
  readonly translationalPeriod: { readonly x: number | null; readonly y: number | null }
  /** T_torsion / T_translation per direction, - (null when a mode is missing). */
  readonly ratio: { readonly x: number | null; readonly y: number | null }
  readonly limit: number
  readonly firstModeTorsional: boolean
  readonly flagged: boolean
}

/** True story stiffness and the soft-story checks of one story in one direction. */
export interface StoryStiffnessRow {
  readonly floorId: string
  readonly direction: 'x' | 'y'
  readonly storyShear: number
  /** Drift at the centre of mass under the ELF pattern applied at the CM, m. */
  readonly driftAtCentreOfMass: number
  /** Story shear / drift, N/m (null when the drift vanishes or reverses). */
  readonly stiffness: number | null
  /** k_i / k_(i+1), - (null at the top). */
  readonly ratioToAbove: number | null
  /** k_i / mean of the three stories above, - (null with fewer than three above). */
  readonly ratioToAverageAbove: number | null
  /** 'none', 'Type 1a' (soft story) or 'Type 1b' (extreme soft story). */
  readonly label: 'none' | 'Type 1a' | 'Type 1b'
}

/** One consequence of an irregularity by seismic design category (data row). */
export interface IrregularityConsequence {
  readonly irregularity: string
  readonly clause: string
  readonly categories: readonly string[]
  readonly consequence: string
  /** Whether the irregularity was found in this model. */
  readonly found: boolean
  /** true/false when a design category is set, null when not. */
  readonly applies: boolean | null
  readonly source: 'from memory'
}

/** Everything design-level; present when settings.seismicDesign is given and matches the spectrum. */
export interface DesignResult {
  readonly code: 'asce7-16' | 'en1998-1'
  readonly x: ElfDirection
  readonly y: ElfDirection
  /** Gravity load used for P-delta as a multiple of the seismic weight, -. */
  readonly gravityLoadRatio: number
  readonly drifts: readonly DesignDriftRow[]
  readonly driftRule: string
  readonly stability: readonly StabilityRow[]
  readonly amplified: readonly AmplifiedCase[] | null
  readonly spectrumScaling: SpectrumScaling | null
  readonly torsionalFlexibility: TorsionalFlexibility | null
  readonly storyStiffness: readonly StoryStiffnessRow[]
  readonly consequences: readonly IrregularityConsequence[]
  readonly notes: readonly string[]
  readonly caution: string
}
