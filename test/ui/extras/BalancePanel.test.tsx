/**
 * Render smoke tests in node with react-dom/server: the pinned jsdom needs Node 22 while the
 * project runs on Node 20, so these check the markup of each state; clicks are covered by the
 * runner tests and belong in the browser suite.
 */
import { renderToStaticMarkup } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { CAUTION, CAUTION_SHORT } from '@/model'
import { BalancePanel, BalancePanelView } from '@/ui/extras'
import type { BalanceRunner } from '@/ui/extras'
import { boxProject, fakeBalance } from './fixtures'

const noop = (): void => {}
const stubRunner = (): BalanceRunner => ({
  inWorker: true,
  run: () => new Promise(() => {}),
  stop: noop,
  debug: { crash: noop, freeze: noop },
  dispose: noop,
})

const view = (over: Partial<Parameters<typeof BalancePanelView>[0]> = {}): string =>
  renderToStaticMarkup(
    <BalancePanelView
      phase="idle"
      result={null}
      error={null}
      elapsedS={0}
      isStale={false}
      inWorker
      onFind={noop}
      onApply={noop}
      {...over}
    />,
  )

describe('BalancePanel', () => {
  it('renders a Find changes button and leaves the caution to the screen line before any search', () => {
    const html = renderToStaticMarkup(
      <BalancePanel project={boxProject()} onApply={noop} createRunner={stubRunner} />,
    )
    expect(html).toContain('data-testid="balance-find"')
    expect(html).toContain('>Find changes</button>')
    expect(html).not.toContain(CAUTION_SHORT)
    expect(html).not.toContain(CAUTION)
    expect(html).not.toContain('balance-apply-0')
  })
})

describe('BalancePanelView', () => {
  it('shows a working state with a disabled button while searching', () => {
    const html = view({ phase: 'working', elapsedS: 3 })
    expect(html).toContain('data-testid="balance-working"')
    expect(html).toMatch(/data-testid="balance-find" disabled=""/)
    expect(html).toContain('3 s')
  })

  it('lists each suggestion with before/after numbers and an Apply button', () => {
    const result = fakeBalance(boxProject())
    const html = view({ phase: 'done', result })
    expect(html).toContain('data-testid="balance-apply-0"')
    expect(html).toContain('data-testid="balance-apply-1"')
    expect(html).not.toContain('data-testid="balance-apply-2"')
    expect(html).toContain('Move frame line &#x27;West line&#x27; 2.50 m towards +x (to x = 2.50 m)')
    // formatNumber to 3 significant digits: 0.2983 -> 0.298, 1.3 -> 1.3
    expect(html).toContain('0.298')
    expect(html).toContain('score S')
    expect(html).toContain('worst e/r')
    expect(html).toContain('worst drift max/avg')
    expect(html).not.toContain(CAUTION_SHORT)
  })

  it('disables Apply and says so when the model changed since the search', () => {
    const html = view({ phase: 'done', result: fakeBalance(boxProject()), isStale: true })
    expect(html).toContain('data-testid="balance-stale"')
    expect(html).toMatch(/data-testid="balance-apply-0"[^>]*disabled=""/)
  })

  it('shows the error text and the engine message when there is nothing to suggest', () => {
    expect(view({ phase: 'error', error: '[balance] boom' })).toContain('[balance] boom')
    const empty = { ...fakeBalance(boxProject()), suggestions: [], message: 'Already balanced.' }
    expect(view({ phase: 'done', result: empty })).toContain('Already balanced.')
  })
})

describe('BalancePanelView measures and re-validation', () => {
  it('shows all four measures before and after and says in words which get worse', () => {
    const html = view({ phase: 'done', result: fakeBalance(boxProject()) })
    expect(html).toContain('period ratio T_torsion/T_transl.')
    expect(html).toContain('data-testid="balance-worse-1"')
    expect(html).toContain('Gets worse: period ratio T_torsion/T_translation worse (1.100 → 1.200).')
    expect(html).not.toContain('data-testid="balance-worse-0"')
    expect(html).toMatch(/<span class="gx-worse"> worse<\/span>/)
  })

  it('enables Apply per suggestion from the re-validation, not from the stale flag', () => {
    const html = view({ phase: 'done', result: fakeBalance(boxProject()), isStale: true, canApply: [true, false] })
    expect(html).not.toMatch(/data-testid="balance-apply-0"[^>]*disabled=""/)
    expect(html).toMatch(/data-testid="balance-apply-1"[^>]*disabled=""/)
    expect(html).toContain('data-testid="balance-not-applicable-1"')
  })

  it('shows the search settings with their defaults', () => {
    const html = renderToStaticMarkup(<BalancePanel project={boxProject()} onApply={noop} createRunner={stubRunner} />)
    expect(html).toContain('data-testid="balance-objective"')
    expect(html).toMatch(/data-testid="balance-min-thickness"[^>]*value="200"/)
    expect(html).toMatch(/data-testid="balance-max-move"[^>]*value="6"/)
  })
})
