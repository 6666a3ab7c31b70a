import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('moveElements', () => {
  it('moves a multiple selection of walls, columns, slabs (with openings) and masses by (dx, dy)', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveElements', { ids: ['w1', 'c1', 's1', 'lm1', 'pm1'], dx: 1, dy: -2 }, (doc, before) => {
      expect(doc.walls.w1?.p1).toEqual({ x: 1, y: -2 })
      expect(doc.walls.w1?.p2).toEqual({ x: 5, y: -2 })
      expect(doc.columns.c1?.at).toEqual({ x: 7, y: 2 })
      expect(doc.slabs.s1?.outline[2]).toEqual({ x: 13, y: 6 })
      expect(doc.slabs.s1?.openings[0]?.[0]).toEqual({ x: 3, y: 0 })
      expect(doc.lineMasses.lm1?.points[1]).toEqual({ x: 13, y: -2 })
      expect(doc.pointMasses.pm1?.at).toEqual({ x: 10, y: 3 })
      // not selected: untouched, same record
      expect(doc.walls.w2).toBe(before.walls.w2)
      expect(doc.frameLines.f1).toBe(before.frameLines.f1)
    })
  })

  it('moves an element but not the material it references', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveElements', { ids: ['w2', 'concrete'], dx: 0.5, dy: 0 }, (doc, before) => {
      expect(doc.walls.w2?.p1.x).toBeCloseTo(12.5, 12)
      expect(doc.materials).toBe(before.materials)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'moveElements', { ids: ['f1'], dx: 0, dy: 1 })
  })

  it('refuses an empty selection, an unknown id and a non-numeric offset', () => {
    const store = createTestEditor()
    checkRefused(store, 'moveElements', { ids: [], dx: 1, dy: 0 }, 'ids: nothing to move (empty selection)')
    checkRefused(store, 'moveElements', { ids: ['w1', 'ghost'], dx: 1, dy: 0 }, 'ids: unknown id "ghost"')
    checkRefused(store, 'moveElements', { ids: ['w1'], dx: Number.POSITIVE_INFINITY, dy: 0 }, 'dx: must be a number')
  })
})
