import { describe, expect, it } from 'vitest'
import { computeFloorMass, floorMassBlock, polygonIntegrals } from '@/engine/mass'
import { expectArrayRelClose, expectRelClose } from '../helpers/approx'
import { projectBuilder } from '../helpers/projectBuilder'

const rect = (x: number, y: number, w: number, d: number) => [
  { x, y },
  { x: x + w, y },
  { x: x + w, y: y + d },
  { x, y: y + d },
]

describe('polygonIntegrals', () => {
  it('gives area, first and second moments of a rectangle', () => {
    // closed form for a b x h rectangle at the origin: A = bh, ∫x = b²h/2, ∫x² = b³h/3, ∫xy = b²h²/4
    const g = polygonIntegrals(rect(0, 0, 4, 3))
    expectRelClose(g.area, 12, 1e-14)
    expectRelClose(g.sx, (16 * 3) / 2, 1e-14)
    expectRelClose(g.sy, (4 * 9) / 2, 1e-14)
    expectRelClose(g.sxx, (64 * 3) / 3, 1e-14)
    expectRelClose(g.syy, (4 * 27) / 3, 1e-14)
    expectRelClose(g.sxy, (16 * 9) / 4, 1e-14)
  })

  it('changes sign with the winding', () => {
    const g = polygonIntegrals([...rect(0, 0, 4, 3)].reverse())
    expectRelClose(g.area, -12, 1e-14)
    expectRelClose(g.sxx, -64, 1e-14)
  })

  it('gives the triangle centroid', () => {
    // closed form: centroid of a triangle is the mean of its vertices
    const g = polygonIntegrals([
      { x: 0, y: 0 },
      { x: 6, y: 0 },
      { x: 0, y: 3 },
    ])
    expectRelClose(g.area, 9, 1e-14)
    expectRelClose(g.sx / g.area, 2, 1e-14)
    expectRelClose(g.sy / g.area, 1, 1e-14)
  })
})

describe('computeFloorMass', () => {
  it('gives m, CM and J = m(L²+B²)/12 for a rectangle', () => {
    // closed form: J of a uniform L x B rectangle about its centroid = m (L² + B²)/12
    const p = projectBuilder({ floors: 1 }).rectSlab({ x: 0, y: 0, width: 20, depth: 10, areaMass: 500 }).build()
    const { props, issues } = computeFloorMass(p, 'L1')
    expect(issues).toHaveLength(0)
    expectRelClose(props.mass, 100000, 1e-14)
    expectRelClose(props.centreOfMass.x, 10, 1e-14)
    expectRelClose(props.centreOfMass.y, 5, 1e-14)
    expectRelClose(props.polarInertia, (100000 * (400 + 100)) / 12, 1e-13)
    expectRelClose(props.radiusOfGyration, Math.sqrt(500 / 12), 1e-13)
    expectRelClose(props.slabArea, 200, 1e-14)
    expect(props.extent).toEqual({ minX: 0, maxX: 20, minY: 0, maxY: 10 })
  })

  it('does not depend on the outline winding', () => {
    const a = computeFloorMass(
      projectBuilder().slab({ outline: rect(0, 0, 20, 10), areaMass: 500 }).build(),
      'L1',
    ).props
    const b = computeFloorMass(
      projectBuilder().slab({ outline: rect(0, 0, 20, 10).reverse(), areaMass: 500 }).build(),
      'L1',
    ).props
    expectRelClose(b.mass, a.mass, 1e-14)
    expectRelClose(b.polarInertia, a.polarInertia, 1e-13)
  })

  it('matches a composite-area hand calculation for an L-shaped slab', () => {
    // Hand calculation (composite areas): the L (0,0)-(6,0)-(6,2)-(2,2)-(2,8)-(0,8) is a 6x2 bar
    // (A 12, centroid (3,1)) plus a 2x6 bar (A 12, centroid (1,5)): centroid (2,3);
    // polar moment per unit area mass = Σ [A (b² + h²)/12 + A d²] = (40 + 60) + (40 + 60) = 200 m⁴.
    const outline = [
      { x: 0, y: 0 },
      { x: 6, y: 0 },
      { x: 6, y: 2 },
      { x: 2, y: 2 },
      { x: 2, y: 8 },
      { x: 0, y: 8 },
    ]
    const mu = 700
    const { props } = computeFloorMass(projectBuilder().slab({ outline, areaMass: mu }).build(), 'L1')
    expectRelClose(props.mass, 24 * mu, 1e-14)
    expectRelClose(props.centreOfMass.x, 2, 1e-14)
    expectRelClose(props.centreOfMass.y, 3, 1e-14)
    expectRelClose(props.polarInertia, 200 * mu, 1e-13)
    expect(props.extremePoints).toHaveLength(6)
  })

  it('subtracts an opening of either winding (rectangle with a hole)', () => {
    // Hand calculation: 10x8 plate minus a 2x2 hole centred at (2,2), by parallel axes.
    const mu = 400
    const cFull = { x: 5, y: 4 }
    const cHole = { x: 2, y: 2 }
    const A = 80 - 4
    const cx = (80 * cFull.x - 4 * cHole.x) / A
    const cy = (80 * cFull.y - 4 * cHole.y) / A
    const d1 = (cFull.x - cx) ** 2 + (cFull.y - cy) ** 2
    const d2 = (cHole.x - cx) ** 2 + (cHole.y - cy) ** 2
    const Jarea = (80 * (100 + 64)) / 12 + 80 * d1 - ((4 * (4 + 4)) / 12 + 4 * d2)
    for (const hole of [rect(1, 1, 2, 2), rect(1, 1, 2, 2).reverse()]) {
      const p = projectBuilder().slab({ outline: rect(0, 0, 10, 8), openings: [hole], areaMass: mu }).build()
      const { props } = computeFloorMass(p, 'L1')
      expectRelClose(props.mass, A * mu, 1e-14)
      expectRelClose(props.centreOfMass.x, cx, 1e-13)
      expectRelClose(props.centreOfMass.y, cy, 1e-13)
      expectRelClose(props.polarInertia, Jarea * mu, 1e-13)
      expectRelClose(props.slabArea, A, 1e-14)
      // extreme points are the outer outline only
      expect(props.extremePoints).toHaveLength(4)
      expect(props.extent).toEqual({ minX: 0, maxX: 10, minY: 0, maxY: 8 })
    }
  })

  it('keeps full precision for a plan far from the origin', () => {
    const p = projectBuilder().rectSlab({ x: 1e6, y: -2e6, width: 20, depth: 10, areaMass: 500 }).build()
    const { props } = computeFloorMass(p, 'L1')
    // closed form m (L² + B²)/12 as above
    expectRelClose(props.polarInertia, (100000 * 500) / 12, 1e-9)
    expectRelClose(props.centreOfMass.x, 1e6 + 10, 1e-15)
  })

  it('treats a line mass as thin segments with own moment mu L³/12', () => {
    // closed form: a thin rod of mass m, length L has J = m L²/12 about its centre;
    // polyline (0,0)-(4,0)-(4,3): rods of 4 m at (2,0) and 3 m at (4,1.5), composite by parallel axes.
    const mu = 100
    const p = projectBuilder()
      .lineMass({ points: [{ x: 0, y: 0 }, { x: 4, y: 0 }, { x: 4, y: 3 }], massPerLength: mu })
      .build()
    const { props } = computeFloorMass(p, 'L1')
    const m1 = 400
    const m2 = 300
    const cx = (m1 * 2 + m2 * 4) / 700
    const cy = (m2 * 1.5) / 700
    const J =
      (m1 * 16) / 12 + m1 * ((2 - cx) ** 2 + cy ** 2) + (m2 * 9) / 12 + m2 * ((4 - cx) ** 2 + (1.5 - cy) ** 2)
    expectRelClose(props.mass, 700, 1e-14)
    expectRelClose(props.centreOfMass.x, cx, 1e-14)
    expectRelClose(props.centreOfMass.y, cy, 1e-14)
    expectRelClose(props.polarInertia, J, 1e-13)
  })

  it('gives point masses only their own polar inertia plus the parallel axis', () => {
    // parallel-axis theorem: two 1000 kg points 10 m apart -> J = 2·1000·5² about the middle
    const p = projectBuilder()
      .pointMass({ at: { x: 0, y: 0 }, mass: 1000 })
      .pointMass({ at: { x: 10, y: 0 }, mass: 1000, polarInertia: 250 })
      .build()
    const { props } = computeFloorMass(p, 'L1')
    expectRelClose(props.mass, 2000, 1e-15)
    expectRelClose(props.centreOfMass.x, 5, 1e-15)
    expectRelClose(props.polarInertia, 50000 + 250, 1e-14)
  })

  it('follows a typical-floor link', () => {
    const p = projectBuilder({ floors: [{}, { typicalOf: 'L1' }] })
      .rectSlab({ width: 20, depth: 10, areaMass: 500, floor: 'L1' })
      .rectSlab({ width: 5, depth: 5, areaMass: 1, floor: 'L2' })
      .build()
    const a = computeFloorMass(p, 'L1').props
    const b = computeFloorMass(p, 'L2').props
    expectRelClose(b.mass, a.mass, 1e-15)
    expectRelClose(b.polarInertia, a.polarInertia, 1e-15)
  })

  it('reports a floor without mass and a degenerate slab as issues', () => {
    const p = projectBuilder({ floors: 2 })
      .slab({
        outline: [
          { x: 0, y: 0 },
          { x: 5, y: 0 },
          { x: 10, y: 0 },
        ],
        areaMass: 500,
        floor: 'L1',
      })
      .rectSlab({ width: 4, depth: 4, areaMass: 500, floor: 'L2', openings: [{ x: 0, y: 0, width: 4, depth: 4 }] })
      .build()
    const r1 = computeFloorMass(p, 'L1')
    expect(r1.issues.map((i) => i.code)).toEqual(['degenerate-slab', 'no-mass'])
    expect(r1.props.mass).toBe(0)
    expect(Number.isFinite(r1.props.centreOfMass.x)).toBe(true)
    const r2 = computeFloorMass(p, 'L2')
    expect(r2.issues.map((i) => i.code)).toEqual(['degenerate-slab', 'no-mass'])
    expect(r2.issues[0]?.message).toContain('openings cover it')
  })
})

describe('floorMassBlock', () => {
  it('builds the block about O of MODELING.md', () => {
    // MODELING.md §Mass: [[m, 0, -m y], [0, m, m x], [-m y, m x, J + m (x² + y²)]]
    const b = floorMassBlock(1000, { x: 3, y: -2 }, 5000)
    expectArrayRelClose(b, [1000, 0, 2000, 0, 1000, 3000, 2000, 3000, 5000 + 1000 * 13], 1e-15)
  })
})
