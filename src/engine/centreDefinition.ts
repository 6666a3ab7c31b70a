/**
 * When the floor-load centre of rigidity is only one of several reasonable definitions: information
 * issues for mixed wall-frame systems and for lateral elements that start above the base or stop below
 * the top floor. The centres themselves are unchanged; the issues tell the reader how far to trust
 * CR, e and r as "the" centre. Pure.
 * @see MODELING.md §Analyses (Centres); EN 1998-1:2004 4.2.3.2(8) (METHODS.md §2, from memory there):
 * approximate centre definitions for multi-storey buildings need every lateral system to run from the
 * foundation to the top and all systems to deflect in similar shapes; docs/criteria.md
 */
import type { Project } from '@/model'
import type { Issue } from './results'

/** Most element ids listed in one message (all ids still go to `refs`). */
const NAMED = 6

const list = (names: readonly string[]): string =>
  names.length <= NAMED ? names.join(', ') : `${names.slice(0, NAMED).join(', ')} and ${names.length - NAMED} more`

/**
 * Info issues (code 'centre-definition') for the two situations in which the floor-load centre of
 * rigidity depends on its definition:
 * - walls (bending-type deflection) together with frame lines or columns (shear-type deflection):
 *   the share each system takes changes up the height, so a force on one floor alone, a force
 *   pattern over all floors and a story-by-story definition give different centres;
 * - elements that start above the base or stop below the top floor.
 * Returns [] for a wall-only or frame-only system whose elements all run from the ground to the top.
 */
export function centreDefinitionIssues(project: Pick<Project, 'floors' | 'walls' | 'frameLines' | 'columns'>): Issue[] {
  const issues: Issue[] = []
  const walls = Object.values(project.walls)
  const frames = Object.values(project.frameLines)
  const columns = Object.values(project.columns)
  if (walls.length > 0 && frames.length + columns.length > 0) {
    const others = [
      frames.length > 0 ? `${frames.length} frame line${frames.length === 1 ? '' : 's'}` : '',
      columns.length > 0 ? `${columns.length} column${columns.length === 1 ? '' : 's'}` : '',
    ].filter((s) => s !== '')
    issues.push({
      code: 'centre-definition',
      severity: 'info',
      message:
        `[centres] mixed wall-frame system (${walls.length} wall${walls.length === 1 ? '' : 's'} with ${others.join(' and ')}): ` +
        'walls deflect in bending and frames and columns in shear, so the share each takes changes up the height and ' +
        'the floor-load centre of rigidity (a force on one floor alone) differs from centres found with other load ' +
        'patterns. Read CR, eccentricity and torsional radius as that one definition; EN 1998-1 4.2.3.2(8) admits ' +
        'approximate centres only where all systems deflect alike.',
      refs: [],
    })
  }
  const top = project.floors[project.floors.length - 1]?.id
  const partial = [...walls, ...frames, ...columns].filter((e) => e.base !== 'ground' || e.top !== top)
  if (partial.length > 0 && top !== undefined) {
    issues.push({
      code: 'centre-definition',
      severity: 'info',
      message:
        `[centres] ${partial.length} lateral element${partial.length === 1 ? '' : 's'} start above the base or stop below ` +
        `the top floor (${list(partial.map((e) => e.name || e.id))}): the floor-load centre of rigidity of the floors ` +
        'near where they start or stop depends on its definition. EN 1998-1 4.2.3.2(8) admits approximate centres ' +
        'only where every lateral system runs from the foundation to the top.',
      refs: partial.map((e) => e.id),
    })
  }
  return issues
}
