import { describe, expect, it } from 'vitest'
import { suggestBalance } from '@/engine'
import type { BalanceResult } from '@/engine'
import { BalanceCancelled, createBalanceRunner } from '@/ui/extras/balanceRunner'
import type { BalanceWorkerLike } from '@/ui/extras/balanceRunner'
import type { BalanceRequest, BalanceResponse } from '@/ui/extras/balanceProtocol'
import { runBalanceRequest } from '@/ui/extras/balanceProtocol'
import { boxProject, fakeBalance } from './fixtures'

/** A worker stand-in: records requests; the test answers them by hand. */
function fakeWorker() {
  const sent: BalanceRequest[] = []
  let terminated = false
  const worker: BalanceWorkerLike = {
    postMessage: (m) => {
      sent.push(m as BalanceRequest)
    },
    terminate: () => {
      terminated = true
    },
    onmessage: null,
    onerror: null,
  }
  const answer = (response: BalanceResponse): void =>
    worker.onmessage?.({ data: response } as MessageEvent<BalanceResponse>)
  return { worker, sent, answer, isTerminated: () => terminated }
}

describe('createBalanceRunner', () => {
  it('posts the project to the worker and resolves with its answer', async () => {
    const project = boxProject()
    const fake = fakeWorker()
    const runner = createBalanceRunner({ createWorker: () => fake.worker, suggest: suggestBalance })
    expect(runner.inWorker).toBe(true)
    const promise = runner.run(project, { count: 2 })
    expect(fake.sent).toHaveLength(1)
    expect(fake.sent[0]?.project).toBe(project)
    expect(fake.sent[0]?.options).toEqual({ count: 2 })
    const result = fakeBalance(project)
    fake.answer({ id: fake.sent[0]?.id ?? -1, ok: true, result, workerMs: 3 })
    await expect(promise).resolves.toBe(result)
  })

  it('passes progress reports on and still waits for the answer', async () => {
    const project = boxProject()
    const fake = fakeWorker()
    const seen: number[] = []
    const runner = createBalanceRunner({
      createWorker: () => fake.worker,
      suggest: suggestBalance,
      onProgress: (p) => seen.push(p.fraction),
    })
    const promise = runner.run(project)
    const id = fake.sent[0]?.id ?? -1
    fake.answer({ id, progress: { phase: 'single', fraction: 0.25, trials: 10 } })
    fake.answer({ id, progress: { phase: 'combinations', fraction: 0.7, trials: 90 } })
    expect(seen).toEqual([0.25, 0.7])
    const result = fakeBalance(project)
    fake.answer({ id, ok: true, result, workerMs: 3 })
    await expect(promise).resolves.toBe(result)
  })

  it('reports progress from the search through the request runner, throttled', () => {
    const reports: number[] = []
    const response = runBalanceRequest(
      { id: 7, project: boxProject(), options: { maxChanges: 1, withDriftRatios: false } },
      suggestBalance,
      (m) => reports.push(m.progress.fraction),
    )
    expect('ok' in response && response.ok).toBe(true)
    // the first report always passes the 200 ms throttle
    expect(reports.length).toBeGreaterThan(0)
    for (const f of reports) expect(f).toBeGreaterThan(0)
  })

  it('cancels the older run when a newer one starts and ignores its late answer', async () => {
    const project = boxProject()
    const fake = fakeWorker()
    const runner = createBalanceRunner({ createWorker: () => fake.worker, suggest: suggestBalance })
    const first = runner.run(project)
    const second = runner.run(project)
    await expect(first).rejects.toBeInstanceOf(BalanceCancelled)
    const result = fakeBalance(project)
    fake.answer({ id: fake.sent[0]?.id ?? -1, ok: true, result: { ...result, trials: 1 }, workerMs: 1 })
    fake.answer({ id: fake.sent[1]?.id ?? -1, ok: true, result, workerMs: 1 })
    await expect(second).resolves.toBe(result)
  })

  it('rejects with the worker error text and terminates on dispose', async () => {
    const project = boxProject()
    const fake = fakeWorker()
    const runner = createBalanceRunner({ createWorker: () => fake.worker, suggest: suggestBalance })
    const p = runner.run(project)
    fake.answer({ id: fake.sent[0]?.id ?? -1, ok: false, error: '[balance] boom' })
    await expect(p).rejects.toThrow('[balance] boom')
    const q = runner.run(project)
    runner.dispose()
    await expect(q).rejects.toBeInstanceOf(BalanceCancelled)
    expect(fake.isTerminated()).toBe(true)
  })

  it('finds the exact fix of the eccentric box on the main thread when there is no worker', async () => {
    // One storey, y-frames 200 MN/m at x = 0 and 100 MN/m at x = 10, CM at x = 5 (notes of
    // eccentric-box.json). CR of shear-type elements = sum(k x) / sum(k) (common practice), so the
    // CR reaches the CM when the west frame moves to x = 2.5 m (200 * 2.5 + 100 * 10 = 300 * 5) or
    // the east frame doubles (200 * 0 + 200 * 10 = 400 * 5).
    const runner = createBalanceRunner({ createWorker: () => null, suggest: suggestBalance })
    expect(runner.inWorker).toBe(false)
    const result: BalanceResult = await runner.run(boxProject(), { count: 3, withDriftRatios: false })
    const best = result.suggestions[0]
    expect(best?.scoreAfter ?? 1).toBeLessThan(1e-6)
    const fixes = result.suggestions.slice(0, 2).map((s) => s.description)
    expect(fixes.some((d) => d.includes("'West line' 2.50 m towards +x (to x = 2.50 m)"))).toBe(true)
    expect(fixes.some((d) => d.includes("'East line' to x2.00"))).toBe(true)
  })
})

describe('createBalanceRunner with a failing worker', () => {
  const factory = () => {
    const made: ReturnType<typeof fakeWorker>[] = []
    const create = (): BalanceWorkerLike => {
      const fake = fakeWorker()
      made.push(fake)
      return fake.worker
    }
    return { made, create, newest: () => made[made.length - 1] as ReturnType<typeof fakeWorker> }
  }

  it('restarts a crashed worker and sends the running search again', async () => {
    const workers = factory()
    const faults: string[] = []
    const runner = createBalanceRunner({
      createWorker: workers.create,
      suggest: suggestBalance,
      onFault: (reason, retried) => faults.push(`${retried} ${reason}`),
    })
    const project = boxProject()
    const p = runner.run(project)
    workers.newest().worker.onerror?.({ message: 'gone' } as ErrorEvent)
    expect(workers.made).toHaveLength(2)
    expect(workers.made[0]?.isTerminated()).toBe(true)
    expect(faults).toEqual(['true [balance] the worker stopped: gone'])
    const resent = workers.newest().sent[0]
    expect(resent?.project).toBe(project)
    const result = fakeBalance(project)
    workers.newest().answer({ id: resent?.id ?? -1, ok: true, result, workerMs: 1 })
    await expect(p).resolves.toBe(result)
  })

  it('rejects the search when it kills the worker a second time', async () => {
    const workers = factory()
    const runner = createBalanceRunner({ createWorker: workers.create, suggest: suggestBalance })
    const p = runner.run(boxProject())
    workers.newest().worker.onerror?.({ message: 'one' } as ErrorEvent)
    workers.newest().worker.onmessageerror?.({} as MessageEvent)
    await expect(p).rejects.toThrow('not retried')
    expect(workers.newest().sent).toEqual([])
  })

  it('stops a long search: the promise is cancelled and a fresh worker takes the next one', async () => {
    const workers = factory()
    const runner = createBalanceRunner({ createWorker: workers.create, suggest: suggestBalance })
    const p = runner.run(boxProject())
    runner.stop()
    await expect(p).rejects.toBeInstanceOf(BalanceCancelled)
    expect(workers.made[0]?.isTerminated()).toBe(true)
    void runner.run(boxProject()).catch(() => undefined)
    expect(workers.newest().sent).toHaveLength(1)
    expect(workers.made).toHaveLength(2)
  })
})

describe('runBalanceRequest', () => {
  it('turns a thrown error into an error response naming the subsystem', () => {
    const r = runBalanceRequest({ id: 7, project: boxProject(), options: {} }, () => {
      throw new Error('bad input')
    })
    expect(r).toEqual({ id: 7, ok: false, error: '[balance] bad input' })
  })
})
