/**
 * Test hooks understood by the app's workers (reached through `window.__gyre`, see debugHandle.ts):
 * `crash` throws inside the worker's message handler (the page sees a real `error` event) and
 * `freeze` keeps the worker busy forever, so it never answers again until it is terminated.
 */
export interface WorkerDebugMessage {
  readonly gyreDebug: 'crash' | 'freeze'
}

export function isWorkerDebugMessage(data: unknown): data is WorkerDebugMessage {
  return typeof data === 'object' && data !== null && 'gyreDebug' in data
}

/** Run a debug message inside a worker. `crash` throws; `freeze` never returns. */
export function runWorkerDebug(message: WorkerDebugMessage): void {
  if (message.gyreDebug === 'crash') throw new Error('[test] worker crashed on request')
  let spins = 0
  while (spins >= 0) spins = (spins + 1) % 1_000_000_007
}
