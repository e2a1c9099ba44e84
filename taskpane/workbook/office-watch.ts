/**
 * Watching data for new rows inside Excel. A table is watched through table.onChanged (it
 * follows the table as it grows); a plain region through worksheet.onChanged, keeping only
 * changes that touch the region or the row just below it (where pasted rows land), after
 * which the region is found again around its top-left cell. Both events need ExcelApi 1.7.
 * Stopping removes the handler in a batch on the context it was added with, as Office asks.
 */
import { MooringInputError } from '../../addin/errors';
import { overlaps, parseRange, rangeAddress, splitSheet, type CellRange } from './a1-address';
import { supportsExcelApi } from './office-block-write';
import type { RegionChange } from './port';

/** Whether a change at `address` touches the region or the row below it. */
export function touchesRegion(address: string, region: CellRange): boolean {
  const local = splitSheet(address).address;
  let changed: CellRange;
  try {
    changed = parseRange(local);
  } catch {
    return false;
  }
  return overlaps(changed, { ...region, bottom: region.bottom + 1 });
}

/** Starts watching; returns the function that stops. */
export async function watchInExcel(context: Excel.RequestContext, sheetName: string, address: string, onChange: (change: RegionChange) => void): Promise<() => void> {
  if (!supportsExcelApi('1.7')) {
    throw new MooringInputError('This version of Excel cannot report changes to a range (ExcelApi 1.7 is needed): use Refresh in the pane after adding rows.');
  }
  const sheet = context.workbook.worksheets.getItem(sheetName);
  const range = sheet.getRange(address);
  const tables = supportsExcelApi('1.9') ? range.getTables(false) : null;
  tables?.load('items/name');
  await context.sync();
  const table = tables && tables.items.length > 0 ? tables.items[0] : null;
  let region = parseRange(address);

  const report = (found: string) => {
    const r = parseRange(splitSheet(found).address);
    region = r;
    onChange({ sheet: sheetName, address: rangeAddress(r), rowCount: r.bottom - r.top });
  };

  let handler: OfficeExtension.EventHandlerResult<Excel.TableChangedEventArgs | Excel.WorksheetChangedEventArgs>;
  if (table) {
    const tableName = table.name;
    handler = table.onChanged.add(async () => {
      await Excel.run(async (ctx) => {
        const now = ctx.workbook.tables.getItem(tableName).getRange().load('address');
        await ctx.sync();
        report(now.address);
      });
    });
  } else {
    handler = sheet.onChanged.add(async (event: Excel.WorksheetChangedEventArgs) => {
      if (!touchesRegion(event.address, region)) return;
      await Excel.run(async (ctx) => {
        const top = rangeAddress({ top: region.top, left: region.left, bottom: region.top, right: region.left });
        const now = ctx.workbook.worksheets.getItem(sheetName).getRange(top).getSurroundingRegion().load('address');
        await ctx.sync();
        report(now.address);
      });
    });
  }
  await context.sync();
  return () => {
    void Excel.run(handler.context, async (ctx) => {
      handler.remove();
      await ctx.sync();
    }).catch(() => undefined);
  };
}
