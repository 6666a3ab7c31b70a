import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { setCurrentFloor, setTool, undo } from '@/editor'
import { click, createTestEditor, move, send } from '../../helpers/createTestEditor'

describe('columnTool', () => {
  it('places a column where clicked (snapped) and selects it; undo removes it', () => {
    const store = createTestEditor()
    setTool(store, 'column')
    move(store, 6.1, 0.1)
    expect(store.getState().ephemeral.snap?.point).toEqual({ x: 6, y: 0 })
    click(store, 6.1, 0.1)
    const added = Object.values(store.getState().doc.columns).filter((c) => c.id !== 'c1')
    expect(added).toHaveLength(1)
    expect(added[0]?.at).toEqual({ x: 6, y: 0 })
    expect(store.getState().selection).toEqual([added[0]?.id])
    undo(store)
    expect(Object.keys(store.getState().doc.columns)).toEqual(['c1'])
  })
})

describe('massPointTool', () => {
  it('puts a point mass on the typical floor a linked floor shows', () => {
    const store = createTestEditor()
    setCurrentFloor(store, 'L2' as FloorId)
    setTool(store, 'mass-point')
    click(store, 3.3, 6.6)
    const added = Object.values(store.getState().doc.pointMasses).filter((m) => m.id !== 'pm1')
    expect(added).toHaveLength(1)
    expect(added[0]?.floor).toBe('L1')
    expect(added[0]?.mass).toBeCloseTo(1000, 9)
  })
})

describe('slabTool', () => {
  const corners = [
    [20, 0],
    [26, 0],
    [26, 6],
    [20, 6],
  ] as const

  it('draws a slab by vertices, closing on the first vertex, in one undo step', () => {
    const store = createTestEditor()
    setTool(store, 'slab')
    for (const [x, y] of corners) click(store, x, y)
    click(store, 20.1, 0.05)
    const added = Object.values(store.getState().doc.slabs).filter((s) => s.id !== 's1')
    expect(added).toHaveLength(1)
    expect(added[0]?.outline).toEqual(corners.map(([x, y]) => ({ x, y })))
    expect(store.getState().tool.state).toBe('idle')
    undo(store)
    expect(Object.keys(store.getState().doc.slabs)).toEqual(['s1'])
  })

  it('closes with Enter, removes the last vertex with Backspace, cancels with Escape', () => {
    const store = createTestEditor()
    setTool(store, 'slab')
    for (const [x, y] of corners) click(store, x, y)
    click(store, 23, 9)
    send(store, { type: 'key', key: 'Backspace' })
    send(store, { type: 'key', key: 'Enter' })
    const added = Object.values(store.getState().doc.slabs).filter((s) => s.id !== 's1')
    expect(added[0]?.outline).toHaveLength(4)

    click(store, 30, 0)
    click(store, 34, 0)
    send(store, { type: 'key', key: 'Enter' }) // too few: refused, still drawing
    expect(store.getState().message).toContain('needs at least 3 points')
    expect(store.getState().tool.state).toBe('drawing')
    send(store, { type: 'key', key: 'Escape' })
    expect(store.getState().tool.state).toBe('idle')
    expect(Object.keys(store.getState().doc.slabs)).toHaveLength(2)
  })

  it('adds vertices by typed offsets from the last one', () => {
    const store = createTestEditor()
    setTool(store, 'slab')
    click(store, 20, 0)
    send(store, { type: 'numeric', mode: 'offset', a: 5, b: 0 })
    send(store, { type: 'numeric', mode: 'offset', a: 0, b: 5 })
    send(store, { type: 'key', key: 'Enter' })
    const added = Object.values(store.getState().doc.slabs).filter((s) => s.id !== 's1')
    expect(added[0]?.outline).toEqual([
      { x: 20, y: 0 },
      { x: 25, y: 0 },
      { x: 25, y: 5 },
    ])
  })
})

describe('openingTool', () => {
  it('cuts an opening into the slab holding the first vertex', () => {
    const store = createTestEditor()
    setTool(store, 'opening')
    click(store, 7.3, 1.3)
    click(store, 9.3, 1.3)
    click(store, 9.3, 3.3)
    send(store, { type: 'key', key: 'Enter' })
    expect(store.getState().doc.slabs.s1?.openings).toHaveLength(2)
  })

  it('refuses an opening started outside every slab and keeps drawing', () => {
    const store = createTestEditor()
    setTool(store, 'opening')
    click(store, 30.3, 1.3)
    click(store, 32.3, 1.3)
    click(store, 32.3, 3.3)
    send(store, { type: 'key', key: 'Enter' })
    expect(store.getState().message).toContain('start the opening inside a slab')
    expect(store.getState().doc.slabs.s1?.openings).toHaveLength(1)
    send(store, { type: 'cancel' })
    expect(undo(store)).toBe(false)
  })
})

describe('massLineTool', () => {
  it('draws a line mass; a second click on the last point finishes it', () => {
    const store = createTestEditor()
    setTool(store, 'mass-line')
    click(store, 1.3, 6.3)
    click(store, 5.3, 6.3)
    click(store, 5.3, 7.3)
    click(store, 5.3, 7.3)
    const added = Object.values(store.getState().doc.lineMasses).filter((m) => m.id !== 'lm1')
    expect(added).toHaveLength(1)
    expect(added[0]?.points).toHaveLength(3)
    expect(added[0]?.massPerLength).toBeCloseTo(500, 9)
  })
})
