/**
 * Worker watch: the life-cycle policy shared by the analysis and balance workers, with the timers
 * injected so node tests can drive it.
 *
 * The honest limits of the rule: a worker busy with a long job cannot answer pings, so silence alone
 * never proves it is dead. Therefore
 * - an `error` or `messageerror` event is a death, acted on at once: the worker is terminated, a
 *   fresh one is started and the owner is told (it re-sends its latest request);
 * - silence is only "slow": after a grace period that grows with the job size the owner is told the
 *   job is still running (the UI then offers Stop); it is never restarted behind the user's back;
 * - `cancel()` (the user's Stop) terminates the worker and starts a fresh one; any late answer of the
 *   old worker is ignored because its handlers are detached.
 * A job that kills the worker again after a restart should not be retried forever: `retryAllowed`
 * gives the owner the rule (one retry per request).
 */

/** The part of a Worker the watch uses (tests pass a fake). */
export interface WatchableWorker<In, Out> {
  postMessage(message: In): void
  terminate(): void
  onmessage: ((event: MessageEvent<Out>) => void) | null
  onerror: ((event: ErrorEvent) => void) | null
  onmessageerror?: ((event: MessageEvent) => void) | null
}

/** Clock and timers (the browser's by default; fakes in tests). */
export interface WatchTimers {
  now(): number
  setTimeout(fn: () => void, ms: number): unknown
  clearTimeout(handle: unknown): void
}

export const browserTimers: WatchTimers = {
  now: () => (typeof performance !== 'undefined' ? performance.now() : Date.now()),
  setTimeout: (fn, ms) => setTimeout(fn, ms),
  clearTimeout: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
}

export interface WorkerWatchConfig<In, Out> {
  /** Makes a fresh worker; may throw or return null (no workers here). */
  readonly create: () => WatchableWorker<In, Out> | null
  readonly timers?: WatchTimers
  /** Label used in messages, e.g. "analysis". */
  readonly label: string
  /** An answer from the current worker (the job is over). */
  readonly onMessage: (data: Out) => void
  /** Messages that report progress of the running job (the job goes on); default: none. */
  readonly isProgress?: (data: Out) => boolean
  /**
   * The worker died (error or messageerror). It has already been replaced; `busy` says whether a
   * job was running, which the owner should now re-send or fail.
   */
  readonly onDeath: (reason: string, busy: boolean) => void
  /** The running job passed its grace period without an answer (called once per job). */
  readonly onSlow: (elapsedMs: number) => void
}

export interface WorkerWatch<In> {
  /** Whether a worker exists (false: the owner must work without one). */
  readonly hasWorker: () => boolean
  /** Post a job; `graceMs` is how long silence is normal for this job. */
  post(message: In, graceMs: number): void
  /** Post a message that is not a job (no timers), e.g. a test hook. */
  postRaw(message: In): void
  /** The user's Stop: terminate the worker now and start a fresh one. */
  cancel(): void
  /** When the running job was posted (timer clock, ms), or null when idle. */
  busySince(): number | null
  /** Number of replacements so far (deaths and cancels). */
  restarts(): number
  dispose(): void
}

/** Grace before a silent analysis counts as slow, ms: 4 s plus 25 ms per element, ×3 with time history. */
export function analysisGraceMs(elementCount: number, withTimeHistory: boolean): number {
  const base = 4000 + 25 * Math.max(0, elementCount)
  return withTimeHistory ? 3 * base : base
}

/** Whether a request that has already killed the worker `deaths` times may be sent again. */
export function retryAllowed(deaths: number): boolean {
  return deaths <= 1
}

function describeError(event: ErrorEvent | undefined): string {
  const where = event?.filename ? ` (${event.filename.split('/').pop() ?? ''}:${event.lineno ?? 0})` : ''
  return `${event?.message || 'unknown error'}${where}`
}

export function createWorkerWatch<In, Out>(config: WorkerWatchConfig<In, Out>): WorkerWatch<In> {
  const timers = config.timers ?? browserTimers
  let worker: WatchableWorker<In, Out> | null = null
  let since: number | null = null
  let slowTimer: unknown = null
  let restarts = 0
  let disposed = false

  const stopTimer = (): void => {
    if (slowTimer !== null) timers.clearTimeout(slowTimer)
    slowTimer = null
  }

  const detach = (w: WatchableWorker<In, Out>): void => {
    w.onmessage = null
    w.onerror = null
    w.onmessageerror = null
    try {
      w.terminate()
    } catch (_err) {
      // Already gone.
    }
  }

  const start = (): void => {
    let w: WatchableWorker<In, Out> | null = null
    try {
      w = config.create()
    } catch (err) {
      console.warn(`[${config.label}] worker unavailable:`, err)
      w = null
    }
    worker = w
    if (!w) return
    w.onmessage = (event) => {
      if (worker !== w || disposed) return
      if (config.isProgress?.(event.data)) {
        config.onMessage(event.data)
        return
      }
      stopTimer()
      since = null
      config.onMessage(event.data)
    }
    const die = (reason: string, event?: { preventDefault?: () => void }): void => {
      event?.preventDefault?.()
      if (worker !== w || disposed) return
      const busy = since !== null
      stopTimer()
      since = null
      detach(w)
      restarts += 1
      start()
      config.onDeath(`[${config.label}] the worker stopped: ${reason}`, busy)
    }
    w.onerror = (event) => die(describeError(event), event)
    w.onmessageerror = (event) => die('an answer could not be read (messageerror)', event)
  }

  start()

  return {
    hasWorker: () => worker !== null,
    post(message, graceMs) {
      if (!worker || disposed) return
      stopTimer()
      const posted = timers.now()
      since = posted
      slowTimer = timers.setTimeout(() => {
        slowTimer = null
        if (since === posted && !disposed) config.onSlow(timers.now() - posted)
      }, graceMs)
      worker.postMessage(message)
    },
    postRaw(message) {
      if (worker && !disposed) worker.postMessage(message)
    },
    cancel() {
      if (disposed) return
      stopTimer()
      since = null
      if (worker) detach(worker)
      restarts += 1
      start()
    },
    busySince: () => since,
    restarts: () => restarts,
    dispose() {
      disposed = true
      stopTimer()
      since = null
      if (worker) detach(worker)
      worker = null
    },
  }
}
