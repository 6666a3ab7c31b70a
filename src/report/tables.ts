/**
 * Result tables: the numbers of one analysis as plain, ordered tables in display units, shared by the
 * printable report, the CSV export and any UI that wants a grid. Values stay numbers (full precision,
 * converted to the chosen unit system); text cells are strings; a missing value is null.
 */
import type {
  AnalysisResult,
  CheckRow,
  CriterionEvaluation,
  SpectrumFloorResponse,
  Verdict,
} from '@/engine'
import { CAUTION, elementFloorRange, modeColumn, toDisplay, unitLabel } from '@/model'
import type { ModeColumnKey, Project, Quantity, UnitSystem } from '@/model'
import { DESIGN_TABLE_IDS, designBaseShearTable, designDetailTables } from './designTables'

/** One column: a machine key, a short label and the display unit ('' for pure numbers and text). */
export interface TableColumn {
  readonly key: string
  readonly label: string
  readonly unit: string
}

/** A cell: a display-unit number, a text, or null when there is no value. */
export type TableCell = string | number | null

/** One result table, ready for CSV or HTML. */
export interface ResultTable {
  /** Stable id, also used in file names: 'floors', 'modes', 'torsion', ... */
  readonly id: string
  readonly title: string
  readonly columns: readonly TableColumn[]
  /** Rows in column order. */
  readonly rows: readonly (readonly TableCell[])[]
  /** What the columns mean, assumptions, the criterion set and its notes. */
  readonly notes: readonly string[]
  /** Always CAUTION: every table holds design numbers or verdicts. */
  readonly caution: string
}

/** The table ids in report order (a table is left out when its analysis stage did not run). */
export const TABLE_IDS = [
  'floors',
  'modes',
  'design-base-shear',
  'torsion',
  'torsion-rules',
  'regularity',
  ...DESIGN_TABLE_IDS.slice(1),
  'spectrum-floors',
  'spectrum-base',
  'spectrum-torsion',
  'wall-forces',
  'element-forces',
  'time-history',
] as const

export type TableId = (typeof TABLE_IDS)[number]

/** Display text of a verdict: 'pass', 'fail', 'not checked' or 'n/a'. */
export function verdictText(verdict: Verdict): string {
  return verdict === 'not-applicable' ? 'n/a' : verdict === 'not-checked' ? 'not checked' : verdict
}

const VERDICT_RANK: Record<Verdict, number> = { fail: 3, 'not-checked': 2, pass: 1, 'not-applicable': 0 }

/** The governing verdict of some rows: fail over not checked over pass over n/a; null when there are no rows. */
export function worstVerdict(rows: readonly CheckRow[]): CheckRow | null {
  let pick: CheckRow | null = null
  for (const r of rows) if (!pick || VERDICT_RANK[r.verdict] > VERDICT_RANK[pick.verdict]) pick = r
  return pick
}

/** A number cell: finite values as they are, infinities as text, NaN as no value. */
function num(value: number | null | undefined): TableCell {
  if (value === null || value === undefined || Number.isNaN(value)) return null
  if (value === Number.POSITIVE_INFINITY) return 'inf'
  if (value === Number.NEGATIVE_INFINITY) return '-inf'
  return value
}

/** Builds cells and columns for one unit system. */
function helpers(units: UnitSystem) {
  const col = (key: string, label: string, quantity?: Quantity): TableColumn => ({
    key,
    label,
    unit: quantity ? unitLabel(quantity, units) : '',
  })
  const q = (valueSI: number | null | undefined, quantity: Quantity): TableCell =>
    valueSI === null || valueSI === undefined ? null : num(toDisplay(valueSI, quantity, units))
  return { col, q }
}

function table(
  id: TableId,
  title: string,
  columns: TableColumn[],
  rows: TableCell[][],
  notes: string[],
): ResultTable {
  return { id, title, columns, rows, notes, caution: CAUTION }
}

/** Number of walls, frame lines and columns acting in the story below each floor index. */
function elementsPerStory(project: Project): number[] {
  const counts = project.floors.map(() => 0)
  const all = [
    ...Object.values(project.walls),
    ...Object.values(project.frameLines),
    ...Object.values(project.columns),
  ]
  for (const el of all) {
    const range = elementFloorRange(project, el)
    if (!range) continue
    for (let i = range.first; i <= range.last; i++) counts[i] = (counts[i] ?? 0) + 1
  }
  return counts
}

function floorsTable(project: Project, result: AnalysisResult, units: UnitSystem): ResultTable {
  const { col, q } = helpers(units)
  const perStory = elementsPerStory(project)
  const centres = new Map((result.centres ?? []).map((c) => [c.floorId, c]))
  const columns = [
    col('floor', 'floor'),
    col('name', 'name'),
    col('z', 'elevation z', 'length'),
    col('mass', 'mass', 'mass'),
    col('cmX', 'CM x', 'length'),
    col('cmY', 'CM y', 'length'),
    col('crX', 'CR x', 'length'),
    col('crY', 'CR y', 'length'),
    col('eX', 'e_x', 'length'),
    col('eY', 'e_y', 'length'),
    col('rX', 'r_x', 'length'),
    col('rY', 'r_y', 'length'),
    col('ls', 'l_s', 'length'),
    col('elements', 'lateral elements in story'),
  ]
  const rows = result.floors.map((f): TableCell[] => {
    const c = centres.get(f.id)
    return [
      f.index + 1,
      f.name,
      q(f.elevation, 'length'),
      q(f.mass, 'mass'),
      q(f.centreOfMass.x, 'length'),
      q(f.centreOfMass.y, 'length'),
      q(c?.centreOfRigidity.x, 'length'),
      q(c?.centreOfRigidity.y, 'length'),
      q(c?.eccentricity.x, 'length'),
      q(c?.eccentricity.y, 'length'),
      q(c?.torsionalRadius.x, 'length'),
      q(c?.torsionalRadius.y, 'length'),
      q(f.radiusOfGyration, 'length'),
      perStory[f.index] ?? null,
    ]
  })
  const notes = [
    'CM centre of mass; CR centre of rigidity (a force through it on this floor alone turns the floor by zero); e = CR - CM.',
    'r_x = sqrt(K_theta / K_y), r_y = sqrt(K_theta / K_x) torsional radii about the CR; l_s = sqrt(J / m) mass radius of gyration.',
    `Total mass ${fmtPlain(toDisplay(result.totalMass, 'mass', units))} ${unitLabel('mass', units)}.`,
  ]
  if (result.centres === null) notes.push('Centres were not computed (see the issues).')
  if (result.centres?.some((c) => c.hasXYCoupling)) {
    notes.push('Inclined elements couple x and y: the torsional radii use the diagonal stiffness terms only.')
  }
  return table('floors', 'Floors: mass, centres and torsional radii', columns, rows, notes)
}

function modesTable(result: AnalysisResult): ResultTable | null {
  const m = result.modes
  if (!m) return null
  // Gyre's one set of mode headers (src/model/modeHeaders.ts); shares here as ratios 0..1 (no unit).
  const h = (k: ModeColumnKey): string => modeColumn(k).header
  const col = (key: string, label: string, unit = ''): TableColumn => ({ key, label, unit })
  const columns = [
    col('mode', h('mode')),
    col('period', h('period'), 's'),
    col('frequency', h('frequency'), 'Hz'),
    col('mx', h('shareX')),
    col('my', h('shareY')),
    col('mrz', h('shareRz')),
    col('cumX', h('runningX')),
    col('cumY', h('runningY')),
    col('cumRz', h('runningRz')),
    col('torsion', h('torsion')),
    col('class', h('class')),
  ]
  const rows: TableCell[][] = []
  for (let i = 0; i < m.count; i++) {
    rows.push([
      i + 1,
      num(m.periods[i]),
      num(m.frequenciesHz[i]),
      num(m.effectiveMassRatio.x[i]),
      num(m.effectiveMassRatio.y[i]),
      num(m.effectiveMassRatio.rz[i]),
      num(m.cumulativeMassRatio.x[i]),
      num(m.cumulativeMassRatio.y[i]),
      num(m.cumulativeMassRatio.rz[i]),
      num(m.torsionShare[i]),
      m.character[i] ?? null,
    ])
  }
  const notes = [
    'share X, share Y, share θ: effective modal mass over total mass (0 to 1) for translation along X and Y and rotation θ about the building centre of mass; running: the sum over this and all lower modes.',
    'torsion: part of the modal kinetic energy in rotation about each floor centre of mass (0 to 1).',
    `${m.count} of ${m.dofCount} modes, solver ${m.solver}${m.complete ? '' : ' (incomplete)'}.`,
  ]
  return table('modes', 'Modes: periods, effective masses and torsion share', columns, rows, notes)
}

function criterionNotes(c: CriterionEvaluation): string[] {
  return [`Criterion set ${c.setName} [${c.setId}]: ${c.source}.`, ...(c.notes ?? [])]
}

function torsionTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const t = result.torsion
  if (!t) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('story', 'story'),
    col('floor', 'floor'),
    col('case', 'case'),
    col('driftMax', 'drift max', 'displacement'),
    col('driftAvg', 'drift avg', 'displacement'),
    col('driftRatio', 'drift max/avg'),
    col('displacementRatio', 'displacement max/avg'),
    col('driftIndex', 'drift / height'),
    col('ax', 'Ax'),
    col('verdict', 'verdict'),
    col('label', 'classification'),
    col('clause', 'clause'),
  ]
  const rows: TableCell[][] = []
  for (const lc of t.cases) {
    for (const s of lc.stories) {
      const w = worstVerdict(
        t.criterion.rows.filter(
          (r) => r.floorId === s.floorId && r.caseId === lc.id && r.comparison !== undefined,
        ),
      )
      const floor = names.get(s.floorId)
      rows.push([
        (floor?.index ?? s.index) + 1,
        floor?.name ?? s.floorId,
        lc.id,
        q(s.driftMax, 'displacement'),
        q(s.driftAvg, 'displacement'),
        num(s.driftRatio),
        num(s.displacementRatio),
        num(s.driftIndex),
        num(s.amplification),
        w ? verdictText(w.verdict) : null,
        w?.label ?? null,
        w?.clause ?? null,
      ])
    }
  }
  const source =
    t.eccentricitySource === 'criterion-set'
      ? ' (from the criterion set)'
      : t.eccentricitySource === 'settings'
        ? ' (from the project settings)'
        : ''
  const notes = [
    `Equivalent static loads in X and Y with the centre of mass moved by ±${fmtPlain(100 * t.eccentricityFraction)}% of the plan extent across the load${source}; story n lies below floor n.`,
    'drift max: largest story drift along the load at the slab outline corners; drift avg: mean of the drifts at the two ends across the load.',
    result.design
      ? 'Drifts are elastic under the design base shear (before Cd/Ie or q); design drifts and limits are in the design drift table.'
      : 'No seismic system is set: drifts are elastic under V = Sa(T)·W with R = 1 and no period cap, not design drifts.',
    `Verdict: the governing pass/fail rule of the criterion set for that story and case; overall ${verdictText(t.criterion.overall)}.`,
    ...criterionNotes(t.criterion),
  ]
  return table('torsion', 'Torsion check per story and static case', columns, rows, notes)
}

function checkRowsTable(
  id: TableId,
  title: string,
  evaluation: CriterionEvaluation,
  result: AnalysisResult,
  units: UnitSystem,
  quantity: Quantity | null,
  caseLabel: string,
): ResultTable {
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('floor', 'floor'),
    col('name', 'name'),
    col('case', caseLabel),
    col('quantity', 'quantity'),
    quantity ? col('value', 'value', quantity) : col('value', 'value'),
    col('comparison', 'rule'),
    quantity ? col('limit', 'limit', quantity) : col('limit', 'limit'),
    col('verdict', 'verdict'),
    col('label', 'classification'),
    col('clause', 'clause'),
  ]
  const value = (v: number): TableCell => (quantity ? q(v, quantity) : num(v))
  const rows = evaluation.rows.map((r): TableCell[] => {
    const floor = names.get(r.floorId)
    return [
      floor ? floor.index + 1 : null,
      floor?.name ?? r.floorId,
      r.caseId,
      r.quantity,
      value(r.value),
      r.comparison ?? 'info',
      value(r.limit),
      verdictText(r.verdict),
      r.label,
      r.clause,
    ]
  })
  const notes = [
    `Overall ${verdictText(evaluation.overall)}.`,
    "rule: '<=' passes when the value is at most the limit, '>=' when at least the limit, 'info' is informative only.",
    ...criterionNotes(evaluation),
  ]
  return table(id, title, columns, rows, notes)
}

function spectrumFloorsTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const s = result.spectrum
  if (!s) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('floor', 'floor'),
    col('name', 'name'),
    col('ux', 'u_x at CM', 'displacement'),
    col('uy', 'u_y at CM', 'displacement'),
    col('rotation', 'rotation', 'rotation'),
    col('driftX', 'drift max X', 'displacement'),
    col('driftY', 'drift max Y', 'displacement'),
    col('shearX', 'story shear X', 'force'),
    col('shearY', 'story shear Y', 'force'),
  ]
  const rows = s.combined.map((r: SpectrumFloorResponse): TableCell[] => {
    const floor = names.get(r.floorId)
    return [
      floor ? floor.index + 1 : null,
      floor?.name ?? r.floorId,
      q(r.displacementCqc.x, 'displacement'),
      q(r.displacementCqc.y, 'displacement'),
      q(r.displacementCqc.rotation, 'rotation'),
      q(r.driftMaxCqc.x, 'displacement'),
      q(r.driftMaxCqc.y, 'displacement'),
      q(r.storyShearCqc.x, 'force'),
      q(r.storyShearCqc.y, 'force'),
    ]
  })
  const notes = [
    `Peak responses combined over modes by CQC (damping ${fmtPlain(100 * s.damping)}%) and over the two excitation directions by ${s.directionCombination === 'srss' ? 'SRSS' : 'the 100%/30% rule'}; spectrum ${describeSpectrum(s.spectrum)}; elastic (no behaviour or response modification factor).`,
    'Story drifts are formed per mode at the slab outline corners, then combined; story shear is the shear in the story below the floor.',
  ]
  if (s.scale !== 1) notes.push(`All values scaled by ${fmtPlain(s.scale)} to the base-shear target.`)
  return table('spectrum-floors', 'Response spectrum: floor responses', columns, rows, notes)
}

function spectrumBaseTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const s = result.spectrum
  if (!s) return null
  const { col, q } = helpers(units)
  const columns = [
    col('excitation', 'excitation'),
    col('cqc', 'base shear CQC', 'force'),
    col('srss', 'base shear SRSS', 'force'),
    col('scale', 'scale factor'),
  ]
  const rows: TableCell[][] = [
    ['X', q(s.baseShear.x.cqc, 'force'), q(s.baseShear.x.srss, 'force'), num(s.scaleByDirection?.x ?? s.scale)],
    ['Y', q(s.baseShear.y.cqc, 'force'), q(s.baseShear.y.srss, 'force'), num(s.scaleByDirection?.y ?? s.scale)],
  ]
  const notes = [
    `Total base shear for excitation along one axis; ${s.modeCount ?? result.modes?.count ?? 0} modes combined${s.residual ? ' plus one residual rigid mode at 0.05 s for the rest of the mass (ASCE/SEI 7-16 12.9.1.1)' : ''}.`,
  ]
  if (s.massRatio) {
    notes.push(
      `Effective mass combined: ${fmtPlain(100 * s.massRatio.x)}% (X), ${fmtPlain(100 * s.massRatio.y)}% (Y)${s.residual ? `, of which the residual mode ${fmtPlain(100 * s.residual.massRatio.x)}% (X), ${fmtPlain(100 * s.residual.massRatio.y)}% (Y)` : ''}${s.modeRule === 'ninety-percent' ? '; lowest modes to 90% of the mass (the 12.9.1.1 exception)' : ''}${s.modeSource === 'all-modes' ? '; all modes were solved for the spectrum' : ''}.`,
    )
  }
  return table('spectrum-base', 'Response spectrum: base shears', columns, rows, notes)
}

function spectrumTorsionTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const at = result.spectrum?.accidentalTorsion
  if (!at) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('floor', 'floor'),
    col('name', 'name'),
    col('driftX', 'story drift X with torsion', 'displacement'),
    col('ratioX', 'max/avg drift X'),
    col('indexX', 'drift / height X'),
    col('driftY', 'story drift Y with torsion', 'displacement'),
    col('ratioY', 'max/avg drift Y'),
    col('indexY', 'drift / height Y'),
  ]
  const rows = at.stories.x.map((rx, i): TableCell[] => {
    const ry = at.stories.y[i]
    const floor = names.get(rx.floorId)
    return [
      floor ? floor.index + 1 : null,
      floor?.name ?? rx.floorId,
      q(rx.driftMax, 'displacement'),
      num(rx.driftRatio),
      num(rx.driftIndex),
      q(ry?.driftMax, 'displacement'),
      num(ry?.driftRatio),
      num(ry?.driftIndex),
    ]
  })
  const notes = [
    `Spectrum peaks plus static accidental torsion, envelope of +e and -e: floor torques = floor force x ${fmtPlain(100 * at.eccentricityFraction)}% of the plan extent across the load, floor forces from the equivalent-static vertical distribution (w z^k) scaled to the spectrum's CQC base shear (ASCE/SEI 7-16 12.9.1.5, from memory).`,
    'Drift: peak + |torsion| at the worst slab outline corner; max/avg: per sign of e, the peak taken along the load plus the signed torsion drift, the sign with the larger ratio shown. Informative: the torsion verdicts come from the static cases. No amplification Ax applied.',
  ]
  return table('spectrum-torsion', 'Response spectrum with accidental torsion: story drifts', columns, rows, notes)
}

/** The element-force case shown in the report: the spectrum with accidental torsion when present. */
function designCaseIndex(result: AnalysisResult): number {
  const cases = result.elementForces?.cases ?? []
  for (const id of ['spectrum+torsion', 'spectrum']) {
    const i = cases.findIndex((c) => c.id === id)
    if (i >= 0) return i
  }
  return -1
}

const KIND_WORDS = {
  wall: 'wall',
  frameLine: 'frame line',
  columnX: 'column local x',
  columnY: 'column local y',
  wallGroup: 'wall group, principal axis',
  wallGroupTorsion: 'wall group, St Venant torsion',
} as const

function wallForcesTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const ef = result.elementForces
  const ci = designCaseIndex(result)
  if (!ef || ci < 0) return null
  const walls = ef.elements.filter((e) => e.kind === 'wall')
  if (walls.length === 0) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('wall', 'wall'),
    col('floor', 'floor'),
    col('name', 'story below'),
    col('shear', 'story shear', 'force'),
    col('share', 'share of story shear'),
    col('moment', 'overturning moment', 'moment'),
  ]
  const rows: TableCell[][] = []
  for (const w of walls) {
    for (let k = w.floorIds.length - 1; k >= 0; k--) {
      const floor = names.get(w.floorIds[k]!)
      rows.push([
        w.elementId,
        floor ? floor.index + 1 : null,
        floor?.name ?? w.floorIds[k]!,
        q(w.shear[ci]?.[k], 'force'),
        num(w.share[ci]?.[k]),
        q(w.overturningMoment[ci]?.[k], 'moment'),
      ])
    }
  }
  const notes = [
    `Case: ${ef.cases[ci]!.label}. Each wall's storey shear in its own plane (its nodal forces summed from the top down), its share of the storey shear along the load (along the wall's main axis for both directions combined; peaks need not add up to 100%), and its overturning moment at the bottom of the storey (storey shear x storey height summed from the top down). Formed per mode, then combined by CQC.`,
    'Every case and every element (frame lines, columns) are in the element-forces CSV table.',
  ]
  return table('wall-forces', 'Walls: storey shears and overturning moments', columns, rows, notes)
}

function elementForcesTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const ef = result.elementForces
  if (!ef || ef.cases.length === 0) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('element', 'element'),
    col('kind', 'kind'),
    col('case', 'case'),
    col('floor', 'floor'),
    col('name', 'story below'),
    col('shear', 'story shear', 'force'),
    col('share', 'share of story shear'),
    col('moment', 'overturning moment', 'moment'),
  ]
  const rows: TableCell[][] = []
  ef.cases.forEach((c, ci) => {
    for (const e of ef.elements.filter((row) => row.kind !== 'wallGroupTorsion')) {
      for (let k = e.floorIds.length - 1; k >= 0; k--) {
        const floor = names.get(e.floorIds[k]!)
        rows.push([
          e.elementId,
          KIND_WORDS[e.kind],
          c.id,
          floor ? floor.index + 1 : null,
          floor?.name ?? e.floorIds[k]!,
          q(e.shear[ci]?.[k], 'force'),
          num(e.share[ci]?.[k]),
          q(e.overturningMoment[ci]?.[k], 'moment'),
        ])
      }
    }
  })
  const notes = [
    `Cases: ${ef.cases.map((c) => `${c.id} = ${c.label}`).join('; ')}.`,
    'Static cases are signed; spectrum cases are peaks formed per mode and combined by CQC, then over directions; +torsion adds the static accidental torsion as the envelope of +e and -e.',
  ]
  return table('element-forces', 'Element storey shears and overturning moments, every case', columns, rows, notes)
}

function timeHistoryTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const th = result.timeHistory
  if (!th) return null
  const { col, q } = helpers(units)
  const names = new Map(result.floors.map((f) => [f.id, f]))
  const columns = [
    col('floor', 'floor'),
    col('name', 'name'),
    col('ux', 'peak u_x at CM', 'displacement'),
    col('uy', 'peak u_y at CM', 'displacement'),
    col('rotation', 'peak rotation', 'rotation'),
  ]
  const rows = th.peaks.map((p): TableCell[] => {
    const floor = names.get(p.floorId)
    return [
      floor ? floor.index + 1 : null,
      floor?.name ?? p.floorId,
      q(p.x, 'displacement'),
      q(p.y, 'displacement'),
      q(p.rotation, 'rotation'),
    ]
  })
  const notes = [
    `Ground motion: ${th.groundMotionName}${th.synthetic ? ' (generated for demonstration, not a recorded earthquake)' : ''}; ${th.stepCount} stored steps of ${fmtPlain(th.dt)} s; damping ${fmtPlain(100 * th.damping)}%; Newmark average acceleration.`,
  ]
  return table('time-history', 'Time history: peak floor responses', columns, rows, notes)
}

/** A short plain-words description of a design spectrum. */
export function describeSpectrum(spec: NonNullable<AnalysisResult['spectrum']>['spectrum']): string {
  switch (spec.kind) {
    case 'asce7':
      return `ASCE/SEI 7-16 11.4.6 shape with S_DS ${spec.SDS} g, S_D1 ${spec.SD1} g, T_L ${spec.TL} s`
    case 'en1998-1':
      return `EN 1998-1 3.2.2.2 Type 1 elastic shape with a_g ${spec.ag} g, ground type ${spec.ground}`
    case 'table':
      return `tabulated, ${spec.points.length} (T, Sa) points`
    default: {
      const never: never = spec
      return never
    }
  }
}

/** Short decimal text for notes (6 significant digits, no trailing zeros). */
function fmtPlain(value: number): string {
  if (!Number.isFinite(value)) return '-'
  return String(Number(value.toPrecision(6)))
}

/**
 * All result tables of one analysis in report order, values converted to `units` (SI or US display
 * units of @/model's units module). Stages that did not run give no table.
 */
export function buildResultTables(
  project: Project,
  result: AnalysisResult,
  units: UnitSystem,
): ResultTable[] {
  const tables: (ResultTable | null)[] = [floorsTable(project, result, units), modesTable(result)]
  tables.push(designBaseShearTable(result, units), torsionTable(result, units))
  const t = result.torsion
  if (t && t.criterion.rows.length > 0) {
    tables.push(
      checkRowsTable(
        'torsion-rules',
        'Torsion rules: every check row',
        t.criterion,
        result,
        units,
        null,
        'case',
      ),
    )
  }
  if (result.regularity) {
    tables.push(
      checkRowsTable(
        'regularity',
        'Plan regularity per floor and direction',
        result.regularity,
        result,
        units,
        'length',
        'direction',
      ),
    )
  }
  tables.push(...designDetailTables(result, units))
  tables.push(spectrumFloorsTable(result, units), spectrumBaseTable(result, units))
  tables.push(spectrumTorsionTable(result, units), wallForcesTable(result, units), elementForcesTable(result, units))
  tables.push(timeHistoryTable(result, units))
  return tables.filter((x): x is ResultTable => x !== null)
}
