import { describe, expect, it } from 'vitest'
import { demoProject, parseProject, serializeProject } from '@/model'

describe('optional locked field of walls and frame lines', () => {
  it('reads locked: true, omits the default, and names the path of a wrong value', () => {
    const demo = demoProject()
    const wallId = Object.keys(demo.walls)[0]!
    const doc = JSON.parse(serializeProject(demo)) as { walls: Record<string, Record<string, unknown>> }
    doc.walls[wallId]!.locked = true
    const ok = parseProject(doc)
    expect(ok.ok).toBe(true)
    if (!ok.ok) return
    expect(ok.project.walls[wallId]?.locked).toBe(true)
    const other = Object.keys(demo.walls)[1]!
    expect(ok.project.walls[other]).not.toHaveProperty('locked') // default false: not written
    expect(serializeProject(ok.project)).toContain('"locked": true')
    doc.walls[wallId]!.locked = 'yes'
    const bad = parseProject(doc)
    expect(bad.ok).toBe(false)
    if (bad.ok) return
    expect(bad.errors).toEqual([`walls.${wallId}.locked: must be true or false, got "yes"`])
  })
})
