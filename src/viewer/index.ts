/**
 * viewer: three.js / @react-three/fiber view of the building and its modes and responses.
 * Public API: ViewerPane. Must not import: ui.
 */
export { ViewerPane } from './ViewerPane'
export { characterWords } from './modeMeaning'
export { downloadBlob } from './exportMedia'
export type { ViewerPaneProps } from './ViewerPane'
