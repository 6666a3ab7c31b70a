import { describe, expect, it } from 'vitest'
import { generateGrid, gridLetter } from '@/editor'

describe('gridLetter', () => {
  it('skips I and O (common drawing practice) and continues with double letters', () => {
    expect([0, 1, 7, 8, 12, 13].map(gridLetter)).toEqual(['A', 'B', 'H', 'J', 'N', 'P'])
    expect(gridLetter(23)).toBe('Z')
    expect(gridLetter(24)).toBe('AA')
    expect(gridLetter(25)).toBe('AB')
  })
})

describe('generateGrid', () => {
  it('numbers the lines of constant x and letters the lines of constant y at the given spacing', () => {
    const g = generateGrid({ xCount: 3, yCount: 2, xSpacing: 7.5, ySpacing: 6, x0: 1 })
    expect(g.x).toEqual([
      { label: '1', at: 1 },
      { label: '2', at: 8.5 },
      { label: '3', at: 16 },
    ])
    expect(g.y).toEqual([
      { label: 'A', at: 0 },
      { label: 'B', at: 6 },
    ])
  })

  it('throws on a spacing <= 0 (programmer error)', () => {
    expect(() => generateGrid({ xCount: 2, yCount: 2, xSpacing: 0, ySpacing: 1 })).toThrow('spacing must be > 0')
  })
})
