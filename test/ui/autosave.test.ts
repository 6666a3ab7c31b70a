import { describe, expect, it } from 'vitest'
import { demoProject } from '@/model'
import type { Project } from '@/model'
import {
  AUTOSAVE_KEY,
  FALLBACK_KEY,
  chooseRestore,
  createAutosaveService,
  createAutosaver,
  planSnapshotWrite,
  readSnapshotIndex,
} from '@/ui/autosave'
import type { KeyValueStore, LocalStore, SaveOutcome, SnapshotIndex } from '@/ui/autosave'

const named = (name: string): Project => ({ ...demoProject(), name })

/** An in-memory database; `refuse` makes writes reject like a full quota. */
function memoryDb() {
  const data = new Map<string, unknown>()
  let refuse = false
  const db: KeyValueStore = {
    get: async (key) => structuredClone(data.get(key)),
    setMany: async (entries) => {
      if (refuse) throw new DOMException('quota exceeded', 'QuotaExceededError')
      for (const [k, v] of entries) data.set(k, structuredClone(v))
    },
  }
  return { db, data, refuse: (on: boolean) => (refuse = on) }
}

function memoryLocal() {
  const data = new Map<string, string>()
  let refuse = false
  const local: LocalStore = {
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => {
      if (refuse) throw new DOMException('quota exceeded', 'QuotaExceededError')
      data.set(k, v)
    },
    removeItem: (k) => void data.delete(k),
  }
  return { local, data, refuse: (on: boolean) => (refuse = on) }
}

/** A clock that moves one second per call. */
function ticking(start = Date.UTC(2026, 0, 5, 9, 0, 0)) {
  let t = start
  return () => new Date((t += 1000))
}

describe('snapshot ring', () => {
  it('fills free slots first, newest first', () => {
    let index: SnapshotIndex = { entries: [] }
    for (let r = 1; r <= 3; r++) index = planSnapshotWrite(index, { savedAt: `t${r}`, revision: r }, 5).index
    expect(index.entries.map((e) => [e.slot, e.revision])).toEqual([
      [2, 3],
      [1, 2],
      [0, 1],
    ])
  })

  it('overwrites the oldest snapshot when the ring is full and keeps five', () => {
    let index: SnapshotIndex = { entries: [] }
    for (let r = 1; r <= 7; r++) index = planSnapshotWrite(index, { savedAt: `t${r}`, revision: r }, 5).index
    expect(index.entries.map((e) => e.revision)).toEqual([7, 6, 5, 4, 3])
    expect(new Set(index.entries.map((e) => e.slot)).size).toBe(5)
    const next = planSnapshotWrite(index, { savedAt: 't8', revision: 8 }, 5)
    expect(next.slot).toBe(index.entries[4]?.slot)
  })

  it('drops malformed index entries', () => {
    const index = readSnapshotIndex({
      entries: [{ slot: 0, savedAt: 'a', revision: 1 }, { slot: 9, savedAt: 'b', revision: 2 }, { slot: 0, savedAt: 'c', revision: 3 }, null],
    })
    expect(index.entries).toEqual([{ slot: 0, savedAt: 'a', revision: 1 }])
    expect(readSnapshotIndex('junk').entries).toEqual([])
  })
})

describe('chooseRestore', () => {
  it('restores the newest valid copy whatever its source', () => {
    const r = chooseRestore([
      { source: 'snapshot', savedAt: '2026-01-05T09:00:00.000Z', revision: 4, data: named('older') },
      { source: 'emergency copy', savedAt: '2026-01-05T09:05:00.000Z', revision: 5, data: named('newest') },
      { source: 'previous version', savedAt: '2025-12-01T09:00:00.000Z', revision: 0, data: named('oldest') },
    ])
    expect(r.kind).toBe('restored')
    if (r.kind === 'restored') {
      expect(r.project.name).toBe('newest')
      expect(r.source).toBe('emergency copy')
      expect(r.skipped).toEqual([])
    }
  })

  it('passes over a newer invalid copy, names it, and restores the next one', () => {
    const r = chooseRestore([
      { source: 'snapshot', savedAt: '2026-01-05T09:00:00.000Z', revision: 1, data: named('good') },
      { source: 'snapshot', savedAt: '2026-01-05T09:10:00.000Z', revision: 2, data: { format: 'nonsense' } },
    ])
    expect(r.kind).toBe('restored')
    if (r.kind === 'restored') {
      expect(r.project.name).toBe('good')
      expect(r.skipped).toHaveLength(1)
      expect(r.skipped[0]).toContain('2026-01-05T09:10:00.000Z')
    }
  })

  it('refuses with every reason when no copy is valid, and reports none when there is none', () => {
    const r = chooseRestore([{ source: 'previous version', savedAt: '', revision: 0, data: null }])
    expect(r.kind).toBe('refused')
    expect(chooseRestore([]).kind).toBe('none')
  })
})

describe('createAutosaveService', () => {
  it('keeps the last five snapshots and restores the newest after a reload', async () => {
    const mem = memoryDb()
    const service = createAutosaveService({ db: mem.db, local: memoryLocal().local, now: ticking() })
    for (let r = 1; r <= 7; r++) expect((await service.save(named(`rev ${r}`), r)).kind).toBe('saved')
    expect((await service.snapshots()).map((e) => e.revision)).toEqual([7, 6, 5, 4, 3])
    const reloaded = createAutosaveService({ db: mem.db, local: null })
    const r = await reloaded.load()
    expect(r.kind === 'restored' && r.project.name).toBe('rev 7')
  })

  it('keeps an emergency copy when the database refuses, and restores it rather than an older snapshot', async () => {
    const mem = memoryDb()
    const loc = memoryLocal()
    const service = createAutosaveService({ db: mem.db, local: loc.local, now: ticking() })
    await service.save(named('stored'), 1)
    mem.refuse(true)
    const outcome = await service.save(named('newest'), 2)
    expect(outcome.kind).toBe('fallback')
    if (outcome.kind === 'fallback') expect(outcome.error).toContain('quota exceeded')
    expect((await service.snapshots()).map((e) => e.revision)).toEqual([1])
    const r = await createAutosaveService({ db: mem.db, local: loc.local }).load()
    expect(r.kind === 'restored' && r.project.name).toBe('newest')
  })

  it('reports failed when both the database and local storage refuse', async () => {
    const mem = memoryDb()
    const loc = memoryLocal()
    const service = createAutosaveService({ db: mem.db, local: loc.local, now: ticking() })
    mem.refuse(true)
    loc.refuse(true)
    const outcome = await service.save(named('lost'), 3)
    expect(outcome.kind).toBe('failed')
  })

  it('removes the emergency copy once the database takes a save again', async () => {
    const mem = memoryDb()
    const loc = memoryLocal()
    const service = createAutosaveService({ db: mem.db, local: loc.local, now: ticking() })
    mem.refuse(true)
    await service.save(named('a'), 1)
    expect(loc.data.has(FALLBACK_KEY)).toBe(true)
    mem.refuse(false)
    await service.save(named('b'), 2)
    expect(loc.data.has(FALLBACK_KEY)).toBe(false)
  })

  it('reads the previous version autosave once and moves it into the ring', async () => {
    const mem = memoryDb()
    const loc = memoryLocal()
    loc.data.set(AUTOSAVE_KEY, JSON.stringify({ savedAt: '2025-11-30T08:00:00.000Z', project: named('from before') }))
    const first = await createAutosaveService({ db: mem.db, local: loc.local }).load()
    expect(first.kind === 'restored' && first.project.name).toBe('from before')
    expect(first.kind === 'restored' && first.source).toBe('previous version')
    expect(loc.data.has(AUTOSAVE_KEY)).toBe(false)
    const second = await createAutosaveService({ db: mem.db, local: loc.local }).load()
    expect(second.kind === 'restored' && second.source).toBe('snapshot')
  })

  it('refuses writes through the test hook', async () => {
    const loc = memoryLocal()
    const service = createAutosaveService({ db: memoryDb().db, local: loc.local, now: ticking() })
    service.debug.failWrites('database')
    expect((await service.save(named('x'), 1)).kind).toBe('fallback')
    service.debug.failWrites('all')
    expect((await service.save(named('x'), 2)).kind).toBe('failed')
    service.debug.failWrites('none')
    expect((await service.save(named('x'), 3)).kind).toBe('saved')
  })
})

describe('createAutosaver', () => {
  it('runs one save at a time and saves a change made during a save right after it', async () => {
    const calls: number[] = []
    const outcomes: SaveOutcome[] = []
    let release: (() => void) | null = null
    const save = (_p: Project, revision: number): Promise<SaveOutcome> => {
      calls.push(revision)
      return new Promise((done) => {
        release = () => done({ kind: 'saved', savedAt: `t${revision}`, revision })
      })
    }
    const saver = createAutosaver(10_000, save, (o) => outcomes.push(o))
    saver.schedule(named('a'), 1)
    saver.flush()
    saver.schedule(named('b'), 2)
    saver.flush()
    expect(calls).toEqual([1])
    ;(release as unknown as () => void)()
    await new Promise((r) => setTimeout(r, 0))
    expect(calls).toEqual([1, 2])
    ;(release as unknown as () => void)()
    await new Promise((r) => setTimeout(r, 0))
    expect(outcomes.map((o) => o.kind === 'saved' && o.revision)).toEqual([1, 2])
  })

  it('turns a rejected save into a failed outcome', async () => {
    const outcomes: SaveOutcome[] = []
    const saver = createAutosaver(10_000, () => Promise.reject(new Error('disk gone')), (o) => outcomes.push(o))
    saver.schedule(named('a'), 1)
    saver.flush()
    await new Promise((r) => setTimeout(r, 0))
    expect(outcomes).toEqual([{ kind: 'failed', error: '[autosave] disk gone' }])
  })
})
