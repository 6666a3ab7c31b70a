/**
 * editor: plan editing for Gyre — the document store (vanilla zustand), named pure commands, undo
 * history (marks, reversible diffs, bail, squash), tools as small state machines fed with plan-space
 * events, and pure plan geometry (snapping, hit testing, readouts, grid).
 *
 * Public API: createEditorStore + the action functions (execute, undo, redo, mark, bail, squash,
 * setSelection, setCurrentFloor, setTool, dispatch, loadDocument, ...), the command table and its
 * argument types, tool ids, event types, geometry helpers and selectors. See docs/editor.md.
 *
 * Must not import: react, react-dom, three, @react-three/fiber, the engine, viewer or ui, DOM types.
 * Only `zustand/vanilla` from zustand.
 */
export {
  EMPTY_EPHEMERAL,
  TOOL_IDS,
  bail,
  clearMessage,
  createEditorStore,
  execute,
  loadDocument,
  mark,
  redo,
  selectCanRedo,
  selectCanUndo,
  setCurrentFloor,
  setDefaults,
  setMessage,
  setSelection,
  setSnapping,
  squash,
  undo,
} from './store'
export type {
  Draft,
  EditorState,
  EditorStore,
  Ephemeral,
  ExecuteOptions,
  ExecuteResult,
  SnapSettings,
  ToolId,
  ToolMemory,
  ToolState,
} from './store'

export { commands } from './commands/index'
export type { CommandArgs, CommandName } from './commands/index'
export type { Command, CommandOutcome, Refusal } from './commands/result'
export { isRefusal } from './commands/result'
export { ELEMENT_DEFAULTS } from './commands/defaults'
export type { ElementDefaults } from './commands/defaults'
export { ELEMENT_KINDS, PLAN_KINDS, findRecord, kindOf } from './commands/records'
export type { ElementKind, PlanKind } from './commands/records'
export type { Patch } from './commands/patch'
export type { AddFloorArgs } from './commands/addFloor'
export type { RemoveFloorArgs } from './commands/removeFloor'
export type { DuplicateFloorArgs } from './commands/duplicateFloor'
export type { SetFloorHeightArgs } from './commands/setFloorHeight'
export type { RenameFloorArgs } from './commands/renameFloor'
export type { LinkTypicalFloorArgs } from './commands/linkTypicalFloor'
export type { UnlinkTypicalFloorArgs } from './commands/unlinkTypicalFloor'
export type { AddSlabArgs } from './commands/addSlab'
export type { SetSlabOutlineArgs } from './commands/setSlabOutline'
export type { MoveSlabVertexArgs } from './commands/moveSlabVertex'
export type { InsertSlabVertexArgs } from './commands/insertSlabVertex'
export type { RemoveSlabVertexArgs } from './commands/removeSlabVertex'
export type { SlabRing } from './commands/slabRings'
export type { AddOpeningArgs } from './commands/addOpening'
export type { RemoveOpeningArgs } from './commands/removeOpening'
export type { AddWallArgs } from './commands/addWall'
export type { AddFrameLineArgs } from './commands/addFrameLine'
export type { AddColumnArgs } from './commands/addColumn'
export type { AddLineMassArgs } from './commands/addLineMass'
export type { AddPointMassArgs } from './commands/addPointMass'
export type { ElementPatch, UpdateElementArgs } from './commands/updateElement'
export type { MoveElementsArgs } from './commands/moveElements'
export type { RotateElementsArgs } from './commands/rotateElements'
export type { MoveEndpointArgs } from './commands/moveEndpoint'
export type { DeleteElementsArgs } from './commands/deleteElements'
export { materialUsers } from './commands/deleteElements'
export type { CopyElementsToFloorsArgs } from './commands/copyElementsToFloors'
export type { SetElementFloorRangeArgs } from './commands/setElementFloorRange'
export type { SetAnalysisSettingsArgs } from './commands/setAnalysisSettings'
export type { AddMaterialArgs } from './commands/addMaterial'
export type { UpdateMaterialArgs } from './commands/updateMaterial'
export type { SetGridArgs } from './commands/setGrid'

export type { DocDiff, HistoryEntry, HistoryState, RecordDiff, RecordKind } from './history'
export { RECORD_KINDS, applyDiff, diffDocuments, hasRedo, hasUndo, invertDiff } from './history'

export { numericOffset, parseNumericEntry } from './events'
export type {
  CancelInput,
  EditorEvent,
  KeyInput,
  Modifiers,
  NumericInput,
  NumericParse,
  PointerInput,
} from './events'

export { TOOLS, dispatch, resetTool, setTool } from './tools/runtime'
export type { ToolContext, ToolDefinition, ToolStateNode } from './tools/types'
export { ROTATE_HANDLE_OFFSET } from './tools/PickTool/Idle'

export { DEFAULT_SNAP, constrainAngle, snapCandidates, snapPoint } from './geometry/snap'
export type { SnapKind, SnapOptions, SnapResult } from './geometry/snap'
export {
  boxSelect,
  distanceToPolygonEdge,
  distanceToSegment,
  hitTest,
  hitTestAll,
  normalizeBox,
  pointInPolygon,
  pointInSlab,
} from './geometry/hitTest'
export type { Hit } from './geometry/hitTest'
export { polarPoint, segmentReadout } from './geometry/readout'
export type { Readout } from './geometry/readout'
export { generateGrid, gridLetter } from './geometry/grid'
export type { GridOptions } from './geometry/grid'
export { hitHandle, selectionHandles } from './geometry/handles'
export type { Handle } from './geometry/handles'
export { boundsOfIds, recordPoints } from './geometry/bounds'
export { isOnFloor, visibleRecords } from './geometry/visible'
export type { VisibleRecords } from './geometry/visible'
