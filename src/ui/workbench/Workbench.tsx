/**
 * The working screen's resizable panes: floors | (plan | 3D model over problems | results) | side.
 * The active layout (drafting, side by side, 3D stage) sets the pane sizes; sizes the engineer drags
 * are remembered per layout in localStorage. Panels are slots, so new panels mount without changes here.
 */
import { useEffect, useRef } from 'react'
import type { ReactNode } from 'react'
import { Group, Panel, Separator, useGroupRef } from 'react-resizable-panels'
import type { Layout, LayoutChangedMeta } from 'react-resizable-panels'
import { GROUP_PANELS, LAYOUT_STORAGE_KEY, parseStoredLayouts, sizesFor, withPaneSizes } from './layouts'
import type { GroupId, LayoutId, PaneSizes, StoredLayouts } from './layouts'

/** Stored layouts from localStorage (defaults when storage is unavailable or holds nonsense). */
export function readStoredLayouts(): StoredLayouts {
  try {
    return parseStoredLayouts(localStorage.getItem(LAYOUT_STORAGE_KEY))
  } catch (_err) {
    return parseStoredLayouts(null)
  }
}

function writeStoredLayouts(stored: StoredLayouts): void {
  try {
    localStorage.setItem(LAYOUT_STORAGE_KEY, JSON.stringify(stored))
  } catch (_err) {
    // Storage may be unavailable (private mode); the layout then lasts for this session only.
  }
}

const PANE_PREFIX = 'pane-'
const toPanels = (s: PaneSizes): Layout => Object.fromEntries(Object.entries(s).map(([k, v]) => [PANE_PREFIX + k, v]))
const fromPanels = (group: GroupId, l: Layout): PaneSizes =>
  Object.fromEntries(GROUP_PANELS[group].map((k) => [k, l[PANE_PREFIX + k] ?? NaN]))

export interface WorkbenchProps {
  readonly layout: LayoutId
  readonly floors: ReactNode
  readonly plan: ReactNode
  readonly model: ReactNode
  readonly problems: ReactNode
  readonly results: ReactNode
  readonly side: ReactNode
}

/** The four nested resizable groups of the working screen. */
export function Workbench({ layout, floors, plan, model, problems, results, side }: WorkbenchProps) {
  const stored = useRef<StoredLayouts | null>(null)
  if (stored.current === null) stored.current = { ...readStoredLayouts(), active: layout }
  const initial = useRef(sizesFor(stored.current, layout))
  const refs = {
    columns: useGroupRef(),
    rows: useGroupRef(),
    views: useGroupRef(),
    lower: useGroupRef(),
  }
  const active = useRef(layout)
  const mounted = useRef(false)

  useEffect(() => {
    active.current = layout
    const s = stored.current ?? readStoredLayouts()
    stored.current = { ...s, active: layout }
    writeStoredLayouts(stored.current)
    if (!mounted.current) {
      mounted.current = true
      return
    }
    const sizes = sizesFor(stored.current, layout)
    for (const g of Object.keys(GROUP_PANELS) as GroupId[]) refs[g].current?.setLayout(toPanels(sizes[g]))
    // refs are stable objects from useGroupRef
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [layout])

  const saver = (group: GroupId) => (l: Layout, meta: LayoutChangedMeta) => {
    if (!meta.isUserInteraction || !stored.current) return
    stored.current = withPaneSizes(stored.current, active.current, group, fromPanels(group, meta.requestedLayout ?? l))
    writeStoredLayouts(stored.current)
  }
  const groupProps = (group: GroupId) => ({
    id: `group-${group}`,
    groupRef: refs[group],
    defaultLayout: toPanels(initial.current[group]),
    onLayoutChanged: saver(group),
  })

  return (
    <div className="workbench" data-testid="workbench" data-layout={layout}>
      <Group {...groupProps('columns')} orientation="horizontal" className="wb-group">
        <Panel id="pane-floors" minSize={96} className="wb-pane side">
          {floors}
        </Panel>
        <Separator className="wb-sep wb-sep-v" />
        <Panel id="pane-centre" minSize={240} className="wb-pane wb-centre">
          <Group {...groupProps('rows')} orientation="vertical" className="wb-group">
            <Panel id="pane-views" minSize={160} className="wb-pane">
              <Group {...groupProps('views')} orientation="horizontal" className="wb-group">
                <Panel id="pane-plan" minSize={140} className="wb-pane wb-plan">
                  {plan}
                </Panel>
                <Separator className="wb-sep wb-sep-v" />
                <Panel id="pane-model" minSize={180} className="wb-pane viewer-slot">
                  {model}
                </Panel>
              </Group>
            </Panel>
            <Separator className="wb-sep wb-sep-h" />
            <Panel id="pane-lower" minSize={60} className="wb-pane">
              <Group {...groupProps('lower')} orientation="horizontal" className="wb-group">
                <Panel id="pane-problems" minSize={120} className="wb-pane wb-scroll">
                  {problems}
                </Panel>
                <Separator className="wb-sep wb-sep-v" />
                <Panel id="pane-results" minSize={160} className="wb-pane wb-scroll">
                  {results}
                </Panel>
              </Group>
            </Panel>
          </Group>
        </Panel>
        <Separator className="wb-sep wb-sep-v" />
        <Panel id="pane-side" minSize={180} className="wb-pane side right">
          {side}
        </Panel>
      </Group>
    </div>
  )
}
