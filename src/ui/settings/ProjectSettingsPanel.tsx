/**
 * The project settings panel (side slot, collapsible): project name, criterion set, accidental
 * eccentricity, damping, direction combination, spectrum modes rule, the design spectrum (ASCE 7 shape,
 * EN 1998-1 Type 1 or a period/Sa table), the plan grid lines, and snapping. Every document change is
 * one editor command (one undo step); a refused value stays in its box with the command's path-naming
 * message and the model keeps its value. Snapping is an editor preference kept in localStorage.
 */
import { useEffect, useState } from 'react'
import { bail, execute, mark, setSnapping } from '@/editor'
import type { CommandArgs, CommandName, EditorStore } from '@/editor'
import { BUILT_IN_CRITERION_SETS } from '@/engine'
import type { AnalysisSettings, Grid, Material, SpectrumSpec, UnitSystem } from '@/model'
import { NumberField } from '../NumberField'
import { Choice, NumberBox } from '../SeismicSystemForm'
import { useEditor } from '../hooks/useEditor'
import {
  SNAP_STORAGE_KEY,
  addGridLine,
  addTableRow,
  changeGridLine,
  parseStoredSnap,
  removeGridLine,
  removeTableRow,
  setTableRow,
  spectrumOfKind,
} from './settingsEdit'
import type { GridAxis, SnapPreferences } from './settingsEdit'
import '../seismicForm.css'
import './settings.css'

export interface ProjectSettingsPanelProps {
  readonly store: EditorStore
  readonly units: UnitSystem
}

/** A text box that commits on Enter or blur; a refused text stays with the message. */
function TextBox(props: { readonly label: string; readonly value: string; readonly testId: string; readonly onCommit: (v: string) => string | null }) {
  const [text, setText] = useState(props.value)
  const [prev, setPrev] = useState(props.value)
  const [error, setError] = useState<string | null>(null)
  if (prev !== props.value) {
    setPrev(props.value)
    setText(props.value)
    setError(null)
  }
  const commit = (): void => {
    if (text === props.value) return setError(null)
    setError(props.onCommit(text))
  }
  return (
    <label className="field gx-seismic-field">
      <span>{props.label}</span>
      <input
        type="text"
        value={text}
        aria-invalid={error ? 'true' : 'false'}
        data-testid={props.testId}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit()
          if (e.key === 'Escape') {
            setText(props.value)
            setError(null)
          }
        }}
      />
      {error ? <small className="error" role="alert">{error}</small> : null}
    </label>
  )
}

/** Starting values of a new material, to overwrite (E 30 GPa, ν 0.2: a normal-weight concrete, from memory). */
const NEW_MATERIAL = { E: 30e9, nu: 0.2 } as const

function readStoredSnap(): Partial<SnapPreferences> {
  try {
    return parseStoredSnap(localStorage.getItem(SNAP_STORAGE_KEY))
  } catch (_err) {
    return {}
  }
}

function writeStoredSnap(p: SnapPreferences): void {
  try {
    localStorage.setItem(SNAP_STORAGE_KEY, JSON.stringify(p))
  } catch (_err) {
    // Storage unavailable: the preference lasts for this session only.
  }
}

/**
 * Run one command as its own undo step (a mark before it, so it never merges with the previous
 * change); a refusal removes the mark again. Returns the refusal message or null.
 */
function runStep<N extends CommandName>(store: EditorStore, label: string, name: N, args: CommandArgs<N>): string | null {
  const id = mark(store, label)
  const r = execute(store, name, args)
  if (r.ok) return null
  bail(store, id)
  return r.message
}

/** The panel; reads the document and snap settings from the store and writes through commands. */
export function ProjectSettingsPanel({ store, units }: ProjectSettingsPanelProps) {
  const name = useEditor(store, (s) => s.doc.name)
  const settings = useEditor(store, (s) => s.doc.settings)
  const grid = useEditor(store, (s) => s.doc.grid)
  const snapping = useEditor(store, (s) => s.snapping)
  const materials = useEditor(store, (s) => s.doc.materials)
  const [materialMessage, setMaterialMessage] = useState<string | null>(null)
  useEffect(() => {
    const stored = readStoredSnap()
    if (Object.keys(stored).length > 0) setSnapping(store, stored)
  }, [store])

  const settingsPatch = (patch: Partial<AnalysisSettings> | Record<string, undefined>): string | null => {
    return runStep(store, 'change settings', 'setAnalysisSettings', { patch: patch as Partial<AnalysisSettings> })
  }
  const [choiceMessage, setChoiceMessage] = useState<string | null>(null)
  const choose = (patch: Partial<AnalysisSettings> | Record<string, undefined>): void => setChoiceMessage(settingsPatch(patch))
  const setGrid = (g: Grid | undefined): string | null => {
    return runStep(store, 'change grid', 'setGrid', { grid: g })
  }
  const [gridMessage, setGridMessage] = useState<string | null>(null)

  const ownSets = settings.criterionSets ?? []
  const setOptions: (readonly [string, string])[] = [
    ['none', 'none (numbers only)'],
    ...BUILT_IN_CRITERION_SETS.map((s) => [s.spec.id, s.spec.name] as const),
    ...ownSets.map((s) => [s.id, `${s.name} (this project)`] as const),
  ]
  if (settings.criterionSet !== '' && !setOptions.some(([id]) => id === settings.criterionSet)) setOptions.push([settings.criterionSet, `${settings.criterionSet} (unknown)`])

  const snapPref = (patch: Partial<SnapPreferences>): void => {
    setSnapping(store, patch)
    const s = store.getState().snapping
    writeStoredSnap({ enabled: s.enabled, grid: s.grid, elements: s.elements, midpoints: s.midpoints, vertices: s.vertices })
  }

  return (
    <details className="gx-panel gx-seismic gx-settings" data-testid="project-settings">
      <summary>Project settings</summary>
      <TextBox label="Project name" value={name} testId="settings-name" onCommit={(v) => runStep(store, 'rename project', 'renameProject', { name: v })} />
      <Choice label="Criterion set" value={settings.criterionSet === '' ? 'none' : settings.criterionSet} testId="settings-criterion-set" options={setOptions} onChange={(v) => choose({ criterionSet: v })} />
      <NumberBox
        label="Accidental eccentricity (fraction of plan width)"
        value={settings.accidentalEccentricity}
        testId="settings-eccentricity"
        onCommit={(v) => settingsPatch({ accidentalEccentricity: v })}
      />
      <NumberBox label="Damping ratio" value={settings.damping} testId="settings-damping" onCommit={(v) => settingsPatch({ damping: v })} />
      <Choice
        label="Two directions combined by"
        value={settings.directionCombination}
        testId="settings-direction-combination"
        options={[
          ['srss', 'SRSS'],
          ['100-30', '100% + 30%'],
        ]}
        onChange={(v) => choose({ directionCombination: v })}
      />
      <Choice
        label="Spectrum modes"
        value={settings.spectrumModes ?? 'full-mass'}
        testId="settings-spectrum-modes"
        options={[
          ['full-mass', 'all modes ≥ 0.05 s + residual mass'],
          ['ninety-percent', 'lowest modes to 90% mass'],
        ]}
        onChange={(v) => choose({ spectrumModes: v })}
      />
      {choiceMessage ? <p className="error" role="alert">{choiceMessage}</p> : null}
      <SpectrumFields spectrum={settings.spectrum} onSpectrum={(s) => settingsPatch({ spectrum: s })} />
      <fieldset className="gx-seismic-dir" data-testid="settings-grid">
        <legend>Grid lines</legend>
        {grid ? (
          (['x', 'y'] as const).map((axis) => (
            <GridAxisRows
              key={axis}
              axis={axis}
              grid={grid}
              units={units}
              onGrid={setGrid}
              onRemove={(i) => setGridMessage(setGrid(removeGridLine(grid, axis, i)))}
            />
          ))
        ) : (
          <p className="gx-muted">No grid.</p>
        )}
        <div className="gx-settings-buttons">
          <button type="button" data-testid="settings-grid-add-x" onClick={() => setGridMessage(setGrid(addGridLine(grid, 'x')))}>
            + line across X
          </button>
          <button type="button" data-testid="settings-grid-add-y" onClick={() => setGridMessage(setGrid(addGridLine(grid, 'y')))}>
            + line across Y
          </button>
        </div>
        {gridMessage ? <p className="error" role="alert">{gridMessage}</p> : null}
      </fieldset>
      <fieldset className="gx-seismic-dir" data-testid="settings-materials">
        <legend>Materials</legend>
        {Object.values(materials).map((m: Material) => (
          <div key={m.id} className="gx-settings-material" data-testid={`settings-material-${m.id}`}>
            <TextBox label="Name" value={m.name} testId={`settings-material-${m.id}-name`} onCommit={(v) => runStep(store, 'rename material', 'updateMaterial', { id: m.id, patch: { name: v } })} />
            <NumberField
              label={`E of ${m.name}`}
              value={m.E}
              kind="modulus"
              units={units}
              testId={`settings-material-${m.id}-E`}
              onCommit={(v) => runStep(store, 'change material', 'updateMaterial', { id: m.id, patch: { E: v } })}
            />
            <NumberBox label="ν" value={m.nu} testId={`settings-material-${m.id}-nu`} onCommit={(v) => runStep(store, 'change material', 'updateMaterial', { id: m.id, patch: { nu: v } })} />
            <button
              type="button"
              data-testid={`settings-material-${m.id}-remove`}
              onClick={() => setMaterialMessage(runStep(store, 'remove material', 'deleteElements', { ids: [m.id] }))}
            >
              Remove {m.name}
            </button>
          </div>
        ))}
        <button
          type="button"
          data-testid="settings-material-add"
          onClick={() =>
            setMaterialMessage(
              runStep(store, 'add material', 'addMaterial', { name: `Material ${Object.keys(materials).length + 1}`, E: NEW_MATERIAL.E, nu: NEW_MATERIAL.nu }),
            )
          }
        >
          + material
        </button>
        {materialMessage ? <p className="error" role="alert">{materialMessage}</p> : null}
      </fieldset>
      <fieldset className="gx-seismic-dir" data-testid="settings-snap">
        <legend>Snapping (this browser)</legend>
        {(
          [
            ['enabled', 'Snap at all'],
            ['grid', 'to grid lines and crossings'],
            ['elements', 'to element ends and slab corners'],
            ['midpoints', 'to midpoints'],
            ['vertices', 'to slab vertices'],
          ] as const
        ).map(([key, text]) => (
          <label key={key} className="gx-settings-check">
            <input type="checkbox" data-testid={`settings-snap-${key}`} checked={snapping[key]} onChange={(e) => snapPref({ [key]: e.target.checked })} />{' '}
            {text}
          </label>
        ))}
      </fieldset>
    </details>
  )
}

function GridAxisRows(props: {
  readonly axis: GridAxis
  readonly grid: Grid
  readonly units: UnitSystem
  readonly onGrid: (g: Grid) => string | null
  readonly onRemove: (index: number) => void
}) {
  const { axis, grid, units, onGrid, onRemove } = props
  const lines = grid[axis]
  return (
    <div className="gx-settings-grid-axis">
      <p className="gx-muted">{axis === 'x' ? 'Lines of constant x' : 'Lines of constant y'}</p>
      {lines.map((l, i) => (
        <div className="gx-settings-row" key={`${axis}-${i}`} data-testid={`settings-grid-${axis}-${i}`}>
          <TextBox label="Name" value={l.label} testId={`settings-grid-${axis}-${i}-label`} onCommit={(v) => onGrid(changeGridLine(grid, axis, i, { label: v }))} />
          <div className="gx-settings-at">
            <NumberField
              label={`${axis} at`}
              value={l.at}
              kind="length"
              units={units}
              testId={`settings-grid-${axis}-${i}-at`}
              onCommit={(v) => onGrid(changeGridLine(grid, axis, i, { at: v }))}
            />
          </div>
          <button type="button" data-testid={`settings-grid-${axis}-${i}-remove`} aria-label={`Remove grid line ${l.label}`} title={`Remove grid line ${l.label}`} onClick={() => onRemove(i)}>
            ×
          </button>
        </div>
      ))}
    </div>
  )
}

function SpectrumFields({ spectrum, onSpectrum }: { readonly spectrum: SpectrumSpec; readonly onSpectrum: (s: SpectrumSpec) => string | null }) {
  const [message, setMessage] = useState<string | null>(null)
  return (
    <fieldset className="gx-seismic-dir" data-testid="settings-spectrum">
      <legend>Design spectrum</legend>
      <Choice
        label="Shape"
        value={spectrum.kind}
        testId="settings-spectrum-kind"
        options={[
          ['asce7', 'ASCE/SEI 7-16 (SDS, SD1, TL)'],
          ['en1998-1', 'EN 1998-1 Type 1 (ag, ground)'],
          ['table', 'table of period / Sa'],
        ]}
        onChange={(k) => setMessage(onSpectrum(spectrumOfKind(spectrum, k)))}
      />
      {spectrum.kind === 'asce7' ? (
        <>
          <NumberBox label="SDS (g)" value={spectrum.SDS} testId="settings-spectrum-SDS" onCommit={(v) => onSpectrum({ ...spectrum, SDS: v })} />
          <NumberBox label="SD1 (g)" value={spectrum.SD1} testId="settings-spectrum-SD1" onCommit={(v) => onSpectrum({ ...spectrum, SD1: v })} />
          <NumberBox label="TL (s)" value={spectrum.TL} testId="settings-spectrum-TL" onCommit={(v) => onSpectrum({ ...spectrum, TL: v })} />
          <OptionalNumber
            label="S1 (g), optional"
            value={spectrum.S1}
            testId="settings-spectrum-S1"
            onCommit={(v) => {
              const { S1: _drop, ...rest } = spectrum
              return onSpectrum(v === undefined ? rest : { ...rest, S1: v })
            }}
          />
        </>
      ) : null}
      {spectrum.kind === 'en1998-1' ? (
        <>
          <NumberBox label="ag (g)" value={spectrum.ag} testId="settings-spectrum-ag" onCommit={(v) => onSpectrum({ ...spectrum, ag: v })} />
          <Choice
            label="Ground type"
            value={spectrum.ground}
            testId="settings-spectrum-ground"
            options={(['A', 'B', 'C', 'D', 'E'] as const).map((g) => [g, g] as const)}
            onChange={(g) => setMessage(onSpectrum({ ...spectrum, ground: g }))}
          />
        </>
      ) : null}
      {spectrum.kind === 'table' ? (
        <div data-testid="settings-spectrum-table">
          {spectrum.points.map(([T, Sa], i) => (
            <div className="gx-settings-row" key={i}>
              <NumberBox label="T (s)" value={T} testId={`settings-spectrum-T-${i}`} onCommit={(v) => onSpectrum({ kind: 'table', points: setTableRow(spectrum.points, i, [v, Sa]) })} />
              <NumberBox label="Sa (g)" value={Sa} testId={`settings-spectrum-Sa-${i}`} onCommit={(v) => onSpectrum({ kind: 'table', points: setTableRow(spectrum.points, i, [T, v]) })} />
              <button
                type="button"
                aria-label={`Remove row ${i + 1}`}
                data-testid={`settings-spectrum-remove-${i}`}
                onClick={() => setMessage(onSpectrum({ kind: 'table', points: removeTableRow(spectrum.points, i) }))}
              >
                ×
              </button>
            </div>
          ))}
          <button type="button" data-testid="settings-spectrum-add-row" onClick={() => setMessage(onSpectrum({ kind: 'table', points: addTableRow(spectrum.points) }))}>
            + row
          </button>
        </div>
      ) : null}
      {message ? <p className="error" role="alert">{message}</p> : null}
    </fieldset>
  )
}

/** A number box where an empty entry clears the value. */
function OptionalNumber(props: { readonly label: string; readonly value: number | undefined; readonly testId: string; readonly onCommit: (v: number | undefined) => string | null }) {
  return (
    <TextBox
      label={props.label}
      value={props.value === undefined ? '' : String(props.value)}
      testId={props.testId}
      onCommit={(t) => {
        if (t.trim() === '') return props.onCommit(undefined)
        const v = Number(t.trim())
        if (!Number.isFinite(v)) return `${props.label}: must be a number or empty, got "${t}"`
        return props.onCommit(v)
      }}
    />
  )
}
