import type { FloorId, UnitSystem } from '@/model'
import type { CentresRow } from './centresRows'
import { formatNumber, unitSymbol } from './quantities'

interface Props {
  readonly rows: readonly CentresRow[]
  readonly currentFloor: string
  readonly units: UnitSystem
  readonly isStale: boolean
  readonly onSelectFloor: (floorId: FloorId) => void
}

const dash = '—'

/**
 * Each floor's centres beside the plan: CM, CR, eccentricity, torsional radii, l_s and e/r, the
 * current floor highlighted; a click on a row shows that floor on the plan.
 */
export function CentresTable({ rows, currentFloor, units, isStale, onSelectFloor }: Props) {
  const len = (v: number | null | undefined): string => (v === null || v === undefined ? dash : formatNumber(v, 'length', units, 1))
  const rat = (v: number | null | undefined): string => (v === null || v === undefined ? dash : v.toFixed(2))
  const u = unitSymbol('length', units)
  return (
    <div className={`centres-table${isStale ? ' stale' : ''}`} data-testid="centres-table">
      <table className="data compact">
        <caption>
          Centres by floor ({u})
        </caption>
        <thead>
          <tr>
            <th>Floor</th>
            <th title="Centre of mass, x and y">CM</th>
            <th title="Centre of rigidity, x and y">CR</th>
            <th title="Eccentricity e = CR − CM, along x and y">e_x, e_y</th>
            <th title="Torsional radii about the centre of rigidity">r_x, r_y</th>
            <th title="Mass radius of gyration about the centre of mass">l_s</th>
            <th title="|e_x| / r_x and |e_y| / r_y">e/r</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr
              key={r.floorId}
              data-testid={`centres-row-${r.floorId}`}
              aria-current={r.floorId === currentFloor ? 'true' : undefined}
              className={r.floorId === currentFloor ? 'current' : undefined}
              onClick={() => onSelectFloor(r.floorId)}
            >
              <td title={r.floorName}>{r.number}</td>
              <td>{r.centreOfMass ? `${len(r.centreOfMass.x)}, ${len(r.centreOfMass.y)}` : dash}</td>
              <td>{r.centreOfRigidity ? `${len(r.centreOfRigidity.x)}, ${len(r.centreOfRigidity.y)}` : dash}</td>
              <td>{r.eccentricity ? `${len(r.eccentricity.x)}, ${len(r.eccentricity.y)}` : dash}</td>
              <td>{r.torsionalRadius ? `${len(r.torsionalRadius.x)}, ${len(r.torsionalRadius.y)}` : dash}</td>
              <td>{len(r.radiusOfGyration)}</td>
              <td>{r.eccentricityRatio ? `${rat(r.eccentricityRatio.x)}, ${rat(r.eccentricityRatio.y)}` : dash}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  )
}
