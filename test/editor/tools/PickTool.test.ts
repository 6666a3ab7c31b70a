import { describe, expect, it } from 'vitest'
import { dispatch, hasRedo, redo, setSelection, undo } from '@/editor'
import { click, createTestEditor, drag, send } from '../../helpers/createTestEditor'

describe('pickTool', () => {
  it('selects by click, adds and removes with Shift, clears on empty space', () => {
    const store = createTestEditor()
    click(store, 12, 4.1)
    expect(store.getState().selection).toEqual(['w2'])
    click(store, 6.05, 4, { shift: true })
    expect(store.getState().selection).toEqual(['w2', 'c1'])
    click(store, 6.05, 4, { shift: true })
    expect(store.getState().selection).toEqual(['w2'])
    click(store, 20, 20)
    expect(store.getState().selection).toEqual([])
  })

  it('selects what lies wholly inside a dragged box', () => {
    const store = createTestEditor()
    drag(store, { x: -1, y: -1 }, { x: 5, y: 1 })
    expect(store.getState().selection).toEqual(['w1'])
    drag(store, { x: 5, y: 3 }, { x: 10, y: 6 }, { shift: true })
    expect(store.getState().selection).toEqual(['w1', 'c1', 'pm1'])
  })

  it('selects a slab by a click inside it, and moves it by a drag once selected', () => {
    const store = createTestEditor()
    click(store, 8, 2)
    expect(store.getState().selection).toEqual(['s1'])
    drag(store, { x: 8, y: 2 }, { x: 8.5, y: 2 }, { alt: true })
    expect(store.getState().doc.slabs.s1?.outline[0]?.x).toBeCloseTo(0.5, 12)
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.slabs.s1?.outline[0]?.x).toBeCloseTo(0, 12)
  })

  it('restores the previous selection when a box is cancelled', () => {
    const store = createTestEditor()
    setSelection(store, ['f1'])
    drag(store, { x: -1, y: -1 }, { x: 5, y: 1 }, { release: false })
    send(store, { type: 'key', key: 'Escape' })
    expect(store.getState().selection).toEqual(['f1'])
    expect(store.getState().tool.state).toBe('idle')
  })

  it('moves the selection by a 200-event drag that undoes in one step', () => {
    const store = createTestEditor()
    drag(store, { x: 6, y: 4 }, { x: 8.5, y: 5.5 }, { steps: 200 })
    const c1 = store.getState().doc.columns.c1
    expect(c1?.at.x).toBeCloseTo(8.5, 9)
    expect(c1?.at.y).toBeCloseTo(5.5, 9)
    // every pointer move past the press tolerance changed the document, all inside one undo step
    expect(store.getState().revision).toBeGreaterThan(150)
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.columns.c1?.at).toEqual({ x: 6, y: 4 })
    expect(undo(store)).toBe(false)
    expect(redo(store)).toBe(true)
    expect(store.getState().doc.columns.c1?.at.x).toBeCloseTo(8.5, 9)
  })

  it('snaps the grabbed element key point while moving (w2 end onto the midpoint of f1)', () => {
    const store = createTestEditor()
    // grab w2 near its upper end (12, 6); the pointer offset (-5.9, 1.9) puts that end at (6.1, 7.9)
    drag(store, { x: 12, y: 5 }, { x: 6.1, y: 6.9 }, { steps: 30 })
    const w2 = store.getState().doc.walls.w2
    expect(w2?.p2.x).toBeCloseTo(6, 12)
    expect(w2?.p2.y).toBeCloseTo(8, 12)
    expect(w2?.p1.x).toBeCloseTo(6, 12)
    expect(w2?.p1.y).toBeCloseTo(4, 12)
    expect(store.getState().ephemeral.readout).toBeNull()
  })

  it('restores everything when Escape arrives mid-drag, leaving nothing to redo', () => {
    const store = createTestEditor()
    const before = store.getState().doc
    drag(store, { x: 6, y: 4 }, { x: 9.5, y: 7 }, { steps: 50, release: false })
    expect(store.getState().doc.columns.c1?.at.x).toBeCloseTo(9.5, 9)
    send(store, { type: 'key', key: 'Escape' })
    expect(store.getState().doc).toEqual(before)
    expect(store.getState().doc.columns.c1).toBe(before.columns.c1)
    expect(hasRedo(store.getState().history)).toBe(false)
    expect(undo(store)).toBe(false)
    expect(store.getState().tool.state).toBe('idle')
  })

  it('stretches a selected wall by its end handle, with a length readout, in one undo step', () => {
    const store = createTestEditor()
    setSelection(store, ['w1'])
    drag(store, { x: 4, y: 0 }, { x: 5.5, y: 0.05 }, { release: false })
    expect(store.getState().ephemeral.readout?.length).toBeCloseTo(5.5, 12) // snapped to grid line A (y = 0)
    dispatch(store, { type: 'pointerUp', point: { x: 5.5, y: 0.05 }, tolerance: 0.2 })
    expect(store.getState().doc.walls.w1?.p2).toEqual({ x: 5.5, y: 0 })
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.walls.w1?.p2).toEqual({ x: 4, y: 0 })
  })

  it('reshapes a selected slab by dragging an outline vertex, in one undo step; Escape puts it back', () => {
    const store = createTestEditor()
    setSelection(store, ['s1'])
    // vertex 2 of s1 is (12, 8); pull it to (14, 9) with snapping off (Alt)
    drag(store, { x: 12, y: 8 }, { x: 14, y: 9 }, { alt: true })
    expect(store.getState().doc.slabs.s1?.outline[2]).toEqual({ x: 14, y: 9 })
    expect(store.getState().doc.slabs.s1?.outline[1]).toEqual({ x: 12, y: 0 })
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.slabs.s1?.outline[2]).toEqual({ x: 12, y: 8 })
    expect(redo(store)).toBe(true)
    expect(store.getState().doc.slabs.s1?.outline[2]).toEqual({ x: 14, y: 9 })
    drag(store, { x: 14, y: 9 }, { x: 13, y: 13 }, { alt: true, release: false })
    expect(store.getState().doc.slabs.s1?.outline[2]).toEqual({ x: 13, y: 13 })
    send(store, { type: 'key', key: 'Escape' })
    expect(store.getState().doc.slabs.s1?.outline[2]).toEqual({ x: 14, y: 9 })
    expect(hasRedo(store.getState().history)).toBe(false)
  })

  it('turns the selection by the rotation handle about its box centre (+90°)', () => {
    const store = createTestEditor()
    setSelection(store, ['w1'])
    // box (0,0)-(4,0): pivot (2, 0); handle 4 tolerances (0.8 m) above; pull it round to the left
    const steps = 20
    dispatch(store, { type: 'pointerDown', point: { x: 2, y: 0.8 }, tolerance: 0.2 })
    for (let i = 1; i <= steps; i++) {
      const a = Math.PI / 2 + ((Math.PI / 2) * i) / steps
      dispatch(store, { type: 'pointerMove', point: { x: 2 + 0.8 * Math.cos(a), y: 0.8 * Math.sin(a) }, tolerance: 0.2 })
    }
    dispatch(store, { type: 'pointerUp', point: { x: 1.2, y: 0 }, tolerance: 0.2 })
    const w1 = store.getState().doc.walls.w1
    expect(w1?.p1.x).toBeCloseTo(2, 9)
    expect(w1?.p1.y).toBeCloseTo(-2, 9)
    expect(w1?.p2.x).toBeCloseTo(2, 9)
    expect(w1?.p2.y).toBeCloseTo(2, 9)
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
    expect(undo(store)).toBe(false)
  })

  it('deletes the selection with Delete and moves it by a typed offset', () => {
    const store = createTestEditor()
    setSelection(store, ['c1', 'pm1'])
    send(store, { type: 'numeric', mode: 'offset', a: 1, b: -1 })
    expect(store.getState().doc.columns.c1?.at).toEqual({ x: 7, y: 3 })
    expect(store.getState().doc.pointMasses.pm1?.at).toEqual({ x: 10, y: 4 })
    send(store, { type: 'key', key: 'Delete' })
    expect(store.getState().doc.columns.c1).toBeUndefined()
    expect(store.getState().selection).toEqual([])
    undo(store)
    expect(store.getState().doc.columns.c1?.at).toEqual({ x: 7, y: 3 })
    undo(store)
    expect(store.getState().doc.columns.c1?.at).toEqual({ x: 6, y: 4 })
  })

  it('does nothing to the document when Delete is pressed with an empty selection', () => {
    const store = createTestEditor()
    send(store, { type: 'key', key: 'Delete' })
    expect(store.getState().revision).toBe(0)
  })
})
