/**
 * Seismic system per direction and the design-level settings that turn elastic responses into design
 * numbers: ASCE/SEI 7-16 (R, Cd, Omega0, Ie, risk category, Ct and x of the approximate period) or
 * EN 1998-1 (q, importance class, nu of the damage limitation check). Optional in the project
 * settings (`settings.seismicDesign`); without it the absolute numbers stay elastic (R = 1) and the
 * engine says so. The presets are a short list of common systems with values recalled from the
 * standards' tables "from memory" until someone checks them; free entry is always possible.
 * @see docs/file-format.md "settings.seismicDesign"; ASCE/SEI 7-16 Tables 12.2-1, 12.8-2, 1.5-2;
 *   EN 1998-1:2004 5.2.2.2, 4.4.3.2
 */

export type RiskCategory = 'I' | 'II' | 'III' | 'IV'
export type SeismicDesignCategory = 'A' | 'B' | 'C' | 'D' | 'E' | 'F'
/** Row of ASCE/SEI 7-16 Table 12.12-1 used for the allowable story drift. */
export type Asce7DriftRow = 'other' | 'low-rise' | 'masonry-cantilever' | 'masonry-other'
/** EN 1998-1 4.4.3.2(1): kind of non-structural elements (0.005 h, 0.0075 h, 0.010 h). */
export type En1998NonStructural = 'brittle' | 'ductile' | 'none'

/** ASCE/SEI 7-16 seismic force-resisting system along one direction. */
export interface Asce7System {
  /** Preset the values came from (display only; the numbers below govern). */
  readonly preset?: string
  /** Response modification coefficient R, - (Table 12.2-1). */
  readonly R: number
  /** Deflection amplification factor Cd, - (Table 12.2-1). */
  readonly Cd: number
  /** Overstrength factor Omega0, - (Table 12.2-1; reported, not used by the checks here). */
  readonly Omega0: number
  /** Approximate-period coefficient Ct for hn in metres (Table 12.8-2, SI column). */
  readonly Ct: number
  /** Approximate-period exponent x, - (Table 12.8-2). */
  readonly x: number
}

/** ASCE/SEI 7-16 design settings. */
export interface Asce7SeismicDesign {
  readonly code: 'asce7-16'
  readonly riskCategory: RiskCategory
  /** Seismic importance factor Ie, - (default from the risk category, Table 1.5-2: 1.0/1.0/1.25/1.5). */
  readonly Ie?: number
  /** Seismic design category; when given, the consequences of irregularities are marked as applying. */
  readonly designCategory?: SeismicDesignCategory
  /** Table 12.12-1 row (default 'other': "all other structures"). */
  readonly driftRow?: Asce7DriftRow
  /** beta of 12.8.7 (shear demand / capacity) for theta_max, - (default 1.0, the conservative value). */
  readonly stabilityBeta?: number
  readonly systemX: Asce7System
  readonly systemY: Asce7System
  /** Gravity load P for the stability coefficient as a multiple of the seismic weight, - (default 1). */
  readonly gravityLoadRatio?: number
}

/** EN 1998-1 system along one direction. */
export interface En1998System {
  readonly preset?: string
  /** Behaviour factor q, - (3.2.2.5, 5.2.2.2); the displacement behaviour factor q_d is taken = q. */
  readonly q: number
}

/** EN 1998-1 design settings. The spectrum's a_g already includes gamma_I (a_g = gamma_I a_gR). */
export interface En1998SeismicDesign {
  readonly code: 'en1998-1'
  readonly importanceClass: RiskCategory
  /** Reduction factor nu of 4.4.3.2(2), - (default 0.5 for classes I/II, 0.4 for III/IV; from memory). */
  readonly nu?: number
  /** Non-structural elements for the damage limitation limit (default 'brittle': 0.005 h). */
  readonly nonStructural?: En1998NonStructural
  readonly systemX: En1998System
  readonly systemY: En1998System
  /** Gravity load P for the stability coefficient as a multiple of the seismic weight, - (default 1). */
  readonly gravityLoadRatio?: number
}

export type SeismicDesign = Asce7SeismicDesign | En1998SeismicDesign

/** A named preset: system values per code (values "from memory" until checked against the tables). */
export interface SeismicSystemPreset<S> {
  readonly id: string
  readonly name: string
  readonly values: Omit<S, 'preset'>
}

/**
 * Common ASCE/SEI 7-16 systems. R, Omega0, Cd: Table 12.2-1; Ct, x (hn in m): Table 12.8-2.
 * All values from memory (not yet checked against the printed tables).
 */
export const ASCE7_SYSTEM_PRESETS: readonly SeismicSystemPreset<Asce7System>[] = [
  { id: 'special-rc-walls-bearing', name: 'Special reinforced concrete shear walls (bearing wall system)', values: { R: 5, Omega0: 2.5, Cd: 5, Ct: 0.0488, x: 0.75 } },
  { id: 'special-rc-walls-frame', name: 'Special reinforced concrete shear walls (building frame system)', values: { R: 6, Omega0: 2.5, Cd: 5, Ct: 0.0488, x: 0.75 } },
  { id: 'ordinary-rc-walls-bearing', name: 'Ordinary reinforced concrete shear walls (bearing wall system)', values: { R: 4, Omega0: 2.5, Cd: 4, Ct: 0.0488, x: 0.75 } },
  { id: 'special-rc-moment-frame', name: 'Special reinforced concrete moment frames', values: { R: 8, Omega0: 3, Cd: 5.5, Ct: 0.0466, x: 0.9 } },
  { id: 'intermediate-rc-moment-frame', name: 'Intermediate reinforced concrete moment frames', values: { R: 5, Omega0: 3, Cd: 4.5, Ct: 0.0466, x: 0.9 } },
  { id: 'special-steel-moment-frame', name: 'Special steel moment frames', values: { R: 8, Omega0: 3, Cd: 5.5, Ct: 0.0724, x: 0.8 } },
  { id: 'special-steel-cbf', name: 'Special steel concentrically braced frames', values: { R: 6, Omega0: 2, Cd: 5, Ct: 0.0488, x: 0.75 } },
  { id: 'steel-ebf', name: 'Steel eccentrically braced frames', values: { R: 8, Omega0: 2, Cd: 4, Ct: 0.0731, x: 0.75 } },
  { id: 'dual-special-rc-walls-smf', name: 'Dual system: special RC shear walls with special moment frames', values: { R: 7, Omega0: 2.5, Cd: 5.5, Ct: 0.0488, x: 0.75 } },
]

/**
 * Common EN 1998-1 systems (q for DCM unless named; concrete frames with alpha_u/alpha_1 = 1.3,
 * 5.2.2.2 Table 5.1; steel 6.3.2 Table 6.2). All values from memory.
 */
export const EN1998_SYSTEM_PRESETS: readonly SeismicSystemPreset<En1998System>[] = [
  { id: 'concrete-frame-dcm', name: 'Concrete frame system, multi-bay multi-storey (DCM)', values: { q: 3.9 } },
  { id: 'concrete-walls-dcm', name: 'Concrete uncoupled wall system (DCM)', values: { q: 3.0 } },
  { id: 'concrete-torsionally-flexible-dcm', name: 'Concrete torsionally flexible system (DCM)', values: { q: 2.0 } },
  { id: 'steel-moment-frame-dcm', name: 'Steel moment resisting frames (DCM)', values: { q: 4.0 } },
  { id: 'steel-concentric-braces-dcm', name: 'Steel concentrically braced frames (DCM)', values: { q: 4.0 } },
  { id: 'low-dissipative', name: 'Low-dissipative structure (DCL)', values: { q: 1.5 } },
]

/**
 * Seismic importance factor Ie by risk category, Table 1.5-2 (I/II 1.0, III 1.25, IV 1.5; from memory).
 */
export function importanceFactorOf(category: RiskCategory): number {
  return category === 'IV' ? 1.5 : category === 'III' ? 1.25 : 1.0
}

/** EN 1998-1 4.4.3.2(2) recommended nu: 0.5 for importance classes I/II, 0.4 for III/IV (from memory). */
export function damageLimitationNuOf(importanceClass: RiskCategory): number {
  return importanceClass === 'III' || importanceClass === 'IV' ? 0.4 : 0.5
}

/** Default torsional flexibility limit (ratio of the first torsional to translational period). */
export const DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT = 1.0

// ---------------------------------------------------------------- reading from a file

const isRecord = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v)

const shown = (v: unknown): string =>
  typeof v === 'string' ? JSON.stringify(v) : typeof v === 'number' ? String(v) : v === undefined ? 'nothing' : Array.isArray(v) ? 'a list' : typeof v === 'object' ? (v === null ? 'null' : 'an object') : `a ${typeof v}`

/** Messages of `readSeismicDesign`, each starting with the field path. */
export interface SeismicReadMessages {
  readonly errors: string[]
  readonly warnings: string[]
}

/**
 * Read `settings.seismicDesign` from a loaded file. Every problem names the field path; an invalid
 * block gives errors (the caller refuses the file) and never a half-read value.
 */
export function readSeismicDesign(v: unknown, path: string, out: SeismicReadMessages): SeismicDesign | undefined {
  const before = out.errors.length
  const err = (p: string, problem: string): undefined => {
    out.errors.push(`${p}: ${problem}`)
    return undefined
  }
  const fields = (p: string, o: Record<string, unknown>, known: readonly string[]): void => {
    for (const k of Object.keys(o)) if (!known.includes(k)) out.warnings.push(`${p}.${k}: unknown field, ignored`)
  }
  const num = (p: string, x: unknown, lo: number, hi: number, loOpen = true): number | undefined => {
    if (typeof x !== 'number' || !Number.isFinite(x)) return err(p, `must be a finite number, got ${shown(x)}`)
    if (loOpen ? !(x > lo) : !(x >= lo)) return err(p, `must be ${loOpen ? '>' : '>='} ${lo}, got ${x}`)
    if (!(x <= hi)) return err(p, `must be <= ${hi}, got ${x}`)
    return x
  }
  const optNum = (p: string, x: unknown, lo: number, hi: number): number | undefined =>
    x === undefined ? undefined : num(p, x, lo, hi)
  const optNumClosed = (p: string, x: unknown, lo: number, hi: number): number | undefined =>
    x === undefined ? undefined : num(p, x, lo, hi, false)
  const pick = <T extends string>(p: string, x: unknown, options: readonly T[], optional: boolean): T | undefined => {
    if (x === undefined && optional) return undefined
    if (typeof x === 'string' && (options as readonly string[]).includes(x)) return x as T
    return err(p, `must be one of ${options.map((o) => `"${o}"`).join(', ')}, got ${shown(x)}`)
  }
  const preset = (p: string, x: unknown): string | undefined => {
    if (x === undefined) return undefined
    if (typeof x !== 'string' || x.length > 64) return err(p, `must be a short text, got ${shown(x)}`)
    return x
  }
  if (!isRecord(v)) return err(path, `must be an object, got ${shown(v)}`)
  const code = pick(`${path}.code`, v.code, ['asce7-16', 'en1998-1'] as const, false)
  if (code === undefined) return undefined
  const categories = ['I', 'II', 'III', 'IV'] as const
  const gravityLoadRatio = optNum(`${path}.gravityLoadRatio`, v.gravityLoadRatio, 0, 10)
  if (code === 'asce7-16') {
    fields(path, v, ['code', 'riskCategory', 'Ie', 'designCategory', 'driftRow', 'stabilityBeta', 'systemX', 'systemY', 'gravityLoadRatio'])
    const system = (p: string, x: unknown): Asce7System | undefined => {
      if (!isRecord(x)) return err(p, `must be an object with R, Cd, Omega0, Ct, x, got ${shown(x)}`)
      fields(p, x, ['preset', 'R', 'Cd', 'Omega0', 'Ct', 'x'])
      const s = {
        preset: preset(`${p}.preset`, x.preset),
        // Factors below 1 do not occur in ASCE/SEI 7-16 Table 12.2-1 (common practice reading); a tiny
        // R would make Cs = SDS/(R/Ie) overflow, so the range starts at 1 (found by the fuzz test).
        R: num(`${p}.R`, x.R, 1, 20, false),
        Cd: num(`${p}.Cd`, x.Cd, 1, 20, false),
        Omega0: num(`${p}.Omega0`, x.Omega0, 1, 10, false),
        Ct: num(`${p}.Ct`, x.Ct, 0, 1),
        x: num(`${p}.x`, x.x, 0, 2),
      }
      if (s.R === undefined || s.Cd === undefined || s.Omega0 === undefined || s.Ct === undefined || s.x === undefined) return undefined
      const { preset: pr, ...rest } = s
      return { ...(pr !== undefined ? { preset: pr } : {}), ...(rest as Omit<Asce7System, 'preset'>) }
    }
    const riskCategory = pick(`${path}.riskCategory`, v.riskCategory, categories, false)
    // Table 1.5-2 gives Ie of 1.0 to 1.5; below 1 the design drifts Cd δe/Ie would grow without bound.
    const Ie = optNumClosed(`${path}.Ie`, v.Ie, 1, 3)
    const designCategory = pick(`${path}.designCategory`, v.designCategory, ['A', 'B', 'C', 'D', 'E', 'F'] as const, true)
    const driftRow = pick(`${path}.driftRow`, v.driftRow, ['other', 'low-rise', 'masonry-cantilever', 'masonry-other'] as const, true)
    const stabilityBeta = optNum(`${path}.stabilityBeta`, v.stabilityBeta, 0, 1)
    const systemX = system(`${path}.systemX`, v.systemX)
    const systemY = system(`${path}.systemY`, v.systemY)
    if (out.errors.length > before || !riskCategory || !systemX || !systemY) return undefined
    return {
      code,
      riskCategory,
      ...(Ie !== undefined ? { Ie } : {}),
      ...(designCategory !== undefined ? { designCategory } : {}),
      ...(driftRow !== undefined ? { driftRow } : {}),
      ...(stabilityBeta !== undefined ? { stabilityBeta } : {}),
      systemX,
      systemY,
      ...(gravityLoadRatio !== undefined ? { gravityLoadRatio } : {}),
    }
  }
  fields(path, v, ['code', 'importanceClass', 'nu', 'nonStructural', 'systemX', 'systemY', 'gravityLoadRatio'])
  const system = (p: string, x: unknown): En1998System | undefined => {
    if (!isRecord(x)) return err(p, `must be an object with q, got ${shown(x)}`)
    fields(p, x, ['preset', 'q'])
    const pr = preset(`${p}.preset`, x.preset)
    const q = num(`${p}.q`, x.q, 1, 10, false)
    if (q === undefined) return undefined
    return { ...(pr !== undefined ? { preset: pr } : {}), q }
  }
  const importanceClass = pick(`${path}.importanceClass`, v.importanceClass, categories, false)
  const nu = optNum(`${path}.nu`, v.nu, 0, 1)
  const nonStructural = pick(`${path}.nonStructural`, v.nonStructural, ['brittle', 'ductile', 'none'] as const, true)
  const systemX = system(`${path}.systemX`, v.systemX)
  const systemY = system(`${path}.systemY`, v.systemY)
  if (out.errors.length > before || !importanceClass || !systemX || !systemY) return undefined
  return {
    code,
    importanceClass,
    ...(nu !== undefined ? { nu } : {}),
    ...(nonStructural !== undefined ? { nonStructural } : {}),
    systemX,
    systemY,
    ...(gravityLoadRatio !== undefined ? { gravityLoadRatio } : {}),
  }
}
