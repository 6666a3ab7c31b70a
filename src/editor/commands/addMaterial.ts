import type { Material, MaterialId, Project } from '@/model'
import { createId } from '@/model'
import type { CommandOutcome } from './result'
import { refuse } from './result'
import { checkMaterialRecord } from './validate'

export interface AddMaterialArgs {
  readonly name: string
  /** Young's modulus, Pa */
  readonly E: number
  /** Poisson ratio, - */
  readonly nu: number
  readonly id?: string
}

/** Add an elastic material. */
export function addMaterial(doc: Project, args: AddMaterialArgs): CommandOutcome {
  const id = (args.id ?? createId<MaterialId>('m')) as MaterialId
  if (doc.materials[id]) return refuse(`id: material "${id}" already exists`)
  const material: Material = { id, name: typeof args.name === 'string' ? args.name.trim() : args.name, E: args.E, nu: args.nu }
  const c = checkMaterialRecord(material)
  if (c) return refuse(`material ${id}: ${c}`)
  return { ...doc, materials: { ...doc.materials, [id]: material } }
}
