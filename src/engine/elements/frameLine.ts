/**
 * Frame line (moment or braced frame acting in its own plane). Direct and braced frames have a
 * shear-type story stiffness; a moment frame is condensed from a plane frame of its members
 * (momentFrame.ts), giving a full lateral stiffness over its floors. Units: N, m, Pa.
 * @see MODELING.md §Lateral-resisting elements, docs/mechanics.md §Frame lines
 */
import { STIFFNESS_FACTOR_DEFAULTS, elementFloorRange } from '@/model'
import type { FrameLine, Project } from '@/model'
import { elementMapRow, extendWithSupportFloor, segmentDirection } from '../dofs'
import type { AssembledElement, Issue } from '../results'
import { leftOutIssue, positive } from './leftOut'
import { momentFrameStiffness } from './momentFrame'
import type { MomentFrameStory } from './momentFrame'

/**
 * Story stiffness of a regular moment frame by the equal-joint-rotation method, N/m:
 * k = 12 E / (h² (1/ΣKc + 1/ΣKb)), ΣKc = (bays+1) Ic/h, ΣKb = bays Ib/bayWidth.
 * No longer used by the engine (moment frames are condensed from the plane frame, momentFrame.ts);
 * kept as the hand formula the docs compare against: it assumes every joint of a story turns by the
 * same angle and the stories above and below are alike, so it misses the first and top stories.
 * @see docs/mechanics.md §Frame lines (derivation by slope-deflection, common practice)
 */
export function momentFrameStoryStiffness(
  E: number,
  bays: number,
  bayWidth: number,
  columnI: number,
  beamI: number,
  h: number,
): number {
  const sumKc = ((bays + 1) * columnI) / h
  const sumKb = (bays * beamI) / bayWidth
  return (12 * E) / (h * h * (1 / sumKc + 1 / sumKb))
}

/**
 * Story stiffness of a braced bay, N/m: braces · E A cos²α / L_d with L_d = sqrt(bayWidth² + h²) and
 * cos α = bayWidth / L_d (pin-ended axial braces, rigid beams and columns).
 * @see common practice: axial stiffness EA/L_d projected twice onto the story drift direction
 */
export function bracedFrameStoryStiffness(
  E: number,
  braces: number,
  bayWidth: number,
  braceArea: number,
  h: number,
): number {
  const Ld = Math.hypot(bayWidth, h)
  const cos = bayWidth / Ld
  return (braces * E * braceArea * cos * cos) / Ld
}

/**
 * Shear-type stiffness (n x n, row-major, N/m) of a chain of n stories with story stiffness k_s
 * (story s joins floor s-1 and floor s; the base below story 0 is fixed): tridiagonal,
 * K[i][i] = k_i + k_{i+1}, K[i][i+1] = -k_{i+1}.
 * @see MODELING.md §Lateral-resisting elements (shear type)
 */
export function shearChainStiffness(storyStiffness: ArrayLike<number>): Float64Array {
  const n = storyStiffness.length
  const K = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    const k = storyStiffness[i] as number
    K[i * n + i] = (K[i * n + i] as number) + k
    if (i > 0) {
      K[(i - 1) * n + i - 1] = (K[(i - 1) * n + i - 1] as number) + k
      K[(i - 1) * n + i] = -k
      K[i * n + i - 1] = -k
    }
  }
  return K
}

/** Assembled-element record of a frame line (issues instead of exceptions for bad input). */
export function buildFrameLineElement(
  project: Pick<Project, 'floors' | 'materials'>,
  frame: FrameLine,
): { element: AssembledElement | null; issues: Issue[] } {
  const fail = (code: Issue['code'], why: string): { element: null; issues: Issue[] } => ({
    element: null,
    issues: [leftOutIssue('frame line', frame.id, frame.name, code, why)],
  })
  const seg = segmentDirection(frame.p1, frame.p2)
  if (!seg) return fail('zero-length', 'its two end points coincide (zero length)')
  const range = elementFloorRange(project, frame)
  if (!range) {
    return fail(
      'element-outside-floors',
      `its floor range (base ${frame.base}, top ${frame.top}) is empty or names an unknown floor`,
    )
  }
  const spec = frame.stiffness
  let E = 0
  if (spec.kind !== 'direct') {
    const material = project.materials[spec.material]
    if (!material) return fail('invalid-model', `material "${spec.material}" does not exist`)
    if (!positive(material.E)) return fail('invalid-model', `material E must be > 0 (got ${material.E})`)
    E = material.E
  }
  if (spec.kind === 'moment') return buildMomentFrame(project, frame, E, range, seg.d, fail)
  const k: number[] = []
  for (let f = range.first; f <= range.last; f++) {
    const floor = project.floors[f]
    if (!floor) return fail('element-outside-floors', `floor index ${f} does not exist`)
    const h = floor.height
    if (!positive(h)) return fail('invalid-model', `story height of ${floor.id} must be > 0`)
    let ks: number
    switch (spec.kind) {
      case 'direct':
        ks = spec.stories?.[floor.id] ?? spec.storyStiffness
        break
      case 'braced':
        if (!positive(spec.braces) || !positive(spec.bayWidth) || !positive(spec.braceArea)) {
          return fail('invalid-model', 'braces, bay width and brace area must all be > 0')
        }
        ks = bracedFrameStoryStiffness(E, spec.braces, spec.bayWidth, spec.braceArea, h)
        break
      default: {
        const never: never = spec
        return fail('unsupported-element', `unknown stiffness kind ${String((never as { kind: unknown }).kind)}`)
      }
    }
    if (!(Number.isFinite(ks) && ks >= 0)) {
      return fail('invalid-model', `story stiffness at ${floor.id} must be a finite number >= 0 (got ${ks})`)
    }
    k.push(ks)
  }
  const fixedBase = shearChainStiffness(k)
  const standsOnFloor = range.below >= 0
  const floors: number[] = []
  if (standsOnFloor) floors.push(range.below)
  for (let f = range.first; f <= range.last; f++) floors.push(f)
  return {
    element: {
      id: frame.id,
      kind: 'frameLine',
      floors,
      map: elementMapRow(frame.p1, seg.d),
      standsOnFloor,
      stiffness: standsOnFloor ? extendWithSupportFloor(fixedBase, k.length) : fixedBase,
      isShearType: true,
    },
    issues: [],
  }
}

/** Largest number of rotation DOFs a condensed moment frame may have (bays+1 times levels). */
const MOMENT_FRAME_MAX_JOINTS = 200_000

/**
 * Assembled-element record of a moment frame: per story E·f_c·I_c for every column and E·f_b·I_b for
 * every beam at the floor on top (per-story overrides keyed by that floor), condensed to the floors.
 */
function buildMomentFrame(
  project: Pick<Project, 'floors' | 'materials'>,
  frame: FrameLine,
  E: number,
  range: { below: number; first: number; last: number },
  d: { x: number; y: number },
  fail: (code: Issue['code'], why: string) => { element: null; issues: Issue[] },
): { element: AssembledElement | null; issues: Issue[] } {
  const spec = frame.stiffness
  if (spec.kind !== 'moment') throw new Error('[engine] buildMomentFrame needs a moment frame')
  if (!(Number.isInteger(spec.bays) && spec.bays >= 1)) {
    return fail('invalid-model', `bays must be a whole number >= 1 (got ${spec.bays})`)
  }
  if (!positive(spec.bayWidth) || !positive(spec.columnI) || !positive(spec.beamI)) {
    return fail('invalid-model', 'bay width, column I and beam I must all be > 0')
  }
  const fc = spec.columnFactor ?? STIFFNESS_FACTOR_DEFAULTS.frameColumn
  const fb = spec.beamFactor ?? STIFFNESS_FACTOR_DEFAULTS.frameBeam
  if (!positive(fc)) return fail('invalid-model', `column factor must be > 0 (got ${fc})`)
  if (!positive(fb)) return fail('invalid-model', `beam factor must be > 0 (got ${fb})`)
  const stories: MomentFrameStory[] = []
  for (let f = range.first; f <= range.last; f++) {
    const floor = project.floors[f]
    if (!floor) return fail('element-outside-floors', `floor index ${f} does not exist`)
    if (!positive(floor.height)) return fail('invalid-model', `story height of ${floor.id} must be > 0`)
    const o = spec.stories?.[floor.id]
    const Ic = o?.columnI ?? spec.columnI
    const Ib = o?.beamI ?? spec.beamI
    if (!positive(Ic) || !positive(Ib)) {
      return fail('invalid-model', `column I and beam I at ${floor.id} must be > 0 (got ${Ic}, ${Ib})`)
    }
    stories.push({ h: floor.height, EIc: E * fc * Ic, EIb: E * fb * Ib })
  }
  if ((spec.bays + 1) * (stories.length + 1) > MOMENT_FRAME_MAX_JOINTS) {
    return fail(
      'invalid-model',
      `${spec.bays} bays over ${stories.length} stories is more than ${MOMENT_FRAME_MAX_JOINTS} joints`,
    )
  }
  const fixedBase = momentFrameStiffness(stories, spec.bays, spec.bayWidth, spec.baseFixity ?? 'fixed')
  if (!fixedBase) return fail('invalid-model', 'its joint rotation stiffness is not positive definite')
  const n = stories.length
  for (let i = 0; i < n * n; i++) {
    if (!Number.isFinite(fixedBase[i])) return fail('invalid-model', 'its condensed stiffness is not finite')
  }
  const standsOnFloor = range.below >= 0
  const floors: number[] = []
  if (standsOnFloor) floors.push(range.below)
  for (let f = range.first; f <= range.last; f++) floors.push(f)
  return {
    element: {
      id: frame.id,
      kind: 'frameLine',
      floors,
      map: elementMapRow(frame.p1, d),
      standsOnFloor,
      stiffness: standsOnFloor ? extendWithSupportFloor(fixedBase, n) : fixedBase,
      isShearType: false,
    },
    issues: [],
  }
}
