/**
 * Pure helpers of the project settings panel: grid-line edits, the tabulated spectrum rows, spectrum
 * kind switches with starting values, and the stored snap preferences. They build the next value;
 * the editor commands (setGrid, setAnalysisSettings) check it and refuse with the field's path.
 */
import type { Grid, SpectrumSpec } from '@/model'

export type GridAxis = 'x' | 'y'
type GridLine = Grid['x'][number]

/** Spacing of a newly added grid line beyond the last one, m (common practice bay size; editable). */
export const NEW_GRID_SPACING = 6

/** Next free default label: 1, 2, 3 ... for x lines, A, B, C ... (then AA, AB ...) for y lines. */
export function nextGridLabel(lines: readonly GridLine[], axis: GridAxis): string {
  const used = new Set(lines.map((l) => l.label))
  for (let i = 0; ; i++) {
    const label = axis === 'x' ? String(i + 1) : letters(i)
    if (!used.has(label)) return label
  }
}

function letters(i: number): string {
  let s = ''
  let n = i
  do {
    s = String.fromCharCode(65 + (n % 26)) + s
    n = Math.floor(n / 26) - 1
  } while (n >= 0)
  return s
}

/** The grid with one more line on `axis`, NEW_GRID_SPACING beyond the farthest (at 0 when none). */
export function addGridLine(grid: Grid | undefined, axis: GridAxis): Grid {
  const g: Grid = grid ?? { x: [], y: [] }
  const lines = g[axis]
  const at = lines.length === 0 ? 0 : Math.max(...lines.map((l) => l.at)) + NEW_GRID_SPACING
  return { ...g, [axis]: [...lines, { label: nextGridLabel(lines, axis), at }] }
}

/** The grid with line `index` of `axis` changed (label and/or position). */
export function changeGridLine(grid: Grid, axis: GridAxis, index: number, patch: Partial<GridLine>): Grid {
  return { ...grid, [axis]: grid[axis].map((l, i) => (i === index ? { ...l, ...patch } : l)) }
}

/** The grid without line `index` of `axis`. */
export function removeGridLine(grid: Grid, axis: GridAxis, index: number): Grid {
  return { ...grid, [axis]: grid[axis].filter((_l, i) => i !== index) }
}

/**
 * Starting values when the spectrum kind changes: the same kind keeps its values; a new kind starts
 * from plain example values the engineer then overwrites (ours, not from any site).
 */
export function spectrumOfKind(current: SpectrumSpec, kind: SpectrumSpec['kind']): SpectrumSpec {
  if (current.kind === kind) return current
  switch (kind) {
    case 'asce7':
      return { kind, SDS: 1.0, SD1: 0.6, TL: 8 }
    case 'en1998-1':
      return { kind, ag: 0.25, ground: 'C' }
    case 'table':
      return { kind, points: tableFrom(current) }
  }
}

/** A few (T, Sa) rows to start a table from: sampled from the current shape where it is simple. */
function tableFrom(s: SpectrumSpec): [number, number][] {
  if (s.kind === 'asce7') {
    // ASCE/SEI 7-16 11.4.6: plateau S_DS up to T_S = S_D1/S_DS, then S_D1/T.
    const Ts = s.SD1 / s.SDS
    return [
      [0, 0.4 * s.SDS],
      [0.2 * Ts, s.SDS],
      [Ts, s.SDS],
      [2 * Ts, s.SD1 / (2 * Ts)],
    ]
  }
  return [
    [0, 0.4],
    [0.5, 1],
    [2, 0.25],
  ]
}

/** Table rows with row `index` set to (T, Sa); the command refuses periods that do not ascend. */
export function setTableRow(points: readonly (readonly [number, number])[], index: number, row: readonly [number, number]): [number, number][] {
  return points.map((p, i) => (i === index ? [row[0], row[1]] : [p[0], p[1]]))
}

/** Table rows with one more row after the last (period + 1 s, same Sa), or (0, 0) when empty. */
export function addTableRow(points: readonly (readonly [number, number])[]): [number, number][] {
  const last = points[points.length - 1]
  return [...points.map((p) => [p[0], p[1]] as [number, number]), last ? [last[0] + 1, last[1]] : [0, 0]]
}

/** Table rows without row `index`. */
export function removeTableRow(points: readonly (readonly [number, number])[], index: number): [number, number][] {
  return points.filter((_p, i) => i !== index).map((p) => [p[0], p[1]])
}

/** Snap preferences kept per browser (a view preference, not part of the project file). */
export interface SnapPreferences {
  readonly enabled: boolean
  readonly grid: boolean
  readonly elements: boolean
  readonly midpoints: boolean
  readonly vertices: boolean
}

/** localStorage key of the snap preferences. */
export const SNAP_STORAGE_KEY = 'gyre.snap.v1'

const SNAP_KEYS = ['enabled', 'grid', 'elements', 'midpoints', 'vertices'] as const

/** The stored preferences that are valid booleans (anything else is ignored, never thrown). */
export function parseStoredSnap(text: string | null): Partial<SnapPreferences> {
  if (!text) return {}
  let o: unknown
  try {
    o = JSON.parse(text)
  } catch (_err) {
    return {}
  }
  if (!o || typeof o !== 'object') return {}
  const out: Record<string, boolean> = {}
  for (const k of SNAP_KEYS) {
    const v = (o as Record<string, unknown>)[k]
    if (typeof v === 'boolean') out[k] = v
  }
  return out
}
