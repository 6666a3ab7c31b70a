// What `npm test` does about the browser the browser tests drive (Debian's Chromium), as a pure
// decision so it can be tested without touching the machine; scripts/ensureDeps.mjs carries it out.

/** Where the browser tests look for Chromium unless GYRE_CHROMIUM says otherwise. */
export const DEFAULT_CHROMIUM = '/usr/bin/chromium'

/** The commands that install Debian's Chromium (run as root). */
export const APT_INSTALL = [
  ['apt-get', ['update']],
  ['apt-get', ['install', '-y', 'chromium']],
]

/**
 * Decide what to do about Chromium.
 * @param {object} facts
 * @param {string | undefined} facts.override  GYRE_CHROMIUM, when set
 * @param {(path: string) => boolean} facts.exists  whether a file exists
 * @param {number | undefined} facts.uid  process.getuid() (undefined where there is none, e.g. Windows)
 * @param {string} facts.platform  process.platform
 * @param {string | null} facts.aptGet  path of apt-get, or null when it is not on PATH
 * @returns {{ kind: 'ok', path: string }
 *   | { kind: 'install', path: string, log: string, commands: typeof APT_INSTALL }
 *   | { kind: 'fail', message: string, command: string }}
 */
export function decideChromiumSetup({ override, exists, uid, platform, aptGet }) {
  if (override !== undefined && override !== '') {
    if (exists(override)) return { kind: 'ok', path: override }
    return {
      kind: 'fail',
      message: `[setup] GYRE_CHROMIUM is set to ${override}, but there is no file there.`,
      command: 'unset GYRE_CHROMIUM',
    }
  }
  if (exists(DEFAULT_CHROMIUM)) return { kind: 'ok', path: DEFAULT_CHROMIUM }
  if (platform === 'linux' && aptGet !== null && uid === 0) {
    return {
      kind: 'install',
      path: DEFAULT_CHROMIUM,
      log: `[setup] the browser tests need Chromium and ${DEFAULT_CHROMIUM} is missing: installing Debian's chromium package (apt-get update, then apt-get install -y chromium)...`,
      commands: APT_INSTALL,
    }
  }
  if (platform === 'linux' && aptGet !== null) {
    return {
      kind: 'fail',
      message: `[setup] the browser tests need Chromium at ${DEFAULT_CHROMIUM}; installing it needs root.`,
      command: 'sudo apt-get update && sudo apt-get install -y chromium',
    }
  }
  return {
    kind: 'fail',
    message: `[setup] the browser tests need Chromium at ${DEFAULT_CHROMIUM} (Debian: apt-get install -y chromium), or GYRE_CHROMIUM set to a Chromium binary.`,
    command: 'export GYRE_CHROMIUM=/path/to/chromium',
  }
}
