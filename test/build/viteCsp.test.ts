import { describe, expect, it } from 'vitest'
import { APP_CSP, contentSecurityPolicy, cspMetaTag, injectCsp } from '../../vite.csp'

const INDEX = '<!doctype html>\n<html>\n  <head>\n    <meta charset="UTF-8" />\n    <title>x</title>\n    <script type="module" src="/assets/a.js"></script>\n  </head>\n</html>'

function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy.split(';').map((d) => {
      const [name = '', ...values] = d.trim().split(/\s+/)
      return [name, values] as const
    }),
  )
}

describe('APP_CSP', () => {
  it('allows scripts only from the app itself and nothing from other hosts', () => {
    // CSP Level 3 (W3C) 6.1: script-src without 'unsafe-inline'/'unsafe-eval' blocks inline and eval.
    const d = directives(APP_CSP)
    expect(d.get('default-src')).toEqual(["'self'"])
    expect(d.get('script-src')).toEqual(["'self'"])
    expect(d.get('object-src')).toEqual(["'none'"])
    expect(d.get('base-uri')).toEqual(["'none'"])
    expect(APP_CSP).not.toMatch(/https?:|\*|unsafe-eval|ws:|wss:/)
    expect(d.get('script-src')).not.toContain("'unsafe-inline'")
  })

  it('allows the workers, blob downloads and data images the app uses', () => {
    const d = directives(APP_CSP)
    expect(d.get('worker-src')).toEqual(["'self'", 'blob:'])
    expect(d.get('img-src')).toEqual(["'self'", 'data:', 'blob:'])
    expect(d.get('connect-src')).toEqual(["'self'", 'data:', 'blob:'])
  })
})

describe('injectCsp', () => {
  it('puts the policy right after the charset, before any script', () => {
    const html = injectCsp(INDEX)
    expect(html.indexOf(cspMetaTag(APP_CSP))).toBeGreaterThan(html.indexOf('<meta charset'))
    expect(html.indexOf(cspMetaTag(APP_CSP))).toBeLessThan(html.indexOf('<script'))
    expect(html.match(/Content-Security-Policy/g)).toHaveLength(1)
  })

  it('refuses a page without a charset declaration', () => {
    expect(() => injectCsp('<html><head></head></html>')).toThrow('no <meta charset>')
  })

  it('refuses a policy that would break out of the attribute', () => {
    expect(() => cspMetaTag(`default-src 'self'" onload="x`)).toThrow('must not contain')
  })
})

describe('contentSecurityPolicy', () => {
  it('applies to the build only, so the dev server keeps its inline scripts and hot reload', () => {
    expect(contentSecurityPolicy().apply).toBe('build')
  })
})
