import { useState } from 'react'
import type { UnitSystem } from '@/model'
import { formatNumber, implausibility, parseDisplayInput, unitSymbol } from './quantities'
import type { FieldRule, QuantityKind } from './quantities'

interface Props {
  readonly label: string
  /** SI value. */
  readonly value: number
  readonly kind: QuantityKind
  readonly units: UnitSystem
  readonly rule?: FieldRule
  readonly testId: string
  /** Apply the SI value; return a refusal message to show, or null when accepted. */
  readonly onCommit: (value: number) => string | null
  readonly disabled?: boolean
}

/**
 * A number in display units, or with its own length unit ("300 mm", "1'-6\""), converted to the box.
 * Commits on Enter or leaving the field; Escape restores the model value. A value outside the usual
 * range of the box (e.g. a wall 0.25 mm thick) is asked about once before it is taken.
 * A refused value stays in the box, marked, with the message below; the model is not touched.
 */
export function NumberField({ label, value, kind, units, rule, testId, onCommit, disabled }: Props) {
  const shown = formatNumber(value, kind, units)
  const [text, setText] = useState(shown)
  const [error, setError] = useState<string | null>(null)
  // An unusual value is asked about once: the same text committed again is taken.
  const [warning, setWarning] = useState<{ text: string; message: string } | null>(null)
  // A new model value or unit resets the box during render (no stale frame in between).
  const [prevShown, setPrevShown] = useState(shown)
  if (prevShown !== shown) {
    setPrevShown(shown)
    setText(shown)
    setError(null)
    setWarning(null)
  }

  const commit = (): void => {
    if (text === shown) {
      setError(null)
      return
    }
    const parsed = parseDisplayInput(text, label, kind, units, rule)
    if (!parsed.ok) {
      setError(parsed.message)
      return
    }
    const unusual = implausibility(parsed.value, kind, units)
    if (unusual && warning?.text !== text) {
      setError(null)
      setWarning({ text, message: `${label}: ${unusual}. Press Enter again to keep it.` })
      return
    }
    setWarning(null)
    const refusal = onCommit(parsed.value)
    setError(refusal ? `${label}: ${refusal.replace(/^[^:]*:\s*/, '')}` : null)
  }
  const symbol = unitSymbol(kind, units)
  return (
    <>
      <label className="field">
        <span>{label}</span>
        <input
          type="text"
          inputMode="decimal"
          value={text}
          disabled={disabled}
          aria-invalid={error ? 'true' : 'false'}
          data-testid={testId}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') {
              e.preventDefault()
              commit()
            } else if (e.key === 'Escape') {
              e.stopPropagation()
              setText(shown)
              setError(null)
              setWarning(null)
            }
          }}
        />
        <span className="unit">{symbol}</span>
      </label>
      {warning && warning.text === text && !error ? (
        <p className="warning" role="status" data-testid={`${testId}-warning`}>
          {warning.message}
        </p>
      ) : null}
      {error ? (
        <p className="error" role="alert" data-testid={`${testId}-error`}>
          {error}
        </p>
      ) : null}
    </>
  )
}
