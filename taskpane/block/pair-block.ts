/**
 * The results block of one pair, built from the diagnostic report and the region its data
 * came from: a title naming the series and the sample, the four stages (stage-rows.ts), the
 * cautions last, and beside them five spilling columns (dates, the spread, its bands at two
 * standard deviations, its z-scores) that feed a native line chart. The block is a
 * BlockToWrite plus a ChartToAdd; nothing is written here (see plan-block-write.ts).
 */
import { MooringInputError } from '../../addin/errors';
import { describePreparation, parsePreparation, type Preparation } from '../../addin/series/preparation';
import type { PairReport } from '../../addin/report/pair-types';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { cellAddress, parseCell, parseRange, rangeAddress } from '../workbook/a1-address';
import { safeName } from '../workbook/block-geometry';
import type { BlockToWrite, ChartToAdd, DataRegion } from '../workbook/port';
import { encodeBlockNote } from './block-note';
import { BlockGrid, COL } from './block-grid';
import { COLUMN_WIDTHS, NUMBER_FORMAT, STYLE } from './block-style';
import { JoinedReferences } from './joined-references';
import { joinedRegionFor } from './joined-region';
import { SeriesReferences, type PriceReferences } from './series-reference';
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

/**
 * The workbook-level name of a pair's block: Mooring_<a>_<b> for the first, Mooring_<a>_<b>_2,
 * _3, ... for further blocks of the same pair elsewhere, so each placement keeps its own name
 * (and its chart, which carries the same name).
 */
export function blockNameFor(a: string, b: string, copy = 1): string {
  const tail = copy > 1 ? `_${copy}` : '';
  return safeName(`Mooring_${a}_${b}`, 'Mooring').slice(0, 200 - tail.length) + tail;
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

/** Builds the block of one pair of the report over the region its data came from, under `blockName` (default the pair's first name). */
export function buildPairBlock(report: DiagnosticReport, pair: { a: string; b: string }, sheetRegion: DataRegion, placement: BlockPlacement = besideRegion(sheetRegion), blockName?: string): PairBlock {
  const p = findPair(report, pair.a, pair.b);
  // Series of the report on several calendars: the block joins them on their dates with one
  // MOOR.COMMONDATES formula, placed after the chart's columns, and reads its spill.
  const joined = joinedRegionFor(sheetRegion, report.series.map((s) => s.name));
  const region: DataRegion = joined ?? sheetRegion;
  const joinCol = COL.chart + CHART_COLS.length + 1;
  const width = joined ? joinCol + joined.headers.length : COL.chart + CHART_COLS.length;
  const anchorAt = parseCell(placement.anchor);
  const joinRefs = joined ? new JoinedReferences(joined, cellAddress({ row: anchorAt.row + TOP_ROWS.spill, col: anchorAt.col + joinCol }, true)) : null;
  const refs: PriceReferences = joinRefs ?? new SeriesReferences(region);
  const y = p.relation?.dependent ?? p.a;
  const x = p.relation?.regressor ?? p.b;
  const g = new BlockGrid(placement.anchor, width);
  const { data } = report;
  const name = blockName ?? blockNameFor(p.a, p.b);

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
  const prep = pairPreparation(report, p.a, p.b, region);
  const prepRow = g.add({
    [COL.label]: { value: 'Prices prepared as', format: STYLE.label },
    [COL.value]: { value: describePreparation(prep), format: STYLE.label },
    [COL.how]: { value: preparationWords(prep, region), format: STYLE.note },
  });
  const prepCell = cellAddress({ row: g.anchor.row + prepRow, col: g.anchor.col + COL.value }, true);

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
    { formula: `=MOOR.SPREAD(${yRef},${xRef},,${prepCell})`, format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: band('+'), format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: band('-'), format: { numberFormat: NUMBER_FORMAT.spread } },
    { formula: `=MOOR.ZSCORE(${yRef},${xRef},,${prepCell})`, format: { numberFormat: NUMBER_FORMAT.statistic } },
  ];
  spills.forEach((cell, k) => g.set(spillRow, COL.chart + k, cell));
  if (joinRefs) {
    joinRefs.heads.forEach((head, k) => g.set(TOP_ROWS.heads, joinCol + k, { value: head, format: STYLE.columnHead }));
    g.set(spillRow, joinCol, { formula: joinRefs.joinFormula(), format: { numberFormat: NUMBER_FORMAT.date } });
    g.set(TOP_ROWS.title, joinCol, { value: 'The prices on the dates every series shares: every number of this block is read from these columns.', format: STYLE.note });
  }

  const context: StageContext = { report, pair: p, refs, y, x, zSpill, prep: prepCell };
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
  if (joined && spillBottom > blockBottom) {
    reserved.push(rangeAddress({ top: blockBottom + 1, bottom: spillBottom, left: g.anchor.col + joinCol, right: g.anchor.col + width - 1 }));
  }
  const column = (k: number) => rangeAddress({ top: spillTop, bottom: spillBottom, left: left + k, right: left + k });

  const block: BlockToWrite = {
    sheet: placement.sheet,
    anchor: placement.anchor,
    cells: g.rows,
    name,
    columnWidths: COLUMN_WIDTHS.slice(),
    reserved,
    note: encodeBlockNote({
      sheet: region.sheet, address: region.address, table: region.tableName, a: p.a, b: p.b, reserved,
      analysis: { preparation: report.settings.preparation ?? '', alpha: report.settings.alpha, deterministic: report.settings.deterministic, lagRule: report.settings.lagRule, johansenCase: report.settings.johansenCase, unitRootTest: report.settings.unitRootTest ?? 'adf' },
    }),
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
    anchor: cellAddress({ row: g.anchor.row + TOP_ROWS.heads, col: g.anchor.col + width + 1 }),
    name,
  };
  return { block, chart };
}

/**
 * The preparation the block's formulas use: the report's own (logs, gaps, window), plus, when
 * gaps were skipped across more series than the pair, the rows the analysis lost only because
 * another of its series had a gap there, so the pair's formulas use exactly the report's rows.
 */
export function pairPreparation(report: DiagnosticReport, a: string, b: string, region: DataRegion): Preparation {
  const prep = parsePreparation(report.settings.preparation ?? '');
  const others = report.series.map((s) => s.name).filter((n) => n !== a && n !== b).map((n) => region.headers.indexOf(n)).filter((j) => j >= 0);
  if (!prep.skipGaps || others.length === 0) return prep;
  const ja = region.headers.indexOf(a);
  const jb = region.headers.indexOf(b);
  const isPrice = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v);
  const skip: number[] = [];
  region.rows.forEach((row, i) => {
    if (isPrice(row[ja]) && isPrice(row[jb]) && others.some((j) => !isPrice(row[j]))) skip.push(i + 1);
  });
  return skip.length === 0 ? prep : { ...prep, skipRows: [...new Set([...prep.skipRows, ...skip])].sort((m, n) => m - n) };
}

/** The preparation in plain words beside its cell. */
function preparationWords(prep: Preparation, region: DataRegion): string {
  const rowText = (r: number): string => {
    const d = region.dateColumn;
    const date = d === null ? null : region.rows[r - 1]?.[d];
    return `row ${r} of the data${typeof date === 'string' && date.trim() ? ` (${date.trim()})` : ''}`;
  };
  const parts = [
    prep.log ? 'natural logs of the prices' : 'the prices as they are',
    prep.skipGaps ? 'rows with a blank or text cell left out' : 'a blank or text cell refused',
  ];
  if (prep.fromRow !== null) parts.push(`from ${rowText(prep.fromRow)}`);
  if (prep.toRow !== null) parts.push(`to ${rowText(prep.toRow)}`);
  if (prep.lastRows !== null) parts.push(`the last ${prep.lastRows} rows`);
  if (prep.skipRows.length > 0) parts.push(`${prep.skipRows.length} row${prep.skipRows.length === 1 ? '' : 's'} left out because another series of the analysis had a gap there`);
  return `${parts.join('; ')}. Every formula of this block reads this cell, so it uses the rows the pane used.`;
}
