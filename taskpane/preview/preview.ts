// Preview entry: the same pane as inside Excel, over the in-memory workbook holding the demo
// data (the Quennel Delta table on the sheet Prices, with a cell inside it selected), so
// anyone can try the pane in a browser without Excel. The workbook and the pane are exposed
// as window.__mooringWorkbook and window.__mooringPane for the end-to-end tests.

import demoCsv from '../../addin/demo/data/quennel-delta.csv';
import { bootPane } from '../ui/boot';
import type { PaneHandle } from '../ui/pane';
import { DEMO_SHEET, loadCsvTable } from '../workbook/demo-workbook';
import type { MemoryWorkbook } from '../workbook/memory-workbook';

declare global {
  interface Window {
    __mooringWorkbook?: MemoryWorkbook;
    __mooringPane?: PaneHandle;
  }
}

function start(): void {
  const workbook = loadCsvTable(demoCsv);
  workbook.select(DEMO_SHEET, 'B2');
  window.__mooringWorkbook = workbook;
  window.__mooringPane = bootPane(workbook);
}

if (document.readyState === 'loading') document.addEventListener('DOMContentLoaded', start);
else start();
