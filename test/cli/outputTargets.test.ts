import { describe, expect, it } from 'vitest'
import { outputProblem } from '@/cli/outputTargets'
import type { PathInfo } from '@/cli/outputTargets'

/** A probe over a made-up tree: absent paths are missing. */
const tree = (entries: Record<string, PathInfo>) => (p: string): PathInfo => entries[p] ?? { kind: 'missing', writable: false }

describe('outputProblem', () => {
  const fs = tree({
    '/w': { kind: 'folder', writable: true },
    '/ro': { kind: 'folder', writable: false },
    '/w/model.json': { kind: 'file', writable: true },
    '/w/locked.html': { kind: 'file', writable: false },
    '/dev-null': { kind: 'other', writable: true },
  })

  it('accepts a new file or folder below a writable folder, however deep', () => {
    expect(outputProblem('/w/report.html', 'file', fs)).toBeNull()
    expect(outputProblem('/w/a/b/c/tables', 'folder', fs)).toBeNull()
    expect(outputProblem('/w', 'folder', fs)).toBeNull()
    expect(outputProblem('/dev-null', 'file', fs)).toBeNull()
  })

  it('names the path and the reason when it cannot be written', () => {
    expect(outputProblem('/w', 'file', fs)).toBe('/w is a folder, not a file')
    expect(outputProblem('/w/model.json', 'folder', fs)).toBe('/w/model.json is a file, not a folder')
    expect(outputProblem('/w/locked.html', 'file', fs)).toBe('/w/locked.html is not writable')
    expect(outputProblem('/ro/x/report.html', 'file', fs)).toBe('cannot create /ro/x/report.html: folder /ro is not writable')
    expect(outputProblem('/w/model.json/r.html', 'file', fs)).toBe('cannot create /w/model.json/r.html: /w/model.json is not a folder')
    expect(outputProblem('/nowhere/r.html', 'file', fs)).toBe('cannot create /nowhere/r.html: no existing folder above it')
  })
})
