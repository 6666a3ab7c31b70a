/** Applying a validated patch to one record. */
import type { Project } from '@/model'
import type { RecordKind } from '../history'
import type { CommandOutcome } from './result'
import { refuse } from './result'
import { KIND_LABEL, OPTIONAL_FIELDS, RECORD_FIELDS, checkRecord } from './validate'

/** A partial record; `undefined` clears an optional field. */
export type Patch<T> = { readonly [K in Exclude<keyof T, 'id'>]?: T[K] | undefined }

export function patchRecord(doc: Project, kind: RecordKind, id: string, patch: Readonly<Record<string, unknown>>): CommandOutcome {
  const label = KIND_LABEL[kind]
  const map: Readonly<Record<string, unknown>> = doc[kind]
  const record = map[id] as Record<string, unknown> | undefined
  if (!record) return refuse(`id: unknown ${label} "${id}"`)
  if (!patch || typeof patch !== 'object') return refuse(`patch: must be an object of fields`)
  const next: Record<string, unknown> = { ...record }
  for (const [field, value] of Object.entries(patch)) {
    if (field === 'id') return refuse(`${label} ${id}: id cannot be changed`)
    if (!RECORD_FIELDS[kind].includes(field)) return refuse(`${label} ${id}: unknown field "${field}"`)
    if (value === undefined) {
      if (!OPTIONAL_FIELDS.includes(field)) return refuse(`${label} ${id}: ${field}: is required and cannot be cleared`)
      delete next[field]
    } else {
      next[field] = value
    }
  }
  const c = checkRecord(doc, kind, next)
  if (c) return refuse(`${label} ${id}: ${c}`)
  return { ...doc, [kind]: { ...map, [id]: next } } as Project
}
