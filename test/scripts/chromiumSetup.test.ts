import { describe, expect, it } from 'vitest'
import { APT_INSTALL, DEFAULT_CHROMIUM, decideChromiumSetup } from '../../scripts/chromiumSetup.mjs'
import type { ChromiumFacts } from '../../scripts/chromiumSetup.mjs'

/** A machine: which paths exist, who runs, the platform, where apt-get is. */
function facts(over: Partial<ChromiumFacts> & { files?: string[] } = {}): ChromiumFacts {
  const files = new Set(over.files ?? [])
  return {
    override: over.override,
    exists: (p) => files.has(p),
    uid: 'uid' in over ? over.uid : 0,
    platform: over.platform ?? 'linux',
    aptGet: 'aptGet' in over ? (over.aptGet ?? null) : '/usr/bin/apt-get',
  }
}

describe('decideChromiumSetup', () => {
  it('does nothing when Chromium is at /usr/bin/chromium', () => {
    expect(decideChromiumSetup(facts({ files: [DEFAULT_CHROMIUM] }))).toEqual({ kind: 'ok', path: DEFAULT_CHROMIUM })
  })

  it('installs Debian chromium with apt-get update then install -y when root has apt-get and it is missing', () => {
    const s = decideChromiumSetup(facts())
    expect(s.kind).toBe('install')
    if (s.kind !== 'install') return
    expect(s.commands).toEqual(APT_INSTALL)
    expect(s.commands.map(([c, a]) => [c, ...a].join(' '))).toEqual(['apt-get update', 'apt-get install -y chromium'])
    expect(s.log).toMatch(/^\[setup\] .*installing Debian's chromium package/)
    expect(s.path).toBe(DEFAULT_CHROMIUM)
  })

  it('fails early with the sudo command when apt-get is there but the user is not root', () => {
    const s = decideChromiumSetup(facts({ uid: 1000 }))
    expect(s).toEqual({
      kind: 'fail',
      message: `[setup] the browser tests need Chromium at ${DEFAULT_CHROMIUM}; installing it needs root.`,
      command: 'sudo apt-get update && sudo apt-get install -y chromium',
    })
  })

  it('fails early and points to GYRE_CHROMIUM without apt-get or off Linux', () => {
    for (const s of [
      decideChromiumSetup(facts({ aptGet: null })),
      decideChromiumSetup(facts({ platform: 'darwin', aptGet: null, uid: 501 })),
      decideChromiumSetup(facts({ platform: 'win32', aptGet: null, uid: undefined })),
    ]) {
      expect(s.kind).toBe('fail')
      if (s.kind === 'fail') expect(s.command).toBe('export GYRE_CHROMIUM=/path/to/chromium')
    }
  })

  it('uses GYRE_CHROMIUM when it points at a file, and never installs over it', () => {
    expect(decideChromiumSetup(facts({ override: '/opt/chrome/chrome', files: ['/opt/chrome/chrome'] }))).toEqual({
      kind: 'ok',
      path: '/opt/chrome/chrome',
    })
    const s = decideChromiumSetup(facts({ override: '/opt/missing' }))
    expect(s.kind).toBe('fail')
    if (s.kind === 'fail') {
      expect(s.message).toContain('/opt/missing')
      expect(s.command).toBe('unset GYRE_CHROMIUM')
    }
  })

  it('treats an empty GYRE_CHROMIUM as not set', () => {
    expect(decideChromiumSetup(facts({ override: '', files: [DEFAULT_CHROMIUM] }))).toEqual({ kind: 'ok', path: DEFAULT_CHROMIUM })
  })
})
