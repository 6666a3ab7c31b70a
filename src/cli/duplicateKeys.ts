/**
 * Duplicate keys in JSON text. JSON.parse keeps the last of two equal keys in an object without a
 * word (ECMA-262 JSON.parse; RFC 8259 section 4 says names SHOULD be unique and that receivers
 * then behave unpredictably), so a hand-edited model can lose a value silently. This scanner walks
 * the text once with an explicit stack (no recursion, so deep nesting cannot overflow) and names
 * each repeated key by its path in the same notation as the model's validation messages.
 */

/** A repeated key: where it is and how often it occurs in its object. */
export interface DuplicateKey {
  /** Path of the repeated key, e.g. `walls.w1.thickness` or `floors[0].name`. */
  readonly path: string
  readonly count: number
}

interface ObjectFrame {
  readonly kind: 'object'
  readonly path: string
  readonly seen: Map<string, number>
  key: string | null
  expectKey: boolean
}

interface ArrayFrame {
  readonly kind: 'array'
  readonly path: string
  index: number
}

type Frame = ObjectFrame | ArrayFrame

const IDENTIFIER = /^[A-Za-z_$][A-Za-z0-9_$-]*$/

/** `parent.key`, or `parent["odd key"]` when the key is not a plain name. */
export function joinKeyPath(parent: string, key: string): string {
  if (!IDENTIFIER.test(key)) return `${parent}[${JSON.stringify(key)}]`
  return parent === '' ? key : `${parent}.${key}`
}

function childPath(frame: Frame | undefined): string {
  if (!frame) return ''
  if (frame.kind === 'array') return `${frame.path}[${frame.index}]`
  return joinKeyPath(frame.path, frame.key ?? '')
}

/** End index (exclusive) of the JSON string starting with the quote at `start`. */
function stringEnd(text: string, start: number): number {
  let i = start + 1
  while (i < text.length) {
    const c = text.charCodeAt(i)
    if (c === 0x5c) i += 2
    else if (c === 0x22) return i + 1
    else i += 1
  }
  return text.length
}

/**
 * Every key that occurs more than once in one object, in the order the repeats appear, with how
 * often it occurs. Meant for text that JSON.parse accepted; on other text it reports what it can.
 */
export function findDuplicateKeys(text: string): DuplicateKey[] {
  const found = new Map<string, DuplicateKey>()
  const stack: Frame[] = []
  let i = 0
  while (i < text.length) {
    const ch = text[i]
    const top = stack[stack.length - 1]
    switch (ch) {
      case '{':
        stack.push({ kind: 'object', path: childPath(top), seen: new Map(), key: null, expectKey: true })
        i += 1
        break
      case '[':
        stack.push({ kind: 'array', path: childPath(top), index: 0 })
        i += 1
        break
      case '}':
      case ']':
        stack.pop()
        i += 1
        break
      case ',':
        if (top?.kind === 'array') top.index += 1
        else if (top?.kind === 'object') top.expectKey = true
        i += 1
        break
      case '"': {
        const end = stringEnd(text, i)
        if (top?.kind === 'object' && top.expectKey) {
          let key: string
          try {
            key = JSON.parse(text.slice(i, end)) as string
          } catch (_e) {
            key = text.slice(i + 1, end - 1)
          }
          top.key = key
          top.expectKey = false
          const count = (top.seen.get(key) ?? 0) + 1
          top.seen.set(key, count)
          if (count > 1) {
            const path = joinKeyPath(top.path, key)
            found.set(`${top.path}\u0000${key}`, { path, count })
          }
        }
        i = end
        break
      }
      default:
        i += 1
    }
  }
  return [...found.values()]
}
