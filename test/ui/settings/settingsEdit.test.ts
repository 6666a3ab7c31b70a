import { describe, expect, it } from 'vitest'
import {
  NEW_GRID_SPACING,
  addGridLine,
  addTableRow,
  changeGridLine,
  nextGridLabel,
  parseStoredSnap,
  removeGridLine,
  removeTableRow,
  setTableRow,
  spectrumOfKind,
} from '@/ui/settings/settingsEdit'

describe('settingsEdit grid helpers', () => {
  it('labels new lines 1, 2, 3 across x and A, B, C across y, skipping labels in use', () => {
    expect(nextGridLabel([], 'x')).toBe('1')
    expect(nextGridLabel([{ label: '1', at: 0 }, { label: '3', at: 6 }], 'x')).toBe('2')
    expect(nextGridLabel([{ label: 'A', at: 0 }], 'y')).toBe('B')
    const many = Array.from({ length: 26 }, (_v, i) => ({ label: String.fromCharCode(65 + i), at: i }))
    expect(nextGridLabel(many, 'y')).toBe('AA')
  })

  it('adds a line one spacing beyond the farthest, or at 0 on an empty axis', () => {
    const g = addGridLine(undefined, 'x')
    expect(g).toEqual({ x: [{ label: '1', at: 0 }], y: [] })
    const g2 = addGridLine({ x: [{ label: '1', at: 0 }, { label: '2', at: 7.5 }], y: [] }, 'x')
    expect(g2.x[2]).toEqual({ label: '3', at: 7.5 + NEW_GRID_SPACING })
  })

  it('renames, moves and removes one line without touching the others', () => {
    const g = { x: [{ label: '1', at: 0 }, { label: '2', at: 6 }], y: [{ label: 'A', at: 0 }] }
    expect(changeGridLine(g, 'x', 1, { label: '2a', at: 6.5 }).x).toEqual([{ label: '1', at: 0 }, { label: '2a', at: 6.5 }])
    expect(removeGridLine(g, 'x', 0)).toEqual({ x: [{ label: '2', at: 6 }], y: g.y })
    expect(g.x).toHaveLength(2)
  })
})

describe('settingsEdit spectrum helpers', () => {
  it('keeps the values when the kind does not change and starts a table from the ASCE 7 shape', () => {
    const asce = { kind: 'asce7', SDS: 1.0, SD1: 0.5, TL: 8 } as const
    expect(spectrumOfKind(asce, 'asce7')).toBe(asce)
    const t = spectrumOfKind(asce, 'table')
    if (t.kind !== 'table') throw new Error('expected a table')
    // ASCE/SEI 7-16 11.4.6: Sa = 0.4 SDS at T = 0, SDS on the plateau up to Ts = SD1/SDS = 0.5 s,
    // Sa = SD1/T beyond (Eq. 11.4-6): at T = 1.0 s, 0.5/1.0 = 0.5 g.
    expect(t.points[0]).toEqual([0, 0.4])
    expect(t.points[2]![0]).toBeCloseTo(0.5, 12)
    expect(t.points[2]![1]).toBeCloseTo(1.0, 12)
    expect(t.points[3]![0]).toBeCloseTo(1.0, 12)
    expect(t.points[3]![1]).toBeCloseTo(0.5, 12)
    for (let i = 1; i < t.points.length; i++) expect(t.points[i]![0]).toBeGreaterThan(t.points[i - 1]![0])
  })

  it('edits, adds and removes table rows as new arrays', () => {
    const pts = [[0, 0.4], [0.5, 1]] as const
    expect(setTableRow(pts, 1, [0.6, 0.9])).toEqual([[0, 0.4], [0.6, 0.9]])
    expect(addTableRow(pts)).toEqual([[0, 0.4], [0.5, 1], [1.5, 1]])
    expect(addTableRow([])).toEqual([[0, 0]])
    expect(removeTableRow(pts, 0)).toEqual([[0.5, 1]])
  })
})

describe('parseStoredSnap', () => {
  it('keeps valid booleans and ignores nonsense without throwing', () => {
    expect(parseStoredSnap(null)).toEqual({})
    expect(parseStoredSnap('{not json')).toEqual({})
    expect(parseStoredSnap('[1]')).toEqual({})
    expect(parseStoredSnap('{"grid": false, "midpoints": "no", "colour": true}')).toEqual({ grid: false })
  })
})
