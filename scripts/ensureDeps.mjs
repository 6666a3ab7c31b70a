// Runs before `npm start` and `npm test`: installs the pinned dependencies on a fresh clone so the
// README's two commands work as they are. It never upgrades anything (npm ci follows the lock file).
import { execSync } from 'node:child_process'
import { existsSync } from 'node:fs'

if (!existsSync('node_modules/.package-lock.json')) {
  console.log('[setup] installing pinned dependencies (npm ci)...')
  execSync('npm ci --no-audit --no-fund', { stdio: 'inherit' })
}
if (process.env.npm_lifecycle_event === 'pretest' && !existsSync(process.env.GYRE_CHROMIUM ?? '/usr/bin/chromium')) {
  console.warn(
    '[setup] browser tests need Debian\'s Chromium at /usr/bin/chromium: run `apt-get install -y chromium` (CI does this in .ci/run).',
  )
}
