import type { Material, Project } from '@/model'
import type { Patch } from './patch'
import { patchRecord } from './patch'
import type { CommandOutcome } from './result'

export interface UpdateMaterialArgs {
  readonly id: string
  readonly patch: Patch<Material>
}

/** Change a material's name, E or nu (validated: E > 0, -1 < nu < 0.5). */
export function updateMaterial(doc: Project, args: UpdateMaterialArgs): CommandOutcome {
  return patchRecord(doc, 'materials', args.id, args.patch as Readonly<Record<string, unknown>>)
}
