import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('moveEndpoint', () => {
  it('stretches a wall by moving one end', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveEndpoint', { id: 'w1', end: 'p2', to: { x: 6, y: 0 } }, (doc) => {
      expect(doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
      expect(doc.walls.w1?.p2).toEqual({ x: 6, y: 0 })
    })
  })

  it('moves a frame line end', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'moveEndpoint', { id: 'f1', end: 'p1', to: { x: -2, y: 8 } }, (doc) => {
      expect(doc.frameLines.f1?.p1).toEqual({ x: -2, y: 8 })
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'moveEndpoint', { id: 'w2', end: 'p1', to: { x: 12, y: 0 } })
  })

  it('refuses collapsing the wall onto its other end and elements without ends', () => {
    const store = createTestEditor()
    checkRefused(store, 'moveEndpoint', { id: 'w1', end: 'p2', to: { x: 0, y: 0 } }, 'wall w1: p2: length must be > 0.001 m')
    checkRefused(store, 'moveEndpoint', { id: 'c1', end: 'p1', to: { x: 0, y: 0 } }, 'id: "c1" is not a wall or frame line')
  })
})
