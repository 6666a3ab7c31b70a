/**
 * Pure: the results summary read at a glance: the worst max/avg story drift ratio of each storey
 * with its case and verdict, the first three periods with their class, and the ratio of the first
 * torsional period to the longest translational period.
 */
import type { AnalysisResult, ModeCharacter, Verdict } from '@/engine'
import type { Floor } from '@/model'
import { floorOverlay } from './floorOverlay'

export interface SummaryDrift {
  readonly floorId: string
  readonly floorName: string
  readonly ratio: number
  readonly caseId: string
  readonly verdict: Verdict | null
  readonly limit: number | null
}

export interface SummaryMode {
  readonly number: number
  /** s */
  readonly period: number
  readonly character: ModeCharacter
}

export interface ResultsSummary {
  /** Top storey first; storeys without a drift ratio are left out. */
  readonly drifts: readonly SummaryDrift[]
  readonly modes: readonly SummaryMode[]
  /**
   * T of the first mode classed torsion over the longest period of a mode classed x or y; null when
   * either is missing. Above 1 the building twists before it sways (common practice reading).
   */
  readonly periodRatio: { readonly value: number; readonly torsionMode: number; readonly translationMode: number } | null
}

/** The summary of a result; empty lists when the result holds nothing of the kind. */
export function resultsSummary(floors: readonly Floor[], result: AnalysisResult | null): ResultsSummary {
  if (!result) return { drifts: [], modes: [], periodRatio: null }
  const drifts: SummaryDrift[] = []
  for (const f of [...floors].reverse()) {
    const w = floorOverlay(result, f.id).worstDrift
    if (w && Number.isFinite(w.ratio)) drifts.push({ floorId: f.id, floorName: f.name, ...w })
  }
  const m = result.modes
  const modes: SummaryMode[] = []
  let torsion: number | null = null
  let translation: number | null = null
  if (m) {
    for (let i = 0; i < m.count; i++) {
      const T = m.periods[i] ?? Number.NaN
      const c = m.character[i] ?? 'coupled'
      if (!Number.isFinite(T)) continue
      if (modes.length < 3) modes.push({ number: i + 1, period: T, character: c })
      if (c === 'torsion' && torsion === null) torsion = i
      if ((c === 'x' || c === 'y') && translation === null) translation = i
    }
  }
  const Tt = torsion !== null ? (m?.periods[torsion] ?? Number.NaN) : Number.NaN
  const Tl = translation !== null ? (m?.periods[translation] ?? Number.NaN) : Number.NaN
  const periodRatio =
    torsion !== null && translation !== null && Number.isFinite(Tt) && Number.isFinite(Tl) && Tl > 0
      ? { value: Tt / Tl, torsionMode: torsion + 1, translationMode: translation + 1 }
      : null
  return { drifts, modes, periodRatio }
}
