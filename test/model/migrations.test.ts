import { describe, expect, it } from 'vitest'
import boxV0 from '../fixtures/box-v0.json'
import mixedV1 from '../fixtures/mixed-v1.json'
import { MIGRATIONS, MigrationError, migrateDocument } from '@/model/migrations'
import type { Migration, RawDocument } from '@/model/migrations'
import { CURRENT_VERSION, parseProject } from '@/model/schema'

const copy = <T>(x: T): Record<string, unknown> => JSON.parse(JSON.stringify(x)) as Record<string, unknown>

describe('MIGRATIONS', () => {
  it('holds one step per version, numbered from 0 up to CURRENT_VERSION - 1', () => {
    expect(MIGRATIONS.map((m) => m.from)).toEqual(Array.from({ length: CURRENT_VERSION }, (_, i) => i))
  })

  it('turns version-0 floor elevations into story heights (before/after fixture)', () => {
    const step = MIGRATIONS[0] as Migration
    const before = copy(boxV0)
    const after = step.up(before)
    // Hand calculation: h1 = 4.0 - 0 = 4.0 m, h2 = 7.5 - 4.0 = 3.5 m
    expect(after.version).toBe(1)
    expect(after.floors).toEqual([
      { id: 'F1', name: 'First', height: 4.0 },
      { id: 'F2', name: 'Roof', height: 3.5 },
    ])
    // Pure: the input is untouched
    expect(before).toEqual(copy(boxV0))
  })

  it('refuses version-0 elevations that do not rise, naming the floor', () => {
    const doc = copy(boxV0)
    ;(doc.floors as Record<string, unknown>[])[1]!.elevation = 3
    expect(() => (MIGRATIONS[0] as Migration).up(doc)).toThrow(MigrationError)
    expect(() => (MIGRATIONS[0] as Migration).up(doc)).toThrow(
      'floors[1].elevation: must be above the floor below (4 m), got 3',
    )
  })
})

describe('version 1 -> 2', () => {
  it('writes an explicit 1.0 where a version-1 file relied on the file default (before/after fixture)', () => {
    const step = MIGRATIONS[1] as Migration
    const before = copy(mixedV1)
    const after = step.up(before)
    const b = before as { walls: Record<string, object>; columns: Record<string, object>; frameLines: Record<string, { stiffness: object }> }
    const a = after as typeof b
    expect(after.version).toBe(2)
    expect(a.walls['w-plain']).toEqual({ ...b.walls['w-plain'], flexureFactor: 1 })
    expect(a.walls['w-set']).toEqual(b.walls['w-set'])
    expect(a.columns['c-plain']).toEqual({ ...b.columns['c-plain'], stiffnessFactor: 1 })
    expect(a.columns['c-set']).toEqual(b.columns['c-set'])
    expect(a.frameLines.mf).toEqual({
      ...b.frameLines.mf,
      stiffness: { ...b.frameLines.mf!.stiffness, columnFactor: 1, beamFactor: 1 },
    })
    // braced frames have no factor: untouched; nothing else changes
    expect(a.frameLines.bf).toEqual(b.frameLines.bf)
    expect({ ...after, walls: 0, columns: 0, frameLines: 0, version: 0 }).toEqual({
      ...before,
      walls: 0,
      columns: 0,
      frameLines: 0,
      version: 0,
    })
    // Pure: the input is untouched
    expect(before).toEqual(copy(mixedV1))
  })

  it('passes through sections that are missing or not objects, for validation to report', () => {
    const after = (MIGRATIONS[1] as Migration).up({ version: 1, walls: 'x' })
    expect(after).toEqual({ version: 2, walls: 'x' })
  })
})

describe('migrateDocument', () => {
  it('runs the steps in order and reports each one', () => {
    const steps: Migration[] = [
      { from: 0, description: 'a', up: (d: RawDocument) => ({ ...d, version: 1, trail: ['a'] }) },
      {
        from: 1,
        description: 'b',
        up: (d: RawDocument) => ({ ...d, version: 2, trail: [...((d.trail as string[] | undefined) ?? []), 'b'] }),
      },
    ]
    const r = migrateDocument({ version: 0 }, 2, steps)
    expect(r).toEqual({
      ok: true,
      doc: { version: 2, trail: ['a', 'b'] },
      applied: ['migrated version 0 -> 1: a', 'migrated version 1 -> 2: b'],
    })
    expect(migrateDocument({ version: 1 }, 2, steps)).toMatchObject({ ok: true, doc: { version: 2, trail: ['b'] } })
  })

  it('returns a path-naming error when a step cannot convert a value', () => {
    const doc = copy(boxV0)
    ;(doc.floors as Record<string, unknown>[])[0]!.elevation = 'high'
    expect(migrateDocument(doc, 1)).toEqual({
      ok: false,
      errors: ['floors[0].elevation: must be a finite number, got "high" (while migrating version 0 -> 1)'],
    })
  })

  it('throws on a step list that is out of order (a programmer error)', () => {
    const steps: Migration[] = [{ from: 1, description: 'x', up: (d) => d }]
    expect(() => migrateDocument({ version: 0 }, 1, steps)).toThrow('[file] migrations: no step from version 0')
  })
})

describe('parseProject on old files', () => {
  it('loads a version-0 file, says it was migrated, and validates the result', () => {
    const r = parseProject(copy(boxV0))
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.project.version).toBe(CURRENT_VERSION)
    expect(r.project.floors.map((f) => f.height)).toEqual([4, 3.5])
    expect(r.warnings).toEqual([
      'migrated version 0 -> 1: floors[].elevation (absolute, m) becomes floors[].height (story below, m)',
      `migrated version 1 -> 2: ${(MIGRATIONS[1] as Migration).description}`,
    ])
  })

  it('keeps the gross-section meaning of a version-1 file whose factors were left to the default', () => {
    const r = parseProject(copy(mixedV1))
    if (!r.ok) throw new Error(r.errors.join('; '))
    expect(r.project.version).toBe(2)
    expect(r.project.walls['w-plain']?.flexureFactor).toBe(1)
    expect(r.project.walls['w-set']?.flexureFactor).toBe(0.5)
    expect(r.project.columns['c-plain']?.stiffnessFactor).toBe(1)
    expect(r.project.columns['c-set']?.stiffnessFactor).toBe(0.7)
    expect(r.project.frameLines.mf?.stiffness).toMatchObject({ columnFactor: 1, beamFactor: 1 })
    expect(r.warnings).toHaveLength(1)
  })

  it('still validates after migrating: a version-0 floor too low is refused', () => {
    const doc = copy(boxV0)
    ;(doc.floors as Record<string, unknown>[])[1]!.elevation = 4.05
    expect(parseProject(doc)).toEqual({
      ok: false,
      errors: ['floors[1].height: must be >= 0.1, got 0.04999999999999982'],
    })
  })
})
