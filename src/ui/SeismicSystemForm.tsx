/**
 * A compact form for the seismic system per direction (settings.seismicDesign): the design rules
 * (none, ASCE/SEI 7-16 or EN 1998-1), risk category or importance class, a preset or free values per
 * direction, and the torsional flexibility limit. Every change is one setAnalysisSettings command
 * (one undo step); a refused value stays in its box with the command's message. When the last
 * analysis has design numbers, the base shear per direction is shown with the caution.
 */
import { useState } from 'react'
import { bail, execute, mark } from '@/editor'
import type { EditorStore } from '@/editor'
import type { AnalysisResult } from '@/engine'
import {
  ASCE7_SYSTEM_PRESETS,
  DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT,
  EN1998_SYSTEM_PRESETS,
  formatNumber,
  formatQuantity,
} from '@/model'
import type {
  AnalysisSettings,
  Asce7SeismicDesign,
  Asce7System,
  En1998SeismicDesign,
  En1998System,
  SeismicDesign,
  UnitSystem,
} from '@/model'
import { useEditor } from './hooks/useEditor'
import './seismicForm.css'

export interface SeismicSystemFormProps {
  readonly store: EditorStore
  readonly result: AnalysisResult | null
  readonly units: UnitSystem
}

const FREE = ''

function defaultDesign(code: SeismicDesign['code']): SeismicDesign {
  if (code === 'asce7-16') {
    const p = ASCE7_SYSTEM_PRESETS[1] ?? ASCE7_SYSTEM_PRESETS[0]!
    const system: Asce7System = { preset: p.id, ...p.values }
    return { code, riskCategory: 'II', systemX: system, systemY: system }
  }
  const p = EN1998_SYSTEM_PRESETS[1] ?? EN1998_SYSTEM_PRESETS[0]!
  const system: En1998System = { preset: p.id, ...p.values }
  return { code, importanceClass: 'II', systemX: system, systemY: system }
}

/** A plain number box (no units) that commits on Enter or blur; a refused value stays with the message. */
export function NumberBox(props: {
  readonly label: string
  readonly value: number
  readonly testId: string
  readonly onCommit: (v: number) => string | null
}) {
  const shown = formatNumber(props.value, 4)
  const [text, setText] = useState(shown)
  const [prev, setPrev] = useState(shown)
  const [error, setError] = useState<string | null>(null)
  if (prev !== shown) {
    setPrev(shown)
    setText(shown)
    setError(null)
  }
  const commit = (): void => {
    if (text === shown) return
    const v = Number(text.trim())
    if (text.trim() === '' || !Number.isFinite(v)) {
      setError(`${props.label}: must be a number, got "${text}"`)
      return
    }
    setError(props.onCommit(v))
  }
  return (
    <label className="field gx-seismic-field">
      <span>{props.label}</span>
      <input
        type="text"
        inputMode="decimal"
        value={text}
        aria-invalid={error ? 'true' : 'false'}
        data-testid={props.testId}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit()
          if (e.key === 'Escape') {
            setText(shown)
            setError(null)
          }
        }}
      />
      {error ? <small className="error" role="alert">{error}</small> : null}
    </label>
  )
}

export function Choice<T extends string>(props: {
  readonly label: string
  readonly value: T
  readonly options: readonly (readonly [T, string])[]
  readonly testId: string
  readonly onChange: (v: T) => void
}) {
  return (
    <label className="field gx-seismic-field">
      <span>{props.label}</span>
      <select value={props.value} data-testid={props.testId} onChange={(e) => props.onChange(e.target.value as T)}>
        {props.options.map(([v, text]) => (
          <option key={v} value={v}>
            {text}
          </option>
        ))}
      </select>
    </label>
  )
}

const CATEGORIES = [
  ['I', 'I'],
  ['II', 'II'],
  ['III', 'III'],
  ['IV', 'IV'],
] as const

/** The form; reads the settings from the store and writes them back through one command. */
export function SeismicSystemForm({ store, result, units }: SeismicSystemFormProps) {
  const settings = useEditor(store, (s) => s.doc.settings)
  const [message, setMessage] = useState<string | null>(null)
  // A number box shows its own refusal; choices show theirs below the form.
  const apply = (patch: Partial<AnalysisSettings> | { seismicDesign: undefined }, fromBox: boolean): string | null => {
    // Its own undo step: a mark before the command (removed again when it is refused).
    const id = mark(store, 'seismic system')
    const r = execute(store, 'setAnalysisSettings', { patch })
    if (!r.ok) bail(store, id)
    const msg = r.ok ? null : r.message
    setMessage(fromBox ? null : msg)
    return msg
  }
  return (
    <SeismicSystemFormView
      settings={settings}
      result={result}
      units={units}
      message={message}
      onDesign={(d, fromBox) => apply({ seismicDesign: d } as Partial<AnalysisSettings>, fromBox === true)}
      onLimit={(v) => apply({ torsionalFlexibilityLimit: v }, true)}
    />
  )
}

export interface SeismicSystemFormViewProps {
  readonly settings: AnalysisSettings
  readonly result: AnalysisResult | null
  readonly units: UnitSystem
  readonly message: string | null
  /** Set (or clear with undefined) settings.seismicDesign; returns a refusal message or null. */
  readonly onDesign: (d: SeismicDesign | undefined, fromBox?: boolean) => string | null
  readonly onLimit: (v: number) => string | null
}

/** The form's markup for given settings (pure; tested with react-dom/server). */
export function SeismicSystemFormView({ settings, result, units, message, onDesign, onLimit }: SeismicSystemFormViewProps) {
  const d = settings.seismicDesign
  const code = d?.code ?? 'none'
  const design = result?.design ?? null
  return (
    <details className="gx-panel gx-seismic" data-testid="seismic-form">
      <summary>{`Seismic system${d ? ` (${d.code === 'asce7-16' ? 'ASCE/SEI 7-16' : 'EN 1998-1'})` : ': not set'}`}</summary>
      <Choice
        label="Design rules"
        value={code}
        testId="seismic-code"
        options={[
          ['none', 'none (elastic, R = 1)'],
          ['asce7-16', 'ASCE/SEI 7-16'],
          ['en1998-1', 'EN 1998-1'],
        ]}
        onChange={(v) => onDesign(v === 'none' ? undefined : v === code ? d : defaultDesign(v))}
      />
      {d?.code === 'asce7-16' ? <AsceFields design={d} onDesign={onDesign} /> : null}
      {d?.code === 'en1998-1' ? <EnFields design={d} onDesign={onDesign} /> : null}
      <NumberBox
        label="Torsional flexibility limit (T torsion / T translation)"
        value={settings.torsionalFlexibilityLimit ?? DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT}
        testId="seismic-flex-limit"
        onCommit={onLimit}
      />
      {message ? (
        <p className="error" role="alert">
          {message}
        </p>
      ) : null}
      {design ? (
        <div className="gx-summary" data-testid="seismic-result">
          {[design.x, design.y].map((e) => (
            <p key={e.direction}>
              {e.direction.toUpperCase()}: T used {formatNumber(e.periodUsed, 3)} s ({e.periodReason});{' '}
              {design.code === 'asce7-16' ? 'Cs' : 'Sd'} {formatNumber(e.coefficient, 3)}; V {formatQuantity(e.baseShear, 'force', units)}
            </p>
          ))}
        </div>
      ) : null}
    </details>
  )
}

function presetOptions(list: readonly { id: string; name: string }[]): readonly (readonly [string, string])[] {
  return [[FREE, 'values entered below'], ...list.map((p) => [p.id, p.name] as const)]
}

function AsceFields({ design, onDesign }: { design: Asce7SeismicDesign; onDesign: (d: SeismicDesign, fromBox?: boolean) => string | null }) {
  const system = (key: 'systemX' | 'systemY', label: string) => {
    const s = design[key]
    const set = (next: Asce7System, fromBox = false): string | null => onDesign({ ...design, [key]: next }, fromBox)
    const field = (f: 'R' | 'Cd' | 'Omega0' | 'Ct' | 'x', text: string) => (
      <NumberBox
        key={f}
        label={text}
        value={s[f]}
        testId={`seismic-${key}-${f}`}
        onCommit={(v) => {
          const { preset: _drop, ...rest } = s
          return set({ ...rest, [f]: v }, true)
        }}
      />
    )
    return (
      <fieldset className="gx-seismic-dir">
        <legend>{label}</legend>
        <Choice
          label="System"
          value={s.preset ?? FREE}
          testId={`seismic-${key}-preset`}
          options={presetOptions(ASCE7_SYSTEM_PRESETS)}
          onChange={(id) => {
            const p = ASCE7_SYSTEM_PRESETS.find((x) => x.id === id)
            if (p) set({ preset: p.id, ...p.values })
          }}
        />
        {field('R', 'R')}
        {field('Cd', 'Cd')}
        {field('Omega0', 'Ω0')}
        {field('Ct', 'Ct (hn in m)')}
        {field('x', 'x')}
      </fieldset>
    )
  }
  return (
    <>
      <Choice label="Risk category" value={design.riskCategory} testId="seismic-risk" options={CATEGORIES} onChange={(v) => onDesign({ ...design, riskCategory: v })} />
      <Choice
        label="Seismic design category"
        value={design.designCategory ?? FREE}
        testId="seismic-sdc"
        options={[[FREE, 'not set'], ['A', 'A'], ['B', 'B'], ['C', 'C'], ['D', 'D'], ['E', 'E'], ['F', 'F']]}
        onChange={(v) => {
          const { designCategory: _drop, ...rest } = design
          onDesign(v === FREE ? rest : { ...rest, designCategory: v })
        }}
      />
      {system('systemX', 'Along X')}
      {system('systemY', 'Along Y')}
      <p className="gx-muted">Preset values are from memory until checked against the standard's tables.</p>
    </>
  )
}

function EnFields({ design, onDesign }: { design: En1998SeismicDesign; onDesign: (d: SeismicDesign, fromBox?: boolean) => string | null }) {
  const system = (key: 'systemX' | 'systemY', label: string) => {
    const s = design[key]
    return (
      <fieldset className="gx-seismic-dir">
        <legend>{label}</legend>
        <Choice
          label="System"
          value={s.preset ?? FREE}
          testId={`seismic-${key}-preset`}
          options={presetOptions(EN1998_SYSTEM_PRESETS)}
          onChange={(id) => {
            const p = EN1998_SYSTEM_PRESETS.find((x) => x.id === id)
            if (p) onDesign({ ...design, [key]: { preset: p.id, ...p.values } })
          }}
        />
        <NumberBox label="q" value={s.q} testId={`seismic-${key}-q`} onCommit={(v) => onDesign({ ...design, [key]: { q: v } }, true)} />
      </fieldset>
    )
  }
  return (
    <>
      <Choice label="Importance class" value={design.importanceClass} testId="seismic-class" options={CATEGORIES} onChange={(v) => onDesign({ ...design, importanceClass: v })} />
      <Choice
        label="Non-structural elements"
        value={design.nonStructural ?? 'brittle'}
        testId="seismic-nonstructural"
        options={[
          ['brittle', 'brittle, attached (0.005 h)'],
          ['ductile', 'ductile (0.0075 h)'],
          ['none', 'not interfering (0.010 h)'],
        ]}
        onChange={(v) => onDesign({ ...design, nonStructural: v })}
      />
      {system('systemX', 'Along X')}
      {system('systemY', 'Along Y')}
      <p className="gx-muted">Preset values are from memory until checked against the standard's tables.</p>
    </>
  )
}
