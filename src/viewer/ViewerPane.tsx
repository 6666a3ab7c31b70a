import { useCallback, useEffect, useMemo, useRef, useState } from 'react'
import { advance } from '@react-three/fiber'
import type { RootState } from '@react-three/fiber'
import { useStore } from 'zustand'
import type { AnalysisResult } from '@/engine'
import { CAUTION, CAUTION_SHORT, MODE_COLUMNS, modeHeaderLabel } from '@/model'
import type { Point, Project } from '@/model'
import { layoutBuilding } from './buildingLayout'
import type { FloorMarks } from './BuildingInstance'
import { legendTicks, rampGradient } from './colourScale'
import type { ColourBy } from './colourScale'
import {
  EXPORT_SIZE_CHOICES,
  canEncodeVp8,
  captionLayout,
  createGifWriter,
  drawCaptioned,
  downloadBlob,
  encodeWebm,
  exportFileName,
  exportPixels,
  gifPixels,
  pickWebmType,
} from './exportMedia'
import type { Caption, ExportSizeChoice } from './exportMedia'
import type { RigidTransform } from './modeAnimation'
import { characterWords } from './modeMeaning'
import { historyMotion, modeMotion, modeRows, resultFits, wallSegments } from './motionSource'
import type { MotionSource } from './motionSource'
import { PlanTrace } from './PlanTrace'
import { ViewerCanvas } from './ViewerCanvas'
import type { FrameCapture } from './ViewerCanvas'
import { ViewerErrorBoundary, ViewerUnavailable, webglProblem } from './ViewerErrorBoundary'
import { VIEWER_CSS } from './viewerStyles'
import {
  BASE_CYCLES_PER_SECOND,
  STEP_FRACTION,
  createViewerStore,
  requestCamera,
  selectMode,
  setViewer,
} from './viewerStore'
import type { AnimationClock, CameraPreset, ViewerState, ViewerStore } from './viewerStore'

/** Props of the 3D viewer pane mounted by the UI beside the plan editor. */
export interface ViewerPaneProps {
  readonly project: Project
  /** Latest analysis of `project` (or of an older revision while `isStale`). */
  readonly result: AnalysisResult | null
  readonly isStale: boolean
  /** Initial viewer settings (tests and benchmarks); later changes are ignored. */
  readonly initial?: Partial<ViewerState>
  /** Called after each rendered frame (benchmarks count frames with it). */
  readonly onFrameRendered?: () => void
}

/** How many of the first modes presentation mode cycles through. */
const CYCLE_MODES = 6
/** Seconds each mode stays on screen while cycling. */
const CYCLE_SECONDS = 6
/** Frames of the GIF export (one cycle). */
const GIF_FRAMES = 24

const pct = (v: number) => `${(v * 100).toFixed(1)}`

/** The 3D view of the building and its modes: canvas, controls, mode list, legend and plan trace. */
export function ViewerPane(props: ViewerPaneProps) {
  const { project, result, isStale, initial, onFrameRendered } = props
  const [store] = useState<ViewerStore>(() => createViewerStore(initial))
  const [clock] = useState<AnimationClock>(() => ({ phase: Math.PI / 2, time: 0, held: false }))
  const rootState = useRef<RootState | null>(null)
  const capture = useRef<FrameCapture | null>(null)
  const onFrame = useRef<(() => void) | null>(null)
  const transformsA = useRef<RigidTransform[]>([])
  const rootRef = useRef<HTMLElement | null>(null)
  const [glProblem] = useState(() => (typeof document === 'undefined' ? 'No document.' : webglProblem()))

  const state = useStore(store)
  const layout = useMemo(() => layoutBuilding(project), [project])
  const walls = useMemo(() => wallSegments(Object.values(project.walls)), [project.walls])
  const floorNames = useMemo(() => layout.floors.map((f) => f.name), [layout])
  const fits = resultFits(result, layout)
  const modes = fits ? (result?.modes ?? null) : null
  const rows = useMemo(() => (modes ? modeRows(modes) : []), [modes])
  const modeIndex = Math.min(state.mode, Math.max(0, rows.length - 1))
  const modeBIndex = Math.min(state.modeB, Math.max(0, rows.length - 1))

  const marks = useMemo<FloorMarks>(() => {
    if (!fits || !result) return { cm: [], cr: [] }
    const cm: (Point | null)[] = layout.floors.map((_, i) => result.floors[i]?.centreOfMass ?? null)
    const cr: (Point | null)[] = layout.floors.map((_, i) => result.centres?.[i]?.centreOfRigidity ?? null)
    return { cm, cr }
  }, [fits, result, layout])

  const history = useMemo(() => (fits ? historyMotion(result, layout) : null), [fits, result, layout])
  const motionMode = useMemo(
    () => modeMotion(result, layout, modeIndex, walls),
    [result, layout, modeIndex, walls],
  )
  const motionA: MotionSource | null = state.source === 'history' && history ? history : motionMode
  const motionB = useMemo(
    () => modeMotion(result, layout, modeBIndex, walls),
    [result, layout, modeBIndex, walls],
  )

  // Presentation: Escape leaves; auto-cycle steps through the first modes.
  useEffect(() => {
    if (!state.presenting) return
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') setViewer(store, { presenting: false, autoCycle: false })
    }
    window.addEventListener('keydown', onKey)
    return () => window.removeEventListener('keydown', onKey)
  }, [state.presenting, store])
  useEffect(() => {
    if (!state.presenting || !state.autoCycle || rows.length === 0) return
    const n = Math.min(CYCLE_MODES, rows.length)
    const id = window.setInterval(() => {
      const s = store.getState()
      selectMode(store, (s.mode + 1) % n)
    }, CYCLE_SECONDS * 1000)
    return () => window.clearInterval(id)
  }, [state.presenting, state.autoCycle, rows.length, store])
  useEffect(() => {
    requestCamera(store, store.getState().cameraRequest.preset)
  }, [state.sideBySide, state.presenting, store])

  /** Caption of an export `width` pixels wide: the full caution where it fits, else the short one. */
  const caption = useCallback(
    (width: number): Caption => {
      const title = motionA ? `${motionA.title} — ${project.name}` : project.name
      const meaning = motionA?.meaning ?? 'Building at rest (no modal results).'
      return { title, meaning, caution: width >= 1200 ? CAUTION : CAUTION_SHORT }
    },
    [motionA, project.name],
  )

  const exportName = (ext: 'png' | 'webm' | 'gif') =>
    motionA?.kind === 'mode'
      ? exportFileName(project.name, motionA.mode + 1, ext)
      : exportFileName(project.name, motionA ? 'response' : 'building', ext)

  /** Output canvas and 2D context for an export of the given size, or null with a message. */
  const outputCanvas = (width: number, height: number, what: string) => {
    const out = document.createElement('canvas')
    out.width = width
    out.height = height
    const ctx = out.getContext('2d', { willReadFrequently: what === 'GIF' })
    if (!ctx) setViewer(store, { message: `[viewer] ${what} export failed: no 2D canvas.` })
    return ctx ? { out, ctx } : null
  }

  const exportPng = () => {
    const name = exportName('png')
    const choice = store.getState().exportSize
    capture.current = (gl, grab) => {
      capture.current = null
      const { width, height } = exportPixels(choice, gl.width, gl.height)
      const made = outputCanvas(width, height, 'PNG')
      if (!made) return
      const cap = caption(width)
      grab.renderAt(width, captionLayout(width, height).scene.height, (frame) =>
        drawCaptioned(made.ctx, frame, width, height, cap),
      )
      made.out.toBlob((blob) => {
        if (!blob) {
          setViewer(store, { message: '[viewer] PNG export failed.' })
          return
        }
        downloadBlob(blob, name)
        setViewer(store, { message: `Saved ${name} (${width} × ${height})` })
      }, 'image/png')
    }
    setViewer(store, { message: 'Preparing PNG…' })
  }

  /** The running 3D canvas and r3f root, or null with a message. */
  const running = () => {
    const glCanvas = rootRef.current?.querySelector('canvas')
    const root = rootState.current
    if (!glCanvas || !root) {
      setViewer(store, { message: '[viewer] Nothing to record: the 3D view is not running.' })
      return null
    }
    return { glCanvas, root }
  }

  const exportWebm = async () => {
    const live = running()
    if (!live) return
    const { glCanvas, root } = live
    const name = exportName('webm')
    const { width: w, height: h } = exportPixels(store.getState().exportSize, glCanvas.width, glCanvas.height)
    const made = outputCanvas(w, h, 'WebM')
    if (!made) return
    const { out, ctx } = made
    const cap = caption(w)
    const sceneHeight = captionLayout(w, h).scene.height
    const speed = store.getState().speed
    const saved = { phase: clock.phase, time: clock.time }
    setViewer(store, { recording: true, message: `Recording ${name}…` })
    capture.current = (_gl, grab) => grab.renderAt(w, sceneHeight, (frame) => drawCaptioned(ctx, frame, w, h, cap))
    try {
      if (await canEncodeVp8(w, h)) {
        const fps = 30
        const history = motionA?.kind === 'history' ? motionA.history : null
        // Modes: whole cycles (at most two, at most 8 s) so the file loops without a jump.
        const cycles = Math.max(1, Math.min(2, Math.floor(8 * BASE_CYCLES_PER_SECOND * speed)))
        const seconds = history
          ? Math.min(8, (history.dt * history.stepCount) / speed)
          : cycles / (BASE_CYCLES_PER_SECOND * speed)
        const frames = Math.max(2, Math.round(seconds * fps))
        clock.held = true
        const blob = await encodeWebm(out, frames, fps, (k) => {
          clock.phase = (2 * Math.PI * cycles * k) / frames
          clock.time = (k / fps) * speed
          advance(performance.now(), true, root)
        })
        downloadBlob(blob, name)
        setViewer(store, { message: `Saved ${name} (${w} × ${h})` })
      } else {
        await recordRealTime(out, name, speed)
      }
    } catch (e) {
      setViewer(store, { message: `[viewer] WebM export failed: ${e instanceof Error ? e.message : String(e)}` })
    } finally {
      clock.held = false
      clock.phase = saved.phase
      clock.time = saved.time
      capture.current = null
      setViewer(store, { recording: false })
    }
  }

  /** One cycle of the shown motion as a looping GIF (GIF_FRAMES frames, at most 960 × 540). */
  const exportGif = async () => {
    const live = running()
    if (!live) return
    const { glCanvas, root } = live
    const name = exportName('gif')
    const { width: w, height: h } = gifPixels(store.getState().exportSize, glCanvas.width, glCanvas.height)
    const made = outputCanvas(w, h, 'GIF')
    if (!made) return
    const { ctx } = made
    const cap = caption(w)
    const sceneHeight = captionLayout(w, h).scene.height
    const speed = store.getState().speed
    const history = motionA?.kind === 'history' ? motionA.history : null
    // Modes: one cycle at the on-screen speed; a time history: its first seconds (at most 8 s).
    const seconds = history
      ? Math.min(8, (history.dt * history.stepCount) / speed)
      : 1 / (BASE_CYCLES_PER_SECOND * speed)
    const saved = { phase: clock.phase, time: clock.time }
    setViewer(store, { recording: true, message: `Writing ${name}…` })
    capture.current = (_gl, grab) => grab.renderAt(w, sceneHeight, (frame) => drawCaptioned(ctx, frame, w, h, cap))
    try {
      const gif = await createGifWriter(w, h, (seconds * 1000) / GIF_FRAMES)
      clock.held = true
      for (let k = 0; k < GIF_FRAMES; k++) {
        clock.phase = (2 * Math.PI * k) / GIF_FRAMES
        clock.time = (k / GIF_FRAMES) * seconds * speed
        advance(performance.now(), true, root)
        gif.add(ctx.getImageData(0, 0, w, h).data)
        // Let the page breathe between frames (quantising a frame takes a while).
        await new Promise((r) => window.setTimeout(r, 0))
      }
      const bytes = gif.finish()
      downloadBlob(new Blob([bytes as Uint8Array<ArrayBuffer>], { type: 'image/gif' }), name)
      setViewer(store, { message: `Saved ${name} (${w} × ${h}, ${GIF_FRAMES} frames)` })
    } catch (e) {
      setViewer(store, { message: `[viewer] GIF export failed: ${e instanceof Error ? e.message : String(e)}` })
    } finally {
      clock.held = false
      clock.phase = saved.phase
      clock.time = saved.time
      capture.current = null
      setViewer(store, { recording: false })
    }
  }

  /** Fallback without WebCodecs: MediaRecorder on the composited canvas in real time. */
  const recordRealTime = async (out: HTMLCanvasElement, name: string, speed: number) => {
    const type = pickWebmType()
    if (!type) throw new Error('this browser can neither encode nor record WebM video')
    const stream = out.captureStream(30)
    const recorder = new MediaRecorder(stream, { mimeType: type, videoBitsPerSecond: 4_000_000 })
    const chunks: Blob[] = []
    recorder.ondataavailable = (e) => {
      if (e.data.size > 0) chunks.push(e.data)
    }
    const stopped = new Promise<void>((done) => (recorder.onstop = () => done()))
    const seconds = Math.min(8, 2 / (BASE_CYCLES_PER_SECOND * speed))
    clock.phase = 0
    recorder.start(250)
    await new Promise((r) => window.setTimeout(r, seconds * 1000))
    recorder.stop()
    await stopped
    stream.getTracks().forEach((t) => t.stop())
    if (chunks.length === 0) throw new Error('the browser recorded no video frames')
    downloadBlob(new Blob(chunks, { type: 'video/webm' }), name)
    setViewer(store, { message: `Saved ${name}` })
  }

  const peak = () => {
    clock.phase = Math.PI / 2
    setViewer(store, { playing: false, message: '' })
  }

  const step = () => {
    setViewer(store, { playing: false })
    clock.phase = (clock.phase + 2 * Math.PI * STEP_FRACTION) % (2 * Math.PI)
    clock.time += (result?.timeHistory?.dt ?? 0.02) * 4
    setViewer(store, { message: '' })
  }

  const banner = !result
    ? 'No analysis yet: the building is shown at rest.'
    : !fits
      ? 'The analysis does not match the floors on screen; analyse again to animate the modes.'
      : isStale
        ? 'The model changed since this analysis: the motion shown is from the previous version.'
        : null

  const presentTitle = motionA?.title ?? project.name
  const presentMeaning = motionA?.meaning ?? ''
  const presentMeaningB = state.sideBySide && motionB ? `Right: ${motionB.meaning}` : ''

  return (
    <section
      ref={rootRef}
      aria-label="3D view"
      className={`gyre-viewer${state.presenting ? ' gyre-viewer--presenting' : ''}`}
      data-testid="viewer-pane"
      data-mode={motionA?.kind === 'mode' ? motionA.mode + 1 : ''}
      data-presenting={state.presenting ? 'true' : 'false'}
    >
      <style>{VIEWER_CSS}</style>
      <header className="gyre-caption" data-testid="presentation-caption">
        <h2 data-testid="presentation-title">
          {presentTitle}
          {state.sideBySide && motionB ? `  |  ${motionB.title}` : ''}
        </h2>
        <p data-testid="presentation-meaning">{presentMeaning}</p>
        {presentMeaningB && <p>{presentMeaningB}</p>}
      </header>
      <Toolbar
        store={store}
        state={state}
        hasHistory={Boolean(history)}
        floorNames={floorNames}
        onStep={step}
        onPeak={peak}
        onPng={exportPng}
        onWebm={() => void exportWebm()}
        onGif={() => void exportGif()}
      />
      {state.presenting && (
        <PresentationBar
          store={store}
          state={state}
          rows={rows.length}
          onPng={exportPng}
          onWebm={() => void exportWebm()}
          onGif={() => void exportGif()}
        />
      )}
      <div className="gyre-viewer-stage">
        {/* The legend and plan trace sit beside the canvas, never over the building. */}
        <div className="gyre-viewer-stage-inner">
          <div className="gyre-viewer-canvas-box" data-testid="viewer-canvas-box">
            {glProblem ? (
              <ViewerUnavailable reason={glProblem} />
            ) : (
              <ViewerErrorBoundary resetKey={layout}>
                <ViewerCanvas
                  layout={layout}
                  motionA={motionA}
                  motionB={motionB}
                  marks={marks}
                  store={store}
                  clock={clock}
                  capture={capture}
                  onFrame={onFrame}
                  transformsA={transformsA}
                  rootState={rootState}
                  {...(onFrameRendered ? { onFrameRendered } : {})}
                />
              </ViewerErrorBoundary>
            )}
            {banner && (
              <div className="gyre-viewer-banner" data-testid="viewer-banner">
                {banner}
              </div>
            )}
          </div>
          <div className="gyre-viewer-aside" data-testid="viewer-aside">
            <Legend motion={motionA} colourBy={state.colourBy} amplitude={state.amplitude} />
            {state.showTrace && (
              <PlanTrace
                layout={layout}
                motion={motionA}
                marks={marks}
                store={store}
                onFrame={onFrame}
                transforms={transformsA}
              />
            )}
          </div>
        </div>
      </div>
      {rows.length > 0 && (
        <div className="gyre-modes">
          <table data-testid="mode-table">
            <thead>
              <tr>
                {MODE_COLUMNS.map((c) => (
                  <th key={c.key} title={c.hint}>
                    {modeHeaderLabel(c)}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((r, i) => (
                <tr
                  key={r.number}
                  data-testid={`mode-row-${r.number}`}
                  aria-selected={i === modeIndex && state.source === 'mode'}
                  onClick={() => selectMode(store, i)}
                >
                  <td>{r.number}</td>
                  <td>{r.period.toFixed(3)}</td>
                  <td>{r.frequencyHz.toFixed(3)}</td>
                  <td>{pct(r.ratioX)}</td>
                  <td>{pct(r.ratioY)}</td>
                  <td>{pct(r.ratioRz)}</td>
                  <td>{pct(r.cumulativeX)}</td>
                  <td>{pct(r.cumulativeY)}</td>
                  <td>{pct(r.cumulativeRz)}</td>
                  <td>{pct(r.torsionShare)}</td>
                  <td>{characterWords(r.character)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <p className="gyre-viewer-status" data-testid="viewer-status" role="status">
        {state.message}
      </p>
      {/* Full window covers the app's caution line: the presentation says it itself. */}
      {state.presenting ? (
        <p className="gyre-viewer-caution" data-testid="viewer-caution">
          {CAUTION}
        </p>
      ) : null}
    </section>
  )
}

function Toolbar(props: {
  store: ViewerStore
  state: ViewerState
  hasHistory: boolean
  floorNames: readonly string[]
  onStep: () => void
  onPeak: () => void
  onPng: () => void
  onWebm: () => void
  onGif: () => void
}) {
  const { store, state, hasHistory, floorNames, onStep, onPeak, onPng, onWebm, onGif } = props
  const cam = (preset: CameraPreset, label: string, id: string) => (
    <button type="button" data-testid={`viewer-camera-${id}`} onClick={() => requestCamera(store, preset)}>
      {label}
    </button>
  )
  return (
    <div className="gyre-viewer-bar" role="toolbar" aria-label="3D view controls">
      <fieldset>
        <button
          type="button"
          data-testid="viewer-play"
          aria-pressed={state.playing}
          onClick={() => setViewer(store, { playing: !state.playing })}
        >
          {state.playing ? 'Pause' : 'Play'}
        </button>
        <button type="button" data-testid="viewer-step" onClick={onStep}>
          Step
        </button>
        <button type="button" data-testid="viewer-peak" title="Pause at the largest displacement" onClick={onPeak}>
          Peak
        </button>
        <label>
          Speed
          <input
            type="range"
            data-testid="viewer-speed"
            min={0.25}
            max={3}
            step={0.25}
            value={state.speed}
            onChange={(e) => setViewer(store, { speed: Number(e.target.value) })}
          />
        </label>
        <label>
          Amplitude
          <input
            type="range"
            data-testid="viewer-amplitude"
            min={0.01}
            max={0.2}
            step={0.01}
            value={state.amplitude}
            onChange={(e) => setViewer(store, { amplitude: Number(e.target.value) })}
          />
        </label>
      </fieldset>
      <div className="gyre-viewer-bar gyre-viewer-bar--main">
        <fieldset>
          <Toggle store={store} testId="viewer-ghost" label="Ghost" on={state.showGhost} field="showGhost" />
          <Toggle store={store} testId="viewer-centres" label="CM / CR" on={state.showCentres} field="showCentres" />
          <Toggle store={store} testId="viewer-trace-toggle" label="Corner paths" on={state.showTrace} field="showTrace" />
          <label>
            Colour
            <select
              data-testid="viewer-colour"
              value={state.colourBy}
              onChange={(e) => setViewer(store, { colourBy: e.target.value as ColourBy })}
            >
              <option value="drift">story drift ratio</option>
              <option value="displacement">displacement</option>
              <option value="none">plain</option>
            </select>
          </label>
          {state.showTrace && floorNames.length > 1 && (
            <label>
              Paths of
              <select
                data-testid="viewer-trace-floor"
                value={state.traceFloor ?? floorNames.length - 1}
                onChange={(e) => setViewer(store, { traceFloor: Number(e.target.value) })}
              >
                {floorNames.map((name, i) => (
                  <option key={i} value={i}>
                    {name}
                  </option>
                ))}
              </select>
            </label>
          )}
          {hasHistory && (
            <label>
              Motion
              <select
                data-testid="viewer-source"
                value={state.source}
                onChange={(e) => setViewer(store, { source: e.target.value as ViewerState['source'] })}
              >
                <option value="mode">mode shape</option>
                <option value="history">time history</option>
              </select>
            </label>
          )}
        </fieldset>
        <fieldset aria-label="Camera">
          {cam('top', 'Top', 'top')}
          {cam('front', 'Front (X)', 'front')}
          {cam('side', 'Side (Y)', 'side')}
          {cam('three-quarter', '3/4', 'three-quarter')}
          <button type="button" data-testid="viewer-camera-reset" onClick={() => requestCamera(store, 'three-quarter')}>
            Reset view
          </button>
        </fieldset>
        <fieldset aria-label="Export and present">
          <ExportButtons store={store} state={state} idPrefix="viewer" onPng={onPng} onWebm={onWebm} onGif={onGif} />
          <button type="button" data-testid="viewer-present" onClick={() => setViewer(store, { presenting: true })}>
            Present
          </button>
        </fieldset>
      </div>
    </div>
  )
}

function Toggle(props: {
  store: ViewerStore
  testId: string
  label: string
  on: boolean
  field: 'showGhost' | 'showCentres' | 'showTrace'
}) {
  const { store, testId, label, on, field } = props
  return (
    <button type="button" data-testid={testId} aria-pressed={on} onClick={() => setViewer(store, { [field]: !on })}>
      {label}
    </button>
  )
}

/** Export size menu and the PNG / WebM / GIF buttons (toolbar and presentation bar). */
function ExportButtons(props: {
  store: ViewerStore
  state: ViewerState
  idPrefix: 'viewer' | 'presentation'
  onPng: () => void
  onWebm: () => void
  onGif: () => void
}) {
  const { store, state, idPrefix, onPng, onWebm, onGif } = props
  return (
    <>
      <label title="Pixel size of exported pictures and videos (GIF: at most 960 × 540)">
        Size
        <select
          data-testid={`${idPrefix}-export-size`}
          value={state.exportSize}
          onChange={(e) => setViewer(store, { exportSize: e.target.value as ExportSizeChoice })}
        >
          {EXPORT_SIZE_CHOICES.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
      <button type="button" data-testid={`${idPrefix}-export-png`} onClick={onPng} disabled={state.recording}>
        PNG
      </button>
      <button type="button" data-testid={`${idPrefix}-export-webm`} onClick={onWebm} disabled={state.recording}>
        {state.recording ? 'Working…' : 'WebM'}
      </button>
      <button type="button" data-testid={`${idPrefix}-export-gif`} onClick={onGif} disabled={state.recording}>
        GIF
      </button>
    </>
  )
}

function PresentationBar(props: {
  store: ViewerStore
  state: ViewerState
  rows: number
  onPng: () => void
  onWebm: () => void
  onGif: () => void
}) {
  const { store, state, rows, onPng, onWebm, onGif } = props
  return (
    <div className="gyre-viewer-bar" aria-label="Presentation controls">
      <button type="button" data-testid="presentation-prev" onClick={() => selectMode(store, Math.max(0, state.mode - 1))}>
        Previous mode
      </button>
      <button
        type="button"
        data-testid="presentation-next"
        onClick={() => selectMode(store, Math.min(Math.max(0, rows - 1), state.mode + 1))}
      >
        Next mode
      </button>
      <button
        type="button"
        data-testid="presentation-cycle"
        aria-pressed={state.autoCycle}
        onClick={() => setViewer(store, { autoCycle: !state.autoCycle })}
      >
        Cycle first {Math.min(CYCLE_MODES, rows)}
      </button>
      <button
        type="button"
        data-testid="presentation-side"
        aria-pressed={state.sideBySide}
        onClick={() => setViewer(store, { sideBySide: !state.sideBySide })}
      >
        Side by side
      </button>
      {state.sideBySide && (
        <label>
          with mode
          <select
            data-testid="presentation-mode-b"
            value={state.modeB}
            onChange={(e) => setViewer(store, { modeB: Number(e.target.value) })}
          >
            {Array.from({ length: rows }, (_, i) => (
              <option key={i} value={i}>
                {i + 1}
              </option>
            ))}
          </select>
        </label>
      )}
      <ExportButtons store={store} state={state} idPrefix="presentation" onPng={onPng} onWebm={onWebm} onGif={onGif} />
      <button
        type="button"
        data-testid="presentation-close"
        onClick={() => setViewer(store, { presenting: false, autoCycle: false })}
      >
        Close (Esc)
      </button>
    </div>
  )
}

function Legend(props: { motion: MotionSource | null; colourBy: ColourBy; amplitude: number }) {
  const { motion, colourBy, amplitude } = props
  if (!motion) return null
  const isHistory = motion.kind === 'history'
  const max = colourBy === 'drift' ? motion.colours.maxDriftRatio : motion.colours.maxDisplacement
  const ticks = legendTicks(isHistory ? max : 1, 5)
  const label = (v: number) =>
    !isHistory
      ? `${Math.round(v * 100)}%`
      : colourBy === 'drift'
        ? `${(v * 100).toFixed(2)}%`
        : `${(v * 1000).toFixed(0)} mm`
  return (
    <div className="gyre-legend" data-testid="viewer-legend">
      {colourBy !== 'none' && (
        <>
          <div>
            {colourBy === 'drift' ? 'Story drift ratio' : 'Floor displacement'}
            {isHistory ? ' at the peak' : ', relative to the largest in this mode'}
          </div>
          <div className="gyre-legend-bar" style={{ background: rampGradient() }} />
          <div className="gyre-legend-ticks">
            {ticks.map((t) => (
              <span key={t.t}>{label(t.value)}</span>
            ))}
          </div>
        </>
      )}
      <div className="gyre-legend-keys">
        <i style={{ background: '#6b3fa0', borderRadius: '50%' }} />
        centre of mass
        <i style={{ background: '#14806b', transform: 'rotate(45deg)' }} />
        centre of rigidity
      </div>
      <div className="gyre-legend-keys">
        Motion scaled: largest floor displacement = {Math.round(amplitude * 100)}% of the plan size
      </div>
    </div>
  )
}
