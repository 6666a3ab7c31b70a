/**
 * Analysis worker: runs analyzeProject off the main thread. The client sends at most one request at a
 * time (latest wins on its side), so this worker simply answers each message in turn. Test hooks
 * (crash, freeze) are described in workerDebug.ts.
 */
import { analyzeProject } from '@/engine'
import { runAnalysisRequest } from './analysisProtocol'
import type { AnalysisRequest } from './analysisProtocol'
import { isWorkerDebugMessage, runWorkerDebug } from './workerDebug'
import type { WorkerDebugMessage } from './workerDebug'

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<AnalysisRequest | WorkerDebugMessage>) => void) | null
  postMessage(message: unknown): void
}

scope.onmessage = (event) => {
  const data = event.data
  if (isWorkerDebugMessage(data)) {
    runWorkerDebug(data)
    return
  }
  scope.postMessage(runAnalysisRequest(data, analyzeProject))
}
