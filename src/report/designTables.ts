/**
 * Result tables of the design-level numbers (result.design): the ELF base shear with the period used
 * and the system factors (shown before the drift tables), then design drifts with their limits, the
 * stability coefficient, amplified accidental torsion, spectrum scaling to ELF, story stiffness and
 * soft stories, torsional flexibility and the consequences of irregularities. Every table carries
 * CAUTION; values in display units.
 * @see docs/results-format.md "design"; docs/criteria.md "Design-level numbers"
 */
import type { AnalysisResult, DesignResult } from '@/engine'
import { CAUTION, toDisplay, unitLabel } from '@/model'
import type { Quantity, UnitSystem } from '@/model'
import type { ResultTable, TableCell, TableColumn } from './tables'

/** Ids of the design tables: the first goes before the torsion table, the others after the rules. */
export const DESIGN_TABLE_IDS = [
  'design-base-shear',
  'design-drifts',
  'design-stability',
  'design-amplified-torsion',
  'design-spectrum-scaling',
  'design-spectrum-drifts',
  'design-story-stiffness',
  'design-torsional-flexibility',
  'design-consequences',
] as const

type DesignTableId = (typeof DESIGN_TABLE_IDS)[number]

const n = (v: number | null | undefined): TableCell =>
  v === null || v === undefined || !Number.isFinite(v) ? null : v

function kit(units: UnitSystem) {
  const col = (key: string, label: string, quantity?: Quantity): TableColumn => ({
    key,
    label,
    unit: quantity ? unitLabel(quantity, units) : '',
  })
  const q = (v: number | null | undefined, quantity: Quantity): TableCell =>
    v === null || v === undefined ? null : n(toDisplay(v, quantity, units))
  return { col, q }
}

const make = (id: DesignTableId, title: string, columns: TableColumn[], rows: TableCell[][], notes: string[]): ResultTable => ({
  id,
  title,
  columns,
  rows,
  notes,
  caution: CAUTION,
})

const codeName = (d: DesignResult): string => (d.code === 'asce7-16' ? 'ASCE/SEI 7-16' : 'EN 1998-1:2004')

/** The ELF base shear table (V, coefficient, T used and why, system factors) per direction. */
export function designBaseShearTable(result: AnalysisResult, units: UnitSystem): ResultTable | null {
  const d = result.design
  if (!d) return null
  const { col, q } = kit(units)
  const asce = d.code === 'asce7-16'
  const columns = [
    col('direction', 'direction'),
    col('system', 'system'),
    ...(asce
      ? [col('R', 'R'), col('Cd', 'Cd'), col('Omega0', 'Omega0'), col('Ie', 'Ie')]
      : [col('q', 'q')]),
    col('modalPeriod', 'modal T', 'period'),
    ...(asce ? [col('Ta', 'Ta', 'period'), col('cap', 'Cu·Ta', 'period')] : []),
    col('periodUsed', 'T used', 'period'),
    col('periodReason', 'why this T'),
    col('coefficient', asce ? 'Cs' : 'Sd(T1) (g)'),
    col('governs', asce ? 'Cs set by' : 'lambda'),
    col('weight', 'seismic weight W', 'force'),
    col('baseShear', asce ? 'V' : 'Fb', 'force'),
    col('k', 'k'),
  ]
  const rows = [d.x, d.y].map((e) => [
    e.direction.toUpperCase(),
    e.factors.preset ?? 'user values',
    ...(asce ? [n(e.factors.R), n(e.factors.Cd), n(e.factors.Omega0), n(e.factors.Ie)] : [n(e.factors.q)]),
    q(e.modalPeriod, 'period'),
    ...(asce ? [q(e.approximatePeriod, 'period'), q(e.periodCap, 'period')] : []),
    q(e.periodUsed, 'period'),
    e.periodReason,
    n(e.coefficient),
    asce ? (e.coefficientGovernedBy ?? null) : n(e.lambda),
    q(e.seismicWeight, 'force'),
    q(e.baseShear, 'force'),
    n(e.exponent),
  ])
  const notes = asce
    ? [
        'ASCE/SEI 7-16 12.8.1: V = Cs W, Cs = SDS/(R/Ie) limited by SD1/(T R/Ie) (T <= TL) or SD1 TL/(T² R/Ie), at least max(0.044 SDS Ie, 0.01) and, when S1 >= 0.6 g, 0.5 S1/(R/Ie).',
        'T used: the modal period of the direction (largest effective mass) capped at Cu·Ta, Ta = Ct hn^x (12.8.2, Tables 12.8-1/12.8-2).',
        'The static torsion cases use this V distributed by w z^k (12.8.3); their ratios do not depend on V.',
        ...d.notes,
      ]
    : [
        'EN 1998-1 4.3.3.2: Fb = Sd(T1) m lambda with the design spectrum Sd of 3.2.2.5 (q, beta = 0.2); lambda = 0.85 when T1 <= 2 TC and more than two storeys.',
        'Forces distributed by z_i m_i (4.3.3.2.3); the static torsion cases use them, their ratios do not depend on Fb.',
        ...d.notes,
      ]
  return make('design-base-shear', `Design base shear per direction (${codeName(d)})`, columns, rows, notes)
}

/** All design tables after the base shear table, in report order. */
export function designDetailTables(result: AnalysisResult, units: UnitSystem): ResultTable[] {
  const d = result.design
  if (!d) return []
  const { col, q } = kit(units)
  const floors = new Map(result.floors.map((f) => [f.id, f]))
  const story = (id: string): TableCell => (floors.get(id)?.index ?? -1) + 1
  const name = (id: string): TableCell => floors.get(id)?.name ?? id
  const asce = d.code === 'asce7-16'
  const out: ResultTable[] = []

  out.push(
    make(
      'design-drifts',
      'Design story drifts at the extreme points and their limits',
      [
        col('story', 'story'),
        col('floor', 'floor'),
        col('case', 'case'),
        col('elastic', asce ? 'delta_e drift' : 'd_e drift', 'displacement'),
        col('design', asce ? 'design drift Delta' : 'design drift d_r', 'displacement'),
        col('index', 'drift / height'),
        col('limit', asce ? 'allowable Delta_a' : 'limit alpha h / nu', 'displacement'),
        col('verdict', 'verdict'),
        col('clause', 'clause'),
      ],
      d.drifts.map((r) => [
        story(r.floorId),
        name(r.floorId),
        r.caseId,
        q(r.elasticDrift, 'displacement'),
        q(r.designDrift, 'displacement'),
        n(r.driftIndex),
        q(r.limit, 'displacement'),
        r.verdict,
        r.clause,
      ]),
      [`Design drift: ${d.driftRule}; elastic drifts from the static cases under the design forces with accidental torsion (Ax = 1).`],
    ),
  )

  out.push(
    make(
      'design-stability',
      'P-delta stability coefficient per story',
      [
        col('story', 'story'),
        col('floor', 'floor'),
        col('direction', 'direction'),
        col('P', 'gravity load P', 'force'),
        col('V', 'story shear V', 'force'),
        col('drift', 'design drift at CM', 'displacement'),
        col('theta', 'theta'),
        col('thetaMax', 'theta max'),
        col('amplifier', '1/(1 - theta)'),
        col('verdict', 'verdict'),
        col('note', 'note'),
      ],
      d.stability.map((r) => [
        story(r.floorId),
        name(r.floorId),
        r.direction.toUpperCase(),
        q(r.gravityLoad, 'force'),
        q(r.storyShear, 'force'),
        q(r.designDrift, 'displacement'),
        n(r.theta),
        n(r.thetaMax),
        n(r.amplifier),
        r.verdict,
        r.note,
      ]),
      [
        asce
          ? 'ASCE/SEI 7-16 12.8.7: theta = Px Delta Ie / (Vx hsx Cd) <= theta_max = 0.5/(beta Cd) <= 0.25.'
          : 'EN 1998-1 4.4.2.2: theta = Ptot d_r / (Vtot h); <= 0.1 ignore, 0.1 to 0.2 amplify by 1/(1 - theta), at most 0.3.',
        `P = ${d.gravityLoadRatio} x the seismic weight on and above the story (the seismic weight is the gravity load unless the settings give another ratio).`,
      ],
    ),
  )

  if (d.amplified) {
    out.push(
      make(
        'design-amplified-torsion',
        'Accidental torsion amplified by Ax until Ax stops changing',
        [
          col('case', 'case'),
          col('iterations', 'iterations'),
          col('converged', 'converged'),
          col('firstMax', 'largest Ax with Ax = 1'),
          col('finalMax', 'largest Ax at the end'),
          col('ratio', 'largest drift max/avg'),
          col('drift', 'largest design drift', 'displacement'),
        ],
        d.amplified.map((c) => [
          c.caseId,
          c.iterations,
          c.converged ? 'yes' : 'no',
          n(Math.max(...c.firstPass)),
          n(Math.max(...c.final)),
          n(c.maxDriftRatio),
          q(c.maxDesignDrift, 'displacement'),
        ]),
        [
          'ASCE/SEI 7-16 12.8.4.3, Eq. 12.8-14: Ax = (delta_max / (1.2 delta_avg))², 1 <= Ax <= 3, multiplying the accidental eccentricity of each floor.',
          'The clause takes Ax from the displacements with Ax = 1 (first column); re-running until Ax changes by at most 1e-4 (at most 30 runs) is common practice.',
        ],
      ),
    )
  }

  const sc = d.spectrumScaling
  if (sc) {
    const dirs = [sc.x, sc.y].filter((x): x is NonNullable<typeof x> => x !== null)
    out.push(
      make(
        'design-spectrum-scaling',
        'Response spectrum scaled to the ELF base shear',
        [
          col('direction', 'direction'),
          col('elastic', 'elastic CQC base shear', 'force'),
          col('Vt', 'Vt = elastic Ie/R', 'force'),
          col('V', 'ELF V', 'force'),
          col('forceScale', 'force scale'),
          col('driftScale', 'drift scale'),
          col('reason', 'reason'),
        ],
        dirs.map((s) => [
          s.direction.toUpperCase(),
          q(s.elasticBaseShear, 'force'),
          q(s.modalBaseShear, 'force'),
          q(s.elfBaseShear, 'force'),
          n(s.forceScale),
          n(s.driftScale),
          s.reason,
        ]),
        [sc.note],
      ),
    )
    if (sc.drifts.length > 0) {
      out.push(
        make(
          'design-spectrum-drifts',
          'Response spectrum design drifts per story',
          [
            col('story', 'story'),
            col('floor', 'floor'),
            col('x', 'design drift, X excitation', 'displacement'),
            col('y', 'design drift, Y excitation', 'displacement'),
            col('limit', 'allowable Delta_a', 'displacement'),
            col('verdict', 'verdict'),
          ],
          sc.drifts.map((r) => [story(r.floorId), name(r.floorId), q(r.x, 'displacement'), q(r.y, 'displacement'), q(r.limit, 'displacement'), r.verdict]),
          ['Largest CQC drift at the extreme points times Cd/R and the drift scale (12.9.1.4.2, 12.8.6).'],
        ),
      )
    }
  }

  out.push(
    make(
      'design-story-stiffness',
      'Story stiffness under the ELF pattern and soft stories',
      [
        col('story', 'story'),
        col('floor', 'floor'),
        col('direction', 'direction'),
        col('V', 'story shear', 'force'),
        col('drift', 'drift at CM', 'displacement'),
        col('k', 'story stiffness', 'stiffness'),
        col('above', 'k / k above'),
        col('mean', 'k / mean of 3 above'),
        col('label', 'classification'),
      ],
      d.storyStiffness.map((r) => [
        story(r.floorId),
        name(r.floorId),
        r.direction.toUpperCase(),
        q(r.storyShear, 'force'),
        q(r.driftAtCentreOfMass, 'displacement'),
        q(r.stiffness, 'stiffness'),
        n(r.ratioToAbove),
        n(r.ratioToAverageAbove),
        r.label === 'none' ? 'no soft story' : r.label === 'Type 1a' ? 'Type 1a soft story' : 'Type 1b extreme soft story',
      ]),
      [
        'ELF floor forces applied at the centres of mass; stiffness = story shear / drift at the story centre of mass.',
        'ASCE/SEI 7-16 Table 12.3-2: Type 1a below 70 % of the story above or 80 % of the mean of the three above; Type 1b at 60 % / 70 %.',
      ],
    ),
  )

  const tf = d.torsionalFlexibility
  if (tf) {
    out.push(
      make(
        'design-torsional-flexibility',
        'Torsional flexibility: first torsional period against the first translational periods',
        [
          col('direction', 'direction'),
          col('mode', 'translational mode'),
          col('T', 'translational T', 'period'),
          col('torsionMode', 'torsional mode'),
          col('Tt', 'torsional T', 'period'),
          col('ratio', 'T torsion / T translation'),
          col('limit', 'limit'),
          col('flag', 'flag'),
        ],
        (['x', 'y'] as const).map((k) => [
          k.toUpperCase(),
          tf.translationalMode[k],
          q(tf.translationalPeriod[k], 'period'),
          tf.firstTorsionalMode,
          q(tf.torsionalPeriod, 'period'),
          n(tf.ratio[k]),
          tf.limit,
          tf.firstModeTorsional
            ? 'first mode torsional'
            : (tf.ratio[k] ?? 0) > tf.limit
              ? 'torsionally flexible'
              : 'no',
        ]),
        [
          'A mode is mainly torsional when at least half its kinetic energy is rotation about the floor centres of mass (common practice).',
          'Flagged when the first mode is torsional or the ratio exceeds the limit (settings.torsionalFlexibilityLimit, default 1.0).',
        ],
      ),
    )
  }

  if (d.consequences.length > 0) {
    out.push(
      make(
        'design-consequences',
        'Consequences of irregularities by seismic design category',
        [
          col('irregularity', 'irregularity'),
          col('found', 'found here'),
          col('categories', 'design categories'),
          col('consequence', 'consequence'),
          col('applies', 'applies'),
          col('clause', 'clause'),
          col('source', 'source'),
        ],
        d.consequences.map((c) => [
          c.irregularity,
          c.found ? 'yes' : 'no',
          c.categories.join(', '),
          c.consequence,
          c.applies === null ? 'set a design category' : c.applies ? 'yes' : 'no',
          c.clause,
          c.source,
        ]),
        ['All rows from memory until checked against the standard.'],
      ),
    )
  }
  return out
}
