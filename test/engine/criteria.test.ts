import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { CAUTION, parseProject } from '@/model'
import { analyzeProject } from '@/engine'
import type { AnalysisSettings, CriterionSetSpec } from '@/model'
import {
  BUILT_IN_CRITERION_SETS,
  amplificationFactor,
  evaluateRegularity,
  overallVerdict,
  resolveCriterionSet,
  scopeLine,
  torsionCheckRows,
} from '@/engine/criteria'
import type { FloorCentres, StoryTorsionRow } from '@/engine/results'
import { eccentricOneStorey } from '../helpers/projectBuilder'
import { denseSolver, oneStoreyEccentric } from './torsionFixtures'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

const row = (driftRatio: number, displacementRatio = driftRatio): StoryTorsionRow => ({
  floorId: 'F1',
  index: 0,
  driftMax: driftRatio,
  driftAvg: 1,
  driftRatio,
  displacementMax: displacementRatio,
  displacementAvg: 1,
  displacementRatio,
  amplification: null,
  driftIndex: 0.001,
})

/** Centres of one floor from the floor flexibility block, by the MODELING.md "Centres" formulas. */
function centresFromFlexibility(
  F: Float64Array,
  cm: { x: number; y: number },
  ls: number,
): FloorCentres {
  const ftt = F[8]!
  const xcr = -F[7]! / ftt
  const ycr = F[6]! / ftt
  // K_j = inv(F_j) (3x3 by cofactors)
  const [a, b, c, d, e, f, g, h, i] = Array.from(F) as [
    number, number, number, number, number, number, number, number, number,
  ]
  const det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g)
  const kxx = (e * i - f * h) / det
  const kyy = (a * i - c * g) / det
  const kt = 1 / ftt
  return {
    floorId: 'F1',
    centreOfMass: cm,
    centreOfRigidity: { x: xcr, y: ycr },
    storyCentreOfStiffness: null,
    eccentricity: { x: xcr - cm.x, y: ycr - cm.y },
    torsionalStiffness: kt,
    lateralStiffness: { x: kxx, y: kyy },
    torsionalRadius: { x: Math.sqrt(kt / kyy), y: Math.sqrt(kt / kxx) },
    radiusOfGyration: ls,
    hasXYCoupling: false,
  }
}

describe('resolveCriterionSet', () => {
  it('finds the built-in sets by id', () => {
    for (const id of ['asce7-16', 'en1998-1', 'nbcc-2015']) {
      const r = resolveCriterionSet(settings({ criterionSet: id }))
      expect(r.set?.id).toBe(id)
      expect(r.issues).toEqual([])
    }
  })

  it('returns criterion-unknown and no set for an unknown id', () => {
    const r = resolveCriterionSet(settings({ criterionSet: 'nope-99' }))
    expect(r.set).toBeNull()
    expect(r.issues.map((i) => i.code)).toEqual(['criterion-unknown'])
    expect(r.issues[0]!.message).toContain('nope-99')
  })

  it('prefers the override and treats none as no set', () => {
    expect(resolveCriterionSet(settings(), 'en1998-1').set?.id).toBe('en1998-1')
    expect(resolveCriterionSet(settings(), 'none')).toEqual({ set: null, issues: [] })
  })

  it('uses a user set from the settings the same way', () => {
    const mine: CriterionSetSpec = {
      id: 'office-rule',
      name: 'Office rule',
      source: 'Our own office rule, rev. 2 (invented)',
      irregularRatio: 1.3,
    }
    const r = resolveCriterionSet(settings({ criterionSet: 'office-rule', criterionSets: [mine] }))
    expect(r.set).toBe(mine)
    const rows = torsionCheckRows(r.set!, [
      { caseId: 'X+e', row: row(1.25) },
      { caseId: 'X-e', row: row(1.35) },
    ])
    expect(rows.map((w) => w.verdict)).toEqual(['pass', 'fail'])
    expect(rows[0]!.clause).toContain('Our own office rule')
  })

  it('reports a user set with a bad threshold, naming the field', () => {
    const bad: CriterionSetSpec = { id: 'bad', name: 'Bad', source: 'x', irregularRatio: -1 }
    const r = resolveCriterionSet(settings({ criterionSet: 'bad', criterionSets: [bad] }))
    expect(r.set).toBeNull()
    expect(r.issues[0]!.message).toContain('criterionSets[0].irregularRatio: must be a number > 0')
  })

  it('gives every built-in set a source naming a document and clause', () => {
    for (const b of BUILT_IN_CRITERION_SETS) {
      expect(b.spec.source).toMatch(/\d/)
      expect(b.spec.name.length).toBeGreaterThan(3)
    }
  })
})

describe('amplificationFactor', () => {
  it('matches Ax = (r/1.2)² clamped to [1, 3]', () => {
    const rule = resolveCriterionSet(settings()).set!.amplification!
    // METHODS.md §1, ASCE/SEI 7-16 Eq. 12.8-14 check values (derived)
    const cases: [number, number][] = [
      [1.1, 1.0],
      [1.3, 1.173611],
      [1.4, 1.361111],
      [1.5, 1.5625],
      [2.0, 2.777778],
      [2.2, 3.0],
    ]
    for (const [r, ax] of cases) expect(amplificationFactor(r, rule)).toBeCloseTo(ax, 6)
  })
})

describe('torsionCheckRows', () => {
  it('classifies ASCE 7 stories as regular, Type 1a and Type 1b', () => {
    const set = resolveCriterionSet(settings()).set!
    // ASCE/SEI 7-16 Table 12.3-1: > 1.2 Type 1a, > 1.4 Type 1b
    const rows = torsionCheckRows(set, [
      { caseId: 'X+e', row: row(1.1) },
      { caseId: 'X+e', row: row(1.3) },
      { caseId: 'X+e', row: row(1.5) },
    ])
    const labels = rows.filter((w) => w.clause.endsWith('Type 1a')).map((w) => w.label)
    expect(labels).toEqual([
      'no torsional irregularity',
      'Type 1a torsional irregularity',
      'Type 1b extreme torsional irregularity',
    ])
    const extreme = rows.filter((w) => w.clause.endsWith('Type 1b')).map((w) => w.verdict)
    expect(extreme).toEqual(['pass', 'pass', 'fail'])
  })

  it('uses displacements, not drifts, for the NBCC sensitivity ratio', () => {
    const set = resolveCriterionSet(settings({ criterionSet: 'nbcc-2015' })).set!
    // NBCC 2015 4.1.8.11(9): B_x = delta_max/delta_ave of displacements; B > 1.7 sensitive
    const rows = torsionCheckRows(set, [
      { caseId: 'Y+e', row: row(1.9, 1.6) },
      { caseId: 'Y-e', row: row(1.2, 1.75) },
    ])
    expect(rows.map((w) => w.value)).toEqual([1.6, 1.75])
    expect(rows.map((w) => w.verdict)).toEqual(['pass', 'fail'])
    expect(rows[1]!.label).toContain('torsionally sensitive')
  })
})

describe('evaluateRegularity', () => {
  const s = oneStoreyEccentric()
  const F = denseSolver(s).floorFlexibility(0)
  const f0 = s.floors[0]!
  const centres = [centresFromFlexibility(F, f0.centreOfMass, f0.radiusOfGyration)]

  it('fails 4.1a and passes 4.1b for the one-storey eccentric case', () => {
    // METHODS.md §8 (derived): CR = (6.6667, 5), e0x = 3.3333 m, r_x = 10.2740 m, r_y = 12.5831 m,
    // l_s = 6.4550 m; 0.30 r_x = 3.0822 -> EN 1998-1 Eq. 4.1a fails, Eq. 4.1b passes
    expect(centres[0]!.centreOfRigidity.x).toBeCloseTo(6.66667, 4)
    expect(centres[0]!.torsionalRadius.x).toBeCloseTo(10.274, 3)
    expect(centres[0]!.torsionalRadius.y).toBeCloseTo(12.5831, 4)
    const set = resolveCriterionSet(settings({ criterionSet: 'en1998-1' })).set!
    const ev = evaluateRegularity(s, centres, set)!
    const ecc = ev.rows.find((w) => w.caseId === 'x' && w.clause.includes('4.1a'))!
    const rad = ev.rows.find((w) => w.caseId === 'x' && w.clause.includes('4.1b'))!
    expect(ecc.value).toBeCloseTo(3.33333, 4)
    expect(ecc.limit).toBeCloseTo(3.0822, 4)
    expect(ecc.verdict).toBe('fail')
    expect(rad.value).toBeCloseTo(10.274, 3)
    expect(rad.limit).toBeCloseTo(6.455, 3)
    expect(rad.verdict).toBe('pass')
    // along y the CR lies on the CM: e0y = 0 passes
    expect(ev.rows.find((w) => w.caseId === 'y' && w.clause.includes('4.1a'))!.verdict).toBe('pass')
    expect(ev.overall).toBe('fail')
    expect(ev.caution).toBe(CAUTION)
    expect(ev.source).toContain('EN 1998-1')
  })

  it('returns null for a set without regularity rules', () => {
    const set = resolveCriterionSet(settings()).set!
    expect(evaluateRegularity(s, centres, set)).toBeNull()
  })
})

describe('torsionCheckRows without movement', () => {
  it('marks a story with no drift at the extreme points as not checked, never pass (was: not applicable, overall PASS)', () => {
    const set = resolveCriterionSet(settings()).set!
    const still: StoryTorsionRow = { ...row(1), driftMax: 0, driftAvg: 0, driftRatio: 1 }
    const moving: StoryTorsionRow = { ...row(1), floorId: 'L2', index: 1 }
    const rows = torsionCheckRows(set, [{ caseId: 'X+e', row: still }, { caseId: 'X+e', row: moving }])
    // common practice: a ratio of two zero drifts carries no information
    expect(rows.filter((w) => w.comparison && w.floorId === 'F1').map((w) => w.verdict)).toEqual([
      'not-checked',
      'not-checked',
    ])
    // the other story passes ASCE/SEI 7-16 Table 12.3-1 Type 1a (ratio 1 <= 1.2), but a partial pass is not a pass
    expect(rows.some((w) => w.floorId === 'L2' && w.verdict === 'pass')).toBe(true)
    expect(overallVerdict(rows)).toBe('not-checked')
  })

  it('marks a story the loads module flags as not checkable as not checked, with the reason as label', () => {
    const set = resolveCriterionSet(settings()).set!
    const rows = torsionCheckRows(set, [{ caseId: 'Y-e', row: row(1), notCheckable: 'no plan extent' }])
    expect(rows.filter((w) => w.comparison).map((w) => [w.verdict, w.label])).toEqual([
      ['not-checked', 'not checked: no plan extent'],
      ['not-checked', 'not checked: no plan extent'],
    ])
  })
})

describe('user criterion sets from a project file', () => {
  it('load with ratioQuantity and evaluate on displacements', () => {
    const raw = JSON.parse(readFileSync('public/examples/corner-block.json', 'utf8')) as {
      settings: Record<string, unknown>
    }
    raw.settings.criterionSet = 'office-b'
    raw.settings.criterionSets = [
      {
        id: 'office-b',
        name: 'Office displacement rule',
        source: 'Invented office rule for this test',
        irregularRatio: 1.5,
        ratioQuantity: 'displacement',
        accidentalEccentricity: 0.1,
      },
    ]
    const parsed = parseProject(raw)
    expect(parsed.ok).toBe(true)
    if (!parsed.ok) return
    const r = resolveCriterionSet(parsed.project.settings)
    expect(r.set?.ratioQuantity).toBe('displacement')
    const res = analyzeProject(parsed.project, { spectrum: false })
    expect(res.torsion!.eccentricityFraction).toBeCloseTo(0.1, 12)
    const row = res.torsion!.criterion.rows[0]!
    const story = res.torsion!.cases[0]!.stories[0]!
    // the row's value is the displacement ratio, not the drift ratio (set data, ratioQuantity)
    expect(row.value).toBeCloseTo(story.displacementRatio, 12)
    expect(res.torsion!.criterion.source).toBe('Invented office rule for this test')
  })

  it('refuses an unknown ratioQuantity at load, naming the field', () => {
    const raw = JSON.parse(readFileSync('public/examples/corner-block.json', 'utf8')) as {
      settings: Record<string, unknown>
    }
    raw.settings.criterionSets = [
      { id: 'x', name: 'x', source: 'x', irregularRatio: 1.2, ratioQuantity: 'rotation' },
    ]
    const parsed = parseProject(raw)
    expect(parsed.ok).toBe(false)
    if (parsed.ok) return
    expect(parsed.errors.join('\n')).toContain('ratioQuantity')
  })
})

describe('plan-regularity scope', () => {
  it('never calls a pass "regular in plan" and lists the conditions it did not check', () => {
    // EN 1998-1:2004 4.2.3.2: regularity in plan needs conditions (2) to (6); only (6) is evaluated
    // here (METHODS.md §2 lists (2)-(5): symmetry, compactness, diaphragm rigidity, slenderness <= 4)
    const p = eccentricOneStorey()
    const r = analyzeProject({ ...p, settings: { ...p.settings, criterionSet: 'en1998-1' } }, { spectrum: false })
    const reg = r.regularity!
    for (const row of reg.rows) expect(row.label).not.toBe('regular in plan')
    expect(reg.scope?.notChecked).toHaveLength(4)
    expect(reg.scope?.notChecked.join(' ')).toContain('4.2.3.2(5) slenderness')
    expect(scopeLine(reg)).toMatch(/^Checked: 4\.2\.3\.2\(6\) Eq\. 4\.1a.*Not checked/)
    // a set whose rows are the whole rule carries no scope
    const asce = analyzeProject({ ...p, settings: { ...p.settings, criterionSet: 'asce7-16' } }, { spectrum: false })
    expect(asce.torsion?.criterion.scope).toBeUndefined()
  })
})
