/**
 * Analysis client on the UI thread. Latest request wins: at most one request is in the worker at a
 * time and only the newest waiting snapshot is kept, so a drag never builds a queue of stale work.
 * Results are keyed by the document revision they were computed for; `isStale` says whether the
 * shown result belongs to an older revision than the latest one asked for.
 *
 * Worker faults follow workerWatch.ts: an error or messageerror restarts the worker and re-sends the
 * latest request (once per request; a second death on the same request is reported as an error); a
 * silent worker is only marked `slow`; `stop()` terminates it, starts a fresh one and leaves the
 * shown result stale (never current) until the next request is answered.
 */
import type { AnalysisOptions, AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { runAnalysisRequest } from './analysisProtocol'
import type { AnalysisRequest, AnalysisResponse } from './analysisProtocol'
import type { WorkerDebugMessage } from './workerDebug'
import { analysisGraceMs, createWorkerWatch, retryAllowed } from './workerWatch'
import type { WatchTimers } from './workerWatch'

/** The part of a Worker the client uses (lets tests pass a fake). */
export interface WorkerLike {
  postMessage(message: AnalysisRequest | WorkerDebugMessage): void
  terminate(): void
  onmessage: ((event: MessageEvent<AnalysisResponse>) => void) | null
  onerror: ((event: ErrorEvent) => void) | null
  onmessageerror?: ((event: MessageEvent) => void) | null
}

/** The last worker fault: why it stopped, when (ms, client clock) and which revision it was on. */
export interface WorkerFault {
  readonly reason: string
  readonly at: number
  readonly revision: number | null
  /** Whether the latest request was sent again to the fresh worker. */
  readonly retried: boolean
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
  /** When the request now in the worker was sent (client clock, ms), or null when the worker is idle. */
  readonly busySince: number | null
  /** True when the request in the worker passed its grace period without an answer. */
  readonly slow: boolean
  /** Revision whose analysis the user stopped; its results are not computed (null otherwise). */
  readonly stoppedRevision: number | null
  /** Last worker death (error or messageerror), kept until `dismissFault()`. */
  readonly fault: WorkerFault | null
  /** Workers replaced so far (deaths and stops). */
  readonly restarts: number
}

export interface AnalysisClient {
  /** Ask for an analysis of `project` at `revision`; `options` overrides the client's defaults. */
  request(revision: number, project: Project, options?: AnalysisOptions): void
  getState(): AnalysisState
  subscribe(listener: () => void): () => void
  /** Stop the running analysis: terminate the worker, start a fresh one, keep results stale. */
  stop(): void
  /** Ask again for the request the user stopped (nothing when none was stopped). */
  retryStopped(): void
  /** Forget the last worker fault (the notice's Close button). */
  dismissFault(): void
  /** Test hooks: make the worker crash (error event) or freeze (never answers). */
  readonly debug: { crash(): void; freeze(): void }
  dispose(): void
}

export interface AnalysisClientOptions {
  /** Worker factory; return null to analyze on the main thread (tests, no-worker browsers). */
  readonly createWorker: () => WorkerLike | null
  /** Used only by the main-thread fallback. */
  readonly analyze: (project: Project, options: AnalysisOptions) => AnalysisResult
  readonly options?: AnalysisOptions
  /** Timers of the worker watch and the client clock (tests inject fakes). */
  readonly timers?: WatchTimers
}

const defaultNow = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/** Element count that sizes the grace period of one request. */
function sizeOf(project: Project): number {
  const count = (r: Readonly<Record<string, unknown>> | undefined): number => (r ? Object.keys(r).length : 0)
  return count(project.walls) + count(project.frameLines) + count(project.columns) + (project.floors?.length ?? 0)
}

export function createAnalysisClient(config: AnalysisClientOptions): AnalysisClient {
  const options = config.options ?? {}
  const timers = config.timers
  const now = timers ? () => timers.now() : defaultNow
  const listeners = new Set<() => void>()
  let inFlight: { request: AnalysisRequest; sentAt: number; deaths: number } | null = null
  let waiting: AnalysisRequest | null = null
  const askedAt = new Map<number, number>()
  let stoppedRequest: AnalysisRequest | null = null
  let disposed = false

  const watch = createWorkerWatch<AnalysisRequest | WorkerDebugMessage, AnalysisResponse>({
    label: 'analysis',
    create: config.createWorker,
    ...(timers ? { timers } : {}),
    onMessage: (data) => receive(data),
    onSlow: () => set({ slow: true }),
    onDeath: (reason, busy) => died(reason, busy),
  })

  let state: AnalysisState = {
    result: null,
    resultRevision: null,
    error: null,
    requestedRevision: null,
    answeredRevision: null,
    isStale: false,
    inWorker: watch.hasWorker(),
    lastRoundTripMs: null,
    lastLatencyMs: null,
    lastWorkerMs: null,
    answered: 0,
    skipped: 0,
    busySince: null,
    slow: false,
    stoppedRevision: null,
    fault: null,
    restarts: 0,
  }

  const set = (patch: Partial<AnalysisState>): void => {
    state = { ...state, ...patch }
    for (const listener of listeners) listener()
  }

  function receive(response: AnalysisResponse): void {
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
      busySince: null,
      slow: false,
    }
    if (response.ok) {
      set({ ...common, result: response.result, resultRevision: response.revision, error: null })
    } else {
      set({ ...common, error: response.error })
    }
    pump()
  }

  function died(reason: string, busy: boolean): void {
    if (disposed) return
    const lost = busy ? inFlight : null
    inFlight = null
    // The newest waiting request replaces the lost one; otherwise the lost one is sent once more.
    const deaths = (lost?.deaths ?? 0) + 1
    const retry = lost !== null && (waiting !== null || retryAllowed(deaths))
    const revision = lost?.request.revision ?? null
    set({
      fault: { reason, at: now(), revision, retried: retry },
      restarts: watch.restarts(),
      busySince: null,
      slow: false,
      inWorker: watch.hasWorker(),
    })
    if (lost && !waiting) {
      if (retry) {
        send(lost.request, deaths)
        return
      }
      receive({
        revision: lost.request.revision,
        ok: false,
        error: `${reason}; it stopped again on the same model (revision ${lost.request.revision}), so it is not retried. Change the model to try again.`,
        workerMs: 0,
      })
      return
    }
    pump()
  }

  const send = (request: AnalysisRequest, deaths = 0): void => {
    const sentAt = now()
    inFlight = { request, sentAt, deaths }
    if (watch.hasWorker()) {
      const grace = analysisGraceMs(sizeOf(request.project), request.options.timeHistory === true)
      watch.post(request, grace)
      set({ busySince: watch.busySince() ?? sentAt, slow: false })
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

  const request = (revision: number, project: Project, override?: AnalysisOptions): void => {
    if (disposed) return
    stoppedRequest = null
    if (waiting) set({ skipped: state.skipped + 1 })
    waiting = { revision, project, options: override ?? options }
    askedAt.set(revision, now())
    set({ requestedRevision: revision, isStale: state.answeredRevision !== revision, stoppedRevision: null })
    pump()
  }

  return {
    request,
    getState: () => state,
    subscribe(listener) {
      listeners.add(listener)
      return () => listeners.delete(listener)
    },
    stop() {
      if (disposed || (!inFlight && !waiting)) return
      const revision = state.requestedRevision
      stoppedRequest = waiting ?? inFlight?.request ?? null
      waiting = null
      inFlight = null
      if (watch.hasWorker()) watch.cancel()
      set({
        stoppedRevision: revision,
        isStale: state.answeredRevision !== revision,
        busySince: null,
        slow: false,
        restarts: watch.restarts(),
        inWorker: watch.hasWorker(),
      })
    },
    retryStopped() {
      const again = stoppedRequest
      if (again) request(again.revision, again.project, again.options)
    },
    dismissFault() {
      if (state.fault) set({ fault: null })
    },
    debug: {
      crash: () => watch.postRaw({ gyreDebug: 'crash' }),
      freeze: () => watch.postRaw({ gyreDebug: 'freeze' }),
    },
    dispose() {
      disposed = true
      watch.dispose()
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
