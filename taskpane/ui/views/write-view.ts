/**
 * The view of "Put it in the sheet": where the block can go, the offer to turn a plain range
 * into a table (so rows pasted below are included), what a write would replace (each cell
 * and what it holds, for an explicit yes), and exactly what was written or what failed.
 */
import type { BlockPlan, PlannedWriteOutcome } from '../../block/plan-block-write';
import { blockNameFor } from '../../block/pair-block';
import { cellAddress, parseCell } from '../../workbook/a1-address';
import type { DataRegion, OccupiedCell } from '../../workbook/port';

/** Where the user wants the block. */
export type PlaceKind = 'beside' | 'cell' | 'new-sheet';

/** The write step's own state. */
export interface WriteState {
  place: PlaceKind;
  /** The cell typed for 'cell' (A1, or Sheet!A1). */
  cell: string;
  makeTable: boolean;
  plan: BlockPlan | null;
  outcome: PlannedWriteOutcome | null;
  /** A refusal before anything was written (a bad cell address, say). */
  problem: string | null;
  busy: boolean;
  /** What turning the range into a table did, when it was asked for. */
  tableNote: string | null;
}

/** The first write state for a region. */
export function initialWriteState(): WriteState {
  return { place: 'beside', cell: '', makeTable: true, plan: null, outcome: null, problem: null, busy: false, tableNote: null };
}

/** The write step's view. */
export interface WriteStepView {
  pairLabel: string;
  /** The table offer; null when the data already are a table. */
  tableOffer: string | null;
  /** Shown while a yes is needed: the cells that would be replaced. */
  confirm: { question: string; cells: string[] } | null;
  /** What was written, line by line, or the failure. */
  result: { ok: boolean; lines: string[] } | null;
  problem: string | null;
}

/** How many replaced cells are listed before "and N more". */
export const OCCUPIED_LISTED = 12;

/** One occupied cell in words. */
export function occupiedLine(c: OccupiedCell): string {
  if (c.formula) return `${c.address} holds the formula ${c.formula}`;
  return `${c.address} holds ${typeof c.value === 'string' ? `'${c.value}'` : String(c.value)}`;
}

/** The write step's view of its state. */
export function writeStepView(region: DataRegion, pair: { a: string; b: string }, state: WriteState): WriteStepView {
  const plan = state.plan;
  const confirm = plan && !plan.safe && !state.outcome
    ? {
        question: `Writing here would replace ${plan.occupied.length} filled cell${plan.occupied.length === 1 ? '' : 's'} on ${plan.block.sheet}. Replace ${plan.occupied.length === 1 ? 'it' : 'them'}?`,
        cells: [
          ...plan.occupied.slice(0, OCCUPIED_LISTED).map(occupiedLine),
          ...(plan.occupied.length > OCCUPIED_LISTED ? [`and ${plan.occupied.length - OCCUPIED_LISTED} more`] : []),
        ],
      }
    : null;
  let result: WriteStepView['result'] = null;
  const o = state.outcome;
  if (o && plan) {
    if (o.ok) {
      const rows = plan.block.cells.length;
      const cols = plan.block.cells[0]?.length ?? 0;
      const top = parseCell(plan.block.anchor);
      const span = `${plan.block.anchor}:${cellAddress({ row: top.row + rows - 1, col: top.col + Math.max(cols, 1) - 1 })}`;
      const lines = [`Wrote ${o.written.length} cells to ${plan.block.sheet}!${span} (${rows} rows by ${cols} columns), named ${plan.block.name}.`];
      const beyond = o.written.length - rows * cols;
      if (beyond > 0) lines.push(`${beyond} more cell${beyond === 1 ? ' was' : 's were'} cleared below it, for the columns that spill down.`);
      if (plan.replacesEarlierBlock) lines.push('It replaced the earlier block of this pair.');
      else if (plan.block.name !== blockNameFor(pair.a, pair.b)) {
        lines.push(`The block of this pair written elsewhere keeps its own name (${blockNameFor(pair.a, pair.b)}) and chart; both are refreshed when rows are pasted into the table.`);
      }
      lines.push(o.chart.added ? `Added the chart '${plan.chart?.title ?? ''}'.` : `No chart: ${o.chart.error ?? 'none was asked for'}.`);
      if (state.tableNote) lines.push(state.tableNote);
      result = { ok: true, lines };
    } else {
      const lines = [o.error ?? 'The write failed.'];
      if (o.written.length > 0) lines.push(`Cells changed before the failure: ${o.written.slice(0, OCCUPIED_LISTED).join(', ')}${o.written.length > OCCUPIED_LISTED ? ` and ${o.written.length - OCCUPIED_LISTED} more` : ''}.`);
      result = { ok: false, lines };
    }
  }
  return {
    pairLabel: `${pair.a} and ${pair.b}`,
    tableOffer: region.tableName
      ? null
      : `Turn ${region.sheet}!${region.address} into a table, so rows you paste below it are included when the pane refreshes.`,
    confirm,
    result,
    problem: state.problem,
  };
}
