/**
 * The input size budget: how large a project file may be before the loader refuses it, checked on the
 * raw JSON before any field is validated so that an absurd file is refused in well under a second
 * with a message naming the field. The one place for these numbers; docs/file-format.md "Limits"
 * lists them with their reasons.
 * @see docs/file-format.md "Limits"
 */

/** Budget constants (counts, bytes). */
export const INPUT_BUDGET = {
  /** Bytes of a project file (CLI stat, UI file size) and characters of its text (loader). 64 MiB. */
  fileBytes: 64 * 1024 * 1024,
  /** Floors. */
  floors: 300,
  /** Lateral elements (walls + frame lines + columns). */
  elements: 20000,
  /** Lateral elements times floors: bounds assembly and wall condensation work. */
  elementFloors: 200000,
  /** Vertices of one slab outline, one opening or one line mass. */
  verticesPerPolygon: 10000,
  /** Vertices of all slab outlines, openings and line masses together. */
  verticesTotal: 50000,
  /** Mass records (slabs + line masses + point masses). */
  massRecords: 50000,
  /** Samples per direction of a recorded ground motion. */
  groundMotionSamples: 200000,
} as const

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)
const keyCount = (v: unknown): number => (isObject(v) ? Object.keys(v).length : 0)
const arrayLength = (v: unknown): number => (Array.isArray(v) ? v.length : 0)

/** Characters of a file's text over the budget, as a refusal message; null when within it. */
export function checkTextBudget(characters: number): string | null {
  if (characters <= INPUT_BUDGET.fileBytes) return null
  return `(file): ${characters} characters is more than the budget of ${INPUT_BUDGET.fileBytes} bytes (64 MiB; docs/file-format.md, Limits)`
}

/** A file size in bytes over the budget, as a refusal message; null when within it. */
export function checkFileSizeBudget(bytes: number): string | null {
  if (bytes <= INPUT_BUDGET.fileBytes) return null
  return `(file): ${bytes} bytes is more than the budget of ${INPUT_BUDGET.fileBytes} bytes (64 MiB; docs/file-format.md, Limits)`
}

/**
 * Budget problems of a raw (parsed, not yet validated) project document, each naming the field; empty
 * when within budget. Only counts are read (array lengths, key counts): linear in the number of
 * records and polygons, never in their vertices.
 */
export function checkDocumentBudget(doc: Record<string, unknown>): string[] {
  const B = INPUT_BUDGET
  const out: string[] = []
  const floors = arrayLength(doc.floors)
  if (floors > B.floors) out.push(`floors: ${floors} floors is more than the budget of ${B.floors}`)
  const walls = keyCount(doc.walls)
  const frames = keyCount(doc.frameLines)
  const columns = keyCount(doc.columns)
  const elements = walls + frames + columns
  if (elements > B.elements) {
    out.push(
      `walls, frameLines, columns: ${elements} lateral elements (${walls} walls, ${frames} frame lines, ${columns} columns) ` +
        `is more than the budget of ${B.elements}`,
    )
  }
  if (elements * Math.max(1, floors) > B.elementFloors) {
    out.push(
      `walls, frameLines, columns: ${elements} lateral elements × ${floors} floors = ${elements * floors} ` +
        `is more than the budget of ${B.elementFloors} element-floors`,
    )
  }
  const massRecords = keyCount(doc.slabs) + keyCount(doc.lineMasses) + keyCount(doc.pointMasses)
  if (massRecords > B.massRecords) {
    out.push(`slabs, lineMasses, pointMasses: ${massRecords} mass records is more than the budget of ${B.massRecords}`)
  }
  let total = 0
  const polygon = (path: string, v: unknown): void => {
    const n = arrayLength(v)
    total += n
    if (n > B.verticesPerPolygon) out.push(`${path}: ${n} vertices is more than the budget of ${B.verticesPerPolygon}`)
  }
  if (isObject(doc.slabs)) {
    for (const [id, s] of Object.entries(doc.slabs)) {
      if (!isObject(s)) continue
      polygon(`slabs.${id}.outline`, s.outline)
      if (Array.isArray(s.openings)) s.openings.forEach((o, i) => polygon(`slabs.${id}.openings[${i}]`, o))
    }
  }
  if (isObject(doc.lineMasses)) {
    for (const [id, m] of Object.entries(doc.lineMasses)) if (isObject(m)) polygon(`lineMasses.${id}.points`, m.points)
  }
  if (total > B.verticesTotal) {
    out.push(`slabs, lineMasses: ${total} vertices in all is more than the budget of ${B.verticesTotal}`)
  }
  const gm = isObject(doc.settings) && isObject(doc.settings.groundMotion) ? doc.settings.groundMotion : null
  if (gm) {
    for (const k of ['ax', 'ay'] as const) {
      const n = arrayLength(gm[k])
      if (n > B.groundMotionSamples) {
        out.push(`settings.groundMotion.${k}: ${n} samples is more than the budget of ${B.groundMotionSamples}`)
      }
    }
  }
  return out.length > 0 ? [...out, 'the input size budget is in docs/file-format.md, Limits'] : out
}
