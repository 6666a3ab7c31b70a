/**
 * Node entry: `npm run analyze -- [model.json] [--json] [--time-history] [--criteria <id>] [--units SI|US] [--balance] [--report file.html] [--csv folder] [--system preset[,presetY]] [--risk-category I..IV]`.
 * Reads a project file, validates it, runs the engine and prints a summary (or the full JSON result).
 * Exit codes: 0 analysis completed, 1 invalid model or arguments (including an output path that cannot
 * be written or would overwrite the model, and an unknown --criteria id), 2 mechanism, 3 internal error,
 * 4 analysis incomplete (modes, base shears or verdicts missing).
 * Imports only model and engine: the living proof that both run without a browser.
 * @see ../../docs/cli.md
 */
import { mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs'
import { dirname, join, resolve } from 'node:path'
import { fileURLToPath } from 'node:url'
import { BUILT_IN_CRITERION_SETS, analyzeProject, suggestBalance } from '@/engine'
import type { AnalysisOptions } from '@/engine'
import { CAUTION, checkFileSizeBudget, parseProjectText } from '@/model'
import { TABLE_IDS, buildReportHtml, buildResultTables, csvFileName, toCsv } from '@/report'
import { seismicDesignFromOption } from './seismicOption'
import { USAGE, parseArgs } from './args'
import { findDuplicateKeys } from './duplicateKeys'
import { canonicalPath, outputProblem, probeNodePath } from './outputTargets'
import type { ProbePath } from './outputTargets'
import { formatBalance, formatIssue, formatResultJson, formatSummary } from './format'

/** Where the CLI writes and how it reads files (injected so tests run in-process). */
export interface CliIo {
  readonly out: (text: string) => void
  readonly err: (text: string) => void
  readonly readFile: (path: string) => string
  /** Size of a file in bytes, checked against the input budget before reading (optional in tests). */
  readonly fileSize?: (path: string) => number
  /** Write a text file, creating its folder (used by --report and --csv). */
  readonly writeFile: (path: string, text: string) => void
  /** What is at a path (default: the real file system); output paths are checked with it first. */
  readonly probe?: ProbePath
  /** Canonical form of a path, to tell whether two paths name one file (default: realpath). */
  readonly canonical?: (path: string) => string
}

export const EXIT_OK = 0
export const EXIT_INVALID = 1
export const EXIT_MECHANISM = 2
export const EXIT_INTERNAL = 3
/** The analysis ran but some numbers (modes, base shears, verdicts) could not be computed. */
export const EXIT_INCOMPLETE = 4

/** The demo building analyzed when no file is given. */
export const DEFAULT_MODEL = fileURLToPath(new URL('../../public/examples/corner-block.json', import.meta.url))

const nodeIo: CliIo = {
  out: (text) => process.stdout.write(text),
  err: (text) => process.stderr.write(text),
  readFile: (path) => readFileSync(path, 'utf8'),
  fileSize: (path) => statSync(path).size,
  writeFile: (path, text) => {
    mkdirSync(dirname(path), { recursive: true })
    writeFileSync(path, text, 'utf8')
  },
}

/** Run the CLI on argv (without node and the script) and return the exit code. Never throws. */
export function runCli(argv: readonly string[], io: CliIo = nodeIo): number {
  const args = parseArgs(argv)
  if (!args.ok) {
    io.err(`${args.error}\n${USAGE}\n`)
    return EXIT_INVALID
  }
  const o = args.options
  if (o.help) {
    io.out(`${USAGE}\n`)
    return EXIT_OK
  }
  const file = o.file ?? DEFAULT_MODEL
  const probe = io.probe ?? probeNodePath
  const canonical = io.canonical ?? canonicalPath
  // Output paths are checked before anything is read, analysed or printed (docs/cli.md).
  const targets: [string, string | null, 'file' | 'folder'][] = [
    ['--report', o.report, 'file'],
    ['--csv', o.csv, 'folder'],
  ]
  for (const [option, path, want] of targets) {
    if (path === null) continue
    const problem = outputProblem(path, want, probe)
    if (problem !== null) {
      io.err(`[cli] ${option}: cannot write ${path}: ${problem}\n`)
      return EXIT_INVALID
    }
  }
  if (o.report !== null && canonical(o.report) === canonical(file)) {
    io.err(`[cli] --report: ${o.report} is the model file itself; refusing to overwrite it\n`)
    return EXIT_INVALID
  }
  let text: string
  try {
    // Stat first: a file over the budget is refused without reading it (docs/file-format.md, Limits).
    const tooBig = io.fileSize ? checkFileSizeBudget(io.fileSize(file)) : null
    if (tooBig) {
      io.err(`[file] ${file}: ${tooBig.replace(/^\(file\): /, '')}\n`)
      return EXIT_INVALID
    }
    text = io.readFile(file)
  } catch (error) {
    io.err(`[file] cannot read ${file}: ${(error as Error).message}\n`)
    return EXIT_INVALID
  }
  const parsed = parseProjectText(text)
  if (!parsed.ok) {
    io.err(`[file] ${file} is not a valid Gyre project (${parsed.errors.length} problem${parsed.errors.length === 1 ? '' : 's'}):\n`)
    for (const e of parsed.errors) io.err(`${e}\n`)
    return EXIT_INVALID
  }
  if (o.csv !== null) {
    const csvDir = o.csv
    const clash = TABLE_IDS.map((id) => join(csvDir, csvFileName(parsed.project, { id }))).find(
      (path) => canonical(path) === canonical(file),
    )
    if (clash !== undefined) {
      io.err(`[cli] --csv: ${clash} would overwrite the model file ${file}; choose another folder\n`)
      return EXIT_INVALID
    }
  }
  if (o.criteria !== null) {
    const known = [
      ...BUILT_IN_CRITERION_SETS.map((b) => b.spec.id),
      ...(parsed.project.settings.criterionSets ?? []).map((c) => c.id),
      'none',
    ]
    if (!known.includes(o.criteria.trim())) {
      io.err(`[cli] --criteria: unknown criterion set ${JSON.stringify(o.criteria)} (known: ${known.join(', ')})\n`)
      return EXIT_INVALID
    }
  }
  for (const d of findDuplicateKeys(text)) {
    io.err(`[file] warning: ${d.path}: the key appears ${d.count} times in one object; only the last value is used\n`)
  }
  for (const w of parsed.warnings) io.err(`[file] warning: ${w}\n`)
  let project = parsed.project
  if (o.system) {
    const sd = seismicDesignFromOption(o.system, o.riskCategory ?? null)
    if (!sd.ok) {
      io.err(`${sd.error}\n`)
      return EXIT_INVALID
    }
    project = { ...project, settings: { ...project.settings, seismicDesign: sd.design } }
  }

  const options: AnalysisOptions = {
    timeHistory: o.timeHistory,
    ...(o.criteria !== null ? { criterionSet: o.criteria } : {}),
  }
  let result
  try {
    result = analyzeProject(project, options)
  } catch (error) {
    io.err(`[cli] internal error while analyzing ${file}: ${(error as Error).message}\n${CAUTION}\n`)
    return EXIT_INTERNAL
  }

  // A write that fails after the checks (disk full, a race) is still the user's path, not a defect.
  let failedWrite: { path: string; message: string } | null = null
  const write = (path: string, content: string): void => {
    try {
      io.writeFile(path, content)
    } catch (error) {
      failedWrite = { path, message: (error as Error).message }
      throw error
    }
  }
  try {
    const balance = o.balance && result.status === 'ok' ? suggestBalance(project) : null
    if (o.json) {
      // The balance suggestions ride along as one extra top-level field (docs/results-format.md).
      io.out(formatResultJson(balance ? { ...result, balance } : result))
    } else {
      io.out(formatSummary(result, o.units))
      if (balance) io.out(`\n${formatBalance(balance)}`)
    }
    if (o.report !== null) {
      const html = buildReportHtml(project, result, {
        unitSystem: o.units,
        generatedAt: new Date(),
        ...(balance ? { balance } : {}),
      })
      write(o.report, html)
      io.err(`[cli] report written to ${o.report}\n`)
    }
    if (o.csv !== null) {
      const tables = buildResultTables(project, result, o.units)
      for (const t of tables) write(join(o.csv, csvFileName(project, t)), toCsv(t, project))
      io.err(`[cli] ${tables.length} CSV tables written to ${o.csv}\n`)
    }
  } catch (error) {
    if (failedWrite !== null) {
      const { path, message } = failedWrite
      io.err(`[cli] cannot write ${path}: ${message}\n`)
      return EXIT_INVALID
    }
    io.err(`[cli] internal error while printing the result: ${(error as Error).message}\n`)
    return EXIT_INTERNAL
  }
  if (result.status === 'mechanism') {
    const mechanisms = result.issues.filter((i) => i.code === 'mechanism')
    const list = mechanisms.length > 0 ? mechanisms : result.issues.filter((i) => i.severity === 'error')
    io.err(`[engine] ${file}: the structure is a mechanism:\n`)
    for (const i of list) io.err(`${formatIssue(i)}\n`)
    return EXIT_MECHANISM
  }
  if (result.status === 'incomplete') {
    io.err(`[engine] ${file}: the analysis is incomplete; numbers are missing and no verdict is a pass:\n`)
    for (const i of result.issues.filter((x) => x.severity === 'error')) io.err(`${formatIssue(i)}\n`)
    return EXIT_INCOMPLETE
  }
  if (result.status === 'invalid') {
    io.err(`[engine] ${file}: the model cannot be analyzed:\n`)
    for (const i of result.issues.filter((x) => x.severity === 'error')) io.err(`${formatIssue(i)}\n`)
    return EXIT_INVALID
  }
  return EXIT_OK
}

const entry = process.argv[1]
if (entry !== undefined && resolve(entry) === fileURLToPath(import.meta.url)) {
  process.exitCode = runCli(process.argv.slice(2))
}
