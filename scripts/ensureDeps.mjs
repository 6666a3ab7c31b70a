// Runs before `npm start` and `npm test`: installs the pinned dependencies on a fresh clone so the
// README's two commands work as they are. It never upgrades anything (npm ci follows the lock file).
// Before `npm test` it also makes sure the browser tests have Chromium: Debian's package is
// installed when missing and the machine allows it (root with apt-get); otherwise it stops here with
// the one command to run (scripts/chromiumSetup.mjs decides).
import { execSync, spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { decideChromiumSetup } from './chromiumSetup.mjs'

if (!existsSync('node_modules/.package-lock.json')) {
  console.log('[setup] installing pinned dependencies (npm ci)...')
  execSync('npm ci --no-audit --no-fund', { stdio: 'inherit' })
}

function which(command) {
  const r = spawnSync('sh', ['-c', `command -v ${command}`], { encoding: 'utf8' })
  return r.status === 0 && r.stdout.trim() !== '' ? r.stdout.trim() : null
}

if (process.env.npm_lifecycle_event === 'pretest') {
  const setup = decideChromiumSetup({
    override: process.env.GYRE_CHROMIUM,
    exists: existsSync,
    uid: typeof process.getuid === 'function' ? process.getuid() : undefined,
    platform: process.platform,
    aptGet: which('apt-get'),
  })
  if (setup.kind === 'install') {
    console.log(setup.log)
    for (const [command, args] of setup.commands) {
      const r = spawnSync(command, args, {
        stdio: 'inherit',
        env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
      })
      if (r.status !== 0) {
        console.error(`[setup] \`${command} ${args.join(' ')}\` failed (exit ${r.status ?? r.signal}); install Chromium by hand: apt-get install -y chromium`)
        process.exit(1)
      }
    }
    if (!existsSync(setup.path)) {
      console.error(`[setup] the chromium package is installed but ${setup.path} is still missing; set GYRE_CHROMIUM to the Chromium binary`)
      process.exit(1)
    }
    console.log(`[setup] Chromium installed at ${setup.path}`)
  } else if (setup.kind === 'fail') {
    console.error(`${setup.message}\n[setup] run: ${setup.command}`)
    process.exit(1)
  }
}
