import { describe, expect, it } from 'vitest'
import { generateGrid } from '@/editor'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

describe('setGrid', () => {
  it('replaces the grid and removes it when given undefined', () => {
    const store = createTestEditor()
    const grid = generateGrid({ xCount: 4, yCount: 3, xSpacing: 5, ySpacing: 4 })
    checkDoUndoRedo(store, 'setGrid', { grid }, (doc) => {
      expect(doc.grid?.x.map((l) => l.label)).toEqual(['1', '2', '3', '4'])
    })
    checkDoUndoRedo(store, 'setGrid', { grid: undefined }, (doc) => {
      expect(doc).not.toHaveProperty('grid')
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'setGrid', { grid: { x: [], y: [] } })
  })

  it('refuses a label used twice', () => {
    checkRefused(
      createTestEditor(),
      'setGrid',
      { grid: { x: [{ label: '1', at: 0 }, { label: '1', at: 6 }], y: [] } },
      'grid.x[1].label: "1" is used twice',
    )
  })
})
