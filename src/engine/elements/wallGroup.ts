/**
 * Wall groups: walls joined at their ends (L, T, C and box cores) act as one thin-walled composite
 * section. A group is assembled as three elements of the existing kind, all measured at the section's
 * shear centre S: two condensed Timoshenko stacks along the principal directions d1, d2 (composite I
 * and shear area) and one St Venant torsion chain (story stiffness G J / h, map [0, 0, 1]).
 * Why this is exact for the idealised beam: with translations measured at the shear centre, bending
 * about the two principal axes and torsion about S are uncoupled (Vlasov), and a rigid diaphragm moves
 * S of a floor by (u_x − θ y_S, u_y + θ x_S), so the stack along d takes the map row
 * [d_x, d_y, x_S d_y − y_S d_x] and the twist is θ itself. Warping torsion is neglected.
 * Units: N, m, Pa, rad.
 * @see docs/mechanics.md §Wall groups; Vlasov, Thin-Walled Elastic Beams (1961) (from memory);
 * MODELING.md §Lateral-resisting elements
 */
import { elementFloorRange } from '@/model'
import type { Point, Project, Wall } from '@/model'
import { elementMapRow, extendWithSupportFloor, segmentDirection } from '../dofs'
import type { AssembledElement, Issue } from '../results'
import { shearChainStiffness } from './frameLine'
import { buildWallElement, wallStackStiffness } from './wall'
import type { WallStory } from './wall'
import { compositeSection, jointTolerance, legsJoin } from './wallSection'
import type { CompositeSection, SectionLeg } from './wallSection'

/** A set of joined walls acting as one section. */
export interface WallGroup {
  /** Group id: the member wall ids, sorted, joined by '+'. */
  readonly id: string
  /** Member wall ids, sorted. */
  readonly wallIds: readonly string[]
}

/** The walls' legs at their own thickness (the wall's base value, overrides ignored). */
function baseLeg(wall: Wall): SectionLeg {
  return { p1: wall.p1, p2: wall.p2, t: wall.thickness }
}

/**
 * Groups of joined walls. Two walls join when an end of one lies within half the larger thickness of
 * an end or of the centre-line of the other (`legsJoin`), neither is marked `joins: 'apart'`, and
 * they span the same floors (same base and top) in the same material. Walls whose floor range is
 * empty or unknown never join. Walls that touch but differ in
 * floors or material stay apart, with an info issue. Only groups of two or more walls are returned.
 * @see docs/mechanics.md §Wall groups (detection)
 */
export function findWallGroups(project: Pick<Project, 'walls' | 'floors'>): {
  groups: WallGroup[]
  issues: Issue[]
} {
  // Walls that cannot be built (no length, an unknown floor range) are left to the planar builder,
  // which reports them.
  const walls = Object.values(project.walls).filter(
    (w) =>
      w.joins !== 'apart' &&
      elementFloorRange(project, w) !== null &&
      segmentDirection(w.p1, w.p2) !== null &&
      Number.isFinite(w.thickness) &&
      w.thickness > 0,
  )
  const parent = walls.map((_, i) => i)
  const find = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]!]!
    return i
  }
  const issues: Issue[] = []
  for (let i = 0; i < walls.length; i++) {
    const a = walls[i]!
    for (let j = i + 1; j < walls.length; j++) {
      const b = walls[j]!
      const tol = jointTolerance(a.thickness, b.thickness)
      // Bounding-box rejection before the exact test.
      if (
        Math.min(a.p1.x, a.p2.x) - tol > Math.max(b.p1.x, b.p2.x) ||
        Math.min(b.p1.x, b.p2.x) - tol > Math.max(a.p1.x, a.p2.x) ||
        Math.min(a.p1.y, a.p2.y) - tol > Math.max(b.p1.y, b.p2.y) ||
        Math.min(b.p1.y, b.p2.y) - tol > Math.max(a.p1.y, a.p2.y)
      ) {
        continue
      }
      if (!legsJoin(baseLeg(a), baseLeg(b), tol)) continue
      if (a.base !== b.base || a.top !== b.top || a.material !== b.material) {
        const why =
          a.material !== b.material
            ? 'they are of different materials'
            : `they span different floors (${a.base}–${a.top} and ${b.base}–${b.top})`
        issues.push({
          code: 'not-applicable',
          severity: 'info',
          message:
            `[engine] walls ${a.id} (${a.name}) and ${b.id} (${b.name}) touch but act as separate planar walls: ` +
            `${why}; give them the same floors and material to join them into one section`,
          refs: [a.id, b.id],
        })
        continue
      }
      parent[find(i)] = find(j)
    }
  }
  const byRoot = new Map<number, string[]>()
  walls.forEach((w, i) => {
    const r = find(i)
    const list = byRoot.get(r)
    if (list) list.push(w.id)
    else byRoot.set(r, [w.id])
  })
  const groups: WallGroup[] = []
  for (const ids of byRoot.values()) {
    if (ids.length < 2) continue
    const sorted = [...ids].sort()
    groups.push({ id: sorted.join('+'), wallIds: sorted })
  }
  groups.sort((g, h) => (g.id < h.id ? -1 : g.id > h.id ? 1 : 0))
  return { groups, issues }
}

/** The section of a group at one story (per-story overrides of thickness and factors applied). */
export function groupStoryLegs(walls: readonly Wall[], floorId: string): SectionLeg[] {
  return walls.map((w) => {
    const o = w.stories?.[floorId]
    return {
      p1: w.p1,
      p2: w.p2,
      t: o?.thickness ?? w.thickness,
      flexureFactor: o?.flexureFactor ?? w.flexureFactor,
      shearFactor: o?.shearFactor ?? w.shearFactor,
    }
  })
}

/** What a wall group is, for the inspector and the plan: its section at the lowest story. */
export interface WallGroupSummary extends WallGroup {
  /** section of the lowest story (thickness and factors of that story) */
  readonly section: CompositeSection
}

/**
 * Groups of a project with their lowest-story sections (for display: members, shear centre, axes).
 * @see findWallGroups, compositeSection
 */
export function describeWallGroups(project: Pick<Project, 'walls' | 'floors'>): WallGroupSummary[] {
  const out: WallGroupSummary[] = []
  for (const g of findWallGroups(project).groups) {
    const walls = g.wallIds.map((id) => project.walls[id]!)
    const range = elementFloorRange(project, walls[0]!)
    const floorId = range ? project.floors[range.first]?.id : undefined
    out.push({ ...g, section: compositeSection(groupStoryLegs(walls, floorId ?? '')) })
  }
  return out
}

/**
 * The assembled elements of a wall group: stacks along the principal directions d1 and d2 through
 * the shear centre (E I1, G As1 and E I2, G As2 per story) and a torsion chain with story stiffness
 * G J / h and map [0, 0, 1]. All carry the group id and `refs` = the member walls. The axes and the
 * shear centre are those of the lowest story; where thickness or factors change up the height, each
 * story's I and A_s are taken along those fixed axes (the product term about them is dropped) and an
 * info issue says how far that story's own shear centre or axes lie from them.
 * A stack whose I is negligible (all legs on one line: no stiffness across it, as for a planar wall)
 * is left out. If any member cannot be built as a wall on its own (bad input), the group is not
 * formed: `elements` is null and the caller builds the walls one by one (which reports the problem).
 * @see docs/mechanics.md §Wall groups
 */
export function buildWallGroupElements(
  project: Pick<Project, 'floors' | 'materials'>,
  walls: readonly Wall[],
  groupId: string,
): { elements: AssembledElement[] | null; issues: Issue[] } {
  const first = walls[0]
  if (!first) return { elements: [], issues: [] }
  for (const w of walls) {
    if (buildWallElement(project, w).element === null) return { elements: null, issues: [] }
  }
  const range = elementFloorRange(project, first)
  const material = project.materials[first.material]
  if (!range || !material) return { elements: null, issues: [] }
  const E = material.E
  const G = E / (2 * (1 + material.nu))
  const refs = walls.map((w) => w.id)
  const issues: Issue[] = []

  const sections: { h: number; s: CompositeSection; floorId: string }[] = []
  for (let f = range.first; f <= range.last; f++) {
    const floor = project.floors[f]!
    sections.push({ h: floor.height, s: compositeSection(groupStoryLegs(walls, floor.id)), floorId: floor.id })
  }
  const ref = sections[0]!.s
  const { d1, d2, shearCentre: S } = ref
  const size = Math.sqrt(Math.max(ref.I1, 1e-300) / Math.max(ref.area, 1e-300))
  const along = (s: CompositeSection, d: Point): { I: number; As: number } => ({
    I: d.x * d.x * s.Sxx + d.y * d.y * s.Syy + 2 * d.x * d.y * s.Sxy,
    // Shear areas along a direction between the principal ones: As1 cos² + As2 sin² (legs' own terms).
    As: (() => {
      const c1 = d.x * s.d1.x + d.y * s.d1.y
      const c2 = d.x * s.d2.x + d.y * s.d2.y
      return s.As1 * c1 * c1 + s.As2 * c2 * c2
    })(),
  })
  for (const { s, floorId } of sections.slice(1)) {
    const moved = Math.hypot(s.shearCentre.x - S.x, s.shearCentre.y - S.y)
    const turned = Math.abs(Math.asin(Math.max(-1, Math.min(1, s.d1.x * d1.y - s.d1.y * d1.x))))
    if (moved > 0.05 * Math.max(size, 1e-9) || turned > (2 * Math.PI) / 180) {
      issues.push({
        code: 'not-applicable',
        severity: 'info',
        message:
          `[engine] wall group ${groupId}: at story ${floorId} its own shear centre lies ${moved.toFixed(2)} m and its ` +
          `principal axes ${((turned * 180) / Math.PI).toFixed(1)}° from those of the lowest story, which the group uses ` +
          'at every story',
        refs,
        floor: floorId,
      })
    }
  }

  const standsOnFloor = range.below >= 0
  const floors: number[] = []
  if (standsOnFloor) floors.push(range.below)
  for (let f = range.first; f <= range.last; f++) floors.push(f)
  const n = sections.length
  const extend = (k: Float64Array): Float64Array => (standsOnFloor ? extendWithSupportFloor(k, n) : k)
  const elements: AssembledElement[] = []
  for (const d of [d1, d2]) {
    const stories: WallStory[] = []
    let negligible = false
    for (const { h, s } of sections) {
      const { I, As } = along(s, d)
      if (!(I > 1e-9 * s.I1) || !(As > 1e-9 * (s.As1 + s.As2))) negligible = true
      stories.push({ h, EI: E * I, GAs: G * As })
    }
    if (negligible) continue
    elements.push({
      id: groupId,
      kind: 'wallGroup',
      floors,
      map: elementMapRow(S, d),
      standsOnFloor,
      stiffness: extend(wallStackStiffness(stories)),
      isShearType: false,
      refs,
    })
  }
  elements.push({
    id: groupId,
    kind: 'wallGroupTorsion',
    floors,
    map: [0, 0, 1],
    standsOnFloor,
    stiffness: extend(shearChainStiffness(sections.map(({ h, s }) => (G * s.J) / h))),
    isShearType: true,
    refs,
  })
  return { elements, issues }
}
