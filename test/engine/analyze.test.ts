import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION } from '@/model'
import { demoProject } from '@/model/demo'
import { generateBuilding } from '../helpers/generateBuilding'
import { projectBuilder } from '../helpers/projectBuilder'

describe('analyzeProject', () => {
  it('analyzes the demo building completely, with all 21 modes and the caution', () => {
    const r = analyzeProject(demoProject())
    expect(r.status).toBe('ok')
    expect(r.modes?.count).toBe(21)
    expect(r.modes?.complete).toBe(true)
    expect(r.caution).toBe(CAUTION)
    expect(r.torsion?.criterion.caution).toBe(CAUTION)
    // effective masses sum to the total mass when all modes are kept (common practice identity)
    expect(r.modes!.cumulativeMassRatio.x[20]).toBeCloseTo(1, 9)
    expect(r.issues.filter((i) => i.code === 'eigen-incomplete')).toEqual([])
  })

  it('tells as information, not a warning, that a tall building keeps only the lowest modes', () => {
    const r = analyzeProject(generateBuilding({ floors: 70, seed: 3 }), { spectrum: false })
    expect(r.status).toBe('ok')
    // above 60 floors the engine keeps the lowest modes up to 90% of the mass (docs/dynamics.md)
    expect(r.modes!.complete).toBe(false)
    const note = r.issues.find((i) => i.code === 'eigen-incomplete')
    expect(note?.severity).toBe('info')
    expect(note?.message).toMatch(/lowest \d+ of 210 modes, reaching (9\d|100)\.\d% \(X\)/)
  })
})

describe('analyzeProject completeness', () => {
  /** One storey, three frame lines, all mass in one point mass (polarInertia optional). */
  const pointMassOnly = (polarInertia?: number) =>
    projectBuilder({ floors: 1 })
      .pointMass({ at: { x: 5, y: 3 }, mass: 20000, ...(polarInertia !== undefined ? { polarInertia } : {}) })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 0, y: 6 }, storyStiffness: 2e8 })
      .frameLine({ p1: { x: 10, y: 0 }, p2: { x: 10, y: 6 }, storyStiffness: 1e8 })
      .frameLine({ p1: { x: 0, y: 0 }, p2: { x: 10, y: 0 }, storyStiffness: 1e8 })
      .build()

  it('is incomplete, not ok, when the only mass is a point mass without polarInertia (was: ok, 0 of 3 modes, zero base shear, PASS)', () => {
    const r = analyzeProject(pointMassOnly())
    expect(r.status).toBe('incomplete')
    expect(r.modes?.count).toBe(0)
    // nothing that needs a period is shown as a number or a verdict
    expect(r.torsion).toBeNull()
    expect(r.spectrum).toBeNull()
    const why = r.issues.find((i) => i.code === 'incomplete')
    expect(why?.severity).toBe('error')
    expect(why?.message).toMatch(/floor 'Level 1' \(L1\) has no rotational inertia .*give the point mass a polar inertia or add a slab/)
  })

  it('gives no PASS and is incomplete when a floor has no plan extent across the load (single point mass with polarInertia)', () => {
    const r = analyzeProject(pointMassOnly(2e5))
    // with rotary inertia all 3 modes of the one-storey building exist
    expect(r.modes?.count).toBe(3)
    expect(r.status).toBe('incomplete')
    expect(r.torsion?.criterion.overall).toBe('not-checked')
    expect(r.torsion?.criterion.rows.filter((row) => row.verdict === 'pass')).toEqual([])
    expect(r.issues.find((i) => i.code === 'incomplete')?.message).toMatch(
      /torsion check: 8 checks on floor L1 could not be made \(the floor has no plan extent across a load along x/,
    )
  })

  it('keeps status ok with positive base shears on a slab building (no false incomplete)', () => {
    const r = analyzeProject(demoProject())
    expect(r.status).toBe('ok')
    expect(r.issues.filter((i) => i.code === 'incomplete')).toEqual([])
    expect(r.spectrum!.baseShear.x.cqc).toBeGreaterThan(0)
    expect(r.spectrum!.baseShear.y.cqc).toBeGreaterThan(0)
  })
})
