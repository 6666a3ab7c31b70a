/** Finding records by id across the record maps. */
import type { Project } from '@/model'
import type { AnyRecord, RecordKind } from '../history'
import { RECORD_KINDS } from '../history'

/** Record kinds that can be selected on the plan (materials are not). */
export const PLAN_KINDS = ['walls', 'frameLines', 'columns', 'slabs', 'lineMasses', 'pointMasses'] as const
export type PlanKind = (typeof PLAN_KINDS)[number]

/** Lateral-resisting element kinds (they span floor ranges). */
export const ELEMENT_KINDS = ['walls', 'frameLines', 'columns'] as const
export type ElementKind = (typeof ELEMENT_KINDS)[number]

/**
 * The kind of the record with this id, or null. Ids are unique within a kind; if a loaded file reuses
 * an id across kinds, the first kind in RECORD_KINDS order wins (lateral elements before masses).
 */
export function kindOf(doc: Project, id: string): RecordKind | null {
  for (const kind of ELEMENT_KINDS) if (doc[kind][id] !== undefined) return kind
  for (const kind of RECORD_KINDS) if (doc[kind][id] !== undefined) return kind
  return null
}

export function findRecord(doc: Project, id: string): { kind: RecordKind; record: AnyRecord } | null {
  const kind = kindOf(doc, id)
  if (!kind) return null
  return { kind, record: doc[kind][id] as AnyRecord }
}

/** A copy of the doc with one record map replaced. */
export function withRecords<K extends RecordKind>(doc: Project, kind: K, map: Project[K]): Project {
  return { ...doc, [kind]: map }
}

/** Unique, known ids or a refusal message. */
export function checkIds(doc: Project, ids: unknown, what: string): string | undefined {
  if (!Array.isArray(ids)) return 'ids: must be a list of ids'
  if (ids.length === 0) return `ids: nothing to ${what} (empty selection)`
  for (const id of ids) {
    if (typeof id !== 'string' || kindOf(doc, id) === null) return `ids: unknown id "${String(id)}"`
  }
  return undefined
}
