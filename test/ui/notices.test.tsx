/**
 * Markup of the worker and autosave notices and the status line in each state, rendered in node with
 * react-dom/server (interaction is covered by test/browser/workerFault and autosaveFault).
 */
import { renderToStaticMarkup } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import type { AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { createAnalysisClient } from '@/ui/analysisClient'
import type { AnalysisClient, WorkerLike } from '@/ui/analysisClient'
import type { AnalysisResponse } from '@/ui/analysisProtocol'
import { BalancePanelView } from '@/ui/extras'
import type { SaveStatus } from '@/ui/hooks/useAutosave'
import { SaveNotice } from '@/ui/SaveNotice'
import { StatusLine } from '@/ui/StatusLine'
import { WorkerNotice } from '@/ui/WorkerNotice'
import { fakeTimers } from '../helpers/fakeTimers'

const project = { name: 'p', floors: [{}], walls: {}, frameLines: {}, columns: {} } as unknown as Project
const result = { projectName: 'p', issues: [] } as unknown as AnalysisResult

function setup() {
  const clock = fakeTimers()
  const made: WorkerLike[] = []
  const client = createAnalysisClient({
    createWorker: () => {
      const w: WorkerLike = { postMessage: (_m: unknown) => undefined, terminate: () => undefined, onmessage: null, onerror: null }
      made.push(w)
      return w
    },
    analyze: () => result,
    timers: clock.timers,
  })
  const reply = (r: AnalysisResponse): void => made[made.length - 1]?.onmessage?.({ data: r } as MessageEvent<AnalysisResponse>)
  const notice = (c: AnalysisClient): string => renderToStaticMarkup(<WorkerNotice client={c} now={clock.timers.now} />)
  return { clock, client, made, reply, notice }
}

const status = (client: AnalysisClient, autosave: Partial<Parameters<typeof StatusLine>[0]> = {}): string =>
  renderToStaticMarkup(
    <StatusLine analysis={client.getState()} message={null} autosavedAt={null} floorLabel="" toolLabel="" selectionCount={0} {...autosave} />,
  )

describe('WorkerNotice', () => {
  it('renders nothing while an analysis is quick', () => {
    const { clock, client, notice } = setup()
    client.request(1, project)
    clock.advance(500)
    expect(notice(client)).toBe('')
  })

  it('offers Stop after a second and says still analysing past the grace period', () => {
    const { clock, client, notice } = setup()
    client.request(1, project)
    clock.advance(1500)
    expect(notice(client)).toContain('data-testid="analysis-stop"')
    expect(notice(client)).toContain('Analysing… 1 s')
    clock.advance(5000)
    expect(notice(client)).toContain('Still analysing (6 s)')
  })

  it('says results are not current after Stop, also in the status line', () => {
    const { client, reply, notice } = setup()
    client.request(1, project)
    reply({ revision: 1, ok: true, result, workerMs: 1 })
    client.request(2, project)
    client.stop()
    expect(notice(client)).toContain('not current')
    expect(notice(client)).toContain('rev 1')
    expect(status(client)).toContain('data-state="stopped"')
    expect(status(client)).toContain('results not current')
  })

  it('shows a worker fault with the reason and a Close button', () => {
    const { client, made, notice } = setup()
    client.request(1, project)
    made[0]?.onerror?.({ message: 'Out of memory' } as ErrorEvent)
    const html = notice(client)
    expect(html).toContain('role="alert"')
    expect(html).toContain('Out of memory')
    expect(html).toContain('analysed again')
    expect(html).toContain('data-testid="worker-fault-close"')
  })
})

describe('SaveNotice and the autosave status', () => {
  const failed: SaveStatus = { kind: 'failed', lastSavedAt: '2026-01-05T09:00:00.000Z', fallbackAt: null, error: '[autosave] quota' }

  it('warns that changes since the last save are not stored when autosave fails', () => {
    const html = renderToStaticMarkup(<SaveNotice status={failed} />)
    expect(html).toContain('since 09:00:00 UTC are not stored')
    expect(html).toContain('[autosave] quota')
  })

  it('renders nothing while saves succeed', () => {
    expect(renderToStaticMarkup(<SaveNotice status={{ kind: 'saved', lastSavedAt: 'x', fallbackAt: null, error: null }} />)).toBe('')
  })

  it('never shows an earlier save time when autosave is failing', () => {
    const { client } = setup()
    const html = status(client, { autosavedAt: '2026-01-05T09:00:00.000Z', autosaveProblem: 'FAILED' })
    expect(html).toContain('autosave FAILED')
    expect(html).not.toContain('autosaved 09:00:00')
  })
})

describe('BalancePanelView while searching', () => {
  it('shows Stop next to the search and a worker fault', () => {
    const html = renderToStaticMarkup(
      <BalancePanelView
        phase="working"
        result={null}
        error={null}
        elapsedS={70}
        isStale={false}
        inWorker
        slow
        fault="[balance] the worker stopped: gone. Restarted it and searching again."
        onFind={() => undefined}
        onApply={() => undefined}
        onStop={() => undefined}
      />,
    )
    expect(html).toContain('data-testid="balance-stop"')
    expect(html).toContain('still searching (70 s)')
    expect(html).toContain('data-testid="balance-fault"')
  })
})
