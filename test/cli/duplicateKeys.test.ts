import { describe, expect, it } from 'vitest'
import { findDuplicateKeys, joinKeyPath } from '@/cli/duplicateKeys'

describe('findDuplicateKeys', () => {
  it('finds nothing in JSON without repeats, including equal keys in different objects', () => {
    expect(findDuplicateKeys('{"a": 1, "b": {"a": 2}, "c": [{"a": 1}, {"a": 2}]}')).toEqual([])
  })

  it('names a repeated key at the top level and inside records and arrays', () => {
    const text = '{"name": "x", "walls": {"w1": {"t": 0.2, "t": 0.3}}, "floors": [{"h": 3}, {"h": 3, "h": 4, "h": 5}], "name": "y"}'
    expect(findDuplicateKeys(text)).toEqual([
      { path: 'walls.w1.t', count: 2 },
      { path: 'floors[1].h', count: 3 },
      { path: 'name', count: 2 },
    ])
  })

  it('compares keys after JSON escapes, as JSON.parse does', () => {
    // "\u0061" and "a" are the same name once decoded (RFC 8259 section 7).
    expect(findDuplicateKeys('{"a": 1, "\\u0061": 2}')).toEqual([{ path: 'a', count: 2 }])
    expect(Object.keys(JSON.parse('{"a": 1, "\\u0061": 2}') as object)).toEqual(['a'])
  })

  it('is not fooled by braces, commas and quotes inside strings', () => {
    expect(findDuplicateKeys('{"a": "}, \\"a\\": {", "b": "[1,2]"}')).toEqual([])
  })

  it('handles nesting far deeper than a recursive scanner would survive', () => {
    const depth = 100_000
    const text = `${'['.repeat(depth)}{"k": 1, "k": 2}${']'.repeat(depth)}`
    const found = findDuplicateKeys(text)
    expect(found).toHaveLength(1)
    expect(found[0]?.path.endsWith('[0][0].k')).toBe(true)
  })
})

describe('joinKeyPath', () => {
  it('writes plain names with a dot and other names in brackets', () => {
    expect(joinKeyPath('', 'walls')).toBe('walls')
    expect(joinKeyPath('walls', 'core-s')).toBe('walls.core-s')
    expect(joinKeyPath('walls', 'a b')).toBe('walls["a b"]')
  })
})
