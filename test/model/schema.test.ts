import { describe, expect, it } from 'vitest'
import box from '../../public/examples/eccentric-box.json'
import corner from '../../public/examples/corner-block.json'
import {
  CURRENT_VERSION,
  DEFAULT_SETTINGS,
  MAX_MESSAGES,
  parseProject,
  parseProjectText,
  serializeProject,
} from '@/model/schema'
import type { Project } from '@/model'
import { analyzeProject } from '@/engine'

type Json = Record<string, unknown>

/** A deep copy of a fixture that a test may edit freely. */
const copy = <T>(x: T): Json => JSON.parse(JSON.stringify(x)) as Json

function errorsOf(input: unknown): readonly string[] {
  const r = parseProject(input)
  if (r.ok) throw new Error('expected the file to be refused')
  return r.errors
}

function projectOf(input: unknown): { project: Project; warnings: readonly string[] } {
  const r = parseProject(input)
  if (!r.ok) throw new Error(`expected the file to load: ${r.errors.join('; ')}`)
  return r
}

/** Set a value at a dotted path with [i] indices, e.g. 'floors[0].height'. */
function setPath(doc: Json, path: string, value: unknown): Json {
  const parts = path.replace(/\[(\d+)\]/g, '.$1').split('.')
  let node: Record<string, unknown> = doc
  for (const p of parts.slice(0, -1)) node = node[p] as Record<string, unknown>
  const last = parts[parts.length - 1] as string
  if (value === undefined) delete node[last]
  else node[last] = value
  return doc
}

describe('parseProject', () => {
  it('loads the demo building and the hand-check box without errors or warnings', () => {
    for (const fixture of [corner, box]) {
      const { project, warnings } = projectOf(copy(fixture))
      expect(warnings).toEqual([])
      expect(project.version).toBe(CURRENT_VERSION)
    }
    const { project } = projectOf(copy(corner))
    expect(project.floors.map((f) => f.id)).toEqual(['L1', 'L2', 'L3', 'L4', 'L5', 'L6', 'L7'])
    expect(Object.keys(project.walls)).toHaveLength(5)
    // corner-block.json: story heights 4.5 + 6 x 3.2 m (hand sum) = 23.7 m
    expect(project.floors.reduce((s, f) => s + f.height, 0)).toBeCloseTo(23.7, 12)
  })

  it('reads the optional wall field joins and names its path when the value is wrong', () => {
    const doc = copy(corner)
    setPath(doc, 'walls.core-e.joins', 'apart')
    const { project } = projectOf(doc)
    expect(project.walls['core-e']?.joins).toBe('apart')
    expect(project.walls['core-s']).not.toHaveProperty('joins') // default auto: not written
    expect(serializeProject(project)).toContain('"joins": "apart"')
    setPath(doc, 'walls.core-e.joins', 'yes')
    expect(errorsOf(doc)).toEqual(['walls.core-e.joins: must be one of "auto", "apart", got "yes"'])
  })

  it('names the path and the value when a number is out of range or not a number', () => {
    const doc = copy(corner)
    setPath(doc, 'walls.core-s.thickness', -0.2)
    setPath(doc, 'floors[3].height', 'abc')
    expect(errorsOf(doc)).toEqual([
      'floors[3].height: must be a finite number, got "abc"',
      'walls.core-s.thickness: must be > 0, got -0.2',
    ])
  })

  it('reads the version-2 frame and column fields and names the path of a bad one', () => {
    const doc = copy(corner)
    setPath(doc, 'frameLines.mf-south.stiffness.baseFixity', 'pinned')
    setPath(doc, 'frameLines.mf-south.stiffness.beamFactor', 0.5)
    setPath(doc, 'frameLines.mf-south.stiffness.stories', { L2: { columnI: 0.009 } })
    setPath(doc, 'columns.c1.restraint', 0.4)
    const { project, warnings } = projectOf(doc)
    expect(warnings).toEqual([])
    expect(project.frameLines['mf-south']?.stiffness).toMatchObject({
      baseFixity: 'pinned',
      beamFactor: 0.5,
      stories: { L2: { columnI: 0.009 } },
    })
    expect(project.frameLines['mf-south']?.stiffness).not.toHaveProperty('columnFactor')
    expect(project.columns.c1?.restraint).toBe(0.4)
    setPath(doc, 'frameLines.mf-south.stiffness.baseFixity', 'hinged')
    setPath(doc, 'frameLines.mf-south.stiffness.stories', { L2: { beamI: -1 } })
    setPath(doc, 'columns.c1.restraint', 1.5)
    const errors = errorsOf(doc)
    expect(errors).toContain('frameLines.mf-south.stiffness.stories.L2.beamI: must be > 0, got -1')
    expect(errors).toContain('columns.c1.restraint: must be <= 1, got 1.5')
    expect(errors.some((e) => e.startsWith('frameLines.mf-south.stiffness.baseFixity:'))).toBe(true)
  })

  it('collects every error of a file instead of stopping at the first', () => {
    const doc = copy(corner)
    setPath(doc, 'materials.concrete.E', 0)
    setPath(doc, 'materials.steel.nu', 0.5)
    setPath(doc, 'columns.c3.material', 'timber')
    setPath(doc, 'walls.core-n.top', 'L9')
    setPath(doc, 'settings.damping', 0)
    setPath(doc, 'settings.accidentalEccentricity', 0.6)
    expect(errorsOf(doc)).toEqual([
      'materials.concrete.E: must be > 0, got 0',
      // Poisson ratio of an isotropic elastic solid is below 0.5 (incompressible limit): common practice
      'materials.steel.nu: must be < 0.5, got 0.5',
      'walls.core-n.top: no floor "L9"',
      'columns.c3.material: no material "timber"',
      'settings.accidentalEccentricity: must be <= 0.5, got 0.6',
      'settings.damping: must be > 0, got 0',
    ])
  })

  it('refuses NaN, Infinity and huge values that JSON.parse or the editor could hand over', () => {
    const doc = copy(box)
    setPath(doc, 'floors[0].height', Number.NaN)
    setPath(doc, 'slabs.deck.areaMass', Number.POSITIVE_INFINITY)
    setPath(doc, 'frameLines.west.stiffness.storyStiffness', 1e300)
    expect(errorsOf(doc)).toEqual([
      'floors[0].height: must be a finite number, got NaN',
      'slabs.deck.areaMass: must be a finite number, got Infinity',
      'frameLines.west.stiffness.storyStiffness: must be <= 100000000000000, got 1e+300',
    ])
    // 1e400 overflows to Infinity in JSON.parse (IEEE 754 double range, ECMA-262 Number type)
    const text = JSON.stringify(copy(box)).replace('"height":3.5', '"height":1e400')
    expect(parseProjectText(text)).toEqual({
      ok: false,
      errors: ['floors[0].height: must be a finite number, got Infinity'],
    })
  })

  it('refuses a file whose record key differs from the record id', () => {
    const doc = copy(box)
    setPath(doc, 'frameLines.west.id', 'east')
    expect(errorsOf(doc)).toEqual(['frameLines.west.id: must equal its key "west", got "east"'])
  })

  it('refuses duplicate floor ids and an element whose base is not below its top', () => {
    const doc = copy(corner)
    setPath(doc, 'floors[4].id', 'L2')
    setPath(doc, 'walls.gable-e.base', 'L7')
    const errors = errorsOf(doc)
    expect(errors).toContain('floors[4].id: duplicate floor id "L2" (also floors[1])')
    expect(errors).toContain('walls.gable-e.top: must be above its base "L7", got "L7"')
  })

  it('refuses typical-floor links to itself, to a missing floor, or in a cycle', () => {
    const self = copy(corner)
    setPath(self, 'floors[2].typicalOf', 'L3')
    expect(errorsOf(self)).toEqual(['floors[2].typicalOf: must name another floor, got its own id "L3"'])
    const missing = copy(corner)
    setPath(missing, 'floors[2].typicalOf', 'L0')
    expect(errorsOf(missing)).toEqual(['floors[2].typicalOf: no floor "L0"'])
    const cycle = copy(corner)
    setPath(cycle, 'floors[1].typicalOf', 'L4')
    expect(errorsOf(cycle)).toEqual(['floors[1].typicalOf: links form a cycle L2 -> L4 -> L2'])
  })

  it('refuses polygons with fewer than 3 vertices, zero area, or crossing edges', () => {
    const few = copy(box)
    setPath(few, 'slabs.deck.outline', [
      { x: 0, y: 0 },
      { x: 1, y: 0 },
    ])
    expect(errorsOf(few)).toEqual(['slabs.deck.outline: needs at least 3 vertices, got 2'])
    // Shoelace formula (Green's theorem): collinear vertices enclose zero area
    const flat = copy(box)
    setPath(flat, 'slabs.deck.outline', [
      { x: 0, y: 0 },
      { x: 5, y: 0 },
      { x: 10, y: 0 },
    ])
    expect(errorsOf(flat)).toEqual(['slabs.deck.outline: must enclose a non-zero area (the vertices are in one line)'])
    // A bow tie: edges 0-1 and 2-3 cross at (5, 3), the two lobes' signed areas cancel
    const bowTie = copy(box)
    setPath(bowTie, 'slabs.deck.outline', [
      { x: 0, y: 0 },
      { x: 10, y: 6 },
      { x: 10, y: 0 },
      { x: 0, y: 6 },
    ])
    expect(errorsOf(bowTie)[0]).toMatch(/^slabs\.deck\.outline: /)
    const bowTie2 = copy(box)
    setPath(bowTie2, 'slabs.deck.outline', [
      { x: 0, y: 0 },
      { x: 10, y: 6 },
      { x: 10, y: 0 },
      { x: 0, y: 5 },
    ])
    expect(errorsOf(bowTie2)).toEqual([
      'slabs.deck.outline: edges 0-1 and 2-3 cross or touch (an outline must not cross itself)',
    ])
  })

  it('refuses an opening outside its outline and openings that cover the outline', () => {
    const out = copy(box)
    setPath(out, 'slabs.deck.openings', [
      [
        { x: 8, y: 1 },
        { x: 12, y: 1 },
        { x: 12, y: 2 },
        { x: 8, y: 2 },
      ],
    ])
    expect(errorsOf(out)).toEqual([
      'slabs.deck.openings[0]: must lie inside the outline (vertex 1 at (12, 1) is outside)',
    ])
    const full = copy(box)
    setPath(full, 'slabs.deck.openings', [
      [
        { x: 0, y: 0 },
        { x: 10, y: 0 },
        { x: 10, y: 6 },
        { x: 0, y: 6 },
      ],
    ])
    expect(errorsOf(full)).toEqual([
      'slabs.deck.openings: cover the whole outline (openings must not overlap each other)',
    ])
  })

  it('refuses overlapping, nested, crossing and outline-crossing openings with path-naming messages (was: accepted, wrong mass)', () => {
    const r = (x0: number, y0: number, x1: number, y1: number) => [
      { x: x0, y: y0 },
      { x: x1, y: y0 },
      { x: x1, y: y1 },
      { x: x0, y: y1 },
    ]
    const withOpenings = (openings: unknown, outline?: unknown): Json => {
      const doc = copy(box)
      setPath(doc, 'slabs.deck.openings', openings)
      if (outline) setPath(doc, 'slabs.deck.outline', outline)
      return doc
    }
    expect(errorsOf(withOpenings([r(1, 1, 4, 4), r(3, 2, 6, 5)]))).toEqual([
      'slabs.deck.openings[1]: overlaps openings[0] (its edge 0-1 crosses edge 1-2 of openings[0]; openings must not overlap each other)',
    ])
    expect(errorsOf(withOpenings([r(1, 1, 4, 4), r(2, 2, 3, 3)]))).toEqual([
      'slabs.deck.openings[1]: lies inside openings[0] (openings must not overlap each other)',
    ])
    expect(errorsOf(withOpenings([r(1, 2, 9, 3), r(4, 1, 5, 5)]))[0]).toMatch(/^slabs\.deck\.openings\[1\]: overlaps openings\[0\]/)
    expect(errorsOf(withOpenings([[{ x: 1, y: 1 }, { x: 3, y: 3 }, { x: 3, y: 1 }, { x: 1, y: 2 }]]))).toEqual([
      'slabs.deck.openings[0]: edges 0-1 and 2-3 cross or touch (an outline must not cross itself)',
    ])
    const L = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 3 },
      { x: 4, y: 3 },
      { x: 4, y: 6 },
      { x: 0, y: 6 },
    ]
    expect(errorsOf(withOpenings([[{ x: 1, y: 1 }, { x: 9, y: 1 }, { x: 2, y: 5 }]], L))).toEqual([
      'slabs.deck.openings[0]: must lie inside the outline (its edge 1-2 crosses outline edge 2-3)',
    ])
  })

  it('gives the hand-calculated mass for openings that touch each other', () => {
    const doc = copy(box)
    setPath(doc, 'slabs.deck.openings', [
      [
        { x: 1, y: 1 },
        { x: 3, y: 1 },
        { x: 3, y: 3 },
        { x: 1, y: 3 },
      ],
      [
        { x: 3, y: 1 },
        { x: 5, y: 1 },
        { x: 5, y: 3 },
        { x: 3, y: 3 },
      ],
    ])
    const r = analyzeProject(projectOf(doc).project)
    // hand calculation: 600 kg/m² × (10 × 6 − 2 × 2 − 2 × 2) m² = 31 200 kg
    expect(r.floors[0]!.mass).toBeCloseTo(31200, 6)
  })

  it('accepts an opening that touches the outline edge', () => {
    const doc = copy(box)
    setPath(doc, 'slabs.deck.openings', [
      [
        { x: 0, y: 2 },
        { x: 2, y: 2 },
        { x: 2, y: 4 },
        { x: 0, y: 4 },
      ],
    ])
    expect(projectOf(doc).project.slabs.deck?.openings).toHaveLength(1)
  })

  it('checks wall story overrides are keyed by floors the wall spans', () => {
    const doc = copy(corner)
    setPath(doc, 'walls.gable-e.base', 'L2')
    setPath(doc, 'walls.gable-e.stories', { L2: { thickness: 0.2 }, L9: { thickness: 0.2 }, L5: { thickness: 0 } })
    expect(errorsOf(doc)).toEqual([
      'walls.gable-e.stories.L2: floor "L2" is outside the element\'s stories',
      'walls.gable-e.stories.L9: no floor "L9"',
      'walls.gable-e.stories.L5.thickness: must be > 0, got 0',
    ])
  })

  it('validates the settings: spectrum kinds, table order, ground motion and criterion sets', () => {
    const doc = copy(box)
    setPath(doc, 'settings.spectrum', { kind: 'table', points: [[0, 0.4], [0.5, 1], [0.4, 0.8]] })
    setPath(doc, 'settings.directionCombination', 'abs')
    setPath(doc, 'settings.groundMotion', { kind: 'record', name: 'r', dt: 0.01, ax: [0, 1, 2], ay: [0, 1] })
    setPath(doc, 'settings.criterionSets', [
      { id: 'mine', name: 'Mine', source: 'office rule', irregularRatio: 1.3, extremeRatio: 1.2 },
      { id: 'mine', name: 'Again', source: 'x' },
    ])
    setPath(doc, 'settings.criterionSet', 7)
    expect(errorsOf(doc)).toEqual([
      'settings.criterionSet: must be a string, got 7',
      'settings.criterionSets[0].extremeRatio: must be >= irregularRatio (1.3), got 1.2',
      'settings.criterionSets[1].id: duplicate criterion set id "mine" (also settings.criterionSets[0])',
      'settings.spectrum.points[2][0]: periods must be strictly ascending, got 0.4 after 0.5',
      'settings.directionCombination: must be one of "srss", "100-30", got "abs"',
      'settings.groundMotion.ay: must have as many samples as ax (3), got 2',
    ])
    const ratio = copy(box)
    setPath(ratio, 'settings.criterionSets', [{ id: 'mine', source: 'office rule', ratioQuantity: 'rotation' }])
    expect(errorsOf(ratio)).toEqual([
      'settings.criterionSets[0].ratioQuantity: must be one of "drift", "displacement", got "rotation"',
    ])
    const asce = copy(box)
    setPath(asce, 'settings.spectrum.SD1', -0.6)
    setPath(asce, 'settings.spectrum.kind', 'asce7')
    expect(errorsOf(asce)).toEqual(['settings.spectrum.SD1: must be > 0, got -0.6'])
  })

  it('reads the optional spectrum mode rule, keeps it on save and names the field when it is wrong', () => {
    const doc = copy(box)
    setPath(doc, 'settings.spectrumModes', 'ninety-percent')
    const { project } = projectOf(doc)
    expect(project.settings.spectrumModes).toBe('ninety-percent')
    expect(projectOf(JSON.parse(serializeProject(project))).project.settings.spectrumModes).toBe('ninety-percent')
    expect(projectOf(copy(box)).project.settings.spectrumModes).toBeUndefined()
    setPath(doc, 'settings.spectrumModes', 'all')
    expect(errorsOf(doc)).toEqual([
      'settings.spectrumModes: must be one of "full-mass", "ninety-percent", got "all"',
    ])
  })

  it('refuses a newer version with a message that says to update', () => {
    const doc = copy(box)
    doc.version = 7
    expect(errorsOf(doc)).toEqual([`version 7 is newer than this Gyre (reads up to ${CURRENT_VERSION}): update Gyre`])
  })

  it('refuses a file with a wrong or missing format tag, and input that is not an object', () => {
    expect(errorsOf({ ...copy(box), format: 'other-tool' })).toEqual([
      'format: must be "gyre-project" (this is not a Gyre project file), got "other-tool"',
    ])
    const noFormat = copy(box)
    delete noFormat.format
    expect(errorsOf(noFormat)).toEqual([
      'format: must be "gyre-project" (this is not a Gyre project file), got nothing',
    ])
    expect(errorsOf([1, 2])).toEqual(['(file): must be a JSON object (a Gyre project), got a list'])
    expect(errorsOf(null)).toEqual(['(file): must be a JSON object (a Gyre project), got null'])
    expect(errorsOf({ ...copy(box), version: 'one' })).toEqual([
      'version: must be a whole number >= 0, got "one"',
    ])
  })

  it('warns about unknown fields and drops them from the project', () => {
    const doc = copy(box)
    setPath(doc, 'colour', 'red')
    setPath(doc, 'frameLines.west.color', 'blue')
    const { project, warnings } = projectOf(doc)
    expect(warnings).toEqual(['colour: unknown field, ignored', 'frameLines.west.color: unknown field, ignored'])
    expect(project).not.toHaveProperty('colour')
    expect(project.frameLines.west).not.toHaveProperty('color')
  })

  it('fills documented defaults for fields a hand-written file leaves out', () => {
    const { project, warnings } = projectOf({
      format: 'gyre-project',
      version: CURRENT_VERSION,
      floors: [{ id: 'F1', height: 3 }],
      materials: { c: { E: 30e9, nu: 0.2 } },
      walls: { w: { p1: { x: 0, y: 0 }, p2: { x: 4, y: 0 }, thickness: 0.2, material: 'c', top: 'F1' } },
    })
    expect(project.name).toBe('Untitled project')
    expect(project.floors[0]?.name).toBe('F1')
    expect(project.materials.c).toEqual({ id: 'c', name: 'c', E: 30e9, nu: 0.2 })
    // flexureFactor: ACI 318-19 Table 6.6.3.1.1(a), walls uncracked 0.70 Ig (the file default since version 2)
    expect(project.walls.w).toMatchObject({ id: 'w', name: 'w', flexureFactor: 0.7, shearFactor: 1, base: 'ground' })
    expect(project.slabs).toEqual({})
    expect(project.settings).toEqual(DEFAULT_SETTINGS)
    expect(warnings).toEqual([
      'settings: missing: using the defaults and a placeholder spectrum; set your site spectrum',
    ])
  })

  it('warns when a floor linked to a typical floor has its own content', () => {
    const doc = copy(corner)
    setPath(doc, 'floors[2].typicalOf', 'L2')
    setPath(doc, 'pointMasses.tank.floor', 'L3')
    expect(projectOf(doc).warnings).toEqual([
      'pointMasses.tank: floor "L3" uses a typical floor, so this is ignored',
    ])
  })

  it('caps the error list and says how many more there were', () => {
    const doc = copy(box)
    doc.floors = Array.from({ length: 80 }, (_, i) => ({ id: `F${i}`, height: -1 }))
    const errors = errorsOf(doc)
    expect(errors).toHaveLength(MAX_MESSAGES + 1)
    expect(errors[MAX_MESSAGES]).toMatch(/^\.\.\. and \d+ more errors$/)
  })

  it('refuses ids that are empty, reserved or not plain names', () => {
    const doc = copy(box)
    doc.frameLines = {
      ...(doc.frameLines as Json),
      'bad id': { p1: { x: 0, y: 0 }, p2: { x: 1, y: 0 }, stiffness: { kind: 'direct', storyStiffness: 1 }, top: 'F1' },
      constructor: { p1: { x: 0, y: 0 }, p2: { x: 1, y: 0 }, stiffness: { kind: 'direct', storyStiffness: 1 }, top: 'F1' },
    }
    expect(errorsOf(doc)).toEqual([
      'frameLines["bad id"]: must be 1 to 64 letters, digits or _ . : - (starting with a letter or digit), got "bad id"',
      'frameLines.constructor: "constructor" is a reserved name, choose another id',
    ])
  })

  it('never shares objects with its input', () => {
    const doc = copy(box)
    const { project } = projectOf(doc)
    expect(project.slabs.deck?.outline).not.toBe((doc.slabs as Json).deck)
    ;((doc.slabs as Record<string, Json>).deck as Json).areaMass = 1
    expect(project.slabs.deck?.areaMass).toBe(600)
  })
})

describe('parseProjectText', () => {
  it('refuses text that is not JSON with the parser message', () => {
    const r = parseProjectText('{"format": "gyre-project",')
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.errors[0]).toMatch(/^\(file\): not valid JSON: /)
  })
})

describe('serializeProject', () => {
  it('round-trips the demo through parseProject unchanged', () => {
    const { project } = projectOf(copy(corner))
    const text = serializeProject(project)
    const again = projectOf(JSON.parse(text)).project
    expect(again).toEqual(project)
    expect(serializeProject(again)).toBe(text)
  })

  it('writes 2-space JSON with a stable field order whatever the insertion order', () => {
    const { project } = projectOf(copy(box))
    const shuffled = JSON.parse(JSON.stringify(project), (_k, v: unknown) => {
      if (typeof v !== 'object' || v === null || Array.isArray(v)) return v
      return Object.fromEntries(Object.entries(v).reverse())
    }) as Project
    const text = serializeProject(shuffled)
    expect(text.startsWith(`{\n  "format": "gyre-project",\n  "version": ${CURRENT_VERSION},\n  "name": `)).toBe(true)
    expect(text.endsWith('}\n')).toBe(true)
    // Field order is fixed; record maps keep the document's order (reversed here).
    const a = JSON.parse(serializeProject(project)) as Json
    const b = JSON.parse(text) as Json
    expect(Object.keys(b)).toEqual(Object.keys(a))
    expect(Object.keys((b.frameLines as Json).west as Json)).toEqual(Object.keys((a.frameLines as Json).west as Json))
    expect(Object.keys(b.frameLines as Json)).toEqual([...Object.keys(a.frameLines as Json)].reverse())
  })
})
