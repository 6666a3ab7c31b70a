import { describe, expect, it } from 'vitest'
import { CAUTION } from '@/model'
import type { AnalysisSettings } from '@/model'
import { analyzeProject } from '@/engine'
import { resolveCriterionSet } from '@/engine/criteria'
import {
  dominantPeriod,
  endPointGroups,
  runStaticTorsion,
  verticalDistribution,
  verticalDistributionExponent,
} from '@/engine/loads'
import type { StaticTorsionResult } from '@/engine/results'
import {
  buildTestStructure,
  denseModes,
  denseSolver,
  multiStoreyEccentric,
  oneStoreyEccentric,
  shearElement,
} from './torsionFixtures'
import { generateBuilding, transformProject } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

const settings = (over: Partial<AnalysisSettings> = {}): AnalysisSettings => ({
  criterionSet: 'asce7-16',
  accidentalEccentricity: 0.05,
  damping: 0.05,
  spectrum: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
  directionCombination: 'srss',
  ...over,
})

const caseOf = (r: StaticTorsionResult, id: string) => {
  const c = r.cases.find((k) => k.id === id)
  if (!c) throw new Error(`no case ${id}`)
  return c
}

describe('verticalDistributionExponent', () => {
  it('follows k = 1 below 0.5 s, 2 above 2.5 s, linear between', () => {
    // METHODS.md §1, ASCE/SEI 7-16 12.8.3 check values (T -> k)
    expect(verticalDistributionExponent(0.3)).toBeCloseTo(1, 12)
    expect(verticalDistributionExponent(1.0)).toBeCloseTo(1.25, 12)
    expect(verticalDistributionExponent(1.5)).toBeCloseTo(1.5, 12)
    expect(verticalDistributionExponent(3.0)).toBeCloseTo(2, 12)
    expect(verticalDistributionExponent(0.5)).toBeCloseTo(1, 12)
    expect(verticalDistributionExponent(2.5)).toBeCloseTo(2, 12)
  })
})

describe('verticalDistribution', () => {
  it('gives F_i = V w_i z_i^k / sum w z^k that sums to V', () => {
    // ASCE/SEI 7-16 Eqs 12.8-11/12.8-12: equal masses at z = 3.5, 7, 10.5 m, k = 2 -> 1:4:9
    const s = multiStoreyEccentric([1e8, 1e8, 1e8])
    const F = verticalDistribution(s, 14e6, 2)
    expect(F[0]! / 1e6).toBeCloseTo(1, 9)
    expect(F[1]! / 1e6).toBeCloseTo(4, 9)
    expect(F[2]! / 1e6).toBeCloseTo(9, 9)
  })
})

describe('endPointGroups', () => {
  it('collects tied vertices at the two ends across the load', () => {
    const s = oneStoreyEccentric()
    const f = s.floors[0]!
    // load along y: ends are x = 0 (vertices 0, 3) and x = 20 (vertices 1, 2) -- common practice
    expect(endPointGroups(f, 'y')).toEqual({ low: [0, 3], high: [1, 2] })
    expect(endPointGroups(f, 'x')).toEqual({ low: [0, 1], high: [2, 3] })
  })
})

describe('runStaticTorsion', () => {
  const s = oneStoreyEccentric()
  const solver = denseSolver(s)
  const modes = denseModes(s)

  it('reproduces the one-storey eccentric edge displacements without eccentricity', () => {
    const r = runStaticTorsion(s, solver, modes, settings({ accidentalEccentricity: 0 }), null)
    const c = caseOf(r, 'Y+e')
    const per1000kN = 1e6 / r.baseShear.y
    const row = c.stories[0]!
    // METHODS.md §8 (derived): Fy = 1000 kN at CM -> 2.63158 and 4.73684 mm, ratio 1.28571
    expect(row.displacementMax * per1000kN * 1000).toBeCloseTo(4.73684, 4)
    expect(2 * row.displacementAvg * per1000kN * 1000 - 4.73684).toBeCloseTo(2.63158, 4)
    expect(row.displacementRatio).toBeCloseTo(1.28571, 5)
    expect(row.driftRatio).toBeCloseTo(1.28571, 5)
  })

  it('gives ratios 1.36111 / 1.20588 and Ax = 1.28654 with a ±1.0 m accidental shift', () => {
    const set = resolveCriterionSet(settings()).set
    const r = runStaticTorsion(s, solver, modes, settings(), set)
    expect(r.eccentricityFraction).toBeCloseTo(0.05, 12)
    const plus = caseOf(r, 'Y+e')
    const minus = caseOf(r, 'Y-e')
    // Y+e moves the load point towards +x by 0.05 * 20 m = 1.0 m (MODELING.md)
    expect(plus.loadPoints[0]!.x).toBeCloseTo(11, 12)
    expect(minus.loadPoints[0]!.x).toBeCloseTo(9, 12)
    const per1000kN = (1e6 / r.baseShear.y) * 1000
    // METHODS.md §8 (derived): +1.0 m shift -> edges 2.42105 and 5.15789 mm, ratio 1.36111,
    // Ax 1.28654
    expect(plus.stories[0]!.driftMax * per1000kN).toBeCloseTo(5.15789, 4)
    expect(plus.stories[0]!.driftRatio).toBeCloseTo(1.36111, 5)
    expect(plus.stories[0]!.amplification!).toBeCloseTo(1.28654, 5)
    // -1.0 m shift -> ratio 1.20588
    expect(minus.stories[0]!.driftRatio).toBeCloseTo(1.20588, 5)
    // ASCE/SEI 7-16 Table 12.3-1: 1.36111 > 1.2 is Type 1a, <= 1.4 not Type 1b
    const rows = r.criterion.rows.filter((w) => w.caseId === 'Y+e')
    const type1a = rows.find((w) => w.clause.includes('Type 1a'))!
    const type1b = rows.find((w) => w.clause.includes('Type 1b'))!
    expect(type1a.verdict).toBe('fail')
    expect(type1a.label).toContain('Type 1a')
    expect(type1b.verdict).toBe('pass')
    expect(r.criterion.overall).toBe('fail')
    expect(r.criterion.caution).toBe(CAUTION)
    expect(r.criterion.source).toContain('ASCE/SEI 7-16')
  })

  it('uses the criterion set eccentricity over the settings value', () => {
    const nbcc = resolveCriterionSet(settings({ criterionSet: 'nbcc-2015' })).set
    const r = runStaticTorsion(s, solver, modes, settings({ accidentalEccentricity: 0.05 }), nbcc)
    expect(r.eccentricityFraction).toBeCloseTo(0.1, 12)
    expect(r.eccentricitySource).toBe('criterion-set')
    // ±0.10 Dn (NBCC 2015 4.1.8.11, METHODS.md §7): load point at 10 + 2 m
    expect(caseOf(r, 'Y+e').loadPoints[0]!.x).toBeCloseTo(12, 12)
    const r2 = runStaticTorsion(s, solver, modes, settings({ accidentalEccentricity: 0.07 }), null)
    expect(r2.eccentricityFraction).toBeCloseTo(0.07, 12)
    expect(r2.eccentricitySource).toBe('settings')
  })

  it('keeps a symmetric building at ratio 1 without eccentricity and above 1 with it', () => {
    // closed form: a doubly symmetric plan does not twist under a load through the CM
    const sym = buildTestStructure(
      [{ mass: 1e5, L: 20, B: 10, height: 3 }],
      [
        shearElement({ x: 0, y: 0 }, { x: 0, y: 1 }, [1e8]),
        shearElement({ x: 20, y: 0 }, { x: 0, y: 1 }, [1e8]),
        shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [1e8]),
        shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [1e8]),
      ],
    )
    const m = denseModes(sym)
    const noEcc = settings({ accidentalEccentricity: 0 })
    const r0 = runStaticTorsion(sym, denseSolver(sym), m, noEcc, null)
    for (const c of r0.cases) expect(c.stories[0]!.driftRatio).toBeCloseTo(1, 10)
    // with e = 1 m: K_y = 2k, K_T = 2k*10² + 2k*5² = 250k; theta = F e / K_T; edge ratio
    // (delta_c + theta*10)/delta_c with delta_c = F/(2k): 1 + 2k*10/250k = 1.08 (hand calculation)
    const r1 = runStaticTorsion(sym, denseSolver(sym), m, settings(), null)
    expect(caseOf(r1, 'Y+e').stories[0]!.driftRatio).toBeCloseTo(1.08, 10)
  })

  it('does not change drift ratios when the base shear is scaled', () => {
    const ms = multiStoreyEccentric([3e8, 2.5e8, 2e8, 1.5e8, 1e8])
    const mm = denseModes(ms)
    const sv = denseSolver(ms)
    const set = resolveCriterionSet(settings()).set
    const a = runStaticTorsion(ms, sv, mm, settings(), set)
    const b = runStaticTorsion(
      ms,
      sv,
      mm,
      settings({ spectrum: { kind: 'asce7', SDS: 3.0, SD1: 1.8, TL: 8 } }),
      set,
    )
    // MODELING.md: the absolute base shear does not change the ratios (linear elastic)
    expect(b.baseShear.x / a.baseShear.x).toBeCloseTo(3, 9)
    a.cases.forEach((c, ci) => {
      c.stories.forEach((row, i) => {
        const other = b.cases[ci]!.stories[i]!
        expect(other.driftRatio).toBeCloseTo(row.driftRatio, 10)
        expect(other.displacementRatio).toBeCloseTo(row.displacementRatio, 10)
        expect(other.driftMax / row.driftMax).toBeCloseTo(3, 9)
      })
    })
    expect(b.criterion.rows.map((w) => w.verdict)).toEqual(a.criterion.rows.map((w) => w.verdict))
  })

  it('gives the same ratios when the plan origin is moved', () => {
    // MODELING.md: nothing shown to the user depends on where O lies
    const build = (dx: number, dy: number) =>
      buildTestStructure(
        [0, 1, 2].map(() => ({ mass: 1e5, x0: dx, y0: dy, L: 20, B: 10, height: 3.5 })),
        [
          shearElement({ x: dx, y: dy }, { x: 0, y: 1 }, [4e8, 3e8, 2e8]),
          shearElement({ x: dx + 20, y: dy }, { x: 0, y: 1 }, [2e8, 1.5e8, 1e8]),
          shearElement({ x: dx, y: dy }, { x: 1, y: 0 }, [2e8, 1.5e8, 1e8]),
          shearElement({ x: dx, y: dy + 10 }, { x: 1, y: 0 }, [2e8, 1.5e8, 1e8]),
        ],
      )
    const s1 = build(0, 0)
    const s2 = build(120, -45)
    const r1 = runStaticTorsion(s1, denseSolver(s1), denseModes(s1), settings(), null)
    const r2 = runStaticTorsion(s2, denseSolver(s2), denseModes(s2), settings(), null)
    r1.cases.forEach((c, ci) =>
      c.stories.forEach((row, i) => {
        const o = r2.cases[ci]!.stories[i]!
        expect(o.driftRatio).toBeCloseTo(row.driftRatio, 8)
        expect(o.driftMax / row.driftMax).toBeCloseTo(1, 8)
      }),
    )
  })

  it('forms story drifts as differences of floor displacements at the same plan point', () => {
    const ms = multiStoreyEccentric([3e8, 2e8, 1e8])
    const r = runStaticTorsion(ms, denseSolver(ms), denseModes(ms), settings(), null)
    const c = caseOf(r, 'X+e')
    const u = c.displacements
    // top story, corner (20, 10): (u_x3 - th3*10) - (u_x2 - th2*10)  (MODELING.md plan-point rule)
    const d = u[6]! - u[8]! * 10 - (u[3]! - u[5]! * 10)
    const d0 = u[6]! - u[8]! * 0 - (u[3]! - u[5]! * 0)
    expect(c.stories[2]!.driftMax).toBeCloseTo(Math.max(d, d0), 14)
    expect(c.stories[2]!.driftIndex).toBeCloseTo(c.stories[2]!.driftMax / 3.5, 14)
  })

  it('takes the period of the mode with the largest effective mass ratio', () => {
    const ms = multiStoreyEccentric([3e8, 2e8, 1e8])
    const mm = denseModes(ms)
    const r = runStaticTorsion(ms, denseSolver(ms), mm, settings(), null)
    expect(r.periodUsed.x).toBeCloseTo(dominantPeriod(mm, 'x'), 12)
    expect(r.exponent.x).toBeCloseTo(verticalDistributionExponent(r.periodUsed.x), 12)
    // the first x mode of a uniform-mass shear building carries most x mass (common practice)
    let best = 0
    const ex = mm.effectiveMassRatio.x
    for (let m = 1; m < mm.count; m++) if (ex[m]! > ex[best]!) best = m
    expect(r.periodUsed.x).toBeCloseTo(mm.periods[best]!, 12)
  })
})

describe('runStaticTorsion through analyzeProject', () => {
  // METHODS.md §8 one-storey case built as a project: frame lines with direct story stiffness
  const k = 1e8
  const project = (criterionSet: string, dx = 0, dy = 0) =>
    projectBuilder({ floors: 1 })
      .rectSlab({ x: dx, y: dy, width: 20, depth: 10, areaMass: 1e5 / 200 })
      .frameLine({ p1: { x: dx, y: dy }, p2: { x: dx, y: dy + 10 }, storyStiffness: 2 * k })
      .frameLine({ p1: { x: dx + 20, y: dy }, p2: { x: dx + 20, y: dy + 10 }, storyStiffness: k })
      .frameLine({ p1: { x: dx, y: dy }, p2: { x: dx + 20, y: dy }, storyStiffness: k })
      .frameLine({ p1: { x: dx, y: dy + 10 }, p2: { x: dx + 20, y: dy + 10 }, storyStiffness: k })
      .settings({ criterionSet })
      .build()

  it('reproduces the ratios 1.36111 / 1.20588, Type 1a and Ax = 1.28654 (ASCE 7-16)', () => {
    const r = analyzeProject(project('asce7-16'), { spectrum: false })
    expect(r.status).toBe('ok')
    const t = r.torsion!
    // METHODS.md §8 (derived); ASCE/SEI 7-16 Table 12.3-1 and Eq. 12.8-14
    expect(caseOf(t, 'Y+e').stories[0]!.driftRatio).toBeCloseTo(1.36111, 5)
    expect(caseOf(t, 'Y-e').stories[0]!.driftRatio).toBeCloseTo(1.20588, 5)
    expect(caseOf(t, 'Y+e').stories[0]!.amplification!).toBeCloseTo(1.28654, 5)
    expect(t.criterion.overall).toBe('fail')
    expect(t.criterion.caution).toBe(CAUTION)
    expect(r.regularity).toBeNull()
  })

  it('fails EN 1998-1 Eq. 4.1a and passes Eq. 4.1b', () => {
    const r = analyzeProject(project('en1998-1', 35, -12), { spectrum: false })
    const rows = r.regularity!.rows
    // METHODS.md §8 (derived): e0x = 3.3333 > 0.30 r_x = 3.0822; r_x = 10.274 >= l_s = 6.455
    const a = rows.find((w) => w.caseId === 'x' && w.clause.includes('4.1a'))!
    const b = rows.find((w) => w.caseId === 'x' && w.clause.includes('4.1b'))!
    expect(a.value).toBeCloseTo(3.33333, 4)
    expect(a.limit).toBeCloseTo(3.0822, 3)
    expect(a.verdict).toBe('fail')
    expect(b.value).toBeCloseTo(10.274, 3)
    expect(b.verdict).toBe('pass')
    expect(r.regularity!.caution).toBe(CAUTION)
    // the plan shift by (35, -12) does not change the static ratios (MODELING.md)
    expect(caseOf(r.torsion!, 'Y+e').stories[0]!.driftRatio).toBeCloseTo(1.36111, 5)
  })

  it('reports an unknown criterion set as an issue and still computes the ratios', () => {
    const r = analyzeProject(project('no-such-set'), { spectrum: false })
    expect(r.issues.map((i) => i.code)).toContain('criterion-unknown')
    expect(r.torsion!.criterion.overall).toBe('not-applicable')
    expect(caseOf(r.torsion!, 'Y-e').stories[0]!.driftRatio).toBeCloseTo(1.20588, 5)
  })
})

describe('runStaticTorsion on generated buildings', () => {
  it('keeps drift ratios when the spectrum (and so the base shear) is scaled', () => {
    // MODELING.md: the absolute base shear does not change the ratios (linear elastic)
    const p = generateBuilding({ floors: 12, seed: 5 })
    const a = analyzeProject(p, { spectrum: false })
    const b = analyzeProject(
      { ...p, settings: { ...p.settings, spectrum: { kind: 'asce7', SDS: 2.2, SD1: 1.3, TL: 8 } } },
      { spectrum: false },
    )
    expect(a.status).toBe('ok')
    const ta = a.torsion!
    const tb = b.torsion!
    expect(tb.baseShear.x / ta.baseShear.x).not.toBeCloseTo(1, 2)
    ta.cases.forEach((c, ci) =>
      c.stories.forEach((row, i) => {
        const o = tb.cases[ci]!.stories[i]!
        expect(o.driftRatio).toBeCloseTo(row.driftRatio, 9)
        expect(o.displacementRatio).toBeCloseTo(row.displacementRatio, 9)
      }),
    )
  })

  it('keeps drift ratios when the plan is moved', () => {
    // MODELING.md: nothing shown to the user depends on where O lies
    const p = generateBuilding({ floors: 8, seed: 11 })
    const q = transformProject(p, { dx: 250, dy: -90, angle: 0 })
    const a = analyzeProject(p, { spectrum: false }).torsion!
    const b = analyzeProject(q, { spectrum: false }).torsion!
    a.cases.forEach((c, ci) =>
      c.stories.forEach((row, i) => {
        expect(b.cases[ci]!.stories[i]!.driftRatio).toBeCloseTo(row.driftRatio, 7)
        expect(b.cases[ci]!.stories[i]!.driftMax / row.driftMax).toBeCloseTo(1, 7)
      }),
    )
  })
})

describe('runStaticTorsion on a story that mostly twists', () => {
  it('reports a finite large ratio and Ax = 3 when the story mostly twists', () => {
    // one y-wall through the CM line plus a far x-pair: under Y+e the plan turns about a point
    // inside the plan, so the ends move in opposite directions (hand reasoning: ratio ~ 200)
    const s = buildTestStructure(
      [{ mass: 1e5, L: 20, B: 10, height: 3 }],
      [
        shearElement({ x: 10, y: 0 }, { x: 0, y: 1 }, [1e9]),
        shearElement({ x: 0, y: 0 }, { x: 1, y: 0 }, [1e6]),
        shearElement({ x: 0, y: 10 }, { x: 1, y: 0 }, [1e6]),
      ],
    )
    const set = resolveCriterionSet(settings()).set
    const r = runStaticTorsion(s, denseSolver(s), denseModes(s), settings(), set)
    const row = caseOf(r, 'Y+e').stories[0]!
    expect(Number.isFinite(row.driftRatio)).toBe(true)
    expect(row.driftRatio).toBeGreaterThan(1.4)
    expect(row.amplification!).toBeCloseTo(3, 12) // ASCE/SEI 7-16 12.8.4.3 cap
    const rows = r.criterion.rows.filter((w) => w.caseId === 'Y+e' && w.comparison)
    expect(rows.every((w) => w.verdict === 'fail')).toBe(true)
  })
})
