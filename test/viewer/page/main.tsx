/**
 * Test page for the 3D viewer alone (browser tests and the frame-rate benchmark), served by Vite's
 * dev server at /test/viewer/page/index.html. Query: model=three|demo|gen, floors=N (gen),
 * engine=1 to analyse with the engine (falls back to the hand-made fixture if it cannot), th=1 to
 * include the time history, play=0 to start paused.
 */
import { createRoot } from 'react-dom/client'
import { analyzeProject } from '@/engine'
import type { AnalysisResult } from '@/engine'
import type { Project } from '@/model'
import { ViewerPane } from '@/viewer'
import { generateBuilding } from '../../helpers/generateBuilding'
import { fixtureResult, threeFloorProject } from '../fixtures'

declare global {
  interface Window {
    __viewerPage?: { source: 'engine' | 'fixture'; floors: number; note: string }
    __viewerFrames?: number
  }
}

async function loadProject(params: URLSearchParams): Promise<Project> {
  const model = params.get('model') ?? 'three'
  if (model === 'demo') {
    const res = await fetch('/examples/corner-block.json')
    return (await res.json()) as Project
  }
  if (model === 'gen') return generateBuilding({ floors: Number(params.get('floors') ?? 60), seed: 7 })
  return threeFloorProject()
}

async function main() {
  const params = new URLSearchParams(location.search)
  const project = await loadProject(params)
  let result: AnalysisResult = fixtureResult(project)
  let source: 'engine' | 'fixture' = 'fixture'
  let note = ''
  if (params.get('engine') === '1') {
    try {
      const r = analyzeProject(project, { timeHistory: params.get('th') === '1' })
      if (r.modes && r.modes.count > 0) {
        result = r
        source = 'engine'
      } else note = `engine gave no modes (${r.status})`
    } catch (e) {
      note = `engine unavailable: ${e instanceof Error ? e.message : String(e)}`
    }
  }
  window.__viewerPage = { source, floors: project.floors.length, note }
  const root = document.getElementById('root')
  if (root) {
    createRoot(root).render(
      <ViewerPane
        project={project}
        result={result}
        isStale={false}
        initial={{ playing: params.get('play') !== '0' }}
        onFrameRendered={() => {
          window.__viewerFrames = (window.__viewerFrames ?? 0) + 1
        }}
      />,
    )
  }
}

void main()
