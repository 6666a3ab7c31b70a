/**
 * The main screen: toolbar from the action table, floor stack, the plan of the current floor with
 * live centre overlays, the 3D view beside it, problems and results below, inspector on the right,
 * and a status line. Every panel sits in its own error boundary.
 */
import { memo, useCallback, useEffect, useMemo, useRef, useState } from 'react'
import type { ChangeEvent } from 'react'
import {
  dispatch,
  execute,
  loadDocument,
  mark,
  ROTATE_HANDLE_OFFSET,
  parseNumericEntry,
  resetTool,
  selectCanRedo,
  selectCanUndo,
  selectionHandles,
  setCurrentFloor,
  setMessage,
  setSelection,
} from '@/editor'
import type { Draft, EditorStore } from '@/editor'
import type { BalanceSuggestion, Issue } from '@/engine'
import { demoProject } from '@/model'
import type { BaseRef, FloorId, Project, UnitSystem } from '@/model'
import { ViewerPane } from '@/viewer'
import { BalancePanel, ReportActions } from './extras'
import './extras/extras.css'
import type { ViewerPaneProps } from '@/viewer'
import { ACTIONS, actionForKey } from './actions'
import type { Action, ActionContext } from './actions'
import type { AnalysisClient, AnalysisState } from './analysisClient'
import type { AutosaveService } from './autosave'
import { blankProject } from './blankProject'
import { CentresTable } from './CentresTable'
import { centresRows } from './centresRows'
import { ErrorBoundary } from './ErrorBoundary'
import { FloorStack } from './FloorStack'
import type { FloorActions } from './FloorStack'
import { floorOverlay } from './floorOverlay'
import { useAnalysis } from './hooks/useAnalysis'
import { useAutosave } from './hooks/useAutosave'
import { useEditor, useEditorPick } from './hooks/useEditor'
import { ElementForcesPanel } from './ElementForcesPanel'
import { SeismicSystemForm } from './SeismicSystemForm'
import { ProjectSettingsPanel } from './settings'
import { Inspector } from './Inspector'
import type { InspectedKind } from './Inspector'
import { PlanCanvas } from './PlanCanvas'
import type { PlanHandle, PlanPointerEvent, PlanPreview } from './PlanCanvas'
import { planScene, sceneBounds } from './planScene'
import { ProblemsPanel } from './ProblemsPanel'
import { downloadProject, readProjectFile } from './projectFile'
import { formatQuantity, fromDisplay } from './quantities'
import { ResultsPanel } from './ResultsPanel'
import { SaveNotice } from './SaveNotice'
import { WorkerNotice } from './WorkerNotice'
import { normaliseNumericText } from './numericText'
import { ShortcutSheet } from './ShortcutSheet'
import { StatusLine } from './StatusLine'
import { LAYOUTS, layoutForKey } from './workbench/layouts'
import type { LayoutId } from './workbench/layouts'
import { readStoredLayouts, Workbench } from './workbench/Workbench'

export interface AppProps {
  readonly store: EditorStore
  readonly analysis: AnalysisClient
  /** A message from start-up (autosave restored or refused). */
  readonly startupNotice?: string | null
  /** Initial 3D viewer settings (e.g. animation paused for tests and benchmarks). */
  readonly viewerInitial?: ViewerPaneProps['initial']
  /** Where autosave writes (none: no autosave, e.g. in tests). */
  readonly autosave?: AutosaveService | null
}

interface Banner {
  readonly kind: 'error' | 'info' | 'confirm'
  readonly title: string
  readonly lines: readonly string[]
}

const UNITS_KEY = 'gyre.units'
const MemoViewerPane = memo(ViewerPane)
const MemoResultsPanel = memo(ResultsPanel)
const MemoFloorStack = memo(FloorStack)
const PICK_PIXELS = 8
const DRAWING_TOOLS = new Set(['wall', 'frame', 'slab', 'opening', 'mass-line'])

function storedUnits(): UnitSystem {
  try {
    return localStorage.getItem(UNITS_KEY) === 'US' ? 'US' : 'SI'
  } catch (_err) {
    return 'SI'
  }
}

function isTyping(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLInputElement ||
    target instanceof HTMLTextAreaElement ||
    target instanceof HTMLSelectElement ||
    (target instanceof HTMLElement && target.isContentEditable)
  )
}

function previewOf(draft: Draft | null, wallThickness: number): PlanPreview[] {
  if (!draft) return []
  switch (draft.kind) {
    case 'segment':
      return [draft.tool === 'wall' ? { kind: 'segment', p1: draft.p1, p2: draft.p2, thickness: wallThickness } : { kind: 'segment', p1: draft.p1, p2: draft.p2 }]
    case 'polyline':
      return [{ kind: 'polyline', points: draft.points, closed: draft.closed }]
    case 'point':
      return [{ kind: 'point', at: draft.at }]
    case 'box':
      return [{ kind: 'box', a: draft.min, b: draft.max }]
    case 'rotate':
      return []
    default: {
      const never: never = draft
      throw new Error(`[ui] unknown draft ${String(never)}`)
    }
  }
}

export function App({ store, analysis, startupNotice = null, viewerInitial, autosave = null }: AppProps) {
  const doc = useEditor(store, (s) => s.doc)
  const revision = useEditor(store, (s) => s.revision)
  const floorId = useEditor(store, (s) => s.currentFloor)
  const selection = useEditor(store, (s) => s.selection)
  const tool = useEditorPick(store, (s) => ({ id: s.tool.id, state: s.tool.state }))
  const ephemeral = useEditor(store, (s) => s.ephemeral)
  const message = useEditor(store, (s) => s.message)
  const canUndo = useEditor(store, selectCanUndo)
  const canRedo = useEditor(store, selectCanRedo)
  const wallThickness = useEditor(store, (s) => s.defaults.wallThickness)
  const state = useAnalysis(analysis)

  const [units, setUnits] = useState<UnitSystem>(storedUnits)
  const [layout, setLayout] = useState<LayoutId>(() => readStoredLayouts().active)
  const [showOverlays, setShowOverlays] = useState(true)
  // Time history is the heaviest stage: run it only while the engineer asks for the ground-motion response.
  const [withMotion, setWithMotion] = useState(false)
  const [fitRequest, setFitRequest] = useState(0)
  // A new layout resizes the plan pane: fit the plan again once its new size is measured.
  const chooseLayout = useCallback((id: LayoutId) => {
    setLayout(id)
    setFitRequest((n) => n + 1)
  }, [])
  const [banner, setBanner] = useState<Banner | null>(startupNotice ? { kind: 'info', title: startupNotice, lines: [] } : null)
  const [statusNote, setStatusNote] = useState<string | null>(null)
  const [numericText, setNumericText] = useState('')
  const [sheetOpen, setSheetOpen] = useState(false)
  const [viewScale, setViewScale] = useState(20)
  const onViewChange = useCallback((v: { scale: number }) => setViewScale(v.scale), [])
  const fileInput = useRef<HTMLInputElement>(null)

  // Analysis on every revision (latest wins in the client); debounced autosave with its unload guard.
  const saving = useAutosave(store, autosave)
  const { markFileSaved } = saving
  useEffect(() => {
    analysis.request(revision, doc, withMotion ? { timeHistory: true } : undefined)
  }, [analysis, revision, doc, withMotion])

  useEffect(() => {
    try {
      localStorage.setItem(UNITS_KEY, units)
    } catch (_err) {
      // Storage may be unavailable (private mode); the choice then lasts for this session only.
    }
  }, [units])

  const openFile = useCallback(() => fileInput.current?.click(), [])
  const saveFile = useCallback(() => {
    const name = downloadProject(store.getState().doc)
    markFileSaved()
    setStatusNote(`Saved ${name}`)
  }, [store, markFileSaved])
  const [replaceWith, setReplaceWith] = useState<'demo' | 'blank'>('demo')
  const startFromDemo = useCallback(() => {
    setReplaceWith('demo')
    setBanner({ kind: 'confirm', title: 'Replace the current model with the demo building? Undo history is cleared.', lines: [] })
  }, [])
  const startBlank = useCallback(() => {
    setReplaceWith('blank')
    setBanner({ kind: 'confirm', title: 'Start a new, empty building? The current model is replaced and undo history is cleared.', lines: [] })
  }, [])
  const ctx: ActionContext = useMemo(
    () => ({
      store,
      openFile,
      saveFile,
      startFromDemo,
      startBlank,
      fit: () => setFitRequest((n) => n + 1),
      toggleOverlays: () => setShowOverlays((v) => !v),
      toggleUnits: () => setUnits((u) => (u === 'SI' ? 'US' : 'SI')),
    }),
    [store, openFile, saveFile, startFromDemo, startBlank],
  )

  // Keyboard shortcuts from the action table; typing in a field is left alone.
  useEffect(() => {
    const onKey = (e: KeyboardEvent): void => {
      const mod = e.ctrlKey || e.metaKey
      // Ctrl+Z / Ctrl+Y in a property box: apply the box (blur commits it), then undo or redo.
      if (isTyping(e.target) && mod && (e.key.toLowerCase() === 'z' || e.key.toLowerCase() === 'y')) {
        const box = e.target as HTMLElement
        if (box.closest('.inspector, .floor-stack')) {
          e.preventDefault()
          box.blur()
          const action = actionForKey(e)
          if (action?.canRun(ctx)) action.run(ctx)
        }
        return
      }
      if (isTyping(e.target)) return
      if (e.key === 'Escape') setSheetOpen(false)
      if (e.key === '?') {
        e.preventDefault()
        setSheetOpen((v) => !v)
        return
      }
      // While a segment or outline is being drawn, typed numbers go to the length, angle box.
      const st = store.getState()
      if (!mod && !e.altKey && DRAWING_TOOLS.has(st.tool.id) && st.tool.state !== 'idle' && /^[0-9.@<-]$/.test(e.key)) {
        const input = document.getElementById('numeric-input')
        if (input instanceof HTMLInputElement) {
          e.preventDefault()
          input.focus()
          setNumericText((t) => t + e.key)
          return
        }
      }
      // While a gesture is in progress Enter and Backspace belong to the tool (finish, drop vertex).
      if ((e.key === 'Enter' || e.key === 'Backspace') && store.getState().tool.state !== 'idle') {
        e.preventDefault()
        dispatch(store, { type: 'key', key: e.key, shift: e.shiftKey, alt: e.altKey })
        return
      }
      const action = actionForKey(e)
      if (action) {
        e.preventDefault()
        if (action.canRun(ctx)) action.run(ctx)
        return
      }
      const nextLayout = layoutForKey(e)
      if (nextLayout) {
        e.preventDefault()
        chooseLayout(nextLayout)
      }
    }
    const onBlur = (): void => {
      if (store.getState().tool.state !== 'idle') dispatch(store, { type: 'cancel' })
    }
    window.addEventListener('keydown', onKey)
    window.addEventListener('blur', onBlur)
    return () => {
      window.removeEventListener('keydown', onKey)
      window.removeEventListener('blur', onBlur)
    }
  }, [chooseLayout, ctx, store])

  const onOpenChange = async (e: ChangeEvent<HTMLInputElement>): Promise<void> => {
    const file = e.target.files?.[0]
    e.target.value = ''
    if (!file) return
    const read = await readProjectFile(file)
    if (!read.ok) {
      setBanner({ kind: 'error', title: `[file] ${file.name} was not opened; your current model is unchanged.`, lines: read.errors })
      return
    }
    loadDocument(store, read.project)
    resetTool(store)
    setFitRequest((n) => n + 1)
    setBanner(read.warnings.length ? { kind: 'info', title: `Opened ${file.name}`, lines: read.warnings } : null)
    setStatusNote(`Opened ${file.name}`)
  }

  const replaceModel = (): void => {
    loadDocument(store, replaceWith === 'demo' ? demoProject() : blankProject())
    resetTool(store)
    setFitRequest((n) => n + 1)
    setBanner(null)
    setStatusNote(replaceWith === 'demo' ? 'Started from the demo building' : 'Started a new building')
  }

  // Pointer input from the plan, in plan metres, to the active tool.
  const onPointer = useCallback(
    (e: PlanPointerEvent) => {
      const tolerance = PICK_PIXELS / e.pixelsPerMetre
      const type = e.type === 'down' ? 'pointerDown' : e.type === 'up' ? 'pointerUp' : 'pointerMove'
      if (e.type === 'leave') return
      dispatch(store, { type, point: e.point, shift: e.shift, alt: e.alt, tolerance })
    },
    [store],
  )

  const run = useCallback(
    (label: string, fn: () => { ok: boolean; message?: string }): string | null => {
      mark(store, label)
      const r = fn()
      return r.ok ? null : (r.message ?? 'refused')
    },
    [store],
  )
  const floorActions: FloorActions = useMemo(
    () => ({
      add: () => run('add floor', () => execute(store, 'addFloor', {})),
      remove: (floor) => run('remove floor', () => execute(store, 'removeFloor', { floor })),
      duplicate: (floor) => run('duplicate floor', () => execute(store, 'duplicateFloor', { floor })),
      rename: (floor, name) => run('rename floor', () => execute(store, 'renameFloor', { floor, name })),
      setHeight: (floor, height) => run('story height', () => execute(store, 'setFloorHeight', { floor, height })),
      link: (floor, source) => run('typical floor', () => execute(store, 'linkTypicalFloor', { floor, source })),
      unlink: (floor) => run('break typical link', () => execute(store, 'unlinkTypicalFloor', { floor })),
    }),
    [run, store],
  )
  const onSelectFloor = useCallback((f: FloorId) => setCurrentFloor(store, f), [store])
  const onReplace = (_kind: InspectedKind, record: { readonly id: string }): string | null => {
    const { id, ...patch } = record
    return run('edit property', () => execute(store, 'updateElement', { id, patch: patch as never }))
  }
  const onApplyBalance = useCallback(
    (suggestion: BalanceSuggestion): void => {
      const items = suggestion.edits.map(({ after }) => {
        const { id, ...patch } = after
        return { id, patch: patch as never }
      })
      const refused = run('apply balance change', () => execute(store, 'updateElements', { items }))
      if (refused === null) setSelection(store, items.map((i) => i.id))
    },
    [run, store],
  )
  const onCopyToFloors = (base: BaseRef, top: FloorId, move: boolean): string | null => {
    const ids = store.getState().selection
    return move
      ? run('move to floors', () => execute(store, 'setElementFloorRange', { ids, base, top }))
      : run('copy to floors', () => execute(store, 'copyElementsToFloors', { ids, base, top }))
  }
  const onPickIssue = (issue: Issue): void => {
    const st = store.getState()
    const floorRef = issue.floor ?? issue.refs.find((r) => st.doc.floors.some((f) => f.id === r))
    if (floorRef && st.doc.floors.some((f) => f.id === floorRef) && floorRef !== st.currentFloor) {
      setCurrentFloor(store, floorRef as FloorId)
    }
    setSelection(store, issue.refs)
  }

  const nameOf = useCallback((id: string): string => recordName(store.getState().doc, id), [store])
  const scene = useMemo(() => planScene(doc, floorId), [doc, floorId])
  const bounds = useMemo(() => sceneBounds(doc, scene), [doc, scene])
  const overlay = useMemo(() => floorOverlay(state.result, floorId), [state.result, floorId])
  const centres = useMemo(() => centresRows(doc.floors, state.result), [doc.floors, state.result])
  const handles = useMemo(
    // Slab vertex handles are drawn with the slab itself; the canvas draws the others.
    () =>
      selectionHandles(doc, floorId, selection, (ROTATE_HANDLE_OFFSET * PICK_PIXELS) / viewScale).filter(
        (h): h is PlanHandle => h.kind !== 'vertex',
      ),
    [doc, floorId, selection, viewScale],
  )
  const preview = useMemo(() => previewOf(ephemeral.draft, wallThickness), [ephemeral.draft, wallThickness])
  const readout = ephemeral.readout
    ? tool.id === 'pick'
      ? `Δx ${formatQuantity(ephemeral.readout.dx, 'length', units)} · Δy ${formatQuantity(ephemeral.readout.dy, 'length', units)}`
      : `L ${formatQuantity(ephemeral.readout.length, 'length', units)} · ${formatQuantity(ephemeral.readout.angle, 'angle', units)}`
    : ephemeral.draft?.kind === 'rotate'
      ? `turn ${formatQuantity(ephemeral.draft.angle, 'angle', units)}`
      : null
  const snap = ephemeral.snap && ephemeral.snap.kind !== 'none' ? { at: ephemeral.snap.point, kind: ephemeral.snap.kind } : null

  const numericMode = DRAWING_TOOLS.has(tool.id) ? 'length-angle' : tool.id === 'pick' && selection.length > 0 ? 'offset' : null
  const submitNumeric = (): void => {
    if (!numericMode) return
    const parsed = parseNumericEntry(normaliseNumericText(numericText), numericMode, fromDisplay(1, 'length', units))
    if (!parsed.ok) {
      setMessage(store, parsed.message)
      return
    }
    dispatch(store, parsed.event)
    setNumericText('')
  }

  // The 3D view and the result tables follow the model between gestures: during a drag they keep the
  // state from the gesture's start (marked stale), so rebuilding them never competes with the pointer;
  // the plan overlays alone follow the drag live.
  const gestureActive = tool.state !== 'idle'
  const viewerFrozen = useRef<{ doc: Project; result: AnalysisState['result'] }>({ doc, result: state.result })
  if (!gestureActive) viewerFrozen.current = { doc, result: state.result }
  const viewerDoc = viewerFrozen.current.doc
  const viewerResult = viewerFrozen.current.result
  const viewerStale = gestureActive || state.isStale || state.error !== null

  const floor = doc.floors.find((f) => f.id === floorId)
  const floorNumber = doc.floors.findIndex((f) => f.id === floorId) + 1
  const canAction = (a: Action): boolean => {
    if (a.id === 'undo') return canUndo
    if (a.id === 'redo') return canRedo
    if (a.id === 'delete') return selection.length > 0
    return a.canRun(ctx)
  }
  const groups: { id: string; label: string; actions: Action[] }[] = [
    { id: 'file', label: 'File', actions: ACTIONS.filter((a) => a.group === 'file') },
    { id: 'edit', label: 'Edit', actions: ACTIONS.filter((a) => a.group === 'edit' && a.id !== 'cancel') },
    { id: 'tool', label: 'Draw', actions: ACTIONS.filter((a) => a.group === 'tool') },
    { id: 'view', label: 'View', actions: ACTIONS.filter((a) => a.group === 'view' && a.id !== 'units') },
  ]
  const issues = state.result?.issues ?? []

  return (
    <div className="app" data-testid="app">
      <header className="topbar" role="toolbar" aria-label="Actions">
        <span className="brand">Gyre</span>
        {groups.map((g) => (
          <div className="group" key={g.id} role="group" aria-label={g.label}>
            {g.actions.map((a) => (
              <button
                key={a.id}
                type="button"
                data-testid={`action-${a.id}`}
                disabled={!canAction(a)}
                aria-pressed={a.tool ? tool.id === a.tool : a.id === 'overlays' ? showOverlays : undefined}
                title={a.shortcut ? `${a.label} (${a.shortcut})` : a.label}
                onClick={() => a.run(ctx)}
              >
                {a.label}
              </button>
            ))}
          </div>
        ))}
        <div className="group" role="group" aria-label="Layout">
          {LAYOUTS.map((l) => (
            <button
              key={l.id}
              type="button"
              data-testid={`layout-${l.id}`}
              aria-pressed={layout === l.id}
              title={`${l.hint} (${l.key})`}
              onClick={() => chooseLayout(l.id)}
            >
              {l.label}
            </button>
          ))}
        </div>
        <div className="group" role="group" aria-label="Units">
          {(['SI', 'US'] as const).map((u) => (
            <button
              key={u}
              type="button"
              data-testid={`units-${u}`}
              aria-pressed={units === u}
              title={u === 'SI' ? 'SI units: m, mm, kN, t, s (U switches)' : 'US customary units: ft, in, kip, s (U switches)'}
              onClick={() => setUnits(u)}
            >
              {u === 'SI' ? 'Metric' : 'US customary'}
            </button>
          ))}
        </div>
        <div className="group" role="group" aria-label="Analysis">
          <button
            type="button"
            data-testid="toggle-motion"
            aria-pressed={withMotion}
            title="Also run the time history with the project's ground motion (slower); the 3D view can then play it"
            onClick={() => setWithMotion((v) => !v)}
          >
            Ground motion
          </button>
        </div>
        <input ref={fileInput} type="file" accept=".json,application/json" data-testid="file-input" hidden onChange={(e) => void onOpenChange(e)} />
      </header>
      {banner ? (
        <div className={`banner ${banner.kind === 'error' ? '' : 'info'}`} role={banner.kind === 'error' ? 'alert' : 'status'} data-testid={`banner-${banner.kind}`}>
          <strong>{banner.title}</strong>
          {banner.lines.length ? (
            <ul>
              {banner.lines.map((l, i) => (
                <li key={i}>{l}</li>
              ))}
            </ul>
          ) : null}
          {banner.kind === 'confirm' ? (
            <>
              {' '}
              <button type="button" data-testid="confirm-replace" onClick={replaceModel}>
                {replaceWith === 'demo' ? 'Replace with demo' : 'Start new'}
              </button>{' '}
              <button type="button" onClick={() => setBanner(null)}>
                Keep my model
              </button>
            </>
          ) : (
            <>
              {' '}
              <button type="button" data-testid="banner-close" onClick={() => setBanner(null)}>
                Close
              </button>
            </>
          )}
        </div>
      ) : null}
      <WorkerNotice client={analysis} />
      <SaveNotice status={saving.status} />
      <Workbench
        layout={layout}
        floors={
          <ErrorBoundary name="Floors">
            <MemoFloorStack floors={doc.floors} current={floorId} units={units} onSelect={onSelectFloor} actions={floorActions} />
          </ErrorBoundary>
        }
        plan={
          <div className="plan-area">
          <ErrorBoundary name="Plan">
            <div className="plan-wrap" style={{ position: 'relative', minWidth: 0, minHeight: 0, display: 'grid' }}>
              <PlanCanvas
                project={doc}
                scene={scene}
                bounds={bounds}
                units={units}
                selection={new Set(selection)}
                overlay={overlay}
                overlayStale={state.isStale || state.error !== null}
                showOverlays={showOverlays}
                preview={preview}
                snap={snap}
                handles={handles}
                readout={readout}
                fitRequest={fitRequest}
                cursor={tool.id === 'pick' ? 'default' : 'crosshair'}
                onPointer={onPointer}
                onViewChange={onViewChange}
              />
              <div className="plan-note" data-testid="plan-floor">
                {floor ? `Floor ${floorNumber}: ${floor.name}` : ''}
                {scene.slabsLinked ? ' · slabs and masses as typical floor' : ''}
              </div>
              {numericMode ? (
                <form
                  className="numeric-entry"
                  data-testid="numeric-entry"
                  onSubmit={(e) => {
                    e.preventDefault()
                    submitNumeric()
                  }}
                >
                  <label htmlFor="numeric-input">{numericMode === 'offset' ? 'Move by Δx, Δy' : 'Length, angle°'}</label>
                  <input
                    id="numeric-input"
                    data-testid="numeric-input"
                    type="text"
                    value={numericText}
                    placeholder={numericMode === 'offset' ? (units === 'SI' ? '1.5, 0' : '5, 0') : units === 'SI' ? '6, 90' : '20, 90'}
                    onChange={(e) => setNumericText(e.target.value)}
                    onKeyDown={(e) => {
                      if (e.key === 'Escape') {
                        setNumericText('')
                        ;(e.target as HTMLInputElement).blur()
                      }
                    }}
                  />
                  <button type="submit">Apply</button>
                </form>
              ) : null}
            </div>
          </ErrorBoundary>
          <ErrorBoundary name="Centres">
            <CentresTable rows={centres} currentFloor={floorId} units={units} isStale={viewerStale} onSelectFloor={onSelectFloor} />
          </ErrorBoundary>
          </div>
        }
        model={
          <ErrorBoundary name="3D view">
            <MemoViewerPane
              project={viewerDoc}
              result={viewerResult}
              isStale={viewerStale}
              {...(viewerInitial ? { initial: viewerInitial } : {})}
            />
          </ErrorBoundary>
        }
        problems={
          <ErrorBoundary name="Problems">
            <ProblemsPanel issues={issues} analysisError={state.error} notices={message ? [message] : []} onPick={onPickIssue} nameOf={nameOf} />
          </ErrorBoundary>
        }
        results={
          <ErrorBoundary name="Results">
            <MemoResultsPanel floors={doc.floors} result={viewerResult} isStale={viewerStale} units={units} />
          </ErrorBoundary>
        }
        side={
          <>
            <ErrorBoundary name="Inspector">
              <Inspector
                project={doc}
                selection={selection}
                units={units}
                onReplace={onReplace}
                onDelete={() => {
                  const ids = store.getState().selection
                  if (ids.length) run('delete', () => execute(store, 'deleteElements', { ids }))
                }}
                onCopyToFloors={onCopyToFloors}
                copyMessage={null}
              />
            </ErrorBoundary>
            <ErrorBoundary name="Element forces">
              <ElementForcesPanel floors={doc.floors} result={viewerResult} selection={selection} units={units} isStale={viewerStale} />
            </ErrorBoundary>
            <ErrorBoundary name="Project settings">
              <ProjectSettingsPanel store={store} units={units} />
            </ErrorBoundary>
            <ErrorBoundary name="Seismic system">
              <SeismicSystemForm store={store} result={viewerResult} units={units} />
            </ErrorBoundary>
            <ErrorBoundary name="Balance">
              <BalancePanel project={doc} onApply={onApplyBalance} />
            </ErrorBoundary>
            <ErrorBoundary name="Report">
              <ReportActions project={doc} result={viewerResult} unitSystem={units} />
            </ErrorBoundary>
          </>
        }
      />
      {sheetOpen ? <ShortcutSheet onClose={() => setSheetOpen(false)} /> : null}
      <StatusLine
        analysis={state}
        message={message ?? statusNote}
        autosavedAt={saving.status.kind === 'saved' ? saving.status.lastSavedAt : null}
        autosaveProblem={saving.status.kind === 'failed' ? 'FAILED' : saving.status.kind === 'fallback' ? 'emergency copy only' : null}
        floorLabel={floor ? `Floor ${floorNumber} of ${doc.floors.length}` : ''}
        toolLabel={`${ACTIONS.find((a) => a.tool === tool.id)?.label ?? tool.id} · ${tool.state}`}
        selectionCount={selection.length}
      />
    </div>
  )
}

/** The name of the element, slab, mass or floor with this id; the id when none has it. */
export function recordName(doc: Project, id: string): string {
  const groups = [doc.walls, doc.frameLines, doc.columns, doc.slabs, doc.pointMasses, doc.lineMasses] as readonly Readonly<Record<string, { readonly name?: string }>>[]
  for (const g of groups) {
    const name = g[id]?.name
    if (name) return name
  }
  return doc.floors.find((f) => f.id === id)?.name ?? id
}

/** Start-up document: the autosaved model when there is a valid one, else the demo building. */
export function initialProject(restored: Project | null): Project {
  return restored ?? demoProject()
}
