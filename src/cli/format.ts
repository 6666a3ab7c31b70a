/**
 * Plain-text and JSON renderings of an analysis result for the terminal. Pure functions: the CLI
 * entry does the I/O. Every rendering that holds a design number or a verdict carries the caution.
 */
import type {
  AnalysisResult,
  BalanceResult,
  CheckRow,
  CriterionEvaluation,
  Issue,
  StaticTorsionResult,
  Verdict,
} from '@/engine'
import { scopeLine } from '@/engine'
import { CAUTION, formatNumber, maxOf, MODE_COLUMNS, modeHeaderLabel, toDisplay, unitLabel } from '@/model'
import type { Quantity, UnitSystem } from '@/model'
import { designDetailSection, designLeadSection } from './formatDesign'

type Align = 'left' | 'right'

interface Column {
  readonly header: string
  readonly align?: Align
}

/** A text table: header row, a rule, then the rows; numbers right-aligned. */
export function formatTable(columns: readonly Column[], rows: readonly (readonly string[])[]): string {
  const widths = columns.map((c, j) => maxOf(rows.map((r) => (r[j] ?? '').length), c.header.length))
  const cell = (text: string, j: number): string => {
    const w = widths[j] ?? 0
    return (columns[j]?.align ?? 'right') === 'left' ? text.padEnd(w) : text.padStart(w)
  }
  const line = (cells: readonly string[]): string =>
    columns
      .map((_, j) => cell(cells[j] ?? '', j))
      .join('  ')
      .trimEnd()
  return [line(columns.map((c) => c.header)), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join(
    '\n',
  )
}

function unitSuffix(q: Quantity, units: UnitSystem): string {
  const label = unitLabel(q, units)
  return label === '' ? '' : ` (${label})`
}

const showValue = (valueSI: number, q: Quantity, units: UnitSystem, digits = 4): string =>
  formatNumber(toDisplay(valueSI, q, units), digits)

const pct = (ratio: number): string => (Number.isFinite(ratio) ? `${(100 * ratio).toFixed(1)}%` : '-')

// A row that could not be checked outranks a pass: a missing number is never shown as PASS.
const VERDICT_ORDER: Record<Verdict, number> = { fail: 3, 'not-checked': 2, pass: 1, 'not-applicable': 0 }

/** The row that decides a story's verdict; among several failures the last (the stricter test). */
function worst(rows: readonly CheckRow[]): CheckRow | undefined {
  let pick: CheckRow | undefined
  for (const r of rows) {
    const rank = VERDICT_ORDER[r.verdict]
    if (!pick || rank > VERDICT_ORDER[pick.verdict] || (rank === VERDICT_ORDER.fail && pick.verdict === 'fail')) {
      pick = r
    }
  }
  return pick
}

function verdictText(v: Verdict): string {
  return v === 'not-applicable' ? 'n/a' : v === 'not-checked' ? 'NOT CHECKED' : v.toUpperCase()
}

function floorsSection(result: AnalysisResult, units: UnitSystem): string {
  const centres = new Map((result.centres ?? []).map((c) => [c.floorId, c]))
  const L = (h: string, q: Quantity): string => `${h}${unitSuffix(q, units)}`
  const columns: Column[] = [
    { header: 'floor' },
    { header: 'name', align: 'left' },
    { header: L('z', 'length') },
    { header: L('mass', 'mass') },
    { header: L('CM x', 'length') },
    { header: L('CM y', 'length') },
    { header: L('CR x', 'length') },
    { header: L('CR y', 'length') },
    { header: L('e_x', 'length') },
    { header: L('e_y', 'length') },
    { header: L('r_x', 'length') },
    { header: L('r_y', 'length') },
    { header: L('l_s', 'length') },
  ]
  const rows = result.floors.map((f) => {
    const c = centres.get(f.id)
    const len = (v: number | undefined): string => (v === undefined ? '-' : showValue(v, 'length', units))
    return [
      String(f.index + 1),
      f.name,
      len(f.elevation),
      showValue(f.mass, 'mass', units),
      len(f.centreOfMass.x),
      len(f.centreOfMass.y),
      len(c?.centreOfRigidity.x),
      len(c?.centreOfRigidity.y),
      len(c?.eccentricity.x),
      len(c?.eccentricity.y),
      len(c?.torsionalRadius.x),
      len(c?.torsionalRadius.y),
      len(f.radiusOfGyration),
    ]
  })
  const notes: string[] = []
  if (result.centres?.some((c) => c.hasXYCoupling)) {
    notes.push('Note: inclined elements couple x and y; torsional radii use the diagonal stiffness terms only.')
  }
  const total = `Total mass ${showValue(result.totalMass, 'mass', units)} ${unitLabel('mass', units)}`
  const bcm = result.buildingCentreOfMass
  const cm = bcm
    ? `, building centre of mass (${showValue(bcm.x, 'length', units)}, ${showValue(bcm.y, 'length', units)}) ${unitLabel('length', units)}`
    : ''
  return [
    'Floors (CM centre of mass, CR centre of rigidity, e = CR - CM, r torsional radius, l_s mass radius of gyration)',
    formatTable(columns, rows),
    `${total}${cm}`,
    ...notes,
  ].join('\n')
}

function modesSection(result: AnalysisResult): string {
  const m = result.modes
  if (!m) return 'Modes: not computed'
  // Gyre's one set of mode headers (src/model/modeHeaders.ts); shares in percent, without the sign.
  const columns: Column[] = MODE_COLUMNS.map((c) => (c.key === 'class' ? { header: modeHeaderLabel(c), align: 'left' } : { header: modeHeaderLabel(c) }))
  const share = (ratio: number): string => (Number.isFinite(ratio) ? (100 * ratio).toFixed(1) : '-')
  const rows: string[][] = []
  for (let i = 0; i < m.count; i++) {
    rows.push([
      String(i + 1),
      formatNumber(m.periods[i] ?? Number.NaN, 4),
      formatNumber(m.frequenciesHz[i] ?? Number.NaN, 4),
      share(m.effectiveMassRatio.x[i] ?? Number.NaN),
      share(m.effectiveMassRatio.y[i] ?? Number.NaN),
      share(m.effectiveMassRatio.rz[i] ?? Number.NaN),
      share(m.cumulativeMassRatio.x[i] ?? Number.NaN),
      share(m.cumulativeMassRatio.y[i] ?? Number.NaN),
      share(m.cumulativeMassRatio.rz[i] ?? Number.NaN),
      share(m.torsionShare[i] ?? Number.NaN),
      m.character[i] ?? '-',
    ])
  }
  const head = `Modes (${m.count} of ${m.dofCount}, solver ${m.solver}${m.complete ? '' : ', INCOMPLETE'}; share = effective modal mass over total mass, running = sum over this and lower modes, torsion = share of kinetic energy in rotation)`
  return [head, formatTable(columns, rows)].join('\n')
}

function criterionHeader(c: CriterionEvaluation): string {
  return `Criterion set: ${c.setName} [${c.setId}], source: ${c.source}`
}

function torsionSection(t: StaticTorsionResult, result: AnalysisResult, units: UnitSystem): string {
  const c = t.criterion
  const names = new Map(result.floors.map((f) => [f.id, f.index + 1]))
  const columns: Column[] = [
    { header: 'story' },
    { header: 'case', align: 'left' },
    { header: `drift max${unitSuffix('displacement', units)}` },
    { header: `drift avg${unitSuffix('displacement', units)}` },
    { header: 'drift max/avg' },
    { header: 'displ max/avg' },
    { header: 'Ax' },
    { header: 'verdict', align: 'left' },
    { header: 'label', align: 'left' },
    { header: 'clause', align: 'left' },
  ]
  const rows: string[][] = []
  for (const lc of t.cases) {
    for (const s of lc.stories) {
      const checks = c.rows.filter((r) => r.floorId === s.floorId && r.caseId === lc.id)
      const w = worst(checks)
      rows.push([
        String(names.get(s.floorId) ?? s.index + 1),
        lc.id,
        showValue(s.driftMax, 'displacement', units),
        showValue(s.driftAvg, 'displacement', units),
        formatNumber(s.driftRatio, 4),
        formatNumber(s.displacementRatio, 4),
        s.amplification === null ? '-' : formatNumber(s.amplification, 4),
        w ? verdictText(w.verdict) : '-',
        w?.label ?? '',
        w?.clause ?? '',
      ])
    }
  }
  const source =
    t.eccentricitySource === 'criterion-set' ? ' (from the criterion set)' : t.eccentricitySource === 'settings' ? ' (from the settings)' : ''
  const lead = [
    `Torsion check, equivalent static loads with accidental eccentricity ${pct(t.eccentricityFraction)} of the plan extent${source}`,
    `  period used T_x ${formatNumber(t.periodUsed.x, 4)} s, T_y ${formatNumber(t.periodUsed.y, 4)} s; exponent k_x ${formatNumber(t.exponent.x, 3)}, k_y ${formatNumber(t.exponent.y, 3)}`,
    `  ${criterionHeader(c)}`,
    ...(c.notes ?? []).map((n) => `  note: ${n}`),
  ]
  const extra = c.rows.filter((r) => !t.cases.some((lc) => lc.id === r.caseId))
  const tail = extra.length > 0 ? ['', checksTable(extra, result)] : []
  return [
    ...lead,
    formatTable(columns, rows),
    ...tail,
    `Overall: ${verdictText(c.overall)} (${c.caution})`,
  ].join('\n')
}

function checksTable(rows: readonly CheckRow[], result: AnalysisResult): string {
  const names = new Map(result.floors.map((f) => [f.id, f.index + 1]))
  return formatTable(
    [
      { header: 'floor' },
      { header: 'case', align: 'left' },
      { header: 'quantity', align: 'left' },
      { header: 'value' },
      { header: 'limit' },
      { header: 'verdict', align: 'left' },
      { header: 'label', align: 'left' },
      { header: 'clause', align: 'left' },
    ],
    rows.map((r) => [
      String(names.get(r.floorId) ?? r.floorId),
      r.caseId,
      r.quantity,
      formatNumber(r.value, 4),
      formatNumber(r.limit, 4),
      verdictText(r.verdict),
      r.label,
      r.clause,
    ]),
  )
}

function regularitySection(result: AnalysisResult): string {
  const r = result.regularity
  if (!r) return 'Plan regularity: the criterion set has no eccentricity or torsional-radius rules'
  return [
    'Plan regularity',
    `  ${criterionHeader(r)}`,
    ...(r.notes ?? []).map((n) => `  note: ${n}`),
    checksTable(r.rows, result),
    `Overall: ${verdictText(r.overall)}${scopeLine(r) ? ' for the conditions checked only' : ''} (${r.caution})`,
    ...(scopeLine(r) ? [`  ${scopeLine(r)}`] : []),
  ].join('\n')
}

function spectrumSection(result: AnalysisResult, units: UnitSystem): string {
  const s = result.spectrum
  if (!s) return 'Response spectrum: not computed'
  const spec = s.spectrum
  const shape =
    spec.kind === 'asce7'
      ? `ASCE 7 shape, SDS ${spec.SDS} g, SD1 ${spec.SD1} g, TL ${spec.TL} s`
      : spec.kind === 'en1998-1'
        ? `EN 1998-1 Type 1, ag ${spec.ag} g, ground ${spec.ground}`
        : `table of ${spec.points.length} points`
  const f = unitSuffix('force', units)
  return [
    `Response spectrum (${shape}; damping ${pct(s.damping)}; directions ${s.directionCombination}; scale ${formatNumber(s.scale, 4)})`,
    formatTable(
      [{ header: 'excitation', align: 'left' }, { header: `base shear CQC${f}` }, { header: `base shear SRSS${f}` }],
      [
        ['X', showValue(s.baseShear.x.cqc, 'force', units), showValue(s.baseShear.x.srss, 'force', units)],
        ['Y', showValue(s.baseShear.y.cqc, 'force', units), showValue(s.baseShear.y.srss, 'force', units)],
      ],
    ),
    ...(s.massRatio
      ? [
          `${s.modeCount ?? 0} modes${s.residual ? ' + one residual rigid mode at 0.05 s' : ''}; effective mass combined ${pct(s.massRatio.x)} (X), ${pct(s.massRatio.y)} (Y)`,
        ]
      : []),
  ].join('\n')
}

function timeHistorySection(result: AnalysisResult, units: UnitSystem): string | null {
  const th = result.timeHistory
  if (!th) return null
  const names = new Map(result.floors.map((f) => [f.id, f.index + 1]))
  const d = unitSuffix('displacement', units)
  return [
    `Time history (${th.groundMotionName}; ${th.stepCount} steps of ${formatNumber(th.dt, 4)} s; damping ${pct(th.damping)}; Newmark average acceleration)`,
    formatTable(
      [{ header: 'floor' }, { header: `peak u_x at CM${d}` }, { header: `peak u_y at CM${d}` }, { header: 'peak rotation (mrad)' }],
      th.peaks.map((p) => [
        String(names.get(p.floorId) ?? p.floorId),
        showValue(p.x, 'displacement', units),
        showValue(p.y, 'displacement', units),
        showValue(p.rotation, 'rotation', units),
      ]),
    ),
  ].join('\n')
}

/** One line per issue: `error mechanism: message [refs]`. */
export function formatIssue(issue: Issue): string {
  const refs = issue.refs.length > 0 ? ` [${issue.refs.join(', ')}]` : ''
  return `${issue.severity} ${issue.code}: ${issue.message}${refs}`
}

function issuesSection(result: AnalysisResult): string {
  if (result.issues.length === 0) return 'Issues: none'
  return ['Issues', ...result.issues.map((i) => `  ${formatIssue(i)}`)].join('\n')
}

/** Unit overview line for the header. */
function unitsLine(units: UnitSystem): string {
  const qs: Quantity[] = ['length', 'displacement', 'mass', 'force', 'stiffness']
  return `Units: ${units} (${qs.map((q) => `${q} ${unitLabel(q, units)}`).join(', ')})`
}

/**
 * The readable summary: header with the project name and the caution, then floors, modes, torsion
 * check, plan regularity, spectrum base shears, time history (when run), issues, and the caution again.
 */
export function formatSummary(result: AnalysisResult, units: UnitSystem = 'SI'): string {
  const caution = result.caution || CAUTION
  const parts: string[] = [
    `Gyre analysis: ${result.projectName}`,
    `CAUTION: ${caution}`,
    unitsLine(units),
    `Status: ${result.status}`,
    '',
    floorsSection(result, units),
  ]
  if (result.status === 'ok' || result.status === 'incomplete') {
    parts.push('', modesSection(result))
    parts.push('', designLeadSection(result, units))
    parts.push('', result.torsion ? torsionSection(result.torsion, result, units) : 'Torsion check: not computed')
    parts.push('', regularitySection(result))
    const design = designDetailSection(result, units)
    if (design) parts.push('', design)
    parts.push('', spectrumSection(result, units))
    const th = timeHistorySection(result, units)
    if (th) parts.push('', th)
  }
  parts.push('', issuesSection(result), '', `CAUTION: ${caution}`)
  return `${parts.join('\n')}\n`
}

/** JSON.stringify replacer: typed arrays become plain arrays; non-finite numbers become null. */
function jsonReplacer(_key: string, value: unknown): unknown {
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    return Array.from(value as unknown as ArrayLike<number>, (v) => (Number.isFinite(v) ? v : null))
  }
  if (typeof value === 'number' && !Number.isFinite(value)) return null
  return value
}

/** Top-level field order of the JSON (docs/results-format.md); fields not listed follow. */
const JSON_LEAD = [
  'status',
  'caution',
  'projectName',
  'issues',
  'totalMass',
  'buildingCentreOfMass',
  'floors',
  'centres',
  'modes',
  'torsion',
  'regularity',
  'design',
  'spectrum',
  'timeHistory',
  'timings',
] as const

/** The full AnalysisResult as 2-space JSON (SI units; see docs/results-format.md). */
export function formatResultJson(result: AnalysisResult & { readonly balance?: BalanceResult }): string {
  const rest = Object.fromEntries(
    Object.entries(result).filter(([k]) => !(JSON_LEAD as readonly string[]).includes(k)),
  )
  const ordered = { ...Object.fromEntries(JSON_LEAD.map((k) => [k, result[k]])), ...rest }
  return `${JSON.stringify(ordered, jsonReplacer, 2)}\n`
}

/** The balance assistant's suggestions as a table, with the caution. */
export function formatBalance(balance: BalanceResult): string {
  const lines: string[] = []
  lines.push(
    `Balance assistant (score = RMS over floors of e/r; 0 = centres coincide; see docs/balance.md)`,
  )
  lines.push(
    `  current score ${balance.score.toFixed(3)}, worst |e|/r ${balance.worstEccentricityRatio.toFixed(3)}; ${balance.trials} trial analyses`,
  )
  if (balance.suggestions.length === 0) {
    lines.push(`  ${balance.message ?? 'no suggestion'}`)
  } else {
    const rows = balance.suggestions.map((s, i) => [
      String(i + 1),
      s.description,
      s.scoreAfter.toFixed(3),
      s.worstEccentricityRatioAfter.toFixed(3),
      s.worstDriftRatioBefore === null ? '-' : s.worstDriftRatioBefore.toFixed(3),
      s.worstDriftRatioAfter === null ? '-' : s.worstDriftRatioAfter.toFixed(3),
    ])
    lines.push(
      formatTable(
        [
          { header: '#', align: 'right' },
          { header: 'change (one at a time)', align: 'left' },
          { header: 'score after', align: 'right' },
          { header: 'worst e/r after', align: 'right' },
          { header: 'drift ratio before', align: 'right' },
          { header: 'after', align: 'right' },
        ],
        rows,
      ),
    )
  }
  lines.push(`CAUTION: ${balance.caution}`)
  return `${lines.join('\n')}\n`
}
