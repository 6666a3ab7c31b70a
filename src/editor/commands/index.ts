/** The command table: every document change goes through one of these, by name, via `execute`. */
import { addColumn } from './addColumn'
import { addFloor } from './addFloor'
import { addFrameLine } from './addFrameLine'
import { addLineMass } from './addLineMass'
import { addMaterial } from './addMaterial'
import { addOpening } from './addOpening'
import { addPointMass } from './addPointMass'
import { addSlab } from './addSlab'
import { addWall } from './addWall'
import { copyElementsToFloors } from './copyElementsToFloors'
import { deleteElements } from './deleteElements'
import { duplicateFloor } from './duplicateFloor'
import { insertSlabVertex } from './insertSlabVertex'
import { linkTypicalFloor } from './linkTypicalFloor'
import { moveElements } from './moveElements'
import { moveEndpoint } from './moveEndpoint'
import { moveSlabVertex } from './moveSlabVertex'
import { removeFloor } from './removeFloor'
import { removeOpening } from './removeOpening'
import { removeSlabVertex } from './removeSlabVertex'
import { renameFloor } from './renameFloor'
import { renameProject } from './renameProject'
import { rotateElements } from './rotateElements'
import { setAnalysisSettings } from './setAnalysisSettings'
import { setElementFloorRange } from './setElementFloorRange'
import { setFloorHeight } from './setFloorHeight'
import { setGrid } from './setGrid'
import { setSlabOutline } from './setSlabOutline'
import { unlinkTypicalFloor } from './unlinkTypicalFloor'
import { updateElement } from './updateElement'
import { updateElements } from './updateElements'
import { updateMaterial } from './updateMaterial'

export const commands = {
  renameProject,
  addFloor,
  removeFloor,
  duplicateFloor,
  setFloorHeight,
  renameFloor,
  linkTypicalFloor,
  unlinkTypicalFloor,
  addSlab,
  setSlabOutline,
  moveSlabVertex,
  insertSlabVertex,
  removeSlabVertex,
  addOpening,
  removeOpening,
  addWall,
  addFrameLine,
  addColumn,
  addLineMass,
  addPointMass,
  updateElement,
  updateElements,
  moveElements,
  rotateElements,
  moveEndpoint,
  deleteElements,
  copyElementsToFloors,
  setElementFloorRange,
  setAnalysisSettings,
  addMaterial,
  updateMaterial,
  setGrid,
} as const

/** Names of all commands. */
export type CommandName = keyof typeof commands

/** The argument type of a command. */
export type CommandArgs<N extends CommandName> = Parameters<(typeof commands)[N]>[1]
