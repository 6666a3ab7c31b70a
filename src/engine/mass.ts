/**
 * Floor mass properties from slab polygons (with openings), line masses and point masses, by exact
 * polygon integrals (Green's theorem), and the 3x3 floor mass block about the plan origin O.
 * Units: m, kg, kg·m². All integrals are taken about a local reference point near the floor and moved
 * to the centre of mass afterwards, so a plan far from O loses no digits.
 * @see docs/mechanics.md §Mass
 */
import { floorContent, pointsExtent } from '@/model'
import type { FloorId, Point, Project } from '@/model'
import type { FloorProps, Issue } from './results'

/** Signed area integrals of a polygon (counter-clockwise positive), about the point `ref`. */
export interface PolygonIntegrals {
  /** ∫dA, m² (negative for a clockwise polygon) */
  readonly area: number
  /** ∫x dA, ∫y dA with x, y measured from ref, m³ */
  readonly sx: number
  readonly sy: number
  /** ∫x² dA, ∫y² dA, ∫xy dA with x, y from ref, m⁴ */
  readonly sxx: number
  readonly syy: number
  readonly sxy: number
}

/**
 * Exact area, first and second moments of a simple polygon by Green's theorem, about `ref`.
 * With c_i = x_i y_{i+1} - x_{i+1} y_i:
 * A = Σc/2, ∫x = Σ(x_i+x_{i+1})c/6, ∫x² = Σ(x_i²+x_i x_{i+1}+x_{i+1}²)c/12,
 * ∫xy = Σ(x_i y_{i+1} + 2x_i y_i + 2x_{i+1} y_{i+1} + x_{i+1} y_i)c/24.
 * The sign follows the winding (counter-clockwise positive).
 * @see Green's theorem (∮ of suitable potentials over the boundary); derivation in docs/mechanics.md.
 */
export function polygonIntegrals(points: readonly Point[], ref: Point = { x: 0, y: 0 }): PolygonIntegrals {
  let a = 0
  let sx = 0
  let sy = 0
  let sxx = 0
  let syy = 0
  let sxy = 0
  const n = points.length
  for (let i = 0; i < n; i++) {
    const p = points[i] as Point
    const q = points[(i + 1) % n] as Point
    const x0 = p.x - ref.x
    const y0 = p.y - ref.y
    const x1 = q.x - ref.x
    const y1 = q.y - ref.y
    const c = x0 * y1 - x1 * y0
    a += c
    sx += (x0 + x1) * c
    sy += (y0 + y1) * c
    sxx += (x0 * x0 + x0 * x1 + x1 * x1) * c
    syy += (y0 * y0 + y0 * y1 + y1 * y1) * c
    sxy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c
  }
  return { area: a / 2, sx: sx / 6, sy: sy / 6, sxx: sxx / 12, syy: syy / 12, sxy: sxy / 24 }
}

/** Mass, first moments and polar moment about a reference point (accumulator). */
interface MassSums {
  m: number
  /** Σ m x, Σ m y about ref, kg·m */
  mx: number
  my: number
  /** Σ polar moment about ref, kg·m² */
  jRef: number
}

/**
 * Net area integrals of a slab: the outer outline adds and every opening subtracts, whatever the
 * winding of each. Returns null for fewer than 3 vertices.
 */
function slabIntegrals(
  outline: readonly Point[],
  openings: readonly (readonly Point[])[],
  ref: Point,
): PolygonIntegrals | null {
  if (outline.length < 3) return null
  const outer = polygonIntegrals(outline, ref)
  const s = Math.sign(outer.area) || 1
  let area = s * outer.area
  let sx = s * outer.sx
  let sy = s * outer.sy
  let sxx = s * outer.sxx
  let syy = s * outer.syy
  let sxy = s * outer.sxy
  for (const hole of openings) {
    if (hole.length < 3) continue
    const h = polygonIntegrals(hole, ref)
    const t = Math.sign(h.area) || 1
    area -= t * h.area
    sx -= t * h.sx
    sy -= t * h.sy
    sxx -= t * h.sxx
    syy -= t * h.syy
    sxy -= t * h.sxy
  }
  return { area, sx, sy, sxx, syy, sxy }
}

/** Mass properties of one floor (FloorProps without the stack data) and the problems found. */
export interface FloorMass {
  readonly mass: number
  readonly centreOfMass: Point
  /** about the centre of mass, kg·m² */
  readonly polarInertia: number
  readonly radiusOfGyration: number
  readonly slabArea: number
  readonly extent: FloorProps['extent']
  readonly extremePoints: readonly Point[]
}

/**
 * Mass properties of a floor, following its typical-floor link (floorContent from @/model).
 * Slab: m = μA, centre from ∫x, ∫y, J_ref = μ(∫x² + ∫y²). Line mass segment of length L and μ_l:
 * m = μ_l L at its midpoint with own polar moment μ_l L³/12 (thin rod), plus parallel axis.
 * Point mass: m at its point with its own polarInertia (default 0), plus parallel axis.
 * J about the CM = J_ref - m |c - ref|². Extent and extreme points come from outer slab outline
 * vertices; with no slab they fall back to the mass points (line mass vertices, point masses).
 * A floor without mass or with a degenerate slab is an Issue, never an exception.
 * @see docs/mechanics.md §Mass; MODELING.md §Mass
 */
export function computeFloorMass(
  project: Pick<Project, 'floors' | 'slabs' | 'lineMasses' | 'pointMasses'>,
  floorId: string,
): { props: FloorMass; issues: Issue[] } {
  const issues: Issue[] = []
  const floor = project.floors.find((f) => f.id === floorId)
  const label = floor ? `${floor.id} (${floor.name})` : floorId
  const content = floorContent(project, floorId as FloorId)

  // Reference point: the first vertex found on the floor, so integrals are local.
  const first =
    content.slabs[0]?.outline[0] ?? content.lineMasses[0]?.points[0] ?? content.pointMasses[0]?.at
  const ref: Point = first ? { x: first.x, y: first.y } : { x: 0, y: 0 }

  const sums: MassSums = { m: 0, mx: 0, my: 0, jRef: 0 }
  let slabArea = 0
  const extremePoints: Point[] = []
  const fallbackPoints: Point[] = []

  for (const slab of content.slabs) {
    const bad = (why: string): void => {
      issues.push({
        code: 'degenerate-slab',
        severity: 'warning',
        message: `[engine] slab ${slab.id} on floor ${label}: ${why}; its mass is left out`,
        refs: [slab.id, floorId],
        floor: floorId,
      })
    }
    const finite = [...slab.outline, ...slab.openings.flat()].every(
      (p) => Number.isFinite(p.x) && Number.isFinite(p.y),
    )
    if (!finite) {
      bad('a vertex has a non-finite coordinate')
      continue
    }
    const g = slabIntegrals(slab.outline, slab.openings, ref)
    if (!g) {
      bad(`outline has ${slab.outline.length} vertices (needs at least 3)`)
      continue
    }
    let size = 0
    for (const p of slab.outline) size = Math.max(size, Math.abs(p.x - ref.x), Math.abs(p.y - ref.y))
    if (!(g.area > 1e-12 * Math.max(size * size, 1e-300))) {
      bad(`net area is ${g.area.toPrecision(3)} m² (outline collinear, or openings cover it)`)
      continue
    }
    if (!(Number.isFinite(slab.areaMass) && slab.areaMass >= 0)) {
      bad(`area mass must be a finite number >= 0 (got ${slab.areaMass})`)
      continue
    }
    const mu = slab.areaMass
    sums.m += mu * g.area
    sums.mx += mu * g.sx
    sums.my += mu * g.sy
    sums.jRef += mu * (g.sxx + g.syy)
    slabArea += g.area
    for (const p of slab.outline) extremePoints.push({ x: p.x, y: p.y })
  }

  for (const line of content.lineMasses) {
    const mu = line.massPerLength
    if (!(Number.isFinite(mu) && mu >= 0)) continue
    for (let i = 0; i + 1 < line.points.length; i++) {
      const p = line.points[i] as Point
      const q = line.points[i + 1] as Point
      const L = Math.hypot(q.x - p.x, q.y - p.y)
      if (!Number.isFinite(L)) continue
      const m = mu * L
      const cx = (p.x + q.x) / 2 - ref.x
      const cy = (p.y + q.y) / 2 - ref.y
      sums.m += m
      sums.mx += m * cx
      sums.my += m * cy
      sums.jRef += (mu * L * L * L) / 12 + m * (cx * cx + cy * cy)
    }
    for (const p of line.points) fallbackPoints.push({ x: p.x, y: p.y })
  }

  for (const pm of content.pointMasses) {
    const m = pm.mass
    if (!(Number.isFinite(m) && m >= 0)) continue
    const cx = pm.at.x - ref.x
    const cy = pm.at.y - ref.y
    const own = pm.polarInertia !== undefined && Number.isFinite(pm.polarInertia) ? pm.polarInertia : 0
    sums.m += m
    sums.mx += m * cx
    sums.my += m * cy
    sums.jRef += own + m * (cx * cx + cy * cy)
    fallbackPoints.push({ x: pm.at.x, y: pm.at.y })
  }

  const m = sums.m
  let centreOfMass: Point
  let polarInertia = 0
  if (m > 0) {
    const dx = sums.mx / m
    const dy = sums.my / m
    centreOfMass = { x: ref.x + dx, y: ref.y + dy }
    polarInertia = Math.max(0, sums.jRef - m * (dx * dx + dy * dy))
  } else {
    centreOfMass = { x: ref.x, y: ref.y }
    issues.push({
      code: 'no-mass',
      severity: 'error',
      message: `[engine] floor ${label} has no mass: add a slab with an area mass, a line mass or a point mass`,
      refs: [floorId],
      floor: floorId,
    })
  }

  const pts = extremePoints.length > 0 ? extremePoints : fallbackPoints
  const extent = pointsExtent(pts) ?? {
    minX: centreOfMass.x,
    maxX: centreOfMass.x,
    minY: centreOfMass.y,
    maxY: centreOfMass.y,
  }

  return {
    props: {
      mass: m,
      centreOfMass,
      polarInertia,
      radiusOfGyration: m > 0 ? Math.sqrt(polarInertia / m) : 0,
      slabArea,
      extent,
      extremePoints: pts,
    },
    issues,
  }
}

/**
 * The 3x3 floor mass block about O (row-major, order u_x, u_y, theta):
 * [[m, 0, -m y_m], [0, m, m x_m], [-m y_m, m x_m, J + m (x_m² + y_m²)]], kg, kg·m, kg·m².
 * @see MODELING.md §Mass (a point (x, y) moves by (u_x - theta y, u_y + theta x))
 */
export function floorMassBlock(mass: number, centreOfMass: Point, polarInertia: number): Float64Array {
  const { x, y } = centreOfMass
  const m = mass
  return Float64Array.from([
    m,
    0,
    -m * y,
    0,
    m,
    m * x,
    -m * y,
    m * x,
    polarInertia + m * (x * x + y * y),
  ])
}
