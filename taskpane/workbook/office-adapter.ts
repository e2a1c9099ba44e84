/**
 * The WorkbookPort inside Excel, through Office.js. Every call is one Excel.run, its work
 * batched into as few syncs as the data allow (read, then write); nothing here runs where
 * Excel is absent: each call first checks `typeof Excel` and refuses with a plain message.
 *
 * Requirement sets (Office Add-ins documentation, "Excel JavaScript API requirement sets"):
 * getSurroundingRegion, table.onChanged, worksheet.onChanged and chart series editing need
 * ExcelApi 1.7; range.getTables and get/setCellProperties need ExcelApi 1.9. Where 1.9 is
 * missing the table around a selection cannot be found and the surrounding region is used;
 * where 1.7 is missing the selection itself is the region.
 */
import { MooringInputError } from '../../addin/errors';
import { parseRange, splitSheet, type CellRange } from './a1-address';
import { blockRange, uniqueName } from './block-geometry';
import { occupiedInExcel, supportsExcelApi, writeBlockInExcel } from './office-block-write';
import { cellsFromRead } from './office-cells';
import { watchInExcel } from './office-watch';
import type { BlockToWrite, ChartToAdd, DataRegion, FoundBlock, OccupiedCell, RegionChange, WorkbookPort, WriteOutcome } from './port';
import { regionOfGrid } from './region-of-grid';

/** Runs a batch in Excel; refuses plainly when the page is not running inside Excel. */
export function runInExcel<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T> {
  if (typeof Excel === 'undefined') {
    return Promise.reject(new MooringInputError('Excel is not available here: open Mooring from the Home tab inside Excel to work on a workbook.'));
  }
  return Excel.run(batch);
}

/** The address part of "Sheet!B2:H781". */
function localAddress(address: string): string {
  return splitSheet(address).address;
}

/** Loads a range's cells and reads them as a region. */
async function readAsRegion(context: Excel.RequestContext, range: Excel.Range, tableName: string | null): Promise<DataRegion | null> {
  range.load(['address', 'values', 'numberFormat']);
  range.worksheet.load('name');
  await context.sync();
  const grid = cellsFromRead(range.values, range.numberFormat);
  if (grid.every((row) => row.every((v) => v === null))) return null;
  const r: CellRange = parseRange(localAddress(range.address));
  return regionOfGrid(range.worksheet.name, r, grid, tableName);
}

/** The Office.js WorkbookPort. */
export class OfficeWorkbook implements WorkbookPort {
  regionAroundSelection(): Promise<DataRegion | null> {
    return runInExcel(async (context) => {
      const selection = context.workbook.getSelectedRange();
      const tables = supportsExcelApi('1.9') ? selection.getTables(false) : null;
      tables?.load('items/name');
      await context.sync();
      const table = tables && tables.items.length > 0 ? tables.items[0] : null;
      if (table) return readAsRegion(context, table.getRange(), table.name);
      return readAsRegion(context, supportsExcelApi('1.7') ? selection.getSurroundingRegion() : selection, null);
    });
  }

  readRegion(sheet: string, address: string): Promise<DataRegion> {
    return runInExcel(async (context) => {
      const range = context.workbook.worksheets.getItem(sheet).getRange(address);
      const tables = supportsExcelApi('1.9') ? range.getTables(false) : null;
      tables?.load('items/name');
      await context.sync();
      const region = await readAsRegion(context, range, tables && tables.items.length > 0 ? tables.items[0].name : null);
      if (!region) throw new MooringInputError(`${sheet}!${address} is empty: select the header row and the prices below it.`, `${sheet}!${address}`);
      return region;
    });
  }

  readTable(name: string): Promise<DataRegion> {
    return runInExcel(async (context) => {
      const table = context.workbook.tables.getItemOrNullObject(name);
      table.load('name');
      await context.sync();
      if (table.isNullObject) throw new MooringInputError(`There is no table named ${name}: it may have been renamed or deleted.`, name);
      const region = await readAsRegion(context, table.getRange(), table.name);
      if (!region) throw new MooringInputError(`Table ${name} is empty.`, name);
      return region;
    });
  }

  makeTable(sheet: string, address: string, suggestedName: string): Promise<string> {
    return runInExcel(async (context) => {
      const tables = context.workbook.tables.load('items/name');
      const names = context.workbook.names.load('items/name');
      await context.sync();
      const taken = new Set([...tables.items, ...names.items].map((t) => t.name.toLowerCase()));
      const name = uniqueName(suggestedName, 'Prices', (n) => taken.has(n.toLowerCase()));
      const table = context.workbook.worksheets.getItem(sheet).tables.add(address, true);
      table.name = name;
      await context.sync();
      return name;
    });
  }

  occupiedCells(block: BlockToWrite): Promise<OccupiedCell[]> {
    return runInExcel((context) => occupiedInExcel(context, block));
  }

  writeBlock(block: BlockToWrite): Promise<WriteOutcome> {
    blockRange(block);
    return runInExcel((context) => writeBlockInExcel(context, block));
  }

  addChart(chart: ChartToAdd): Promise<void> {
    return runInExcel(async (context) => {
      if (!supportsExcelApi('1.7')) throw new MooringInputError('This version of Excel cannot set a chart\'s series (ExcelApi 1.7 is needed); the block is written without its chart.');
      const sheet = context.workbook.worksheets.getItem(chart.sheet);
      const earlier = sheet.charts.getItemOrNullObject(chart.name);
      earlier.load('name');
      await context.sync();
      if (!earlier.isNullObject) earlier.delete();
      const [first, ...rest] = chart.series;
      const added = sheet.charts.add(Excel.ChartType.line, sheet.getRange(first.values), Excel.ChartSeriesBy.columns);
      added.name = chart.name;
      added.title.text = chart.title;
      const categories = sheet.getRange(chart.categories);
      const s0 = added.series.getItemAt(0);
      s0.name = first.name;
      s0.setXAxisValues(categories);
      for (const s of rest) {
        const line = added.series.add(s.name);
        line.setValues(sheet.getRange(s.values));
        line.setXAxisValues(categories);
      }
      added.setPosition(chart.anchor);
      await context.sync();
    });
  }

  findBlock(name: string): Promise<FoundBlock | null> {
    return runInExcel(async (context) => {
      const item = context.workbook.names.getItemOrNullObject(name);
      item.load(['name', 'comment']);
      const range = item.getRangeOrNullObject();
      range.load('address');
      await context.sync();
      if (item.isNullObject || range.isNullObject) return null;
      const { sheet, address } = splitSheet(range.address);
      return { sheet: sheet ?? '', address, note: item.comment || null };
    });
  }

  removeBlock(name: string): Promise<void> {
    return runInExcel(async (context) => {
      const item = context.workbook.names.getItemOrNullObject(name);
      item.load('name');
      const range = item.getRangeOrNullObject();
      range.load('address');
      await context.sync();
      if (item.isNullObject) return;
      if (!range.isNullObject) {
        const { sheet } = splitSheet(range.address);
        const chart = context.workbook.worksheets.getItem(sheet ?? '').charts.getItemOrNullObject(name);
        chart.load('name');
        await context.sync();
        if (!chart.isNullObject) chart.delete();
        range.conditionalFormats.clearAll();
        range.clear(Excel.ClearApplyTo.all);
      }
      item.delete();
      await context.sync();
    });
  }

  addSheet(suggestedName: string): Promise<string> {
    return runInExcel(async (context) => {
      const sheets = context.workbook.worksheets.load('items/name');
      await context.sync();
      const taken = new Set(sheets.items.map((s) => s.name.toLowerCase()));
      const name = uniqueName(suggestedName, 'Mooring', (n) => taken.has(n.toLowerCase()), 31);
      context.workbook.worksheets.add(name);
      await context.sync();
      return name;
    });
  }

  watch(sheet: string, address: string, onChange: (change: RegionChange) => void): Promise<() => void> {
    return runInExcel((context) => watchInExcel(context, sheet, address, onChange));
  }
}
