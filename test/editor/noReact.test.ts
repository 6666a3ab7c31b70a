/**
 * The editor core runs with React (and three, and the DOM) absent: importing any of them from
 * src/editor fails this file, both by a scan of the sources and by loading the editor while those
 * modules are replaced by ones that throw on load.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { describe, expect, it, vi } from 'vitest'
import { smallFixture } from '../helpers/createTestEditor'

vi.mock('react', () => {
  throw new Error('react must not be loaded by the editor')
})
vi.mock('react-dom', () => {
  throw new Error('react-dom must not be loaded by the editor')
})
vi.mock('three', () => {
  throw new Error('three must not be loaded by the editor')
})

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name)
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : []
  })
}

describe('editor without React', () => {
  const root = fileURLToPath(new URL('../../src/editor', import.meta.url))

  it('has no import of react, three, the engine, viewer or ui, and no DOM globals', () => {
    const files = sources(root)
    expect(files.length).toBeGreaterThan(30)
    for (const file of files) {
      const text = readFileSync(file, 'utf8')
      expect(text, file).not.toMatch(/from ['"](react|react-dom|three|@react-three\/fiber)['"/]/)
      // only the framework-free part of zustand
      expect(text, file).not.toMatch(/from ['"]zustand(\/(react|traditional|shallow))?['"]/)
      expect(text, file).not.toMatch(/from ['"]@\/(engine|viewer|ui|cli)/)
      expect(text, file).not.toMatch(/\b(window|document)\.\w/)
    }
  })

  it('creates a store, draws a wall and undoes it with React unloadable', async () => {
    const editor = await import('@/editor')
    const store = editor.createEditorStore(smallFixture())
    editor.setTool(store, 'wall')
    editor.dispatch(store, { type: 'pointerDown', point: { x: 7.3, y: 5.3 }, tolerance: 0.2 })
    editor.dispatch(store, { type: 'numeric', mode: 'offset', a: 2, b: 0 })
    expect(Object.keys(store.getState().doc.walls)).toHaveLength(3)
    expect(editor.undo(store)).toBe(true)
    expect(Object.keys(store.getState().doc.walls)).toHaveLength(2)
  })
})
