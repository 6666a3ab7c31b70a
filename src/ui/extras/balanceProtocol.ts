/**
 * Messages between the balance panel and its worker. Plain, structured-clone-safe data: the project
 * goes in, the BalanceResult (or an error text) comes out, tagged with the request id.
 */
import type { BalanceOptions, BalanceResult } from '@/engine'
import type { Project } from '@/model'

export interface BalanceRequest {
  readonly id: number
  readonly project: Project
  readonly options: BalanceOptions
}

export type BalanceResponse =
  | { readonly id: number; readonly ok: true; readonly result: BalanceResult; readonly workerMs: number }
  | { readonly id: number; readonly ok: false; readonly error: string }

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/** Answer one request with the given balance function; never throws. */
export function runBalanceRequest(
  request: BalanceRequest,
  suggest: (project: Project, options: BalanceOptions) => BalanceResult,
): BalanceResponse {
  const t0 = now()
  try {
    const result = suggest(request.project, request.options)
    return { id: request.id, ok: true, result, workerMs: now() - t0 }
  } catch (error) {
    return { id: request.id, ok: false, error: `[balance] ${(error as Error).message ?? String(error)}` }
  }
}
