import type { BaseRef, Column, FloorId, FrameLine, Project, Wall } from '@/model'
import { contentFloorId, floorIndex } from '@/model'
import { copyFloorContent, dropFloorContent } from './floorContent'
import type { CommandOutcome } from './result'
import { checkFloor, refuse, withOptional } from './result'

export interface RemoveFloorArgs {
  readonly floor: FloorId
}

/**
 * Remove a floor (refused for the last one). Its slabs and masses go; elements ending or standing on
 * it move to the floor below (or the ground); an element left with no story is removed; per-story
 * overrides keyed by it are dropped. Floors linked to it as a typical floor get a copy of its content.
 */
export function removeFloor(doc: Project, args: RemoveFloorArgs): CommandOutcome {
  const c = checkFloor(doc, 'floor', args.floor)
  if (c) return refuse(c)
  if (doc.floors.length <= 1) return refuse('floor: a project needs at least one floor; the last one cannot be removed')
  const index = floorIndex(doc, args.floor)
  const belowId: BaseRef = index === 0 ? 'ground' : (doc.floors[index - 1]?.id as FloorId)
  let next: Project = doc
  // Floors following a link to this floor keep what they showed.
  for (const f of doc.floors) {
    if (f.id !== args.floor && f.typicalOf === args.floor) {
      next = copyFloorContent(next, contentFloorId(doc, args.floor), f.id)
    }
  }
  next = {
    ...next,
    floors: next.floors
      .filter((f) => f.id !== args.floor)
      .map((f) => (f.typicalOf === args.floor ? withOptional(f, 'typicalOf', undefined) : f)),
  }
  next = dropFloorContent(next, args.floor)
  const remaining = next
  const adjust = <T extends Wall | FrameLine | Column>(el: T): T | null => {
    const base: BaseRef = el.base === args.floor ? belowId : el.base
    const top: BaseRef = el.top === args.floor ? belowId : el.top
    if (top === 'ground') return null
    const b = base === 'ground' ? -1 : floorIndex(remaining, base)
    if (floorIndex(remaining, top) <= b) return null
    let out: T = { ...el, base, top }
    if ('stories' in out && out.stories && args.floor in out.stories) {
      const stories: Record<string, unknown> = { ...out.stories }
      delete stories[args.floor]
      out = withOptional(out, 'stories' as keyof T, (Object.keys(stories).length > 0 ? stories : undefined) as T[keyof T])
    }
    if ('stiffness' in out && out.stiffness.kind === 'direct' && out.stiffness.stories && args.floor in out.stiffness.stories) {
      const stories: Record<string, number> = { ...out.stiffness.stories }
      delete stories[args.floor]
      const stiffness = withOptional(out.stiffness, 'stories', Object.keys(stories).length > 0 ? stories : undefined)
      out = { ...out, stiffness }
    }
    return out
  }
  const mapAll = <T extends Wall | FrameLine | Column>(m: Readonly<Record<string, T>>): Record<string, T> => {
    const out: Record<string, T> = {}
    for (const [id, el] of Object.entries(m)) {
      const touches =
        el.base === args.floor ||
        el.top === args.floor ||
        ('stories' in el && el.stories !== undefined && args.floor in el.stories) ||
        ('stiffness' in el && el.stiffness.kind === 'direct' && el.stiffness.stories !== undefined && args.floor in el.stiffness.stories)
      if (!touches) {
        out[id] = el
        continue
      }
      const a = adjust(el)
      if (a) out[id] = a
    }
    return out
  }
  return {
    ...next,
    walls: mapAll(next.walls),
    frameLines: mapAll(next.frameLines),
    columns: mapAll(next.columns),
  }
}
