import { describe, expect, it } from 'vitest'
import {
  checkPositiveDefinite,
  isExactlySymmetric,
  multiply,
  squareSize,
  symmetryError,
  translationalMass,
} from '@/engine/checks'
import { buildStructure } from '@/engine/assemble'
import { expectArrayRelClose, expectRelClose } from '../helpers/approx'
import { mixedModel } from '../helpers/projectBuilder'

describe('squareSize', () => {
  it('throws for a length that is not a square', () => {
    expect(squareSize(new Float64Array(9))).toBe(3)
    expect(() => squareSize(new Float64Array(8))).toThrow('is not square')
  })
})

describe('symmetryError', () => {
  it('measures the largest mirror difference relative to the largest term', () => {
    expect(symmetryError(Float64Array.of(2, 1, 1, 2))).toBe(0)
    expectRelClose(symmetryError(Float64Array.of(4, 1, 0, 2)), 0.25, 1e-15)
    expect(symmetryError(new Float64Array(4))).toBe(0)
  })
})

describe('isExactlySymmetric', () => {
  it('compares mirror terms exactly', () => {
    expect(isExactlySymmetric(Float64Array.of(1, 0.1 + 0.2, 0.3, 1))).toBe(false)
    expect(isExactlySymmetric(Float64Array.of(1, 0.5, 0.5, 1))).toBe(true)
  })
})

describe('translationalMass', () => {
  it('equals the total floor mass of an assembled M', () => {
    const s = buildStructure(mixedModel()).structure!
    const t = translationalMass(s.mass)
    expectRelClose(t.x, s.totalMass, 1e-15)
    expectRelClose(t.y, s.totalMass, 1e-15)
  })
})

describe('checkPositiveDefinite', () => {
  it('accepts a positive definite matrix and rejects a singular one', () => {
    // [[2,1],[1,2]] has eigenvalues 1 and 3; pivots 2 and 3/2 -> ratio 3/4 (hand calculation)
    const pd = checkPositiveDefinite(Float64Array.of(2, 1, 1, 2))
    expect(pd.ok).toBe(true)
    expectRelClose(pd.minPivotRatio, 0.75, 1e-15)
    // [[1,1],[1,1]] is singular (eigenvalues 0 and 2)
    const sing = checkPositiveDefinite(Float64Array.of(1, 1, 1, 1))
    expect(sing.ok).toBe(false)
    expect(sing.failedIndex).toBe(1)
    // indefinite [[1,2],[2,1]] (eigenvalues -1, 3)
    expect(checkPositiveDefinite(Float64Array.of(1, 2, 2, 1)).ok).toBe(false)
  })

  it('finds the assembled M and K of a sound model positive definite', () => {
    const s = buildStructure(mixedModel()).structure!
    expect(checkPositiveDefinite(s.mass).ok).toBe(true)
    expect(checkPositiveDefinite(s.stiffness, 1e-12).ok).toBe(true)
  })
})

describe('multiply', () => {
  it('multiplies a row-major matrix by a vector', () => {
    expectArrayRelClose(multiply(Float64Array.of(1, 2, 3, 4), [1, -1]), [-1, -1], 1e-15)
    expect(() => multiply(Float64Array.of(1, 2, 3, 4), [1])).toThrow('expected 2')
  })
})
