/**
 * The demo building (invented): "Corner Block, Quarry Street", read from
 * public/examples/corner-block.json through the same parser as any user file.
 */
import cornerBlock from '../../public/examples/corner-block.json'
import { parseProject } from './schema'
import type { Project } from './types'

/** A fresh copy of the demo project (SI units); throws only if the bundled file is broken. */
export function demoProject(): Project {
  const parsed = parseProject(cornerBlock)
  if (!parsed.ok) {
    throw new Error(`[model] the bundled demo project is invalid: ${parsed.errors.join('; ')}`)
  }
  return parsed.project
}
