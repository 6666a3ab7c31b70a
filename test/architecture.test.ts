/**
 * Architecture guard (DEVELOPERS.md "Dependency direction"): the engine and the model are pure
 * TypeScript that runs in node and in a worker; the editor core has no React, three.js or engine.
 * Complements the ESLint import bans with a check that also sees globals and dynamic imports.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'

const root = fileURLToPath(new URL('../', import.meta.url))

function sourceFiles(dir: string): string[] {
  const abs = join(root, dir)
  let entries: string[]
  try {
    entries = readdirSync(abs)
  } catch {
    return []
  }
  return entries.flatMap((name) => {
    const path = join(abs, name)
    if (statSync(path).isDirectory()) return sourceFiles(relative(root, path))
    return /\.(ts|tsx|mts|js|mjs)$/.test(name) ? [path] : []
  })
}

/** Code without comments and string contents, so prose like "the document" does not count. */
function stripCommentsAndStrings(code: string): string {
  return code
    .replace(/\/\*[\s\S]*?\*\//g, ' ')
    .replace(/(^|[^:\\])\/\/.*$/gm, '$1')
    .replace(/`(?:\\[\s\S]|[^`\\])*`/g, '``')
    .replace(/'(?:\\.|[^'\\\n])*'/g, "''")
    .replace(/"(?:\\.|[^"\\\n])*"/g, '""')
}

/** Module specifiers of static imports, re-exports, dynamic imports and requires. */
function importedModules(code: string): string[] {
  const noComments = code.replace(/\/\*[\s\S]*?\*\//g, ' ').replace(/(^|[^:\\])\/\/.*$/gm, '$1')
  const out: string[] = []
  const patterns = [
    /\b(?:import|export)\b[^'"`;]*?\bfrom\s*['"]([^'"]+)['"]/g,
    /\bimport\s*['"]([^'"]+)['"]/g,
    /\bimport\s*\(\s*['"]([^'"]+)['"]\s*\)/g,
    /\brequire\s*\(\s*['"]([^'"]+)['"]\s*\)/g,
  ]
  for (const re of patterns) for (const m of noComments.matchAll(re)) out.push(m[1] as string)
  return out
}

const isPackage = (spec: string, name: string): boolean => spec === name || spec.startsWith(`${name}/`)

type Rule = (spec: string) => boolean

interface Violation {
  readonly file: string
  readonly what: string
}

function importViolations(dir: string, banned: Record<string, Rule>): Violation[] {
  const out: Violation[] = []
  for (const file of sourceFiles(dir)) {
    const code = readFileSync(file, 'utf8')
    for (const spec of importedModules(code)) {
      for (const [what, rule] of Object.entries(banned)) {
        if (rule(spec)) out.push({ file: relative(root, file), what: `imports ${spec} (${what})` })
      }
    }
  }
  return out
}

/** Uses of the DOM globals as identifiers (not property names like `x.document`). */
function globalViolations(dir: string): Violation[] {
  const out: Violation[] = []
  for (const file of sourceFiles(dir)) {
    const code = stripCommentsAndStrings(readFileSync(file, 'utf8'))
    for (const name of ['document', 'window']) {
      const re = new RegExp(`(^|[^.\\w$])${name}\\b(?!\\s*:)`, 'm')
      if (re.test(code)) out.push({ file: relative(root, file), what: `uses the global ${name}` })
    }
  }
  return out
}

const UI_LIBS: Record<string, Rule> = {
  react: (s) => isPackage(s, 'react') || isPackage(s, 'react-dom') || isPackage(s, '@react-three/fiber'),
  three: (s) => isPackage(s, 'three'),
  zustand: (s) => isPackage(s, 'zustand'),
}

describe('architecture', () => {
  it('finds the source folders it guards (a guard over no files cannot fail)', () => {
    expect(sourceFiles('src/engine').length).toBeGreaterThan(3)
    expect(sourceFiles('src/model').length).toBeGreaterThan(3)
  })

  it('keeps src/engine and src/model free of react, three, zustand, document and window', () => {
    const violations = [
      ...importViolations('src/engine', UI_LIBS),
      ...importViolations('src/model', {
        ...UI_LIBS,
        'a higher layer': (s) => /^@\/(engine|editor|viewer|ui|cli)\b/.test(s),
      }),
      ...globalViolations('src/engine'),
      ...globalViolations('src/model'),
    ]
    expect(violations).toEqual([])
  })

  it('keeps src/editor free of react, three and the engine', () => {
    const violations = importViolations('src/editor', {
      react: UI_LIBS.react as Rule,
      three: UI_LIBS.three as Rule,
      engine: (s) => /^@\/engine\b/.test(s) || /(^|\/)engine(\/|$)/.test(s),
    })
    expect(violations).toEqual([])
  })

  it('keeps src/cli free of the editor, viewer, ui, react and three', () => {
    const violations = importViolations('src/cli', {
      react: UI_LIBS.react as Rule,
      three: UI_LIBS.three as Rule,
      'a browser layer': (s) => /^@\/(editor|viewer|ui)\b/.test(s),
    })
    expect(violations).toEqual([])
  })
})

describe('importedModules', () => {
  it('sees static, type-only, side-effect and dynamic imports and requires, not comments', () => {
    const code = [
      "import { a } from 'react'",
      "import type { B } from '@/engine'",
      "export { c } from 'three/examples'",
      "import 'zustand'",
      "const d = await import('react-dom')",
      "const e = require('three')",
      "// import { f } from 'never'",
    ].join('\n')
    expect(importedModules(code)).toEqual(['react', '@/engine', 'three/examples', 'zustand', 'react-dom', 'three'])
  })
})

describe('stripCommentsAndStrings', () => {
  it('keeps code and drops prose, so only real uses of document or window are caught', () => {
    const stripped = stripCommentsAndStrings("/** the document */ const s = 'window' // document\nwindow.alert(1)")
    expect(stripped).not.toMatch(/document/)
    expect(stripped).toMatch(/window\.alert/)
  })
})
