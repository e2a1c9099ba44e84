/**
 * The preview page's own styles: the pane at the width Excel gives it, the in-memory workbook
 * beside it (the sheet's tools, tabs, formula bar, grid and charts). Adopted as a constructed
 * style sheet by preview.ts, so the preview needs no build step beyond its script and keeps
 * the page's content security policy (no inline styles).
 */
export const PREVIEW_CSS = String.raw`
/* The preview page: the pane at the width Excel gives it, the in-memory workbook beside it. */

.preview-layout {
  display: flex;
  align-items: flex-start;
}

.preview-layout > .pane-frame {
  flex: none;
}

.sheet {
  flex: 1 1 auto;
  min-width: 0;
  height: 100vh;
  position: sticky;
  top: 0;
  display: flex;
  flex-direction: column;
  background: #f3f1ea;
  font-size: 12px;
  color: var(--mooring-ink);
}

/* Narrower than pane plus a useful sheet: the sheet goes below the pane. */
@media (max-width: 699px) {
  .preview-layout { flex-direction: column; }
  .sheet { width: 100%; height: 70vh; position: static; border-top: 3px solid var(--mooring-rope); }
}

.sheet-tools {
  display: flex;
  flex-wrap: wrap;
  align-items: center;
  gap: 6px 10px;
  padding: 8px 10px 4px;
}

.append-count {
  width: 4.5em;
  font: inherit;
  padding: 2px 4px;
  border: 1px solid var(--mooring-line);
  border-radius: 3px;
}

.append-button {
  font: inherit;
  font-weight: 600;
  color: #fff;
  background: var(--mooring-water);
  border: 0;
  border-radius: 3px;
  padding: 4px 12px;
  cursor: pointer;
}

.append-button:focus-visible,
.sheet-tab:focus-visible,
.sheet-scroll:focus-visible {
  outline: 2px solid var(--mooring-rope);
  outline-offset: 1px;
}

.append-button[disabled] { opacity: 0.5; cursor: default; }

.sheet-hint { color: var(--mooring-muted); }

.append-status {
  margin: 0;
  padding: 0 10px;
  min-height: 1.3em;
  color: var(--mooring-yes);
}

.sheet-tabs {
  display: flex;
  flex-wrap: wrap;
  gap: 4px;
  padding: 4px 10px 0;
  margin-bottom: -1px;
}

.sheet-tab {
  font: inherit;
  padding: 3px 12px;
  border: 1px solid var(--mooring-line);
  border-bottom: 0;
  border-radius: 6px 6px 0 0;
  background: #e6e2d6;
  color: var(--mooring-muted);
  cursor: pointer;
}

.sheet-tab[aria-selected="true"] {
  background: #fff;
  color: var(--mooring-water);
  font-weight: 600;
  box-shadow: inset 0 3px 0 var(--mooring-rope);
}

.sheet-bar {
  display: flex;
  align-items: center;
  gap: 6px;
  margin: 0 10px;
  padding: 4px 6px;
  background: #fff;
  border: 1px solid var(--mooring-line);
}

.cell-name {
  flex: none;
  min-width: 4.5em;
  font-weight: 600;
  color: var(--mooring-water);
}

.fx { color: var(--mooring-muted); font-style: italic; }

.formula-bar {
  flex: 1 1 auto;
  min-width: 0;
  font-family: ui-monospace, "DejaVu Sans Mono", monospace;
  white-space: nowrap;
  overflow: hidden;
  text-overflow: ellipsis;
}

.formula-bar.spilled { color: var(--mooring-muted); }

.sheet-scroll {
  flex: 1 1 auto;
  min-height: 0;
  overflow: auto;
  margin: 0 10px 10px;
  background: #fff;
  border: 1px solid var(--mooring-line);
}

.grid-holder { position: relative; width: max-content; }

.grid {
  table-layout: fixed;
  border-collapse: collapse;
  font-variant-numeric: tabular-nums;
}

.grid th,
.grid td {
  height: 22px;
  box-sizing: border-box;
  padding: 0 5px;
  border: 1px solid #e7e4db;
  white-space: nowrap;
  overflow: hidden;
  text-overflow: ellipsis;
}

.grid thead th {
  position: sticky;
  top: 0;
  z-index: 2;
  background: #ebe7da;
  color: var(--mooring-muted);
  font-weight: 500;
}

.grid tbody th {
  position: sticky;
  left: 0;
  z-index: 1;
  background: #f3f0e6;
  color: var(--mooring-muted);
  font-weight: 500;
  text-align: right;
}

.grid td.num { text-align: right; }
.grid td.bold { font-weight: 700; }
.grid td.italic { font-style: italic; }
.grid td.heading { font-size: 13px; }
.grid td.error { color: var(--mooring-no); }
.grid td.formula { border-bottom-color: #c9d6e2; }
.grid td.selected { outline: 2px solid var(--mooring-rope); outline-offset: -2px; }
.grid tr.fresh th { background: var(--mooring-yes-bg); color: var(--mooring-yes); box-shadow: inset 3px 0 0 var(--mooring-yes); }
.grid tr.fresh td { background-color: #f3faf5; }

.sheet-chart {
  position: absolute;
  margin: 0;
  z-index: 1;
  border: 1px solid var(--mooring-line);
  box-shadow: 0 2px 6px rgba(18, 63, 90, 0.18);
  background: #fff;
}

.sheet-chart svg { display: block; }
.sheet-chart .chart-paper { fill: #fff; }
.sheet-chart .chart-plot { fill: #fbfaf6; stroke: #dcd9d0; }
.sheet-chart .chart-grid { stroke: #ebe7da; }
.sheet-chart .chart-title { font-size: 12px; font-weight: 600; fill: var(--mooring-water); }
.sheet-chart .chart-axis,
.sheet-chart .chart-legend,
.sheet-chart .chart-note { font-size: 10px; fill: var(--mooring-muted); }
`;
