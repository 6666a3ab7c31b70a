export { ProjectSettingsPanel } from './ProjectSettingsPanel'
export type { ProjectSettingsPanelProps } from './ProjectSettingsPanel'
