import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { EXIT_INVALID, EXIT_OK, runCli } from '@/cli/analyze'
import type { CliIo } from '@/cli/analyze'
import { parseArgs } from '@/cli/args'
import { seismicDesignFromOption } from '@/cli/seismicOption'
import { CAUTION } from '@/model'

const root = fileURLToPath(new URL('../../', import.meta.url))
const box = `${root}public/examples/eccentric-box.json`

function run(argv: string[]): { code: number; out: string; err: string } {
  let out = ''
  let err = ''
  const io: CliIo = {
    out: (t) => (out += t),
    err: (t) => (err += t),
    readFile: (p) => readFileSync(p, 'utf8'),
    writeFile: () => undefined,
  }
  return { code: runCli(argv, io), out, err }
}

describe('--system and --risk-category', () => {
  it('builds an ASCE 7 design from presets with the given risk category', () => {
    const r = seismicDesignFromOption('special-rc-walls-frame,special-steel-moment-frame', 'IV')
    expect(r.ok).toBe(true)
    if (!r.ok || r.design.code !== 'asce7-16') return
    expect(r.design.riskCategory).toBe('IV')
    expect(r.design.systemX.preset).toBe('special-rc-walls-frame')
    expect(r.design.systemY.R).toBe(8)
  })

  it('refuses unknown presets and mixed standards, naming the option', () => {
    const a = seismicDesignFromOption('shiny-walls', null)
    expect(!a.ok && a.error).toMatch(/^\[cli\] --system: unknown preset "shiny-walls"/)
    const b = seismicDesignFromOption('special-rc-walls-frame,concrete-walls-dcm', null)
    expect(!b.ok && b.error).toBe('[cli] --system: both directions must be presets of the same standard')
    const c = seismicDesignFromOption('special-rc-walls-frame', 'V')
    expect(!c.ok && c.error).toBe('[cli] --risk-category must be I, II, III or IV, got "V"')
    expect(parseArgs(['--risk-category', 'II'])).toEqual({ ok: false, error: '[cli] --risk-category needs --system' })
  })

  it('prints the design base shear with the caution, and exits 1 for a bad preset', () => {
    const ok = run([box, '--system', 'special-rc-walls-frame'])
    expect(ok.code).toBe(EXIT_OK)
    const lead = ok.out.indexOf('Design base shear per direction (ASCE/SEI 7-16)')
    expect(lead).toBeGreaterThan(0)
    expect(lead).toBeLessThan(ok.out.indexOf('Torsion check'))
    expect(ok.out.slice(lead)).toContain(`CAUTION: ${CAUTION}`)
    const bad = run([box, '--system', 'nope'])
    expect(bad.code).toBe(EXIT_INVALID)
    expect(bad.err).toContain('--system: unknown preset "nope"')
  })
})
