/**
 * The diagnostic report of columns of a data region, through the same cleaner and engine
 * call as every other surface (addin/series/clean-block.ts, addin/report): the region's
 * columns by header, each row labelled by its sheet row, dates from the region's date
 * column; series on several calendars joined on their dates first (joined-region.ts). Bad cells
 * are refused with the cleaner's message naming the sheet row.
 */
import { MooringInputError } from '../../addin/errors';
import { diagnose, type DiagnosticOptions } from '../../addin/report/pairwise-diagnostic';
import { prepareDiagnosticInput } from '../../addin/report/prepare-input';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { cleanBlock } from '../../addin/series/clean-block';
import { cutWindow, parsePreparation } from '../../addin/series/preparation';
import type { DataRegion } from '../workbook/port';
import { joinedRegionFor } from './joined-region';

/**
 * The report of the named columns of the region (two or more), with the prices prepared as
 * `options.preparation` says (logs, gaps, window: addin/series/preparation.ts), the same rule
 * the block's formulas apply to the same cells.
 */
export function regionReport(sheetRegion: DataRegion, names: readonly string[], options: DiagnosticOptions = {}): DiagnosticReport {
  // Series on several calendars are joined on their dates first, as the pane and the block do.
  const joined = joinedRegionFor(sheetRegion, names);
  const region = joined ?? sheetRegion;
  const prep = parsePreparation(options.preparation ?? '', 'The preparation of the prices');
  const columns = names.map((name) => {
    const j = region.headers.indexOf(name);
    if (j < 0) throw new MooringInputError(`There is no column headed '${name}' in ${region.sheet}!${region.address}: pick one of ${region.headers.join(', ')}.`);
    if (j === region.dateColumn) throw new MooringInputError(`'${name}' is the date column of ${region.sheet}!${region.address}: pick columns of prices.`);
    return region.rows.map((row) => row[j]);
  });
  const sheetRow = (i: number) => (joined ? `shared date ${joined.join.rowLabels[i]}` : `${region.sheet} row ${region.firstDataRow + i}`);
  const series = cutWindow(cleanBlock(columns, names, { rowLabel: sheetRow, skipGaps: prep.skipGaps, log: prep.log }), prep);
  const d = region.dateColumn;
  const dateOf = (i: number): string | null => {
    if (d === null) return null;
    const v = region.rows[i]?.[d];
    return typeof v === 'string' && v.trim() !== '' ? v.trim() : null;
  };
  const input = prepareDiagnosticInput(series, { dateOf, source: region.tableName ?? `${region.sheet}!${region.address}` });
  if (joined) input.notices = joined.join.notices.slice();
  return diagnose(input, { ...options, log: prep.log });
}
