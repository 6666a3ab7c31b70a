import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import {
  bail,
  createEditorStore,
  execute,
  hasRedo,
  loadDocument,
  mark,
  redo,
  selectCanRedo,
  selectCanUndo,
  setCurrentFloor,
  setSelection,
  setTool,
  squash,
  undo,
} from '@/editor'
import { createTestEditor, demoProject, smallFixture } from '../helpers/createTestEditor'

describe('createEditorStore', () => {
  it('starts on the first floor with the pick tool, empty selection and history, revision 0', () => {
    const store = createTestEditor('demo')
    const s = store.getState()
    expect(s.currentFloor).toBe('L1')
    expect(s.tool).toEqual({ id: 'pick', state: 'idle', memory: {} })
    expect(s.selection).toEqual([])
    expect(s.revision).toBe(0)
    expect(selectCanUndo(s)).toBe(false)
  })

  it('throws on a project without floors (programmer error: validate first)', () => {
    expect(() => createEditorStore({ ...smallFixture(), floors: [] })).toThrow('[editor] createEditorStore')
  })
})

describe('execute', () => {
  it('bumps the revision on every change but not on a refusal or a no-op', () => {
    const store = createTestEditor()
    execute(store, 'moveElements', { ids: ['c1'], dx: 1, dy: 0 })
    expect(store.getState().revision).toBe(1)
    execute(store, 'moveElements', { ids: ['c1'], dx: 0, dy: 0 })
    expect(store.getState().revision).toBe(1)
    execute(store, 'updateElement', { id: 'w1', patch: { thickness: -1 } })
    expect(store.getState().revision).toBe(1)
    undo(store)
    redo(store)
    expect(store.getState().revision).toBe(3)
  })

  it('reports created ids and selects them on request', () => {
    const store = createTestEditor()
    const r = execute(store, 'addColumn', { at: { x: 1, y: 1 } }, { select: true })
    expect(r.ok && r.created).toHaveLength(1)
    expect(store.getState().selection).toEqual(r.ok ? r.created : [])
  })

  it('keeps the refusal message for the UI and clears it on the next change', () => {
    const store = createTestEditor()
    execute(store, 'setFloorHeight', { floor: 'L1' as FloorId, height: 0 })
    expect(store.getState().message).toBe('height: must be > 0, got 0')
    execute(store, 'setFloorHeight', { floor: 'L1' as FloorId, height: 3.5 })
    expect(store.getState().message).toBeNull()
  })
})

describe('mark / undo / redo / bail / squash', () => {
  it('makes everything between marks one undo step', () => {
    const store = createTestEditor()
    mark(store)
    for (let i = 0; i < 200; i++) execute(store, 'moveElements', { ids: ['w1'], dx: 0.01, dy: 0 })
    mark(store)
    execute(store, 'moveElements', { ids: ['c1'], dx: 1, dy: 0 })
    expect(store.getState().doc.walls.w1?.p1.x).toBeCloseTo(2, 9)
    undo(store)
    expect(store.getState().doc.columns.c1?.at.x).toBeCloseTo(6, 12)
    expect(store.getState().doc.walls.w1?.p1.x).toBeCloseTo(2, 9)
    undo(store)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
    expect(selectCanUndo(store.getState())).toBe(false)
    expect(selectCanRedo(store.getState())).toBe(true)
    redo(store)
    expect(store.getState().doc.walls.w1?.p1.x).toBeCloseTo(2, 9)
    expect(store.getState().doc.columns.c1?.at.x).toBeCloseTo(6, 12)
    redo(store)
    expect(store.getState().doc.columns.c1?.at.x).toBeCloseTo(7, 12)
  })

  it('skips empty marks on undo', () => {
    const store = createTestEditor()
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    mark(store)
    mark(store)
    expect(undo(store)).toBe(true)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
  })

  it('bails to the mark with nothing on the redo stack, keeping earlier steps', () => {
    const store = createTestEditor()
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    const m = mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 5, dy: 0 })
    execute(store, 'deleteElements', { ids: ['c1'] })
    bail(store, m)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 1, y: 0 })
    expect(store.getState().doc.columns.c1).toBeDefined()
    expect(hasRedo(store.getState().history)).toBe(false)
    undo(store)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
  })

  it('keeps the redo stack when a gesture that changed nothing is bailed', () => {
    const store = createTestEditor()
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    undo(store)
    const m = mark(store)
    bail(store, m)
    expect(redo(store)).toBe(true)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 1, y: 0 })
  })

  it('squashes several steps since a mark into one', () => {
    const store = createTestEditor()
    const m = mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    squash(store, m)
    undo(store)
    expect(store.getState().doc.walls.w1?.p1).toEqual({ x: 0, y: 0 })
    expect(undo(store)).toBe(false)
  })

  it('does not record selection, current floor or tool in history', () => {
    const store = createTestEditor()
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    setSelection(store, ['c1'])
    setCurrentFloor(store, 'L2' as FloorId)
    setSelection(store, ['c1'])
    setTool(store, 'wall')
    undo(store)
    expect(store.getState().selection).toEqual(['c1'])
    expect(store.getState().currentFloor).toBe('L2')
    expect(store.getState().tool.id).toBe('wall')
  })
})

describe('setSelection / setCurrentFloor', () => {
  it('drops unknown and repeated ids', () => {
    const store = createTestEditor()
    setSelection(store, ['w1', 'nope', 'w1', 'c1'])
    expect(store.getState().selection).toEqual(['w1', 'c1'])
  })

  it('refuses an unknown floor with a thrown programmer error', () => {
    expect(() => setCurrentFloor(createTestEditor(), 'X' as FloorId)).toThrow('[editor] setCurrentFloor: unknown floor "X"')
  })
})

describe('loadDocument', () => {
  it('replaces the document, clears history and selection, and bumps the revision', () => {
    const store = createTestEditor()
    mark(store)
    execute(store, 'moveElements', { ids: ['w1'], dx: 1, dy: 0 })
    setSelection(store, ['w1'])
    setCurrentFloor(store, 'L3' as FloorId)
    const demo = demoProject()
    loadDocument(store, demo)
    const s = store.getState()
    expect(s.doc).toBe(demo)
    expect(s.revision).toBe(2)
    expect(s.selection).toEqual([])
    expect(s.currentFloor).toBe('L3')
    expect(undo(store)).toBe(false)
    expect(redo(store)).toBe(false)
  })
})
