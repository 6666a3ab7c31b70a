import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import { demoProject } from '@/model'
import { resultsSummary } from '@/ui/resultsSummary'

describe('resultsSummary', () => {
  it('lists the first three periods with their class and forms the torsion / translation period ratio', () => {
    const project = demoProject()
    const result = analyzeProject(project)
    const s = resultsSummary(project.floors, result)
    const m = result.modes
    if (!m) throw new Error('demo has no modes')
    expect(s.modes.map((x) => x.number)).toEqual([1, 2, 3])
    expect(s.modes[0]?.period).toBe(m.periods[0])
    expect(s.modes[2]?.character).toBe(m.character[2])
    const t = m.character.indexOf('torsion')
    const l = m.character.findIndex((c) => c === 'x' || c === 'y')
    expect(t).toBeGreaterThanOrEqual(0)
    // Definition (docs/user-guide.md, common practice): first mostly-torsion period over the longest translational one.
    expect(s.periodRatio?.value).toBeCloseTo((m.periods[t] ?? 0) / (m.periods[l] ?? 1), 12)
    expect(s.periodRatio?.torsionMode).toBe(t + 1)
  })

  it('gives the worst drift ratio of every storey, top first, with case and verdict', () => {
    const project = demoProject()
    const result = analyzeProject(project)
    const s = resultsSummary(project.floors, result)
    expect(s.drifts.length).toBe(project.floors.length)
    expect(s.drifts[0]?.floorId).toBe(project.floors[project.floors.length - 1]?.id)
    const bottom = project.floors[0]?.id
    let worst = 0
    for (const c of result.torsion?.cases ?? []) {
      for (const row of c.stories) if (row.floorId === bottom) worst = Math.max(worst, row.driftRatio)
    }
    expect(s.drifts[s.drifts.length - 1]?.ratio).toBe(worst)
    expect(['pass', 'fail', 'not-applicable']).toContain(s.drifts[0]?.verdict)
  })

  it('is empty with no result and forms no ratio without a torsion mode', () => {
    expect(resultsSummary([], null)).toEqual({ drifts: [], modes: [], periodRatio: null })
    const fake = {
      modes: { count: 2, periods: new Float64Array([1, 0.8]), character: ['x', 'y'] },
      torsion: null,
      floors: [],
      centres: null,
    } as unknown as AnalysisResult
    expect(resultsSummary([], fake).periodRatio).toBeNull()
  })
})
