/**
 * Plan-view inset: one floor's outline at rest, the paths its slab corners travel over one cycle of
 * the shown mode (or over the record for a response), the turn centre, CM and CR, and the live
 * outline (moved by the frame loop through a ref, never through React state).
 */
import { pointsExtent } from '@/model'
import { useEffect, useMemo, useRef } from 'react'
import type { RefObject } from 'react'
import { useStore } from 'zustand'
import type { Point } from '@/model'
import type { BuildingLayout } from './buildingLayout'
import type { FloorMarks } from './BuildingInstance'
import {
  applyTransform,
  cyclePaths,
  historyFloorDofs,
  rigidTransform,
  scaleDof,
  turnCentre,
} from './modeAnimation'
import type { RigidTransform } from './modeAnimation'
import type { MotionSource } from './motionSource'
import type { ViewerStore } from './viewerStore'

interface Props {
  readonly layout: BuildingLayout
  readonly motion: MotionSource | null
  readonly marks: FloorMarks
  readonly store: ViewerStore
  readonly onFrame: RefObject<(() => void) | null>
  readonly transforms: RefObject<RigidTransform[]>
}

const SIZE = 220
const pts = (ps: readonly Point[], map: (p: Point) => Point) =>
  ps.map((p) => {
    const q = map(p)
    return `${q.x.toFixed(1)},${q.y.toFixed(1)}`
  }).join(' ')

export function PlanTrace(props: Props) {
  const { layout, motion, marks, store, onFrame, transforms } = props
  const amplitude = useStore(store, (s) => s.amplitude)
  const chosen = useStore(store, (s) => s.traceFloor)
  const floorIndex = Math.min(chosen ?? layout.floors.length - 1, layout.floors.length - 1)
  const floor = layout.floors[floorIndex]
  const live = useRef<SVGPolygonElement | null>(null)

  const drawing = useMemo(() => {
    if (!floor || floor.corners.length === 0) return null
    const outlines = floor.slabs.map((s) => s.outline)
    let paths: Point[][] = []
    let extreme: Point[][] = []
    let centre: Point | null = null
    if (motion?.kind === 'mode') {
      const d = motion.dofs[floorIndex]
      if (d) {
        const scale = motion.unitScale * amplitude
        paths = cyclePaths(d, scale, floor.corners, 48)
        const tr = rigidTransform(scaleDof(d, scale))
        extreme = outlines.map((o) => o.map((p) => applyTransform(tr, p.x, p.y)))
        const size = Math.max(layout.box.maxX - layout.box.minX, layout.box.maxY - layout.box.minY)
        centre = turnCentre(d, size)
      }
    } else if (motion?.kind === 'history') {
      const th = motion.history
      const stride = Math.max(1, Math.floor(th.stepCount / 400))
      paths = floor.corners.map(() => [])
      for (let s = 0; s < th.stepCount; s += stride) {
        const d = historyFloorDofs(th.displacements, th.dofCount, s, motion.unitScale * amplitude)[floorIndex]
        if (!d) continue
        const tr = rigidTransform(d)
        floor.corners.forEach((p, j) => paths[j]?.push(applyTransform(tr, p.x, p.y)))
      }
    }
    const all = [...floor.corners, ...paths.flat()]
    const { minX, maxX, minY, maxY } = pointsExtent(all) ?? { minX: 0, maxX: 0, minY: 0, maxY: 0 }
    const span = Math.max(maxX - minX, maxY - minY, 1e-6)
    const k = (SIZE - 24) / span
    const ox = (SIZE - (maxX - minX) * k) / 2
    const oy = (SIZE - (maxY - minY) * k) / 2
    // Plan y points up the screen, SVG y points down: flip here.
    const map = (p: Point): Point => ({ x: ox + (p.x - minX) * k, y: SIZE - oy - (p.y - minY) * k })
    const inView = (p: Point | null) =>
      p && p.x > minX - span * 0.2 && p.x < maxX + span * 0.2 && p.y > minY - span * 0.2 && p.y < maxY + span * 0.2
    return { outlines, paths, extreme, centre: inView(centre) ? centre : null, map }
  }, [floor, motion, amplitude, floorIndex, layout.box])

  useEffect(() => {
    if (!drawing || !floor) return
    const outline = floor.slabs[0]?.outline ?? []
    onFrame.current = () => {
      const tr = transforms.current?.[floorIndex]
      const el = live.current
      if (!el || !tr) return
      el.setAttribute('points', pts(outline.map((p) => applyTransform(tr, p.x, p.y)), drawing.map))
    }
    return () => {
      onFrame.current = null
    }
  }, [drawing, floor, floorIndex, onFrame, transforms])

  if (!drawing || !floor) return null
  const { map } = drawing
  const cm = marks.cm[floorIndex]
  const cr = marks.cr[floorIndex]
  return (
    <figure className="gyre-trace" data-testid="viewer-trace">
      <svg viewBox={`0 0 ${SIZE} ${SIZE}`} role="img" aria-label={`Plan paths of ${floor.name}`}>
        {drawing.outlines.map((o, i) => (
          <polygon key={`o${i}`} points={pts(o, map)} className="gyre-trace-rest" />
        ))}
        {floor.slabs.flatMap((s) =>
          s.openings.map((h, i) => <polygon key={`${s.id}h${i}`} points={pts(h, map)} className="gyre-trace-hole" />),
        )}
        {drawing.extreme.map((o, i) => (
          <polygon key={`e${i}`} points={pts(o, map)} className="gyre-trace-extreme" />
        ))}
        {drawing.paths.map((p, i) => (
          <polyline key={`p${i}`} points={pts(p, map)} className="gyre-trace-path" />
        ))}
        <polygon ref={live} className="gyre-trace-live" points="" />
        {cm && <circle {...circleAt(map(cm))} r={4} className="gyre-trace-cm" />}
        {cr && <rect {...squareAt(map(cr), 7)} className="gyre-trace-cr" />}
        {drawing.centre && (
          <g className="gyre-trace-centre">
            <line {...cross(map(drawing.centre), 6, 0)} />
            <line {...cross(map(drawing.centre), 6, 1)} />
          </g>
        )}
      </svg>
      <figcaption>
        {floor.name}: corner paths{motion?.kind === 'history' ? ' over the record' : ' over one cycle'}
        {drawing.centre ? ', + turn centre' : ''}
      </figcaption>
    </figure>
  )
}

const circleAt = (p: Point) => ({ cx: p.x, cy: p.y })
const squareAt = (p: Point, s: number) => ({
  x: p.x - s / 2,
  y: p.y - s / 2,
  width: s,
  height: s,
  transform: `rotate(45 ${p.x} ${p.y})`,
})
const cross = (p: Point, r: number, which: 0 | 1) =>
  which === 0
    ? { x1: p.x - r, y1: p.y - r, x2: p.x + r, y2: p.y + r }
    : { x1: p.x - r, y1: p.y + r, x2: p.x + r, y2: p.y - r }
