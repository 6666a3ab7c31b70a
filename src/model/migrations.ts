/**
 * Project file migrations: an ordered list of small pure steps, each taking a parsed file of version n
 * to version n + 1. Steps work on plain JSON (before validation) and never mutate their input.
 * Validation runs after the last step, so a step only reshapes what it knows about and leaves the
 * rest untouched.
 * @see ../../docs/file-format.md "Versions and migrations"
 */

/** A JSON object as read from a file, before validation. */
export type RawDocument = Readonly<Record<string, unknown>>

/** One numbered step from version `from` to `from + 1`. */
export interface Migration {
  readonly from: number
  /** One line for the docs and the load warnings. */
  readonly description: string
  /** Pure: returns a new document; throws MigrationError for input it cannot convert. */
  readonly up: (doc: RawDocument) => RawDocument
}

/** A step could not convert a value; `path` names it like validation errors do. */
export class MigrationError extends Error {
  readonly path: string
  constructor(path: string, problem: string) {
    super(`${path}: ${problem}`)
    this.name = 'MigrationError'
    this.path = path
  }
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v)

/**
 * Version 0 (early drafts) stored the absolute elevation of each floor (`floors[].elevation`, m,
 * above the base at z = 0) instead of the height of the story below it. Version 1 stores `height`:
 * height_i = elevation_i - elevation_(i-1), with elevation_0 = 0 for the base.
 */
const v0ToV1: Migration = {
  from: 0,
  description: 'floors[].elevation (absolute, m) becomes floors[].height (story below, m)',
  up(doc) {
    const floors = doc.floors
    if (!Array.isArray(floors)) return { ...doc, version: 1 }
    let below = 0
    const converted = floors.map((floor: unknown, i) => {
      if (!isObject(floor) || !('elevation' in floor)) return floor
      const { elevation, ...rest } = floor
      if (typeof elevation !== 'number' || !Number.isFinite(elevation)) {
        throw new MigrationError(
          `floors[${i}].elevation`,
          `must be a finite number, got ${JSON.stringify(elevation) ?? String(elevation)}`,
        )
      }
      const height = elevation - below
      if (!(height > 0)) {
        throw new MigrationError(
          `floors[${i}].elevation`,
          `must be above the floor below (${below} m), got ${elevation}`,
        )
      }
      below = elevation
      return { ...rest, height }
    })
    return { ...doc, version: 1, floors: converted }
  },
}

/**
 * Version 2 takes its default effective-stiffness factors from ACI 318-19 Table 6.6.3.1.1(a)
 * (walls 0.70, columns 0.70, moment-frame columns 0.70 and beams 0.35; src/model/stiffnessFactors.ts),
 * where version 1 read a missing factor as 1.0 (gross section) and moment frames had none. So a v1
 * file keeps its meaning: every wall without `flexureFactor`, every column without `stiffnessFactor`
 * and every moment frame without `columnFactor` / `beamFactor` gets an explicit 1.0.
 * Two corrections are not migrated, since the old meaning was wrong: a `pinned` column is now pinned
 * at its foot only (v1 applied 3EI/h³ to every story), and a moment frame is condensed from its plane
 * frame (v1 used the typical-story formula in every story).
 */
const v1ToV2: Migration = {
  from: 1,
  description:
    'stiffness factors that were missing (read as 1.0 in version 1) are written as 1.0; pinned columns are now pinned at the foot only and moment frames are condensed from the full frame (corrections)',
  up(doc) {
    const each = (
      section: unknown,
      change: (o: Record<string, unknown>) => Record<string, unknown>,
    ): unknown => {
      if (!isObject(section)) return section
      return Object.fromEntries(Object.entries(section).map(([id, v]) => [id, isObject(v) ? change(v) : v]))
    }
    const walls = each(doc.walls, (w) => ('flexureFactor' in w ? w : { ...w, flexureFactor: 1 }))
    const columns = each(doc.columns, (c) => ('stiffnessFactor' in c ? c : { ...c, stiffnessFactor: 1 }))
    const frameLines = each(doc.frameLines, (f) => {
      const k = f.stiffness
      if (!isObject(k) || k.kind !== 'moment') return f
      return {
        ...f,
        stiffness: {
          ...k,
          ...('columnFactor' in k ? {} : { columnFactor: 1 }),
          ...('beamFactor' in k ? {} : { beamFactor: 1 }),
        },
      }
    })
    return {
      ...doc,
      version: 2,
      ...(doc.walls !== undefined ? { walls } : {}),
      ...(doc.columns !== undefined ? { columns } : {}),
      ...(doc.frameLines !== undefined ? { frameLines } : {}),
    }
  },
}

/** All steps in order; MIGRATIONS[n] takes version n to n + 1. */
export const MIGRATIONS: readonly Migration[] = [v0ToV1, v1ToV2]

export type MigrationResult =
  | { readonly ok: true; readonly doc: RawDocument; readonly applied: readonly string[] }
  | { readonly ok: false; readonly errors: readonly string[] }

/**
 * Run the steps from `doc.version` up to `target`. The version must be a whole number in
 * [0, target]; newer files are refused by the caller before this is reached.
 * `applied` lists one line per step run, e.g. `migrated version 0 -> 1: ...`.
 */
export function migrateDocument(
  doc: RawDocument,
  target: number,
  steps: readonly Migration[] = MIGRATIONS,
): MigrationResult {
  const version = doc.version
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 0) {
    return {
      ok: false,
      errors: [`version: must be a whole number >= 0, got ${JSON.stringify(version) ?? 'nothing'}`],
    }
  }
  let current: RawDocument = doc
  const applied: string[] = []
  for (let v = version; v < target; v++) {
    const step = steps[v]
    if (!step || step.from !== v) {
      throw new Error(`[file] migrations: no step from version ${v} (the list is out of order)`)
    }
    try {
      current = step.up(current)
    } catch (error) {
      if (error instanceof MigrationError) {
        return { ok: false, errors: [`${error.message} (while migrating version ${v} -> ${v + 1})`] }
      }
      throw error
    }
    if (current.version !== v + 1) {
      throw new Error(`[file] migrations: step ${v} -> ${v + 1} did not set the version`)
    }
    applied.push(`migrated version ${v} -> ${v + 1}: ${step.description}`)
  }
  return { ok: true, doc: current, applied }
}
