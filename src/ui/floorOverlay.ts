/** Pure: the overlay figures of one floor picked out of an analysis result. */
import type { AnalysisResult, Verdict } from '@/engine'
import type { Point } from '@/model'

export interface FloorOverlay {
  readonly centreOfMass: Point | null
  readonly centreOfRigidity: Point | null
  /** CR minus CM, m. */
  readonly eccentricity: { readonly x: number; readonly y: number } | null
  /** r_x, r_y about the centre of rigidity, m. */
  readonly torsionalRadius: { readonly x: number; readonly y: number } | null
  /** l_s about the centre of mass, m. */
  readonly radiusOfGyration: number | null
  /** Worst max/avg story drift ratio of the story below this floor over the static torsion cases. */
  readonly worstDrift: {
    readonly ratio: number
    readonly caseId: string
    readonly verdict: Verdict | null
    readonly limit: number | null
  } | null
}

const finitePoint = (p: Point | null | undefined): Point | null =>
  p && Number.isFinite(p.x) && Number.isFinite(p.y) ? p : null

/** The overlay data of floor `floorId`, with nulls for anything the result does not hold. */
export function floorOverlay(result: AnalysisResult | null, floorId: string): FloorOverlay {
  const floor = result?.floors.find((f) => f.id === floorId)
  const centres = result?.centres?.find((c) => c.floorId === floorId) ?? null
  let worst: FloorOverlay['worstDrift'] = null
  for (const c of result?.torsion?.cases ?? []) {
    for (const row of c.stories) {
      if (row.floorId !== floorId || !Number.isFinite(row.driftRatio)) continue
      if (!worst || row.driftRatio > worst.ratio) {
        worst = { ratio: row.driftRatio, caseId: c.id, verdict: null, limit: null }
      }
    }
  }
  if (worst) {
    const rows = result?.torsion?.criterion.rows.filter((r) => r.floorId === floorId) ?? []
    const driftRows = rows.filter((r) => /drift/i.test(r.quantity))
    const pick = driftRows.find((r) => r.caseId === worst?.caseId) ?? driftRows[0] ?? null
    if (pick) worst = { ...worst, verdict: pick.verdict, limit: pick.limit }
  }
  // A floor without mass has no centre of mass to draw (and no radius of gyration).
  const massless = floor !== undefined && !(Number.isFinite(floor.mass) && floor.mass > 0)
  const ls = massless ? null : (centres?.radiusOfGyration ?? floor?.radiusOfGyration ?? null)
  return {
    centreOfMass: massless ? null : finitePoint(centres?.centreOfMass ?? floor?.centreOfMass),
    centreOfRigidity: finitePoint(centres?.centreOfRigidity),
    eccentricity: centres ? centres.eccentricity : null,
    torsionalRadius: centres ? centres.torsionalRadius : null,
    radiusOfGyration: ls !== null && Number.isFinite(ls) ? ls : null,
    worstDrift: worst,
  }
}
