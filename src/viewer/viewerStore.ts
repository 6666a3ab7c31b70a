/**
 * The viewer's own small store (one per pane): structure-changing choices that React renders
 * (mode, toggles, presentation) and the values the frame loop reads with getState() each frame
 * (playing, speed, amplitude). Fast-moving animation time lives in a plain mutable clock, never here.
 */
import { createStore } from 'zustand/vanilla'
import type { StoreApi } from 'zustand/vanilla'
import type { ColourBy } from './colourScale'
import type { ExportSizeChoice } from './exportMedia'

export type CameraPreset = 'top' | 'front' | 'side' | 'three-quarter'
export type MotionSourceKind = 'mode' | 'history'

export interface ViewerState {
  /** 0-based selected mode. */
  readonly mode: number
  /** 0-based second mode of the side-by-side view. */
  readonly modeB: number
  readonly playing: boolean
  /** Animation speed factor (1 = one cycle in 1.6 s). */
  readonly speed: number
  /** Largest floor displacement as a fraction of the plan size. */
  readonly amplitude: number
  readonly showGhost: boolean
  readonly showTrace: boolean
  readonly showCentres: boolean
  readonly colourBy: ColourBy
  readonly source: MotionSourceKind
  readonly presenting: boolean
  readonly sideBySide: boolean
  readonly autoCycle: boolean
  /** Floor (0-based) drawn in the plan trace; null = the top floor. */
  readonly traceFloor: number | null
  readonly cameraRequest: { readonly preset: CameraPreset; readonly nonce: number }
  readonly recording: boolean
  /** Output size of the PNG, WebM and GIF exports (GIF scaled down to at most 960 × 540). */
  readonly exportSize: ExportSizeChoice
  /** Last export or viewer message for the status line. */
  readonly message: string
}

export type ViewerStore = StoreApi<ViewerState>

/** Base animation rate at speed 1, cycles per second (a display rate, not the mode's frequency). */
export const BASE_CYCLES_PER_SECOND = 1 / 1.6
/** Step of the step button, fraction of a cycle. */
export const STEP_FRACTION = 1 / 24

export function createViewerStore(initial: Partial<ViewerState> = {}): ViewerStore {
  return createStore<ViewerState>(() => ({
    mode: 0,
    modeB: 1,
    playing: true,
    speed: 1,
    amplitude: 0.06,
    showGhost: true,
    showTrace: true,
    showCentres: true,
    colourBy: 'drift',
    source: 'mode',
    presenting: false,
    sideBySide: false,
    autoCycle: false,
    traceFloor: null,
    cameraRequest: { preset: 'three-quarter', nonce: 0 },
    recording: false,
    exportSize: '1920x1080',
    message: '',
    ...initial,
  }))
}

export function setViewer(store: ViewerStore, patch: Partial<ViewerState>): void {
  store.setState(patch)
}

export function requestCamera(store: ViewerStore, preset: CameraPreset): void {
  store.setState((s) => ({ cameraRequest: { preset, nonce: s.cameraRequest.nonce + 1 } }))
}

export function selectMode(store: ViewerStore, mode: number): void {
  store.setState({ mode, source: 'mode' })
}

/** Mutable animation clock shared by the frame loop and the plan trace (never React state). */
export interface AnimationClock {
  /** Mode phase, rad. */
  phase: number
  /** Time-history playback time, s. */
  time: number
  /** While true the frame loop does not advance the clock (frame-exact export sets it itself). */
  held: boolean
}
