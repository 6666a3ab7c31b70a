/** The floor stack: name, elevation and story height of every floor, top first; edit the current one. */
import { useState } from 'react'
import { computeElevations } from '@/model'
import type { Floor, FloorId, UnitSystem } from '@/model'
import { NumberField } from './NumberField'
import { formatQuantity } from './quantities'

export interface FloorActions {
  /** Each returns the refusal message, or null when done. */
  add(): string | null
  remove(floor: FloorId): string | null
  duplicate(floor: FloorId): string | null
  rename(floor: FloorId, name: string): string | null
  setHeight(floor: FloorId, height: number): string | null
  link(floor: FloorId, source: FloorId): string | null
  unlink(floor: FloorId): string | null
}

interface Props {
  readonly floors: readonly Floor[]
  readonly current: FloorId | null
  readonly units: UnitSystem
  readonly onSelect: (floor: FloorId) => void
  readonly actions: FloorActions
}

export function FloorStack({ floors, current, units, onSelect, actions }: Props) {
  const project = { floors }
  const [message, setMessage] = useState<string | null>(null)
  const z = computeElevations(project)
  const floor = project.floors.find((f) => f.id === current) ?? null
  const run = (fn: () => string | null): void => setMessage(fn())
  return (
    <section className="floor-stack" aria-label="Floors" data-testid="floor-stack">
      <h2>Floors</h2>
      <ol>
        {project.floors.map((f, i) => (
          <li
            key={f.id}
            className={`floor-row${f.id === current ? ' current' : ''}`}
            data-testid={`floor-${i + 1}`}
            data-floor-id={f.id}
            aria-current={f.id === current ? 'true' : undefined}
            onClick={() => onSelect(f.id)}
          >
            <span className="floor-name">{f.name}</span>
            {f.typicalOf ? (
              <span className="link" title="Typical floor: slabs and masses follow the named floor">
                = {project.floors.find((g) => g.id === f.typicalOf)?.name ?? f.typicalOf}
              </span>
            ) : (
              <span />
            )}
            <span className="floor-meta">
              z {formatQuantity(z[i] ?? 0, 'elevation', units)} · h {formatQuantity(f.height, 'elevation', units)}
            </span>
          </li>
        ))}
      </ol>
      <div className="floor-tools">
        <button type="button" data-testid="floor-add" onClick={() => run(actions.add)}>
          Add on top
        </button>
        <button type="button" data-testid="floor-duplicate" disabled={!floor} onClick={() => floor && run(() => actions.duplicate(floor.id))}>
          Duplicate
        </button>
        <button
          type="button"
          data-testid="floor-remove"
          disabled={!floor || project.floors.length <= 1}
          onClick={() => floor && run(() => actions.remove(floor.id))}
        >
          Remove
        </button>
      </div>
      {floor ? (
        <div className="floor-edit" data-testid="floor-edit">
          <label htmlFor="floor-name-input">Name</label>
          <input
            id="floor-name-input"
            key={`${floor.id}-${floor.name}`}
            type="text"
            data-testid="floor-name"
            defaultValue={floor.name}
            onBlur={(e) => {
              if (e.target.value !== floor.name) run(() => actions.rename(floor.id, e.target.value))
            }}
            onKeyDown={(e) => {
              if (e.key === 'Enter') (e.target as HTMLInputElement).blur()
            }}
          />
          <div style={{ gridColumn: '1 / -1' }} className="inspector">
            <NumberField
              key={floor.id}
              label="Story height"
              value={floor.height}
              kind="elevation"
              units={units}
              rule={{ min: 0, exclusiveMin: true }}
              testId="floor-height"
              onCommit={(h) => actions.setHeight(floor.id, h)}
            />
          </div>
          <label htmlFor="floor-link-input">Typical of</label>
          <select
            id="floor-link-input"
            data-testid="floor-link"
            value={floor.typicalOf ?? ''}
            onChange={(e) => {
              const v = e.target.value
              run(() => (v === '' ? actions.unlink(floor.id) : actions.link(floor.id, v as FloorId)))
            }}
          >
            <option value="">— own slabs and masses —</option>
            {project.floors
              .filter((g) => g.id !== floor.id)
              .map((g) => (
                <option key={g.id} value={g.id}>
                  {g.name}
                </option>
              ))}
          </select>
        </div>
      ) : null}
      {message ? (
        <p className="message-error" role="alert" data-testid="floor-message">
          {message}
        </p>
      ) : null}
    </section>
  )
}
