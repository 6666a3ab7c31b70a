/**
 * Browser tests of the Content-Security-Policy and of hostile names (headless Chromium): the built
 * app and the report it writes must make no request outside the local server (only data: and blob:
 * besides), and names built to break out of CSS or HTML must render as plain text with the caution
 * still visible. Before the fix a form feed in the project name broke out of the report's CSS.
 */
import { readFileSync } from 'node:fs'
import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openApp, waitForCurrentAnalysis } from './appDriver'
import { startBrowserSession } from './harness'
import type { BrowserSession } from './harness'

let session: BrowserSession

beforeAll(async () => {
  session = await startBrowserSession()
})
afterAll(async () => {
  await session?.close()
})

const HOSTILE_NAME =
  'Tower\f} body { display: none; background: url(http://example.invalid/leak.png) } x{ </style></script><img src="http://example.invalid/x.png"> "q" \'s\' \\22'
const HOSTILE_FLOOR = 'Floor\f} .caution-box { display: none } </style><b>'
const HOSTILE_WALL = '=HYPERLINK("http://example.invalid") </script>'

/** Every request URL the page makes, to check that none leaves the local server. */
function recordRequests(page: Page): string[] {
  const urls: string[] = []
  page.on('request', (r) => urls.push(r.url()))
  return urls
}

function outside(urls: readonly string[]): string[] {
  return urls.filter((u) => !u.startsWith(session.url) && !u.startsWith('data:') && !u.startsWith('blob:'))
}

function hostileProject(): string {
  const doc = JSON.parse(readFileSync(new URL('../../public/examples/corner-block.json', import.meta.url), 'utf8')) as {
    name: string
    floors: { name: string }[]
    walls: Record<string, { name: string }>
  }
  doc.name = HOSTILE_NAME
  doc.floors[0]!.name = HOSTILE_FLOOR
  Object.values(doc.walls)[0]!.name = HOSTILE_WALL
  return JSON.stringify(doc)
}

describe('content security policy', () => {
  it('serves the built app with its policy and makes no outside request', async () => {
    const { page, errors, context } = await session.newPage()
    const urls = recordRequests(page)
    await openApp(page, session.url)
    const policy = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content')
    expect(policy).toContain("default-src 'self'")
    expect(policy).toContain("script-src 'self'")
    // The analysis ran in its worker under the policy (the status says current, see openApp).
    expect(urls.length).toBeGreaterThan(1)
    // The report prints from a srcdoc frame when pop-ups are blocked: the policy must allow it.
    const framed = await page.evaluate(
      () =>
        new Promise<string>((done) => {
          const frame = document.createElement('iframe')
          frame.onload = () => done(frame.contentDocument?.getElementById('probe')?.textContent ?? 'no document')
          frame.srcdoc = '<!doctype html><style>p { color: red }</style><p id="probe">framed</p>'
          document.body.appendChild(frame)
        }),
    )
    expect(framed).toBe('framed')
    expect(outside(urls)).toEqual([])
    // A policy violation is logged as a console error, so none happened.
    expect(errors).toEqual([])
    await context.close()
  })

  it('opens a model with hostile names, shows them as text, and writes a report that renders them as text with the caution and no outside request', async () => {
    const { page, errors, context } = await session.newPage()
    const urls = recordRequests(page)
    await openApp(page, session.url)
    await page.getByTestId('file-input').setInputFiles({
      name: 'hostile.json',
      mimeType: 'application/json',
      buffer: Buffer.from(hostileProject()),
    })
    await page.waitForFunction(
      (name) =>
        (window as unknown as { __gyre: { store: { getState(): { doc: { name: string } } } } }).__gyre.store.getState().doc
          .name === name,
      HOSTILE_NAME,
    )
    await waitForCurrentAnalysis(page)
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('report-download').click()])
    const html = readFileSync(await download.path(), 'utf8')
    expect(outside(urls)).toEqual([])
    expect(errors).toEqual([])

    // Open the report from the local server (its own origin rules, like a file a user opens).
    const report = await context.newPage()
    const reportErrors: string[] = []
    report.on('console', (m) => {
      if (m.type() === 'error') reportErrors.push(m.text())
    })
    const reportUrls = recordRequests(report)
    const at = `${session.url}hostile-report.html`
    await report.route(at, (route) => route.fulfill({ status: 200, contentType: 'text/html; charset=utf-8', body: html }))
    await report.goto(at)
    await expect(report.locator('h1').textContent()).resolves.toBe(HOSTILE_NAME)
    await expect(report.locator('h1').isVisible()).resolves.toBe(true)
    await expect(report.locator('#caution-top').isVisible()).resolves.toBe(true)
    await expect(report.locator('#caution-top').textContent()).resolves.toContain('licensed structural engineer')
    await expect(report.locator('body').isVisible()).resolves.toBe(true)
    await expect(report.locator('img').count()).resolves.toBe(0)
    await expect(report.locator('script').count()).resolves.toBe(0)
    await expect(report.locator('b').count()).resolves.toBe(0)
    const floorCells = await report.locator('td', { hasText: 'Floor' }).allTextContents()
    expect(floorCells).toContain(HOSTILE_FLOOR)
    // The style sheet still applies: the caution box keeps its left border.
    const border = await report.locator('#caution-top').evaluate((el) => getComputedStyle(el).borderLeftWidth)
    expect(border).toBe('5px')
    await session.screenshot(report, 'security-hostile-report')
    // Only the report itself was fetched: nothing from outside, nothing else from the server.
    expect(reportUrls).toEqual([at])
    expect(reportErrors).toEqual([])
    await context.close()
  })
})
