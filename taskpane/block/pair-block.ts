/**
 * The results block of one pair, built from the diagnostic report and the region its data
 * came from: a title naming the series and the sample, the four stages (stage-rows.ts), the
 * cautions last, and beside them five spilling columns (dates, the spread, its bands at two
 * standard deviations, its z-scores) that feed a native line chart. The block is a
 * BlockToWrite plus a ChartToAdd; nothing is written here (see plan-block-write.ts).
 */
import { MooringInputError } from '../../addin/errors';
import type { PairReport } from '../../addin/report/pair-types';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { cellAddress, parseRange, rangeAddress } from '../workbook/a1-address';
import { safeName } from '../workbook/block-geometry';
import type { BlockToWrite, ChartToAdd, DataRegion } from '../workbook/port';
import { encodeBlockNote } from './block-note';
import { BlockGrid, COL } from './block-grid';
import { COLUMN_WIDTHS, NUMBER_FORMAT, STYLE } from './block-style';
import { SeriesReferences } from './series-reference';
import { closingStage, leadStage, lineStage, seriesStage, tieStage, type StageContext } from './stage-rows';

/** A block and its chart, ready to plan and write. */
export interface PairBlock {
  block: BlockToWrite;
  chart: ChartToAdd;
}

/** Where a block goes. */
export interface BlockPlacement {
  sheet: string;
  anchor: string;
}

/** The workbook-level name of a pair's block: Mooring_<a>_<b>. */
export function blockNameFor(a: string, b: string): string {
  return safeName(`Mooring_${a}_${b}`, 'Mooring');
}

/** Two columns to the right of the region, level with its header row. */
export function besideRegion(region: DataRegion): BlockPlacement {
  const r = parseRange(region.address);
  return { sheet: region.sheet, anchor: cellAddress({ row: r.top, col: r.right + 2 }) };
}

/** The pair's part of the report, by its two names in either order. */
export function findPair(report: DiagnosticReport, a: string, b: string): PairReport {
  const pair = report.pairs.find((p) => (p.a === a && p.b === b) || (p.a === b && p.b === a));
  if (!pair) {
    const have = report.pairs.map((p) => `${p.a} and ${p.b}`).join('; ');
    throw new MooringInputError(`The report holds no pair of ${a} and ${b}; it holds ${have || 'no pairs'}.`);
  }
  return pair;
}

const CHART_COLS = ['Date', 'Spread', 'Upper band (+2 sd)', 'Lower band (-2 sd)', 'z-score'];
const TOP_ROWS = { title: 0, heads: 1, spill: 2 };

/** Builds the block of one pair of the report over the region its data came from. */
export function buildPairBlock(report: DiagnosticReport, pair: { a: string; b: string }, region: DataRegion, placement: BlockPlacement = besideRegion(region)): PairBlock {
  const p = findPair(report, pair.a, pair.b);
  const refs = new SeriesReferences(region);
  const y = p.relation?.dependent ?? p.a;
  const x = p.relation?.regressor ?? p.b;
  const g = new BlockGrid(placement.anchor, COL.chart + CHART_COLS.length);
  const { data } = report;
  const name = blockNameFor(p.a, p.b);

  // Title and source.
  const from = data.first.date ?? data.first.label;
  const to = data.last.date ?? data.last.label;
  g.add({ [COL.label]: { value: `${p.a} and ${p.b}: ${data.observations} rows, ${from} to ${to}`, format: STYLE.title } });
  g.add({ [COL.label]: { value: `Numbers from ${refs.describe()}.`, format: STYLE.note } });
  const rowsNow = g.add({
    [COL.label]: { value: 'Rows in the data now', format: STYLE.label },
    [COL.value]: { formula: `=ROWS(${refs.column(y)})`, format: { numberFormat: NUMBER_FORMAT.count } },
    [COL.how]: { value: `${refs.rowCount} when the block was written`, format: STYLE.note },
  });
  g.add({
    [COL.label]: { value: 'Level of every reading', format: STYLE.label },
    [COL.value]: { value: report.settings.alpha, format: { numberFormat: NUMBER_FORMAT.level } },
    [COL.how]: { value: 'a p-value below it counts as evidence; write the block again to use another level', format: STYLE.note },
  });

  // The chart's columns: heads, then one spilling formula each.
  const spillRow = TOP_ROWS.spill;
  if (rowsNow !== spillRow) throw new Error('block layout: the spill row moved');
  const zSpill = g.address(spillRow, COL.chart + 4);
  const spreadCell = g.address(spillRow, COL.chart + 1);
  const yRef = refs.column(y);
  const xRef = refs.column(x);
  const dates = refs.dates();
  CHART_COLS.forEach((head, k) => g.set(TOP_ROWS.heads, COL.chart + k, { value: k === 0 && !dates ? 'Sheet row' : head, format: STYLE.columnHead }));
  const band = (sign: '+' | '-') => `=IF(ISNUMBER(${spreadCell}#),AVERAGE(${spreadCell}#)${sign}2*STDEV.S(${spreadCell}#),NA())`;
  const spills = [
    { formula: dates ? `=${dates}` : `=ROW(${yRef})`, format: { numberFormat: dates ? NUMBER_FORMAT.date : NUMBER_FORMAT.count } },
    { formula: `=MOOR.SPREAD(${yRef},${xRef})`, format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: band('+'), format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: band('-'), format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: `=MOOR.ZSCORE(${yRef},${xRef})`, format: { numberFormat: NUMBER_FORMAT.statistic } },
  ];
  spills.forEach((cell, k) => g.set(spillRow, COL.chart + k, cell));

  const context: StageContext = { report, pair: p, refs, y, x, zSpill };
  seriesStage(g, context);
  tieStage(g, context);
  lineStage(g, context);
  leadStage(g, context);
  closingStage(g, context);

  // The spill runs one row per data row; the part below the block's own rows is reserved.
  const n = refs.rowCount;
  const spillTop = g.anchor.row + spillRow;
  const spillBottom = spillTop + n - 1;
  const blockBottom = g.anchor.row + g.rows.length - 1;
  const left = g.anchor.col + COL.chart;
  const right = left + CHART_COLS.length - 1;
  const reserved = spillBottom > blockBottom ? [rangeAddress({ top: blockBottom + 1, bottom: spillBottom, left, right })] : [];
  const column = (k: number) => rangeAddress({ top: spillTop, bottom: spillBottom, left: left + k, right: left + k });

  const block: BlockToWrite = {
    sheet: placement.sheet,
    anchor: placement.anchor,
    cells: g.rows,
    name,
    columnWidths: COLUMN_WIDTHS.slice(),
    reserved,
    note: encodeBlockNote({ sheet: region.sheet, address: region.address, table: region.tableName, a: p.a, b: p.b, reserved }),
  };
  const chart: ChartToAdd = {
    sheet: placement.sheet,
    title: `Spread of ${y} on ${x}, with bands at 2 standard deviations`,
    categories: column(0),
    series: [
      { name: 'Spread', values: column(1) },
      { name: 'Upper band (+2 sd)', values: column(2) },
      { name: 'Lower band (-2 sd)', values: column(3) },
    ],
    anchor: cellAddress({ row: g.anchor.row + TOP_ROWS.heads, col: right + 2 }),
    name,
  };
  return { block, chart };
}
