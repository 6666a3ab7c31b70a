import { useSyncExternalStore } from 'react'
import type { AnalysisClient, AnalysisState } from '../analysisClient'

/** The analysis client's state, re-rendering when an answer arrives or a request is made. */
export function useAnalysis(client: AnalysisClient): AnalysisState {
  return useSyncExternalStore(client.subscribe, client.getState, client.getState)
}
