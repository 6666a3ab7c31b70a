/**
 * CLI edge cases (docs/cli.md): output paths checked before any work, no output over the model file,
 * an unknown criterion set refused, duplicate JSON keys reported. Real files live in a fresh
 * temporary folder per test.
 */
import { mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync, mkdirSync, existsSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { afterEach, beforeEach, describe, expect, it } from 'vitest'
import { EXIT_INVALID, EXIT_OK, runCli } from '@/cli/analyze'
import type { CliIo } from '@/cli/analyze'
import { csvFileName } from '@/report'

const root = fileURLToPath(new URL('../../', import.meta.url))
const boxText = readFileSync(`${root}public/examples/eccentric-box.json`, 'utf8')

let dir: string
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'gyre-cli-'))
})
afterEach(() => {
  rmSync(dir, { recursive: true, force: true })
})

/** The CLI on the real file system, with output captured. */
function run(argv: string[], extra: Partial<CliIo> = {}): { code: number; out: string; err: string } {
  let out = ''
  let err = ''
  const io: CliIo = {
    out: (t) => (out += t),
    err: (t) => (err += t),
    readFile: (p) => readFileSync(p, 'utf8'),
    writeFile: (p, text) => {
      mkdirSync(join(p, '..'), { recursive: true })
      writeFileSync(p, text, 'utf8')
    },
    ...extra,
  }
  return { code: runCli(argv, io), out, err }
}

function model(name = 'box.json', text = boxText): string {
  const path = join(dir, name)
  writeFileSync(path, text, 'utf8')
  return path
}

describe('runCli output paths', () => {
  it('exits 1 naming the path when --report lies under a file, before reading or printing anything', () => {
    const blocker = join(dir, 'plain.txt')
    writeFileSync(blocker, 'x')
    let reads = 0
    const target = join(blocker, 'report.html')
    const r = run([model(), '--report', target], { readFile: () => ((reads += 1), boxText) })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.out).toBe('')
    expect(reads).toBe(0)
    expect(r.err).toBe(`[cli] --report: cannot write ${target}: cannot create ${target}: ${blocker} is not a folder\n`)
  })

  it('exits 1 when --report names a folder', () => {
    const r = run([model(), '--report', dir])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toBe(`[cli] --report: cannot write ${dir}: ${dir} is a folder, not a file\n`)
    expect(r.out).toBe('')
  })

  it('exits 1 when --csv names a file, not a folder', () => {
    const file = model()
    const r = run([file, '--csv', file])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toBe(`[cli] --csv: cannot write ${file}: ${file} is a file, not a folder\n`)
    expect(r.out).toBe('')
  })

  it('exits 1 when the probe says the folder is not writable (a read-only mount)', () => {
    const target = join(dir, 'out', 'report.html')
    const r = run([model(), '--report', target], {
      probe: (p) => (p === dir ? { kind: 'folder', writable: false } : { kind: 'missing', writable: false }),
    })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toBe(`[cli] --report: cannot write ${target}: cannot create ${target}: folder ${dir} is not writable\n`)
  })

  it('exits 1, not 3, naming the path when a write fails after the checks', () => {
    const target = join(dir, 'report.html')
    const r = run([model(), '--report', target], {
      writeFile: () => {
        throw new Error('ENOSPC: no space left on device')
      },
    })
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain(`[cli] cannot write ${target}: ENOSPC: no space left on device`)
  })

  it('refuses --report onto the model file itself and leaves the model as it was', () => {
    const file = model()
    const r = run([file, '--report', file])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.out).toBe('')
    expect(r.err).toBe(`[cli] --report: ${file} is the model file itself; refusing to overwrite it\n`)
    expect(readFileSync(file, 'utf8')).toBe(boxText)
  })

  it('refuses --report onto the model file through a symbolic link', () => {
    const file = model()
    const link = join(dir, 'link.html')
    symlinkSync(file, link)
    const r = run([file, '--report', link])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.err).toContain('is the model file itself')
    expect(readFileSync(file, 'utf8')).toBe(boxText)
  })

  it('refuses a --csv folder where a table file would overwrite the model file', () => {
    const project = JSON.parse(boxText) as { name: string }
    const clashName = csvFileName(project, { id: 'modes' })
    const file = model(clashName)
    const r = run([file, '--csv', dir])
    expect(r.code).toBe(EXIT_INVALID)
    expect(r.out).toBe('')
    expect(r.err).toBe(`[cli] --csv: ${join(dir, clashName)} would overwrite the model file ${file}; choose another folder\n`)
    expect(readFileSync(file, 'utf8')).toBe(boxText)
  })

  it('writes the report and the tables into folders it creates', () => {
    const report = join(dir, 'a', 'b', 'report.html')
    const tables = join(dir, 'c', 'tables')
    const r = run([model(), '--report', report, '--csv', tables])
    expect(r.code).toBe(EXIT_OK)
    expect(readFileSync(report, 'utf8')).toContain('licensed structural engineer')
    const project = JSON.parse(boxText) as { name: string }
    expect(existsSync(join(tables, csvFileName(project, { id: 'floors' })))).toBe(true)
  })
})

describe('runCli duplicate keys', () => {
  it('warns naming the path of a duplicate key and still analyses with the last value', () => {
    // JSON.parse keeps the last of two equal names (ECMA-262 25.5.1 JSON.parse, InternalizeJSONProperty;
    // RFC 8259 section 4: names SHOULD be unique).
    const text = boxText.replace('"name": "', '"name": "First", "name": "')
    expect(text).not.toBe(boxText)
    const r = run([model('dup.json', text)])
    expect(r.code).toBe(EXIT_OK)
    expect(r.err).toBe('[file] warning: name: the key appears 2 times in one object; only the last value is used\n')
    expect(r.out).not.toContain('First')
  })
})
