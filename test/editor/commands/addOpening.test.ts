import { describe, expect, it } from 'vitest'
import { parseProject, serializeProject } from '@/model'
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

  it('refuses an opening overlapping an existing one with the loader message, keeping the document (was: accepted)', () => {
    const store = createTestEditor()
    // s1 has the opening (2..4, 2..4); this one overlaps its corner
    const overlapping = [
      { x: 3, y: 3 },
      { x: 5, y: 3 },
      { x: 5, y: 5 },
      { x: 3, y: 5 },
    ]
    const message = 'slabs.s1.openings[1]: overlaps openings[0]'
    checkRefused(store, 'addOpening', { slab: 's1', points: overlapping }, message)
    // the loader refuses the same slab with the same words
    const doc = store.getState().doc
    const s1 = doc.slabs.s1!
    const raw = JSON.parse(serializeProject({ ...doc, slabs: { ...doc.slabs, s1: { ...s1, openings: [...s1.openings, overlapping] } } })) as unknown
    const parsed = parseProject(raw)
    expect(parsed.ok).toBe(false)
    if (!parsed.ok) expect(parsed.errors.some((e) => e.startsWith(message))).toBe(true)
  })

  it('refuses an opening nested in an existing one', () => {
    const inner = [
      { x: 2.5, y: 2.5 },
      { x: 3.5, y: 2.5 },
      { x: 3.5, y: 3.5 },
    ]
    checkRefused(createTestEditor(), 'addOpening', { slab: 's1', points: inner }, 'slabs.s1.openings[1]: lies inside openings[0]')
  })
})
