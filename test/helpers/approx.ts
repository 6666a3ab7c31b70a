/** Relative-error helpers for float comparisons in tests (never compare floats with toBe). */
import { expect } from 'vitest'

/**
 * Relative error |actual - expected| / max(|expected|, floor). `floor` keeps the measure finite when
 * the expected value is zero (then it is an absolute error scaled by `floor`).
 */
export function relativeError(actual: number, expected: number, floor = 1e-300): number {
  return Math.abs(actual - expected) / Math.max(Math.abs(expected), floor)
}

/** Asserts |actual - expected| <= tol * max(|expected|, floor); the message names both values. */
export function expectRelClose(actual: number, expected: number, tol = 1e-9, floor = 1e-300): void {
  const err = relativeError(actual, expected, floor)
  expect(Number.isFinite(actual), `value ${actual} is not finite`).toBe(true)
  expect(err, `actual ${actual} vs expected ${expected}: relative error ${err} > ${tol}`).toBeLessThanOrEqual(
    tol,
  )
}

/**
 * Asserts two arrays agree entry by entry, with the error measured relative to the largest |expected|
 * entry (so round-off on zero entries is judged against the matrix's own scale).
 */
export function expectArrayRelClose(
  actual: ArrayLike<number>,
  expected: ArrayLike<number>,
  tol = 1e-9,
): void {
  expect(actual.length, 'array length').toBe(expected.length)
  let scale = 0
  for (let i = 0; i < expected.length; i++) scale = Math.max(scale, Math.abs(expected[i] ?? 0))
  if (scale === 0) scale = 1
  for (let i = 0; i < expected.length; i++) {
    const a = actual[i] ?? Number.NaN
    const e = expected[i] ?? Number.NaN
    const err = Math.abs(a - e) / scale
    expect(err, `entry ${i}: actual ${a} vs expected ${e} (scale ${scale})`).toBeLessThanOrEqual(tol)
  }
}
