/**
 * Benchmark of the whole analysis (assembly, factorization, modes, centres, the four static torsion
 * cases; response spectrum off) on seeded generated buildings, or on one model file.
 *
 *   npm run bench                 table for 10, 30, 60, 120 and 200 floors (~12 elements per floor)
 *   npm run bench -- model.json   median time of one project file
 *
 * Medians after warm-up: wall-clock milliseconds, and the process CPU time per run (user + system,
 * all threads), which is the better figure on a machine shared with other work. Informative, never a
 * pass/fail.
 */
import { readFileSync } from 'node:fs'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import { CAUTION_SHORT, parseProject } from '@/model'
import type { Project } from '@/model'
import { buildStructure } from '@/engine/assemble'
import { computeCentres } from '@/engine/centres'
import { solveModes } from '@/engine/modal'
import { createStiffnessSolver } from '@/engine/solve'
import { generateBuilding } from '../test/helpers/generateBuilding'

const TARGETS_MS: Record<number, number> = { 30: 5, 120: 60, 200: 250 }

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!)
}

/** One run: the full analysis when every stage exists, else the stages that do (reported). */
function runOnce(project: Project): {
  ms: number
  cpuMs: number
  result: AnalysisResult | null
  stages: Record<string, number>
} {
  const t0 = performance.now()
  const c0 = process.cpuUsage()
  const cpu = (): number => {
    const c = process.cpuUsage(c0)
    return (c.user + c.system) / 1000
  }
  try {
    const result = analyzeProject(project, { spectrum: false })
    return { ms: performance.now() - t0, cpuMs: cpu(), result, stages: { ...result.timings } }
  } catch (error) {
    // A stage not implemented yet: time assembly, factorization, modes and centres directly.
    if (!(error instanceof Error) || !error.message.includes('not implemented')) throw error
    const stages: Record<string, number> = {}
    let t = performance.now()
    const lap = (name: string): void => {
      const now = performance.now()
      stages[name] = now - t
      t = now
    }
    const s = buildStructure(project).structure
    lap('assemble')
    if (!s) throw new Error('[bench] model did not assemble', { cause: error })
    const solver = createStiffnessSolver(s)
    lap('factor')
    solveModes(s)
    lap('modes')
    if (solver.ok) computeCentres(s, solver.solver)
    lap('centres')
    return { ms: performance.now() - t0, cpuMs: cpu(), result: null, stages }
  }
}

function timeProject(project: Project, minRuns = 7, budgetMs = 2500) {
  for (let i = 0; i < 3; i++) runOnce(project) // warm-up (JIT)
  const times: number[] = []
  const cpuTimes: number[] = []
  const stageTimes: Record<string, number[]> = {}
  let last: ReturnType<typeof runOnce> | null = null
  const start = performance.now()
  while (times.length < minRuns || (performance.now() - start < budgetMs && times.length < 41)) {
    last = runOnce(project)
    times.push(last.ms)
    cpuTimes.push(last.cpuMs)
    for (const [k, v] of Object.entries(last.stages)) (stageTimes[k] ??= []).push(v)
  }
  const stages = Object.fromEntries(Object.entries(stageTimes).map(([k, v]) => [k, median(v)]))
  return { median: median(times), cpuMedian: median(cpuTimes), runs: times.length, stages, last: last! }
}

const pad = (s: string, n: number): string => s.padStart(n)

function describeModes(r: AnalysisResult | null): string {
  if (!r?.modes) return r ? `status ${r.status}` : '(partial pipeline)'
  return `${r.modes.count}/${r.modes.dofCount} modes${r.modes.complete ? '' : ' (lowest, Sturm-checked)'}`
}

function main(): void {
  const file = process.argv[2]
  console.log(`[bench] node ${process.version}, medians after warm-up; spectrum off`)
  if (file) {
    const parsed = parseProject(JSON.parse(readFileSync(file, 'utf8')))
    if (!parsed.ok) {
      console.error(`[bench] ${file}: not a valid project:\n  ${parsed.errors.join('\n  ')}`)
      process.exitCode = 1
      return
    }
    const t = timeProject(parsed.project)
    console.log(
      `${file}: ${parsed.project.floors.length} floors, median ${t.median.toFixed(2)} ms ` +
        `(process CPU ${t.cpuMedian.toFixed(2)} ms) over ${t.runs} runs`,
    )
    console.log(`  stages: ${Object.entries(t.stages).map(([k, v]) => `${k} ${v.toFixed(2)}`).join(', ')} ms`)
    console.log(`  ${describeModes(t.last.result)}`)
    console.log(`  ${CAUTION_SHORT}`)
    return
  }
  const sizes = [10, 30, 60, 120, 200]
  const stageNames = ['assemble', 'factor', 'modes', 'centres', 'torsion']
  console.log(
    `${pad('floors', 6)} ${pad('DOF', 5)} ${pad('elements', 8)} ${pad('median ms', 10)} ${pad('cpu ms', 8)} ${pad('target', 7)} ` +
      stageNames.map((s) => pad(s, 9)).join(' ') +
      '  modes',
  )
  for (const floors of sizes) {
    const project = generateBuilding({ floors, seed: 1 })
    const elements =
      Object.keys(project.walls).length + Object.keys(project.frameLines).length + Object.keys(project.columns).length
    const t = timeProject(project, floors >= 120 ? 5 : 9)
    const target = TARGETS_MS[floors]
    console.log(
      `${pad(String(floors), 6)} ${pad(String(3 * floors), 5)} ${pad(String(elements), 8)} ${pad(t.median.toFixed(2), 10)} ` +
        `${pad(t.cpuMedian.toFixed(2), 8)} ` +
        `${pad(target ? `<=${target}` : '-', 7)} ` +
        stageNames.map((s) => pad(t.stages[s] !== undefined ? t.stages[s]!.toFixed(2) : '-', 9)).join(' ') +
        `  ${describeModes(t.last.result)}`,
    )
  }
  console.log(`[bench] ${CAUTION_SHORT}`)
}

main()
