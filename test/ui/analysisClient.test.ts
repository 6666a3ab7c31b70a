import { describe, expect, it } from 'vitest'
import type { AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { createAnalysisClient } from '@/ui/analysisClient'
import type { WorkerLike } from '@/ui/analysisClient'
import type { AnalysisRequest, AnalysisResponse } from '@/ui/analysisProtocol'
import { runAnalysisRequest } from '@/ui/analysisProtocol'
import { fakeTimers } from '../helpers/fakeTimers'

const project = (name: string): Project => ({ name }) as unknown as Project
const result = (name: string): AnalysisResult => ({ projectName: name, issues: [] }) as unknown as AnalysisResult

/** A worker whose replies the test releases by hand. */
function fakeWorker() {
  const posted: AnalysisRequest[] = []
  const worker: WorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage: (m) => posted.push(m as AnalysisRequest),
    terminate: () => undefined,
  }
  const reply = (response: AnalysisResponse): void => {
    worker.onmessage?.({ data: response } as MessageEvent<AnalysisResponse>)
  }
  return { worker, posted, reply }
}

describe('createAnalysisClient', () => {
  it('keeps only the latest waiting request while one is in the worker', () => {
    const fake = fakeWorker()
    const client = createAnalysisClient({ createWorker: () => fake.worker, analyze: () => result('x') })
    client.request(1, project('r1'))
    client.request(2, project('r2'))
    client.request(3, project('r3'))
    expect(fake.posted.map((r) => r.revision)).toEqual([1])
    fake.reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    // Revision 2 was replaced by 3 before the worker was free: it is never computed.
    expect(fake.posted.map((r) => r.revision)).toEqual([1, 3])
    expect(client.getState().skipped).toBe(2 - 1)
  })

  it('marks a result stale until the latest revision is answered', () => {
    const fake = fakeWorker()
    const client = createAnalysisClient({ createWorker: () => fake.worker, analyze: () => result('x') })
    client.request(1, project('r1'))
    fake.reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    expect(client.getState().isStale).toBe(false)
    client.request(2, project('r2'))
    const waiting = client.getState()
    expect(waiting.isStale).toBe(true)
    expect(waiting.resultRevision).toBe(1)
    expect(waiting.result?.projectName).toBe('r1')
    fake.reply({ revision: 2, ok: true, result: result('r2'), workerMs: 1 })
    expect(client.getState().isStale).toBe(false)
    expect(client.getState().resultRevision).toBe(2)
  })

  it('reports an engine error and keeps the last good result, labelled with its revision', () => {
    const fake = fakeWorker()
    const client = createAnalysisClient({ createWorker: () => fake.worker, analyze: () => result('x') })
    client.request(1, project('r1'))
    fake.reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    client.request(2, project('r2'))
    fake.reply({ revision: 2, ok: false, error: '[engine] broken', workerMs: 1 })
    const s = client.getState()
    expect(s.error).toBe('[engine] broken')
    expect(s.resultRevision).toBe(1)
    expect(s.answeredRevision).toBe(2)
  })

  it('analyzes on the main thread, asynchronously, when no worker can be made', async () => {
    const client = createAnalysisClient({ createWorker: () => null, analyze: (p) => result(p.name) })
    client.request(7, project('main'))
    expect(client.getState().result).toBeNull()
    await new Promise<void>((done) => {
      const off = client.subscribe(() => {
        if (client.getState().answeredRevision === 7) {
          off()
          done()
        }
      })
    })
    expect(client.getState().inWorker).toBe(false)
    expect(client.getState().result?.projectName).toBe('main')
  })
})

/** A factory of fake workers: each restart makes a new one; the test answers or kills the newest. */
function workerFactory() {
  const made: ReturnType<typeof fakeWorker>[] = []
  let terminated = 0
  const create = (): WorkerLike => {
    const fake = fakeWorker()
    fake.worker.terminate = () => {
      terminated += 1
    }
    made.push(fake)
    return fake.worker
  }
  const newest = () => made[made.length - 1] as ReturnType<typeof fakeWorker>
  const crash = (message = 'crashed'): void => newest().worker.onerror?.({ message } as ErrorEvent)
  return { made, create, newest, crash, terminated: () => terminated }
}

const realProject = (floors: number): Project =>
  ({ name: 'p', floors: Array.from({ length: floors }, () => ({})), walls: {}, frameLines: {}, columns: {} }) as unknown as Project

describe('createAnalysisClient with a failing worker', () => {
  it('restarts a crashed worker and re-runs the latest request when the worker dies mid-analysis', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(1, project('r1'))
    workers.crash('out of memory')
    expect(workers.made).toHaveLength(2)
    expect(workers.terminated()).toBe(1)
    expect(workers.newest().posted.map((r) => r.revision)).toEqual([1])
    const fault = client.getState().fault
    expect(fault?.reason).toContain('out of memory')
    expect(fault?.retried).toBe(true)
    workers.newest().reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    expect(client.getState().isStale).toBe(false)
    expect(client.getState().resultRevision).toBe(1)
    expect(client.getState().fault).not.toBeNull()
  })

  it('sends the newest waiting request, not the lost one, after a crash', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(1, project('r1'))
    client.request(2, project('r2'))
    workers.crash()
    expect(workers.newest().posted.map((r) => r.revision)).toEqual([2])
  })

  it('reports an error instead of retrying when the same request kills the worker twice', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(1, project('r1'))
    workers.crash('first')
    workers.crash('second')
    expect(workers.made).toHaveLength(3)
    expect(workers.newest().posted).toEqual([])
    const s = client.getState()
    expect(s.error).toContain('not retried')
    expect(s.answeredRevision).toBe(1)
    expect(s.fault?.retried).toBe(false)
    // A new edit is analysed by the fresh worker.
    client.request(2, project('r2'))
    expect(workers.newest().posted.map((r) => r.revision)).toEqual([2])
  })

  it('marks a silent analysis slow after the grace period and keeps the worker', () => {
    const workers = workerFactory()
    const clock = fakeTimers()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: clock.timers })
    client.request(1, realProject(3))
    expect(client.getState().busySince).toBe(0)
    clock.advance(4000)
    // 3 floors and no elements: grace 4000 + 25 * 3 ms (workerWatch.analysisGraceMs).
    expect(client.getState().slow).toBe(false)
    clock.advance(75)
    expect(client.getState().slow).toBe(true)
    expect(workers.made).toHaveLength(1)
  })

  it('leaves results stale, never current, when the user stops an analysis', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(1, project('r1'))
    workers.newest().reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    client.request(2, project('r2'))
    const frozen = workers.newest()
    client.stop()
    let s = client.getState()
    expect(workers.made).toHaveLength(2)
    expect(s.isStale).toBe(true)
    expect(s.stoppedRevision).toBe(2)
    expect(s.resultRevision).toBe(1)
    expect(s.busySince).toBeNull()
    // A late answer of the stopped worker changes nothing.
    frozen.worker.onmessage?.({ data: { revision: 2, ok: true, result: result('late'), workerMs: 1 } } as MessageEvent<AnalysisResponse>)
    frozen.reply({ revision: 2, ok: true, result: result('late'), workerMs: 1 })
    s = client.getState()
    expect(s.resultRevision).toBe(1)
    expect(s.isStale).toBe(true)
    // A new edit analyses again on the fresh worker.
    client.request(3, project('r3'))
    expect(client.getState().stoppedRevision).toBeNull()
    expect(workers.newest().posted.map((r) => r.revision)).toEqual([3])
    workers.newest().reply({ revision: 3, ok: true, result: result('r3'), workerMs: 1 })
    expect(client.getState().isStale).toBe(false)
  })

  it('re-sends the stopped request on retryStopped', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(5, project('r5'))
    client.stop()
    client.retryStopped()
    expect(workers.newest().posted.map((r) => r.revision)).toEqual([5])
    expect(client.getState().stoppedRevision).toBeNull()
  })

  it('restarts an idle worker that dies and keeps the shown result current', () => {
    const workers = workerFactory()
    const client = createAnalysisClient({ createWorker: workers.create, analyze: () => result('x'), timers: fakeTimers().timers })
    client.request(1, project('r1'))
    workers.newest().reply({ revision: 1, ok: true, result: result('r1'), workerMs: 1 })
    workers.newest().worker.onmessageerror?.({} as MessageEvent)
    expect(workers.made).toHaveLength(2)
    expect(client.getState().fault?.retried).toBe(false)
    expect(client.getState().isStale).toBe(false)
    client.dismissFault()
    expect(client.getState().fault).toBeNull()
  })
})

describe('runAnalysisRequest', () => {
  it('turns a throw into an error answer prefixed by subsystem', () => {
    const answer = runAnalysisRequest({ revision: 4, project: project('p'), options: {} }, () => {
      throw new Error('buildStructure: not implemented yet')
    })
    expect(answer.ok).toBe(false)
    if (!answer.ok) expect(answer.error).toBe('[engine] buildStructure: not implemented yet')
    expect(answer.revision).toBe(4)
  })
})
