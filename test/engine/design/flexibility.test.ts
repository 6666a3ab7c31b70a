import { describe, expect, it } from 'vitest'
import { irregularityConsequences, softStoryChecks, storyStiffnessRows, torsionalFlexibility } from '@/engine/design/flexibility'
import type { ElfDirection } from '@/engine/design/types'
import { analyzeProject } from '@/engine'
import { denseSolver, multiStoreyEccentric } from '../torsionFixtures'
import { eccentricOneStorey } from '../../helpers/projectBuilder'

describe('torsionalFlexibility', () => {
  it('finds the torsional and translational periods of the one-storey case', () => {
    // METHODS.md §8 (derived) modes: 44.7214 (x), 50.8638 (y-torsion, Meff_y 0.934), 93.8769 rad/s
    const modes = analyzeProject(eccentricOneStorey(), { spectrum: false }).modes!
    const t = torsionalFlexibility(modes, 1.0)
    expect(t.firstTorsionalMode).toBe(3)
    expect(t.translationalMode).toEqual({ x: 1, y: 2 })
    expect(t.ratio.x!).toBeCloseTo(44.7214 / 93.8769, 5)
    expect(t.ratio.y!).toBeCloseTo(50.8638 / 93.8769, 5)
    expect(t.firstModeTorsional).toBe(false)
    expect(t.flagged).toBe(false)
    // a user limit below the ratio flags it (docs/criteria.md: ratio > limit)
    expect(torsionalFlexibility(modes, 0.5).flagged).toBe(true)
  })
})

describe('softStoryChecks', () => {
  it('labels Types 1a and 1b by the story above and the mean of three above', () => {
    // ASCE/SEI 7-16 Table 12.3-2: 1a < 70 % of above or < 80 % of the mean of three above; 1b 60 % / 70 %
    expect(softStoryChecks([50, 100, 100, 100, 100])[0]!.label).toBe('Type 1b') // 0.5 < 0.6
    expect(softStoryChecks([75, 100, 100, 100])[0]!.label).toBe('Type 1a') // 0.75 >= 0.7 but 0.75 < 0.8 of the mean
    expect(softStoryChecks([65, 100, 100, 100])[0]!.label).toBe('Type 1b') // 0.65 < 0.7 of the mean
    expect(softStoryChecks([85, 100, 100, 100])[0]!.label).toBe('none')
    // the mean test needs three stories above: only the ratio to the story above counts here
    const two = softStoryChecks([75, 100, 100])
    expect(two[0]!.ratioToAverageAbove).toBeNull()
    expect(two[0]!.label).toBe('none')
    expect(two[2]!.ratioToAbove).toBeNull()
  })
})

describe('storyStiffnessRows', () => {
  it('reproduces the closed-form story stiffness of a proportional shear building', () => {
    // METHODS.md §8 story: K at the CM = k[[2,0,0],[0,3,-10],[0,-10,350]]; a story shear at the CM
    // gives drift V/(2k) in x and V*350/(950k) in y (inverse of the 2x2 block); so k_x = 2k,
    // k_y = 950k/350. Story stiffnesses [0.5, 1, 1, 1, 1] x 1e8 N/m: the bottom story is Type 1b.
    const ks = [0.5e8, 1e8, 1e8, 1e8, 1e8]
    const s = multiStoreyEccentric(ks)
    const forces = Float64Array.from(s.floors, (f) => f.elevation * 1e5)
    const elf = { forces } as unknown as ElfDirection
    const rows = storyStiffnessRows(s, denseSolver(s), { x: elf, y: elf })
    rows.forEach((r) => {
      const k = ks[s.floors.findIndex((f) => f.id === r.floorId)]!
      expect(r.stiffness! / (r.direction === 'x' ? 2 * k : (950 * k) / 350)).toBeCloseTo(1, 9)
    })
    expect(rows.filter((r) => r.label !== 'none').map((r) => [r.direction, r.label])).toEqual([
      ['x', 'Type 1b'],
      ['y', 'Type 1b'],
    ])
  })
})

describe('irregularityConsequences', () => {
  it('marks rows as applying only for a found irregularity in a listed category', () => {
    // ASCE/SEI 7-16 12.3.3.1 (from memory): Type 1b not permitted in SDC E and F
    const found = { horizontal1a: true, horizontal1b: true, vertical1a: false, vertical1b: false }
    const e = irregularityConsequences(found, 'E')
    const notPermitted = e.find((c) => c.clause.endsWith('12.3.3.1') && c.irregularity === 'Horizontal Type 1b')!
    expect(notPermitted.applies).toBe(true)
    const inC = irregularityConsequences(found, 'C').find((c) => c.clause.endsWith('12.3.3.1') && c.irregularity === 'Horizontal Type 1b')!
    expect(inC.applies).toBe(false)
    // ASCE/SEI 7-16 12.8.4.3 (from memory): Ax applies from SDC C
    expect(irregularityConsequences(found, 'C').find((c) => c.clause.endsWith('12.8.4.3'))!.applies).toBe(true)
    // no category: applies is unknown (null); vertical rows not found
    const none = irregularityConsequences(found, undefined)
    expect(none.every((c) => c.applies === null)).toBe(true)
    expect(none.filter((c) => c.irregularity.startsWith('Vertical')).every((c) => !c.found)).toBe(true)
    expect(none.every((c) => c.source === 'from memory')).toBe(true)
  })
})

describe('torsionalFlexibility on a torsion-first building', () => {
  it('flags the building when the first mode is mainly torsional', () => {
    // METHODS.md §8: Omega < 1 (a torsion-dominated mode first) marks a torsionally flexible system
    const modes = {
      count: 3,
      periods: Float64Array.of(1.2, 1.0, 0.9),
      torsionShare: Float64Array.of(0.9, 0.05, 0.05),
      effectiveMassRatio: { x: Float64Array.of(0.05, 0.9, 0.05), y: Float64Array.of(0.05, 0.05, 0.9), rz: Float64Array.of(0.9, 0.05, 0.05) },
    } as unknown as Parameters<typeof torsionalFlexibility>[0]
    const t = torsionalFlexibility(modes, 1.0)
    expect(t.firstModeTorsional).toBe(true)
    expect(t.ratio.x!).toBeCloseTo(1.2, 12)
    expect(t.ratio.y!).toBeCloseTo(1.2 / 0.9, 12)
    expect(t.flagged).toBe(true)
  })
})
