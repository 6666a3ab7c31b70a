/**
 * Hostile names in the printable report: user text must stay text. Before the fix a form feed in
 * the project name ended the CSS string of the printed page header (CSS Syntax Level 3, 4.3.5: a
 * newline, which includes U+000C, ends a string token), so the rest of the name ran as CSS and could
 * blank the report, hide the cautions, restyle "fail" cells and request an outside image.
 */
import { describe, expect, it } from 'vitest'
import type { BalanceResult } from '@/engine'
import { CAUTION, CAUTION_SHORT } from '@/model'
import type { Project } from '@/model'
import { buildReportHtml, cssString, escapeHtml } from '@/report'
import { REPORT_CSP } from '@/report/reportHtml'
import { demoCase } from './fixtures'

const AT = new Date('2026-12-02T04:00:00Z')

/** Names that broke out of, or tried to break out of, one escaping context or another. */
const HOSTILE: readonly (readonly [string, string])[] = [
  ['a form feed', 'Tower\f} body { display: none } .caution-box { display: none } x{'],
  ['a closing style tag', 'Tower </style><style>body{display:none}</style>'],
  ['a closing script tag', 'Tower </script><script>alert(1)</script>'],
  ['quotes', `Tower "quoted" and 'single' \`back\``],
  ['a CSS url()', 'Tower\f} body { background: url(http://example.invalid/leak.png) } x{'],
  ['CSS backslash escapes', 'Tower \\22 } td.verdict.fail::after { content: "pass" } \\'],
  ['an attribute break-out', '" onmouseover="alert(1)" x="'],
  ['markup and an image', '<img src="http://example.invalid/x.png"><b>bold</b>'],
]

function decode(text: string): string {
  return text
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
}

/** The demo with `name` as project name, first floor name, first wall name and first material name. */
function renamed(project: Project, name: string): Project {
  const [floor, ...floors] = project.floors
  const wall = Object.values(project.walls)[0]
  const material = Object.values(project.materials)[0]
  if (!floor || !wall || !material) throw new Error('demo has no floor, wall or material')
  return {
    ...project,
    name,
    floors: [{ ...floor, name }, ...floors],
    walls: { ...project.walls, [wall.id]: { ...wall, name } },
    materials: { ...project.materials, [material.id]: { ...material, name } },
  }
}

function balanceNaming(project: Project, name: string): BalanceResult {
  const wall = Object.values(project.walls)[0]
  if (!wall) throw new Error('demo has no wall')
  return {
    score: 0.4,
    worstEccentricityRatio: 0.6,
    trials: 3,
    message: null,
    caution: CAUTION,
    suggestions: [
      {
        elementId: wall.id,
        elementKind: 'wall',
        elementName: name,
        action: 'move',
        description: `Move wall '${name}' 1.00 m towards +x`,
        amount: 1,
        unit: 'm',
        element: wall,
        scoreBefore: 0.4,
        scoreAfter: 0.2,
        worstEccentricityRatioBefore: 0.6,
        worstEccentricityRatioAfter: 0.3,
        worstDriftRatioBefore: 1.3,
        worstDriftRatioAfter: 1.1,
        steps: [],
        edits: [],
        objective: 'eccentricity',
        objectiveBefore: 0.4,
        objectiveAfter: 0.2,
        before: { eccentricityRms: 0.4, worstEccentricityRatio: 0.6, worstDriftRatio: 1.3, periodRatio: null },
        after: { eccentricityRms: 0.2, worstEccentricityRatio: 0.3, worstDriftRatio: 1.1, periodRatio: null },
        worse: [],
        worsensDrift: false,
      },
    ],
    objective: 'eccentricity',
    metrics: null,
  }
}

function report(name: string): string {
  const { project, result } = demoCase()
  const p = renamed(project, name)
  return buildReportHtml(p, result, { unitSystem: 'SI', generatedAt: AT, balance: balanceNaming(p, name) })
}

const styleSheets = (html: string): string[] => html.match(/<style>[\s\S]*?<\/style>/g) ?? []
const verdictCells = (html: string): string[] => html.match(/<td class="verdict (pass|fail)">(pass|fail)<\/td>/g) ?? []

describe('buildReportHtml with hostile names', () => {
  const plain = report('Plain Tower')

  it.each(HOSTILE)('puts no user text in the style sheet when a name holds %s', (_case, name) => {
    const html = report(name)
    // The one style sheet is the same byte for byte as for a plain name: no user text in CSS.
    expect(styleSheets(html)).toEqual(styleSheets(plain))
    expect(styleSheets(html)).toHaveLength(1)
  })

  it.each(HOSTILE)('shows the name as text and keeps markup, scripts and requests out when it holds %s', (_case, name) => {
    const html = report(name)
    expect(html).not.toMatch(/<script/i)
    expect(html).not.toMatch(/<img/i)
    expect(html).not.toMatch(/<b>/i)
    expect(html).not.toMatch(/\son\w+="/i)
    expect(html).not.toMatch(/(src|href)="/i)
    expect(html.match(/<\/style>/g)).toHaveLength(1)
    const h1 = /<h1>([\s\S]*?)<\/h1>/.exec(html)?.[1] ?? ''
    expect(decode(h1)).toBe(name)
    const title = /<title>([\s\S]*?)<\/title>/.exec(html)?.[1] ?? ''
    expect(decode(title)).toBe(`Gyre report: ${name}`)
  })

  it.each(HOSTILE)('keeps the cautions and every verdict cell when a name holds %s', (_case, name) => {
    const html = report(name)
    expect(html).toContain(`<div class="caution-box" role="note" id="caution-top"><strong>Caution</strong>${escapeHtml(CAUTION)}</div>`)
    expect(html).toContain(`<footer class="closing" id="caution-bottom">`)
    expect(html.split(`<tr class="caution-row">`).length).toBe(plain.split(`<tr class="caution-row">`).length)
    expect(html).toContain(escapeHtml(CAUTION_SHORT))
    // Same verdicts in the same order as with a plain name: a name cannot turn "fail" into "pass".
    expect(verdictCells(html)).toEqual(verdictCells(plain))
  })

  it('sends a Content-Security-Policy that allows no outside request and no script', () => {
    const head = plain.slice(0, plain.indexOf('</head>'))
    const meta = /<meta http-equiv="Content-Security-Policy" content="([^"]*)">/.exec(head)
    expect(meta?.[1]).toBe(escapeHtml(REPORT_CSP))
    // The policy comes before the style sheet, so it governs everything after it (CSP Level 3, 3.3).
    expect(head.indexOf('Content-Security-Policy')).toBeLessThan(head.indexOf('<style>'))
    const directives = new Map(REPORT_CSP.split(';').map((d) => {
      const [k = '', ...v] = d.trim().split(/\s+/)
      return [k, v.join(' ')] as const
    }))
    expect(directives.get('default-src')).toBe("'none'")
    expect(directives.get('img-src')).toBe('data:')
    expect(directives.get('style-src')).toBe("'unsafe-inline'")
    expect(directives.get('base-uri')).toBe("'none'")
    expect(directives.get('form-action')).toBe("'none'")
    expect(directives.has('script-src')).toBe(false)
    expect(REPORT_CSP).not.toMatch(/https?:|\*/)
  })

  it('repeats the project name on printed pages as DOM text in the table header rows', () => {
    const html = report('Tower "A" & <B>')
    const rows = html.match(/<tr class="name-row"><th colspan="\d+">([^<]*)<\/th><\/tr>/g) ?? []
    expect(rows.length).toBeGreaterThanOrEqual(6)
    for (const r of rows) expect(r).toContain('Tower &quot;A&quot; &amp; &lt;B&gt;')
  })
})

describe('escapeHtml', () => {
  it('shows control characters the HTML syntax forbids as U+FFFD and keeps tab, LF, FF and CR', () => {
    // HTML Living Standard 13.2.5: control characters other than ASCII whitespace are parse errors.
    expect(escapeHtml('a\u0000b\u0007c\u001bd\u007fe\u0085f')).toBe('a\uFFFDb\uFFFDc\uFFFDd\uFFFDe\uFFFDf')
    expect(escapeHtml('a\tb\nc\fd\re')).toBe('a\tb\nc\fd\re')
  })

  it('replaces a lone surrogate and keeps a surrogate pair', () => {
    expect(escapeHtml('x\uD800y')).toBe('x\uFFFDy')
    expect(escapeHtml('x\uDC00y')).toBe('x\uFFFDy')
    expect(escapeHtml('x\uD83D\uDE00y')).toBe('x\uD83D\uDE00y')
  })
})

describe('cssString', () => {
  it('writes every character but letters, digits, space and plain punctuation as a hex escape', () => {
    // CSS Syntax Level 3, 4.3.7: a backslash and up to six hex digits, then one optional space.
    expect(cssString('a"b\\c</style>\f')).toBe('"a\\000022 b\\00005C c\\00003C \\00002F style\\00003E \\00000C "')
    expect(cssString('Preliminary results. (x, y)')).toBe('"Preliminary results. (x, y)"')
  })
})
