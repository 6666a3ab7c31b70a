/**
 * Runs the balance assistant in a worker (or, where there is none, on the main thread after a
 * yield). One search at a time: a new run supersedes the previous one, whose promise then rejects
 * with a BalanceCancelled error so the panel can ignore it. Worker faults follow ../workerWatch.ts:
 * an error or messageerror restarts the worker and sends the running search once more (a second death
 * on the same search rejects it with the reason); `stop()` terminates a long search and starts a fresh
 * worker.
 */
import type { BalanceOptions, BalanceProgress, BalanceResult } from '@/engine'
import type { Project } from '@/model'
import { isBalanceProgress, runBalanceRequest } from './balanceProtocol'
import type { BalanceRequest, BalanceResponse } from './balanceProtocol'
import type { WorkerDebugMessage } from '../workerDebug'
import { createWorkerWatch, retryAllowed } from '../workerWatch'
import type { WatchTimers } from '../workerWatch'

/** The part of a Worker the runner uses (tests pass a fake). */
export interface BalanceWorkerLike {
  postMessage(message: BalanceRequest | WorkerDebugMessage): void
  terminate(): void
  onmessage: ((event: MessageEvent<BalanceResponse>) => void) | null
  onerror: ((event: ErrorEvent) => void) | null
  onmessageerror?: ((event: MessageEvent) => void) | null
}

/** Silence before a search counts as slow, ms (a search runs many analyses; common practice here). */
export const BALANCE_GRACE_MS = 60_000

/** Thrown into a superseded or disposed run. */
export class BalanceCancelled extends Error {
  constructor() {
    super('[balance] search replaced by a newer one')
    this.name = 'BalanceCancelled'
  }
}

export interface BalanceRunner {
  run(project: Project, options?: BalanceOptions): Promise<BalanceResult>
  /** Whether the search runs in a worker (false: main-thread fallback). */
  readonly inWorker: boolean
  /** Stop the running search (its promise rejects with BalanceCancelled) and start a fresh worker. */
  stop(): void
  /** Test hooks: make the worker crash (error event) or freeze (never answers). */
  readonly debug: { crash(): void; freeze(): void }
  dispose(): void
}

export interface BalanceRunnerConfig {
  /** Worker factory; return null to search on the main thread. */
  readonly createWorker: () => BalanceWorkerLike | null
  /** Used only by the main-thread fallback. */
  readonly suggest: (project: Project, options: BalanceOptions) => BalanceResult
  /** Told when the worker died and was restarted (`retried`: the search was sent again). */
  readonly onFault?: (reason: string, retried: boolean) => void
  /** Called once when a search passes BALANCE_GRACE_MS without an answer. */
  readonly onSlow?: () => void
  /** Progress reports of the running search (from the worker). */
  readonly onProgress?: (progress: BalanceProgress) => void
  readonly timers?: WatchTimers
}

/** The Vite-bundled balance worker, or null where module workers are not available. */
export function createBalanceWorker(): BalanceWorkerLike | null {
  if (typeof Worker === 'undefined') return null
  return new Worker(new URL('./balance.worker.ts', import.meta.url), {
    type: 'module',
    name: 'gyre-balance',
  }) as unknown as BalanceWorkerLike
}

export function createBalanceRunner(config: BalanceRunnerConfig): BalanceRunner {
  let nextId = 1
  let pending: {
    id: number
    request: BalanceRequest
    deaths: number
    resolve: (r: BalanceResult) => void
    reject: (e: Error) => void
  } | null = null
  let disposed = false

  const settle = (response: BalanceResponse): void => {
    if (!pending || response.id !== pending.id) return
    if (isBalanceProgress(response)) {
      config.onProgress?.(response.progress)
      return
    }
    const p = pending
    pending = null
    if (response.ok) p.resolve(response.result)
    else p.reject(new Error(response.error))
  }

  const watch = createWorkerWatch<BalanceRequest | WorkerDebugMessage, BalanceResponse>({
    label: 'balance',
    create: config.createWorker,
    ...(config.timers ? { timers: config.timers } : {}),
    onMessage: settle,
    isProgress: (m) => isBalanceProgress(m),
    onSlow: () => config.onSlow?.(),
    onDeath: (reason, busy) => {
      const p = busy ? pending : null
      if (!p) {
        config.onFault?.(reason, false)
        return
      }
      p.deaths += 1
      if (retryAllowed(p.deaths)) {
        config.onFault?.(reason, true)
        watch.post(p.request, BALANCE_GRACE_MS)
        return
      }
      config.onFault?.(reason, false)
      pending = null
      p.reject(new Error(`${reason}; it stopped again on the same search, so it is not retried.`))
    },
  })

  return {
    inWorker: watch.hasWorker(),
    run(project, options = {}) {
      if (disposed) return Promise.reject(new BalanceCancelled())
      if (pending) pending.reject(new BalanceCancelled())
      const id = nextId++
      const request: BalanceRequest = { id, project, options }
      return new Promise<BalanceResult>((resolve, reject) => {
        pending = { id, request, deaths: 0, resolve, reject }
        if (watch.hasWorker()) watch.post(request, BALANCE_GRACE_MS)
        else setTimeout(() => settle(runBalanceRequest(request, config.suggest)), 0)
      })
    },
    stop() {
      if (disposed || !pending) return
      const p = pending
      pending = null
      if (watch.hasWorker()) watch.cancel()
      p.reject(new BalanceCancelled())
    },
    debug: {
      crash: () => watch.postRaw({ gyreDebug: 'crash' }),
      freeze: () => watch.postRaw({ gyreDebug: 'freeze' }),
    },
    dispose() {
      disposed = true
      if (pending) pending.reject(new BalanceCancelled())
      pending = null
      watch.dispose()
    },
  }
}
