import { describe, expect, it, vi } from 'vitest'
import { analysisGraceMs, createWorkerWatch, retryAllowed } from '@/ui/workerWatch'
import type { WatchableWorker } from '@/ui/workerWatch'
import { fakeTimers } from '../helpers/fakeTimers'

/** Workers that record what they get; the test fires their events. */
function fakeWorkers() {
  const made: { worker: WatchableWorker<string, string>; sent: string[]; terminated: boolean }[] = []
  const create = (): WatchableWorker<string, string> => {
    const entry = { sent: [] as string[], terminated: false } as (typeof made)[number]
    entry.worker = {
      postMessage: (m) => entry.sent.push(m),
      terminate: () => {
        entry.terminated = true
      },
      onmessage: null,
      onerror: null,
      onmessageerror: null,
    }
    made.push(entry)
    return entry.worker
  }
  return { made, create }
}

function setup() {
  const clock = fakeTimers()
  const workers = fakeWorkers()
  const log: string[] = []
  const watch = createWorkerWatch<string, string>({
    label: 'test',
    create: workers.create,
    timers: clock.timers,
    onMessage: (d) => log.push(`message ${d}`),
    onDeath: (reason, busy) => log.push(`death busy=${busy} ${reason}`),
    onSlow: (ms) => log.push(`slow ${ms}`),
  })
  return { clock, workers, log, watch }
}

describe('createWorkerWatch', () => {
  it('restarts the worker at once when it reports an error', () => {
    const { workers, log, watch } = setup()
    watch.post('job', 5000)
    workers.made[0]?.worker.onerror?.({ message: 'out of memory' } as ErrorEvent)
    expect(workers.made).toHaveLength(2)
    expect(workers.made[0]?.terminated).toBe(true)
    expect(log).toEqual(['death busy=true [test] the worker stopped: out of memory'])
    expect(watch.busySince()).toBeNull()
    expect(watch.restarts()).toBe(1)
  })

  it('treats a messageerror as a death', () => {
    const { workers, log } = setup()
    workers.made[0]?.worker.onmessageerror?.({} as MessageEvent)
    expect(workers.made).toHaveLength(2)
    expect(log[0]).toContain('messageerror')
    expect(log[0]).toContain('busy=false')
  })

  it('marks a silent job slow after its grace period and never restarts it by itself', () => {
    const { clock, workers, log, watch } = setup()
    watch.post('job', 5000)
    clock.advance(4999)
    expect(log).toEqual([])
    clock.advance(1)
    expect(log).toEqual(['slow 5000'])
    clock.advance(600_000)
    expect(log).toEqual(['slow 5000'])
    expect(workers.made).toHaveLength(1)
    expect(watch.busySince()).toBe(0)
  })

  it('does not call a job slow when its answer came within the grace period', () => {
    const { clock, workers, log, watch } = setup()
    watch.post('job', 5000)
    clock.advance(1000)
    workers.made[0]?.worker.onmessage?.({ data: 'done' } as MessageEvent<string>)
    clock.advance(10_000)
    expect(log).toEqual(['message done'])
    expect(watch.busySince()).toBeNull()
  })

  it('ignores a late answer of a worker stopped by cancel', () => {
    const { clock, workers, log, watch } = setup()
    watch.post('job', 5000)
    const old = workers.made[0]?.worker
    const oldOnMessage = old?.onmessage
    watch.cancel()
    expect(workers.made[0]?.terminated).toBe(true)
    expect(workers.made).toHaveLength(2)
    oldOnMessage?.call(old as never, { data: 'late' } as MessageEvent<string>)
    clock.advance(10_000)
    expect(log).toEqual([])
    expect(watch.restarts()).toBe(1)
  })

  it('reports no worker when the factory throws', () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => undefined)
    const watch = createWorkerWatch<string, string>({
      label: 'test',
      create: () => {
        throw new Error('no workers here')
      },
      onMessage: () => undefined,
      onDeath: () => undefined,
      onSlow: () => undefined,
    })
    expect(watch.hasWorker()).toBe(false)
    expect(warn).toHaveBeenCalledTimes(1)
    warn.mockRestore()
  })
})

describe('grace and retry rules', () => {
  it('grows the grace period with model size and time history', () => {
    expect(analysisGraceMs(0, false)).toBe(4000)
    expect(analysisGraceMs(200, false)).toBe(9000)
    expect(analysisGraceMs(200, true)).toBe(27000)
  })

  it('allows one retry per request', () => {
    expect(retryAllowed(1)).toBe(true)
    expect(retryAllowed(2)).toBe(false)
  })
})
