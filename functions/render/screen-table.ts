/**
 * A pair screen's answer as cells to spill: the ranked list of directed pairs, or the grid of
 * p-values with the series along the top and down the side. The pairs the screen set aside
 * (series that do not wander with the same order) follow the ranking with their reason: one
 * row per directed pair in the list, one line per cause under the grid, whose cells for them
 * stay blank. Every layout ends with the screen's chance sentence, because a screen of many
 * pairs finds some by luck alone and the reader must see how many next to the pairs
 * themselves. Nothing here computes a statistic: each number is the engine's, unchanged.
 */
import type { ScreenResult } from '../../addin/screen/screen-pairs';
import { spillCell } from './cell-number';

/** The list's header row, in the order of its columns. */
export const SCREEN_LIST_HEADER = [
  'y',
  'x',
  'p-value',
  'adjusted p-value',
  'hedge ratio',
  'half-life',
  'latest z-score',
  'passes after adjustment',
] as const;

/** A row holding one sentence (the chance sentence, a set-aside line) in its first cell, blank across the rest of the width. */
function sentenceRow(sentence: string, width: number): string[] {
  return [sentence, ...new Array<string>(width - 1).fill('')];
}

/** Marks a set-aside pair in the list's last column. */
export const SET_ASIDE_MARK = 'set aside';

/**
 * One row per ranked directed pair (strongest evidence first), under the header; then one row
 * per set-aside pair (y, x, the reason where the p-value would be, "set aside" in the last
 * column); then the chance sentence.
 */
export function screenList(result: ScreenResult): (number | string)[][] {
  const rows: (number | string)[][] = [SCREEN_LIST_HEADER.slice()];
  for (const p of result.pairs) {
    const where = `for ${p.y} on ${p.x}`;
    rows.push([
      p.y,
      p.x,
      spillCell(p.pValue, `The p-value ${where}`),
      spillCell(p.adjustedPValue, `The adjusted p-value ${where}`),
      spillCell(p.beta, `The hedge ratio ${where}`),
      spillCell(p.halfLife, `The half-life ${where}`),
      spillCell(p.zscore, `The latest z-score ${where}`),
      p.discovery ? 'yes' : 'no',
    ]);
  }
  for (const p of result.setAside) rows.push([p.y, p.x, p.reason, '', '', '', '', SET_ASIDE_MARK]);
  rows.push(sentenceRow(result.chanceSentence, SCREEN_LIST_HEADER.length));
  return rows;
}

/**
 * The N x N grid of raw (or adjusted) p-values: row = the series on the left of the relation
 * (y), column = the series it is regressed on (x); the diagonal and any untested or set-aside
 * pair blank, the set-aside ones explained in a line each under the grid. The corner cell says
 * which way the grid reads.
 */
export function screenGrid(result: ScreenResult, adjusted: boolean): (number | string)[][] {
  const grid = adjusted ? result.adjustedMatrix : result.matrix;
  const what = adjusted ? 'adjusted p-value' : 'p-value';
  const rows: (number | string)[][] = [[`${what}: y (row) on x (column)`, ...result.names]];
  result.names.forEach((y, i) => {
    rows.push([y, ...grid[i].map((v, j) => spillCell(v, `The ${what} for ${y} on ${result.names[j]}`))]);
  });
  for (const line of result.setAsideSummary) rows.push(sentenceRow(`Set aside: ${line}`, result.names.length + 1));
  rows.push(sentenceRow(result.chanceSentence, result.names.length + 1));
  return rows;
}
