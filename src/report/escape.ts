/**
 * Text escaping for the HTML report. User text (project, floor, element and material names, notes)
 * goes only into HTML element content and double-quoted attribute values, always through
 * escapeHtml; it never goes into CSS, script, a URL or an unquoted attribute (docs/reports.md).
 * @see HTML Living Standard, 13.1.2.6 (character references) and 13.2.5 (tokenization)
 */

const HTML_ENTITIES: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
}

/**
 * Control characters the HTML syntax forbids in text (C0 except tab, LF, FF, CR; DEL; C1) and lone
 * surrogates. They are shown as U+FFFD so a name never carries invisible bytes into the report.
 */
// eslint-disable-next-line no-control-regex
const FORBIDDEN = /[\u0000-\u0008\u000B\u000E-\u001F\u007F-\u009F]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g

/** Text safe inside HTML element content and double- or single-quoted attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(FORBIDDEN, '\uFFFD').replace(/[&<>"']/g, (c) => HTML_ENTITIES[c] ?? c)
}

/**
 * A CSS string literal (double-quoted) for the report's own fixed texts (the caution), never for
 * user text. Everything but letters, digits, space and plain punctuation is written as a CSS hex
 * escape (`\HHHHHH `), so no character can end the string, the declaration or the style element.
 * @see CSS Syntax Module Level 3, 4.3.7 (consume an escaped code point)
 */
export function cssString(text: string): string {
  let body = ''
  for (const ch of text) {
    body += /^[A-Za-z0-9 .,:;!?()-]$/.test(ch)
      ? ch
      : `\\${(ch.codePointAt(0) ?? 0xfffd).toString(16).toUpperCase().padStart(6, '0')} `
  }
  return `"${body}"`
}
