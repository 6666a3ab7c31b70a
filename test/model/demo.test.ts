import { describe, expect, it } from 'vitest'
import { readFileSync, readdirSync } from 'node:fs'
import { demoProject } from '@/model/demo'
import { parseProjectText } from '@/model/schema'

describe('demoProject', () => {
  it('returns the corner block, parsed and validated', () => {
    const p = demoProject()
    expect(p.name).toBe('Corner Block, Quarry Street')
    expect(p.floors).toHaveLength(7)
    // corner-block.json: 5 walls, 2 frame lines, 12 columns (counted in the file)
    expect(Object.keys(p.walls)).toHaveLength(5)
    expect(Object.keys(p.frameLines)).toHaveLength(2)
    expect(Object.keys(p.columns)).toHaveLength(12)
  })

  it('returns a fresh copy each time', () => {
    expect(demoProject()).not.toBe(demoProject())
    expect(demoProject().floors).not.toBe(demoProject().floors)
    expect(demoProject()).toEqual(demoProject())
  })
})

describe('public/examples', () => {
  it('holds only files that load without errors or warnings', () => {
    const dir = new URL('../../public/examples/', import.meta.url)
    const files = readdirSync(dir).filter((f) => f.endsWith('.json'))
    expect(files).toEqual(expect.arrayContaining(['corner-block.json', 'eccentric-box.json', 'mechanism-x.json']))
    for (const f of files) {
      const r = parseProjectText(readFileSync(new URL(f, dir), 'utf8'))
      expect(r, f).toMatchObject({ ok: true, warnings: [] })
    }
  })
})
