/**
 * Pure: one row per floor of the centres the plan draws (CM, CR, e, r, l_s, e/r), top floor first,
 * for the table beside the plan and the marker tooltips. Missing numbers stay null (shown as "—"),
 * never NaN; a floor without mass has no centre of mass.
 */
import type { AnalysisResult } from '@/engine'
import type { Floor, FloorId, Point } from '@/model'

export interface CentresRow {
  readonly floorId: FloorId
  readonly floorName: string
  /** 1-based floor number, bottom up. */
  readonly number: number
  readonly centreOfMass: Point | null
  readonly centreOfRigidity: Point | null
  /** CR − CM, m. */
  readonly eccentricity: { readonly x: number; readonly y: number } | null
  /** Torsional radii r_x, r_y about the CR, m. */
  readonly torsionalRadius: { readonly x: number; readonly y: number } | null
  /** Mass radius of gyration l_s about the CM, m. */
  readonly radiusOfGyration: number | null
  /** e_x / r_x and e_y / r_y (absolute values), the ratios docs/balance.md scores. */
  readonly eccentricityRatio: { readonly x: number | null; readonly y: number | null } | null
}

const fin = (v: number | null | undefined): number | null => (v !== null && v !== undefined && Number.isFinite(v) ? v : null)
const finPoint = (p: Point | null | undefined): Point | null => (p && fin(p.x) !== null && fin(p.y) !== null ? p : null)
const ratio = (e: number, r: number): number | null => (Number.isFinite(e) && Number.isFinite(r) && r > 0 ? Math.abs(e) / r : null)

/** Rows of the centres table, top floor first (as the building reads), from the latest result. */
export function centresRows(floors: readonly Floor[], result: AnalysisResult | null): CentresRow[] {
  const rows = floors.map((floor, i): CentresRow => {
    const f = result?.floors.find((r) => r.id === floor.id)
    const c = result?.centres?.find((r) => r.floorId === floor.id) ?? null
    const hasMass = f ? Number.isFinite(f.mass) && f.mass > 0 : c !== null
    const e = c && fin(c.eccentricity.x) !== null && fin(c.eccentricity.y) !== null ? c.eccentricity : null
    const r = c && (fin(c.torsionalRadius.x) !== null || fin(c.torsionalRadius.y) !== null) ? c.torsionalRadius : null
    return {
      floorId: floor.id,
      floorName: floor.name,
      number: i + 1,
      centreOfMass: hasMass ? finPoint(c?.centreOfMass ?? f?.centreOfMass) : null,
      centreOfRigidity: finPoint(c?.centreOfRigidity),
      eccentricity: e,
      torsionalRadius: r,
      radiusOfGyration: hasMass ? fin(c?.radiusOfGyration ?? f?.radiusOfGyration) : null,
      eccentricityRatio: e && r ? { x: ratio(e.x, r.x), y: ratio(e.y, r.y) } : null,
    }
  })
  return rows.reverse()
}
