/** Composition root: restore or create the document, the editor store, the analysis client; mount the app. */
import { StrictMode } from 'react'
import { createRoot } from 'react-dom/client'
import { createEditorStore } from '@/editor'
import { analyzeProject } from '@/engine'
import { App, initialProject } from '@/ui/App'
import { createAnalysisClient, createBrowserWorker } from '@/ui/analysisClient'
import { readAutosave } from '@/ui/autosave'
import { exposeDebugHandle } from '@/ui/debugHandle'
import '@/ui/app.css'

const saved = readAutosave()
const store = createEditorStore(initialProject(saved.kind === 'restored' ? saved.project : null))
const analysis = createAnalysisClient({ createWorker: createBrowserWorker, analyze: analyzeProject })
const notice =
  saved.kind === 'restored'
    ? `Restored your autosaved model${saved.savedAt ? ` from ${saved.savedAt.replace('T', ' ').slice(0, 19)} UTC` : ''}. Use "Start from demo" to begin again.`
    : saved.kind === 'refused'
      ? `[autosave] The autosaved copy could not be restored (${saved.errors[0] ?? 'invalid'}); started on the demo building.`
      : null
exposeDebugHandle(store, analysis)
// `?still` starts the 3D view paused (browser tests and benchmarks on software WebGL).
const still = new URLSearchParams(window.location.search).has('still')

const root = document.getElementById('root')
if (root) {
  createRoot(root).render(
    <StrictMode>
      <App store={store} analysis={analysis} startupNotice={notice} {...(still ? { viewerInitial: { playing: false } } : {})} />
    </StrictMode>,
  )
}
