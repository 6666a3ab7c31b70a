import { readSeismicDesign } from '@/model'
import type { AnalysisSettings, Project, SpectrumSpec } from '@/model'
import type { Patch } from './patch'
import type { Check, CommandOutcome } from './result'
import { checkName, checkNonNegative, checkPositive, refuse } from './result'

export interface SetAnalysisSettingsArgs {
  /** Fields to change; `undefined` clears an optional field (baseShearTarget, spectrumModes, groundMotion, criterionSets ...). */
  readonly patch: Patch<AnalysisSettings>
}

const OPTIONAL = ['criterionSets', 'baseShearTarget', 'spectrumModes', 'groundMotion', 'seismicDesign', 'torsionalFlexibilityLimit']

/** The loader's own check of settings.seismicDesign: the first path-naming error, if any. */
function checkSeismicDesign(v: unknown): Check {
  const out = { errors: [] as string[], warnings: [] as string[] }
  readSeismicDesign(v, 'settings.seismicDesign', out)
  return out.errors[0]
}
const FIELDS = ['criterionSet', 'accidentalEccentricity', 'damping', 'spectrum', 'directionCombination', ...OPTIONAL]

function checkSpectrum(s: SpectrumSpec): Check {
  switch (s.kind) {
    case 'asce7':
      return checkPositive('spectrum.SDS', s.SDS) ?? checkPositive('spectrum.SD1', s.SD1) ?? checkPositive('spectrum.TL', s.TL)
    case 'en1998-1':
      return (
        checkPositive('spectrum.ag', s.ag) ??
        (['A', 'B', 'C', 'D', 'E'].includes(s.ground) ? undefined : `spectrum.ground: must be A..E, got "${String(s.ground)}"`)
      )
    case 'table': {
      if (!Array.isArray(s.points) || s.points.length < 1) return 'spectrum.points: needs at least one (period, Sa) pair'
      let last = -Infinity
      for (let i = 0; i < s.points.length; i++) {
        const [T, Sa] = s.points[i] ?? [Number.NaN, Number.NaN]
        const c = checkNonNegative(`spectrum.points[${i}] period`, T) ?? checkNonNegative(`spectrum.points[${i}] Sa`, Sa)
        if (c) return c
        if (T <= last) return `spectrum.points[${i}]: periods must ascend`
        last = T
      }
      return undefined
    }
    default:
      return `spectrum.kind: unknown kind "${String((s as { kind?: unknown }).kind)}"`
  }
}

/** Change analysis settings (validated: 0 <= damping < 1, 0 <= eccentricity <= 0.5, spectrum values). */
export function setAnalysisSettings(doc: Project, args: SetAnalysisSettingsArgs): CommandOutcome {
  const next: Record<string, unknown> = { ...doc.settings }
  for (const [k, v] of Object.entries(args.patch ?? {})) {
    if (!FIELDS.includes(k)) return refuse(`settings: unknown field "${k}"`)
    if (v === undefined) {
      if (!OPTIONAL.includes(k)) return refuse(`settings.${k}: is required and cannot be cleared`)
      delete next[k]
    } else next[k] = v
  }
  const s = next as unknown as AnalysisSettings
  const c =
    checkName('settings.criterionSet', s.criterionSet) ??
    checkNonNegative('settings.accidentalEccentricity', s.accidentalEccentricity) ??
    (s.accidentalEccentricity <= 0.5 ? undefined : `settings.accidentalEccentricity: must be <= 0.5, got ${s.accidentalEccentricity}`) ??
    checkNonNegative('settings.damping', s.damping) ??
    (s.damping < 1 ? undefined : `settings.damping: must be < 1, got ${s.damping}`) ??
    (s.directionCombination === 'srss' || s.directionCombination === '100-30'
      ? undefined
      : `settings.directionCombination: must be "srss" or "100-30", got "${String(s.directionCombination)}"`) ??
    (s.baseShearTarget === undefined ? undefined : checkPositive('settings.baseShearTarget', s.baseShearTarget)) ??
    (s.spectrumModes === undefined || s.spectrumModes === 'full-mass' || s.spectrumModes === 'ninety-percent'
      ? undefined
      : `settings.spectrumModes: must be "full-mass" or "ninety-percent", got "${String(s.spectrumModes)}"`) ??
    checkSpectrum(s.spectrum) ??
    (s.seismicDesign === undefined ? undefined : checkSeismicDesign(s.seismicDesign)) ??
    (s.torsionalFlexibilityLimit === undefined ? undefined : checkPositive('settings.torsionalFlexibilityLimit', s.torsionalFlexibilityLimit))
  if (c) return refuse(c)
  return { ...doc, settings: s }
}
