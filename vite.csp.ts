/**
 * The built app's Content-Security-Policy, injected into dist/index.html by a small Vite plugin.
 * Build only: Vite's dev server needs inline scripts and a websocket for hot reload, so `npm start`
 * runs without it. The policy allows the app's own files only: scripts and workers from the same
 * origin (workers also from blob:), inline styles (React style attributes and component styles),
 * data:/blob: images, media and fetches for exports and project files, and nothing from anywhere
 * else. WebGL and WebCodecs need no directive.
 * @see Content Security Policy Level 3 (W3C), section 6 (directives)
 */
import type { Plugin } from 'vite'

/** The policy of the built app, one string as it goes into the meta tag. */
export const APP_CSP = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self' blob:",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "media-src 'self' data: blob:",
  "font-src 'self' data:",
  "connect-src 'self' data: blob:",
  "object-src 'none'",
  "frame-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ')

/** The meta tag of a policy (the policy holds no double quote or markup). */
export function cspMetaTag(policy: string): string {
  if (/["<>&]/.test(policy)) throw new TypeError(`[build] CSP must not contain " < > or &: ${policy}`)
  return `<meta http-equiv="Content-Security-Policy" content="${policy}" />`
}

/**
 * Put the policy meta tag right after the charset declaration, before any script or style, so it
 * governs everything the page loads (CSP Level 3, section 3.3: a meta policy applies from there on).
 */
export function injectCsp(html: string, policy: string = APP_CSP): string {
  const charset = /<meta charset="[^"]*"\s*\/?>/i.exec(html)
  if (!charset) throw new Error('[build] index.html has no <meta charset>: cannot place the CSP')
  const at = charset.index + charset[0].length
  return `${html.slice(0, at)}\n    ${cspMetaTag(policy)}${html.slice(at)}`
}

/** Vite plugin: the policy in the built index.html only (never in the dev server). */
export function contentSecurityPolicy(policy: string = APP_CSP): Plugin {
  return {
    name: 'gyre-content-security-policy',
    apply: 'build',
    transformIndexHtml: { order: 'post', handler: (html) => injectCsp(html, policy) },
  }
}
