import { describe, expect, it } from 'vitest'
import {
  amplitudeScale,
  applyTransform,
  cyclePaths,
  historyFloorDofs,
  largestDisplacement,
  modeFloorDofs,
  modeTransforms,
  planSize,
  rigidDisplacement,
  rigidTransform,
  scaleDof,
  turnCentre,
} from '@/viewer/modeAnimation'
import type { FloorDof } from '@/viewer/modeAnimation'

const corners = [
  { x: 0, y: 0 },
  { x: 20, y: 0 },
  { x: 20, y: 12 },
  { x: 0, y: 12 },
]
const dist = (a: { x: number; y: number }, b: { x: number; y: number }) => Math.hypot(a.x - b.x, a.y - b.y)

describe('modeFloorDofs', () => {
  it('reads (u_x, u_y, theta) per floor from the mode-major shape array', () => {
    // 2 floors, 2 modes: shapes[m * 6 + 3 i + k]
    const shapes = Float64Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12])
    const d = modeFloorDofs(shapes, 6, 1, 2)
    expect(d).toEqual([
      { ux: 7, uy: 8, theta: 9 },
      { ux: 10, uy: 11, theta: 12 },
    ])
  })

  it('throws a RangeError when floors and DOF count disagree or the mode is missing', () => {
    const shapes = new Float64Array(12)
    expect(() => modeFloorDofs(shapes, 6, 0, 3)).toThrow('3 floors need 9 DOF (got 6)')
    expect(() => modeFloorDofs(shapes, 6, 2, 2)).toThrow('mode 2 is outside the shape array')
  })
})

describe('rigidDisplacement', () => {
  it('equals the rigid-diaphragm formula (u_x - theta*y, u_y + theta*x) at a plan point', () => {
    // MODELING.md "Degrees of freedom"; hand calculation: 0.01 - 0.003*(-5) = 0.025, -0.02 + 0.003*12 = 0.016
    const u = rigidDisplacement({ ux: 0.01, uy: -0.02, theta: 0.003 }, 12, -5)
    expect(u.x).toBeCloseTo(0.025, 12)
    expect(u.y).toBeCloseTo(0.016, 12)
  })
})

describe('rigidTransform', () => {
  it('is a pure translation when theta is zero', () => {
    const p = applyTransform(rigidTransform({ ux: 0.3, uy: -0.1, theta: 0 }), 7, 4)
    expect(p.x).toBeCloseTo(7.3, 12)
    expect(p.y).toBeCloseTo(3.9, 12)
  })

  it('agrees with the first-order formula to second order in the amplitude', () => {
    // Exponential map of the planar twist: exact - linear = O(eps²) (Lie-group first-order
    // expansion, closed form). Halving eps must quarter the error.
    const d: FloorDof = { ux: 0.8, uy: -0.5, theta: 0.04 }
    const err = (eps: number) => {
      const tr = rigidTransform(scaleDof(d, eps))
      let worst = 0
      for (const c of corners) {
        const exact = applyTransform(tr, c.x, c.y)
        const lin = rigidDisplacement(scaleDof(d, eps), c.x, c.y)
        worst = Math.max(worst, dist(exact, { x: c.x + lin.x, y: c.y + lin.y }))
      }
      return worst
    }
    const e1 = err(0.1)
    const e2 = err(0.05)
    expect(e1).toBeGreaterThan(0)
    expect(e1 / e2).toBeCloseTo(4, 1)
  })

  it('keeps every distance between slab corners (no shear or stretch), unlike the linear field', () => {
    const d: FloorDof = { ux: 1.2, uy: 0.4, theta: 0.15 }
    const tr = rigidTransform(d)
    const moved = corners.map((c) => applyTransform(tr, c.x, c.y))
    const linear = corners.map((c) => {
      const u = rigidDisplacement(d, c.x, c.y)
      return { x: c.x + u.x, y: c.y + u.y }
    })
    for (let i = 0; i < 4; i++) {
      for (let j = i + 1; j < 4; j++) {
        expect(dist(moved[i]!, moved[j]!)).toBeCloseTo(dist(corners[i]!, corners[j]!), 10)
      }
    }
    // Closed form: the linear field stretches every length by the factor sqrt(1 + theta²).
    expect(dist(linear[0]!, linear[2]!) / dist(corners[0]!, corners[2]!)).toBeCloseTo(Math.hypot(1, 0.15), 10)
  })

  it('turns a pure-torsion mode about its centre C exactly: C stays, radii and angle are kept', () => {
    // Pure turn about C: u_x = theta*C_y, u_y = -theta*C_x makes (u_x - theta*C_y, u_y + theta*C_x) = 0.
    const C = { x: 5, y: 19 }
    const theta = 0.12
    const tr = rigidTransform({ ux: theta * C.y, uy: -theta * C.x, theta })
    const c2 = applyTransform(tr, C.x, C.y)
    expect(c2.x).toBeCloseTo(C.x, 12)
    expect(c2.y).toBeCloseTo(C.y, 12)
    for (const p of corners) {
      const q = applyTransform(tr, p.x, p.y)
      expect(dist(q, C)).toBeCloseTo(dist(p, C), 10)
      const turned = Math.atan2(q.y - C.y, q.x - C.x) - Math.atan2(p.y - C.y, p.x - C.x)
      const wrapped = Math.atan2(Math.sin(turned), Math.cos(turned))
      expect(wrapped).toBeCloseTo(theta, 12)
    }
  })

  it('matches the direct sin/cos formula inside the small-angle series branch', () => {
    // Closed form t = (a u_x - b u_y, a u_y + b u_x), a = sin t / t, b = (1 - cos t) / t, evaluated
    // directly at t = 9e-5 (still accurate there) against the series branch used below 1e-4.
    const t = 9e-5
    const a = Math.sin(t) / t
    const b = (1 - Math.cos(t)) / t
    const tr = rigidTransform({ ux: 2, uy: -1, theta: t })
    expect(tr.tx).toBeCloseTo(a * 2 - b * -1, 9)
    expect(tr.ty).toBeCloseTo(a * -1 + b * 2, 9)
  })
})

describe('turnCentre', () => {
  it('returns (-u_y/theta, u_x/theta), or null for a translation', () => {
    const c = turnCentre({ ux: 0.19 * 0.1, uy: -0.05 * 0.1, theta: 0.01 })
    expect(c?.x).toBeCloseTo(0.5, 12)
    expect(c?.y).toBeCloseTo(1.9, 12)
    expect(turnCentre({ ux: 1, uy: 0, theta: 0 })).toBeNull()
  })
})

describe('amplitudeScale', () => {
  it('makes the largest floor displacement equal the target for a translation mode', () => {
    const dofs = [
      { ux: 1, uy: 0, theta: 0 },
      { ux: 2, uy: 0, theta: 0 },
    ]
    const s = amplitudeScale(dofs, [corners, corners], 1.5)
    expect(s).toBeCloseTo(0.75, 12)
  })

  it('uses the corner farthest from the turn centre for a torsion mode', () => {
    // Turn about O: the farthest corner is (20, 12), |u| = theta * sqrt(544) (closed form).
    const dofs = [{ ux: 0, uy: 0, theta: 0.5 }]
    const s = amplitudeScale(dofs, [corners], 2)
    expect(s).toBeCloseTo(2 / (0.5 * Math.sqrt(544)), 12)
    expect(largestDisplacement(dofs.map((d) => scaleDof(d, s)), [corners])).toBeCloseTo(2, 12)
  })

  it('returns 0 for a zero shape', () => {
    expect(amplitudeScale([{ ux: 0, uy: 0, theta: 0 }], [corners], 1)).toBe(0)
  })
})

describe('planSize', () => {
  it('is the larger side of the bounding box', () => {
    expect(planSize(corners)).toBeCloseTo(20, 12)
  })
})

describe('modeTransforms', () => {
  it('is at rest at phase 0 and at full amplitude at phase pi/2', () => {
    const dofs = [{ ux: 1, uy: 0.5, theta: 0.01 }]
    const rest = modeTransforms(dofs, 2, 0)[0]!
    expect(rest.tx).toBeCloseTo(0, 12)
    expect(rest.angle).toBeCloseTo(0, 12)
    const peak = modeTransforms(dofs, 2, Math.PI / 2)[0]!
    expect(peak.angle).toBeCloseTo(0.02, 12)
    const ref = rigidTransform({ ux: 2, uy: 1, theta: 0.02 })
    expect(peak.tx).toBeCloseTo(ref.tx, 12)
    expect(peak.ty).toBeCloseTo(ref.ty, 12)
  })
})

describe('cyclePaths', () => {
  it('gives closed paths through the rest position whose farthest point is the peak state', () => {
    const d: FloorDof = { ux: 0.2, uy: -0.1, theta: 0.01 }
    const paths = cyclePaths(d, 3, corners, 48)
    expect(paths).toHaveLength(4)
    for (const [j, path] of paths.entries()) {
      expect(path).toHaveLength(49)
      expect(dist(path[0]!, corners[j]!)).toBeCloseTo(0, 12)
      expect(dist(path[48]!, corners[j]!)).toBeCloseTo(0, 9)
      const peak = applyTransform(rigidTransform(scaleDof(d, 3)), corners[j]!.x, corners[j]!.y)
      expect(dist(path[12]!, peak)).toBeCloseTo(0, 9)
    }
  })
})

describe('historyFloorDofs', () => {
  it('reads a step of the step-major history and clamps out-of-range steps', () => {
    const u = Float64Array.from([0, 0, 0, 1, 2, 0.5, 3, 4, 1])
    expect(historyFloorDofs(u, 3, 1, 2)).toEqual([{ ux: 2, uy: 4, theta: 1 }])
    expect(historyFloorDofs(u, 3, 99, 1)).toEqual([{ ux: 3, uy: 4, theta: 1 }])
  })
})
