import type { FloorId, Project } from '@/model'
import { createId, floorIndex } from '@/model'
import { copyFloorContent } from './floorContent'
import type { CommandOutcome } from './result'
import { checkFloor, checkName, refuse } from './result'

export interface DuplicateFloorArgs {
  readonly floor: FloorId
  readonly id?: string
  readonly name?: string
}

/**
 * Insert a copy of a floor directly above it: same height and typical-floor link, copies of its own
 * slabs and masses (new ids). Elements ending at the floor are extended to the copy, with the floor's
 * per-story overrides repeated for it, so the copy carries the same lateral system.
 */
export function duplicateFloor(doc: Project, args: DuplicateFloorArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor)
  if (c) return refuse(c)
  const index = floorIndex(doc, args.floor)
  const source = doc.floors[index]
  if (!source) return refuse(`floor: unknown floor "${args.floor}"`)
  const id = (args.id ?? createId<FloorId>('L')) as FloorId
  if (doc.floors.some((f) => f.id === id)) return refuse(`id: floor "${id}" already exists`)
  const name = args.name ?? `${source.name} (copy)`
  const cn = checkName('name', name)
  if (cn) return refuse(cn)
  const floor = { ...source, id, name }
  let next: Project = {
    ...doc,
    floors: [...doc.floors.slice(0, index + 1), floor, ...doc.floors.slice(index + 1)],
  }
  next = copyFloorContent(next, source.id, id)
  const extend = <T extends { readonly top: FloorId; readonly base: unknown }>(
    m: Readonly<Record<string, T>>,
  ): Record<string, T> => {
    const out: Record<string, T> = {}
    for (const [k, el] of Object.entries(m)) {
      if (el.top !== source.id) {
        out[k] = el
        continue
      }
      let copy: T = { ...el, top: id }
      const stories = (el as { stories?: Record<string, unknown> }).stories
      if (stories && source.id in stories) copy = { ...copy, stories: { ...stories, [id]: stories[source.id] } }
      const stiffness = (el as { stiffness?: { kind: string; stories?: Record<string, number> } }).stiffness
      if (stiffness?.kind === 'direct' && stiffness.stories && source.id in stiffness.stories) {
        copy = { ...copy, stiffness: { ...stiffness, stories: { ...stiffness.stories, [id]: stiffness.stories[source.id] } } }
      }
      out[k] = copy
    }
    return out
  }
  return {
    ...next,
    walls: extend(next.walls),
    frameLines: extend(next.frameLines),
    columns: extend(next.columns),
  }
}
