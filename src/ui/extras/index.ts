/**
 * ui/extras: panels the app mounts beside its own: the balance assistant (BalancePanel, with its
 * worker) and the report and CSV buttons (ReportActions). They receive everything by props and
 * touch no global store. Import the stylesheet once: `import './extras/extras.css'`.
 */
export { BalancePanel, BalancePanelView } from './BalancePanel'
export type { BalancePanelProps, BalancePanelViewProps, BalancePhase } from './BalancePanel'
export { ReportActions } from './ReportActions'
export type { ReportActionsProps } from './ReportActions'
export { BalanceCancelled, createBalanceRunner, createBalanceWorker } from './balanceRunner'
export type { BalanceRunner, BalanceRunnerConfig, BalanceWorkerLike } from './balanceRunner'
export { csvFiles, csvZipFile, csvZipFileName, reportFile, zipReadme } from './reportFiles'
export type { BinaryDownloadFile, DownloadFile, SavedFile } from './reportFiles'
export { downloadFile, openAndPrint } from './download'
