import { describe, expect, it } from 'vitest'
import { parseArgs } from '@/cli/args'

describe('parseArgs', () => {
  it('gives the defaults when no argument is passed', () => {
    expect(parseArgs([])).toEqual({
      ok: true,
      options: { file: null, json: false, timeHistory: false, criteria: null, units: 'SI', help: false, balance: false, report: null, csv: null },
    })
  })

  it('reads the file and every option, in any order, with spaces or =', () => {
    expect(parseArgs(['--units', 'US', 'm.json', '--json', '--criteria=en1998-1', '--time-history', '--balance'])).toEqual({
      ok: true,
      options: { file: 'm.json', json: true, timeHistory: true, criteria: 'en1998-1', units: 'US', help: false, balance: true, report: null, csv: null },
    })
  })

  it('refuses unknown options, bad units, a missing criterion id and two files', () => {
    expect(parseArgs(['--fast'])).toEqual({ ok: false, error: '[cli] unknown option --fast (see --help)' })
    expect(parseArgs(['--units', 'metric'])).toEqual({ ok: false, error: '[cli] --units must be SI or US, got "metric"' })
    expect(parseArgs(['--criteria'])).toMatchObject({ ok: false, error: expect.stringContaining('--criteria needs') })
    expect(parseArgs(['a.json', 'b.json'])).toEqual({
      ok: false,
      error: '[cli] only one model file, got "a.json" and "b.json"',
    })
  })
})
