/** Balance worker: runs suggestBalance off the main thread, one request at a time, in order. */
import { suggestBalance } from '@/engine'
import { runBalanceRequest } from './balanceProtocol'
import type { BalanceRequest } from './balanceProtocol'

const scope = self as unknown as {
  onmessage: ((event: MessageEvent<BalanceRequest>) => void) | null
  postMessage(message: unknown): void
}

scope.onmessage = (event) => {
  scope.postMessage(runBalanceRequest(event.data, suggestBalance))
}
