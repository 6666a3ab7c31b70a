/**
 * The whole analysis of one project: structure, modes, centres, static torsion cases, criterion
 * checks, response spectrum and (on request) time history. Pure; runs in node, a worker or a test.
 */
import { CAUTION } from '@/model'
import type { Project } from '@/model'
import { buildStructure } from './assemble'
import { computeCentres } from './centres'
import { evaluateRegularity, resolveCriterionSet } from './criteria'
import { runStaticTorsion } from './loads'
import { solveModes } from './modal'
import type { AnalysisOptions, AnalysisResult, Issue } from './results'
import { createStiffnessSolver } from './solve'
import { runSpectrum } from './spectrum'
import { runTimeHistory } from './timeHistory'

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/**
 * Analyze a validated project (SI units). Never throws for a bad model: problems come back as
 * `issues` and `status` ('mechanism' when the stiffness is singular or nearly so).
 * @see docs/results-format.md
 */
export function analyzeProject(project: Project, options: AnalysisOptions = {}): AnalysisResult {
  const timings: Record<string, number> = {}
  const issues: Issue[] = []
  let t = now()
  const lap = (name: string): void => {
    const t2 = now()
    timings[name] = t2 - t
    t = t2
  }

  const built = buildStructure(project)
  issues.push(...built.issues)
  lap('assemble')
  const structure = built.structure
  const empty = {
    projectName: project.name,
    modes: null,
    centres: null,
    torsion: null,
    spectrum: null,
    timeHistory: null,
    regularity: null,
    caution: CAUTION,
    timings,
  }
  if (!structure) {
    const status = issues.some((i) => i.code === 'mechanism') ? 'mechanism' : 'invalid'
    return { ...empty, status, issues, floors: built.floors, totalMass: 0, buildingCentreOfMass: null }
  }
  const base = {
    ...empty,
    floors: structure.floors,
    totalMass: structure.totalMass,
    buildingCentreOfMass: structure.buildingCentreOfMass,
  }
  const solver = createStiffnessSolver(structure)
  if (!solver.ok) {
    issues.push(...solver.issues)
    return { ...base, status: 'mechanism', issues }
  }
  issues.push(...solver.issues)
  lap('factor')

  const modes = solveModes(structure, { stiffnessSolver: solver.solver })
  if (modes.issues) issues.push(...modes.issues)
  if (!modes.complete) {
    issues.push({
      code: 'eigen-incomplete',
      severity: 'warning',
      message: `[engine] modal solver (${modes.solver}) found ${modes.count} of ${structure.dofCount} modes`,
      refs: [],
    })
  }
  lap('modes')
  const centres = computeCentres(structure, solver.solver)
  lap('centres')

  const criterion = resolveCriterionSet(project.settings, options.criterionSet)
  issues.push(...criterion.issues)
  const torsion = runStaticTorsion(structure, solver.solver, modes, project.settings, criterion.set)
  lap('torsion')
  const regularity = criterion.set ? evaluateRegularity(structure, centres, criterion.set) : null

  const spectrum = options.spectrum === false ? null : runSpectrum(structure, modes, project.settings)
  lap('spectrum')
  const timeHistory = options.timeHistory ? runTimeHistory(structure, modes, project.settings) : null
  if (options.timeHistory) lap('timeHistory')

  return {
    ...base,
    status: 'ok',
    issues,
    modes,
    centres,
    torsion,
    regularity,
    spectrum,
    timeHistory,
  }
}
