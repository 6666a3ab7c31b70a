/** Styles of the 3D view pane (scoped by the gyre-viewer class; our own look). */
export const VIEWER_CSS = `
.gyre-viewer { display: flex; flex-direction: column; gap: 4px; height: 100%; min-height: 0;
  font: 12px/1.3 system-ui, sans-serif; color: #1f2630; background: #f4f2ed; box-sizing: border-box; padding: 4px; overflow: hidden; }
.gyre-viewer * { box-sizing: border-box; }
.gyre-viewer-bar { display: flex; flex-wrap: wrap; gap: 3px 8px; align-items: center; flex: 0 0 auto; }
.gyre-viewer-bar--main { flex: 1 1 100%; min-width: 0; }
.gyre-viewer-bar fieldset { border: 0; padding: 0; margin: 0; display: flex; flex-wrap: wrap; gap: 3px; align-items: center; min-width: 0; }
.gyre-viewer button { font: inherit; padding: 1px 6px; border: 1px solid #9aa0a8; border-radius: 3px;
  background: #fbfaf6; color: #1f2630; cursor: pointer; }
.gyre-viewer button[aria-pressed="true"] { background: #2b3a55; color: #f7f3e8; border-color: #2b3a55; }
.gyre-viewer input[type=range] { width: 64px; vertical-align: middle; }
.gyre-viewer select { font: inherit; max-width: 9em; }
.gyre-viewer-stage { position: relative; flex: 1 1 auto; min-height: 180px; container-type: size; border: 1px solid #c9c3b6;
  background: #ebe8e1; overflow: hidden; }
.gyre-viewer-stage-inner { position: absolute; inset: 0; display: flex; flex-direction: row; }
.gyre-viewer-canvas-box { position: relative; flex: 1 1 auto; min-width: 0; min-height: 0; }
.gyre-viewer-canvas-box > div:first-child { position: absolute !important; inset: 0; }
.gyre-viewer-aside { flex: 0 0 auto; width: clamp(96px, 24cqw, 230px); display: flex; flex-direction: column; gap: 6px;
  padding: 4px; overflow: auto; background: #f4f2ed; border-left: 1px solid #c9c3b6; }
.gyre-viewer-aside:empty { display: none; }
@container (max-height: 260px) { .gyre-viewer-aside { flex-direction: row; } }
.gyre-viewer-banner { position: absolute; top: 6px; left: 6px; right: 6px; padding: 3px 8px;
  background: rgba(224, 138, 60, 0.92); color: #1f2630; border-radius: 3px; z-index: 2; }
.gyre-legend, .gyre-trace, .gyre-viewer select, .gyre-viewer input { color: #1f2630; }
.gyre-legend { background: #fbfaf6; padding: 3px 6px; border-radius: 3px; font-size: 11px; }
.gyre-legend-bar { height: 9px; width: 100%; border-radius: 2px; }
.gyre-legend-ticks { display: flex; justify-content: space-between; gap: 4px; font-size: 10px; }
.gyre-legend-keys { font-size: 11px; margin-top: 2px; }
.gyre-legend-keys i { display: inline-block; width: 9px; height: 9px; margin: 0 3px 0 6px; vertical-align: -1px; }
.gyre-trace { margin: 0; background: #fbfaf6; border-radius: 3px; padding: 4px; font-size: 11px; }
.gyre-trace svg { display: block; width: 100%; max-height: 60cqh; height: auto; }
.gyre-trace figcaption { font-size: 10px; }
@container (max-width: 420px) { .gyre-legend-keys, .gyre-trace figcaption { display: none; } }
.gyre-trace-rest { fill: #ddd8cc; stroke: #6b6558; stroke-width: 1; stroke-dasharray: 3 2; }
.gyre-trace-hole { fill: #fbfaf6; stroke: #6b6558; stroke-width: 0.8; }
.gyre-trace-extreme { fill: none; stroke: #a8322a; stroke-width: 1; stroke-dasharray: 5 3; }
.gyre-trace-path { fill: none; stroke: #2b3a55; stroke-width: 1.6; }
.gyre-trace-live { fill: rgba(62, 142, 126, 0.25); stroke: #3e8e7e; stroke-width: 1.4; }
.gyre-trace-cm { fill: #6b3fa0; }
.gyre-trace-cr { fill: #14806b; }
.gyre-trace-centre line { stroke: #a8322a; stroke-width: 2; }
.gyre-modes { flex: 0 0 auto; max-height: min(30%, 10em); min-height: 64px; overflow: auto; border: 1px solid #c9c3b6; background: #fbfaf6; }
.gyre-modes table { border-collapse: collapse; width: 100%; font-variant-numeric: tabular-nums; }
.gyre-modes th, .gyre-modes td { padding: 1px 5px; text-align: right; white-space: nowrap; }
.gyre-modes th { position: sticky; top: 0; background: #e4e0d6; font-weight: 600; }
.gyre-modes td:last-child, .gyre-modes th:last-child { text-align: left; }
.gyre-modes tbody tr { cursor: pointer; }
.gyre-modes tbody tr:hover { background: #efe9da; }
.gyre-modes tbody tr[aria-selected="true"] { background: #2b3a55; color: #f7f3e8; }
.gyre-viewer-caution { font-size: 11px; color: #5b4a1e; margin: 0; }
.gyre-viewer-status { font-size: 11px; color: #3d4450; margin: 0; min-height: 1.3em; white-space: nowrap; overflow: hidden; text-overflow: ellipsis; }
.gyre-viewer-unavailable { position: absolute; inset: 0; display: flex; align-items: center; padding: 24px;
  background: #f4f2ed; color: #1f2630; }
.gyre-caption { display: none; }
.gyre-viewer--presenting { position: fixed; inset: 0; z-index: 1000; min-height: 0; padding: 10px 14px;
  font-size: 18px; background: #181e29; color: #f7f3e8; }
.gyre-viewer--presenting .gyre-modes, .gyre-viewer--presenting .gyre-viewer-bar--main { display: none; }
.gyre-viewer--presenting .gyre-caption { display: block; }
.gyre-caption h2 { font-size: 34px; margin: 0 0 2px; font-weight: 650; text-transform: none;
  letter-spacing: normal; color: #f7f3e8; }
.gyre-caption p { font-size: 22px; margin: 0; color: #e9dfc4; }
.gyre-caption p + p { font-size: 16px; color: #b9c3cf; }
.gyre-viewer--presenting .gyre-viewer-stage { border-color: #2b3a55; }
.gyre-viewer--presenting button { font-size: 16px; padding: 4px 12px; }
.gyre-viewer--presenting .gyre-viewer-caution { font-size: 15px; color: #f2d58c; }
.gyre-viewer--presenting .gyre-viewer-aside { width: clamp(160px, 22cqw, 340px); background: #181e29; border-color: #2b3a55; }
.gyre-viewer--presenting .gyre-legend { font-size: 14px; }
.gyre-viewer--presenting .gyre-viewer-stage { min-height: 0; }
.gyre-viewer--presenting .gyre-viewer-status { color: #b9c3cf; }
`
