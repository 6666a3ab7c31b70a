import type { Project } from '@/model'
import type { FloorProps, Issue, Structure } from './results'

/**
 * Floor mass properties and global K, M (row-major Float64Array) of a validated project.
 * Returns structure null (with issues) when the model cannot be assembled.
 */
export function buildStructure(_project: Project): {
  structure: Structure | null
  floors: FloorProps[]
  issues: Issue[]
} {
  throw new Error('[engine] buildStructure: not implemented yet')
}
