/**
 * Writing a block only with the user's yes. planBlockWrite asks the workbook which cells the
 * block would replace; cells of an earlier block of the same name are its own and are
 * replaced without asking, any other filled cell is listed for the pane to show. writePlannedBlock
 * writes only when nothing else is in the way or the user said yes, and checks again just
 * before writing, so a cell typed meanwhile is never overwritten unseen.
 */
import { overlaps, parseCell, parseRange, rangeSize, type CellRange } from '../workbook/a1-address';
import type { BlockCell, BlockToWrite, ChartToAdd, FoundBlock, OccupiedCell, WorkbookPort, WriteOutcome } from '../workbook/port';
import { decodeBlockNote } from './block-note';

/** What a write would do, for the pane to show before asking. */
export interface BlockPlan {
  block: BlockToWrite;
  chart: ChartToAdd | null;
  /** Filled cells that are not part of an earlier block of the same name: these need a yes. */
  occupied: OccupiedCell[];
  /** Whether an earlier block of the same name is being replaced. */
  replacesEarlierBlock: boolean;
  /** True when nothing of anyone else's would be replaced. */
  safe: boolean;
}

/** What writing a plan did. */
export interface PlannedWriteOutcome extends WriteOutcome {
  /** Cells that stopped the write because they were not confirmed (empty when none). */
  unconfirmed: OccupiedCell[];
  /** Whether the chart was added; the reason when it was not. */
  chart: { added: boolean; error?: string };
}

/**
 * The ranges of the earlier block of this name, on its sheet: its cells, and its spill
 * columns from their top down to where the new block's spill ends. The spill of the earlier
 * block has grown with its table, and Excel reports spilled cells with their values, so
 * without this the block's own spill would be listed as someone else's data.
 */
async function earlierBlock(port: WorkbookPort, block: BlockToWrite): Promise<CellRange[] | null> {
  const found = await port.findBlock(block.name);
  if (!found || found.sheet !== block.sheet) return null;
  return ownRanges(found, block);
}

function ownRanges(found: FoundBlock, block: BlockToWrite): CellRange[] {
  const note = decodeBlockNote(found.note ?? null);
  const newBottom = Math.max(-1, ...(block.reserved ?? []).map((a) => parseRange(a).bottom));
  const spills = (note?.reserved ?? []).map((a) => {
    const r = parseRange(a);
    return { ...r, bottom: Math.max(r.bottom, newBottom) };
  });
  return [parseRange(found.address), ...spills];
}

function outside(cells: OccupiedCell[], own: CellRange[] | null): OccupiedCell[] {
  if (!own) return cells;
  return cells.filter((c) => {
    const p = parseCell(c.address);
    const here = { top: p.row, bottom: p.row, left: p.col, right: p.col };
    return !own.some((r) => overlaps(r, here));
  });
}

/**
 * The block padded with empty cells to the size of the earlier block it replaces in the same
 * place, so one write also clears the earlier block's rows and columns that the new one lacks.
 */
function padToEarlier(block: BlockToWrite, found: FoundBlock | null): BlockToWrite {
  if (!found || found.sheet !== block.sheet) return block;
  const old = parseRange(found.address);
  const at = parseCell(block.anchor);
  if (old.top !== at.row || old.left !== at.col) return block;
  const { rows, cols } = rangeSize(old);
  const width = Math.max(cols, ...block.cells.map((r) => r.length));
  const cells: BlockCell[][] = block.cells.map((r) => [...r, ...Array.from({ length: width - r.length }, () => ({}))]);
  while (cells.length < rows) cells.push(Array.from({ length: width }, () => ({})));
  return { ...block, cells };
}

/** What writing the block would replace. Writes nothing. The plan's block is padded over an earlier block of the same name in the same place. */
export async function planBlockWrite(port: WorkbookPort, block: BlockToWrite, chart: ChartToAdd | null = null): Promise<BlockPlan> {
  const found = await port.findBlock(block.name);
  const padded = padToEarlier(block, found);
  const own = found && found.sheet === block.sheet ? ownRanges(found, padded) : null;
  const occupied = outside(await port.occupiedCells(padded), own);
  return { block: padded, chart, occupied, replacesEarlierBlock: own !== null, safe: occupied.length === 0 };
}

/** Writes a plan: at once when safe, else only with `confirmed` (the user's explicit yes to the cells listed). */
export async function writePlannedBlock(port: WorkbookPort, plan: BlockPlan, confirmed = false): Promise<PlannedWriteOutcome> {
  const own = await earlierBlock(port, plan.block);
  const now = outside(await port.occupiedCells(plan.block), own);
  const seen = new Set(confirmed ? plan.occupied.map((c) => c.address) : []);
  const unconfirmed = now.filter((c) => !seen.has(c.address));
  if (unconfirmed.length > 0) {
    const list = unconfirmed.slice(0, 5).map((c) => c.address).join(', ');
    const more = unconfirmed.length > 5 ? ` and ${unconfirmed.length - 5} more` : '';
    return {
      ok: false,
      written: [],
      error: `Nothing was written: ${unconfirmed.length} cell${unconfirmed.length === 1 ? '' : 's'} in the way (${list}${more}) ${unconfirmed.length === 1 ? 'holds' : 'hold'} data not confirmed for replacing. Review them and confirm, or choose another place.`,
      unconfirmed,
      chart: { added: false, error: 'the block was not written' },
    };
  }
  const outcome = await port.writeBlock(plan.block);
  if (!outcome.ok || !plan.chart) return { ...outcome, unconfirmed: [], chart: { added: false, ...(plan.chart ? { error: 'the block was not written' } : {}) } };
  try {
    await port.addChart(plan.chart);
    return { ...outcome, unconfirmed: [], chart: { added: true } };
  } catch (e) {
    return { ...outcome, unconfirmed: [], chart: { added: false, error: e instanceof Error ? e.message : String(e) } };
  }
}
