/** Composition root: restore or create the document, the editor store, the analysis client; mount the app. */
import { StrictMode } from 'react'
import { createRoot } from 'react-dom/client'
import { createEditorStore } from '@/editor'
import { analyzeProject } from '@/engine'
import { App, initialProject } from '@/ui/App'
import { createAnalysisClient, createBrowserWorker } from '@/ui/analysisClient'
import { createBrowserAutosave } from '@/ui/autosave'
import type { RestoreResult } from '@/ui/autosave'
import { exposeDebugHandle } from '@/ui/debugHandle'
import '@/ui/app.css'

const autosave = createBrowserAutosave()

function restoreNotice(saved: RestoreResult): string | null {
  if (saved.kind === 'restored') {
    const when = saved.savedAt ? ` from ${saved.savedAt.replace('T', ' ').slice(0, 19)} UTC` : ''
    const from = saved.source === 'snapshot' ? '' : ` (${saved.source})`
    const passed = saved.skipped.length ? ` ${saved.skipped.length} newer copy could not be read: ${saved.skipped[0]}.` : ''
    return `Restored your autosaved model${when}${from}.${passed} Use "Start from demo" to begin again.`
  }
  if (saved.kind === 'refused') {
    return `[autosave] The autosaved copy could not be restored (${saved.errors[0] ?? 'invalid'}); started on the demo building.`
  }
  return null
}

async function start(): Promise<void> {
  const saved = await autosave.load().catch((err: unknown): RestoreResult => {
    console.warn('[autosave] restore failed:', err)
    return { kind: 'none' }
  })
  const store = createEditorStore(initialProject(saved.kind === 'restored' ? saved.project : null))
  const analysis = createAnalysisClient({ createWorker: createBrowserWorker, analyze: analyzeProject })
  exposeDebugHandle(store, analysis, autosave)
  // `?still` starts the 3D view paused (browser tests and benchmarks on software WebGL).
  const still = new URLSearchParams(window.location.search).has('still')

  const root = document.getElementById('root')
  if (root) {
    createRoot(root).render(
      <StrictMode>
        <App
          store={store}
          analysis={analysis}
          autosave={autosave}
          startupNotice={restoreNotice(saved)}
          {...(still ? { viewerInitial: { playing: false } } : {})}
        />
      </StrictMode>,
    )
  }
}

void start()
