/**
 * Pure glue between engine results and the frame loop: which motion is shown (a mode or the time
 * history), the unit scale that makes its largest floor displacement equal the plan size (the
 * amplitude control multiplies it), the colour measures, and the mode table rows.
 */
import { maxOf } from '@/model'
import type { AnalysisResult, ModalResult, ModeCharacter, TimeHistoryResult } from '@/engine'
import type { Point } from '@/model'
import type { BuildingLayout } from './buildingLayout'
import { normalizeToMax, responseMeasures } from './colourScale'
import {
  historyFloorDofs,
  historyLargestDisplacement,
  largestDisplacement,
  modeFloorDofs,
  planSize,
} from './modeAnimation'
import type { FloorDof } from './modeAnimation'
import { classifyMode, describeMode, modeTitle } from './modeMeaning'
import type { NamedSegment } from './modeMeaning'

export interface ColourMeasures {
  /** 0..1 per floor, relative to the largest. */
  readonly displacement: readonly number[]
  /** 0..1 per story (index of the floor above), relative to the largest. */
  readonly driftRatio: readonly number[]
  /** Largest raw values (units of the motion: m and - for a response, arbitrary for a mode). */
  readonly maxDisplacement: number
  readonly maxDriftRatio: number
}

export interface ModeMotion {
  readonly kind: 'mode'
  readonly mode: number
  readonly dofs: readonly FloorDof[]
  /** Scale at which the largest floor displacement equals the plan size. */
  readonly unitScale: number
  readonly colours: ColourMeasures
  readonly title: string
  readonly meaning: string
}

export interface HistoryMotion {
  readonly kind: 'history'
  readonly history: TimeHistoryResult
  readonly unitScale: number
  readonly colours: ColourMeasures
  readonly title: string
  readonly meaning: string
}

export type MotionSource = ModeMotion | HistoryMotion

/** Plain row of the mode list. */
export interface ModeRow {
  readonly number: number
  readonly period: number
  readonly frequencyHz: number
  readonly ratioX: number
  readonly ratioY: number
  readonly ratioRz: number
  readonly cumulativeX: number
  readonly cumulativeY: number
  readonly cumulativeRz: number
  readonly torsionShare: number
  readonly character: ModeCharacter
}

/** Whether a result's modes fit the floors on screen (a stale result may not). */
export function resultFits(result: AnalysisResult | null, layout: BuildingLayout): boolean {
  const modes = result?.modes
  return Boolean(
    modes &&
      modes.count > 0 &&
      modes.dofCount === layout.floors.length * 3 &&
      modes.shapes.length >= modes.count * modes.dofCount,
  )
}

/** Rows of the mode list. */
export function modeRows(modes: ModalResult): ModeRow[] {
  const rows: ModeRow[] = []
  for (let m = 0; m < modes.count; m++) {
    const ratioX = modes.effectiveMassRatio.x[m] ?? 0
    const ratioY = modes.effectiveMassRatio.y[m] ?? 0
    const torsionShare = modes.torsionShare[m] ?? 0
    rows.push({
      number: m + 1,
      period: modes.periods[m] ?? 0,
      frequencyHz: modes.frequenciesHz[m] ?? 0,
      ratioX,
      ratioY,
      ratioRz: modes.effectiveMassRatio.rz[m] ?? 0,
      cumulativeX: modes.cumulativeMassRatio.x[m] ?? 0,
      cumulativeY: modes.cumulativeMassRatio.y[m] ?? 0,
      cumulativeRz: modes.cumulativeMassRatio.rz[m] ?? 0,
      torsionShare,
      character: modes.character[m] ?? classifyMode(ratioX, ratioY, torsionShare),
    })
  }
  return rows
}

/** Points per floor used for scaling and colours: slab corners, else the engine's extreme points. */
export function floorPoints(layout: BuildingLayout, result: AnalysisResult | null): Point[][] {
  return layout.floors.map((f, i) => {
    if (f.corners.length) return [...f.corners]
    return [...(result?.floors[i]?.extremePoints ?? [])]
  })
}

function measures(
  dofs: readonly FloorDof[],
  points: readonly (readonly Point[])[],
  heights: readonly number[],
): ColourMeasures {
  const raw = responseMeasures(dofs, points, heights)
  return {
    displacement: normalizeToMax(raw.displacement),
    driftRatio: normalizeToMax(raw.driftRatio),
    maxDisplacement: maxOf(raw.displacement, 0),
    maxDriftRatio: maxOf(raw.driftRatio, 0),
  }
}

/** Walls as named plan segments (for "near the core" in the meaning line). */
export function wallSegments(walls: readonly { name: string; p1: Point; p2: Point }[]): NamedSegment[] {
  return walls.map((w) => ({ name: w.name, p1: w.p1, p2: w.p2 }))
}

/** Motion of one mode; null when the result does not fit the floors or the mode does not exist. */
export function modeMotion(
  result: AnalysisResult | null,
  layout: BuildingLayout,
  mode: number,
  walls: readonly NamedSegment[] = [],
): ModeMotion | null {
  const modes = result?.modes
  if (!modes || !resultFits(result, layout) || mode < 0 || mode >= modes.count) return null
  const n = layout.floors.length
  const dofs = modeFloorDofs(modes.shapes, modes.dofCount, mode, n)
  const points = floorPoints(layout, result)
  const size = planSize(points.flat())
  const largest = largestDisplacement(dofs, points)
  const row = modeRows({ ...modes, count: mode + 1 })[mode]!
  const top = dofs[n - 1] ?? { ux: 0, uy: 0, theta: 0 }
  return {
    kind: 'mode',
    mode,
    dofs,
    unitScale: largest > 0 ? size / largest : 0,
    colours: measures(
      dofs,
      points,
      layout.floors.map((f) => f.height),
    ),
    title: modeTitle(mode + 1, row.period),
    meaning: describeMode(
      {
        number: mode + 1,
        period: row.period,
        character: row.character,
        ratioX: row.ratioX,
        ratioY: row.ratioY,
        torsionShare: row.torsionShare,
        floor: top,
      },
      layout.box,
      walls,
    ),
  }
}

/** Motion of the time history, or null when there is none or it does not fit. */
export function historyMotion(result: AnalysisResult | null, layout: BuildingLayout): HistoryMotion | null {
  const th = result?.timeHistory
  const n = layout.floors.length
  if (!th || th.dofCount !== 3 * n || th.stepCount < 2) return null
  const points = floorPoints(layout, result)
  const size = planSize(points.flat())
  const largest = historyLargestDisplacement(th.displacements, th.dofCount, points)
  // Colour by the peak state: the step with the largest roof-corner displacement.
  let peakStep = 0
  let peak = -1
  for (let s = 0; s < th.stepCount; s++) {
    const d = largestDisplacement(historyFloorDofs(th.displacements, th.dofCount, s, 1).slice(n - 1), [
      points[n - 1] ?? [],
    ])
    if (d > peak) {
      peak = d
      peakStep = s
    }
  }
  return {
    kind: 'history',
    history: th,
    unitScale: largest > 0 ? size / largest : 0,
    colours: measures(
      historyFloorDofs(th.displacements, th.dofCount, peakStep, 1),
      points,
      layout.floors.map((f) => f.height),
    ),
    title: `Response to ${th.groundMotionName}`,
    meaning: `Peak roof displacement ${(largest * 1000).toFixed(1)} mm (coloured at the peak, ${(peakStep * th.dt).toFixed(2)} s)`,
  }
}
