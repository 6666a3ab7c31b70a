/**
 * The printable report: one self-contained HTML document (inline CSS and SVG, no scripts, no
 * external files) built from a project and its analysis result. Pure: returns a string.
 * The caution stands in a box at the top, in the running footer of every printed page (CSS page
 * margin box), in a repeated header row of every table, and in the closing footer.
 * User text (names, notes) appears only as escaped HTML text and quoted attribute values, never in
 * the style sheet; a Content-Security-Policy meta tag forbids every outside request and all scripts.
 */
import { scopeLine } from '@/engine'
import type { AnalysisResult, BalanceResult, CriterionEvaluation, Issue } from '@/engine'
import { CAUTION, CAUTION_SHORT, formatNumber, formatQuantity, toDisplay, unitLabel } from '@/model'
import type { Project, UnitSystem } from '@/model'
import { cssString, escapeHtml } from './escape'
import { distinctPlans, planSketchSvg } from './planSketch'
import { stiffnessFactorsHtml } from './stiffnessFactors'
import { buildResultTables, describeSpectrum, verdictText } from './tables'
import type { ResultTable, TableCell } from './tables'

export interface ReportOptions {
  readonly unitSystem: UnitSystem
  /** Balance assistant output to list (optional). */
  readonly balance?: BalanceResult
  /** When the report was made (shown in the title block, UTC). */
  readonly generatedAt: Date
}

const esc = escapeHtml

/** 'YYYY-MM-DD HH:MM UTC' of a date; 'unknown time' for an invalid date. */
export function formatTimestamp(date: Date): string {
  if (Number.isNaN(date.getTime())) return 'unknown time'
  return `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`
}

/** A table cell for HTML: numbers to 4 significant digits, text escaped, null as a dash. */
function cellHtml(cell: TableCell): string {
  if (cell === null) return '<td class="none">–</td>'
  if (typeof cell === 'number') return `<td class="num">${esc(formatNumber(cell, 4))}</td>`
  if (cell === 'fail') return '<td class="verdict fail">fail</td>'
  if (cell === 'pass') return '<td class="verdict pass">pass</td>'
  return `<td>${esc(cell)}</td>`
}

/**
 * Columns of text that hold one and the same value in every row (e.g. the clause of a one-rule
 * set) are printed once below the table instead of in every row, to keep rows one line high.
 */
function constantTextColumns(table: ResultTable): Set<number> {
  const constant = new Set<number>()
  if (table.rows.length < 2) return constant
  table.columns.forEach((_, j) => {
    const first = table.rows[0]?.[j]
    if (typeof first !== 'string' || first === 'pass' || first === 'fail') return
    if (table.rows.every((r) => r[j] === first)) constant.add(j)
  })
  return constant
}

/**
 * The project name for printed pages: no user text may go into CSS (a page margin box), so the
 * name is DOM text shown only in print, as a header row that repeats on every page a table spans,
 * as a line above sections without such a table, and in each plan sketch's caption.
 */
function nameRow(name: string, colspan: number): string {
  return `<tr class="name-row"><th colspan="${colspan}">${esc(name)}</th></tr>`
}

function runningHead(name: string): string {
  return `<p class="running-head" aria-hidden="true">${esc(name)}</p>`
}

function tableHtml(table: ResultTable, name: string): string {
  const constant = constantTextColumns(table)
  const shown = table.columns.map((c, j) => ({ c, j })).filter(({ j }) => !constant.has(j))
  const head = shown
    .map(
      ({ c }) =>
        `<th scope="col">${esc(c.label)}${c.unit === '' ? '' : `<span class="unit">${esc(c.unit)}</span>`}</th>`,
    )
    .join('')
  const body = table.rows.map((row) => `<tr>${shown.map(({ j }) => cellHtml(row[j] ?? null)).join('')}</tr>`)
  const common = [...constant].map((j) => {
    const label = table.columns[j]?.label ?? ''
    return `<li>${esc(`${label} (all rows): ${String(table.rows[0]?.[j] ?? '')}`)}</li>`
  })
  const notes = [...common, ...table.notes.map((note) => `<li>${esc(note)}</li>`)].join('')
  return [
    `<section class="sheet" id="table-${esc(table.id)}">`,
    `<h2>${esc(table.title)}</h2>`,
    `<table class="grid" data-table="${esc(table.id)}">`,
    // The first header row repeats on every printed page the table spans.
    `<thead><tr class="caution-row"><th colspan="${shown.length}">${esc(CAUTION_SHORT)}</th></tr>${nameRow(name, shown.length)}<tr>${head}</tr></thead>`,
    `<tbody>${body.join('')}</tbody>`,
    '</table>',
    notes === '' ? '' : `<ul class="notes">${notes}</ul>`,
    '</section>',
  ].join('\n')
}

function dl(items: readonly (readonly [string, string])[]): string {
  return `<dl class="facts">${items.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${esc(v)}</dd>`).join('')}</dl>`
}

function governingCriterion(result: AnalysisResult): CriterionEvaluation | null {
  return result.torsion?.criterion ?? result.regularity ?? null
}

function summaryHtml(project: Project, result: AnalysisResult, units: UnitSystem): string {
  const s = project.settings
  const height = project.floors.reduce((sum, f) => sum + f.height, 0)
  const count = (r: Readonly<Record<string, unknown>>): number => Object.keys(r).length
  const c = governingCriterion(result)
  const criterion = c
    ? `${c.setName} [${c.setId}], source: ${c.source}`
    : s.criterionSet === '' || s.criterionSet === 'none'
      ? 'none selected'
      : `${s.criterionSet} (not evaluated)`
  const ecc = result.torsion
    ? `${formatNumber(100 * result.torsion.eccentricityFraction, 4)}% of the plan extent across the load${
        result.torsion.eccentricitySource === 'criterion-set' ? ' (from the criterion set)' : ''
      }`
    : `${formatNumber(100 * s.accidentalEccentricity, 4)}% of the plan extent across the load`
  const gm = s.groundMotion
    ? s.groundMotion.kind === 'record'
      ? `record '${s.groundMotion.name}', dt ${formatNumber(s.groundMotion.dt, 4)} s`
      : `generated demonstration motion, PGA ${formatNumber(s.groundMotion.pga, 3)} g, ${formatNumber(s.groundMotion.duration, 3)} s`
    : 'none'
  const model = dl([
    ['Floors', `${project.floors.length} (total height ${formatQuantity(height, 'length', units)})`],
    ['Total mass', formatQuantity(result.totalMass, 'mass', units)],
    [
      'Lateral elements',
      `${count(project.walls)} walls, ${count(project.frameLines)} frame lines, ${count(project.columns)} columns`,
    ],
    [
      'Mass items',
      `${count(project.slabs)} slabs, ${count(project.lineMasses)} line masses, ${count(project.pointMasses)} point masses`,
    ],
    ['Analysis status', result.status],
  ])
  const settings = dl([
    ['Criterion set', criterion],
    ['Accidental eccentricity', ecc],
    ['Modal damping', `${formatNumber(100 * s.damping, 4)}%`],
    ['Design spectrum', describeSpectrum(s.spectrum)],
    ['Direction combination', s.directionCombination === 'srss' ? 'SRSS of the two directions' : '100% + 30% rule'],
    [
      'Base-shear target',
      s.baseShearTarget === undefined ? 'none (elastic spectrum values)' : formatQuantity(s.baseShearTarget, 'force', units),
    ],
    ['Ground motion', gm],
  ])
  const materials = Object.values(project.materials)
  const matRows = materials
    .map(
      (m) =>
        `<tr><td>${esc(m.name || m.id)}</td><td class="num">${esc(formatNumber(toDisplay(m.E, 'modulus', units), 4))}</td><td class="num">${esc(formatNumber(m.nu, 3))}</td></tr>`,
    )
    .join('')
  const matTable =
    materials.length === 0
      ? '<p>No materials defined.</p>'
      : `<table class="grid small"><thead><tr><th>material</th><th>E<span class="unit">${esc(unitLabel('modulus', units))}</span></th><th>Poisson ratio</th></tr></thead><tbody>${matRows}</tbody></table>`
  const verdicts: string[] = []
  if (result.torsion) {
    verdicts.push(`Torsion check (${result.torsion.criterion.setName}): ${verdictText(result.torsion.criterion.overall)}`)
  }
  if (result.regularity) {
    const scope = scopeLine(result.regularity)
    verdicts.push(
      `Plan regularity (${result.regularity.setName}): ${verdictText(result.regularity.overall)}` +
        (scope ? ` for the conditions checked only. ${scope}` : ''),
    )
  }
  return [
    '<section class="sheet first" id="summary">',
    '<h2>Model summary</h2>',
    '<div class="two-col"><div><h3>Model</h3>',
    model,
    '</div><div><h3>Settings</h3>',
    settings,
    '</div></div>',
    '<h3>Materials</h3>',
    matTable,
    stiffnessFactorsHtml(project),
    verdicts.length === 0
      ? ''
      : `<h3>Overall verdicts</h3><ul class="verdicts">${verdicts.map((v) => `<li>${esc(v)}</li>`).join('')}</ul><p class="inline-caution">${esc(CAUTION)}</p>`,
    project.notes ? `<h3>Project notes</h3><p class="pre">${esc(project.notes)}</p>` : '',
    '</section>',
  ].join('\n')
}

function plansHtml(project: Project, result: AnalysisResult, units: UnitSystem, name: string): string {
  const groups = distinctPlans(project)
  if (groups.length === 0) return ''
  const figures = groups.map((g) => {
    const floors = g.floorIndices.map((i) => i + 1).join(', ')
    return `<figure class="plan">${planSketchSvg(project, result, g, units)}<figcaption>Floor${
      g.floorIndices.length === 1 ? '' : 's'
    } ${esc(floors)}<span class="print-name"> · ${esc(name)}</span></figcaption></figure>`
  })
  return [
    '<section class="sheet" id="plans">',
    runningHead(name),
    '<h2>Floor plans with centres</h2>',
    '<p class="legend"><span class="key-cm">○+</span> centre of mass · <span class="key-cr">◆</span> centre of rigidity (labelled with the floor number; the thin line joins the floors bottom to top) · thick bars walls · dashed lines frame lines · squares columns. One sketch per distinct plan (same slabs and lateral elements).</p>',
    ...figures,
    '</section>',
  ].join('\n')
}

function issuesHtml(issues: readonly Issue[], name: string): string {
  const items =
    issues.length === 0
      ? '<p>No issues were reported for this model.</p>'
      : `<table class="grid small"><thead><tr><th>severity</th><th>code</th><th>message</th><th>refers to</th></tr></thead><tbody>${issues
          .map(
            (i) =>
              `<tr><td class="sev-${esc(i.severity)}">${esc(i.severity)}</td><td>${esc(i.code)}</td><td>${esc(i.message)}</td><td>${esc(i.refs.join(', '))}</td></tr>`,
          )
          .join('')}</tbody></table>`
  return ['<section class="sheet" id="issues">', runningHead(name), '<h2>Issues</h2>', items, '</section>'].join('\n')
}

function balanceHtml(balance: BalanceResult, name: string): string {
  const ratio = (v: number | null): string => (v === null ? '–' : formatNumber(v, 4))
  const rows = balance.suggestions
    .map(
      (s, k) =>
        `<tr><td class="num">${k + 1}</td><td>${esc(s.description)}</td><td class="num">${esc(ratio(s.scoreBefore))}</td><td class="num">${esc(ratio(s.scoreAfter))}</td><td class="num">${esc(ratio(s.worstEccentricityRatioBefore))}</td><td class="num">${esc(ratio(s.worstEccentricityRatioAfter))}</td><td class="num">${esc(ratio(s.worstDriftRatioBefore))}</td><td class="num">${esc(ratio(s.worstDriftRatioAfter))}</td></tr>`,
    )
    .join('')
  const body =
    balance.suggestions.length === 0
      ? `<p>${esc(balance.message ?? 'No suggestions.')}</p>`
      : `<table class="grid" data-table="balance"><thead><tr class="caution-row"><th colspan="8">${esc(CAUTION_SHORT)}</th></tr>${nameRow(name, 8)}<tr><th>rank</th><th>change</th><th>score before</th><th>score after</th><th>worst e/r before</th><th>worst e/r after</th><th>worst drift ratio before</th><th>worst drift ratio after</th></tr></thead><tbody>${rows}</tbody></table>`
  return [
    '<section class="sheet" id="balance">',
    balance.suggestions.length === 0 ? runningHead(name) : '',
    '<h2>Balance suggestions</h2>',
    `<p>Single-element changes ranked by the balance score S, the root mean square over floors of e/r in both directions (S = 0 when every centre of rigidity sits on its centre of mass). Current score ${esc(formatNumber(balance.score, 4))}, worst e/r ${esc(formatNumber(balance.worstEccentricityRatio, 4))}; ${balance.trials} trial analyses. Each change is assessed on its own, not combined with the others.</p>`,
    body,
    `<p class="inline-caution">${esc(balance.caution)}</p>`,
    '</section>',
  ].join('\n')
}

function methodHtml(result: AnalysisResult, name: string): string {
  const evaluations = [result.torsion?.criterion, result.regularity].filter(
    (e): e is CriterionEvaluation => e !== null && e !== undefined,
  )
  const clauses = [...new Set(evaluations.flatMap((e) => e.rows.map((r) => r.clause)))]
  const sets = evaluations.map(
    (e) => `<li><strong>${esc(e.setName)}</strong> [${esc(e.setId)}]: ${esc(e.source)}${
      e.notes && e.notes.length > 0 ? `<ul>${e.notes.map((n) => `<li>${esc(n)}</li>`).join('')}</ul>` : ''
    }</li>`,
  )
  const points = [
    'Each floor is a rigid diaphragm with three degrees of freedom at the plan origin: translations u_x, u_y and the rotation θ about the vertical axis.',
    'Shear walls act in their own plane as Timoshenko cantilevers (bending and shear deformation) from base to top; the rotations at the floors are condensed out, so each wall adds a full lateral stiffness block over the floors it spans. Frame lines and columns are shear-type story springs.',
    'Floor masses and polar moments come from the slab polygons (Green\u2019s theorem area integrals), line masses and point masses.',
    'The centre of rigidity of a floor is the point where a horizontal force on that floor alone causes no rotation of it; the torsional radii r_x and r_y are taken about it.',
    'Modes solve the generalized symmetric eigenproblem K φ = ω² M φ; effective modal masses use the participation factors along X, Y and about the building centre of mass.',
    'Torsion checks apply equivalent static floor forces with the centre of mass moved by the accidental eccentricity, and compare the largest and average story drifts (and floor displacements) at the slab outline corners.',
    'Response spectrum peaks combine modes by CQC (Der Kiureghian 1981 correlation coefficients) and the two horizontal directions by SRSS or the 100%/30% rule.',
    ...(result.spectrum?.residual
      ? ['The spectrum combines every mode with a period of at least 0.05 s plus one residual rigid mode at 0.05 s carrying the rest of the mass, so 100% of the mass is included (ASCE/SEI 7-16 12.9.1.1).']
      : []),
    ...(result.spectrum?.accidentalTorsion
      ? ['Accidental torsion is added to spectrum results as static floor torques (floor force x accidental eccentricity, forces from the equivalent-static distribution scaled to the spectrum base shear), the envelope of +e and -e.']
      : []),
    ...(result.elementForces
      ? ['Element storey shears are the element nodal forces summed from the top down; overturning moments sum storey shear x storey height from the top down; for the spectrum both are formed per mode before combining.']
      : []),
    ...(result.timeHistory ? ['The time history integrates the modal equations by the Newmark average-acceleration method.'] : []),
  ]
  return [
    '<section class="sheet" id="method">',
    runningHead(name),
    '<h2>Method and sources</h2>',
    `<ul class="method">${points.map((p) => `<li>${esc(p)}</li>`).join('')}</ul>`,
    sets.length === 0 ? '<p>No criterion set was evaluated.</p>' : `<h3>Criterion sets</h3><ul class="method">${sets.join('')}</ul>`,
    clauses.length === 0 ? '' : `<h3>Clauses applied</h3><ul class="method">${clauses.map((c) => `<li>${esc(c)}</li>`).join('')}</ul>`,
    `<p class="inline-caution">${esc(CAUTION)}</p>`,
    '</section>',
  ].join('\n')
}

/**
 * The report's Content-Security-Policy: nothing may be fetched from anywhere (no scripts, frames,
 * fonts, forms or outside images), only the inline style sheet and data: images are allowed.
 * @see Content Security Policy Level 3 (W3C), section 6 (directives)
 */
export const REPORT_CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'"

/** The report's style sheet: fixed text only, no user text (names go into the DOM). */
function styles(): string {
  return `
:root { --ink: #23262b; --muted: #5d636c; --rule: #d3d7dc; --band: #f3f5f6; --accent: #2d5562;
  --warm: #fbf4e4; --warm-edge: #a8741c; --fail: #8a2b1a; }
* { box-sizing: border-box; }
html { font-family: "Source Sans 3", "Segoe UI", Roboto, Helvetica, Arial, sans-serif; color: var(--ink);
  font-size: 10.5pt; line-height: 1.4; }
body { margin: 0 auto; max-width: 190mm; padding: 12mm 8mm; }
h1 { font-size: 18pt; margin: 0 0 2mm; color: var(--accent); font-weight: 600; letter-spacing: 0.01em; }
h2 { font-size: 13pt; margin: 0 0 3mm; padding-bottom: 1mm; border-bottom: 1px solid var(--rule);
  color: var(--accent); font-weight: 600; }
h3 { font-size: 10.5pt; margin: 4mm 0 1.5mm; color: var(--muted); text-transform: uppercase;
  letter-spacing: 0.06em; font-weight: 600; }
.title-block { display: flex; justify-content: space-between; align-items: flex-end; gap: 6mm;
  border-bottom: 2px solid var(--accent); padding-bottom: 3mm; margin-bottom: 4mm; }
.title-block .kind { color: var(--muted); font-size: 9pt; text-transform: uppercase; letter-spacing: 0.08em; }
.title-block .meta { text-align: right; color: var(--muted); font-size: 9pt; }
.caution-box { border: 1px solid var(--warm-edge); border-left-width: 5px; background: var(--warm);
  padding: 3mm 4mm; margin: 0 0 5mm; font-size: 11pt; }
.caution-box strong { display: block; font-size: 9pt; text-transform: uppercase; letter-spacing: 0.08em;
  color: var(--warm-edge); }
.inline-caution { font-size: 9pt; color: var(--warm-edge); border-top: 1px dotted var(--warm-edge);
  padding-top: 1.5mm; }
section.sheet { margin: 0 0 8mm; }
.two-col { display: grid; grid-template-columns: 1fr 1fr; gap: 6mm; }
dl.facts { display: grid; grid-template-columns: max-content 1fr; gap: 1mm 3mm; margin: 0; }
dl.facts dt { color: var(--muted); }
dl.facts dd { margin: 0; }
table.grid { border-collapse: collapse; width: 100%; font-size: 8.5pt; font-variant-numeric: tabular-nums; }
table.grid.small { width: auto; min-width: 50%; }
table.grid th, table.grid td { padding: 0.8mm 1.6mm; border-bottom: 1px solid var(--rule); vertical-align: top; }
table.grid thead th { text-align: left; font-weight: 600; background: var(--band); border-bottom: 1px solid var(--muted); }
table.grid thead tr.caution-row th { background: var(--warm); color: var(--warm-edge); font-weight: 400;
  font-size: 7.5pt; border-bottom: 1px solid var(--rule); }
table.grid th .unit { display: block; font-weight: 400; color: var(--muted); font-size: 7.5pt; }
table.grid td.num { text-align: right; white-space: nowrap; }
table.grid td.none { color: var(--muted); text-align: center; }
table.grid td.verdict.fail { font-weight: 700; color: var(--fail); text-decoration: underline dotted; }
table.grid tbody tr:nth-child(even) td { background: #fafbfb; }
thead { display: table-header-group; }
tr { break-inside: avoid; }
ul.notes { font-size: 8.5pt; color: var(--muted); margin: 2mm 0 0; padding-left: 5mm; }
ul.method { padding-left: 5mm; }
ul.method li { margin-bottom: 1mm; }
.legend { font-size: 9pt; color: var(--muted); }
.key-cm { color: #b4652a; font-weight: 700; }
.key-cr { color: #2b7a86; }
figure.plan { margin: 0 0 6mm; break-inside: avoid; }
figure.plan figcaption { font-size: 9pt; color: var(--muted); text-align: center; }
svg.plan-sketch { display: block; max-height: 120mm; margin: 0 auto; }
.g-slab { fill: #f1efe9; stroke: #8e8f8c; stroke-width: 1; }
.g-wall { stroke: #33383f; stroke-linecap: butt; }
.g-frame { stroke: #3f5f8a; stroke-width: 2; stroke-dasharray: 7 4; }
.g-column { fill: #6b7078; }
.g-cm circle { fill: #ffffff; stroke: #b4652a; stroke-width: 1.6; }
.g-cm path { stroke: #b4652a; stroke-width: 1.2; }
.g-cr { fill: #2b7a86; stroke: #ffffff; stroke-width: 0.8; }
.g-trail { fill: none; stroke: #2b7a86; stroke-width: 0.8; stroke-opacity: 0.6; }
.g-label { font-size: 10px; fill: #4a4f57; }
.g-scale { fill: none; stroke: #4a4f57; stroke-width: 1.2; }
.pre { white-space: pre-wrap; }
.sev-error { font-weight: 700; color: var(--fail); }
footer.closing { margin-top: 8mm; padding-top: 2mm; border-top: 2px solid var(--accent); font-size: 9pt; color: var(--muted); }
@page { size: auto; margin: 15mm 13mm 18mm;
  @bottom-left { content: ${cssString(CAUTION)}; font-size: 7.5pt; color: #8a5d12; }
  @bottom-right { content: counter(page) " / " counter(pages); font-size: 7.5pt; color: #5d636c; }
  @top-left { content: "Gyre report"; font-size: 7.5pt; color: #5d636c; } }
.running-head, table.grid thead tr.name-row, .print-name { display: none; }
@media print {
  .running-head { display: block; margin: 0 0 2mm; text-align: right; font-size: 7.5pt; color: var(--muted); }
  table.grid thead tr.name-row { display: table-row; }
  .print-name { display: inline; }
  table.grid thead tr.name-row th { background: none; text-align: right; font-weight: 400; font-size: 7.5pt;
    color: var(--muted); border-bottom: 0; }
  body { max-width: none; padding: 0; }
  html { font-size: 9.5pt; }
  section.sheet { break-before: page; margin: 0; }
  section.sheet.first { break-before: auto; }
  .caution-box { break-inside: avoid; }
  table.grid tbody tr:nth-child(even) td { background: none; }
}
`
}

/**
 * The full report as one HTML document string: title block, caution box, model summary, plan
 * sketches, the result tables of buildResultTables, issues, balance suggestions (when given) and
 * the method and sources. All text from the project is HTML-escaped.
 */
export function buildReportHtml(project: Project, result: AnalysisResult, options: ReportOptions): string {
  const units = options.unitSystem
  // The long every-case element table goes to CSV only; the report shows the walls' design case.
  const tables = buildResultTables(project, result, units).filter((t) => t.id !== 'element-forces')
  const name = project.name.trim() === '' ? 'Untitled project' : project.name
  const when = formatTimestamp(options.generatedAt)
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="${esc(REPORT_CSP)}">`,
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    '<meta name="generator" content="Gyre">',
    `<title>${esc(`Gyre report: ${name}`)}</title>`,
    `<style>${styles()}</style>`,
    '</head>',
    '<body>',
    '<header class="title-block">',
    `<div><div class="kind">Gyre plan-torsion study</div><h1>${esc(name)}</h1></div>`,
    `<div class="meta">Generated ${esc(when)}<br>Units: ${units === 'SI' ? 'SI (m, mm, t, kN)' : 'US customary (ft, in, kip)'}<br>Status: ${esc(result.status)}</div>`,
    '</header>',
    `<div class="caution-box" role="note" id="caution-top"><strong>Caution</strong>${esc(CAUTION)}</div>`,
    summaryHtml(project, result, units),
    plansHtml(project, result, units, name),
    ...tables.map((t) => tableHtml(t, name)),
    issuesHtml(result.issues, name),
    options.balance ? balanceHtml(options.balance, name) : '',
    methodHtml(result, name),
    `<footer class="closing" id="caution-bottom">Gyre · ${esc(name)} · ${esc(when)}<br>${esc(CAUTION)}</footer>`,
    '</body>',
    '</html>',
    '',
  ]
    .filter((line) => line !== '')
    .join('\n')
}
