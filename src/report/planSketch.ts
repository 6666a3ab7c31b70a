/**
 * Plan sketches for the report: one SVG per distinct floor plan (same slabs and same lateral
 * elements), with each floor's centre of mass and centre of rigidity marked. Plain SVG text, no DOM.
 * Glyphs (our own): centre of mass = open circle with a cross; centre of rigidity = filled diamond;
 * walls = thick dark bars drawn at their thickness (at least 2 px); frame lines = dashed lines;
 * columns = small squares.
 */
import type { AnalysisResult, FloorCentres } from '@/engine'
import { contentFloorId, elementFloorRange, formatNumber, toDisplay, unitLabel } from '@/model'
import type { Floor, Point, Project, UnitSystem } from '@/model'
import { escapeHtml } from './escape'

/** A group of floors sharing one plan. */
export interface PlanGroup {
  /** 0-based floor indices, bottom first. */
  readonly floorIndices: readonly number[]
  /** The floor whose slabs the plan shows (after typical-floor links). */
  readonly contentFloor: string
  /** Ids of the lateral elements acting in the stories below these floors. */
  readonly elementIds: readonly string[]
}

function activeElements(project: Project, index: number): string[] {
  const ids: string[] = []
  const all = [
    ...Object.values(project.walls),
    ...Object.values(project.frameLines),
    ...Object.values(project.columns),
  ]
  for (const el of all) {
    const r = elementFloorRange(project, el)
    if (r && r.first <= index && index <= r.last) ids.push(el.id)
  }
  return ids.sort()
}

/** Floors grouped by identical plan (slab content floor and the set of elements below them). */
export function distinctPlans(project: Project): PlanGroup[] {
  const groups = new Map<string, { floorIndices: number[]; contentFloor: string; elementIds: string[] }>()
  project.floors.forEach((floor: Floor, index) => {
    const contentFloor = contentFloorId(project, floor.id)
    const elementIds = activeElements(project, index)
    const key = `${contentFloor}|${elementIds.join(',')}`
    const g = groups.get(key)
    if (g) g.floorIndices.push(index)
    else groups.set(key, { floorIndices: [index], contentFloor, elementIds })
  })
  return [...groups.values()]
}

const WIDTH = 640
const PAD = 36

interface Frame {
  readonly s: number
  readonly minX: number
  readonly maxY: number
  readonly height: number
}

function frameFor(points: readonly Point[]): Frame {
  let minX = Infinity
  let maxX = -Infinity
  let minY = Infinity
  let maxY = -Infinity
  for (const p of points) {
    if (!Number.isFinite(p.x) || !Number.isFinite(p.y)) continue
    minX = Math.min(minX, p.x)
    maxX = Math.max(maxX, p.x)
    minY = Math.min(minY, p.y)
    maxY = Math.max(maxY, p.y)
  }
  if (!Number.isFinite(minX)) return { s: 1, minX: 0, maxY: 0, height: 2 * PAD }
  const span = Math.max(maxX - minX, maxY - minY, 1e-6)
  const s = (WIDTH - 2 * PAD) / span
  return { s, minX, maxY, height: Math.ceil((maxY - minY) * s + 2 * PAD + 28) }
}

const f2 = (v: number): string => (Math.round(v * 100) / 100).toString()

/** A nice round scale-bar length in display units near `target`: 1, 2 or 5 times a power of ten. */
function niceLength(target: number): number {
  if (!(target > 0)) return 1
  const p = 10 ** Math.floor(Math.log10(target))
  const m = target / p
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p
}

function cmGlyph(x: number, y: number): string {
  return (
    `<g class="g-cm"><circle cx="${f2(x)}" cy="${f2(y)}" r="5.5"/>` +
    `<path d="M${f2(x - 5.5)} ${f2(y)}H${f2(x + 5.5)}M${f2(x)} ${f2(y - 5.5)}V${f2(y + 5.5)}"/></g>`
  )
}

function crGlyph(x: number, y: number): string {
  return `<path class="g-cr" d="M${f2(x)} ${f2(y - 6)}L${f2(x + 6)} ${f2(y)}L${f2(x)} ${f2(y + 6)}L${f2(x - 6)} ${f2(y)}Z"/>`
}

/**
 * SVG text of one plan group: slabs (with openings), walls, frame lines, columns, and per floor the
 * CM and CR markers labelled with the floor number; a scale bar in the display length unit.
 */
export function planSketchSvg(
  project: Project,
  result: AnalysisResult,
  group: PlanGroup,
  units: UnitSystem,
): string {
  const slabs = Object.values(project.slabs).filter((s) => s.floor === group.contentFloor)
  const ids = new Set(group.elementIds)
  const walls = Object.values(project.walls).filter((w) => ids.has(w.id))
  const frames = Object.values(project.frameLines).filter((f) => ids.has(f.id))
  const columns = Object.values(project.columns).filter((c) => ids.has(c.id))
  const centres = new Map<string, FloorCentres>((result.centres ?? []).map((c) => [c.floorId, c]))
  const floors = group.floorIndices.map((i) => ({ index: i, floor: project.floors[i] }))
  const markers = floors.map(({ index, floor }) => {
    const props = result.floors.find((f) => f.index === index)
    const c = floor ? centres.get(floor.id) : undefined
    return { index, cm: c?.centreOfMass ?? props?.centreOfMass ?? null, cr: c?.centreOfRigidity ?? null }
  })
  const points: Point[] = [
    ...slabs.flatMap((s) => s.outline),
    ...walls.flatMap((w) => [w.p1, w.p2]),
    ...frames.flatMap((f) => [f.p1, f.p2]),
    ...columns.map((c) => c.at),
    ...markers.flatMap((m) => [m.cm, m.cr].filter((p): p is Point => p !== null)),
  ]
  const fr = frameFor(points)
  const X = (x: number): number => (x - fr.minX) * fr.s + PAD
  const Y = (y: number): number => (fr.maxY - y) * fr.s + PAD
  const ring = (pts: readonly Point[]): string =>
    pts.length < 3 ? '' : `M${pts.map((p) => `${f2(X(p.x))} ${f2(Y(p.y))}`).join('L')}Z`
  const parts: string[] = []
  for (const slab of slabs) {
    const d = [ring(slab.outline), ...slab.openings.map(ring)].join('')
    if (d !== '') parts.push(`<path class="g-slab" fill-rule="evenodd" d="${d}"/>`)
  }
  for (const f of frames) {
    parts.push(
      `<line class="g-frame" x1="${f2(X(f.p1.x))}" y1="${f2(Y(f.p1.y))}" x2="${f2(X(f.p2.x))}" y2="${f2(Y(f.p2.y))}"/>`,
    )
  }
  for (const w of walls) {
    const sw = Math.max(2, w.thickness * fr.s)
    parts.push(
      `<line class="g-wall" stroke-width="${f2(sw)}" x1="${f2(X(w.p1.x))}" y1="${f2(Y(w.p1.y))}" x2="${f2(X(w.p2.x))}" y2="${f2(Y(w.p2.y))}"/>`,
    )
  }
  for (const c of columns) {
    parts.push(`<rect class="g-column" x="${f2(X(c.at.x) - 3)}" y="${f2(Y(c.at.y) - 3)}" width="6" height="6"/>`)
  }
  const crTrail = markers
    .map((m) => m.cr)
    .filter((p): p is Point => p !== null && Number.isFinite(p.x) && Number.isFinite(p.y))
  if (crTrail.length > 1) {
    parts.push(
      `<polyline class="g-trail" points="${crTrail.map((p) => `${f2(X(p.x))},${f2(Y(p.y))}`).join(' ')}"/>`,
    )
  }
  const labelAll = markers.length <= 8
  markers.forEach((m, k) => {
    const label = labelAll || k === 0 || k === markers.length - 1
    if (m.cm && Number.isFinite(m.cm.x) && Number.isFinite(m.cm.y)) {
      parts.push(cmGlyph(X(m.cm.x), Y(m.cm.y)))
    }
    if (m.cr && Number.isFinite(m.cr.x) && Number.isFinite(m.cr.y)) {
      parts.push(crGlyph(X(m.cr.x), Y(m.cr.y)))
      if (label) {
        parts.push(`<text class="g-label" x="${f2(X(m.cr.x) + 8)}" y="${f2(Y(m.cr.y) - 6)}">${m.index + 1}</text>`)
      }
    }
  })
  // Scale bar in the display length unit, about a fifth of the drawing width.
  const lengthUnit = unitLabel('length', units)
  const spanDisplay = toDisplay((WIDTH - 2 * PAD) / fr.s, 'length', units)
  const bar = niceLength(spanDisplay / 5)
  const barPx = (bar / spanDisplay) * (WIDTH - 2 * PAD)
  const by = fr.height - 14
  parts.push(
    `<path class="g-scale" d="M${PAD} ${by - 4}V${by}H${f2(PAD + barPx)}V${by - 4}"/>`,
    `<text class="g-label" x="${f2(PAD + barPx + 6)}" y="${by}">${escapeHtml(formatNumber(bar, 3))} ${escapeHtml(lengthUnit)}</text>`,
  )
  const floorsText = group.floorIndices.map((i) => i + 1).join(', ')
  const title = `Plan of floor${group.floorIndices.length === 1 ? '' : 's'} ${floorsText}`
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" class="plan-sketch" viewBox="0 0 ${WIDTH} ${fr.height}" ` +
    `width="100%" role="img" aria-label="${escapeHtml(title)}"><title>${escapeHtml(title)}</title>` +
    parts.join('') +
    '</svg>'
  )
}
