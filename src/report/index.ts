/**
 * report: result tables, CSV export and the printable HTML report, as pure text builders shared by
 * the CLI and the UI. Every output carries CAUTION (preliminary results; local codes and a licensed
 * engineer govern).
 * Public API: buildResultTables, toCsv, csvFileName, reportFileName, buildReportHtml, plus small
 * helpers (csvField, escapeHtml, distinctPlans, planSketchSvg) and the table types.
 * May import: @/model, @/engine. Must not import: react, react-dom, three, zustand, @/editor,
 * @/viewer, @/ui, @/cli, or touch window/document.
 */
export { TABLE_IDS, buildResultTables, describeSpectrum, verdictText, worstVerdict } from './tables'
export type { ResultTable, TableCell, TableColumn, TableId } from './tables'
export { csvCell, csvField, csvHeader, csvTextField, toCsv } from './csv'
export { DESIGN_TABLE_IDS, designBaseShearTable, designDetailTables } from './designTables'
export { csvFileName, fileSlug, reportFileName } from './fileNames'
export { buildReportHtml, formatTimestamp } from './reportHtml'
export type { ReportOptions } from './reportHtml'
export { distinctPlans, planSketchSvg } from './planSketch'
export type { PlanGroup } from './planSketch'
export { cssString, escapeHtml } from './escape'
export { stiffnessFactorRows, stiffnessFactorsHtml } from './stiffnessFactors'
export type { StiffnessFactorRow } from './stiffnessFactors'
