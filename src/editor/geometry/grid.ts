/** Default plan grid generator. */
import type { Grid } from '@/model'

/**
 * Letter label for index i: A, B, ... skipping I and O (they read as 1 and 0 on drawings, common
 * practice), then AA, AB, ...
 */
export function gridLetter(i: number): string {
  const letters = 'ABCDEFGHJKLMNPQRSTUVWXYZ'
  let n = i
  let s = ''
  do {
    s = (letters[n % letters.length] as string) + s
    n = Math.floor(n / letters.length) - 1
  } while (n >= 0)
  return s
}

export interface GridOptions {
  /** Number of lines of constant x (numbered 1, 2, 3 ...). */
  readonly xCount: number
  /** Number of lines of constant y (lettered A, B, C ...). */
  readonly yCount: number
  /** Spacing, m. */
  readonly xSpacing: number
  readonly ySpacing: number
  /** First line offsets, m (default 0). */
  readonly x0?: number
  readonly y0?: number
}

/** A regular grid: numbers along x (lines of constant x), letters along y. */
export function generateGrid(options: GridOptions): Grid {
  if (!(options.xCount >= 0 && options.yCount >= 0)) throw new RangeError('[editor] generateGrid: counts must be >= 0')
  if (!(options.xSpacing > 0 && options.ySpacing > 0)) throw new RangeError('[editor] generateGrid: spacing must be > 0')
  const x0 = options.x0 ?? 0
  const y0 = options.y0 ?? 0
  return {
    x: Array.from({ length: options.xCount }, (_, i) => ({ label: String(i + 1), at: x0 + i * options.xSpacing })),
    y: Array.from({ length: options.yCount }, (_, i) => ({ label: gridLetter(i), at: y0 + i * options.ySpacing })),
  }
}
