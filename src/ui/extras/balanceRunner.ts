/**
 * Runs the balance assistant in a worker (or, where there is none, on the main thread after a
 * yield). One search at a time: a new run supersedes the previous one, whose promise then rejects
 * with a BalanceCancelled error so the panel can ignore it.
 */
import type { BalanceOptions, BalanceResult } from '@/engine'
import type { Project } from '@/model'
import { runBalanceRequest } from './balanceProtocol'
import type { BalanceRequest, BalanceResponse } from './balanceProtocol'

/** The part of a Worker the runner uses (tests pass a fake). */
export interface BalanceWorkerLike {
  postMessage(message: BalanceRequest): void
  terminate(): void
  onmessage: ((event: MessageEvent<BalanceResponse>) => void) | null
  onerror: ((event: ErrorEvent) => void) | null
}

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
  dispose(): void
}

export interface BalanceRunnerConfig {
  /** Worker factory; return null to search on the main thread. */
  readonly createWorker: () => BalanceWorkerLike | null
  /** Used only by the main-thread fallback. */
  readonly suggest: (project: Project, options: BalanceOptions) => BalanceResult
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
  let worker: BalanceWorkerLike | null = null
  try {
    worker = config.createWorker()
  } catch (err) {
    console.warn('[balance] worker unavailable, searching on the main thread:', err)
  }
  let nextId = 1
  let pending: {
    id: number
    resolve: (r: BalanceResult) => void
    reject: (e: Error) => void
  } | null = null
  let disposed = false

  const settle = (response: BalanceResponse): void => {
    if (!pending || response.id !== pending.id) return
    const p = pending
    pending = null
    if (response.ok) p.resolve(response.result)
    else p.reject(new Error(response.error))
  }

  if (worker) {
    worker.onmessage = (event) => settle(event.data)
    worker.onerror = (event) => {
      if (!pending) return
      const p = pending
      pending = null
      p.reject(new Error(`[balance] worker failed: ${event.message || 'unknown error'}`))
    }
  }

  return {
    inWorker: worker !== null,
    run(project, options = {}) {
      if (disposed) return Promise.reject(new BalanceCancelled())
      if (pending) pending.reject(new BalanceCancelled())
      const id = nextId++
      const request: BalanceRequest = { id, project, options }
      return new Promise<BalanceResult>((resolve, reject) => {
        pending = { id, resolve, reject }
        if (worker) worker.postMessage(request)
        else setTimeout(() => settle(runBalanceRequest(request, config.suggest)), 0)
      })
    },
    dispose() {
      disposed = true
      if (pending) pending.reject(new BalanceCancelled())
      pending = null
      worker?.terminate()
    },
  }
}
