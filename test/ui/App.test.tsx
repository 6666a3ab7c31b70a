/**
 * Smoke tests of the React screen, rendered to markup in node (react-dom/server). jsdom 31 needs a
 * newer Node than the pinned Node 20 (its undici uses zlib zstd), so interaction is covered by the
 * browser tests in test/browser instead.
 */
import { renderToString } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { createEditorStore } from '@/editor'
import type { AnalysisResult } from '@/engine'
import { CAUTION, CAUTION_SHORT, demoProject } from '@/model'
import { createAnalysisClient } from '@/ui/analysisClient'
import { App, recordName } from '@/ui/App'
import { ProblemsPanel } from '@/ui/ProblemsPanel'
import { Inspector } from '@/ui/Inspector'

/** A stand-in analysis answer (the engine has its own tests): one mechanism issue. */
const fakeResult = (): AnalysisResult =>
  ({
    status: 'mechanism',
    issues: [{ code: 'mechanism', severity: 'error', message: 'Level 1: free to rotate', refs: ['core-s'], floor: 'L1' }],
    projectName: 'demo',
    floors: [],
    totalMass: 0,
    buildingCentreOfMass: null,
    modes: null,
    centres: null,
    torsion: null,
    spectrum: null,
    timeHistory: null,
    regularity: null,
    caution: CAUTION,
    timings: {},
  }) as AnalysisResult

function render(): string {
  const store = createEditorStore(demoProject())
  const client = createAnalysisClient({ createWorker: () => null, analyze: fakeResult })
  const html = renderToString(<App store={store} analysis={client} />)
  client.dispose()
  return html
}

const count = (html: string, needle: string): number => html.split(needle).length - 1

describe('App', () => {
  it('renders the floor stack, the plan with labelled grid lines, and the toolbar on the demo', () => {
    const html = render()
    expect(count(html, 'data-floor-id=')).toBe(7)
    expect(html).toContain('data-testid="plan-canvas"')
    expect(html).toContain('data-testid="el-core-s"')
    expect(html).toContain('data-testid="grid-x-1"')
    expect(html).toContain('data-testid="grid-y-A"')
    for (const id of ['undo', 'redo', 'delete', 'open', 'save', 'new', 'demo', 'tool-wall', 'tool-pick', 'fit']) {
      expect(html).toContain(`data-testid="action-${id}"`)
    }
  })

  it('shows one caution line on the screen: the short text, the full text on hover', () => {
    const html = render()
    expect(count(html, CAUTION_SHORT)).toBe(1)
    expect(count(html, CAUTION)).toBe(1)
    expect(html).toMatch(new RegExp(`data-testid="screen-caution"[^>]*>${CAUTION_SHORT.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}<`))
  })

  it('shows the inspector fields of a selected wall in display units', () => {
    // Rendered on its own: on the server zustand serves the store's initial state (no selection).
    const project = demoProject()
    const props = { project, selection: ['gable-e'], onReplace: () => null, onDelete: () => undefined, onCopyToFloors: () => null, copyMessage: null }
    const si = renderToString(<Inspector {...props} units="SI" />)
    // 0.25 m is 250 mm, and 9.8 in (1 in = 0.0254 m exactly; NIST SP 811)
    expect(si).toMatch(/data-testid="field-thickness" value="250"/)
    const us = renderToString(<Inspector {...props} units="US" />)
    expect(us).toMatch(/data-testid="field-thickness" value="9.8"/)
    expect(us).toMatch(/data-testid="field-p1x" value="98.43"/)
  })

  it('draws the shear centre of the demo core (one wall group) on the plan', () => {
    const html = render()
    expect(html).toContain('data-testid="shear-centre-core-e+core-n+core-s+core-w"')
  })

  it('tells which walls a selected wall acts with, and offers to keep it apart', () => {
    const project = demoProject()
    const props = { project, onReplace: () => null, onDelete: () => undefined, onCopyToFloors: () => null, copyMessage: null, units: 'SI' as const }
    const core = renderToString(<Inspector {...props} selection={['core-s']} />)
    expect(core).toContain('Acts with: Core east (lift door side), Core north, Core west (one section)')
    expect(core).toContain('data-testid="field-joins"')
    const gable = renderToString(<Inspector {...props} selection={['gable-e']} />)
    expect(gable).toContain('Acts alone')
  })

  it('names the elements of a problem by their names, not their ids', () => {
    const project = demoProject()
    expect(recordName(project, 'core-s')).toBe('Core south')
    expect(recordName(project, 'no-such-id')).toBe('no-such-id')
    const issue = fakeResult().issues[0]
    if (!issue) throw new Error('no issue')
    const html = renderToString(
      <ProblemsPanel issues={[issue]} analysisError={null} notices={[]} onPick={() => undefined} nameOf={(id) => recordName(project, id)} />,
    )
    expect(html).toContain('Core south')
    expect(html.replace(/<[^>]*>/g, '')).not.toContain('core-s')
  })
})
