import { describe, expect, it } from 'vitest'
import type { FloorId } from '@/model'
import { hitHandle, selectionHandles } from '@/editor'
import { smallFixture } from '../../helpers/createTestEditor'

describe('selectionHandles', () => {
  it('gives end handles of selected walls and a rotation handle above the box centre', () => {
    const handles = selectionHandles(smallFixture(), 'L1' as FloorId, ['w1', 'c1'], 0.8)
    expect(handles.filter((h) => h.kind === 'endpoint')).toHaveLength(2)
    const rotate = handles.find((h) => h.kind === 'rotate')
    // box of w1 (0,0)-(4,0) and c1 (6,4): centre (3, 2), top y = 4
    expect(rotate?.kind === 'rotate' ? rotate.pivot : null).toEqual({ x: 3, y: 2 })
    expect(rotate?.at).toEqual({ x: 3, y: 4.8 })
  })

  it('has no end handles for a wall not on the floor', () => {
    const handles = selectionHandles(smallFixture(), 'L3' as FloorId, ['w2'], 0.8)
    expect(handles.filter((h) => h.kind === 'endpoint')).toHaveLength(0)
  })
})

describe('hitHandle', () => {
  it('finds the handle within tolerance and prefers ends to the rotation handle', () => {
    const handles = selectionHandles(smallFixture(), 'L1' as FloorId, ['w1'], 0.1)
    const h = hitHandle(handles, { x: 3.95, y: 0.05 }, 0.2)
    expect(h?.kind === 'endpoint' ? h.end : null).toBe('p2')
    expect(hitHandle(handles, { x: 2, y: 0.1 }, 0.2)?.kind).toBe('rotate')
    expect(hitHandle(handles, { x: 8, y: 8 }, 0.2)).toBeNull()
  })
})
