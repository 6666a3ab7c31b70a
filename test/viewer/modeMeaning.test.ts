import { describe, expect, it } from 'vitest'
import { characterWords, classifyMode, describeMode, describePlace, modeTitle } from '@/viewer/modeMeaning'

const box = { minX: 0, maxX: 30, minY: 0, maxY: 24 }
const core = [
  { name: 'Core south', p1: { x: 2, y: 16 }, p2: { x: 8, y: 16 } },
  { name: 'Core north', p1: { x: 2, y: 22 }, p2: { x: 8, y: 22 } },
  { name: 'East gable', p1: { x: 30, y: 2 }, p2: { x: 30, y: 8 } },
]
/** DOFs of a turn by theta about C (u_x = theta*C_y, u_y = -theta*C_x). */
const turnAbout = (x: number, y: number, theta = 0.01) => ({ ux: theta * y, uy: -theta * x, theta })

describe('characterWords', () => {
  it('gives the plain-words class', () => {
    expect(characterWords('x')).toBe('mostly X')
    expect(characterWords('y')).toBe('mostly Y')
    expect(characterWords('torsion')).toBe('mostly torsion')
    expect(characterWords('coupled')).toBe('coupled')
  })
})

describe('classifyMode', () => {
  it('reads torsion, X, Y and coupled from the mass ratios and the rotation share', () => {
    expect(classifyMode(0.1, 0.05, 0.8)).toBe('torsion')
    expect(classifyMode(0.7, 0.01, 0.05)).toBe('x')
    expect(classifyMode(0.01, 0.7, 0.05)).toBe('y')
    expect(classifyMode(0.4, 0.3, 0.1)).toBe('coupled')
    expect(classifyMode(0.7, 0.01, 0.4)).toBe('coupled')
  })
})

describe('describePlace', () => {
  it('says "near the core" when the point is close to a wall named as core', () => {
    expect(describePlace({ x: 5, y: 17 }, box, core)).toBe('near the core')
  })

  it('names another wall it is close to', () => {
    expect(describePlace({ x: 29, y: 5 }, box, core)).toBe('near wall East gable')
  })

  it('names the region of the plan away from walls', () => {
    expect(describePlace({ x: 15, y: 12 }, box, core)).toBe('near the centre of the plan')
    expect(describePlace({ x: 25, y: 2 }, box, [])).toBe('near the bottom-right corner of the plan')
    expect(describePlace({ x: 2, y: 12 }, box, [])).toBe('near the middle of the left edge')
  })

  it('gives the distance beyond an edge, and null far away', () => {
    expect(describePlace({ x: 38, y: 12 }, box, [])).toBe('8.0 m beyond the right edge of the plan')
    expect(describePlace({ x: 500, y: 12 }, box, [])).toBeNull()
  })
})

describe('modeTitle', () => {
  it('prints the number and period', () => {
    expect(modeTitle(1, 0.8234)).toBe('Mode 1 · T = 0.823 s')
    expect(modeTitle(2, 1.234)).toBe('Mode 2 · T = 1.23 s')
  })
})

describe('describeMode', () => {
  it('says a torsion mode turns about the core when its turn centre is at the core', () => {
    const line = describeMode(
      { number: 1, period: 0.9, character: 'torsion', ratioX: 0.1, ratioY: 0.05, torsionShare: 0.8, floor: turnAbout(5, 19) },
      box,
      core,
    )
    expect(line).toBe('Mode 1: mostly torsion — the plan turns about a point near the core')
  })

  it('says a translation mode sways with almost no twist', () => {
    const line = describeMode(
      { number: 2, period: 0.7, character: 'x', ratioX: 0.7, ratioY: 0, torsionShare: 0.002, floor: { ux: 1, uy: 0, theta: 0 } },
      box,
      core,
    )
    expect(line).toBe('Mode 2: mostly X — the floors sway along X with almost no twist')
  })

  it('describes a coupled mode with its direction, rotation share and turn centre', () => {
    const line = describeMode(
      { number: 3, period: 0.6, character: 'coupled', ratioX: 0.02, ratioY: 0.6, torsionShare: 0.32, floor: turnAbout(38, 12) },
      box,
      [],
    )
    expect(line).toBe(
      'Mode 3: coupled — the floors sway along Y while turning (32% rotation) about a point 8.0 m beyond the right edge of the plan',
    )
  })
})
