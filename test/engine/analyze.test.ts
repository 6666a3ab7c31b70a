import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION } from '@/model'
import { demoProject } from '@/model/demo'
import { generateBuilding } from '../helpers/generateBuilding'

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
