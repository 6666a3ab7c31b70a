/**
 * Analysis client on the UI thread. Latest request wins: at most one request is in the worker at a
 * time and only the newest waiting snapshot is kept, so a drag never builds a queue of stale work.
 * Results are keyed by the document revision they were computed for; `isStale` says whether the
 * shown result belongs to an older revision than the latest one asked for.
 */
import type { AnalysisOptions, AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { runAnalysisRequest } from './analysisProtocol'
import type { AnalysisRequest, AnalysisResponse } from './analysisProtocol'

/** The part of a Worker the client uses (lets tests pass a fake). */
export interface WorkerLike {
  postMessage(message: AnalysisRequest): void
  terminate(): void
  onmessage: ((event: MessageEvent<AnalysisResponse>) => void) | null
  onerror: ((event: ErrorEvent) => void) | null
}

export interface AnalysisState {
  /** Last successful result and the revision it belongs to. */
  readonly result: AnalysisResult | null
  readonly resultRevision: number | null
  /** Error text of the latest answered request, when it failed (null otherwise). */
  readonly error: string | null
  /** Latest revision asked for. */
  readonly requestedRevision: number | null
  /** Revision of the latest answer (success or error). */
  readonly answeredRevision: number | null
  /** True while the latest revision has no answer yet. */
  readonly isStale: boolean
  /** Whether analysis runs in a Web Worker (false: main-thread fallback). */
  readonly inWorker: boolean
  /** Round trip of the last answer (post to reply), ms. */
  readonly lastRoundTripMs: number | null
  /** Time from a revision being asked for to its answer, including waiting behind older work, ms. */
  readonly lastLatencyMs: number | null
  /** Time inside analyzeProject for the last answer, ms. */
  readonly lastWorkerMs: number | null
  /** Count of answers received and of requests skipped because a newer one replaced them. */
  readonly answered: number
  readonly skipped: number
}

export interface AnalysisClient {
  /** Ask for an analysis of `project` at `revision`; `options` overrides the client's defaults. */
  request(revision: number, project: Project, options?: AnalysisOptions): void
  getState(): AnalysisState
  subscribe(listener: () => void): () => void
  dispose(): void
}

export interface AnalysisClientOptions {
  /** Worker factory; return null to analyze on the main thread (tests, no-worker browsers). */
  readonly createWorker: () => WorkerLike | null
  /** Used only by the main-thread fallback. */
  readonly analyze: (project: Project, options: AnalysisOptions) => AnalysisResult
  readonly options?: AnalysisOptions
}

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

export function createAnalysisClient(config: AnalysisClientOptions): AnalysisClient {
  const options = config.options ?? {}
  const listeners = new Set<() => void>()
  let worker: WorkerLike | null = null
  try {
    worker = config.createWorker()
  } catch (err) {
    console.warn('[analysis] worker unavailable, analyzing on the main thread:', err)
    worker = null
  }
  let state: AnalysisState = {
    result: null,
    resultRevision: null,
    error: null,
    requestedRevision: null,
    answeredRevision: null,
    isStale: false,
    inWorker: worker !== null,
    lastRoundTripMs: null,
    lastLatencyMs: null,
    lastWorkerMs: null,
    answered: 0,
    skipped: 0,
  }
  let inFlight: { revision: number; sentAt: number } | null = null
  let waiting: AnalysisRequest | null = null
  const askedAt = new Map<number, number>()
  let disposed = false

  const set = (patch: Partial<AnalysisState>): void => {
    state = { ...state, ...patch }
    for (const listener of listeners) listener()
  }

  const receive = (response: AnalysisResponse): void => {
    if (disposed) return
    const sent = inFlight
    inFlight = null
    const t = now()
    const asked = askedAt.get(response.revision)
    for (const key of askedAt.keys()) if (key <= response.revision) askedAt.delete(key)
    const common = {
      answeredRevision: response.revision,
      lastRoundTripMs: sent ? t - sent.sentAt : null,
      lastLatencyMs: asked === undefined ? null : t - asked,
      lastWorkerMs: response.workerMs,
      answered: state.answered + 1,
      isStale: state.requestedRevision !== response.revision,
    }
    if (response.ok) {
      set({ ...common, result: response.result, resultRevision: response.revision, error: null })
    } else {
      set({ ...common, error: response.error })
    }
    pump()
  }

  const send = (request: AnalysisRequest): void => {
    inFlight = { revision: request.revision, sentAt: now() }
    if (worker) {
      worker.postMessage(request)
    } else {
      // Main-thread fallback: still asynchronous so a burst of edits collapses to the latest.
      setTimeout(() => receive(runAnalysisRequest(request, config.analyze)), 0)
    }
  }

  function pump(): void {
    if (inFlight || !waiting || disposed) return
    const next = waiting
    waiting = null
    send(next)
  }

  if (worker) {
    worker.onmessage = (event) => receive(event.data)
    worker.onerror = (event) => {
      event.preventDefault?.()
      const revision = inFlight?.revision ?? state.requestedRevision ?? 0
      receive({
        revision,
        ok: false,
        error: `[analysis] worker failed: ${event.message || 'unknown error'}`,
        workerMs: 0,
      })
    }
  }

  return {
    request(revision, project, override) {
      if (disposed) return
      if (waiting) set({ skipped: state.skipped + 1 })
      waiting = { revision, project, options: override ?? options }
      askedAt.set(revision, now())
      set({ requestedRevision: revision, isStale: state.answeredRevision !== revision })
      pump()
    },
    getState: () => state,
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
    dispose() {
      disposed = true
      worker?.terminate()
      listeners.clear()
    },
  }
}

/** The Vite-bundled analysis worker, or null where module workers are not available. */
export function createBrowserWorker(): WorkerLike | null {
  if (typeof Worker === 'undefined') return null
  return new Worker(new URL('./analysis.worker.ts', import.meta.url), {
    type: 'module',
    name: 'gyre-analysis',
  }) as unknown as WorkerLike
}
