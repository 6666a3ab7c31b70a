/**
 * The three arrangements of the working screen and their remembered pane sizes. Pure data and
 * storage helpers (no React), so that node tests can check them.
 *
 * The screen is four nested resizable groups:
 *   columns: floors | centre | side      rows (inside centre): views / lower
 *   views:   plan | model (3D)           lower: problems | results
 * Sizes are percentages of the group (0..100), keyed by panel id.
 */

/** Which pane the screen favours: drafting the plan, both views, or the 3D model. */
export type LayoutId = 'drafting' | 'side-by-side' | 'stage'

export type GroupId = 'columns' | 'rows' | 'views' | 'lower'

/** Panel id to percentage of its group. */
export type PaneSizes = Readonly<Record<string, number>>

export type LayoutSizes = Readonly<Record<GroupId, PaneSizes>>

export interface LayoutChoice {
  readonly id: LayoutId
  /** Button label. */
  readonly label: string
  /** Keyboard key that switches to it (no modifier, outside text boxes). */
  readonly key: string
  /** Tooltip. */
  readonly hint: string
}

export const LAYOUTS: readonly LayoutChoice[] = [
  { id: 'drafting', label: 'Plan desk', key: '1', hint: 'Large plan for drawing, 3D view beside it small' },
  { id: 'side-by-side', label: 'Side by side', key: '2', hint: 'Plan and 3D view at equal width' },
  { id: 'stage', label: '3D stage', key: '3', hint: 'Large 3D view for meetings, plan beside it small' },
]

export const GROUP_PANELS: Readonly<Record<GroupId, readonly string[]>> = {
  columns: ['floors', 'centre', 'side'],
  rows: ['views', 'lower'],
  views: ['plan', 'model'],
  lower: ['problems', 'results'],
}

/** Starting sizes of each layout (our own choice, tuned on a 1440 × 900 window). */
export const DEFAULT_SIZES: Readonly<Record<LayoutId, LayoutSizes>> = {
  drafting: {
    columns: { floors: 14, centre: 64, side: 22 },
    rows: { views: 68, lower: 32 },
    views: { plan: 68, model: 32 },
    lower: { problems: 34, results: 66 },
  },
  'side-by-side': {
    columns: { floors: 13, centre: 65, side: 22 },
    rows: { views: 64, lower: 36 },
    views: { plan: 50, model: 50 },
    lower: { problems: 34, results: 66 },
  },
  stage: {
    columns: { floors: 11, centre: 74, side: 15 },
    rows: { views: 82, lower: 18 },
    views: { plan: 27, model: 73 },
    lower: { problems: 34, results: 66 },
  },
}

export const LAYOUT_STORAGE_KEY = 'gyre.layout'

/** What is kept in storage: the active layout and the sizes the engineer dragged in each layout. */
export interface StoredLayouts {
  readonly active: LayoutId
  readonly sizes: Readonly<Partial<Record<LayoutId, Partial<LayoutSizes>>>>
}

const isLayoutId = (v: unknown): v is LayoutId => v === 'drafting' || v === 'side-by-side' || v === 'stage'

/** Sizes of one group if they name exactly its panels and add up to 100 % (±1); otherwise null. */
export function validPaneSizes(group: GroupId, value: unknown): PaneSizes | null {
  if (typeof value !== 'object' || value === null) return null
  const ids = GROUP_PANELS[group]
  const rec = value as Record<string, unknown>
  if (Object.keys(rec).length !== ids.length) return null
  let sum = 0
  const out: Record<string, number> = {}
  for (const id of ids) {
    const v = rec[id]
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0 || v > 100) return null
    out[id] = v
    sum += v
  }
  return Math.abs(sum - 100) <= 1 ? out : null
}

/** Read stored layouts from a JSON text; anything malformed falls back to the defaults piece by piece. */
export function parseStoredLayouts(text: string | null): StoredLayouts {
  const fallback: StoredLayouts = { active: 'side-by-side', sizes: {} }
  if (!text) return fallback
  let raw: unknown
  try {
    raw = JSON.parse(text)
  } catch (_err) {
    return fallback
  }
  if (typeof raw !== 'object' || raw === null) return fallback
  const r = raw as { active?: unknown; sizes?: unknown }
  const sizes: Partial<Record<LayoutId, Partial<Record<GroupId, PaneSizes>>>> = {}
  if (typeof r.sizes === 'object' && r.sizes !== null) {
    for (const choice of LAYOUTS) {
      const perLayout = (r.sizes as Record<string, unknown>)[choice.id]
      if (typeof perLayout !== 'object' || perLayout === null) continue
      const kept: Partial<Record<GroupId, PaneSizes>> = {}
      for (const group of Object.keys(GROUP_PANELS) as GroupId[]) {
        const s = validPaneSizes(group, (perLayout as Record<string, unknown>)[group])
        if (s) kept[group] = s
      }
      sizes[choice.id] = kept
    }
  }
  return { active: isLayoutId(r.active) ? r.active : fallback.active, sizes }
}

/** The sizes a layout opens with: the engineer's dragged sizes where kept, else the defaults. */
export function sizesFor(stored: StoredLayouts, layout: LayoutId): LayoutSizes {
  const kept = stored.sizes[layout] ?? {}
  const base = DEFAULT_SIZES[layout]
  return {
    columns: kept.columns ?? base.columns,
    rows: kept.rows ?? base.rows,
    views: kept.views ?? base.views,
    lower: kept.lower ?? base.lower,
  }
}

/** Stored layouts with one group's sizes replaced in one layout. */
export function withPaneSizes(stored: StoredLayouts, layout: LayoutId, group: GroupId, sizes: PaneSizes): StoredLayouts {
  const valid = validPaneSizes(group, sizes)
  if (!valid) return stored
  return { ...stored, sizes: { ...stored.sizes, [layout]: { ...stored.sizes[layout], [group]: valid } } }
}

/** The layout a key press asks for (plain 1, 2, 3), or null. */
export function layoutForKey(e: { key: string; ctrlKey: boolean; metaKey: boolean; altKey: boolean }): LayoutId | null {
  if (e.ctrlKey || e.metaKey || e.altKey) return null
  return LAYOUTS.find((l) => l.key === e.key)?.id ?? null
}
