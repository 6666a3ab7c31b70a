import { describe, expect, it } from 'vitest'
import { createTestEditor } from '../../helpers/createTestEditor'
import { checkCancel, checkDoUndoRedo, checkRefused } from './checklist'

const hole = [
  { x: 8, y: 5 },
  { x: 10, y: 5 },
  { x: 10, y: 7 },
  { x: 8, y: 7 },
]

describe('addOpening', () => {
  it('adds an opening inside the slab', () => {
    const store = createTestEditor()
    checkDoUndoRedo(store, 'addOpening', { slab: 's1', points: hole }, (doc) => {
      expect(doc.slabs.s1?.openings).toHaveLength(2)
      expect(doc.slabs.s1?.openings[1]).toEqual(hole)
    })
  })

  it('is undone by a bail when cancelled mid-interaction', () => {
    checkCancel(createTestEditor(), 'addOpening', { slab: 's1', points: hole })
  })

  it('refuses an opening vertex outside the outline, naming it', () => {
    const store = createTestEditor()
    const out = [...hole.slice(0, 2), { x: 13, y: 7 }, hole[3] ?? { x: 0, y: 0 }]
    checkRefused(store, 'addOpening', { slab: 's1', points: out }, 'points[2]: opening vertex lies outside slab "s1"')
    checkRefused(store, 'addOpening', { slab: 'zz', points: hole }, 'slab: unknown slab "zz"')
  })
})
