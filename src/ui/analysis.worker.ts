/**
 * Analysis worker: runs analyzeProject off the main thread. The client sends at most one request at a
 * time (latest wins on its side), so this worker simply answers each message in turn.
 */
import { analyzeProject } from '@/engine'
import { runAnalysisRequest } from './analysisProtocol'
import type { AnalysisRequest } from './analysisProtocol'

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<AnalysisRequest>) => void) | null
  postMessage(message: unknown): void
}

scope.onmessage = (event) => {
  scope.postMessage(runAnalysisRequest(event.data, analyzeProject))
}
