/**
 * Messages between the balance panel and its worker. Plain, structured-clone-safe data: the project
 * goes in, the BalanceResult (or an error text) comes out, tagged with the request id.
 */
import type { BalanceOptions, BalanceProgress, BalanceResult } from '@/engine'
import type { Project } from '@/model'

export interface BalanceRequest {
  readonly id: number
  readonly project: Project
  readonly options: BalanceOptions
}

export type BalanceResponse =
  | { readonly id: number; readonly ok: true; readonly result: BalanceResult; readonly workerMs: number }
  | { readonly id: number; readonly ok: false; readonly error: string }
  | BalanceProgressMessage

/** A progress report of a running search (the search goes on). */
export interface BalanceProgressMessage {
  readonly id: number
  readonly progress: BalanceProgress
}

export const isBalanceProgress = (m: BalanceResponse): m is BalanceProgressMessage => 'progress' in m

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/** Answer one request with the given balance function; never throws. */
export function runBalanceRequest(
  request: BalanceRequest,
  suggest: (project: Project, options: BalanceOptions, onProgress?: (p: BalanceProgress) => void) => BalanceResult,
  report?: (message: BalanceProgressMessage) => void,
): BalanceResponse {
  const t0 = now()
  let last = -Infinity
  const onProgress = (progress: BalanceProgress): void => {
    // At most one report per 200 ms (common practice for progress bars; keeps the channel quiet).
    const t = now()
    if (!report || t - last < 200) return
    last = t
    report({ id: request.id, progress })
  }
  try {
    const result = suggest(request.project, request.options, onProgress)
    return { id: request.id, ok: true, result, workerMs: now() - t0 }
  } catch (error) {
    return { id: request.id, ok: false, error: `[balance] ${(error as Error).message ?? String(error)}` }
  }
}
