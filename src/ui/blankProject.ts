/** A new, empty project to build from scratch: one floor, two materials, a 6 m grid, no elements. */
import { generateGrid } from '@/editor'
import { CURRENT_VERSION, DEFAULT_SETTINGS } from '@/model'
import type { FloorId, MaterialId, Project } from '@/model'

export function blankProject(): Project {
  return {
    format: 'gyre-project',
    version: CURRENT_VERSION,
    name: 'New building',
    floors: [{ id: 'F1' as FloorId, name: 'Level 1', height: 3.5 }],
    materials: {
      // Typical moduli for a first layout (common practice orders of magnitude); edit to suit.
      concrete: { id: 'concrete' as MaterialId, name: 'Concrete', E: 30e9, nu: 0.2 },
      steel: { id: 'steel' as MaterialId, name: 'Steel', E: 200e9, nu: 0.3 },
    },
    slabs: {},
    lineMasses: {},
    pointMasses: {},
    walls: {},
    frameLines: {},
    columns: {},
    grid: generateGrid({ xCount: 6, yCount: 5, xSpacing: 6, ySpacing: 6 }),
    settings: DEFAULT_SETTINGS,
  }
}
