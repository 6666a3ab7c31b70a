/** Shared defaults for new lateral elements: name, material and floor range. */
import type { BaseRef, FloorId, Project } from '@/model'
import { checkMaterial, checkRange } from './result'

/** "Wall 4" style name not yet used among `existing`. */
export function nextName(prefix: string, existing: Readonly<Record<string, { readonly name: string }>>): string {
  const names = new Set(Object.values(existing).map((e) => e.name))
  let n = Object.keys(existing).length + 1
  while (names.has(`${prefix} ${n}`)) n++
  return `${prefix} ${n}`
}

/** The material to use: the one given, else the first of the project. */
export function pickMaterial(doc: Project, material: string | undefined): string | { message: string } {
  const id = material ?? Object.keys(doc.materials)[0]
  if (id === undefined) return { message: 'material: the project has no materials; add one first' }
  const c = checkMaterial(doc, 'material', id)
  return c ? { message: c } : id
}

/** The range to use: the one given, else from the ground to the top floor. */
export function pickRange(
  doc: Project,
  base: BaseRef | undefined,
  top: FloorId | undefined,
): { base: BaseRef; top: FloorId } | { message: string } {
  const b = base ?? 'ground'
  const t = top ?? doc.floors[doc.floors.length - 1]?.id
  if (t === undefined) return { message: 'top: the project has no floors' }
  const c = checkRange(doc, b, t)
  return c ? { message: c } : { base: b, top: t }
}
