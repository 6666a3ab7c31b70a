/** Command-line options of `npm run analyze`. */
import type { UnitSystem } from '@/model'

export interface CliOptions {
  /** Model file path; null: the bundled demo building. */
  readonly file: string | null
  readonly json: boolean
  readonly timeHistory: boolean
  readonly criteria: string | null
  readonly units: UnitSystem
  readonly help: boolean
  /** Also run the balance assistant and print its ranked suggestions. */
  readonly balance: boolean
  /** Write the printable HTML report to this path. */
  readonly report: string | null
  /** Write every result table as CSV into this folder. */
  readonly csv: string | null
  /** Seismic system presets for this run (`X[,Y]`), replacing settings.seismicDesign. */
  readonly system?: string | null
  /** Risk category / importance class with --system (default II). */
  readonly riskCategory?: string | null
}

export type ArgsResult = { readonly ok: true; readonly options: CliOptions } | { readonly ok: false; readonly error: string }

export const USAGE = `usage: npm run analyze -- [model.json] [options]

Analyzes a Gyre project file (default: public/examples/corner-block.json) and prints
floors, centres, modes, the torsion check, plan-regularity rows and spectrum base shears.

options:
  --json               print the full analysis result as JSON (SI units) instead of tables
  --time-history       also run the time history (slower)
  --criteria <id>      criterion set to check against (overrides the project's setting)
  --units SI|US        display units of the tables (default SI; --json is always SI)
  --balance            also ask the balance assistant which element to move, lengthen or thicken
  --report <file>      also write the printable HTML report (open it in a browser and print)
  --csv <folder>       also write every result table as a CSV file into the folder
  --system <p>[,<pY>]  seismic system preset(s) for X (and Y) for this run, e.g. special-rc-walls-frame
                       (design-level base shear and drifts; see docs/criteria.md)
  --risk-category <c>  I, II, III or IV with --system (default II)
  -h, --help           show this text

exit codes: 0 analysis completed, 1 invalid model, arguments or output path, 2 mechanism, 3 internal error`

/** Parse argv (without node and script). Unknown options are errors, never ignored. */
export function parseArgs(argv: readonly string[]): ArgsResult {
  let file: string | null = null
  let json = false
  let timeHistory = false
  let criteria: string | null = null
  let units: UnitSystem = 'SI'
  let help = false
  let balance = false
  let report: string | null = null
  let csv: string | null = null
  let system: string | null = null
  let riskCategory: string | null = null
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string
    const [name, inline] = arg.startsWith('--') && arg.includes('=') ? arg.split(/=(.*)/s, 2) : [arg, undefined]
    const value = (): string | undefined => {
      if (inline !== undefined) return inline
      const next = argv[i + 1]
      if (next === undefined || next.startsWith('--')) return undefined
      i += 1
      return next
    }
    switch (name) {
      case '--json':
        json = true
        break
      case '--time-history':
        timeHistory = true
        break
      case '--balance':
        balance = true
        break
      case '--report': {
        const v = value()
        if (!v) return { ok: false, error: '[cli] --report needs a file name, e.g. --report report.html' }
        report = v
        break
      }
      case '--csv': {
        const v = value()
        if (!v) return { ok: false, error: '[cli] --csv needs a folder, e.g. --csv tables' }
        csv = v
        break
      }
      case '--system': {
        const v = value()
        if (!v) return { ok: false, error: '[cli] --system needs a preset id, e.g. --system special-rc-walls-frame' }
        system = v
        break
      }
      case '--risk-category': {
        const v = value()
        if (!v) return { ok: false, error: '[cli] --risk-category needs I, II, III or IV' }
        riskCategory = v
        break
      }
      case '--criteria': {
        const v = value()
        if (!v) return { ok: false, error: '[cli] --criteria needs a criterion set id, e.g. --criteria asce7-16' }
        criteria = v
        break
      }
      case '--units': {
        const v = value()
        if (v !== 'SI' && v !== 'US') {
          return { ok: false, error: `[cli] --units must be SI or US, got ${v === undefined ? 'nothing' : JSON.stringify(v)}` }
        }
        units = v
        break
      }
      case '-h':
      case '--help':
        help = true
        break
      default:
        if (name?.startsWith('-')) return { ok: false, error: `[cli] unknown option ${name} (see --help)` }
        if (file !== null) return { ok: false, error: `[cli] only one model file, got ${JSON.stringify(file)} and ${JSON.stringify(arg)}` }
        file = arg
    }
  }
  if (riskCategory !== null && system === null) return { ok: false, error: '[cli] --risk-category needs --system' }
  const seismic = { ...(system !== null ? { system } : {}), ...(riskCategory !== null ? { riskCategory } : {}) }
  return { ok: true, options: { file, json, timeHistory, criteria, units, help, balance, report, csv, ...seismic } }
}
