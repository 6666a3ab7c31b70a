import { describe, expect, it } from 'vitest'
import { dispatch, hasRedo, parseNumericEntry, redo, setTool, undo } from '@/editor'
import type { EditorStore, NumericInput } from '@/editor'
import { click, createTestEditor, move, send } from '../../helpers/createTestEditor'

function numeric(store: EditorStore, text: string, mode: NumericInput['mode']): void {
  const parsed = parseNumericEntry(text, mode)
  if (!parsed.ok) throw new Error(parsed.message)
  dispatch(store, parsed.event)
}

function newWalls(store: EditorStore): string[] {
  return Object.keys(store.getState().doc.walls).filter((id) => id !== 'w1' && id !== 'w2')
}

describe('wallTool', () => {
  it('draws a wall by two clicks with a live length/angle readout, selected, full height', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    expect(store.getState().tool.state).toBe('drawing')
    move(store, 9.3, 5.3)
    const { readout, draft } = store.getState().ephemeral
    expect(readout?.length).toBeCloseTo(2, 12)
    expect(readout?.angle).toBeCloseTo(0, 12)
    expect(draft?.kind).toBe('segment')
    move(store, 10.1, 5.3)
    click(store, 10.1, 5.3)
    const ids = newWalls(store)
    expect(ids).toHaveLength(1)
    const wall = store.getState().doc.walls[ids[0] ?? '']
    expect(wall?.p1.x).toBeCloseTo(7.3, 12)
    expect(wall?.p2.x).toBeCloseTo(10.1, 12)
    expect(wall?.p2.y).toBeCloseTo(5.3, 12)
    expect(wall?.base).toBe('ground')
    expect(wall?.top).toBe('L3')
    expect(store.getState().selection).toEqual(ids)
    expect(store.getState().tool.state).toBe('idle')
    expect(store.getState().ephemeral.draft).toBeNull()
    // one undo removes it, redo brings it back
    expect(undo(store)).toBe(true)
    expect(newWalls(store)).toHaveLength(0)
    expect(undo(store)).toBe(false)
    expect(redo(store)).toBe(true)
    expect(newWalls(store)).toEqual(ids)
  })

  it('draws a wall from a click and an exact "length,angle" entry (5 m at 90°)', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    numeric(store, '5,90', 'length-angle')
    const wall = store.getState().doc.walls[newWalls(store)[0] ?? '']
    expect(wall?.p2.x).toBeCloseTo(7.3, 12)
    expect(wall?.p2.y).toBeCloseTo(10.3, 12)
  })

  it('draws a wall from a click and an exact "dx,dy" entry (3-4-5 triangle: length 5 m)', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    numeric(store, '3,4', 'offset')
    const wall = store.getState().doc.walls[newWalls(store)[0] ?? '']
    expect(wall?.p2.x).toBeCloseTo(10.3, 12)
    expect(wall?.p2.y).toBeCloseTo(9.3, 12)
    expect(Math.hypot((wall?.p2.x ?? 0) - 7.3, (wall?.p2.y ?? 0) - 5.3)).toBeCloseTo(5, 12)
  })

  it('snaps both ends (grid intersection and an element midpoint)', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 12.1, 7.9) // grid B/3 at (12, 8), also the end of f1
    click(store, 6.1, 7.95) // midpoint of f1 at (6, 8)
    const wall = store.getState().doc.walls[newWalls(store)[0] ?? '']
    expect(wall?.p1).toEqual({ x: 12, y: 8 })
    expect(wall?.p2).toEqual({ x: 6, y: 8 })
  })

  it('holds the direction to 15° steps with Shift', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    click(store, 10.3, 5.5, { shift: true })
    const wall = store.getState().doc.walls[newWalls(store)[0] ?? '']
    expect(wall?.p2.y).toBeCloseTo(5.3, 12)
  })

  it('cancels with Escape mid-draw: no wall, back to idle, nothing to undo or redo', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    move(store, 9, 6)
    send(store, { type: 'key', key: 'Escape' })
    expect(store.getState().tool.state).toBe('idle')
    expect(store.getState().ephemeral.draft).toBeNull()
    click(store, 9, 6.5)
    send(store, { type: 'cancel' })
    expect(newWalls(store)).toHaveLength(0)
    expect(undo(store)).toBe(false)
    expect(hasRedo(store.getState().history)).toBe(false)
    expect(store.getState().revision).toBe(0)
  })

  it('cancels the gesture when another tool is chosen mid-draw', () => {
    const store = createTestEditor()
    setTool(store, 'wall')
    click(store, 7.3, 5.3)
    setTool(store, 'pick')
    expect(store.getState().tool).toEqual({ id: 'pick', state: 'idle', memory: {} })
    expect(newWalls(store)).toHaveLength(0)
  })
})

describe('frameTool', () => {
  it('draws a frame line by two clicks; Escape mid-draw adds nothing', () => {
    const store = createTestEditor()
    setTool(store, 'frame')
    click(store, 7.3, 1.3)
    send(store, { type: 'key', key: 'Escape' })
    click(store, 7.3, 1.3)
    click(store, 7.3, 6.3)
    const frames = Object.values(store.getState().doc.frameLines).filter((f) => f.id !== 'f1')
    expect(frames).toHaveLength(1)
    expect(frames[0]?.p2.y).toBeCloseTo(6.3, 12)
    expect(frames[0]?.stiffness.kind).toBe('direct')
    expect(undo(store)).toBe(true)
    expect(Object.keys(store.getState().doc.frameLines)).toEqual(['f1'])
  })
})
