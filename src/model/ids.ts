/** Branded id types. Ids are short strings, unique within their record kind in one project. */
export type FloorId = string & { readonly __brand: 'FloorId' }
export type MaterialId = string & { readonly __brand: 'MaterialId' }
export type SlabId = string & { readonly __brand: 'SlabId' }
export type LineMassId = string & { readonly __brand: 'LineMassId' }
export type PointMassId = string & { readonly __brand: 'PointMassId' }
export type WallId = string & { readonly __brand: 'WallId' }
export type FrameLineId = string & { readonly __brand: 'FrameLineId' }
export type ColumnId = string & { readonly __brand: 'ColumnId' }

/** Any record id of a project. */
export type AnyId = FloorId | MaterialId | SlabId | LineMassId | PointMassId | WallId | FrameLineId | ColumnId

let counter = 0

/**
 * A new id with a readable prefix (`w` for walls, `c` for columns, ...). Unique within a session and,
 * because of the random tail, practically unique across sessions.
 */
export function createId<T extends string>(prefix: string): T {
  counter += 1
  const tail = Math.floor(Math.random() * 36 ** 4)
    .toString(36)
    .padStart(4, '0')
  return `${prefix}${counter.toString(36)}${tail}` as T
}
