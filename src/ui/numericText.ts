/**
 * Pure: the typed exact-entry text in the plain "a, b" form the editor reads. Accepts a leading "@"
 * (relative to the last point, as every entry already is) and "<" before the angle: "@6<90" is
 * "6, 90".
 */
export function normaliseNumericText(text: string): string {
  return text.trim().replace(/^@\s*/, '').replace(/\s*<\s*/, ', ')
}
