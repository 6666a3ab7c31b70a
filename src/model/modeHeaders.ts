/**
 * Gyre's one set of mode-table headers, used by every mode table: the screen, the 3D view, the CLI,
 * the CSV files and the printable report. Change a word here and every output follows.
 *
 * "share" is the effective modal mass of the mode as a part of the total mass (a trade quantity,
 * the effective modal mass ratio); "running" is the sum of the shares of this and all lower modes.
 * θ is rotation about the vertical axis through the building centre of mass.
 *
 * @see docs/results-format.md (modes) for the quantities behind each column
 */

export type ModeColumnKey =
  | 'mode'
  | 'period'
  | 'frequency'
  | 'shareX'
  | 'shareY'
  | 'shareRz'
  | 'runningX'
  | 'runningY'
  | 'runningRz'
  | 'torsion'
  | 'class'

export interface ModeColumn {
  readonly key: ModeColumnKey
  /** The header word(s), identical in every output. */
  readonly header: string
  /** Unit of the value on screen and in the CLI ('' for none). CSV and report carry shares as 0..1. */
  readonly unit: '' | 's' | 'Hz' | '%'
  /** One-line explanation for a tooltip or a table note. */
  readonly hint: string
}

export const MODE_COLUMNS: readonly ModeColumn[] = [
  { key: 'mode', header: 'mode', unit: '', hint: 'Mode number, longest period first' },
  { key: 'period', header: 'T', unit: 's', hint: 'Period' },
  { key: 'frequency', header: 'f', unit: 'Hz', hint: 'Frequency' },
  { key: 'shareX', header: 'share X', unit: '%', hint: 'Effective modal mass along X as a share of the total mass' },
  { key: 'shareY', header: 'share Y', unit: '%', hint: 'Effective modal mass along Y as a share of the total mass' },
  {
    key: 'shareRz',
    header: 'share θ',
    unit: '%',
    hint: 'Effective modal mass moment in rotation about the building centre of mass, as a share of the total',
  },
  { key: 'runningX', header: 'running X', unit: '%', hint: 'Sum of share X over this and all lower modes' },
  { key: 'runningY', header: 'running Y', unit: '%', hint: 'Sum of share Y over this and all lower modes' },
  { key: 'runningRz', header: 'running θ', unit: '%', hint: 'Sum of share θ over this and all lower modes' },
  {
    key: 'torsion',
    header: 'torsion',
    unit: '%',
    hint: "Part of the mode's kinetic energy in rotation about each floor's centre of mass",
  },
  { key: 'class', header: 'class', unit: '', hint: 'What the mode mostly does: X, Y, torsion, or coupled' },
]

/** A column's header with its unit in brackets, e.g. "T (s)", "share X (%)", "class". */
export function modeHeaderLabel(column: ModeColumn, unit: string = column.unit): string {
  return unit ? `${column.header} (${unit})` : column.header
}

/** The column of a key (every key exists). */
export function modeColumn(key: ModeColumnKey): ModeColumn {
  const c = MODE_COLUMNS.find((m) => m.key === key)
  if (!c) throw new Error(`[model] unknown mode column ${key}`)
  return c
}
