/**
 * The 2D plan of one floor as SVG: slab and openings, grid with labelled lines, walls at true
 * thickness, frame lines, columns, masses, selection handles, the drawing preview, snap marks and the
 * live centre overlays. Pointer input is turned into plan coordinates (m) and handed to `onPointer`;
 * pan (middle/right button or Space + drag) and zoom (wheel) are handled here.
 */
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from 'react'
import type { PointerEvent as ReactPointerEvent, ReactNode, WheelEvent as ReactWheelEvent } from 'react'
import { describeWallGroups } from '@/engine'
import { maxOf, minOf } from '@/model'
import type { Point, Project, UnitSystem } from '@/model'
import type { FloorOverlay } from './floorOverlay'
import { markerTip } from './markerTip'
import { PlanKey } from './PlanKey'
import type { PlanScene } from './planScene'
import { backgroundStep, fitView, panBy, polygonPath, toPlan, toScreen, wallOutline, zoomAt } from './planView'
import type { Box, PlanView, ScreenSize } from './planView'
import { formatQuantity } from './quantities'

/** What is under the pointer, as drawn (the editor may hit-test on its own as well). */
export interface PlanTarget {
  readonly id: string
  /** 'body', 'p1', 'p2', 'rotate', or 'vertex:<i>' for slab vertices. */
  readonly part: string
}

export interface PlanPointerEvent {
  readonly type: 'down' | 'move' | 'up' | 'leave'
  readonly point: Point
  readonly screen: Point
  readonly shift: boolean
  readonly alt: boolean
  readonly ctrl: boolean
  readonly target: PlanTarget | null
  readonly pixelsPerMetre: number
}

/** Drawing feedback from the active tool, in plan coordinates. */
export type PlanPreview =
  | { readonly kind: 'segment'; readonly p1: Point; readonly p2: Point; readonly thickness?: number }
  | { readonly kind: 'polyline'; readonly points: readonly Point[]; readonly closed: boolean }
  | { readonly kind: 'point'; readonly at: Point }
  | { readonly kind: 'box'; readonly a: Point; readonly b: Point }

export type PlanHandle =
  | { readonly kind: 'endpoint'; readonly id: string; readonly end: 'p1' | 'p2'; readonly at: Point }
  | { readonly kind: 'rotate'; readonly at: Point; readonly pivot: Point }

export interface PlanSnap {
  readonly at: Point
  /** 'grid', 'endpoint', 'midpoint', 'vertex', 'intersection', ... */
  readonly kind: string
}

interface Props {
  readonly project: Project
  readonly scene: PlanScene
  readonly bounds: Box | null
  readonly units: UnitSystem
  readonly selection: ReadonlySet<string>
  readonly overlay: FloorOverlay
  readonly overlayStale: boolean
  readonly showOverlays: boolean
  readonly preview: readonly PlanPreview[]
  readonly snap: PlanSnap | null
  /** Selection handles from the editor (endpoints to stretch, one rotation knob). */
  readonly handles: readonly PlanHandle[]
  /** Live length/angle text near the pointer while drawing. */
  readonly readout: string | null
  /** Increment to fit the view to `bounds`. */
  readonly fitRequest: number
  readonly cursor: string
  readonly onPointer: (event: PlanPointerEvent) => void
  readonly onViewChange?: (view: PlanView) => void
}

const ZOOM_STEP = 1.15

export function PlanCanvas(props: Props) {
  const { project, scene, bounds, units, selection, overlay, preview, snap } = props
  const hostRef = useRef<HTMLDivElement>(null)
  const svgRef = useRef<SVGSVGElement>(null)
  const [size, setSize] = useState<ScreenSize>({ width: 800, height: 600 })
  const groups = useMemo(() => describeWallGroups(project), [project])
  const [view, setView] = useState<PlanView>(() => fitView(bounds, { width: 800, height: 600 }))
  const [hover, setHover] = useState<Point | null>(null)
  const [tip, setTip] = useState<'cm' | 'cr' | null>(null)
  const panning = useRef<{ x: number; y: number } | null>(null)
  const spaceDown = useRef(false)
  const fitted = useRef<{ request: number; real: boolean } | null>(null)

  useLayoutEffect(() => {
    const host = hostRef.current
    if (!host) return
    const measure = (): void => {
      const r = host.getBoundingClientRect()
      if (r.width > 0 && r.height > 0) setSize({ width: Math.round(r.width), height: Math.round(r.height) })
    }
    measure()
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(measure)
    observer?.observe(host)
    return () => observer?.disconnect()
  }, [])

  // Fit on the first real size, and whenever asked to.
  useLayoutEffect(() => {
    const host = hostRef.current
    if (!host) return
    const r = host.getBoundingClientRect()
    const real = r.width > 0 && r.height > 0
    // Wait for the measured size to reach state before the first fit.
    if (real && (Math.round(r.width) !== size.width || Math.round(r.height) !== size.height)) return
    const last = fitted.current
    if (last && last.request === props.fitRequest && last.real) return
    fitted.current = { request: props.fitRequest, real }
    setView(fitView(bounds, size))
    // bounds left out on purpose: editing must not re-fit the view under the pointer.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [props.fitRequest, size])

  const { onViewChange } = props
  useEffect(() => {
    onViewChange?.(view)
  }, [view, onViewChange])

  useEffect(() => {
    const down = (e: KeyboardEvent): void => {
      if (e.code === 'Space' && !(e.target instanceof HTMLInputElement)) spaceDown.current = true
    }
    const up = (e: KeyboardEvent): void => {
      if (e.code === 'Space') spaceDown.current = false
    }
    window.addEventListener('keydown', down)
    window.addEventListener('keyup', up)
    return () => {
      window.removeEventListener('keydown', down)
      window.removeEventListener('keyup', up)
    }
  }, [])

  const S = (p: Point): Point => toScreen(view, size, p)

  const targetOf = (el: EventTarget | null): PlanTarget | null => {
    let node = el instanceof Element ? el : null
    while (node && node !== svgRef.current) {
      const id = node.getAttribute('data-id')
      if (id) return { id, part: node.getAttribute('data-part') ?? 'body' }
      node = node.parentElement
    }
    return null
  }

  const emit = useCallback(
    (type: PlanPointerEvent['type'], e: ReactPointerEvent<SVGSVGElement>) => {
      const rect = svgRef.current?.getBoundingClientRect()
      const screen = { x: e.clientX - (rect?.left ?? 0), y: e.clientY - (rect?.top ?? 0) }
      const point = toPlan(view, size, screen)
      if (type === 'move') setHover(point)
      props.onPointer({
        type,
        point,
        screen,
        shift: e.shiftKey,
        alt: e.altKey,
        ctrl: e.ctrlKey || e.metaKey,
        target: targetOf(e.target),
        pixelsPerMetre: view.scale,
      })
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [view, size, props.onPointer],
  )

  const onPointerDown = (e: ReactPointerEvent<SVGSVGElement>): void => {
    svgRef.current?.focus({ preventScroll: true })
    if (e.button === 1 || e.button === 2 || spaceDown.current) {
      panning.current = { x: e.clientX, y: e.clientY }
      svgRef.current?.setPointerCapture?.(e.pointerId)
      e.preventDefault()
      return
    }
    if (e.button !== 0) return
    svgRef.current?.setPointerCapture?.(e.pointerId)
    emit('down', e)
  }
  const onPointerMove = (e: ReactPointerEvent<SVGSVGElement>): void => {
    if (panning.current) {
      const dx = e.clientX - panning.current.x
      const dy = e.clientY - panning.current.y
      panning.current = { x: e.clientX, y: e.clientY }
      setView((v) => panBy(v, dx, dy))
      return
    }
    emit('move', e)
  }
  const onPointerUp = (e: ReactPointerEvent<SVGSVGElement>): void => {
    svgRef.current?.releasePointerCapture?.(e.pointerId)
    if (panning.current) {
      panning.current = null
      return
    }
    if (e.button !== 0) return
    emit('up', e)
  }
  const onWheel = (e: ReactWheelEvent<SVGSVGElement>): void => {
    const rect = svgRef.current?.getBoundingClientRect()
    const s = { x: e.clientX - (rect?.left ?? 0), y: e.clientY - (rect?.top ?? 0) }
    const factor = e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP
    setView((v) => zoomAt(v, size, s, factor))
  }

  // Prevent the page from scrolling on wheel over the plan (React wheel listeners are passive).
  useEffect(() => {
    const svg = svgRef.current
    if (!svg) return
    const stop = (e: WheelEvent): void => e.preventDefault()
    svg.addEventListener('wheel', stop, { passive: false })
    return () => svg.removeEventListener('wheel', stop)
  }, [])

  const layers: ReactNode[] = []

  // Background grid (fine, unlabelled) in the visible area.
  const step = backgroundStep(view.scale)
  const topLeft = toPlan(view, size, { x: 0, y: 0 })
  const bottomRight = toPlan(view, size, { x: size.width, y: size.height })
  const bg: string[] = []
  for (let x = Math.ceil(topLeft.x / step) * step; x <= bottomRight.x; x += step) {
    const sx = S({ x, y: 0 }).x.toFixed(1)
    bg.push(`M${sx} 0 V${size.height}`)
  }
  for (let y = Math.ceil(bottomRight.y / step) * step; y <= topLeft.y; y += step) {
    const sy = S({ x: 0, y }).y.toFixed(1)
    bg.push(`M0 ${sy} H${size.width}`)
  }
  layers.push(<path key="bg" className="bg-grid" d={bg.join(' ')} />)

  // Slabs with openings (even-odd fill).
  for (const slab of scene.slabs) {
    const d = [slab.outline, ...slab.openings].map((ring) => polygonPath(ring.map(S))).join(' ')
    const selected = selection.has(slab.id)
    layers.push(
      <g key={slab.id} data-id={slab.id} data-kind="slab" data-testid={`el-${slab.id}`}>
        <path className={`slab${scene.slabsLinked ? ' linked' : ''}${selected ? ' selected' : ''}`} d={d} fillRule="evenodd" />
        {selected
          ? slab.outline.map((p, i) => {
              const s = S(p)
              return (
                <rect
                  key={i}
                  className="handle vertex"
                  data-id={slab.id}
                  data-part={`vertex:${i}`}
                  data-testid={`handle-${slab.id}-v${i}`}
                  x={s.x - 4}
                  y={s.y - 4}
                  width={8}
                  height={8}
                />
              )
            })
          : null}
      </g>,
    )
  }

  // Labelled grid lines: numbers along x, letters along y, bubbles at the ends.
  const grid = project.grid
  if (grid) {
    const ys = grid.y.map((g) => g.at)
    const xs = grid.x.map((g) => g.at)
    const yMin = minOf(ys, bounds?.minY ?? 0) - 2
    const yMax = maxOf(ys, bounds?.maxY ?? 0) + 2
    const xMin = minOf(xs, bounds?.minX ?? 0) - 2
    const xMax = maxOf(xs, bounds?.maxX ?? 0) + 2
    grid.x.forEach((g) => {
      const a = S({ x: g.at, y: yMin })
      const b = S({ x: g.at, y: yMax })
      layers.push(
        <g key={`gx-${g.label}`} className="grid-line" data-testid={`grid-x-${g.label}`}>
          <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
          <circle cx={b.x} cy={b.y - 11} r={10} />
          <text x={b.x} y={b.y - 7} textAnchor="middle">
            {g.label}
          </text>
        </g>,
      )
    })
    grid.y.forEach((g) => {
      const a = S({ x: xMin, y: g.at })
      const b = S({ x: xMax, y: g.at })
      layers.push(
        <g key={`gy-${g.label}`} className="grid-line" data-testid={`grid-y-${g.label}`}>
          <line x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
          <circle cx={a.x - 11} cy={a.y} r={10} />
          <text x={a.x - 11} y={a.y + 4} textAnchor="middle">
            {g.label}
          </text>
        </g>,
      )
    })
  }

  for (const f of scene.frameLines) {
    const a = S(f.p1)
    const b = S(f.p2)
    const selected = selection.has(f.id)
    layers.push(
      <g key={f.id} data-id={f.id} data-kind="frameLine" data-testid={`el-${f.id}`} className={`frame ${f.stiffness.kind}${selected ? ' selected' : ''}`}>
        <line className="hit" x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
        <line className="frame-line" x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
        <circle className="frame-end" cx={a.x} cy={a.y} r={3} />
        <circle className="frame-end" cx={b.x} cy={b.y} r={3} />
      </g>,
    )
  }

  for (const w of scene.walls) {
    const outline = wallOutline(w.p1, w.p2, w.thickness).map(S)
    const a = S(w.p1)
    const b = S(w.p2)
    const selected = selection.has(w.id)
    layers.push(
      <g key={w.id} data-id={w.id} data-kind="wall" data-testid={`el-${w.id}`} className={`wall${selected ? ' selected' : ''}`}>
        <line className="hit" x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
        <path className="wall-body" d={polygonPath(outline)} />
      </g>,
    )
  }

  // Wall groups on this floor: their shear centre with the section's principal directions.
  const onPlan = new Set<string>(scene.walls.map((w) => w.id))
  for (const g of groups) {
    if (!g.wallIds.every((wid) => onPlan.has(wid))) continue
    const sc = g.section.shearCentre
    if (!Number.isFinite(sc.x) || !Number.isFinite(sc.y)) continue
    const s = S(sc)
    const arm = (d: Point): string => `M${s.x - 12 * d.x} ${s.y + 12 * d.y} L${s.x + 12 * d.x} ${s.y - 12 * d.y}`
    const names = g.wallIds.map((wid) => project.walls[wid]?.name || wid).join(', ')
    layers.push(
      <g key={`sc-${g.id}`} className="group-shear-centre" data-testid={`shear-centre-${g.id}`} data-x={sc.x} data-y={sc.y}>
        <title>{`Shear centre of ${names} (one section)`}</title>
        <path d={`${arm(g.section.d1)} ${arm(g.section.d2)}`} />
        <circle r={5} cx={s.x} cy={s.y} />
        <text x={s.x + 8} y={s.y + 16}>SC</text>
      </g>,
    )
  }

  for (const c of scene.columns) {
    const s = S(c.at)
    const half = Math.max(4, 0.2 * view.scale)
    const selected = selection.has(c.id)
    layers.push(
      <g key={c.id} data-id={c.id} data-kind="column" data-testid={`el-${c.id}`} className={`column${selected ? ' selected' : ''}`}>
        <rect
          className="column-body"
          x={s.x - half}
          y={s.y - half}
          width={2 * half}
          height={2 * half}
          transform={`rotate(${(-c.angle * 180) / Math.PI} ${s.x} ${s.y})`}
        />
      </g>,
    )
  }

  for (const m of scene.lineMasses) {
    const pts = m.points.map(S)
    const selected = selection.has(m.id)
    layers.push(
      <g key={m.id} data-id={m.id} data-kind="lineMass" data-testid={`el-${m.id}`} className={`line-mass${selected ? ' selected' : ''}`}>
        <polyline className="hit" points={pts.map((p) => `${p.x},${p.y}`).join(' ')} />
        <polyline className="line-mass-body" points={pts.map((p) => `${p.x},${p.y}`).join(' ')} />
      </g>,
    )
  }

  for (const m of scene.pointMasses) {
    const s = S(m.at)
    const selected = selection.has(m.id)
    layers.push(
      <g key={m.id} data-id={m.id} data-kind="pointMass" data-testid={`el-${m.id}`} className={`point-mass${selected ? ' selected' : ''}`}>
        <path className="point-mass-body" d={`M${s.x} ${s.y - 7} L${s.x + 7} ${s.y} L${s.x} ${s.y + 7} L${s.x - 7} ${s.y} Z`} />
      </g>,
    )
  }

  for (const h of props.handles) {
    const s = S(h.at)
    if (h.kind === 'endpoint') {
      layers.push(
        <rect
          key={`h-${h.id}-${h.end}`}
          className="handle"
          data-id={h.id}
          data-part={h.end}
          data-testid={`handle-${h.id}-${h.end}`}
          x={s.x - 5}
          y={s.y - 5}
          width={10}
          height={10}
        />,
      )
    } else {
      const c = S(h.pivot)
      layers.push(
        <g key="h-rotate">
          <line className="rotate-stem" x1={c.x} y1={c.y} x2={s.x} y2={s.y} />
          <circle className="handle rotate" data-part="rotate" data-testid="handle-rotate" cx={s.x} cy={s.y} r={6} />
        </g>,
      )
    }
  }

  // Live centre overlays.
  const ov: ReactNode[] = []
  if (props.showOverlays) {
    const { centreOfMass: cm, centreOfRigidity: cr } = overlay
    if (cm && overlay.radiusOfGyration !== null) {
      const s = S(cm)
      const r = overlay.radiusOfGyration * view.scale
      ov.push(<circle key="ls" className="ring ring-ls" data-testid="circle-ls" cx={s.x} cy={s.y} r={r} />)
      ov.push(
        <text key="ls-label" className="ring-label ring-label-ls" data-testid="label-ls" x={s.x} y={s.y - r - 4} textAnchor="middle">
          l_s {formatQuantity(overlay.radiusOfGyration, 'length', units, 1)}
        </text>,
      )
    }
    if (cr && overlay.torsionalRadius) {
      const s = S(cr)
      const { x: rx, y: ry } = overlay.torsionalRadius
      if (Number.isFinite(rx)) {
        ov.push(<circle key="rx" className="ring ring-rx" data-testid="circle-rx" cx={s.x} cy={s.y} r={rx * view.scale} />)
        ov.push(
          <text key="rx-label" className="ring-label ring-label-r" data-testid="label-rx" x={s.x + rx * view.scale + 4} y={s.y - 3}>
            r_x {formatQuantity(rx, 'length', units, 1)}
          </text>,
        )
      }
      if (Number.isFinite(ry)) {
        ov.push(<circle key="ry" className="ring ring-ry" data-testid="circle-ry" cx={s.x} cy={s.y} r={ry * view.scale} />)
        ov.push(
          <text key="ry-label" className="ring-label ring-label-r" data-testid="label-ry" x={s.x} y={s.y + ry * view.scale + 13} textAnchor="middle">
            r_y {formatQuantity(ry, 'length', units, 1)}
          </text>,
        )
      }
    }
    if (cm && cr) {
      const a = S(cm)
      const b = S(cr)
      ov.push(<line key="ecc" className="ecc-vector" data-testid="ecc-vector" x1={a.x} y1={a.y} x2={b.x} y2={b.y} markerEnd="url(#ecc-head)" />)
      if (Math.hypot(b.x - a.x, b.y - a.y) > 24) {
        ov.push(
          <text key="ecc-label" className="ring-label ecc-label" data-testid="label-ecc" x={(a.x + b.x) / 2 + 6} y={(a.y + b.y) / 2 - 4}>
            e {formatQuantity(Math.hypot(cr.x - cm.x, cr.y - cm.y), 'length', units, 1)}
          </text>,
        )
      }
    }
    if (cm) {
      const s = S(cm)
      ov.push(
        <g
          key="cm"
          className="marker marker-cm"
          data-testid="marker-cm"
          data-x={cm.x}
          data-y={cm.y}
          transform={`translate(${s.x} ${s.y})`}
          onPointerEnter={() => setTip('cm')}
          onPointerLeave={() => setTip(null)}
        >
          <circle r={9} className="cm-ring" />
          <circle r={4} className="cm-core" />
          <text x={12} y={-10}>CM</text>
        </g>,
      )
    }
    if (cr) {
      const s = S(cr)
      ov.push(
        <g
          key="cr"
          className="marker marker-cr"
          data-testid="marker-cr"
          data-x={cr.x}
          data-y={cr.y}
          transform={`translate(${s.x} ${s.y})`}
          onPointerEnter={() => setTip('cr')}
          onPointerLeave={() => setTip(null)}
        >
          <path d="M0 -11 L10 7 L-10 7 Z" className="cr-body" />
          <circle r={2.5} className="cr-core" />
          <text x={12} y={16}>CR</text>
        </g>,
      )
    }
  }

  // Tool preview and snapping.
  const pv: ReactNode[] = []
  preview.forEach((p, i) => {
    switch (p.kind) {
      case 'segment': {
        const a = S(p.p1)
        const b = S(p.p2)
        if (p.thickness) {
          pv.push(<path key={i} className="preview-body" d={polygonPath(wallOutline(p.p1, p.p2, p.thickness).map(S))} />)
        }
        pv.push(<line key={`l${i}`} className="preview-line" x1={a.x} y1={a.y} x2={b.x} y2={b.y} />)
        break
      }
      case 'polyline': {
        const pts = p.points.map(S).map((q) => `${q.x},${q.y}`).join(' ')
        pv.push(p.closed ? <polygon key={i} className="preview-line" points={pts} /> : <polyline key={i} className="preview-line" points={pts} />)
        break
      }
      case 'point': {
        const s = S(p.at)
        pv.push(<circle key={i} className="preview-line" cx={s.x} cy={s.y} r={6} />)
        break
      }
      case 'box': {
        const a = S(p.a)
        const b = S(p.b)
        pv.push(
          <rect
            key={i}
            className="select-box"
            data-testid="select-box"
            x={Math.min(a.x, b.x)}
            y={Math.min(a.y, b.y)}
            width={Math.abs(a.x - b.x)}
            height={Math.abs(a.y - b.y)}
          />,
        )
        break
      }
      default: {
        const never: never = p
        throw new Error(`[ui] unknown preview ${String(never)}`)
      }
    }
  })
  if (snap) {
    const s = S(snap.at)
    pv.push(
      <g key="snap" className={`snap snap-${snap.kind}`} data-testid="snap-indicator" data-kind={snap.kind} transform={`translate(${s.x} ${s.y})`}>
        {snap.kind === 'midpoint' ? <path d="M0 -7 L7 5 L-7 5 Z" /> : snap.kind.startsWith('grid') ? <path d="M-6 0 H6 M0 -6 V6" /> : <rect x={-5} y={-5} width={10} height={10} />}
      </g>,
    )
  }

  const badge = overlay.worstDrift
  const tipPoint = tip === 'cm' ? overlay.centreOfMass : tip === 'cr' ? overlay.centreOfRigidity : null
  const tipAt = tipPoint ? S(tipPoint) : null
  return (
    <div className="plan-host" ref={hostRef}>
      <svg
        ref={svgRef}
        className={`plan${props.overlayStale ? ' overlays-stale' : ''}`}
        data-testid="plan-canvas"
        aria-label="Floor plan"
        role="application"
        tabIndex={0}
        width={size.width}
        height={size.height}
        style={{ cursor: props.cursor }}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerLeave={(e) => {
          setHover(null)
          if (!panning.current) emit('leave', e)
        }}
        onWheel={onWheel}
        onContextMenu={(e) => e.preventDefault()}
        data-scale={view.scale}
        data-cx={view.cx}
        data-cy={view.cy}
      >
        <defs>
          <marker id="ecc-head" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse">
            <path d="M0 0 L10 5 L0 10 Z" className="ecc-head" />
          </marker>
        </defs>
        {layers}
        <g className={`overlays${props.overlayStale ? ' stale' : ''}`} data-testid="overlays" data-stale={props.overlayStale ? 'true' : 'false'}>
          {ov}
        </g>
        {pv}
      </svg>
      {props.readout ? (
        <div className="readout" data-testid="draw-readout">
          {props.readout}
        </div>
      ) : null}
      {props.showOverlays && badge ? (
        <div className={`drift-badge${props.overlayStale ? ' stale' : ''}`} data-testid="drift-badge" data-ratio={badge.ratio}>
          <strong>max/avg drift {badge.ratio.toFixed(2)}</strong> ({badge.caseId})
          {badge.verdict ? <span className={`verdict verdict-${badge.verdict}`}> {badge.verdict}</span> : null}
          {badge.limit !== null && Number.isFinite(badge.limit) ? <span> · limit {badge.limit.toFixed(2)}</span> : null}
        </div>
      ) : null}
      {props.showOverlays && tipAt && tip ? (
        <div className="marker-tip" data-testid={`tip-${tip}`} role="tooltip" style={{ left: tipAt.x + 14, top: tipAt.y + 14 }}>
          {markerTip(tip, overlay, units).map((line) => (
            <div key={line}>{line}</div>
          ))}
        </div>
      ) : null}
      <details className="plan-key" data-testid="plan-key-toggle">
        <summary>Key</summary>
        <PlanKey />
      </details>
      {hover ? (
        <div className="coords" data-testid="pointer-coords">
          x {formatQuantity(hover.x, 'length', units)} · y {formatQuantity(hover.y, 'length', units)}
        </div>
      ) : null}
    </div>
  )
}
