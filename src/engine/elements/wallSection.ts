/**
 * Thin-walled composite section of joined walls (an L, T, C or box core): the walls' centre-lines as
 * straight legs of thickness t. Area, centroid, second moments, principal axes, shear areas, the
 * St Venant torsion constant (open legs and one closed cell) and the shear centre.
 * Units: m, m², m⁴. Pure geometry; no materials.
 *
 * Idealisation: thin walls (t small against L). Second moments keep only the t·L terms of each leg
 * (the L·t³/12 terms of a leg about its own axis are dropped, as in thin-walled theory, which also
 * keeps a single wall's section equal to the planar wall's in-plane I and nothing out of plane).
 * Corners are not corrected for the overlap of the legs' thickness.
 * @see docs/mechanics.md §Wall groups; Vlasov, Thin-Walled Elastic Beams (1961) (sectorial coordinate
 * and shear centre, from memory); Bredt's formula J = 4A²/∮ds/t (any mechanics-of-materials text)
 */
import type { Point } from '@/model'

/** One straight leg of a section: a wall centre-line with its thickness and stiffness factors. */
export interface SectionLeg {
  readonly p1: Point
  readonly p2: Point
  /** thickness, m */
  readonly t: number
  /** effective flexural factor f_I on the leg's share of I (default 1), - */
  readonly flexureFactor?: number
  /** effective shear factor f_A on the leg's shear area and torsion (default 1), - */
  readonly shearFactor?: number
}

/** A piece of a leg between two joints of the section graph. */
export interface SectionPiece {
  /** index of the leg the piece belongs to */
  readonly leg: number
  readonly p1: Point
  readonly p2: Point
  /** graph nodes (joints or free ends) at p1 and p2 */
  readonly a: number
  readonly b: number
}

/** The legs as a graph: pieces between joints; nodes are clustered end and junction points. */
export interface SectionGraph {
  readonly nodes: readonly Point[]
  readonly pieces: readonly SectionPiece[]
  /** connected parts of the graph */
  readonly components: number
  /** independent closed cells: pieces - nodes + components */
  readonly cells: number
}

/** Properties of a composite thin-walled section (factors applied as stated per field). */
export interface CompositeSection {
  /** Σ t L, m² (geometric) */
  readonly area: number
  /** centroid of the transformed section (thickness t·f_I), m */
  readonly centroid: Point
  /** ∫x² dA, ∫y² dA, ∫xy dA about the centroid (x, y centroidal), times f_I, m⁴ */
  readonly Sxx: number
  readonly Syy: number
  readonly Sxy: number
  /**
   * Principal directions d1, d2 (unit, d2 = d1 turned +90°) and the second moments I1, I2 that resist
   * translation along them (I_d = ∫(r·d)² dA, i.e. bending about the axis perpendicular to d), m⁴.
   * I1 >= I2.
   */
  readonly d1: Point
  readonly d2: Point
  readonly I1: number
  readonly I2: number
  /** shear areas along d1 and d2: Σ (5/6) t L f_A cos²(leg, d), m² */
  readonly As1: number
  readonly As2: number
  /** St Venant torsion constant times f_A, m⁴ (open legs Σ L t³/3; one closed cell by Bredt) */
  readonly J: number
  /** shear centre, m */
  readonly shearCentre: Point
  /** how the shear centre was found */
  readonly shearCentreMethod: 'sectorial' | 'single-line' | 'multi-cell-centroid'
  /** independent closed cells found in the graph of legs */
  readonly cells: number
  /** enclosed area of the closed cell used in Bredt's formula, m² (0 when open) */
  readonly cellArea: number
}

const cross = (a: Point, b: Point): number => a.x * b.y - a.y * b.x

/** Default joint tolerance between two legs: half the larger thickness, m (our choice, see docs). */
export function jointTolerance(ta: number, tb: number): number {
  return 0.5 * Math.max(ta, tb)
}

/**
 * Parameter s (m from p1) of the point of segment p1-p2 nearest to q, and the distance to it.
 */
function project(p1: Point, p2: Point, q: Point): { s: number; dist: number; L: number } {
  const dx = p2.x - p1.x
  const dy = p2.y - p1.y
  const L = Math.hypot(dx, dy)
  if (!(L > 0)) return { s: 0, dist: Math.hypot(q.x - p1.x, q.y - p1.y), L: 0 }
  const s = Math.min(L, Math.max(0, ((q.x - p1.x) * dx + (q.y - p1.y) * dy) / L))
  const px = p1.x + (dx * s) / L
  const py = p1.y + (dy * s) / L
  return { s, dist: Math.hypot(q.x - px, q.y - py), L }
}

/**
 * Whether two legs are joined: an end of one lies within the tolerance of an end of the other, or of
 * the other's centre-line between its ends (a T joint). Legs that cross without an end at the
 * crossing are not joined.
 */
export function legsJoin(a: SectionLeg, b: SectionLeg, tol = jointTolerance(a.t, b.t)): boolean {
  for (const q of [b.p1, b.p2]) if (project(a.p1, a.p2, q).dist <= tol) return true
  for (const q of [a.p1, a.p2]) if (project(b.p1, b.p2, q).dist <= tol) return true
  return false
}

/**
 * The graph of a section's legs: each leg is split where another leg's end meets its interior
 * (T joint), and end points within the joint tolerance of each other are one node. The pieces keep
 * their legs' own coordinates (nothing is moved); a node's position is the mean of its points.
 */
export function buildSectionGraph(legs: readonly SectionLeg[]): SectionGraph {
  const pieces: { leg: number; p1: Point; p2: Point }[] = []
  legs.forEach((leg, i) => {
    const dx = leg.p2.x - leg.p1.x
    const dy = leg.p2.y - leg.p1.y
    const L = Math.hypot(dx, dy)
    if (!(L > 0)) return
    const cuts: number[] = []
    legs.forEach((other, j) => {
      if (j === i) return
      const tol = jointTolerance(leg.t, other.t)
      for (const q of [other.p1, other.p2]) {
        const pr = project(leg.p1, leg.p2, q)
        if (pr.dist <= tol && pr.s > tol && pr.s < L - tol) cuts.push(pr.s)
      }
    })
    cuts.sort((u, v) => u - v)
    const at = (s: number): Point => ({ x: leg.p1.x + (dx * s) / L, y: leg.p1.y + (dy * s) / L })
    let start = 0
    for (const s of cuts) {
      if (s - start <= 0.5 * leg.t) continue
      pieces.push({ leg: i, p1: at(start), p2: at(s) })
      start = s
    }
    pieces.push({ leg: i, p1: at(start), p2: leg.p2 })
  })
  // Cluster the piece ends (union-find over pairs within the joint tolerance).
  const pts: { p: Point; t: number }[] = []
  for (const pc of pieces) {
    const t = legs[pc.leg]!.t
    pts.push({ p: pc.p1, t }, { p: pc.p2, t })
  }
  const parent = pts.map((_, i) => i)
  const find = (i: number): number => {
    while (parent[i] !== i) {
      parent[i] = parent[parent[i]!]!
      i = parent[i]!
    }
    return i
  }
  for (let i = 0; i < pts.length; i++) {
    for (let j = i + 1; j < pts.length; j++) {
      const u = pts[i]!
      const v = pts[j]!
      if (Math.hypot(u.p.x - v.p.x, u.p.y - v.p.y) <= jointTolerance(u.t, v.t)) parent[find(i)] = find(j)
    }
  }
  const nodeOf = new Map<number, number>()
  const sums: { x: number; y: number; n: number }[] = []
  const node = (i: number): number => {
    const r = find(i)
    let k = nodeOf.get(r)
    if (k === undefined) {
      k = sums.length
      nodeOf.set(r, k)
      sums.push({ x: 0, y: 0, n: 0 })
    }
    return k
  }
  const outPieces: SectionPiece[] = pieces.map((pc, i) => ({ ...pc, a: node(2 * i), b: node(2 * i + 1) }))
  pts.forEach((pt, i) => {
    const s = sums[node(i)]!
    s.x += pt.p.x
    s.y += pt.p.y
    s.n += 1
  })
  const nodes = sums.map((s) => ({ x: s.x / s.n, y: s.y / s.n }))
  // Connected parts of the node graph.
  const np = nodes.map((_, i) => i)
  const f2 = (i: number): number => {
    while (np[i] !== i) i = np[i] = np[np[i]!]!
    return i
  }
  for (const pc of outPieces) np[f2(pc.a)] = f2(pc.b)
  let components = 0
  for (let i = 0; i < nodes.length; i++) if (f2(i) === i) components++
  // A piece whose two ends fall in one node (shorter than the tolerance) closes no real cell.
  const loops = outPieces.filter((pc) => pc.a === pc.b).length
  const cells = Math.max(0, outPieces.length - loops - nodes.length + components)
  return { nodes, pieces: outPieces, components, cells }
}

/**
 * The fundamental cycles of the graph (one per non-tree piece of a breadth-first spanning tree),
 * each as the list of piece indices with the direction of travel (+1 from a to b, -1 from b to a)
 * oriented counter-clockwise, and its enclosed area (polygon of its nodes), m².
 */
function fundamentalCycles(g: SectionGraph): { pieces: { i: number; dir: 1 | -1 }[]; area: number }[] {
  const adj: { piece: number; to: number; dir: 1 | -1 }[][] = g.nodes.map(() => [])
  g.pieces.forEach((pc, i) => {
    if (pc.a === pc.b) return
    adj[pc.a]!.push({ piece: i, to: pc.b, dir: 1 })
    adj[pc.b]!.push({ piece: i, to: pc.a, dir: -1 })
  })
  const parentPiece = new Array<{ piece: number; from: number; dir: 1 | -1 } | null>(g.nodes.length).fill(null)
  const depth = new Array<number>(g.nodes.length).fill(-1)
  const treePieces = new Set<number>()
  for (let root = 0; root < g.nodes.length; root++) {
    if (depth[root]! >= 0) continue
    depth[root] = 0
    const queue = [root]
    while (queue.length) {
      const u = queue.shift()!
      for (const e of adj[u]!) {
        if (depth[e.to]! >= 0) continue
        depth[e.to] = depth[u]! + 1
        parentPiece[e.to] = { piece: e.piece, from: u, dir: e.dir }
        treePieces.add(e.piece)
        queue.push(e.to)
      }
    }
  }
  const cycles: { pieces: { i: number; dir: 1 | -1 }[]; area: number }[] = []
  g.pieces.forEach((pc, i) => {
    if (pc.a === pc.b || treePieces.has(i)) return
    // Path a -> ... -> LCA <- ... <- b, then the piece b -> a closes it.
    const up: { i: number; dir: 1 | -1 }[] = [] // from a upwards (travel towards the LCA)
    const down: { i: number; dir: 1 | -1 }[] = [] // from b upwards, reversed later
    let u = pc.a
    let v = pc.b
    while (u !== v) {
      if (depth[u]! >= depth[v]!) {
        const p = parentPiece[u]!
        up.push({ i: p.piece, dir: p.dir === 1 ? -1 : 1 })
        u = p.from
      } else {
        const p = parentPiece[v]!
        down.push({ i: p.piece, dir: p.dir })
        v = p.from
      }
    }
    const path = [...up, ...down.reverse(), { i, dir: -1 as const }]
    // Polygon of the nodes visited, starting at a.
    const poly: Point[] = []
    for (const step of path) {
      const p = g.pieces[step.i]!
      poly.push(g.nodes[step.dir === 1 ? p.a : p.b]!)
    }
    let area2 = 0
    for (let k = 0; k < poly.length; k++) area2 += cross(poly[k]!, poly[(k + 1) % poly.length]!)
    const ccw = area2 >= 0
    cycles.push({
      pieces: ccw ? path : path.map((s) => ({ i: s.i, dir: s.dir === 1 ? (-1 as const) : (1 as const) })),
      area: Math.abs(area2) / 2,
    })
  })
  return cycles
}

/**
 * Composite thin-walled section of joined legs (see the module header for the idealisation).
 * Shear areas: each leg carries shear along its own line only, so along a direction d it adds
 * (5/6)·t·L·f_A·cos²(leg, d); the cross term between the two principal directions is neglected.
 * Torsion: J = Σ L t³/3 f_A over open legs; with one closed cell, Bredt 4A²/∮ds/(t f_A) for the cell's
 * legs plus the open legs. With several cells only the largest fundamental cell counts (a lower
 * value than the true multi-cell J) and the shear centre is put at the centroid.
 * Shear centre: the pole of the principal sectorial coordinate, found from ∫ω x dA = ∫ω y dA = 0
 * (open branched sections; with one closed cell the sectorial coordinate carries Bredt's shear-flow
 * correction ω̄ = ∫(r − ψ/t) ds, ψ = 2A/∮ds/t, on the cell's legs).
 * @see Vlasov, Thin-Walled Elastic Beams (1961) (from memory); Timoshenko & Gere, Mechanics of
 * Materials (channel shear centre, from memory); docs/mechanics.md §Wall groups
 */
export function compositeSection(legs: readonly SectionLeg[]): CompositeSection {
  const live = legs.filter((l) => Math.hypot(l.p2.x - l.p1.x, l.p2.y - l.p1.y) > 0 && l.t > 0)
  let area = 0
  let wA = 0
  let wx = 0
  let wy = 0
  for (const l of live) {
    const L = Math.hypot(l.p2.x - l.p1.x, l.p2.y - l.p1.y)
    const w = l.t * (l.flexureFactor ?? 1) * L
    area += l.t * L
    wA += w
    wx += (w * (l.p1.x + l.p2.x)) / 2
    wy += (w * (l.p1.y + l.p2.y)) / 2
  }
  const c: Point = wA > 0 ? { x: wx / wA, y: wy / wA } : { x: 0, y: 0 }
  let Sxx = 0
  let Syy = 0
  let Sxy = 0
  for (const l of live) {
    const L = Math.hypot(l.p2.x - l.p1.x, l.p2.y - l.p1.y)
    const tw = l.t * (l.flexureFactor ?? 1)
    const x0 = l.p1.x - c.x
    const y0 = l.p1.y - c.y
    const x1 = l.p2.x - c.x
    const y1 = l.p2.y - c.y
    // Exact integrals of products of linear functions along the leg: L/6 (2 f0 g0 + f0 g1 + f1 g0 + 2 f1 g1).
    Sxx += (tw * L * (x0 * x0 + x0 * x1 + x1 * x1)) / 3
    Syy += (tw * L * (y0 * y0 + y0 * y1 + y1 * y1)) / 3
    Sxy += (tw * L * (2 * x0 * y0 + x0 * y1 + x1 * y0 + 2 * x1 * y1)) / 6
  }
  // Principal directions: eigenvectors of [[Sxx, Sxy], [Sxy, Syy]].
  const mean = (Sxx + Syy) / 2
  const rad = Math.hypot((Sxx - Syy) / 2, Sxy)
  const I1 = mean + rad
  const I2 = Math.max(0, mean - rad)
  const alpha = 0.5 * Math.atan2(2 * Sxy, Sxx - Syy)
  const d1 = { x: Math.cos(alpha), y: Math.sin(alpha) }
  const d2 = { x: -d1.y, y: d1.x }
  let As1 = 0
  let As2 = 0
  for (const l of live) {
    const L = Math.hypot(l.p2.x - l.p1.x, l.p2.y - l.p1.y)
    const e = { x: (l.p2.x - l.p1.x) / L, y: (l.p2.y - l.p1.y) / L }
    const a = (5 / 6) * l.t * L * (l.shearFactor ?? 1)
    const c1 = e.x * d1.x + e.y * d1.y
    const c2 = e.x * d2.x + e.y * d2.y
    As1 += a * c1 * c1
    As2 += a * c2 * c2
  }

  const g = buildSectionGraph(live)
  const cycles = g.cells > 0 ? fundamentalCycles(g) : []
  const cell = cycles.reduce<(typeof cycles)[number] | null>((best, cy) => (!best || cy.area > best.area ? cy : best), null)
  const inCell = new Map<number, 1 | -1>()
  if (cell) for (const s of cell.pieces) inCell.set(s.i, s.dir)
  let J = 0
  let cellIntegral = 0 // ∮ ds / (t f_A) over the cell
  let cellIntegralFlex = 0 // ∮ ds / (t f_I) over the cell (for the sectorial correction)
  g.pieces.forEach((pc, i) => {
    const leg = live[pc.leg]!
    const L = Math.hypot(pc.p2.x - pc.p1.x, pc.p2.y - pc.p1.y)
    const fA = leg.shearFactor ?? 1
    if (inCell.has(i)) {
      cellIntegral += L / (leg.t * fA)
      cellIntegralFlex += L / (leg.t * (leg.flexureFactor ?? 1))
    } else J += (L * leg.t * leg.t * leg.t * fA) / 3
  })
  const cellArea = cell ? cell.area : 0
  if (cell && cellIntegral > 0) J += (4 * cellArea * cellArea) / cellIntegral

  const det = Sxx * Syy - Sxy * Sxy
  const singleLine = !(det > 1e-12 * (Sxx + Syy) * (Sxx + Syy))
  let shearCentre: Point = c
  let shearCentreMethod: CompositeSection['shearCentreMethod'] = 'sectorial'
  if (singleLine) shearCentreMethod = 'single-line'
  else if (g.cells > 1) shearCentreMethod = 'multi-cell-centroid'
  else {
    // Sectorial coordinate with pole at the centroid, propagated through the graph from node 0 of each
    // part; on the closed cell's legs the Bredt correction psi/t keeps it single-valued.
    const psi = cell && cellIntegralFlex > 0 ? (2 * cellArea) / cellIntegralFlex : 0
    const omega = new Array<number | undefined>(g.nodes.length).fill(undefined)
    const adj: number[][] = g.nodes.map(() => [])
    g.pieces.forEach((pc, i) => {
      adj[pc.a]!.push(i)
      adj[pc.b]!.push(i)
    })
    // Rise of omega from p1 to p2 of a piece: (r - sigma psi / t) L with r = (p1 - C) x e.
    const rise = (i: number): number => {
      const pc = g.pieces[i]!
      const leg = live[pc.leg]!
      const L = Math.hypot(pc.p2.x - pc.p1.x, pc.p2.y - pc.p1.y)
      if (!(L > 0)) return 0
      const e = { x: (pc.p2.x - pc.p1.x) / L, y: (pc.p2.y - pc.p1.y) / L }
      const r = cross({ x: pc.p1.x - c.x, y: pc.p1.y - c.y }, e)
      const sigma = inCell.get(i) ?? 0
      return (r - (sigma * psi) / (leg.t * (leg.flexureFactor ?? 1))) * L
    }
    for (let root = 0; root < g.nodes.length; root++) {
      if (omega[root] !== undefined) continue
      omega[root] = 0
      const queue = [root]
      while (queue.length) {
        const u = queue.shift()!
        for (const i of adj[u]!) {
          const pc = g.pieces[i]!
          const v = pc.a === u ? pc.b : pc.a
          if (omega[v] !== undefined) continue
          omega[v] = pc.a === u ? omega[u]! + rise(i) : omega[u]! - rise(i)
          queue.push(v)
        }
      }
    }
    let Iwx = 0
    let Iwy = 0
    g.pieces.forEach((pc, i) => {
      const leg = live[pc.leg]!
      const L = Math.hypot(pc.p2.x - pc.p1.x, pc.p2.y - pc.p1.y)
      const tw = leg.t * (leg.flexureFactor ?? 1)
      // omega at p1 from node a; at p2 from p1 plus the piece's own rise (equals node b's value on
      // tree pieces and, by Bredt's correction, on the piece that closes the cell).
      const w0 = omega[pc.a]!
      const w1 = w0 + rise(i)
      const x0 = pc.p1.x - c.x
      const y0 = pc.p1.y - c.y
      const x1 = pc.p2.x - c.x
      const y1 = pc.p2.y - c.y
      Iwx += (tw * L * (2 * w0 * x0 + w0 * x1 + w1 * x0 + 2 * w1 * x1)) / 6
      Iwy += (tw * L * (2 * w0 * y0 + w0 * y1 + w1 * y0 + 2 * w1 * y1)) / 6
    })
    // Moving the pole by (dx, dy) changes omega by -dx (y - y0) + dy (x - x0); the shear centre is
    // the pole with Iwx = Iwy = 0: Iwx - dx Sxy + dy Sxx = 0, Iwy - dx Syy + dy Sxy = 0.
    const dx = (Sxx * Iwy - Sxy * Iwx) / det
    const dy = (Sxy * Iwy - Syy * Iwx) / det
    shearCentre = { x: c.x + dx, y: c.y + dy }
  }
  return {
    area,
    centroid: c,
    Sxx,
    Syy,
    Sxy,
    d1,
    d2,
    I1,
    I2,
    As1,
    As2,
    J,
    shearCentre,
    shearCentreMethod,
    cells: g.cells,
    cellArea,
  }
}
