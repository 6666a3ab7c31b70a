/**
 * The effective-stiffness factors each lateral element uses, for the report: one row per element with
 * the factor(s) on I, whether each is the model default (ACI 318-19 Table 6.6.3.1.1(a)) or set by the
 * user, and the column foot / frame base fixity and slab restraint that go with them. Pure.
 * @see docs/mechanics.md §9, src/model/stiffnessFactors.ts
 */
import { STIFFNESS_FACTOR_DEFAULTS, formatNumber } from '@/model'
import type { Project } from '@/model'
import { escapeHtml } from './escape'

/** One element's factors in words. */
export interface StiffnessFactorRow {
  readonly kind: 'wall' | 'moment frame' | 'column'
  readonly id: string
  readonly name: string
  /** e.g. "f_I 0.70 (default), f_A 1" */
  readonly factors: string
  /** fixity and restraint notes, '' when none apply */
  readonly ends: string
}

const show = (label: string, value: number | undefined, fallback: number): string =>
  value === undefined ? `${label} ${formatNumber(fallback, 3)} (default)` : `${label} ${formatNumber(value, 3)}`

/**
 * Factor rows for every wall, moment frame and column of the project, in record order. Braced and
 * direct frame lines take no factor and are left out. Wall per-story overrides are named.
 */
export function stiffnessFactorRows(project: Project): StiffnessFactorRow[] {
  const rows: StiffnessFactorRow[] = []
  for (const w of Object.values(project.walls)) {
    const perStory = Object.entries(w.stories ?? {})
      .filter(([, o]) => o.flexureFactor !== undefined || o.shearFactor !== undefined)
      .map(([floor]) => floor)
    rows.push({
      kind: 'wall',
      id: w.id,
      name: w.name,
      factors: `f_I ${formatNumber(w.flexureFactor, 3)}, f_A ${formatNumber(w.shearFactor, 3)}${
        perStory.length > 0 ? `; own values at ${perStory.join(', ')}` : ''
      }`,
      ends: '',
    })
  }
  for (const f of Object.values(project.frameLines)) {
    const s = f.stiffness
    if (s.kind !== 'moment') continue
    rows.push({
      kind: 'moment frame',
      id: f.id,
      name: f.name,
      factors: `${show('columns', s.columnFactor, STIFFNESS_FACTOR_DEFAULTS.frameColumn)}, ${show(
        'beams',
        s.beamFactor,
        STIFFNESS_FACTOR_DEFAULTS.frameBeam,
      )}`,
      ends: `feet ${s.baseFixity ?? 'fixed'}`,
    })
  }
  for (const c of Object.values(project.columns)) {
    rows.push({
      kind: 'column',
      id: c.id,
      name: c.name,
      factors: show('I', c.stiffnessFactor, STIFFNESS_FACTOR_DEFAULTS.column),
      ends: `foot ${c.fixity}${c.restraint !== undefined && c.restraint < 1 ? `, slab restraint r = ${formatNumber(c.restraint, 3)}` : ''}`,
    })
  }
  return rows
}

/** The report block: a small table of stiffnessFactorRows, or '' when the project has none. */
export function stiffnessFactorsHtml(project: Project): string {
  const rows = stiffnessFactorRows(project)
  if (rows.length === 0) return ''
  const esc = escapeHtml
  const body = rows
    .map(
      (r) =>
        `<tr><td>${esc(r.kind)}</td><td>${esc(r.name || r.id)}</td><td>${esc(r.factors)}</td><td>${esc(r.ends)}</td></tr>`,
    )
    .join('')
  return [
    '<h3>Effective-stiffness factors used</h3>',
    `<table class="grid small" id="stiffness-factors"><thead><tr><th>element</th><th>name</th><th>factors on I (and A_s)</th><th>ends</th></tr></thead><tbody>${body}</tbody></table>`,
    '<p class="legend">Defaults from ACI 318-19 Table 6.6.3.1.1(a): walls (uncracked) 0.70, columns 0.70, frame beams 0.35. Re-run cracked walls at 0.35 (R6.6.3.1.1).</p>',
  ].join('\n')
}
