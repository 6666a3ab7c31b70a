import { describe, expect, it } from 'vitest'
import { balanceScore, suggestBalance } from '@/engine/balance'
import { demoProject } from '@/model/demo'
import { eccentricOneStorey } from '../helpers/projectBuilder'

describe('balanceScore', () => {
  it('is the RMS over floors of e/r in both directions', () => {
    const c = (ex: number, ey: number) => ({
      floorId: 'f',
      centreOfMass: { x: 0, y: 0 },
      centreOfRigidity: { x: ex, y: ey },
      storyCentreOfStiffness: null,
      eccentricity: { x: ex, y: ey },
      torsionalStiffness: 1,
      lateralStiffness: { x: 1, y: 1 },
      torsionalRadius: { x: 2, y: 4 },
      radiusOfGyration: 1,
      hasXYCoupling: false,
    })
    // hand calculation: floor 1 (1/2)² + (2/4)² = 0.5, floor 2 0; mean 0.25 -> 0.5
    const { score, worst } = balanceScore([c(1, 2), c(0, 0)])
    expect(score).toBeCloseTo(0.5, 12)
    expect(worst).toBeCloseTo(0.5, 12)
  })
})

describe('suggestBalance', () => {
  // METHODS.md §8 one-storey case (y frames 2k at x = 0 and k at x = 20, CM at x = 10). For shear-type
  // elements on one storey the centre of rigidity is the stiffness-weighted mean position
  // x_cr = Σ k_i x_i / Σ k_i (common practice, no source), so the closed-form fixes are:
  //   move the 2k frame to x = 5:      (2k·5 + k·20) / 3k = 10
  //   stiffen the k frame by 2:        (2k·20) / 4k = 10
  const result = suggestBalance(eccentricOneStorey(), { count: 20, maxMove: 10, withDriftRatios: true, maxChanges: 1 })

  it('finds the closed-form move of the stiff frame line', () => {
    const move = result.suggestions.find((s) => s.elementId === 'yw0' && s.action === 'move')
    expect(move).toBeDefined()
    expect((move!.element.p1.x + move!.element.p2.x) / 2).toBeCloseTo(5, 6)
    expect(move!.scoreAfter).toBeLessThan(1e-6)
    expect(move!.description).toContain('towards +x')
  })

  it('finds the closed-form stiffness factor of the soft frame line', () => {
    const stiffen = result.suggestions.find((s) => s.elementId === 'yw20' && s.action === 'stiffness')
    expect(stiffen).toBeDefined()
    expect(stiffen!.amount).toBeCloseTo(2, 6)
    const el = stiffen!.element
    const k = 'stiffness' in el ? el.stiffness : null
    expect(k?.kind === 'direct' ? k.storyStiffness : NaN).toBeCloseTo(2e8, 0)
  })

  it('starts from the eccentricity of the one-storey case', () => {
    // METHODS.md §8: e0x = 3.3333 m, r_x = 10.2740 m, e_y = 0 -> score = 3.3333 / 10.2740
    expect(result.score).toBeCloseTo(3.33333 / 10.274, 3)
  })

  it('reports drift ratios that improve when the plan is balanced', () => {
    const move = result.suggestions.find((s) => s.elementId === 'yw0' && s.action === 'move')!
    // METHODS.md §8 gives 1.36111 for the worst case with accidental eccentricity before the change.
    expect(move.worstDriftRatioBefore).toBeCloseTo(1.36111, 4)
    expect(move.worstDriftRatioAfter!).toBeLessThan(move.worstDriftRatioBefore!)
    expect(result.caution).toMatch(/licensed structural engineer/)
  })

  it('never changes the project it is given', () => {
    const project = eccentricOneStorey()
    const before = JSON.stringify(project)
    suggestBalance(project, { withDriftRatios: false })
    expect(JSON.stringify(project)).toBe(before)
  })

  it('ranks suggestions for the demo building best first and all improve it', () => {
    const demo = suggestBalance(demoProject(), { withDriftRatios: false })
    expect(demo.suggestions.length).toBeGreaterThan(0)
    for (let i = 1; i < demo.suggestions.length; i++) {
      expect(demo.suggestions[i]!.scoreAfter).toBeGreaterThanOrEqual(demo.suggestions[i - 1]!.scoreAfter)
    }
    for (const s of demo.suggestions) expect(s.scoreAfter).toBeLessThan(demo.score)
  })

  it('only thickens or thins the walls of the demo core (one wall group), never moves a leg off it', () => {
    const demo = suggestBalance(demoProject(), { withDriftRatios: false })
    const coreMoves = demo.suggestions.filter((s) => s.elementId.startsWith('core-') && s.action !== 'thickness')
    expect(coreMoves).toEqual([])
  })

  it('says why when the model is a mechanism', () => {
    const p = eccentricOneStorey()
    const { yw0: _a, yw20: _b, ...onlyX } = p.frameLines
    const r = suggestBalance({ ...p, frameLines: onlyX })
    expect(r.suggestions).toEqual([])
    expect(r.message).toMatch(/mechanism/)
  })
})
