// Preview entry: the same pane as inside Excel, over the in-memory workbook holding the demo
// data (the Quennel Delta table on the sheet Prices, with a cell inside it selected), and the
// workbook itself shown beside the pane as a sheet (sheet-view.ts), whose "append rows"
// control adds the demo scenario's next days (addin/demo/continuation.ts), so anyone can try
// the pane and watch the block it writes without Excel. The workbook, the pane and the sheet
// are exposed as window.__mooringWorkbook, window.__mooringPane and window.__mooringSheet for
// the end-to-end tests.

import demoCsv from '../../addin/demo/data/quennel-delta.csv';
import { demoRowsAfterAsGrid } from '../../addin/demo/continuation';
import { bootPane } from '../ui/boot';
import type { PaneHandle } from '../ui/pane';
import { DEMO_SHEET, DEMO_TABLE, loadCsvTable } from '../workbook/demo-workbook';
import type { MemoryWorkbook } from '../workbook/memory-workbook';
import { PREVIEW_CSS } from './preview-styles';
import { mountSheetView, type SheetView } from './sheet-view';

declare global {
  interface Window {
    __mooringWorkbook?: MemoryWorkbook;
    __mooringPane?: PaneHandle;
    __mooringSheet?: SheetView;
  }
}

function start(): void {
  const workbook = loadCsvTable(demoCsv);
  workbook.select(DEMO_SHEET, 'B2');
  window.__mooringWorkbook = workbook;
  window.__mooringPane = bootPane(workbook);
  const styles = new CSSStyleSheet();
  styles.replaceSync(PREVIEW_CSS);
  document.adoptedStyleSheets = [...document.adoptedStyleSheets, styles];
  const sheetRoot = document.getElementById('sheet');
  if (sheetRoot) {
    let appended = 0;
    window.__mooringSheet = mountSheetView(sheetRoot, workbook, {
      table: DEMO_TABLE,
      next(count) {
        const rows = demoRowsAfterAsGrid(appended, count);
        appended += count;
        return rows;
      },
    });
  }
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
