/**
 * Writing a block inside Excel in one Excel.run: one sync to read what is there (values,
 * formulas, number formats and, where ExcelApi 1.9 allows, cell formats: the copy a failed
 * write is undone from), then one sync for everything written (number formats, formulas,
 * fonts and fills, conditional fills, column widths, the workbook-level name). Office does
 * not undo a failed batch, so on failure the range is read again, every cell that differs
 * from the copy is put back, and the outcome lists exactly those cells and whether putting
 * them back worked.
 */
import { cellAddress, qualified, rangeAddress, type CellRange } from './a1-address';
import { blockRange, reservedRanges } from './block-geometry';
import { blockGrids, isFilledRead } from './office-cells';
import type { BlockCell, BlockToWrite, OccupiedCell, WriteOutcome } from './port';

/** Whether the host supports an ExcelApi requirement set (false outside Office). */
export function supportsExcelApi(version: string): boolean {
  return typeof Office !== 'undefined' && Boolean(Office.context?.requirements?.isSetSupported('ExcelApi', version));
}

const CELL_PROPERTIES: Excel.CellPropertiesLoadOptions = {
  format: { fill: { color: true }, font: { bold: true, italic: true, color: true, size: true }, wrapText: true },
};

/** The filled cells of the block's range and reserved ranges, read in one sync. */
export async function occupiedInExcel(context: Excel.RequestContext, block: BlockToWrite): Promise<OccupiedCell[]> {
  const sheet = context.workbook.worksheets.getItem(block.sheet);
  const areas = [blockRange(block), ...reservedRanges(block)];
  const ranges = areas.map((r) => sheet.getRange(rangeAddress(r)).load(['values', 'formulas']));
  await context.sync();
  const out: OccupiedCell[] = [];
  areas.forEach((area, k) => {
    const { values, formulas } = ranges[k];
    values.forEach((row, i) =>
      row.forEach((v, j) => {
        const f = formulas[i][j];
        if (!isFilledRead(v, f)) return;
        const formula = typeof f === 'string' && f.startsWith('=') ? f : undefined;
        out.push({ address: cellAddress({ row: area.top + i, col: area.left + j }), value: v === '' ? null : (v as OccupiedCell['value']), ...(formula ? { formula } : {}) });
      }),
    );
  });
  return out;
}

/** Queues the fonts, fills and conditional fills of one cell. */
function queueCellFormat(range: Excel.Range, cell: BlockCell): void {
  const f = cell.format;
  if (!f) return;
  if (f.bold !== undefined) range.format.font.bold = f.bold;
  if (f.italic !== undefined) range.format.font.italic = f.italic;
  if (f.fontColor) range.format.font.color = f.fontColor;
  if (f.heading) range.format.font.size = f.heading === 1 ? 14 : 12;
  if (f.fill) range.format.fill.color = f.fill;
  if (f.wrap !== undefined) range.format.wrapText = f.wrap;
  for (const rule of f.textFills ?? []) {
    const cf = range.conditionalFormats.add(Excel.ConditionalFormatType.containsText);
    cf.textComparison.format.fill.color = rule.fill;
    cf.textComparison.rule = { operator: Excel.ConditionalTextOperator.beginsWith, text: rule.startsWith };
  }
}

/** What was there before: formulas (values included) and number formats of each area, cell formats where readable. */
interface Snapshot {
  areas: CellRange[];
  formulas: unknown[][][];
  numberFormat: unknown[][][];
  cellProperties: Excel.CellProperties[][] | null;
}

/** The cells of the snapshot's areas whose formulas or number formats now differ from it. */
async function changedCells(context: Excel.RequestContext, sheetName: string, before: Snapshot): Promise<{ area: number; i: number; j: number }[]> {
  const sheet = context.workbook.worksheets.getItem(sheetName);
  const now = before.areas.map((a) => sheet.getRange(rangeAddress(a)).load(['formulas', 'numberFormat']));
  await context.sync();
  const out: { area: number; i: number; j: number }[] = [];
  now.forEach((r, k) => r.formulas.forEach((row, i) => row.forEach((f, j) => {
    if (f !== before.formulas[k][i][j] || r.numberFormat[i][j] !== before.numberFormat[k][i][j]) out.push({ area: k, i, j });
  })));
  return out;
}

/** Puts the snapshot back over its areas, in one sync. */
async function restore(context: Excel.RequestContext, sheetName: string, before: Snapshot): Promise<void> {
  const sheet = context.workbook.worksheets.getItem(sheetName);
  before.areas.forEach((a, k) => {
    const r = sheet.getRange(rangeAddress(a));
    if (k === 0) r.conditionalFormats.clearAll();
    r.numberFormat = before.numberFormat[k] as string[][];
    r.formulas = before.formulas[k] as string[][];
    if (k === 0 && before.cellProperties) r.setCellProperties(before.cellProperties);
  });
  await context.sync();
}

/** Writes the block (one read sync, one write sync); on failure undoes what it can and says exactly what was written. */
export async function writeBlockInExcel(context: Excel.RequestContext, block: BlockToWrite): Promise<WriteOutcome> {
  const area = blockRange(block);
  const reserved = reservedRanges(block);
  const sheet = context.workbook.worksheets.getItem(block.sheet);
  const target = sheet.getRange(rangeAddress(area));
  const areaRanges = [area, ...reserved].map((a) => sheet.getRange(rangeAddress(a)).load(['formulas', 'numberFormat']));
  const props = supportsExcelApi('1.9') ? target.getCellProperties(CELL_PROPERTIES) : null;
  const earlierName = context.workbook.names.getItemOrNullObject(block.name);
  earlierName.load('name');
  await context.sync();
  const before: Snapshot = {
    areas: [area, ...reserved],
    formulas: areaRanges.map((r) => r.formulas),
    numberFormat: areaRanges.map((r) => r.numberFormat),
    cellProperties: props ? props.value : null,
  };

  try {
    const grids = blockGrids(block);
    target.conditionalFormats.clearAll();
    target.format.font.bold = false;
    target.format.font.italic = false;
    target.format.fill.clear();
    target.numberFormat = grids.numberFormat;
    target.formulas = grids.formulas as string[][];
    for (const r of reserved) sheet.getRange(rangeAddress(r)).clear(Excel.ClearApplyTo.contents);
    block.cells.forEach((row, i) => row.forEach((cell, j) => {
      if (cell?.format) queueCellFormat(target.getCell(i, j), cell);
    }));
    (block.columnWidths ?? []).forEach((w, j) => {
      target.getColumn(j).format.columnWidth = w;
    });
    if (!earlierName.isNullObject) earlierName.delete();
    context.workbook.names.add(block.name, target, block.note);
    await context.sync();
  } catch (e) {
    const reason = e instanceof Error ? e.message : String(e);
    const where = `${qualified(block.sheet, area, false)}`;
    let written: string[] = [];
    try {
      const changed = await changedCells(context, block.sheet, before);
      written = changed.map((c) => cellAddress({ row: before.areas[c.area].top + c.i, col: before.areas[c.area].left + c.j }));
      await restore(context, block.sheet, before);
      const left = await changedCells(context, block.sheet, before);
      const restored = left.length === 0;
      return {
        ok: false,
        written,
        error: `Writing the block to ${where} failed (${reason}). ${written.length} cell${written.length === 1 ? ' was' : 's were'} changed before the failure; ` +
          (restored ? 'the previous contents were put back.' : `${left.length} could not be put back.`),
        restored,
      };
    } catch (e2) {
      const again = e2 instanceof Error ? e2.message : String(e2);
      return {
        ok: false,
        written,
        error: `Writing the block to ${where} failed (${reason}), and putting the previous contents back failed too (${again}). The cells listed may hold part of the block.`,
        restored: false,
      };
    }
  }
  const written: string[] = [];
  for (let r = area.top; r <= area.bottom; r++) for (let c = area.left; c <= area.right; c++) written.push(cellAddress({ row: r, col: c }));
  return { ok: true, written };
}
