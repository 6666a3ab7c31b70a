import { describe, expect, it } from 'vitest'
import { formatResultJson, formatSummary, formatTable } from '@/cli/format'
import type { AnalysisResult, ModalResult } from '@/engine'
import { CAUTION, MODE_COLUMNS, modeHeaderLabel } from '@/model'

/**
 * A hand-made result of a one-storey box (10 m x 6 m, 36 t; see public/examples/eccentric-box.json
 * notes for the hand calculation of CM, CR and radii), to test the rendering without the engine.
 */
function handResult(): AnalysisResult {
  const f = (xs: number[]): Float64Array => Float64Array.from(xs)
  const modes: ModalResult = {
    count: 3,
    dofCount: 3,
    angularFrequencies: f([80, 100, 160]),
    periods: f([(2 * Math.PI) / 80, (2 * Math.PI) / 100, (2 * Math.PI) / 160]),
    frequenciesHz: f([80 / (2 * Math.PI), 100 / (2 * Math.PI), 160 / (2 * Math.PI)]),
    shapes: f([1, 0, 0, 0, 1, 0, 0, 0, 1]),
    participation: { x: f([1, 0, 0]), y: f([0, 1, 0]), rz: f([0, 0, 1]) },
    effectiveMassRatio: { x: f([0.9, 0, 0.1]), y: f([0, 1, 0]), rz: f([0.1, 0, 0.9]) },
    cumulativeMassRatio: { x: f([0.9, 0.9, 1]), y: f([0, 1, 1]), rz: f([0.1, 0.1, 1]) },
    torsionShare: f([0.12, 0, 0.88]),
    character: ['x', 'y', 'torsion'],
    solver: 'hand',
    complete: true,
  }
  return {
    status: 'ok',
    issues: [{ code: 'ill-conditioned', severity: 'warning', message: 'made-up warning', refs: ['F1'] }],
    projectName: 'Hand box',
    floors: [
      {
        id: 'F1',
        name: 'Roof',
        index: 0,
        elevation: 3.5,
        height: 3.5,
        mass: 36000,
        centreOfMass: { x: 5, y: 3 },
        polarInertia: 408000,
        radiusOfGyration: Math.sqrt(408000 / 36000),
        slabArea: 60,
        extent: { minX: 0, maxX: 10, minY: 0, maxY: 6 },
        extremePoints: [
          { x: 0, y: 0 },
          { x: 10, y: 0 },
          { x: 10, y: 6 },
          { x: 0, y: 6 },
        ],
      },
    ],
    totalMass: 36000,
    buildingCentreOfMass: { x: 5, y: 3 },
    modes,
    centres: [
      {
        floorId: 'F1',
        centreOfMass: { x: 5, y: 3 },
        centreOfRigidity: { x: 10 / 3, y: 3 },
        storyCentreOfStiffness: { x: 10 / 3, y: 3 },
        eccentricity: { x: -5 / 3, y: 0 },
        torsionalStiffness: 9.3667e9,
        lateralStiffness: { x: 3e8, y: 3e8 },
        torsionalRadius: { x: 5.588, y: 5.588 },
        radiusOfGyration: 3.367,
        hasXYCoupling: false,
      },
    ],
    torsion: {
      periodUsed: { x: 0.0785, y: 0.0628 },
      exponent: { x: 1, y: 1 },
      baseShear: { x: 1e5, y: 1e5 },
      eccentricityFraction: 0.05,
      cases: [
        {
          id: 'Y+e',
          direction: 'y',
          eccentricitySign: 1,
          forces: f([1e5]),
          loadPoints: [{ x: 5.5, y: 3 }],
          displacements: f([0, 0.0004, 1e-5]),
          stories: [
            {
              floorId: 'F1',
              index: 0,
              driftMax: 0.0005,
              driftAvg: 0.0004,
              driftRatio: 1.25,
              displacementMax: 0.0005,
              displacementAvg: 0.0004,
              displacementRatio: 1.25,
              amplification: 1.085,
              driftIndex: 0.0005 / 3.5,
            },
          ],
        },
      ],
      criterion: {
        setId: 'made-up',
        setName: 'Made-up set',
        source: 'test source, clause 1',
        rows: [
          {
            floorId: 'F1',
            caseId: 'Y+e',
            quantity: 'max/avg story drift',
            value: 1.25,
            limit: 1.2,
            verdict: 'fail',
            clause: 'cl. 1',
            label: 'irregular',
          },
        ],
        overall: 'fail',
        caution: CAUTION,
      },
    },
    spectrum: null,
    timeHistory: null,
    regularity: null,
    caution: CAUTION,
    timings: { assemble: 1 },
  }
}

describe('formatTable', () => {
  it('pads columns to the widest cell, numbers to the right', () => {
    expect(formatTable([{ header: 'a', align: 'left' }, { header: 'bb' }], [['xyz', '1'], ['q', '22']])).toBe(
      ['a    bb', '---  --', 'xyz   1', 'q    22'].join('\n'),
    )
  })
})

describe('formatSummary', () => {
  it('starts and ends with the caution and shows every section', () => {
    const text = formatSummary(handResult())
    const lines = text.trimEnd().split('\n')
    expect(lines[0]).toBe('Gyre analysis: Hand box')
    expect(lines[1]).toBe(`CAUTION: ${CAUTION}`)
    expect(lines[lines.length - 1]).toBe(`CAUTION: ${CAUTION}`)
    for (const part of ['Floors', 'Modes', 'Torsion check', 'Plan regularity', 'Response spectrum', 'Issues']) {
      expect(text).toContain(part)
    }
    expect(text).toContain('Criterion set: Made-up set [made-up], source: test source, clause 1')
    expect(text).toContain('warning ill-conditioned: made-up warning [F1]')
  })

  it('prints the floor row in SI display units (t, m)', () => {
    const text = formatSummary(handResult(), 'SI')
    const row = text.split('\n').find((l) => l.trimStart().startsWith('1 '))
    // 36 000 kg = 36 t; CR x = 10/3 m; e_x = -5/3 m (hand calculation in eccentric-box.json notes)
    expect(row?.trim().split(/\s+/)).toEqual(['1', 'Roof', '3.5', '36', '5', '3', '3.333', '3', '-1.667', '0', '5.588', '5.588', '3.367'])
  })

  it('prints the floor row in US units (kip·s²/in, ft)', () => {
    const text = formatSummary(handResult(), 'US')
    const row = text.split('\n').find((l) => l.trimStart().startsWith('1 '))
    // 36 000 kg / (4448.2216 N / 0.0254 m/s²) = 0.2056 kip·s²/in; 3.5 m / 0.3048 = 11.48 ft (NIST SP 811 factors)
    expect(row?.trim().split(/\s+/).slice(0, 4)).toEqual(['1', 'Roof', '11.48', '0.2056'])
    expect(text).toContain('z (ft)')
  })

  it('prints the torsion row with the ratio, Ax, verdict and clause', () => {
    const text = formatSummary(handResult())
    const row = text.split('\n').find((l) => l.includes('Y+e') && l.includes('FAIL'))
    expect(row?.trim().split(/\s+/)).toEqual(['1', 'Y+e', '0.5', '0.4', '1.25', '1.25', '1.085', 'FAIL', 'irregular', 'cl.', '1'])
    expect(text).toContain(`Overall: FAIL (${CAUTION})`)
  })

  it('shows the modes with mass shares in percent under the shared mode headers', () => {
    const lines = formatSummary(handResult()).split('\n')
    const row = lines.find((l) => l.trim().startsWith('3 ') && l.includes('torsion'))
    // T = 2 pi / omega = 2 pi / 160 = 0.03927 s
    expect(row?.trim().split(/\s+/)).toEqual(['3', '0.03927', '25.46', '10.0', '0.0', '90.0', '100.0', '100.0', '100.0', '88.0', 'torsion'])
    const header = lines.find((l) => l.trim().startsWith('mode '))
    const expected = MODE_COLUMNS.map((c) => modeHeaderLabel(c))
    expect(header?.trim().split(/ {2,}/)).toEqual(expected)
    expect(expected).toContain('share θ (%)')
    expect(expected).toContain('running X (%)')
  })
})

describe('formatResultJson', () => {
  it('writes typed arrays as plain arrays and keeps the caution', () => {
    const parsed = JSON.parse(formatResultJson(handResult())) as {
      modes: { periods: unknown; character: unknown }
      caution: string
    }
    expect(Array.isArray(parsed.modes.periods)).toBe(true)
    expect((parsed.modes.periods as number[])[0]).toBeCloseTo((2 * Math.PI) / 80, 12)
    expect(parsed.caution).toBe(CAUTION)
  })

  it('writes non-finite numbers as null rather than invalid JSON', () => {
    const r = handResult()
    const broken = { ...r, totalMass: Number.NaN, modes: { ...r.modes!, periods: new Float64Array([Infinity]) } }
    const parsed = JSON.parse(formatResultJson(broken)) as { totalMass: unknown; modes: { periods: unknown[] } }
    expect(parsed.totalMass).toBeNull()
    expect(parsed.modes.periods).toEqual([null])
  })
})
