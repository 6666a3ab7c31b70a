/**
 * The whole analysis of one project: structure, modes, centres, static torsion cases, criterion
 * checks, response spectrum and (on request) time history. Pure; runs in node, a worker or a test.
 */
import { appendAll, CAUTION } from '@/model'
import type { Project } from '@/model'
import { buildStructure } from './assemble'
import { computeCentres } from './centres'
import { centreDefinitionIssues } from './centreDefinition'
import { evaluateRegularity, resolveCriterionSet } from './criteria'
import { computeElf, elfLoading, runDesign } from './design'
import { runStaticTorsion } from './loads'
import { solveModes } from './modal'
import { incompleteIssue, missingResults, noModesReason } from './completeness'
import type { AnalysisOptions, AnalysisResult, Issue } from './results'
import { createStiffnessSolver } from './solve'
import { computeElementForces } from './elementForces'
import { runSpectrumDetailed } from './spectrum'
import { runTimeHistory } from './timeHistory'

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/**
 * Analyze a validated project (SI units). Never throws for a bad model: problems come back as
 * `issues` and `status` ('mechanism' when the stiffness is singular or nearly so, 'incomplete' when
 * modes, base shears or verdicts could not be computed; never 'ok' with a missing number).
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
  appendAll(issues, built.issues)
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
    design: null,
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
    // A partial set is deliberate for tall buildings (lowest modes to a mass target, Sturm-checked):
    // say so as information when the target is met, warn when it is not.
    const last = modes.count - 1
    const reached = (a: Float64Array): number => (last >= 0 ? (a[last] ?? 0) : 0)
    const cx = reached(modes.cumulativeMassRatio.x)
    const cy = reached(modes.cumulativeMassRatio.y)
    const cr = reached(modes.cumulativeMassRatio.rz)
    const pct = (v: number): string => `${(100 * v).toFixed(1)}%`
    const enough = Math.min(cx, cy, cr) >= 0.9 - 1e-9
    issues.push({
      code: 'eigen-incomplete',
      severity: enough ? 'info' : 'warning',
      message:
        `[engine] modal solver (${modes.solver}) computed the lowest ${modes.count} of ${structure.dofCount} modes, ` +
        `reaching ${pct(cx)} (X), ${pct(cy)} (Y), ${pct(cr)} (rotation) of the mass` +
        (enough ? '' : ': below 90% in some direction, responses may be underestimated'),
      refs: [],
    })
  }
  lap('modes')
  const centres = computeCentres(structure, solver.solver)
  issues.push(...centreDefinitionIssues(project))
  lap('centres')

  const criterion = resolveCriterionSet(project.settings, options.criterionSet)
  issues.push(...criterion.issues)
  if (modes.count === 0) {
    // Without a single mode there is no period for the static loads and nothing for the spectrum or
    // the time history: leave them out rather than show zeros and a pass (docs/results-format.md).
    issues.push(incompleteIssue(noModesReason(structure, modes.issues ?? [])))
    return { ...base, status: 'incomplete', issues, modes, centres, regularity: null }
  }
  const seismic = project.settings.seismicDesign
  const elf = seismic ? computeElf(structure, modes, seismic, project.settings.spectrum) : null
  if (elf) issues.push(...elf.issues)
  else issues.push(ELASTIC_ONLY)
  const loading = elf?.elf ? elfLoading(elf.elf) : undefined
  const torsion = runStaticTorsion(structure, solver.solver, modes, project.settings, criterion.set, loading)
  lap('torsion')
  const regularity = criterion.set ? evaluateRegularity(structure, centres, criterion.set) : null

  const spectrumDetail =
    options.spectrum === false
      ? null
      : runSpectrumDetailed(structure, modes, project.settings, { solver: solver.solver, torsion })
  const spectrum = spectrumDetail?.result ?? null
  lap('spectrum')
  const elementForces = computeElementForces(structure, torsion, spectrumDetail)
  lap('elementForces')
  const timeHistory = options.timeHistory ? runTimeHistory(structure, modes, project.settings) : null
  if (options.timeHistory) lap('timeHistory')
  const design =
    seismic && elf?.elf
      ? runDesign({
          structure,
          solver: solver.solver,
          modes,
          settings: project.settings,
          set: criterion.set,
          design: seismic,
          elf: elf.elf,
          torsion,
          spectrum,
        })
      : null
  lap('design')

  const missing = missingResults(torsion, regularity, spectrum)
  for (const why of missing) issues.push(incompleteIssue(why))

  return {
    ...base,
    status: missing.length > 0 ? 'incomplete' : 'ok',
    issues,
    modes,
    centres,
    torsion,
    regularity,
    spectrum,
    timeHistory,
    elementForces,
    design,
  }
}

/** Said when no seismic system is set: the absolute numbers are elastic, not design numbers. */
const ELASTIC_ONLY: Issue = {
  code: 'not-applicable',
  severity: 'info',
  message:
    '[engine] settings.seismicDesign not set: base shear V = Sa(T)·W with R = 1 and no period cap; ' +
    'drifts are elastic, not design drifts (see docs/criteria.md "Design-level numbers")',
  refs: [],
}
