/** Shared inputs of the report tests: the demo building and the hand-checked eccentric box. */
import { readFileSync } from 'node:fs'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import { demoProject, parseProjectText } from '@/model'
import type { Project } from '@/model'

let demo: { project: Project; result: AnalysisResult } | null = null

/** The demo building analysed once per test file (with the time history). */
export function demoCase(): { project: Project; result: AnalysisResult } {
  if (!demo) {
    const project = demoProject()
    demo = { project, result: analyzeProject(project, { timeHistory: true }) }
  }
  return demo
}

/**
 * public/examples/eccentric-box.json: one storey, four direct-stiffness frame lines; its notes hold
 * the hand calculation (m = 36 000 kg, CM (5, 3) m, CR (3.333, 3) m, r = 5.588 m, l_s = 3.367 m).
 */
export function boxCase(): { project: Project; result: AnalysisResult } {
  const text = readFileSync(new URL('../../public/examples/eccentric-box.json', import.meta.url), 'utf8')
  const parsed = parseProjectText(text)
  if (!parsed.ok) throw new Error(`eccentric-box.json invalid: ${parsed.errors.join('; ')}`)
  return { project: parsed.project, result: analyzeProject(parsed.project) }
}
