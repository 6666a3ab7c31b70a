/** Inputs of the ui/extras tests: the hand-checked eccentric box and a fake balance result. */
import { readFileSync } from 'node:fs'
import type { BalanceResult } from '@/engine'
import { CAUTION, parseProjectText } from '@/model'
import type { FrameLine, Project } from '@/model'

/** public/examples/eccentric-box.json (hand calculation in its notes). */
export function boxProject(): Project {
  const text = readFileSync(new URL('../../../public/examples/eccentric-box.json', import.meta.url), 'utf8')
  const parsed = parseProjectText(text)
  if (!parsed.ok) throw new Error(`eccentric-box.json invalid: ${parsed.errors.join('; ')}`)
  return parsed.project
}

/** A two-suggestion result shaped like suggestBalance's (numbers invented for rendering tests). */
export function fakeBalance(project: Project): BalanceResult {
  const west = Object.values(project.frameLines)[0] as FrameLine
  const moved: FrameLine = { ...west, p1: { x: 2.5, y: west.p1.y }, p2: { x: 2.5, y: west.p2.y } }
  const base = {
    elementId: west.id,
    elementKind: 'frameLine' as const,
    elementName: west.name,
    unit: 'm' as const,
    scoreBefore: 0.2983,
    worstEccentricityRatioBefore: 0.2983,
    worstDriftRatioBefore: 1.3,
    worstDriftRatioAfter: 1.0,
    objective: 'eccentricity' as const,
    objectiveBefore: 0.2983,
    before: { eccentricityRms: 0.2983, worstEccentricityRatio: 0.2983, worstDriftRatio: 1.3, periodRatio: 1.1 },
    worsensDrift: false,
  }
  const step = (action: 'move' | 'stiffness', description: string, amount: number, after: FrameLine) => ({
    steps: [{ targetId: west.id, action, description, amount, unit: base.unit, edits: [{ elementKind: 'frameLine' as const, before: west, after }] }],
    edits: [{ elementKind: 'frameLine' as const, before: west, after }],
  })
  return {
    score: 0.2983,
    worstEccentricityRatio: 0.2983,
    trials: 40,
    message: null,
    caution: CAUTION,
    objective: 'eccentricity',
    metrics: { eccentricityRms: 0.2983, worstEccentricityRatio: 0.2983, worstDriftRatio: 1.3, periodRatio: 1.1 },
    suggestions: [
      {
        ...base,
        action: 'move',
        description: "Move frame line 'West line' 2.50 m towards +x (to x = 2.50 m)",
        amount: -2.5,
        element: moved,
        scoreAfter: 0,
        worstEccentricityRatioAfter: 0,
        ...step('move', "Move frame line 'West line' 2.50 m towards +x (to x = 2.50 m)", -2.5, moved),
        objectiveAfter: 0,
        after: { eccentricityRms: 0, worstEccentricityRatio: 0, worstDriftRatio: 1.0, periodRatio: 0.9 },
        worse: [],
      },
      {
        ...base,
        action: 'stiffness',
        description: "Soften frame line 'West line' to x0.50 of its story stiffness",
        amount: 0.5,
        element: west,
        scoreAfter: 0.01,
        worstEccentricityRatioAfter: 0.01,
        ...step('stiffness', "Soften frame line 'West line' to x0.50 of its story stiffness", 0.5, west),
        objectiveAfter: 0.01,
        after: { eccentricityRms: 0.01, worstEccentricityRatio: 0.01, worstDriftRatio: 1.0, periodRatio: 1.2 },
        worse: ['period ratio T_torsion/T_translation worse (1.100 → 1.200)'],
      },
    ],
  }
}
