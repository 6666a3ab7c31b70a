/** Balance worker: runs suggestBalance off the main thread, one request at a time, in order. */
import { suggestBalance } from '@/engine'
import { isWorkerDebugMessage, runWorkerDebug } from '../workerDebug'
import type { WorkerDebugMessage } from '../workerDebug'
import { runBalanceRequest } from './balanceProtocol'
import type { BalanceRequest } from './balanceProtocol'

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<BalanceRequest | WorkerDebugMessage>) => void) | null
  postMessage(message: unknown): void
}

scope.onmessage = (event) => {
  const data = event.data
  if (isWorkerDebugMessage(data)) {
    runWorkerDebug(data)
    return
  }
  scope.postMessage(runBalanceRequest(data, suggestBalance, (m) => scope.postMessage(m)))
}
