/**
 * Checks on the CLI's output paths, made before anything is read, analysed or printed: a report or
 * CSV target that cannot be written is a usage error (exit 1) naming the path, not a defect found
 * after minutes of analysis; and no output may overwrite the model file it was made from.
 */
import { accessSync, constants, realpathSync, statSync } from 'node:fs'
import { dirname, resolve } from 'node:path'

/** What is at a path: a regular file, a folder, nothing, or something else (device, socket). */
export interface PathInfo {
  readonly kind: 'file' | 'folder' | 'missing' | 'other'
  /** Whether this process may write it (for a folder: create entries in it). */
  readonly writable: boolean
}

export type ProbePath = (path: string) => PathInfo

/** The real file system. */
export const probeNodePath: ProbePath = (path) => {
  let stat
  try {
    stat = statSync(path, { throwIfNoEntry: false })
  } catch (error) {
    // ENOTDIR: a file stands where a folder should be; the ancestor check names it.
    if ((error as NodeJS.ErrnoException).code === 'ENOTDIR') return { kind: 'missing', writable: false }
    return { kind: 'other', writable: false }
  }
  if (!stat) return { kind: 'missing', writable: false }
  const kind = stat.isDirectory() ? 'folder' : stat.isFile() ? 'file' : 'other'
  try {
    accessSync(path, kind === 'folder' ? constants.W_OK | constants.X_OK : constants.W_OK)
    return { kind, writable: true }
  } catch (_e) {
    return { kind, writable: false }
  }
}

/** The canonical path (symbolic links resolved) when it exists, else the absolute path. */
export function canonicalPath(path: string): string {
  try {
    return realpathSync.native(path)
  } catch (_e) {
    return resolve(path)
  }
}

/**
 * Why `path` cannot be written as a file (`want: 'file'`) or used as an output folder, or null when
 * it can. A missing path is fine when its nearest existing ancestor is a writable folder (the
 * folders in between are created).
 */
export function outputProblem(path: string, want: 'file' | 'folder', probe: ProbePath = probeNodePath): string | null {
  const info = probe(path)
  if (info.kind === 'folder' && want === 'file') return `${path} is a folder, not a file`
  if ((info.kind === 'file' || info.kind === 'other') && want === 'folder') return `${path} is a file, not a folder`
  if (info.kind !== 'missing') return info.writable ? null : `${path} is not writable`
  let ancestor = path
  for (;;) {
    const up = dirname(ancestor)
    if (up === ancestor) return `cannot create ${path}: no existing folder above it`
    ancestor = up
    const a = probe(ancestor)
    if (a.kind === 'missing') continue
    if (a.kind !== 'folder') return `cannot create ${path}: ${ancestor} is not a folder`
    return a.writable ? null : `cannot create ${path}: folder ${ancestor} is not writable`
  }
}
