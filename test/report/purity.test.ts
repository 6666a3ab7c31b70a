import { readFileSync, readdirSync } from 'node:fs'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'

const dir = fileURLToPath(new URL('../../src/report', import.meta.url))
const files = readdirSync(dir).filter((f) => f.endsWith('.ts'))

describe('src/report', () => {
  it('imports only @/model, @/engine and its own files (STYLE.md section 2 layering)', () => {
    expect(files.length).toBeGreaterThanOrEqual(5)
    for (const f of files) {
      // Comments may name what is banned; only code counts.
      const text = readFileSync(join(dir, f), 'utf8')
        .replace(/\/\*[\s\S]*?\*\//g, '')
        .replace(/^\s*\/\/.*$/gm, '')
      const sources = [...text.matchAll(/from '([^']+)'/g)].map((m) => m[1] ?? '')
      for (const s of sources) expect(['@/model', '@/engine'].includes(s) || s.startsWith('./'), `${f}: ${s}`).toBe(true)
      expect(/\b(document|window)\./.test(text), `${f} touches the DOM`).toBe(false)
    }
  })

  it('lists its exports by name in index.ts', () => {
    const index = readFileSync(join(dir, 'index.ts'), 'utf8')
    expect(index).not.toMatch(/export \*/)
    for (const name of ['buildResultTables', 'toCsv', 'csvFileName', 'buildReportHtml']) {
      expect(index).toContain(name)
    }
  })
})
