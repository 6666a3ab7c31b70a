/**
 * Editor input events in plan coordinates (metres). The UI translates DOM pointer and keyboard events
 * into these, so tools and commands run and are tested in node without a DOM.
 */
import type { Point } from '@/model'

/** Modifier flags carried by pointer and key events. */
export interface Modifiers {
  /** Shift held: add to selection, constrain angles. */
  readonly shift?: boolean
  /** Alt held: suspend snapping. */
  readonly alt?: boolean
}

/** A pointer event at a plan point. */
export interface PointerInput extends Modifiers {
  readonly type: 'pointerDown' | 'pointerMove' | 'pointerUp'
  /** Plan point under the pointer, m. */
  readonly point: Point
  /**
   * Pick and snap tolerance in plan metres (the UI derives it from zoom, e.g. 8 px / pixels-per-metre).
   * Falls back to the store's snapping tolerance when absent.
   */
  readonly tolerance?: number
}

/** A key press; `key` uses the DOM `KeyboardEvent.key` spelling ('Enter', 'Escape', 'Delete', 'Backspace', 'a'). */
export interface KeyInput extends Modifiers {
  readonly type: 'key'
  readonly key: string
}

/** Gesture cancelled (Escape handled upstream, pointer lost, window blurred). */
export interface CancelInput {
  readonly type: 'cancel'
}

/**
 * Exact numeric entry while drawing or with a selection.
 * - 'length-angle': `a` is a length (m), `b` an angle (rad, counter-clockwise from +x).
 * - 'offset': `a` = dx (m), `b` = dy (m).
 * Use `parseNumericEntry` to read typed text into this shape.
 */
export interface NumericInput {
  readonly type: 'numeric'
  readonly mode: 'length-angle' | 'offset'
  readonly a: number
  readonly b: number
}

/** Any editor input event. */
export type EditorEvent = PointerInput | KeyInput | CancelInput | NumericInput

/** Result of reading typed numeric text. */
export type NumericParse =
  | { readonly ok: true; readonly event: NumericInput }
  | { readonly ok: false; readonly message: string }

/**
 * Read typed text "a,b" (comma, semicolon or spaces between the two numbers) into a numeric event.
 * In 'length-angle' mode the text is "length,angle" with the angle in degrees (converted to rad here);
 * in 'offset' mode it is "dx,dy". Lengths are multiplied by `lengthToMetres` (1 for metres, 0.3048 when
 * the user types feet).
 */
export function parseNumericEntry(
  text: string,
  mode: NumericInput['mode'],
  lengthToMetres = 1,
): NumericParse {
  const parts = text
    .trim()
    .split(/[\s,;]+/)
    .filter((s) => s.length > 0)
  const what = mode === 'length-angle' ? 'length,angle' : 'dx,dy'
  if (parts.length !== 2) {
    return { ok: false, message: `numeric entry: expected two numbers "${what}", got "${text}"` }
  }
  const a = Number(parts[0])
  const b = Number(parts[1])
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    return { ok: false, message: `numeric entry: "${text}" is not two numbers "${what}"` }
  }
  if (mode === 'length-angle') {
    if (a <= 0) return { ok: false, message: `numeric entry: length must be > 0, got ${a}` }
    return {
      ok: true,
      event: { type: 'numeric', mode, a: a * lengthToMetres, b: (b * Math.PI) / 180 },
    }
  }
  return { ok: true, event: { type: 'numeric', mode, a: a * lengthToMetres, b: b * lengthToMetres } }
}

/** The offset (dx, dy) in metres a numeric event asks for. */
export function numericOffset(event: NumericInput): Point {
  if (event.mode === 'offset') return { x: event.a, y: event.b }
  return { x: event.a * Math.cos(event.b), y: event.a * Math.sin(event.b) }
}
