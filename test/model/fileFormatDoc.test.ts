import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CURRENT_VERSION, parseProjectText } from '@/model/schema'

const doc = readFileSync(new URL('../../docs/file-format.md', import.meta.url), 'utf8')

describe('docs/file-format.md', () => {
  it('has a minimal hand-written example that loads and analyzes', () => {
    const section = doc.slice(doc.indexOf('## A minimal file to write by hand'))
    const block = /```json\n([\s\S]*?)```/.exec(section)?.[1]
    expect(block).toBeDefined()
    const r = parseProjectText(block ?? '')
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.warnings).toEqual([
      'settings: missing: using the defaults and a placeholder spectrum; set your site spectrum',
    ])
    const result = analyzeProject(r.project)
    expect(result.status).toBe('ok')
    // The doc's own arithmetic: 500 kg/m² x 8 m x 5 m = 20 000 kg
    expect(result.totalMass).toBeCloseTo(20000, 6)
  })

  it('states the current version that the loader writes', () => {
    expect(doc).toContain(`This build writes **version ${CURRENT_VERSION}**`)
  })
})
