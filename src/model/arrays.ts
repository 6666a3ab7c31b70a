/**
 * Loops that replace spreads of unbounded arrays into calls (`Math.min(...xs)`, `a.push(...b)`): a
 * spread passes every element as an argument and overflows the stack for arrays of some 10⁵ items
 * (a 10 000-vertex outline times a few, a 200 000-sample record). Used everywhere in src.
 */
import type { Point } from './types'

/** Largest of `start` and every value (NaN values are skipped). */
export function maxOf(values: Iterable<number>, start = -Infinity): number {
  let m = start
  for (const v of values) if (v > m) m = v
  return m
}

/** Smallest of `start` and every value (NaN values are skipped). */
export function minOf(values: Iterable<number>, start = Infinity): number {
  let m = start
  for (const v of values) if (v < m) m = v
  return m
}

/** Append every item to `target` (in place) and return it. */
export function appendAll<T>(target: T[], items: Iterable<T>): T[] {
  for (const it of items) target.push(it)
  return target
}

/** Bounding box of points, m; null for none. */
export function pointsExtent(
  points: Iterable<Point>,
): { minX: number; maxX: number; minY: number; maxY: number } | null {
  let minX = Infinity
  let maxX = -Infinity
  let minY = Infinity
  let maxY = -Infinity
  let any = false
  for (const p of points) {
    any = true
    if (p.x < minX) minX = p.x
    if (p.x > maxX) maxX = p.x
    if (p.y < minY) minY = p.y
    if (p.y > maxY) maxY = p.y
  }
  return any ? { minX, maxX, minY, maxY } : null
}
