import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import type { BalanceResult } from '@/engine'
import { CAUTION, CAUTION_SHORT, parseProjectText } from '@/model'
import { buildReportHtml, escapeHtml, formatTimestamp } from '@/report'
import { demoCase } from './fixtures'

const AT = new Date('2026-12-02T04:00:00Z')

/*
 * No DOM here: the pinned jsdom needs Node 22 while the project runs on Node 20, so the checks
 * read the markup with small, strict patterns instead. The builder writes no nested tables.
 */
function tableMarkup(html: string, id: string): string {
  const m = new RegExp(`<table class="grid" data-table="${id}">([\\s\\S]*?)</table>`).exec(html)
  if (!m) throw new Error(`no table ${id}`)
  return m[1] ?? ''
}

function bodyRows(table: string): string[] {
  const body = /<tbody>([\s\S]*?)<\/tbody>/.exec(table)?.[1] ?? ''
  return body.match(/<tr>[\s\S]*?<\/tr>/g) ?? []
}

/** Text of each cell, entities decoded for the five the builder writes. */
function cells(row: string): string[] {
  return (row.match(/<td[^>]*>([\s\S]*?)<\/td>/g) ?? []).map((c) => decode(c.replace(/<[^>]+>/g, '')))
}

function decode(text: string): string {
  return text
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
}

function sectionText(html: string, id: string): string | null {
  const m = new RegExp(`<section class="sheet[^"]*" id="${id}">([\\s\\S]*?)</section>`).exec(html)
  return m ? decode((m[1] ?? '').replace(/<[^>]+>/g, ' ')) : null
}

describe('buildReportHtml', () => {
  it('puts the caution in a box at the top and in the closing footer', () => {
    const { project, result } = demoCase()
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: AT })
    const body = html.slice(html.indexOf('<body>'))
    const box = body.indexOf('<div class="caution-box" role="note" id="caution-top">')
    expect(box).toBeGreaterThan(0)
    expect(body.indexOf(CAUTION, box)).toBeLessThan(body.indexOf('<section'))
    const footer = body.lastIndexOf('<footer class="closing" id="caution-bottom">')
    expect(footer).toBeGreaterThan(body.lastIndexOf('</section>'))
    expect(body.indexOf(CAUTION, footer)).toBeGreaterThan(footer)
    expect(body.slice(footer)).toMatch(/<\/footer>\s*<\/body>\s*<\/html>\s*$/)
    // The running page footer is a CSS page margin box (CSS Paged Media Level 3, margin boxes).
    expect(html).toMatch(/@bottom-left\s*\{\s*content:\s*"Preliminary results for layout studies only\./)
  })

  it('repeats the short caution in the header of every table', () => {
    const { project, result } = demoCase()
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: AT })
    const tables = html.match(/<table class="grid" data-table="[^"]+">[\s\S]*?<\/table>/g) ?? []
    expect(tables.length).toBeGreaterThanOrEqual(6)
    for (const t of tables) {
      expect(t).toMatch(new RegExp(`^<table[^>]*>\\s*<thead><tr class="caution-row"><th colspan="\\d+">${CAUTION_SHORT.replace(/\./g, '\\.')}</th></tr>`))
    }
  })

  it('has one torsion row per story and static case', () => {
    const { project, result } = demoCase()
    const html = buildReportHtml(project, result, { unitSystem: 'US', generatedAt: AT })
    const rows = bodyRows(tableMarkup(html, 'torsion'))
    expect(rows.length).toBe(project.floors.length * 4)
    const first = cells(rows[0] ?? '')
    expect(first.slice(0, 3)).toEqual(['1', 'Level 1 (shops)', 'X+e'])
    // 4 significant digits of drift max in inches (1 in = 0.0254 m exactly, NIST SP 811 B.8).
    const d = (result.torsion?.cases[0]?.stories[0]?.driftMax ?? 0) / 0.0254
    expect(first[3]).toBe(d.toPrecision(4))
    // The clause is the same in every row for this set, so it is printed once below the table.
    expect(html).toContain('clause (all rows): ASCE/SEI 7-16 Table 12.3-1 Type 1a')
  })

  it('escapes markup in the project name everywhere, including the printed page header', () => {
    const { project, result } = demoCase()
    const evil = { ...project, name: '<script>alert("x")</script> & </style><b>' }
    const html = buildReportHtml(evil, result, { unitSystem: 'SI', generatedAt: AT })
    expect(html).not.toContain('<script')
    expect(html).not.toContain('<b>')
    expect(html.match(/<\/style>/g)?.length).toBe(1)
    expect(html).toContain('<h1>&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &lt;/style&gt;&lt;b&gt;</h1>')
  })

  it('states the criterion set, its clauses and the method in the method section', () => {
    const { project, result } = demoCase()
    const method = sectionText(buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: AT }), 'method') ?? ''
    expect(method).toContain('ASCE/SEI 7-16 Table 12.3-1 Type 1a')
    expect(method).toContain(result.torsion?.criterion.source ?? 'missing')
    expect(method).toContain('three degrees of freedom')
    expect(method).toContain('Timoshenko')
    expect(method).toContain('CQC')
    expect(method).toContain('Newmark')
    expect(method).toContain(CAUTION)
  })

  it('draws one CM and one CR marker per floor across the plan sketches', () => {
    const { project, result } = demoCase()
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: AT })
    const svgs = html.match(/<svg[\s\S]*?<\/svg>/g) ?? []
    expect(svgs.length).toBeGreaterThanOrEqual(1)
    const count = (re: RegExp): number => svgs.reduce((n, s) => n + (s.match(re)?.length ?? 0), 0)
    expect(count(/class="g-cr"/g)).toBe(project.floors.length)
    expect(count(/class="g-cm"/g)).toBe(project.floors.length)
  })

  it('lists balance suggestions with their numbers when given', () => {
    const { project, result } = demoCase()
    const balance: BalanceResult = {
      score: 0.4,
      worstEccentricityRatio: 0.6,
      trials: 12,
      message: null,
      caution: CAUTION,
      suggestions: [
        {
          elementId: 'w1',
          elementKind: 'wall',
          elementName: 'East <gable>',
          action: 'move',
          description: "Move wall 'East <gable>' 2.40 m towards -x (to x = 27.60 m)",
          amount: -2.4,
          unit: 'm',
          element: Object.values(project.walls)[0] ?? ({} as never),
          scoreBefore: 0.4,
          scoreAfter: 0.1,
          worstEccentricityRatioBefore: 0.6,
          worstEccentricityRatioAfter: 0.2,
          worstDriftRatioBefore: 1.359,
          worstDriftRatioAfter: 1.12,
          steps: [],
          edits: [],
          objective: 'eccentricity',
          objectiveBefore: 0.4,
          objectiveAfter: 0.1,
          before: { eccentricityRms: 0.4, worstEccentricityRatio: 0.6, worstDriftRatio: 1.359, periodRatio: null },
          after: { eccentricityRms: 0.1, worstEccentricityRatio: 0.2, worstDriftRatio: 1.12, periodRatio: null },
          worse: [],
          worsensDrift: false,
        },
      ],
      objective: 'eccentricity',
      metrics: null,
    }
    const html = buildReportHtml(project, result, { unitSystem: 'SI', balance, generatedAt: AT })
    const rows = bodyRows(tableMarkup(html, 'balance'))
    expect(rows.length).toBe(1)
    const c = cells(rows[0] ?? '')
    expect(c[1]).toBe("Move wall 'East <gable>' 2.40 m towards -x (to x = 27.60 m)")
    expect(c.slice(2)).toEqual(['0.4', '0.1', '0.6', '0.2', '1.359', '1.12'])
    expect(sectionText(html, 'balance')).toContain(CAUTION)
  })

  it('leaves the balance section out when none is given', () => {
    const { project, result } = demoCase()
    const html = buildReportHtml(project, result, { unitSystem: 'SI', generatedAt: AT })
    expect(sectionText(html, 'balance')).toBeNull()
    expect(sectionText(html, 'summary')).toContain(result.torsion?.criterion.source ?? 'missing')
  })
})

describe('escapeHtml', () => {
  it('escapes the five HTML special characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;')
  })
})

describe('formatTimestamp', () => {
  it('prints UTC minutes', () => {
    expect(formatTimestamp(AT)).toBe('2026-12-02 04:00 UTC')
    expect(formatTimestamp(new Date(Number.NaN))).toBe('unknown time')
  })
})

describe('buildReportHtml on a mechanism', () => {
  it('still builds, lists the mechanism issue and keeps the caution', () => {
    const text = readFileSync(new URL('../../public/examples/mechanism-x.json', import.meta.url), 'utf8')
    const parsed = parseProjectText(text)
    if (!parsed.ok) throw new Error(parsed.errors.join('; '))
    const result = analyzeProject(parsed.project)
    expect(result.status).toBe('mechanism')
    const html = buildReportHtml(parsed.project, result, { unitSystem: 'US', generatedAt: AT })
    expect(sectionText(html, 'issues')).toContain('mechanism')
    expect(html).not.toContain('data-table="torsion"')
    expect(html.split(CAUTION).length - 1).toBeGreaterThanOrEqual(3)
  })
})
