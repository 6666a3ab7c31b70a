import { spawnSync } from 'node:child_process'
import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { EXIT_INCOMPLETE, EXIT_INVALID, EXIT_MECHANISM, EXIT_OK, runCli } from '@/cli/analyze'
import type { CliIo } from '@/cli/analyze'
import { BUILT_IN_CRITERION_SETS } from '@/engine'
import { CAUTION } from '@/model'

const root = fileURLToPath(new URL('../../', import.meta.url))
const example = (name: string): string => `${root}public/examples/${name}`

/** In-process run with captured output; files come from disk unless `files` has them. */
function run(
  argv: string[],
  files: Record<string, string> = {},
): { code: number; out: string; err: string; written: Record<string, string> } {
  let out = ''
  let err = ''
  const written: Record<string, string> = {}
  const io: CliIo = {
    out: (t) => (out += t),
    err: (t) => (err += t),
    readFile: (p) => files[p] ?? readFileSync(p, 'utf8'),
    writeFile: (p, text) => {
      written[p] = text
    },
  }
  const code = runCli(argv, io)
  return { code, out, err, written }
}

const boxText = readFileSync(example('eccentric-box.json'), 'utf8')

describe('runCli', () => {
  it('prints the usage and exits 0 for --help', () => {
    const r = run(['--help'])
    expect(r.code).toBe(EXIT_OK)
    expect(r.out).toContain('usage: npm run analyze')
  })

  it('exits 1 with the usage for an unknown option', () => {
    const r = run(['--colour'])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain('[cli] unknown option --colour')
    expect(r.out).toBe('')
  })

  it('exits 1 when the file cannot be read', () => {
    const r = run(['/nonexistent/model.json'])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toMatch(/^\[file\] cannot read \/nonexistent\/model\.json: /)
  })

  it('exits 1 for text that is not JSON', () => {
    const r = run(['m.json'], { 'm.json': '{ "format": ' })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain('(file): not valid JSON')
  })

  it('exits 1 for an invalid model and prints each path-naming error on its own line', () => {
    const doc = JSON.parse(boxText) as {
      floors: { height: unknown }[]
      frameLines: { west: { stiffness: { storyStiffness: unknown } } }
      slabs: { deck: { floor: unknown } }
    }
    doc.floors[0]!.height = -3
    doc.frameLines.west.stiffness.storyStiffness = 'stiff'
    doc.slabs.deck.floor = 'F9'
    const r = run(['bad.json'], { 'bad.json': JSON.stringify(doc) })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.out).toBe('')
    expect(r.err.split('\n')).toEqual([
      '[file] bad.json is not a valid Gyre project (3 problems):',
      'floors[0].height: must be > 0, got -3',
      'slabs.deck.floor: no floor "F9"',
      'frameLines.west.stiffness.storyStiffness: must be a finite number, got "stiff"',
      '',
    ])
  })

  it('exits 1 for a file of a newer version, saying to update', () => {
    const r = run(['new.json'], { 'new.json': boxText.replace('"version": 2', '"version": 7') })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain('version 7 is newer than this Gyre (reads up to 2): update Gyre')
  })

  it('exits 1 when the engine cannot analyze a valid file (no floors)', () => {
    const r = run(['empty.json'], { 'empty.json': '{"format": "gyre-project", "version": 1, "floors": []}' })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain('the model cannot be analyzed')
    expect(r.err).toMatch(/^error no-floors: /m)
  })

  it('exits 2 for a mechanism and names the floor and the direction on stderr', () => {
    const r = run([example('mechanism-x.json')])
    expect(r.code).toBe(EXIT_MECHANISM)
    expect(r.err).toContain('the structure is a mechanism')
    const line = r.err.split('\n').find((l) => l.startsWith('error mechanism:'))
    expect(line).toBeDefined()
    expect(line).toMatch(/F1/)
    expect(line).toMatch(/\bx\b/)
    expect(r.out).toContain(`CAUTION: ${CAUTION}`)
    expect(r.out).not.toMatch(/NaN/)
  })

  it('exits 0 on the demo building and shows the caution before and after the numbers', () => {
    const r = run([])
    expect(r.err).toBe('')
    expect(r.code).toBe(EXIT_OK)
    const lines = r.out.trimEnd().split('\n')
    expect(lines[0]).toBe('Gyre analysis: Corner Block, Quarry Street')
    expect(lines[1]).toBe(`CAUTION: ${CAUTION}`)
    expect(lines[lines.length - 1]).toBe(`CAUTION: ${CAUTION}`)
    for (const part of ['Floors', 'Modes (21 of 21', 'Torsion check', 'Criterion set:', 'Response spectrum']) {
      expect(r.out).toContain(part)
    }
    expect(r.out).not.toMatch(/NaN|Infinity/)
  })

  it('uses US units in the tables with --units US', () => {
    const r = run([example('eccentric-box.json'), '--units', 'US'])
    expect(r.code).toBe(EXIT_OK)
    expect(r.out).toContain('Units: US (length ft, displacement in, mass kip·s²/in, force kip, stiffness kip/in)')
    // 3.5 m / 0.3048 m/ft = 11.48 ft (NIST SP 811 B.8)
    expect(r.out).toMatch(/^\s*1\s+Roof\s+11\.48\s/m)
  })

  it('runs the time history with --time-history and lists the peaks', () => {
    const r = run(['--time-history'])
    expect(r.code).toBe(EXIT_OK)
    expect(r.out).toMatch(/^Time history \(.*Newmark average acceleration\)$/m)
    expect(r.out).not.toMatch(/NaN|Infinity/)
  })

  it('exits 1 for an unknown --criteria id and names the known ids, before printing anything', () => {
    const r = run([example('eccentric-box.json'), '--criteria', 'no-such-set'])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.out).toBe('')
    const known = [...BUILT_IN_CRITERION_SETS.map((b) => b.spec.id), 'none'].join(', ')
    expect(r.err).toBe(`[cli] --criteria: unknown criterion set "no-such-set" (known: ${known})\n`)
    expect(known).toContain('asce7-16')
  })

  it('prints the eccentric box JSON with the hand-calculated centres (--json)', () => {
    const r = run([example('eccentric-box.json'), '--json'])
    expect(r.code).toBe(EXIT_OK)
    const result = JSON.parse(r.out) as {
      caution: string
      floors: { mass: number; centreOfMass: { x: number; y: number }; radiusOfGyration: number }[]
      centres: {
        centreOfRigidity: { x: number; y: number }
        eccentricity: { x: number; y: number }
        torsionalRadius: { x: number; y: number }
      }[]
      modes: { periods: number[] }
    }
    expect(result.caution).toBe(CAUTION)
    const floor = result.floors[0]!
    const c = result.centres[0]!
    // Hand calculation (eccentric-box.json notes): m = 600 kg/m² x 60 m² = 36 000 kg, CM at the centroid (5, 3)
    expect(floor.mass).toBeCloseTo(36000, 6)
    expect(floor.centreOfMass.x).toBeCloseTo(5, 9)
    // Rectangle polar radius of gyration l_s = sqrt((a² + b²)/12) (handbook closed form) = sqrt(136/12) m
    expect(floor.radiusOfGyration).toBeCloseTo(Math.sqrt(136 / 12), 9)
    // One-storey shear building: CR = stiffness-weighted mean of the line positions, x = (0 k1 + 10 k2)/(k1 + k2)
    expect(c.centreOfRigidity.x).toBeCloseTo(10 / 3, 9)
    expect(c.centreOfRigidity.y).toBeCloseTo(3, 9)
    expect(c.eccentricity.x).toBeCloseTo(10 / 3 - 5, 9)
    // K_theta = sum k d² about CR = 200e6 (10/3)² + 100e6 (20/3)² + 2 150e6 3² ; r = sqrt(K_theta / 300e6)
    const Ktheta = 200e6 * (10 / 3) ** 2 + 100e6 * (20 / 3) ** 2 + 2 * 150e6 * 9
    expect(c.torsionalRadius.x).toBeCloseTo(Math.sqrt(Ktheta / 300e6), 6)
    expect(c.torsionalRadius.y).toBeCloseTo(Math.sqrt(Ktheta / 300e6), 6)
    expect(Array.isArray(result.modes.periods)).toBe(true)
    expect(result.modes.periods).toHaveLength(3)
  })
})

describe('runCli on an incomplete analysis', () => {
  const pointMassOnly = JSON.stringify({
    format: 'gyre-project',
    version: 1,
    name: 'Point mass only',
    floors: [{ id: 'F1', height: 3.5 }],
    pointMasses: { m1: { floor: 'F1', at: { x: 5, y: 3 }, mass: 20000 } },
    frameLines: {
      w: { p1: { x: 0, y: 0 }, p2: { x: 0, y: 6 }, stiffness: { kind: 'direct', storyStiffness: 2e8 }, top: 'F1' },
      e: { p1: { x: 10, y: 0 }, p2: { x: 10, y: 6 }, stiffness: { kind: 'direct', storyStiffness: 1e8 }, top: 'F1' },
      s: { p1: { x: 0, y: 0 }, p2: { x: 10, y: 0 }, stiffness: { kind: 'direct', storyStiffness: 1e8 }, top: 'F1' },
    },
    settings: { spectrum: { kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8 } },
  })

  it('exits 4 with the reason on stderr and no PASS when the only mass has no polar inertia (was: exit 0, PASS)', () => {
    const r = run(['pm.json'], { 'pm.json': pointMassOnly })
    expect(EXIT_INCOMPLETE).toBe(4)
    expect(r.code).toBe(EXIT_INCOMPLETE)
    expect(r.out).toContain('Status: incomplete')
    expect(r.out).not.toContain('PASS')
    expect(r.out).toContain(CAUTION)
    expect(r.err).toContain('the analysis is incomplete')
    expect(r.err).toMatch(/error incomplete: .*give the point mass a polar inertia or add a slab/)
  })
})

describe('runCli on a file over the byte budget', () => {
  it('exits 1 after a stat, without reading the file', () => {
    let read = false
    let err = ''
    const io: CliIo = {
      out: () => undefined,
      err: (t) => (err += t),
      readFile: () => {
        read = true
        return '{}'
      },
      fileSize: () => 100 * 1024 * 1024,
      writeFile: () => undefined,
    }
    expect(runCli(['huge.json'], io)).toBe(EXIT_INVALID)
    expect(read).toBe(false)
    expect(err).toBe('[file] huge.json: 104857600 bytes is more than the budget of 67108864 bytes (64 MiB; docs/file-format.md, Limits)\n')
  })
})

describe('the analyze script (node process)', () => {
  const tsx = `${root}node_modules/.bin/tsx`
  const script = `${root}src/cli/analyze.ts`

  it('exits 1 and writes the errors on stderr for an invalid model', () => {
    const p = spawnSync(tsx, [script, `${root}test/fixtures/does-not-exist.json`], { encoding: 'utf8', cwd: root })
    expect(p.status).toBe(EXIT_INVALID)
    expect(p.stderr).toContain('[file] cannot read')
    expect(p.stdout).toBe('')
  })

  it('exits 2 for the mechanism example', () => {
    const p = spawnSync(tsx, [script, example('mechanism-x.json')], { encoding: 'utf8', cwd: root })
    expect(p.status).toBe(EXIT_MECHANISM)
    expect(p.stderr).toContain('error mechanism:')
  })
})

describe('docs/results-format.md', () => {
  it('documents every field name that --json prints for the demo with a time history', () => {
    const r = run(['--json', '--time-history'])
    expect(r.code).toBe(EXIT_OK)
    const doc = readFileSync(`${root}docs/results-format.md`, 'utf8')
    const names = new Set<string>()
    const walk = (v: unknown): void => {
      if (Array.isArray(v)) {
        if (v.length > 0) walk(v[0])
      } else if (v !== null && typeof v === 'object') {
        for (const [k, x] of Object.entries(v)) {
          names.add(k)
          walk(x)
        }
      }
    }
    walk(JSON.parse(r.out))
    // Keys of timings are stage names, not fields.
    // A field is documented when it appears as a word inside a code span (`name` or `{ name, ... }`).
    const spans = [...doc.matchAll(/`([^`]+)`/g)].map((m) => m[1] as string).join(' ')
    const stage = /^(assemble|factor|modes|centres|torsion|spectrum|timeHistory)$/
    const missing = [...names].filter((k) => !new RegExp(`\\b${k}\\b`).test(spans) && !stage.test(k))
    expect(missing).toEqual([])
  })
})

describe('runCli --balance', () => {
  it('prints ranked suggestions for the eccentric box, with the caution after them', () => {
    const { code, out } = run(['public/examples/eccentric-box.json', '--balance'])
    expect(code).toBe(EXIT_OK)
    const at = out.indexOf('Balance assistant')
    expect(at).toBeGreaterThan(0)
    expect(out.slice(at)).toContain(CAUTION)
    expect(out.slice(at)).toMatch(/1 {2}(Move|Stiffen|Lengthen|Thicken|Thin|Soften) /)
  })

  it('adds a balance field to --json output', () => {
    const { code, out } = run(['public/examples/eccentric-box.json', '--balance', '--json'])
    expect(code).toBe(EXIT_OK)
    const parsed = JSON.parse(out) as { balance: { suggestions: { scoreAfter: number }[]; score: number } }
    expect(parsed.balance.suggestions.length).toBeGreaterThan(0)
    expect(parsed.balance.suggestions[0]!.scoreAfter).toBeLessThan(parsed.balance.score)
  })
})

describe('runCli --report and --csv', () => {
  it('writes the printable report with the caution and one CSV per table', () => {
    const r = run(['public/examples/eccentric-box.json', '--report', 'out/box.html', '--csv', 'out/tables'])
    expect(r.code).toBe(EXIT_OK)
    const html = r.written['out/box.html']
    expect(html).toMatch(/^<!doctype html>/)
    expect(html).toContain(CAUTION)
    const csvs = Object.keys(r.written).filter((k) => k.startsWith('out/tables/') && k.endsWith('.csv'))
    expect(csvs.length).toBeGreaterThanOrEqual(3)
    for (const k of csvs) expect(r.written[k]!.split('\r\n')[0]).toContain(CAUTION)
    expect(r.err).toContain('report written to out/box.html')
  })
})
