import type { AnalysisResult } from '@/engine'
import type { Project } from '@/model'

/** Props of the 3D viewer pane mounted by the UI beside the plan editor. */
export interface ViewerPaneProps {
  readonly project: Project
  /** Latest analysis of `project` (or of an older revision while `isStale`). */
  readonly result: AnalysisResult | null
  readonly isStale: boolean
}

/** The 3D view of the building and its modes (placeholder until the viewer lands). */
export function ViewerPane(_props: ViewerPaneProps) {
  return <section aria-label="3D view">3D view is being built.</section>
}
