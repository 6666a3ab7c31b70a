/** Pure: the lines of the tooltip over the plan's centre-of-mass and centre-of-rigidity markers. */
import type { UnitSystem } from '@/model'
import type { FloorOverlay } from './floorOverlay'
import { formatQuantity } from './quantities'

/** Tooltip lines for a marker, in display units; missing numbers read "—". */
export function markerTip(which: 'cm' | 'cr', o: FloorOverlay, units: UnitSystem): string[] {
  const len = (v: number | null | undefined): string => (v === null || v === undefined ? '—' : formatQuantity(v, 'length', units))
  const ratio = (e: number | undefined, r: number | undefined): string =>
    e !== undefined && r !== undefined && Number.isFinite(e) && Number.isFinite(r) && r > 0 ? (Math.abs(e) / r).toFixed(2) : '—'
  if (which === 'cm') {
    const p = o.centreOfMass
    return ['Centre of mass (CM)', `x ${len(p?.x)} · y ${len(p?.y)}`, `l_s ${len(o.radiusOfGyration)} (mass radius of gyration)`]
  }
  const p = o.centreOfRigidity
  const e = o.eccentricity
  const r = o.torsionalRadius
  return [
    'Centre of rigidity (CR)',
    `x ${len(p?.x)} · y ${len(p?.y)}`,
    `e_x ${len(e?.x)} · e_y ${len(e?.y)} (CR − CM)`,
    `r_x ${len(r?.x)} · r_y ${len(r?.y)} (torsional radii)`,
    `e_x/r_x ${ratio(e?.x, r?.x)} · e_y/r_y ${ratio(e?.y, r?.y)}`,
  ]
}
