/**
 * Where the storey shear goes: per assembled element (wall, frame line, column axis, and any later
 * element kind with a map row and a lateral stiffness), its storey shears along its own line, its
 * share of the storey shear along the load, and its overturning moment at every storey, for the
 * static torsion cases and for the response spectrum (formed per mode, then combined).
 *
 * Definitions (MODELING.md, Lateral-resisting elements): the element's displacements along its line
 * at its floors are v = A_e u (v_k = a · u at floor F_k); its nodal forces are f = k_e v (N, the force
 * the element takes from each floor, along d). The storey shear in the storey below its k-th floor
 * is V_k = sum_{j >= k} f_j (top down); the overturning moment at the bottom of that storey is
 * M_k = sum_{j >= k} V_j h_j (h_j the height of the storey below floor F_j), N·m.
 * @see docs/results-format.md "elementForces"; statics of a free body cut below storey k
 */
import { CAUTION } from '@/model'
import { combineCqc } from './cqc'
import type {
  AssembledElement,
  ElementForceCase,
  ElementForceRow,
  ElementForcesResult,
  StaticTorsionResult,
  Structure,
} from './results'
import { combineDirections } from './spectrum'
import type { SpectrumDetail } from './spectrum'

/** Floor indices (0-based) of the storeys an element occupies: the storey below each floor it spans. */
export function elementStoryFloors(element: AssembledElement): number[] {
  return element.standsOnFloor ? element.floors.slice(1) : [...element.floors]
}

/**
 * Storey shears of one element for one displacement vector (global order at O, read from `offset`),
 * N along the element's direction d, one per storey of `elementStoryFloors`, bottom first.
 */
export function elementStoryShears(
  element: AssembledElement,
  u: ArrayLike<number>,
  offset = 0,
): Float64Array {
  const f = element.floors
  const ne = f.length
  const [a0, a1, a2] = element.map
  const v = new Float64Array(ne)
  for (let k = 0; k < ne; k++) {
    const o = offset + 3 * f[k]!
    v[k] = a0 * u[o]! + a1 * u[o + 1]! + a2 * u[o + 2]!
  }
  const kE = element.stiffness
  const nodal = new Float64Array(ne)
  for (let p = 0; p < ne; p++) {
    let s = 0
    for (let q = 0; q < ne; q++) s += kE[p * ne + q]! * v[q]!
    nodal[p] = s
  }
  const first = element.standsOnFloor ? 1 : 0
  const out = new Float64Array(ne - first)
  let sum = 0
  for (let k = ne - 1; k >= first; k--) {
    sum += nodal[k]!
    out[k - first] = sum
  }
  return out
}

/**
 * Overturning moments at the bottom of each storey of an element from its storey shears:
 * M_k = sum_{j >= k} V_j h_j, N·m (same order as the shears).
 */
export function elementOverturningMoments(
  structure: Structure,
  element: AssembledElement,
  shears: ArrayLike<number>,
): Float64Array {
  const floors = elementStoryFloors(element)
  const out = new Float64Array(floors.length)
  let sum = 0
  for (let k = floors.length - 1; k >= 0; k--) {
    sum += shears[k]! * structure.floors[floors[k]!]!.height
    out[k] = sum
  }
  return out
}

/** Storey shears along x or y of the whole building from floor loads (top down), N. */
function storyShearsFrom(structure: Structure, loads: ArrayLike<number>, comp: 0 | 1): Float64Array {
  const nf = structure.floorCount
  const out = new Float64Array(nf)
  let s = 0
  for (let f = nf - 1; f >= 0; f--) {
    s += loads[3 * f + comp]!
    out[f] = s
  }
  return out
}

const ratio = (a: number, b: number): number => (b !== 0 && Number.isFinite(a / b) ? a / b : 0)

interface Builder {
  shear: Float64Array[]
  share: Float64Array[]
  moment: Float64Array[]
}

/**
 * Element storey shears, shares and overturning moments for every static torsion case and every
 * spectrum case (each excitation direction, the two combined, and the same with the accidental
 * torsion envelope when the spectrum has it).
 *
 * Shares: static cases, V_e d_load / V_storey (signed; they sum to 1 over the elements of a storey);
 * spectrum cases, |d_load| V_e / V_storey with both peaks combined over modes, so they need not sum to
 * 1; for the cases of both directions combined, the load direction is the element's own main axis.
 * @see docs/results-format.md "elementForces"; ASCE/SEI 7-16 12.9.1.5 for accidental torsion added to
 *   spectrum results (from memory)
 */
export function computeElementForces(
  structure: Structure,
  torsion: StaticTorsionResult | null,
  spectrum: SpectrumDetail | null,
): ElementForcesResult {
  const cases: ElementForceCase[] = []
  const elements = structure.elements
  const rows: Builder[] = elements.map(() => ({ shear: [], share: [], moment: [] }))
  const push = (e: number, shear: Float64Array, share: Float64Array): void => {
    const el = elements[e]!
    rows[e]!.shear.push(shear)
    rows[e]!.share.push(share)
    rows[e]!.moment.push(elementOverturningMoments(structure, el, shear))
  }

  for (const c of torsion?.cases ?? []) {
    cases.push({ id: c.id, label: `static ${c.id}`, kind: 'static', direction: c.direction, accidentalTorsion: true })
    const comp = c.direction === 'x' ? 0 : 1
    const loads = new Float64Array(structure.dofCount)
    c.forces.forEach((F, i) => {
      loads[3 * i + comp] = F
    })
    const Vs = storyShearsFrom(structure, loads, comp)
    elements.forEach((el, e) => {
      const V = elementStoryShears(el, c.displacements)
      const floors = elementStoryFloors(el)
      const d = el.map[comp]
      push(e, V, Float64Array.from(floors, (f, k) => ratio(V[k]! * d, Vs[f]!)))
    })
  }

  if (spectrum) {
    const { set, rho, responses, scale, rule, torsionDisplacements } = spectrum
    const n = structure.dofCount
    // Per excitation direction: element shears per mode -> CQC -> scaled (moments per mode too).
    const perDir = (d: 'x' | 'y') => {
      const u = responses[d].displacements
      return elements.map((el) => {
        const stories = elementStoryFloors(el).length
        const modalV = new Float64Array(set.count * stories)
        const modalM = new Float64Array(set.count * stories)
        for (let m = 0; m < set.count; m++) {
          const V = elementStoryShears(el, u, m * n)
          modalV.set(V, m * stories)
          modalM.set(elementOverturningMoments(structure, el, V), m * stories)
        }
        const shear = new Float64Array(stories)
        const moment = new Float64Array(stories)
        const buf = new Float64Array(set.count)
        for (let k = 0; k < stories; k++) {
          for (let m = 0; m < set.count; m++) buf[m] = modalV[m * stories + k]!
          shear[k] = combineCqc(buf, rho) * scale[d]
          for (let m = 0; m < set.count; m++) buf[m] = modalM[m * stories + k]!
          moment[k] = combineCqc(buf, rho) * scale[d]
        }
        return { shear, moment }
      })
    }
    const peak = { x: perDir('x'), y: perDir('y') }
    const storeyShear = spectrum.storyShear
    const addSpectrumCases = (withTorsion: boolean): void => {
      const extra = (d: 'x' | 'y', e: number): { shear: Float64Array; moment: Float64Array } | null => {
        const ut = torsionDisplacements?.[d]
        if (!withTorsion || !ut) return null
        const V = elementStoryShears(elements[e]!, ut)
        return { shear: V, moment: elementOverturningMoments(structure, elements[e]!, V) }
      }
      const tag = withTorsion ? ' with accidental torsion' : ''
      const idTag = withTorsion ? '+torsion' : ''
      const dirCase = (d: 'x' | 'y'): void => {
        cases.push({
          id: `spectrum-${d}${idTag}`,
          label: `spectrum ${d.toUpperCase()}${tag}`,
          kind: 'spectrum',
          direction: d,
          accidentalTorsion: withTorsion,
        })
        const comp = d === 'x' ? 0 : 1
        elements.forEach((el, e) => {
          const p = peak[d][e]!
          const t = extra(d, e)
          const shear = t ? p.shear.map((v, k) => v + Math.abs(t.shear[k]!)) : p.shear
          const moment = t ? p.moment.map((v, k) => v + Math.abs(t.moment[k]!)) : p.moment
          const floors = elementStoryFloors(el)
          const dd = Math.abs(el.map[comp])
          const share = Float64Array.from(floors, (f, k) => ratio(shear[k]! * dd, storeyShear[d][comp][f]!))
          rows[e]!.shear.push(shear)
          rows[e]!.share.push(share)
          rows[e]!.moment.push(moment)
        })
      }
      dirCase('x')
      dirCase('y')
      cases.push({
        id: `spectrum${idTag}`,
        label: `spectrum X and Y (${rule === 'srss' ? 'SRSS' : '100/30'})${tag}`,
        kind: 'spectrum',
        direction: 'both',
        accidentalTorsion: withTorsion,
      })
      elements.forEach((el, e) => {
        const at = (d: 'x' | 'y') => {
          const p = peak[d][e]!
          const t = extra(d, e)
          return {
            shear: t ? p.shear.map((v, k) => v + Math.abs(t.shear[k]!)) : p.shear,
            moment: t ? p.moment.map((v, k) => v + Math.abs(t.moment[k]!)) : p.moment,
          }
        }
        const ax = at('x')
        const ay = at('y')
        const shear = ax.shear.map((v, k) => combineDirections(v, ay.shear[k]!, rule))
        const moment = ax.moment.map((v, k) => combineDirections(v, ay.moment[k]!, rule))
        const comp = Math.abs(el.map[0]) >= Math.abs(el.map[1]) ? 0 : 1
        const dd = Math.abs(el.map[comp])
        const floors = elementStoryFloors(el)
        const share = Float64Array.from(floors, (f, k) => ratio(shear[k]! * dd, storeyShear.both[comp][f]!))
        rows[e]!.shear.push(shear)
        rows[e]!.share.push(share)
        rows[e]!.moment.push(moment)
      })
    }
    addSpectrumCases(false)
    if (torsionDisplacements) addSpectrumCases(true)
  }

  // Rows stay aligned with structure.elements. A wall group's St Venant torsion chain (kind
  // 'wallGroupTorsion') carries a storey torque in N·m in its `shear` entries, not a force.
  const out: ElementForceRow[] = elements.map((el, e) => ({
    elementId: el.id,
    ...(el.refs ? { refs: el.refs } : {}),
    kind: el.kind,
    direction: { x: el.map[0], y: el.map[1] },
    floorIds: elementStoryFloors(el).map((f) => structure.floors[f]!.id),
    shear: rows[e]!.shear,
    share: rows[e]!.share,
    overturningMoment: rows[e]!.moment,
  }))
  return { cases, elements: out, caution: CAUTION }
}
