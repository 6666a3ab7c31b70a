/**
 * Smoke tests of the element forces panel, rendered to markup in node (react-dom/server; see
 * App.test.tsx for why not jsdom). The numbers themselves are tested in test/engine/elementForces.
 */
import { renderToString } from 'react-dom/server'
import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { CAUTION, CAUTION_SHORT, demoProject } from '@/model'
import { ElementForcesPanel } from '@/ui/ElementForcesPanel'

describe('ElementForcesPanel', () => {
  const project = demoProject()
  const result = analyzeProject(project)

  it('shows the selected wall storey by storey when one wall is selected (the caution is the screen line)', () => {
    const html = renderToString(
      <ElementForcesPanel floors={project.floors} result={result} selection={['gable-e']} units="SI" isStale={false} />,
    )
    expect(html).toContain('data-testid="element-forces"')
    expect(html).not.toContain(CAUTION_SHORT)
    expect(html).not.toContain(CAUTION)
    expect(html).toContain('element-forces-table-wall')
    // one table row per storey the wall occupies, and every case in the picker
    const row = result.elementForces!.elements.find((e) => e.elementId === 'gable-e')!
    expect((html.match(/<tr>/g) ?? []).length).toBe(row.floorIds.length + 1)
    for (const c of result.elementForces!.cases) expect(html).toContain(c.label)
    expect(html).toContain('kN·m')
  })

  it('shows both axes of a column and nothing without a single selection', () => {
    const col = renderToString(
      <ElementForcesPanel floors={project.floors} result={result} selection={['c1']} units="US" isStale />,
    )
    expect(col).toContain('element-forces-table-columnX')
    expect(col).toContain('element-forces-table-columnY')
    expect(col).toContain('kip')
    expect(col).toContain('Updating')
    const none = renderToString(
      <ElementForcesPanel floors={project.floors} result={result} selection={[]} units="SI" isStale={false} />,
    )
    expect(none).toBe('')
    const two = renderToString(
      <ElementForcesPanel floors={project.floors} result={result} selection={['core-s', 'core-n']} units="SI" isStale={false} />,
    )
    expect(two).toBe('')
  })
})
