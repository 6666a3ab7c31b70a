import { describe, expect, it } from 'vitest'
import { execute } from '@/editor'
import { ACTIONS } from '@/ui/actions'
import { createTestEditor } from '../helpers/createTestEditor'

describe('default names of new elements', () => {
  it('name a new wall, frame line and column after the tool that draws them', () => {
    const store = createTestEditor()
    const label = (tool: string): string => ACTIONS.find((a) => a.tool === tool)?.label ?? '?'
    expect(execute(store, 'addWall', { id: 'nw', p1: { x: 1, y: 1 }, p2: { x: 4, y: 1 } }).ok).toBe(true)
    expect(execute(store, 'addFrameLine', { id: 'nf', p1: { x: 1, y: 2 }, p2: { x: 4, y: 2 } }).ok).toBe(true)
    expect(execute(store, 'addColumn', { id: 'nc', at: { x: 2, y: 3 } }).ok).toBe(true)
    const doc = store.getState().doc
    expect(doc.walls.nw?.name).toMatch(new RegExp(`^${label('wall')} \\d+$`))
    expect(doc.frameLines.nf?.name).toMatch(new RegExp(`^${label('frame')} \\d+$`))
    expect(doc.columns.nc?.name).toMatch(new RegExp(`^${label('column')} \\d+$`))
  })
})
