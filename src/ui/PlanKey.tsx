/**
 * The key to every plan symbol, drawn with the plan's own classes so it always matches the plan.
 * Shown from the plan's "Key" button and in the shortcuts sheet.
 */
import type { ReactNode } from 'react'

interface Entry {
  readonly id: string
  readonly label: string
  readonly swatch: ReactNode
}

const W = 34
const H = 18

export const PLAN_SYMBOLS: readonly Entry[] = [
  { id: 'wall', label: 'Wall (true thickness)', swatch: <rect className="wall-body" x={3} y={6} width={28} height={6} /> },
  { id: 'frame', label: 'Frame line (moment frame)', swatch: <g className="frame"><line className="frame-line" x1={3} y1={9} x2={31} y2={9} /></g> },
  { id: 'braced', label: 'Frame line (braced)', swatch: <g className="frame braced"><line className="frame-line" x1={3} y1={9} x2={31} y2={9} /></g> },
  { id: 'column', label: 'Column (turned to its angle)', swatch: <rect className="column-body" x={12} y={4} width={10} height={10} /> },
  { id: 'slab', label: 'Slab (dashed edge: from the typical floor)', swatch: <rect className="slab" x={3} y={3} width={28} height={12} /> },
  { id: 'opening', label: 'Opening in a slab', swatch: <path className="slab" fillRule="evenodd" d="M3 3 H31 V15 H3 Z M12 6 H22 V12 H12 Z" /> },
  { id: 'point-mass', label: 'Point mass', swatch: <path className="point-mass-body" d="M17 3 L23 9 L17 15 L11 9 Z" /> },
  { id: 'line-mass', label: 'Line mass', swatch: <line className="line-mass-body" x1={3} y1={9} x2={31} y2={9} /> },
  { id: 'grid', label: 'Grid line with its bubble', swatch: <g className="grid-line"><line x1={12} y1={9} x2={33} y2={9} /><circle cx={7} cy={9} r={5} /></g> },
  {
    id: 'cm',
    label: 'CM: centre of mass',
    swatch: (
      <g transform="translate(17 9)">
        <circle r={6} className="cm-ring" />
        <circle r={2.5} className="cm-core" />
      </g>
    ),
  },
  {
    id: 'cr',
    label: 'CR: centre of rigidity',
    swatch: (
      <g transform="translate(17 10)">
        <path d="M0 -7 L6.5 5 L-6.5 5 Z" className="cr-body" />
        <circle r={1.8} className="cr-core" />
      </g>
    ),
  },
  { id: 'ecc', label: 'e: eccentricity, arrow from CM to CR', swatch: <line className="ecc-vector" x1={3} y1={9} x2={29} y2={9} markerEnd="url(#key-ecc-head)" /> },
  { id: 'ls', label: 'l_s: mass radius of gyration, circle about CM', swatch: <circle className="ring ring-ls" cx={17} cy={9} r={7} /> },
  { id: 'rx', label: 'r_x: torsional radius, circle about CR', swatch: <circle className="ring ring-rx" cx={17} cy={9} r={7} /> },
  { id: 'ry', label: 'r_y: torsional radius, circle about CR', swatch: <circle className="ring ring-ry" cx={17} cy={9} r={7} /> },
  { id: 'snap-end', label: 'Snap: element end or slab corner', swatch: <g className="snap"><rect x={12} y={4} width={10} height={10} /></g> },
  { id: 'snap-mid', label: 'Snap: midpoint', swatch: <g className="snap"><path d="M17 3 L23 14 L11 14 Z" /></g> },
  { id: 'snap-grid', label: 'Snap: grid line or crossing', swatch: <g className="snap"><path d="M11 9 H23 M17 3 V15" /></g> },
  { id: 'handle', label: 'Handle of a selected element (round: turn)', swatch: <g><rect className="handle" x={7} y={5} width={8} height={8} /><circle className="handle rotate" cx={25} cy={9} r={4} /></g> },
]

/** The key as a list of small drawings with their meaning. */
export function PlanKey() {
  return (
    <div className="plan-key-list" data-testid="plan-key">
      <svg width={0} height={0} style={{ position: 'absolute' }} aria-hidden="true">
        <defs>
          <marker id="key-ecc-head" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto">
            <path d="M0 0 L10 5 L0 10 Z" className="ecc-head" />
          </marker>
        </defs>
      </svg>
      <ul>
        {PLAN_SYMBOLS.map((e) => (
          <li key={e.id} data-symbol={e.id}>
            <svg width={W} height={H} viewBox={`0 0 ${W} ${H}`} aria-hidden="true">
              {e.swatch}
            </svg>
            <span>{e.label}</span>
          </li>
        ))}
      </ul>
    </div>
  )
}
