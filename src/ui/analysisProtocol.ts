/** Messages between the UI thread and the analysis worker. Plain, structured-clone friendly. */
import type { AnalysisOptions, AnalysisResult } from '@/engine'
import type { Project } from '@/model'

/** One analysis request; `revision` is the document revision the project snapshot belongs to. */
export interface AnalysisRequest {
  readonly revision: number
  readonly project: Project
  readonly options: AnalysisOptions
}

/** The worker's answer to one request. */
export type AnalysisResponse =
  | {
      readonly revision: number
      readonly ok: true
      readonly result: AnalysisResult
      /** Time spent in the worker, ms. */
      readonly workerMs: number
    }
  | {
      readonly revision: number
      readonly ok: false
      /** Readable message, prefixed by subsystem ("[engine] ..."). */
      readonly error: string
      readonly workerMs: number
    }

const now = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now())

/**
 * Run one request (inside the worker, or on the main thread where workers are missing).
 * The engine never throws for a bad model; a throw here is a programmer error, reported as text.
 */
export function runAnalysisRequest(
  request: AnalysisRequest,
  analyze: (project: Project, options: AnalysisOptions) => AnalysisResult,
): AnalysisResponse {
  const t0 = now()
  try {
    const result = analyze(request.project, request.options)
    return { revision: request.revision, ok: true, result, workerMs: now() - t0 }
  } catch (err) {
    const text = err instanceof Error ? err.message : String(err)
    const error = text.startsWith('[') ? text : `[engine] ${text}`
    return { revision: request.revision, ok: false, error, workerMs: now() - t0 }
  }
}
