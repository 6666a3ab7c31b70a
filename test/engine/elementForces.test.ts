import { describe, expect, it } from 'vitest'
import { analyzeProject } from '@/engine'
import { buildStructure } from '@/engine/assemble'
import {
  computeElementForces,
  elementOverturningMoments,
  elementStoryFloors,
  elementStoryShears,
} from '@/engine/elementForces'
import { solveModes } from '@/engine/modal'
import { createStiffnessSolver } from '@/engine/solve'
import { runSpectrumDetailed } from '@/engine/spectrum'
import { runStaticTorsion } from '@/engine/loads'
import type { Structure } from '@/engine/results'
import { expectRelClose } from '../helpers/approx'
import { generateBuilding, transformProject } from '../helpers/generateBuilding'
import { mixedModel, projectBuilder } from '../helpers/projectBuilder'

/** Storey shear along `comp` (0 = x, 1 = y) of storey i from floor loads at O, top down. */
function storeyShear(s: Structure, loads: ArrayLike<number>, offset: number, comp: 0 | 1, i: number): number {
  let v = 0
  for (let g = i; g < s.floorCount; g++) v += loads[offset + 3 * g + comp]!
  return v
}

/** Sum over elements of V_e d_comp in storey i for displacement u. */
function elementSum(s: Structure, u: ArrayLike<number>, offset: number, comp: 0 | 1, i: number): number {
  let sum = 0
  for (const el of s.elements) {
    const k = elementStoryFloors(el).indexOf(i)
    if (k < 0) continue
    sum += elementStoryShears(el, u, offset)[k]! * el.map[comp]
  }
  return sum
}

describe('element storey shears', () => {
  it('sum to the storey shear in every static case, storey and direction (equilibrium)', () => {
    // Statics: the free body above a cut through storey i carries the applied floor forces above it
    // only through the elements crossing the cut. mixedModel has a wall standing on L2, a braced
    // frame stopping at L3, an inclined wall, a skewed column and a column standing on L1.
    const p = mixedModel()
    const r = analyzeProject(p)
    const s = buildStructure(p).structure!
    expect(r.elementForces).toBeTruthy()
    const ef = r.elementForces!
    for (const [ci, c] of r.torsion!.cases.entries()) {
      expect(ef.cases[ci]!.id).toBe(c.id)
      const comp = c.direction === 'x' ? 0 : 1
      const other = comp === 0 ? 1 : 0
      for (let i = 0; i < s.floorCount; i++) {
        let applied = 0
        for (let g = i; g < s.floorCount; g++) applied += c.forces[g]!
        let along = 0
        let across = 0
        let share = 0
        ef.elements.forEach((row, e) => {
          const k = row.floorIds.indexOf(s.floors[i]!.id)
          if (k < 0) return
          const el = s.elements[e]!
          along += row.shear[ci]![k]! * el.map[comp]
          across += row.shear[ci]![k]! * el.map[other]
          share += row.share[ci]![k]!
        })
        expectRelClose(along, applied, 1e-9)
        expect(Math.abs(across) / applied).toBeLessThan(1e-9)
        expect(share).toBeCloseTo(1, 9)
      }
    }
  })

  it('sum to the modal storey shear in every spectrum mode, the residual included', () => {
    // Statics per mode: K u_m = p_m (modal inertia forces; the residual load for the residual).
    const p = mixedModel()
    const s = buildStructure(p).structure!
    const solver = createStiffnessSolver(s)
    if (!solver.ok) throw new Error('mechanism')
    const modes = solveModes(s)
    const detail = runSpectrumDetailed(s, modes, p.settings, { solver: solver.solver })
    const n = s.dofCount
    let checked = 0
    for (const d of ['x', 'y'] as const) {
      const { displacements: u, loads } = detail.responses[d]
      for (let m = 0; m < detail.set.count; m++) {
        for (const comp of [0, 1] as const) {
          for (let i = 0; i < s.floorCount; i++) {
            const V = storeyShear(s, loads, m * n, comp, i)
            const sum = elementSum(s, u, m * n, comp, i)
            let scale = 0
            for (let g = 0; g < s.floorCount; g++) scale += Math.abs(loads[m * n + 3 * g + comp]!)
            if (scale === 0) continue
            expect(Math.abs(sum - V) / scale).toBeLessThan(1e-7)
            checked++
          }
        }
      }
    }
    expect(checked).toBeGreaterThan(50)
  })

  it('gives each of two equal walls half the storey shear of a symmetric plan', () => {
    // Closed form by symmetry: equal walls placed symmetrically about the load line share equally.
    const p = projectBuilder({ floors: 4, height: 3.2 })
      .rectSlab({ width: 20, depth: 12, areaMass: 600 })
      .wall({ id: 'west', p1: { x: 0, y: 2 }, p2: { x: 0, y: 10 }, thickness: 0.25 })
      .wall({ id: 'east', p1: { x: 20, y: 2 }, p2: { x: 20, y: 10 }, thickness: 0.25 })
      .wall({ id: 'south', p1: { x: 6, y: 0 }, p2: { x: 14, y: 0 }, thickness: 0.25 })
      .wall({ id: 'north', p1: { x: 6, y: 12 }, p2: { x: 14, y: 12 }, thickness: 0.25 })
      .settings({ criterionSet: 'none', accidentalEccentricity: 0 })
      .build()
    const r = analyzeProject(p)
    const ef = r.elementForces!
    const ci = ef.cases.findIndex((c) => c.id === 'Y+e')
    const yCase = r.torsion!.cases.find((c) => c.id === 'Y+e')!
    for (const id of ['west', 'east']) {
      const row = ef.elements.find((e) => e.elementId === id)!
      row.shear[ci]!.forEach((v, k) => {
        let applied = 0
        for (let g = k; g < 4; g++) applied += yCase.forces[g]!
        expectRelClose(v, applied / 2, 1e-9)
        expectRelClose(row.share[ci]![k]!, 0.5, 1e-9)
      })
    }
    // the spectrum splits the same way (each mode is symmetric or antisymmetric about the plan axis)
    const si = ef.cases.findIndex((c) => c.id === 'spectrum-y')
    const west = ef.elements.find((e) => e.elementId === 'west')!
    const east = ef.elements.find((e) => e.elementId === 'east')!
    west.shear[si]!.forEach((v, k) => expectRelClose(v, east.shear[si]![k]!, 1e-7))
    expectRelClose(west.share[si]![0]!, 0.5, 1e-7)
  })

  it("gives a lone wall's overturning moment as the sum of F_i (z_i - z_s)", () => {
    // Statics of a cantilever: the only wall along y takes every y force (walls along x have
    // d_y = 0), so its moment at the bottom of storey s is sum_{i >= s} F_i (z_i - z_{s-1}).
    const p = projectBuilder({ floors: [{ height: 4 }, { height: 3 }, { height: 3 }, { height: 3.5 }] })
      .rectSlab({ width: 16, depth: 10, areaMass: 700 })
      .wall({ id: 'spine', p1: { x: 5, y: 1 }, p2: { x: 5, y: 9 }, thickness: 0.3 })
      .wall({ id: 'south', p1: { x: 2, y: 0 }, p2: { x: 14, y: 0 }, thickness: 0.3 })
      .wall({ id: 'north', p1: { x: 2, y: 10 }, p2: { x: 14, y: 10 }, thickness: 0.3 })
      .settings({ criterionSet: 'none' })
      .build()
    const r = analyzeProject(p)
    const ef = r.elementForces!
    const row = ef.elements.find((e) => e.elementId === 'spine')!
    const z = r.floors.map((f) => f.elevation)
    for (const id of ['Y+e', 'Y-e'] as const) {
      const ci = ef.cases.findIndex((c) => c.id === id)
      const F = r.torsion!.cases.find((c) => c.id === id)!.forces
      for (let s = 0; s < 4; s++) {
        const zs = s === 0 ? 0 : z[s - 1]!
        let M = 0
        for (let i = s; i < 4; i++) M += F[i]! * (z[i]! - zs)
        expectRelClose(row.overturningMoment[ci]![s]!, M, 1e-9)
      }
    }
  })

  it('forms spectrum shears and moments per mode and combines them afterwards', () => {
    // MODELING.md "Response spectrum": differences and element forces are formed per mode before
    // combining. Independent reconstruction by SRSS-free CQC over the per-mode element shears.
    const p = mixedModel()
    const s = buildStructure(p).structure!
    const solver = createStiffnessSolver(s)
    if (!solver.ok) throw new Error('mechanism')
    const modes = solveModes(s)
    const torsion = runStaticTorsion(s, solver.solver, modes, p.settings, null)
    const detail = runSpectrumDetailed(s, modes, p.settings, { solver: solver.solver, torsion })
    const ef = computeElementForces(s, torsion, detail)
    const ci = ef.cases.findIndex((c) => c.id === 'spectrum-x')
    const e = s.elements.findIndex((el) => el.id === 'w3')
    const el = s.elements[e]!
    const n = s.dofCount
    const count = detail.set.count
    const rho = detail.rho
    const modalM = Array.from({ length: count }, (_, m) =>
      elementOverturningMoments(s, el, elementStoryShears(el, detail.responses.x.displacements, m * n)),
    )
    let sum = 0
    for (let i = 0; i < count; i++) {
      for (let j = 0; j < count; j++) sum += rho[i * count + j]! * modalM[i]![0]! * modalM[j]![0]!
    }
    expectRelClose(ef.elements[e]!.overturningMoment[ci]![0]!, Math.sqrt(sum), 1e-9)
    // combining first (moment from combined shears) is a different, wrong number
    const shears = ef.elements[e]!.shear[ci]!
    let fromCombined = 0
    elementStoryFloors(el).forEach((f, k) => {
      fromCombined += shears[k]! * s.floors[f]!.height
    })
    expect(Math.abs(fromCombined - Math.sqrt(sum)) / Math.sqrt(sum)).toBeGreaterThan(1e-3)
    // and the accidental torsion envelope only adds
    const ti = ef.cases.findIndex((c) => c.id === 'spectrum-x+torsion')
    ef.elements[e]!.shear[ti]!.forEach((v, k) => expect(v).toBeGreaterThanOrEqual(shears[k]!))
  })
})

describe('element forces and spectrum torsion under a move of the plan origin', () => {
  it('do not depend on where the plan origin lies', () => {
    // MODELING.md "Degrees of freedom": nothing shown to the user depends on where O lies.
    const p = generateBuilding({ floors: 6, seed: 11, setback: true })
    const a = analyzeProject(p)
    const b = analyzeProject(transformProject(p, { dx: 350, dy: -120, angle: 0 }))
    const ea = a.elementForces!
    const eb = b.elementForces!
    expect(eb.cases.map((c) => c.id)).toEqual(ea.cases.map((c) => c.id))
    ea.elements.forEach((row, e) => {
      const other = eb.elements[e]!
      expect(other.elementId).toBe(row.elementId)
      row.shear.forEach((values, ci) => {
        let scale = 0
        for (const v of values) scale = Math.max(scale, Math.abs(v))
        values.forEach((v, k) => {
          expect(Math.abs(other.shear[ci]![k]! - v)).toBeLessThanOrEqual(1e-6 * scale + 1e-9)
        })
      })
    })
    const ta = a.spectrum!.accidentalTorsion!.stories.x
    const tb = b.spectrum!.accidentalTorsion!.stories.x
    ta.forEach((s, i) => expectRelClose(tb[i]!.driftRatio, s.driftRatio, 1e-6))
  })
})
