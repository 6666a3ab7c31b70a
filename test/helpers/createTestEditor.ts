/**
 * A fresh editor store per test: on a small hand-checkable fixture (default), the demo building, or a
 * given project. Also offers short event helpers (`click`, `drag`) in plan metres.
 */
import { readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import type { EditorEvent, EditorStore } from '@/editor'
import { createEditorStore, dispatch } from '@/editor'
import { CURRENT_VERSION } from '@/model'
import type { FloorId, MaterialId, Project } from '@/model'

/** Pick tolerance used by the helpers, m. */
export const TEST_TOLERANCE = 0.2

/**
 * Three floors L1..L3 (3 m), a 12 x 8 m slab on L1 with a 2 x 2 m opening at (2..4, 2..4), floors L2
 * and L3 typical copies of L1, walls w1 (0,0)-(4,0) and w2 (12,2)-(12,6), frame line f1 (0,8)-(12,8),
 * column c1 at (6,4), a point mass pm1 at (9,5) and a line mass lm1 along y = 0 on L1, a 6 m grid.
 */
export function smallFixture(): Project {
  const L1 = 'L1' as FloorId
  const L2 = 'L2' as FloorId
  const L3 = 'L3' as FloorId
  const concrete = 'concrete' as MaterialId
  const range = { base: 'ground' as const, top: L3 }
  return {
    format: 'gyre-project',
    version: CURRENT_VERSION,
    name: 'Editor test block',
    floors: [
      { id: L1, name: 'Level 1', height: 3 },
      { id: L2, name: 'Level 2', height: 3, typicalOf: L1 },
      { id: L3, name: 'Level 3', height: 3, typicalOf: L1 },
    ],
    materials: {
      concrete: { id: concrete, name: 'Concrete', E: 30e9, nu: 0.2 },
      steel: { id: 'steel' as MaterialId, name: 'Steel', E: 200e9, nu: 0.3 },
    },
    slabs: {
      s1: {
        id: 's1' as never,
        floor: L1,
        outline: [
          { x: 0, y: 0 },
          { x: 12, y: 0 },
          { x: 12, y: 8 },
          { x: 0, y: 8 },
        ],
        openings: [
          [
            { x: 2, y: 2 },
            { x: 4, y: 2 },
            { x: 4, y: 4 },
            { x: 2, y: 4 },
          ],
        ],
        areaMass: 600,
      },
    },
    lineMasses: {
      lm1: { id: 'lm1' as never, floor: L1, points: [{ x: 0, y: 0 }, { x: 12, y: 0 }], massPerLength: 400 },
    },
    pointMasses: { pm1: { id: 'pm1' as never, floor: L1, at: { x: 9, y: 5 }, mass: 2000 } },
    walls: {
      w1: {
        id: 'w1' as never,
        name: 'Wall 1',
        p1: { x: 0, y: 0 },
        p2: { x: 4, y: 0 },
        thickness: 0.3,
        material: concrete,
        flexureFactor: 0.7,
        shearFactor: 1,
        ...range,
        stories: { L3: { thickness: 0.2 } },
      },
      w2: {
        id: 'w2' as never,
        name: 'Wall 2',
        p1: { x: 12, y: 2 },
        p2: { x: 12, y: 6 },
        thickness: 0.3,
        material: concrete,
        flexureFactor: 0.7,
        shearFactor: 1,
        base: 'ground',
        top: L2,
      },
    },
    frameLines: {
      f1: {
        id: 'f1' as never,
        name: 'Frame 1',
        p1: { x: 0, y: 8 },
        p2: { x: 12, y: 8 },
        stiffness: { kind: 'direct', storyStiffness: 4e7 },
        ...range,
      },
    },
    columns: {
      c1: {
        id: 'c1' as never,
        name: 'Column 1',
        at: { x: 6, y: 4 },
        angle: 0,
        Ix: 0.005,
        Iy: 0.005,
        material: concrete,
        fixity: 'fixed',
        ...range,
      },
    },
    grid: {
      x: [
        { label: '1', at: 0 },
        { label: '2', at: 6 },
        { label: '3', at: 12 },
      ],
      y: [
        { label: 'A', at: 0 },
        { label: 'B', at: 8 },
      ],
    },
    settings: {
      criterionSet: 'asce7-16',
      accidentalEccentricity: 0.05,
      damping: 0.05,
      spectrum: { kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8 },
      directionCombination: 'srss',
    },
  }
}

/** The demo building from public/examples. */
export function demoProject(): Project {
  const path = fileURLToPath(new URL('../../public/examples/corner-block.json', import.meta.url))
  return JSON.parse(readFileSync(path, 'utf8')) as Project
}

/** A store on `project` (default: the small fixture). */
export function createTestEditor(project: Project | 'demo' = smallFixture()): EditorStore {
  return createEditorStore(project === 'demo' ? demoProject() : project)
}

type Mods = { shift?: boolean; alt?: boolean }

/** Press and release at one point. */
export function click(store: EditorStore, x: number, y: number, mods: Mods = {}): void {
  const point = { x, y }
  dispatch(store, { type: 'pointerDown', point, tolerance: TEST_TOLERANCE, ...mods })
  dispatch(store, { type: 'pointerUp', point, tolerance: TEST_TOLERANCE, ...mods })
}

/** Pointer move without buttons. */
export function move(store: EditorStore, x: number, y: number, mods: Mods = {}): void {
  dispatch(store, { type: 'pointerMove', point: { x, y }, tolerance: TEST_TOLERANCE, ...mods })
}

/**
 * Press at `from`, move in `steps` equal steps to `to`, and release there (unless `release` is false).
 */
export function drag(
  store: EditorStore,
  from: { x: number; y: number },
  to: { x: number; y: number },
  options: Mods & { steps?: number; release?: boolean } = {},
): void {
  const { steps = 10, release = true, ...mods } = options
  dispatch(store, { type: 'pointerDown', point: from, tolerance: TEST_TOLERANCE, ...mods })
  for (let i = 1; i <= steps; i++) {
    const t = i / steps
    const point = { x: from.x + t * (to.x - from.x), y: from.y + t * (to.y - from.y) }
    dispatch(store, { type: 'pointerMove', point, tolerance: TEST_TOLERANCE, ...mods })
  }
  if (release) dispatch(store, { type: 'pointerUp', point: to, tolerance: TEST_TOLERANCE, ...mods })
}

/** Send one event. */
export function send(store: EditorStore, event: EditorEvent): void {
  dispatch(store, event)
}
