import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { centreDefinitionIssues } from '@/engine/centreDefinition'
import { eccentricOneStorey, mixedModel, projectBuilder } from '../helpers/projectBuilder'

/*
 * The rule checked here: approximate (storey) centre definitions hold for multi-storey buildings only
 * when every lateral system runs from the foundation to the top and all systems deflect alike; frame-
 * only or wall-only systems qualify, dual systems generally do not.
 * Source: EN 1998-1:2004 4.2.3.2(8) (METHODS.md §2, wording from memory there).
 */
describe('centreDefinitionIssues', () => {
  const walls = () =>
    projectBuilder({ floors: 3 })
      .rectSlab({ width: 12, depth: 8, areaMass: 600 })
      .wall({ id: 'w1', p1: { x: 0, y: 0 }, p2: { x: 0, y: 6 } })
      .wall({ id: 'w2', p1: { x: 12, y: 2 }, p2: { x: 12, y: 8 } })
      .wall({ id: 'w3', p1: { x: 2, y: 0 }, p2: { x: 8, y: 0 } })

  it('says nothing for a wall-only system whose walls all run from the ground to the top', () => {
    expect(centreDefinitionIssues(walls().build())).toEqual([])
    // frame-only, one storey (EN 1998-1 4.2.3.2(7) one-storey case: a single definition)
    expect(centreDefinitionIssues(eccentricOneStorey())).toEqual([])
  })

  it('gives one info issue for a mixed wall-frame system', () => {
    const p = walls().frameLine({ id: 'f', p1: { x: 0, y: 8 }, p2: { x: 12, y: 8 }, storyStiffness: 2e8 }).build()
    const issues = centreDefinitionIssues(p)
    expect(issues).toHaveLength(1)
    expect(issues[0]).toMatchObject({ code: 'centre-definition', severity: 'info', refs: [] })
    expect(issues[0]?.message).toContain('mixed wall-frame system (3 walls with 1 frame line)')
  })

  it('names the elements that start above the base or stop below the top floor', () => {
    const p = walls()
      .wall({ id: 'w4', name: 'Podium wall', p1: { x: 4, y: 8 }, p2: { x: 10, y: 8 }, top: 'L1' })
      .wall({ id: 'w5', p1: { x: 6, y: 2 }, p2: { x: 6, y: 6 }, base: 'L1' })
      .build()
    const issues = centreDefinitionIssues(p)
    expect(issues).toHaveLength(1)
    expect(issues[0]?.refs).toEqual(['w4', 'w5'])
    expect(issues[0]?.message).toContain('2 lateral elements start above the base or stop below the top floor')
    expect(issues[0]?.message).toContain('Podium wall')
  })

  it('comes back from analyzeProject as information, leaving the status ok', () => {
    const r = analyzeProject(mixedModel(), { spectrum: false })
    expect(r.status).toBe('ok')
    const notes = r.issues.filter((i) => i.code === 'centre-definition')
    expect(notes.map((i) => i.severity)).toEqual(['info', 'info'])
    // mixedModel: w3 stands on L2, f2 stops at L3, c2 spans L1..L3 (helper's own data)
    expect(notes[1]?.refs).toEqual(['w3', 'f2', 'c2'])
  })
})
