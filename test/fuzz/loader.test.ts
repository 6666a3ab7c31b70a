/**
 * Fuzz: generated and mutated project files through parseProject and, when accepted, analyzeProject.
 * Every input must end in a clear refusal, or in results whose numbers are all finite (a mechanism or
 * other model problem is an issue, never a throw or a NaN).
 *
 * Default runs keep CI short; a longer run: GYRE_FUZZ_RUNS=20000 npx vitest run test/fuzz
 * (GYRE_FUZZ_SEED picks another fixed seed; the default seed is fixed so CI is reproducible).
 */
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import corner from '../../public/examples/corner-block.json'
import box from '../../public/examples/eccentric-box.json'
import mechanism from '../../public/examples/mechanism-x.json'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import { CAUTION, MAX_MESSAGES, parseProject, serializeProject } from '@/model'
import { generateBuilding } from '../helpers/generateBuilding'

const envRuns = Number(process.env.GYRE_FUZZ_RUNS)
const LOADER_RUNS = Number.isFinite(envRuns) && envRuns > 0 ? envRuns : 2000
const ENGINE_RUNS = Number.isFinite(envRuns) && envRuns > 0 ? envRuns : 300
const envSeed = Number(process.env.GYRE_FUZZ_SEED)
const SEED = Number.isInteger(envSeed) ? envSeed : 20261202
/** Per-test time limits that grow with a long run (the default 30 s is for the default counts). */
const LOADER_TIMEOUT = 30_000 + LOADER_RUNS * 20
const ENGINE_TIMEOUT = 30_000 + ENGINE_RUNS * 200

type Json = null | boolean | number | string | Json[] | { [k: string]: Json }

const clone = <T>(x: T): Json => JSON.parse(JSON.stringify(x)) as Json

/** Valid starting points: the examples and a few seeded generated buildings. */
const BASES: Json[] = [
  clone(corner),
  clone(box),
  clone(mechanism),
  ...[1, 2, 3, 5, 8].map((n) => clone(generateBuilding({ floors: n, seed: 100 + n }))),
  clone(generateBuilding({ floors: 4, seed: 7, setback: true })),
  clone(generateBuilding({ floors: 3, seed: 9, symmetric: true })),
]

type Path = (string | number)[]

/** Every node of a JSON tree except the root, as paths. */
function paths(node: Json, prefix: Path = [], out: Path[] = []): Path[] {
  if (Array.isArray(node)) {
    node.forEach((v, i) => {
      out.push([...prefix, i])
      paths(v, [...prefix, i], out)
    })
  } else if (node !== null && typeof node === 'object') {
    for (const k of Object.keys(node)) {
      out.push([...prefix, k])
      paths(node[k] as Json, [...prefix, k], out)
    }
  }
  return out
}

function parentOf(root: Json, path: Path): { parent: Json[] | { [k: string]: Json }; last: string | number } | null {
  let node: Json = root
  for (const p of path.slice(0, -1)) {
    if (node === null || typeof node !== 'object') return null
    node = (Array.isArray(node) ? node[p as number] : node[p as string]) as Json
  }
  if (node === null || typeof node !== 'object') return null
  return { parent: node, last: path[path.length - 1] as string | number }
}

const MUTATIONS = [
  'nan',
  'infinity',
  'negInfinity',
  'negate',
  'huge',
  'tiny',
  'zero',
  'scale',
  'string',
  'null',
  'delete',
  'emptyObject',
  'emptyList',
  'badRef',
  'copyOther',
  'random',
] as const
type MutationKind = (typeof MUTATIONS)[number]

interface Mutation {
  readonly at: number
  readonly kind: MutationKind
  readonly other: number
  readonly exponent: number
  readonly value: Json
}

/**
 * Mutations that often leave a file valid but strange (scaled values, removed or copied parts), so
 * that the engine sees many odd but accepted models.
 */
const GENTLE: readonly MutationKind[] = ['scale', 'delete', 'copyOther', 'zero', 'tiny', 'negate']

const mutationArb = (kinds: readonly MutationKind[]): fc.Arbitrary<Mutation> => fc.record({
  at: fc.nat(),
  kind: fc.constantFrom(...kinds),
  other: fc.nat(),
  exponent: fc.integer({ min: -3, max: 3 }),
  value: fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>,
})

/** Apply one mutation in place (on a private copy). */
/** Value at a path, or undefined. */
function valueAt(root: Json, path: Path): Json | undefined {
  const where = parentOf(root, path)
  if (!where) return undefined
  return (Array.isArray(where.parent) ? where.parent[where.last as number] : where.parent[where.last as string]) as Json
}

const COLLECTIONS = new Set(['materials', 'slabs', 'lineMasses', 'pointMasses', 'walls', 'frameLines', 'columns'])

/** Where a mutation may act: gentle kinds aim at numbers or whole records, the rest anywhere. */
function targets(root: Json, kind: MutationKind): Path[] {
  const all = paths(root)
  if (kind === 'scale' || kind === 'copyOther' || kind === 'tiny' || kind === 'zero' || kind === 'negate') {
    return all.filter((p) => typeof valueAt(root, p) === 'number')
  }
  if (kind === 'delete') {
    const records = all.filter((p) => p.length === 2 && COLLECTIONS.has(String(p[0])))
    return records.length > 0 ? records : all
  }
  return all
}

function mutate(root: Json, m: Mutation): void {
  const all = targets(root, m.kind)
  if (all.length === 0) return
  const path = all[m.at % all.length] as Path
  const where = parentOf(root, path)
  if (!where) return
  const { parent, last } = where
  const get = (): Json => (Array.isArray(parent) ? parent[last as number] : parent[last as string]) as Json
  const set = (v: Json | undefined): void => {
    if (Array.isArray(parent)) {
      if (v === undefined) parent.splice(last as number, 1)
      else parent[last as number] = v
    } else if (v === undefined) delete parent[last as string]
    else parent[last as string] = v
  }
  const current = get()
  // NaN and Infinity cannot live in JSON; the parser may still receive them from the editor.
  const nonJson = (v: number): Json => v as unknown as Json
  switch (m.kind) {
    case 'nan':
      return set(nonJson(Number.NaN))
    case 'infinity':
      return set(nonJson(Number.POSITIVE_INFINITY))
    case 'negInfinity':
      return set(nonJson(Number.NEGATIVE_INFINITY))
    case 'negate':
      return set(typeof current === 'number' ? -current : -1)
    case 'huge':
      return set(typeof current === 'number' ? current * 1e300 : 1e300)
    case 'tiny':
      return set(typeof current === 'number' ? current * 1e-300 : 5e-324)
    case 'zero':
      return set(0)
    case 'scale':
      return set(typeof current === 'number' ? current * 10 ** m.exponent : current)
    case 'string':
      return set(typeof current === 'number' ? String(current) : 'abc')
    case 'null':
      return set(null)
    case 'delete':
      return set(undefined)
    case 'emptyObject':
      return set({})
    case 'emptyList':
      return set([])
    case 'badRef':
      return set(typeof current === 'string' ? `${current}-missing` : 'nope')
    case 'copyOther': {
      const v = valueAt(root, all[m.other % all.length] as Path)
      return v === undefined ? undefined : set(clone(v))
    }
    case 'random':
      return set(m.value)
    default: {
      const never: never = m.kind
      throw new Error(`unknown mutation ${String(never)}`)
    }
  }
}

const mutatedArb = (maxMutations: number, kinds: readonly MutationKind[] = MUTATIONS): fc.Arbitrary<Json> =>
  fc
    .record({
      base: fc.nat({ max: BASES.length - 1 }),
      mutations: fc.array(mutationArb(kinds), { minLength: 1, maxLength: maxMutations }),
    })
    .map(({ base, mutations }) => {
      const doc = clone(BASES[base])
      for (const m of mutations) mutate(doc, m)
      return doc
    })

/** Every number reachable in a result, typed arrays included, with its path. */
function nonFinite(value: unknown, path = 'result', out: string[] = []): string[] {
  if (out.length > 5) return out
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`)
  } else if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const arr = value as unknown as ArrayLike<number>
    for (let i = 0; i < arr.length; i++) {
      if (!Number.isFinite(arr[i] as number)) {
        out.push(`${path}[${i}] = ${arr[i]}`)
        break
      }
    }
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => nonFinite(v, `${path}[${i}]`, out))
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) nonFinite(v, `${path}.${k}`, out)
  }
  return out
}

function checkRefusal(errors: readonly string[]): void {
  expect(errors.length).toBeGreaterThan(0)
  expect(errors.length).toBeLessThanOrEqual(MAX_MESSAGES + 1)
  for (const e of errors) {
    expect(typeof e).toBe('string')
    // Each message names a place and a problem: `path: problem` (or the capped-list tail line).
    expect(e).toMatch(/^(\S.*: .+|\.\.\. and \d+ more errors?)$/s)
  }
}

function checkResult(result: AnalysisResult): void {
  expect(result.caution).toBe(CAUTION)
  expect(['ok', 'incomplete', 'invalid', 'mechanism']).toContain(result.status)
  const bad = nonFinite({ ...result, timings: {} })
  expect(bad, `non-finite numbers (status ${result.status})`).toEqual([])
  if (result.status !== 'ok') {
    const errors = result.issues.filter((i) => i.severity === 'error')
    expect(errors.length, 'a refused analysis says why').toBeGreaterThan(0)
    for (const i of errors) expect(i.message.length).toBeGreaterThan(0)
  } else {
    expect(result.modes).not.toBeNull()
    const periods = Array.from(result.modes?.periods ?? [])
    for (const T of periods) expect(T).toBeGreaterThan(0)
    // status ok means nothing is missing: at least one mode, positive base shears both ways,
    // no criterion row left unchecked, no 'incomplete' issue (docs/results-format.md, Status values)
    expect(result.modes!.count, 'status ok with no mode').toBeGreaterThan(0)
    expect(result.torsion, 'status ok without the torsion check').not.toBeNull()
    expect(result.torsion!.baseShear.x).toBeGreaterThan(0)
    expect(result.torsion!.baseShear.y).toBeGreaterThan(0)
    if (result.spectrum) {
      expect(result.spectrum.baseShear.x.cqc, 'status ok with no spectrum base shear along x').toBeGreaterThan(0)
      expect(result.spectrum.baseShear.y.cqc, 'status ok with no spectrum base shear along y').toBeGreaterThan(0)
    }
    for (const e of [result.torsion!.criterion, result.regularity]) {
      if (e) expect(e.rows.filter((row) => row.verdict === 'not-checked')).toEqual([])
    }
    expect(result.issues.filter((i) => i.code === 'incomplete')).toEqual([])
  }
  // whatever the status, a PASS never stands on an unchecked row
  for (const e of [result.torsion?.criterion, result.regularity]) {
    if (e?.overall === 'pass') expect(e.rows.some((row) => row.verdict === 'not-checked')).toBe(false)
  }
}

describe('parseProject (fuzz)', () => {
  it('never throws on random JSON or arbitrary values and refuses them clearly', () => {
    fc.assert(
      fc.property(fc.oneof(fc.jsonValue(), fc.anything()), (input) => {
        const r = parseProject(input)
        if (!r.ok) checkRefusal(r.errors)
      }),
      { numRuns: Math.ceil(LOADER_RUNS / 4), seed: SEED },
    )
  }, LOADER_TIMEOUT)

  it('never throws on random objects that carry the format tag and a version', () => {
    const arb = fc
      .record({
        version: fc.oneof(fc.constant(0), fc.constant(1), fc.integer()),
        rest: fc.dictionary(
          fc.constantFrom('name', 'floors', 'materials', 'slabs', 'walls', 'frameLines', 'columns', 'settings', 'x'),
          fc.jsonValue({ maxDepth: 3 }),
        ),
      })
      .map(({ version, rest }) => ({ ...rest, format: 'gyre-project', version }))
    fc.assert(
      fc.property(arb, (input) => {
        const r = parseProject(input)
        if (!r.ok) checkRefusal(r.errors)
      }),
      { numRuns: Math.ceil(LOADER_RUNS / 4), seed: SEED + 1 },
    )
  }, LOADER_TIMEOUT)

  it('refuses mutated models clearly or accepts them so that they round-trip through the file text', () => {
    let accepted = 0
    fc.assert(
      fc.property(mutatedArb(4), (doc) => {
        const r = parseProject(doc)
        if (!r.ok) {
          checkRefusal(r.errors)
          return
        }
        accepted += 1
        const text = serializeProject(r.project)
        const again = parseProject(JSON.parse(text))
        expect(again.ok).toBe(true)
        if (again.ok) expect(again.project).toEqual(r.project)
      }),
      { numRuns: Math.ceil(LOADER_RUNS / 2), seed: SEED + 2 },
    )
    // Not a tautology: some mutations (a deleted record, a scaled value) must still be valid.
    expect(accepted).toBeGreaterThan(LOADER_RUNS / 40)
  }, LOADER_TIMEOUT)
})

describe('analyzeProject on accepted fuzzed models', () => {
  it('ends in finite results or a clear issue, never a throw or a NaN', () => {
    let analyzed = 0
    const statuses = new Map<string, number>()
    fc.assert(
      fc.property(fc.oneof(mutatedArb(3, GENTLE), mutatedArb(2)), (doc) => {
        const r = parseProject(doc)
        if (!r.ok) return
        analyzed += 1
        const result = analyzeProject(r.project, { spectrum: true, timeHistory: false })
        statuses.set(result.status, (statuses.get(result.status) ?? 0) + 1)
        checkResult(result)
      }),
      { numRuns: ENGINE_RUNS, seed: SEED + 3 },
    )
    expect(analyzed).toBeGreaterThan(ENGINE_RUNS / 4)
    expect(statuses.get('ok') ?? 0).toBeGreaterThan(0)
  }, ENGINE_TIMEOUT)

  it('also keeps the time history finite on a few accepted mutants', () => {
    fc.assert(
      fc.property(mutatedArb(2, GENTLE), (doc) => {
        const r = parseProject(doc)
        if (!r.ok) return
        checkResult(analyzeProject(r.project, { timeHistory: true }))
      }),
      { numRuns: Math.max(10, Math.ceil(ENGINE_RUNS / 30)), seed: SEED + 4 },
    )
  }, ENGINE_TIMEOUT)

  it('never says ok with nothing computed on floors of point masses with or without polar inertia', () => {
    const pm = fc.record({
      x: fc.double({ min: -5, max: 15, noNaN: true }),
      y: fc.double({ min: -5, max: 10, noNaN: true }),
      mass: fc.double({ min: 100, max: 1e6, noNaN: true }),
      J: fc.oneof(fc.constant(undefined), fc.double({ min: 1, max: 1e8, noNaN: true })),
    })
    fc.assert(
      fc.property(fc.array(pm, { minLength: 1, maxLength: 3 }), (masses) => {
        const doc = clone(box) as { [k: string]: Json }
        doc.slabs = {}
        doc.pointMasses = Object.fromEntries(
          masses.map((m, i) => [
            `m${i}`,
            { floor: 'F1', at: { x: m.x, y: m.y }, mass: m.mass, ...(m.J !== undefined ? { polarInertia: m.J } : {}) },
          ]),
        )
        const r = parseProject(doc)
        if (!r.ok) return
        const result = analyzeProject(r.project)
        checkResult(result)
        if ((result.modes?.count ?? 0) === 0) expect(result.status).not.toBe('ok')
      }),
      { numRuns: Math.max(50, Math.ceil(ENGINE_RUNS / 3)), seed: SEED + 5 },
    )
  }, ENGINE_TIMEOUT)

  it('reports the mechanism example as an issue naming floor and direction', () => {
    const r = parseProject(clone(mechanism))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    const result = analyzeProject(r.project)
    expect(result.status).toBe('mechanism')
    const issue = result.issues.find((i) => i.code === 'mechanism')
    expect(issue?.floor ?? issue?.message).toMatch(/F1/)
    checkResult(result)
  })
})
