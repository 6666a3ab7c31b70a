/**
 * The inspector: every property of the selected record, in display units, with validation.
 * Changes go out as whole replacement records through `onReplace`; a refused change shows the
 * editor's message and the model stays as it was.
 */
import { useState } from 'react'
import type { ReactNode } from 'react'
import type {
  BaseRef,
  Column,
  FloorId,
  FrameLine,
  FrameStiffness,
  LineMass,
  MaterialId,
  Point,
  PointMass,
  Project,
  Slab,
  UnitSystem,
  Wall,
} from '@/model'
import { STIFFNESS_FACTOR_DEFAULTS } from '@/model'
import { findWallGroups } from '@/engine'
import { NumberField } from './NumberField'
import { formatQuantity } from './quantities'

export type InspectedKind = 'walls' | 'frameLines' | 'columns' | 'slabs' | 'lineMasses' | 'pointMasses'

interface Props {
  readonly project: Project
  readonly selection: readonly string[]
  readonly units: UnitSystem
  /** Replace a record; returns the refusal message or null. */
  readonly onReplace: (kind: InspectedKind, record: Wall | FrameLine | Column | Slab | LineMass | PointMass) => string | null
  readonly onDelete: () => void
  /** Copy (or move) the selection to span floors from `base` to `top`; returns a refusal or null. */
  readonly onCopyToFloors: (base: BaseRef, top: FloorId, move: boolean) => string | null
  readonly copyMessage: string | null
}

const POSITIVE = { min: 0, exclusiveMin: true } as const

/** A factor's label, saying when the value shown is the default (ACI 318-19 Table 6.6.3.1.1(a)). */
function factorLabel(label: string, value: number | undefined, fallback: number): string {
  return value === undefined ? `${label} (default ${fallback.toFixed(2)}, ACI 318-19)` : label
}

function kindOf(project: Project, id: string): InspectedKind | null {
  for (const k of ['walls', 'frameLines', 'columns', 'slabs', 'lineMasses', 'pointMasses'] as const) {
    if (project[k][id] !== undefined) return k
  }
  return null
}

const KIND_LABEL: Record<InspectedKind, string> = {
  walls: 'Wall',
  frameLines: 'Frame line',
  columns: 'Column',
  slabs: 'Slab',
  lineMasses: 'Line mass',
  pointMasses: 'Point mass',
}

export function Inspector(props: Props) {
  const { project, selection, units } = props
  if (selection.length === 0) {
    return (
      <section className="inspector" aria-label="Inspector" data-testid="inspector">
        <h2>Inspector</h2>
        <p className="muted">Select an element on the plan to see and edit its properties.</p>
      </section>
    )
  }
  const first = selection[0] as string
  const kind = selection.length === 1 ? kindOf(project, first) : null
  return (
    <section className="inspector" aria-label="Inspector" data-testid="inspector">
      <h2>Inspector</h2>
      {kind ? <Single {...props} id={first} kind={kind} /> : <p>{selection.length} elements selected.</p>}
      <div className="floor-tools">
        <button type="button" data-testid="inspector-delete" onClick={props.onDelete}>
          Delete
        </button>
      </div>
      <CopyToFloors project={project} onCopy={props.onCopyToFloors} message={props.copyMessage} units={units} />
    </section>
  )
}

function Single(props: Props & { id: string; kind: InspectedKind }) {
  const { project, units, kind, id } = props
  const record = project[kind][id]
  if (!record) return null
  const replace = (next: typeof record): string | null => props.onReplace(kind, next)
  const fields: ReactNode[] = []
  const num = (
    key: string,
    label: string,
    value: number,
    q: Parameters<typeof NumberField>[0]['kind'],
    apply: (v: number) => string | null,
    rule?: Parameters<typeof NumberField>[0]['rule'],
  ): void => {
    fields.push(
      <NumberField
        key={`${id}-${key}`}
        label={label}
        value={value}
        kind={q}
        units={units}
        testId={`field-${key}`}
        onCommit={apply}
        {...(rule ? { rule } : {})}
      />,
    )
  }
  const text = (key: string, label: string, value: string, apply: (v: string) => string | null): void => {
    fields.push(<TextField key={`${id}-${key}`} label={label} value={value} testId={`field-${key}`} onCommit={apply} />)
  }

  if ('name' in record && typeof record.name === 'string') {
    text('name', 'Name', record.name, (v) => replace({ ...record, name: v } as typeof record))
  }

  const segment = (r: Wall | FrameLine): void => {
    const set = (p1: Point, p2: Point): string | null => replace({ ...r, p1, p2 } as typeof record)
    num('p1x', 'Start x', r.p1.x, 'length', (v) => set({ ...r.p1, x: v }, r.p2))
    num('p1y', 'Start y', r.p1.y, 'length', (v) => set({ ...r.p1, y: v }, r.p2))
    num('p2x', 'End x', r.p2.x, 'length', (v) => set(r.p1, { ...r.p2, x: v }))
    num('p2y', 'End y', r.p2.y, 'length', (v) => set(r.p1, { ...r.p2, y: v }))
    const dx = r.p2.x - r.p1.x
    const dy = r.p2.y - r.p1.y
    const L = Math.hypot(dx, dy)
    const angle = Math.atan2(dy, dx)
    // Length stretches from the start point; angle turns about the midpoint.
    num('length', 'Length', L, 'length', (v) => set(r.p1, { x: r.p1.x + v * Math.cos(angle), y: r.p1.y + v * Math.sin(angle) }), POSITIVE)
    num('angle', 'Angle', angle, 'angle', (a) => {
      const mx = (r.p1.x + r.p2.x) / 2
      const my = (r.p1.y + r.p2.y) / 2
      const hx = (L / 2) * Math.cos(a)
      const hy = (L / 2) * Math.sin(a)
      return set({ x: mx - hx, y: my - hy }, { x: mx + hx, y: my + hy })
    })
  }

  const material = (value: MaterialId, apply: (m: MaterialId) => string | null): void => {
    fields.push(
      <SelectField
        key={`${id}-material`}
        label="Material"
        value={value}
        testId="field-material"
        options={Object.values(project.materials).map((m) => ({ value: m.id, label: `${m.name} (E ${formatQuantity(m.E, 'modulus', units)})` }))}
        onCommit={(v) => apply(v as MaterialId)}
      />,
    )
  }

  const range = (r: { base: BaseRef; top: FloorId }, apply: (base: BaseRef, top: FloorId) => string | null): void => {
    const floors = project.floors.map((f) => ({ value: f.id as string, label: f.name }))
    fields.push(
      <SelectField
        key={`${id}-base`}
        label="Stands on"
        value={r.base}
        testId="field-base"
        options={[{ value: 'ground', label: 'Ground (fixed base)' }, ...floors]}
        onCommit={(v) => apply(v as BaseRef, r.top)}
      />,
      <SelectField key={`${id}-top`} label="Up to" value={r.top} testId="field-top" options={floors} onCommit={(v) => apply(r.base, v as FloorId)} />,
    )
  }

  const lockField = (r: Wall | FrameLine): void => {
    fields.push(
      <SelectField
        key={`${id}-locked`}
        label="Balance assistant"
        value={r.locked === true ? 'locked' : 'free'}
        testId="field-locked"
        options={[
          { value: 'free', label: 'may change it' },
          { value: 'locked', label: 'keep it as it is (locked)' },
        ]}
        onCommit={(v) => replace({ ...r, locked: v === 'locked' ? true : undefined } as typeof r)}
      />,
    )
  }

  switch (kind) {
    case 'walls': {
      const w = record as Wall
      segment(w)
      num('thickness', 'Thickness', w.thickness, 'thickness', (v) => replace({ ...w, thickness: v }), POSITIVE)
      material(w.material, (m) => replace({ ...w, material: m }))
      num('flexureFactor', 'Flexure factor f_I', w.flexureFactor, 'ratio', (v) => replace({ ...w, flexureFactor: v }), POSITIVE)
      num('shearFactor', 'Shear factor f_A', w.shearFactor, 'ratio', (v) => replace({ ...w, shearFactor: v }), POSITIVE)
      range(w, (base, top) => replace({ ...w, base, top }))
      lockField(w)
      fields.push(
        <SelectField
          key={`${id}-joins`}
          label="Touching walls"
          value={w.joins ?? 'auto'}
          testId="field-joins"
          options={[
            { value: 'auto', label: 'join into one section' },
            { value: 'apart', label: 'keep this wall apart' },
          ]}
          onCommit={(v) => {
            // An absent key is not a change to the patch: clear the field explicitly (default auto).
            return replace({ ...w, joins: v === 'apart' ? 'apart' : undefined } as typeof w)
          }}
        />,
      )
      {
        const group = findWallGroups(project).groups.find((g) => g.wallIds.includes(w.id))
        const others = group ? group.wallIds.filter((o) => o !== w.id).map((o) => project.walls[o]?.name || o) : []
        fields.push(
          <p key={`${id}-group`} className="muted small" data-testid="wall-group">
            {others.length > 0
              ? `Acts with: ${others.join(', ')} (one section)`
              : w.joins === 'apart'
                ? 'Acts alone (kept apart from touching walls).'
                : 'Acts alone (touches no wall of the same floors and material).'}
          </p>,
        )
      }
      break
    }
    case 'frameLines': {
      const f = record as FrameLine
      segment(f)
      const s = f.stiffness
      const setS = (stiffness: FrameStiffness): string | null => replace({ ...f, stiffness })
      const firstMaterial = (Object.keys(project.materials)[0] ?? '') as MaterialId
      fields.push(
        <SelectField
          key={`${id}-skind`}
          label="Stiffness from"
          value={s.kind}
          testId="field-stiffnessKind"
          options={[
            { value: 'direct', label: 'story stiffness entered' },
            { value: 'moment', label: 'moment frame members' },
            { value: 'braced', label: 'braces' },
          ]}
          onCommit={(v) => {
            if (v === s.kind) return null
            if (v === 'direct') return setS({ kind: 'direct', storyStiffness: 5e7 })
            if (v === 'moment') return setS({ kind: 'moment', bays: 3, bayWidth: 6, columnI: 0.5 ** 4 / 12, beamI: 0.003, material: firstMaterial })
            return setS({ kind: 'braced', braces: 2, bayWidth: 6, braceArea: 0.005, material: firstMaterial })
          }}
        />,
      )
      if (s.kind === 'direct') {
        num('storyStiffness', 'Story stiffness', s.storyStiffness, 'stiffness', (v) => setS({ ...s, storyStiffness: v }), POSITIVE)
      } else if (s.kind === 'moment') {
        num('bays', 'Bays', s.bays, 'ratio', (v) => setS({ ...s, bays: v }), { min: 1, integer: true })
        num('bayWidth', 'Bay width', s.bayWidth, 'length', (v) => setS({ ...s, bayWidth: v }), POSITIVE)
        num('columnI', 'Column I', s.columnI, 'secondMoment', (v) => setS({ ...s, columnI: v }), POSITIVE)
        num('beamI', 'Beam I', s.beamI, 'secondMoment', (v) => setS({ ...s, beamI: v }), POSITIVE)
        material(s.material, (m) => setS({ ...s, material: m }))
        num('columnFactor', factorLabel('Column factor', s.columnFactor, STIFFNESS_FACTOR_DEFAULTS.frameColumn), s.columnFactor ?? STIFFNESS_FACTOR_DEFAULTS.frameColumn, 'ratio', (v) => setS({ ...s, columnFactor: v }), POSITIVE)
        num('beamFactor', factorLabel('Beam factor', s.beamFactor, STIFFNESS_FACTOR_DEFAULTS.frameBeam), s.beamFactor ?? STIFFNESS_FACTOR_DEFAULTS.frameBeam, 'ratio', (v) => setS({ ...s, beamFactor: v }), POSITIVE)
        fields.push(
          <SelectField
            key={`${id}-baseFixity`}
            label="Column feet"
            value={s.baseFixity ?? 'fixed'}
            testId="field-baseFixity"
            options={[
              { value: 'fixed', label: 'fixed' },
              { value: 'pinned', label: 'pinned' },
            ]}
            onCommit={(v) => setS({ ...s, baseFixity: v === 'pinned' ? 'pinned' : 'fixed' })}
          />,
        )
      } else {
        num('braces', 'Braces per story', s.braces, 'ratio', (v) => setS({ ...s, braces: v }), { min: 1, integer: true })
        num('bayWidth', 'Bay width', s.bayWidth, 'length', (v) => setS({ ...s, bayWidth: v }), POSITIVE)
        num('braceArea', 'Brace area', s.braceArea, 'sectionArea', (v) => setS({ ...s, braceArea: v }), POSITIVE)
        material(s.material, (m) => setS({ ...s, material: m }))
      }
      range(f, (base, top) => replace({ ...f, base, top }))
      lockField(f)
      break
    }
    case 'columns': {
      const c = record as Column
      num('atx', 'x', c.at.x, 'length', (v) => replace({ ...c, at: { ...c.at, x: v } }))
      num('aty', 'y', c.at.y, 'length', (v) => replace({ ...c, at: { ...c.at, y: v } }))
      num('angle', 'Angle', c.angle, 'angle', (v) => replace({ ...c, angle: v }))
      num('Ix', 'I about local x', c.Ix, 'secondMoment', (v) => replace({ ...c, Ix: v }), POSITIVE)
      num('Iy', 'I about local y', c.Iy, 'secondMoment', (v) => replace({ ...c, Iy: v }), POSITIVE)
      material(c.material, (m) => replace({ ...c, material: m }))
      fields.push(
        <SelectField
          key={`${id}-fixity`}
          label="Foot"
          value={c.fixity}
          testId="field-fixity"
          options={[
            { value: 'fixed', label: 'fixed' },
            { value: 'pinned', label: 'pinned (base story 3EI/h³)' },
          ]}
          onCommit={(v) => replace({ ...c, fixity: v === 'pinned' ? 'pinned' : 'fixed' })}
        />,
      )
      num('stiffnessFactor', factorLabel('Stiffness factor', c.stiffnessFactor, STIFFNESS_FACTOR_DEFAULTS.column), c.stiffnessFactor ?? STIFFNESS_FACTOR_DEFAULTS.column, 'ratio', (v) => replace({ ...c, stiffnessFactor: v }), POSITIVE)
      num('restraint', 'Slab restraint r (1 = fixed)', c.restraint ?? 1, 'ratio', (v) => replace({ ...c, restraint: v }), { min: 0, exclusiveMin: true, max: 1 })
      range(c, (base, top) => replace({ ...c, base, top }))
      break
    }
    case 'slabs': {
      const s = record as Slab
      num('areaMass', 'Area load', s.areaMass, 'areaMass', (v) => replace({ ...s, areaMass: v }), { min: 0 })
      fields.push(
        <p key="slabinfo" className="muted small">
          {s.outline.length} outline vertices, {s.openings.length} opening(s). Drag a vertex handle to reshape.
        </p>,
      )
      break
    }
    case 'lineMasses': {
      const m = record as LineMass
      num('massPerLength', 'Load per length', m.massPerLength, 'lineMass', (v) => replace({ ...m, massPerLength: v }), { min: 0 })
      break
    }
    case 'pointMasses': {
      const m = record as PointMass
      num('atx', 'x', m.at.x, 'length', (v) => replace({ ...m, at: { ...m.at, x: v } }))
      num('aty', 'y', m.at.y, 'length', (v) => replace({ ...m, at: { ...m.at, y: v } }))
      num('mass', 'Mass', m.mass, 'mass', (v) => replace({ ...m, mass: v }), POSITIVE)
      num('polarInertia', 'Own polar inertia', m.polarInertia ?? 0, 'rotaryInertia', (v) => replace({ ...m, polarInertia: v }), { min: 0 })
      break
    }
    default: {
      const never: never = kind
      throw new Error(`[ui] unknown kind ${String(never)}`)
    }
  }
  return (
    <div data-testid="inspector-fields" data-kind={kind}>
      <p className="kind">
        {KIND_LABEL[kind]} · {id}
      </p>
      {fields}
    </div>
  )
}

function TextField(props: { label: string; value: string; testId: string; onCommit: (v: string) => string | null }) {
  return <TextInput key={props.value} {...props} />
}

function TextInput({ label, value, testId, onCommit }: { label: string; value: string; testId: string; onCommit: (v: string) => string | null }) {
  const [error, setError] = useState<string | null>(null)
  return (
    <>
      <label className="field">
        <span>{label}</span>
        <input
          type="text"
          defaultValue={value}
          data-testid={testId}
          aria-invalid={error ? 'true' : 'false'}
          onBlur={(e) => {
            if (e.target.value !== value) setError(onCommit(e.target.value))
          }}
          onKeyDown={(e) => {
            if (e.key === 'Enter') (e.target as HTMLInputElement).blur()
          }}
        />
        <span className="unit" />
      </label>
      {error ? (
        <p className="error" role="alert">
          {error}
        </p>
      ) : null}
    </>
  )
}

function SelectField(props: {
  label: string
  value: string
  testId: string
  options: readonly { value: string; label: string }[]
  onCommit: (v: string) => string | null
}) {
  const [error, setError] = useState<string | null>(null)
  return (
    <>
      <label className="field">
        <span>{props.label}</span>
        <select value={props.value} data-testid={props.testId} onChange={(e) => setError(props.onCommit(e.target.value))}>
          {props.options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <span className="unit" />
      </label>
      {error ? (
        <p className="error" role="alert" data-testid={`${props.testId}-error`}>
          {error}
        </p>
      ) : null}
    </>
  )
}

function CopyToFloors(props: {
  project: Project
  units: UnitSystem
  message: string | null
  onCopy: (base: BaseRef, top: FloorId, move: boolean) => string | null
}) {
  const floors = props.project.floors
  const [state, setState] = useState<{ base: string; top: string }>({ base: 'ground', top: floors[floors.length - 1]?.id ?? '' })
  const [error, setError] = useState<string | null>(null)
  return (
    <div className="copy-range" data-testid="copy-range">
      <span>Span floors</span>
      <select aria-label="From" data-testid="copy-base" value={state.base} onChange={(e) => setState({ ...state, base: e.target.value })}>
        <option value="ground">ground</option>
        {floors.map((f) => (
          <option key={f.id} value={f.id}>
            above {f.name}
          </option>
        ))}
      </select>
      <select aria-label="To" data-testid="copy-top" value={state.top} onChange={(e) => setState({ ...state, top: e.target.value })}>
        {floors.map((f) => (
          <option key={f.id} value={f.id}>
            up to {f.name}
          </option>
        ))}
      </select>
      <button type="button" data-testid="copy-to-floors" onClick={() => setError(props.onCopy(state.base as BaseRef, state.top as FloorId, false))}>
        Copy
      </button>
      <button type="button" data-testid="move-to-floors" onClick={() => setError(props.onCopy(state.base as BaseRef, state.top as FloorId, true))}>
        Move
      </button>
      {error || props.message ? (
        <p className="error" role="alert" data-testid="copy-error">
          {error ?? props.message}
        </p>
      ) : null}
    </div>
  )
}
