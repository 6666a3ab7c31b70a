import { describe, expect, it } from 'vitest'
import type { AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { createAnalysisClient } from '@/ui/analysisClient'
import type { WorkerLike } from '@/ui/analysisClient'
import type { AnalysisRequest, AnalysisResponse } from '@/ui/analysisProtocol'
import { runAnalysisRequest } from '@/ui/analysisProtocol'

const project = (name: string): Project => ({ name }) as unknown as Project
const result = (name: string): AnalysisResult => ({ projectName: name, issues: [] }) as unknown as AnalysisResult

/** A worker whose replies the test releases by hand. */
function fakeWorker() {
  const posted: AnalysisRequest[] = []
  const worker: WorkerLike = {
    onmessage: null,
    onerror: null,
    postMessage: (m) => posted.push(m),
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
