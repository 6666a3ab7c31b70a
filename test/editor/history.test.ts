import { describe, expect, it } from 'vitest'
import type { Project, Wall } from '@/model'
import { applyDiff, diffDocuments, invertDiff } from '@/editor'
import { composeDiffs, isEmptyDiff, pushDiff, pushMark, squashStep, undoStep, EMPTY_HISTORY } from '@/editor/history'
import { smallFixture } from '../helpers/createTestEditor'

function withWall(doc: Project, wall: Wall): Project {
  return { ...doc, walls: { ...doc.walls, [wall.id]: wall } }
}

describe('diffDocuments', () => {
  it('records added, updated (from, to) and removed records by id, and field changes', () => {
    const a = smallFixture()
    const w1 = a.walls.w1 as Wall
    const moved = { ...w1, p2: { x: 5, y: 0 } }
    const rest = { ...a.walls }
    delete rest.w2
    const b: Project = {
      ...a,
      walls: { ...rest, w1: moved, w9: { ...w1, id: 'w9' as never } },
      floors: a.floors.slice(0, 2),
      settings: { ...a.settings, damping: 0.03 },
    }
    const d = diffDocuments(a, b)
    expect(Object.keys(d.records.walls?.added ?? {})).toEqual(['w9'])
    expect(d.records.walls?.updated.w1).toEqual([w1, moved])
    expect(Object.keys(d.records.walls?.removed ?? {})).toEqual(['w2'])
    expect(d.records.columns).toBeUndefined()
    expect(d.floors?.to).toHaveLength(2)
    expect(d.settings?.from.damping).toBeCloseTo(0.05, 12)
    expect(applyDiff(a, d)).toEqual(b)
    expect(applyDiff(b, invertDiff(d))).toEqual(a)
  })

  it('is empty for the same document', () => {
    const a = smallFixture()
    expect(isEmptyDiff(diffDocuments(a, a))).toBe(true)
    expect(isEmptyDiff(diffDocuments(a, { ...a }))).toBe(true)
  })

  it('removes an optional top-level field on undo of its addition', () => {
    const a = smallFixture()
    const b: Project = { ...a, notes: 'check the core' }
    const d = diffDocuments(a, b)
    expect(applyDiff(b, invertDiff(d))).not.toHaveProperty('notes')
  })
})

describe('composeDiffs', () => {
  const a = smallFixture()
  const w = { ...(a.walls.w1 as Wall), id: 'wn' as never }
  const b = withWall(a, w)
  const c = withWall(b, { ...w, thickness: 0.4 })

  it('turns add-then-update into one add of the final record', () => {
    const d = composeDiffs(diffDocuments(a, b), diffDocuments(b, c))
    expect(d.records.walls?.added.wn).toBe(c.walls.wn)
    expect(Object.keys(d.records.walls?.updated ?? {})).toEqual([])
    expect(applyDiff(a, d)).toEqual(c)
  })

  it('turns add-then-remove into nothing and update-then-back into nothing', () => {
    expect(isEmptyDiff(composeDiffs(diffDocuments(a, b), diffDocuments(b, a)))).toBe(true)
    expect(isEmptyDiff(composeDiffs(diffDocuments(b, c), diffDocuments(c, b)))).toBe(true)
  })

  it('turns update-then-remove into a remove of the original', () => {
    const d = composeDiffs(diffDocuments(b, c), diffDocuments(c, a))
    expect(d.records.walls?.removed.wn).toBe(b.walls.wn)
    expect(applyDiff(b, d)).toEqual(a)
  })
})

describe('pushDiff / undoStep / squashStep', () => {
  const a = smallFixture()
  const w = { ...(a.walls.w1 as Wall), id: 'wn' as never }
  const b = withWall(a, w)
  const c = withWall(b, { ...w, thickness: 0.4 })

  it('merges diffs pushed without a mark between them into one entry', () => {
    let h = pushMark(EMPTY_HISTORY, 'm1', 'x')
    h = pushDiff(h, diffDocuments(a, b))
    h = pushDiff(h, diffDocuments(b, c))
    expect(h.undos.map((e) => e.type)).toEqual(['mark', 'diff'])
    const step = undoStep(c, h)
    expect(step.doc).toEqual(a)
  })

  it('squashes two marked steps into one', () => {
    let h = pushMark(EMPTY_HISTORY, 'm1', 'x')
    h = pushDiff(h, diffDocuments(a, b))
    h = pushMark(h, 'm2', 'y')
    h = pushDiff(h, diffDocuments(b, c))
    const s = squashStep(h, 'm1')
    expect(s.undos.map((e) => e.type)).toEqual(['mark', 'diff'])
    expect(undoStep(c, s).doc).toEqual(a)
  })
})

describe('history round trip (seeded random command sequences)', () => {
  it('undoes every step back to the start and redoes every step back to the end', async () => {
    const fc = await import('fast-check')
    const { createEditorStore, execute, mark, redo, undo } = await import('@/editor')
    const op = fc.oneof(
      fc.record({ t: fc.constant('mark' as const) }),
      fc.record({
        t: fc.constant('move' as const),
        id: fc.constantFrom('w1', 'w2', 'c1', 's1', 'pm1', 'lm1', 'f1'),
        dx: fc.double({ min: -3, max: 3, noNaN: true }),
        dy: fc.double({ min: -3, max: 3, noNaN: true }),
      }),
      fc.record({ t: fc.constant('wall' as const), x: fc.double({ min: 0, max: 10, noNaN: true }) }),
      fc.record({ t: fc.constant('delete' as const), id: fc.constantFrom('w1', 'c1', 'pm1', 'concrete') }),
      fc.record({ t: fc.constant('height' as const), h: fc.double({ min: -1, max: 5, noNaN: true }) }),
      fc.record({ t: fc.constant('unlink' as const) }),
    )
    fc.assert(
      fc.property(fc.array(op, { maxLength: 40 }), (ops) => {
        const store = createEditorStore(smallFixture())
        const start = structuredClone(store.getState().doc)
        for (const o of ops) {
          switch (o.t) {
            case 'mark':
              mark(store)
              break
            case 'move':
              execute(store, 'moveElements', { ids: [o.id], dx: o.dx, dy: o.dy })
              break
            case 'wall':
              execute(store, 'addWall', { p1: { x: o.x, y: 1 }, p2: { x: o.x, y: 3 } })
              break
            case 'delete':
              execute(store, 'deleteElements', { ids: [o.id] })
              break
            case 'height':
              execute(store, 'setFloorHeight', { floor: 'L2' as never, height: o.h })
              break
            case 'unlink':
              execute(store, 'unlinkTypicalFloor', { floor: 'L3' as never })
              break
          }
        }
        const end = structuredClone(store.getState().doc)
        let guard = 0
        while (undo(store) && guard++ < 100);
        expect(store.getState().doc).toEqual(start)
        guard = 0
        while (redo(store) && guard++ < 100);
        expect(store.getState().doc).toEqual(end)
      }),
      { seed: 20261202, numRuns: 150 },
    )
  })
})
