/**
 * model: what a Gyre project is (plain data, SI units) and pure helpers about it.
 * Public API: types, ids, floor helpers, units, schema/parse, migrations, the caution text, the demo.
 * Must not import: engine, editor, viewer, ui, react, three, ml-matrix.
 */
export type {
  AnalysisSettings,
  BaseRef,
  Column,
  ColumnFixity,
  CriterionSetSpec,
  Floor,
  FrameLine,
  FrameStiffness,
  Grid,
  GroundMotionSpec,
  LineMass,
  Material,
  MomentFrameStoryOverride,
  Point,
  PointMass,
  Project,
  Slab,
  SpectrumModeRule,
  SpectrumSpec,
  Wall,
  WallJoins,
  WallStoryOverride,
} from './types'
export type {
  AnyId,
  ColumnId,
  FloorId,
  FrameLineId,
  LineMassId,
  MaterialId,
  PointMassId,
  SlabId,
  WallId,
} from './ids'
export { createId } from './ids'
export { computeElevations, contentFloorId, elementFloorRange, floorContent, floorIndex } from './floors'
export { CAUTION, CAUTION_SHORT } from './caution'
export { ACI_318_19_FACTORS, STIFFNESS_FACTOR_DEFAULTS } from './stiffnessFactors'
export { MODE_COLUMNS, modeColumn, modeHeaderLabel } from './modeHeaders'
export type { ModeColumn, ModeColumnKey } from './modeHeaders'
export {
  CURRENT_VERSION,
  DEFAULT_SETTINGS,
  LIMITS,
  MAX_MESSAGES,
  PROJECT_FORMAT,
  parseProject,
  parseProjectText,
  serializeProject,
} from './schema'
export type { ParseResult } from './schema'
export { MIGRATIONS, MigrationError, migrateDocument } from './migrations'
export type { Migration, MigrationResult, RawDocument } from './migrations'
export {
  FOOT,
  INCH,
  KIP,
  LENGTH_UNITS,
  POUND_FORCE,
  QUANTITIES,
  STANDARD_GRAVITY,
  UNIT_SYSTEMS,
  formatNumber,
  formatQuantity,
  fromDisplay,
  parseTypedNumber,
  storageUnit,
  toDisplay,
  unitLabel,
} from './units'
export type { Quantity, TypedNumber, UnitSystem } from './units'
export { demoProject } from './demo'
export {
  ASCE7_SYSTEM_PRESETS,
  DEFAULT_TORSIONAL_FLEXIBILITY_LIMIT,
  EN1998_SYSTEM_PRESETS,
  damageLimitationNuOf,
  importanceFactorOf,
  readSeismicDesign,
} from './seismicDesign'
export type {
  Asce7DriftRow,
  Asce7SeismicDesign,
  Asce7System,
  En1998NonStructural,
  En1998SeismicDesign,
  En1998System,
  RiskCategory,
  SeismicDesign,
  SeismicDesignCategory,
  SeismicReadMessages,
  SeismicSystemPreset,
} from './seismicDesign'
export {
  POLYGON_TOLERANCE,
  openingProblems,
  polygonSignedArea,
  simplePolygonProblem,
  slabPolygonProblems,
} from './polygons'
export type { PolygonProblem } from './polygons'
export { appendAll, maxOf, minOf, pointsExtent } from './arrays'
export { INPUT_BUDGET, checkDocumentBudget, checkFileSizeBudget, checkTextBudget } from './budget'
