/**
 * engine: pure numerics, model in, results out. Runs in node (CLI, tests) and in a Web Worker.
 * Public API: analyzeProject, suggestBalance (the balance assistant), the wall groups of a project
 * (findWallGroups, describeWallGroups) and the result types.
 * Must not import: react, three, zustand, editor, viewer, ui, window/document.
 */
export { analyzeProject } from './analyze'
export {
  BALANCE_DEFAULTS,
  balanceMetrics,
  balanceScore,
  elementOnSlabs,
  objectiveValue,
  suggestBalance,
  suggestionApplies,
  worsenedMeasures,
} from './balance'
export { BUILT_IN_CRITERION_SETS, scopeLine } from './criteria'
export { centreDefinitionIssues } from './centreDefinition'
export type { BuiltInCriterionSet } from './criteria'
export { GRAVITY, spectralAcceleration } from './spectra'
export type {
  AmplifiedCase,
  DesignDriftRow,
  DesignFactors,
  DesignResult,
  ElfDirection,
  IrregularityConsequence,
  SpectrumDesignDriftRow,
  SpectrumScaling,
  SpectrumScalingDirection,
  StabilityRow,
  StoryStiffnessRow,
  TorsionalFlexibility,
} from './design/types'
export { describeWallGroups, findWallGroups } from './elements/wallGroup'
export type { WallGroup, WallGroupSummary } from './elements/wallGroup'
export type { CompositeSection } from './elements/wallSection'
export type {
  BalanceAction,
  BalanceEdit,
  BalanceMetrics,
  BalanceObjective,
  BalanceOptions,
  BalanceProgress,
  BalanceResult,
  BalanceStep,
  BalanceSuggestion,
} from './balance'
export type {
  AnalysisOptions,
  AnalysisResult,
  AnalysisStatus,
  AssembledElement,
  CheckRow,
  CriterionEvaluation,
  CriterionScope,
  ElementForceCase,
  ElementForceRow,
  ElementForcesResult,
  FloorCentres,
  FloorProps,
  Issue,
  IssueCode,
  ModalResult,
  ModeCharacter,
  Severity,
  SpectrumAccidentalTorsion,
  SpectrumFloorResponse,
  SpectrumResult,
  SpectrumTorsionStory,
  StaticCaseId,
  StaticLoadCase,
  StaticTorsionResult,
  StoryTorsionRow,
  Structure,
  TimeHistoryResult,
  Verdict,
} from './results'
