/**
 * The work behind "Put it in the sheet", through the port and the block builder only:
 * turning the data into a table when asked, placing the block (beside the data, at a cell
 * the user typed, or on a new sheet), planning the write (what it would replace), writing
 * with the user's yes, and writing the block again after the data grew.
 */
import { MooringInputError } from '../../addin/errors';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { besideRegion, blockNameFor, buildPairBlock, type BlockPlacement } from '../block/pair-block';
import { parseCell, parseRange } from '../workbook/a1-address';
import { planBlockWrite, writePlannedBlock, type BlockPlan, type PlannedWriteOutcome } from '../block/plan-block-write';
import type { DataRegion, WorkbookPort } from '../workbook/port';
import type { PlaceKind } from './views/write-view';

/** Reads "A1" or "Sheet!A1" (quotes allowed around the sheet) against the data's sheet. */
export function parsePlace(text: string, dataSheet: string): BlockPlacement {
  const t = text.trim();
  const m = /^(?:(?:'((?:[^']|'')+)'|([^!'\s][^!]*))!)?\$?([A-Za-z]{1,3})\$?([1-9]\d{0,6})$/.exec(t);
  if (!m) throw new MooringInputError(`'${t}' is not a cell: type a cell such as J2, or a sheet and cell such as Results!B3.`);
  const sheet = m[1]?.replace(/''/g, "'") ?? m[2]?.trim() ?? dataSheet;
  return { sheet, anchor: `${m[3].toUpperCase()}${m[4]}` };
}

/** Turns the region into a table and reads it again, so the block's formulas follow pasted rows. */
export async function tableOfRegion(port: WorkbookPort, region: DataRegion): Promise<{ region: DataRegion; note: string }> {
  const name = await port.makeTable(region.sheet, region.address, 'Prices');
  const again = await port.readRegion(region.sheet, region.address);
  return { region: again.tableName ? again : { ...again, tableName: name }, note: `Made ${region.sheet}!${region.address} the table '${name}': rows pasted below it now belong to it.` };
}

/** Where the block goes for the user's choice; a new sheet is added only for 'new-sheet'. */
export async function placementFor(port: WorkbookPort, region: DataRegion, place: PlaceKind, cell: string): Promise<BlockPlacement> {
  if (place === 'beside') return besideRegion(region);
  if (place === 'cell') return parsePlace(cell, region.sheet);
  const sheet = await port.addSheet('Mooring results');
  return { sheet, anchor: 'A1' };
}

/** Most blocks of one pair the pane names apart. */
const MOST_COPIES = 99;

/**
 * The name of a pair's block at a placement: the name of the pair's block already there (to
 * write it again in place), else the first of the pair's names no block holds yet. A block of
 * the same pair elsewhere keeps its name and its chart.
 */
export async function blockNameAt(port: WorkbookPort, pair: { a: string; b: string }, placement: BlockPlacement): Promise<string> {
  const at = parseCell(placement.anchor);
  let free: string | null = null;
  for (let copy = 1; copy <= MOST_COPIES; copy++) {
    const name = blockNameFor(pair.a, pair.b, copy);
    const found = await port.findBlock(name);
    if (!found) {
      free ??= name;
      // Names are handed out in order, so past two free ones no later block is likely; stop looking.
      if (copy > 1) break;
      continue;
    }
    const r = parseRange(found.address);
    if (found.sheet.toLowerCase() === placement.sheet.toLowerCase() && r.top === at.row && r.left === at.col) return name;
  }
  if (free) return free;
  throw new MooringInputError(`${MOST_COPIES} blocks of ${pair.a} and ${pair.b} are already in this workbook: remove some, or write this one over one of them.`);
}

/** Plans the block of a pair at a placement (writes nothing), under `name` (default: found by blockNameAt). */
export async function planPairWrite(port: WorkbookPort, report: DiagnosticReport, pair: { a: string; b: string }, region: DataRegion, placement: BlockPlacement, name?: string): Promise<BlockPlan> {
  const blockName = name ?? (await blockNameAt(port, pair, placement));
  const { block, chart } = buildPairBlock(report, pair, region, placement, blockName);
  return planBlockWrite(port, block, chart);
}

/** Writes a plan; `confirmed` is the user's yes to the cells it listed. */
export function writePlan(port: WorkbookPort, plan: BlockPlan, confirmed: boolean): Promise<PlannedWriteOutcome> {
  return writePlannedBlock(port, plan, confirmed);
}

/**
 * Writes the block again from a new report at the same place. Only the block's own cells
 * are replaced without asking; when anything else is now in the way nothing is written.
 */
export async function rewriteBlock(port: WorkbookPort, report: DiagnosticReport, pair: { a: string; b: string }, region: DataRegion, placement: BlockPlacement, name: string): Promise<boolean> {
  const plan = await planPairWrite(port, report, pair, region, placement, name);
  if (!plan.safe) return false;
  return (await writePlan(port, plan, false)).ok;
}
