/**
 * The r3f canvas of the 3D view: shared geometry (once per model revision), the animation clock
 * driver, camera presets with orbit controls, and a render step that can hand each finished frame to
 * an exporter. Frame loop 'demand': frames are drawn only while something moves or changes.
 */
import { appendAll } from '@/model'
import { useEffect, useMemo, useRef, useState } from 'react'
import type { RefObject } from 'react'
import { Canvas, useFrame, useThree } from '@react-three/fiber'
import type { RootState } from '@react-three/fiber'
import * as THREE from 'three'
import { OrbitControls } from 'three/examples/jsm/controls/OrbitControls.js'
import { useStore } from 'zustand'
import type { BuildingLayout } from './buildingLayout'
import { SLAB_THICKNESS, shadeOf } from './buildingLayout'
import { BuildingInstance } from './BuildingInstance'
import { isSoftwareWebGL } from './ViewerErrorBoundary'
import { presetView } from './cameraPresets'
import { exportFov } from './exportMedia'
import type { FloorMarks, SharedResources } from './BuildingInstance'
import type { RigidTransform } from './modeAnimation'
import type { MotionSource } from './motionSource'
import { BASE_CYCLES_PER_SECOND } from './viewerStore'
import type { AnimationClock, CameraPreset, ViewerStore } from './viewerStore'

/** Renders the frame just drawn once more at another size, for exports. */
export interface FrameGrab {
  /**
   * Render the current frame at `width` × `height` pixels (pixel ratio 1; the camera's field kept
   * as exportFov says), hand the WebGL canvas to `draw` while it holds that picture, then put the
   * canvas back to the pane's size and redraw it. The pane's CSS size never changes.
   */
  readonly renderAt: (width: number, height: number, draw: (canvas: HTMLCanvasElement) => void) => void
}

/** Called after every rendered frame with the WebGL canvas (exports composite it then). */
export type FrameCapture = (canvas: HTMLCanvasElement, grab: FrameGrab) => void

/** FrameGrab.renderAt for one renderer, scene and camera. */
function renderAtSize(
  gl: THREE.WebGLRenderer,
  scene: THREE.Scene,
  camera: THREE.Camera,
  width: number,
  height: number,
  draw: (canvas: HTMLCanvasElement) => void,
): void {
  const ratio = gl.getPixelRatio()
  const size = gl.getSize(new THREE.Vector2())
  const persp = camera instanceof THREE.PerspectiveCamera ? camera : null
  const saved = persp ? { fov: persp.fov, aspect: persp.aspect } : null
  try {
    gl.setPixelRatio(1)
    gl.setSize(width, height, false)
    if (persp) {
      const aspect = width / Math.max(1, height)
      persp.fov = exportFov(persp.fov, persp.aspect, aspect)
      persp.aspect = aspect
      persp.updateProjectionMatrix()
    }
    gl.render(scene, camera)
    draw(gl.domElement)
  } finally {
    gl.setPixelRatio(ratio)
    gl.setSize(size.x, size.y, false)
    if (persp && saved) {
      persp.fov = saved.fov
      persp.aspect = saved.aspect
      persp.updateProjectionMatrix()
    }
    gl.render(scene, camera)
  }
}

interface Props {
  readonly layout: BuildingLayout
  readonly motionA: MotionSource | null
  readonly motionB: MotionSource | null
  readonly marks: FloorMarks
  readonly store: ViewerStore
  readonly clock: AnimationClock
  readonly capture: RefObject<FrameCapture | null>
  /** Per-frame hook for DOM overlays (the plan trace), run after the clock advances. */
  readonly onFrame: RefObject<(() => void) | null>
  readonly transformsA: RefObject<RigidTransform[]>
  /** Receives the r3f root state once created (exports drive frames with `advance`). */
  readonly rootState?: RefObject<RootState | null>
  readonly onFrameRendered?: () => void
}

function buildShared(layout: BuildingLayout): SharedResources {
  const slabGeometry = new Map<string, THREE.BufferGeometry>()
  const slabEdges = new Map<string, THREE.BufferGeometry>()
  for (const floor of layout.floors) {
    for (const slab of floor.slabs) {
      if (slabGeometry.has(slab.id) || slab.outline.length < 3) continue
      const shape = new THREE.Shape(slab.outline.map((p) => new THREE.Vector2(p.x, p.y)))
      for (const hole of slab.openings) {
        if (hole.length >= 3) shape.holes.push(new THREE.Path(hole.map((p) => new THREE.Vector2(p.x, p.y))))
      }
      const g = new THREE.ExtrudeGeometry(shape, { depth: SLAB_THICKNESS, bevelEnabled: false })
      const normals = g.getAttribute('normal')
      const shade = new Float32Array(normals.count * 3)
      for (let v = 0; v < normals.count; v++) {
        shade.fill(shadeOf(normals.getX(v), normals.getY(v), normals.getZ(v)), 3 * v, 3 * v + 3)
      }
      g.setAttribute('color', new THREE.BufferAttribute(shade, 3))
      slabGeometry.set(slab.id, g)
      slabEdges.set(slab.id, new THREE.EdgesGeometry(g, 30))
    }
  }
  // Ghost of the members: every vertical member edge at rest (walls and columns as outlines).
  const ghostPositions: number[] = []
  for (const mesh of [layout.walls, layout.columns]) {
    const n = mesh.positions.length / 3 / 24
    for (let k = 0; k < n; k++) {
      // The side face 2 of each prism holds corners 0,1,5,4: draw its two vertical edges.
      const base = (k * 24 + 2 * 4) * 3
      const p = mesh.positions
      for (const [a, b] of [
        [0, 3],
        [1, 2],
      ] as const) {
        ghostPositions.push(p[base + a * 3]!, p[base + a * 3 + 1]!, p[base + a * 3 + 2]!)
        ghostPositions.push(p[base + b * 3]!, p[base + b * 3 + 1]!, p[base + b * 3 + 2]!)
      }
    }
  }
  appendAll(ghostPositions, layout.frames.positions)
  const ghostMembers = new THREE.BufferGeometry()
  ghostMembers.setAttribute('position', new THREE.Float32BufferAttribute(ghostPositions, 3))
  return {
    slabGeometry,
    slabEdges,
    ghostMembers,
    ghostMaterial: new THREE.LineBasicMaterial({ color: '#5d6470', transparent: true, opacity: 0.35 }),
    cmGeometry: new THREE.SphereGeometry(0.45, 16, 10),
    crGeometry: new THREE.OctahedronGeometry(0.6),
    cmMaterial: new THREE.MeshBasicMaterial({ color: '#6b3fa0' }),
    crMaterial: new THREE.MeshBasicMaterial({ color: '#14806b' }),
    cmLineMaterial: new THREE.LineBasicMaterial({ color: '#6b3fa0' }),
    crLineMaterial: new THREE.LineBasicMaterial({ color: '#14806b' }),
  }
}

function disposeShared(s: SharedResources): void {
  s.slabGeometry.forEach((g) => g.dispose())
  s.slabEdges.forEach((g) => g.dispose())
  s.ghostMembers.dispose()
  s.ghostMaterial.dispose()
  s.cmGeometry.dispose()
  s.crGeometry.dispose()
  s.cmMaterial.dispose()
  s.crMaterial.dispose()
  s.cmLineMaterial.dispose()
  s.crLineMaterial.dispose()
}

/** Gap between the two copies of the side-by-side view, as a fraction of the plan width. */
const SIDE_GAP = 0.35

export function sideOffset(layout: BuildingLayout): number {
  const w = layout.box.maxX - layout.box.minX
  return w * (1 + SIDE_GAP)
}

export function ViewerCanvas(props: Props) {
  const { layout, store, rootState } = props
  // Software rasterizers pay for every pixel: no multisampling and device pixel ratio 1 there.
  const [software] = useState(isSoftwareWebGL)
  return (
    <Canvas
      frameloop="demand"
      dpr={software ? 1 : [1, 2]}
      gl={{ antialias: !software, preserveDrawingBuffer: false, powerPreference: 'high-performance' }}
      camera={{ fov: 35, near: 0.5, far: 20000, position: [60, -60, 40] }}
      onCreated={(state) => {
        state.camera.up.set(0, 0, 1)
        if (rootState) rootState.current = state
      }}
      data-testid="viewer-canvas"
    >
      <Scene {...props} layout={layout} store={store} />
    </Canvas>
  )
}

function Scene(props: Props) {
  const { layout, motionA, motionB, marks, store, clock, capture, onFrame, transformsA } = props
  const shared = useMemo(() => buildShared(layout), [layout])
  useEffect(() => () => disposeShared(shared), [shared])
  const sideBySide = useStore(store, (s) => s.sideBySide && s.presenting)
  const showGhost = useStore(store, (s) => s.showGhost)
  const showCentres = useStore(store, (s) => s.showCentres)
  const invalidate = useThree((s) => s.invalidate)
  useEffect(() => store.subscribe(() => invalidate()), [store, invalidate])
  useEffect(() => invalidate(), [motionA, motionB, layout, invalidate])
  return (
    <>
      <color attach="background" args={['#ebe8e1']} />
      <ClockDriver store={store} clock={clock} onFrame={onFrame} />
      <BuildingInstance
        layout={layout}
        shared={shared}
        motion={motionA}
        marks={marks}
        store={store}
        clock={clock}
        offsetX={0}
        visible
        showGhost={showGhost}
        showCentres={showCentres}
        transformsOut={transformsA}
      />
      <BuildingInstance
        layout={layout}
        shared={shared}
        motion={motionB}
        marks={marks}
        store={store}
        clock={clock}
        offsetX={sideOffset(layout)}
        visible={sideBySide}
        showGhost={showGhost}
        showCentres={showCentres}
      />
      <CameraRig layout={layout} store={store} sideBySide={sideBySide} />
      <RenderStep capture={capture} {...(props.onFrameRendered ? { onRendered: props.onFrameRendered } : {})} />
    </>
  )
}

function ClockDriver(props: {
  store: ViewerStore
  clock: AnimationClock
  onFrame: RefObject<(() => void) | null>
}) {
  const { store, clock, onFrame } = props
  useFrame((state, delta) => {
    const s = store.getState()
    // After an idle spell the first delta is the whole pause: clamp it so motion resumes smoothly.
    const dt = Math.min(Math.max(delta, 0), 0.1)
    if (clock.held) {
      // Export drives the clock frame by frame.
    } else if (s.playing || s.recording) {
      clock.phase = (clock.phase + dt * 2 * Math.PI * BASE_CYCLES_PER_SECOND * s.speed) % (2 * Math.PI)
      clock.time += dt * s.speed
      state.invalidate()
    }
    onFrame.current?.()
  }, -1)
  return null
}

function RenderStep(props: { capture: RefObject<FrameCapture | null>; onRendered?: () => void }) {
  const { capture, onRendered } = props
  useFrame(({ gl, scene, camera }) => {
    gl.render(scene, camera)
    capture.current?.(gl.domElement, { renderAt: (w, h, draw) => renderAtSize(gl, scene, camera, w, h, draw) })
    onRendered?.()
  }, 1)
  return null
}

function CameraRig(props: { layout: BuildingLayout; store: ViewerStore; sideBySide: boolean }) {
  const { layout, store, sideBySide } = props
  const camera = useThree((s) => s.camera)
  const gl = useThree((s) => s.gl)
  const invalidate = useThree((s) => s.invalidate)
  const size = useThree((s) => s.size)
  const controlsRef = useRef<OrbitControls | null>(null)
  const applyRef = useRef<((preset: CameraPreset) => void) | null>(null)
  // Until the user orbits, a resize re-fits the current preset (the first size is often provisional).
  const touched = useRef(false)
  const fit = useRef({ layout, sideBySide, aspect: size.width / Math.max(1, size.height) })
  fit.current = { layout, sideBySide, aspect: size.width / Math.max(1, size.height) }

  useEffect(() => {
    camera.up.set(0, 0, 1)
    const controls = new OrbitControls(camera, gl.domElement)
    controls.enableDamping = false
    controlsRef.current = controls
    const onChange = () => invalidate()
    const onStart = () => {
      touched.current = true
    }
    controls.addEventListener('change', onChange)
    controls.addEventListener('start', onStart)
    const apply = (preset: CameraPreset) => {
      const f = fit.current
      const box = { ...f.layout.box }
      if (f.sideBySide) box.maxX += sideOffset(f.layout)
      const fov = camera instanceof THREE.PerspectiveCamera ? camera.fov : 35
      const view = presetView(preset, box, f.layout.height, fov, f.aspect)
      camera.position.set(...view.position)
      controls.target.set(...view.target)
      controls.update()
      invalidate()
    }
    applyRef.current = apply
    apply(store.getState().cameraRequest.preset)
    const unsubscribe = store.subscribe((s, prev) => {
      if (s.cameraRequest !== prev.cameraRequest) apply(s.cameraRequest.preset)
    })
    return () => {
      unsubscribe()
      controls.removeEventListener('change', onChange)
      controls.removeEventListener('start', onStart)
      controls.dispose()
      controlsRef.current = null
      applyRef.current = null
    }
  }, [camera, gl, invalidate, store])
  useEffect(() => {
    if (!touched.current) applyRef.current?.(store.getState().cameraRequest.preset)
  }, [size.width, size.height, store])
  return null
}
