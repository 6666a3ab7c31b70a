/** Text escaping for the HTML report. */

const HTML_ENTITIES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
}

/** Text safe inside HTML element content and quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => HTML_ENTITIES[c] ?? c)
}

/**
 * A CSS string literal (double-quoted) for generated content: backslash, quote and line breaks
 * escaped, and '<' written as \3C so no text can close the surrounding <style> element.
 */
export function cssString(text: string): string {
  const body = text
    .replace(/\\/g, '\\\\')
    .replace(/"/g, '\\"')
    .replace(/[\r\n]+/g, ' ')
    .replace(/</g, '\\3C ')
  return `"${body}"`
}
