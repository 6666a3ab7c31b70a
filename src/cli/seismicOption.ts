/**
 * `--system <preset>[,<preset along Y>]` and `--risk-category I..IV`: a seismic system for the run
 * from the presets of @/model (settings.seismicDesign), replacing the file's own for this run only.
 * The code follows the presets (ASCE/SEI 7-16 or EN 1998-1); both directions must use the same code.
 */
import { ASCE7_SYSTEM_PRESETS, EN1998_SYSTEM_PRESETS } from '@/model'
import type { RiskCategory, SeismicDesign } from '@/model'

/** The preset ids the option accepts, for messages and --help. */
export function systemPresetIds(): string[] {
  return [...ASCE7_SYSTEM_PRESETS, ...EN1998_SYSTEM_PRESETS].map((p) => p.id)
}

/** A seismic design from preset ids, or a message naming the option and the problem. */
export function seismicDesignFromOption(
  system: string,
  riskCategory: string | null,
): { ok: true; design: SeismicDesign } | { ok: false; error: string } {
  const ids = system.split(',').map((s) => s.trim())
  if (ids.length < 1 || ids.length > 2 || ids.some((s) => s === '')) {
    return { ok: false, error: `[cli] --system takes one preset or two separated by a comma (X,Y), got ${JSON.stringify(system)}` }
  }
  const category = (riskCategory ?? 'II') as RiskCategory
  if (!['I', 'II', 'III', 'IV'].includes(category)) {
    return { ok: false, error: `[cli] --risk-category must be I, II, III or IV, got ${JSON.stringify(riskCategory)}` }
  }
  const [xId, yId = xId] = ids as [string, string?]
  const asce = (id: string) => ASCE7_SYSTEM_PRESETS.find((p) => p.id === id)
  const en = (id: string) => EN1998_SYSTEM_PRESETS.find((p) => p.id === id)
  const ax = asce(xId)
  const ay = asce(yId)
  if (ax && ay) {
    return { ok: true, design: { code: 'asce7-16', riskCategory: category, systemX: { preset: ax.id, ...ax.values }, systemY: { preset: ay.id, ...ay.values } } }
  }
  const ex = en(xId)
  const ey = en(yId)
  if (ex && ey) {
    return { ok: true, design: { code: 'en1998-1', importanceClass: category, systemX: { preset: ex.id, ...ex.values }, systemY: { preset: ey.id, ...ey.values } } }
  }
  const unknown = [xId, yId].find((id) => !asce(id) && !en(id))
  return {
    ok: false,
    error: unknown
      ? `[cli] --system: unknown preset ${JSON.stringify(unknown)}; one of ${systemPresetIds().join(', ')}`
      : '[cli] --system: both directions must be presets of the same standard',
  }
}
