/**
 * A pair screen's answer as cells to spill: the ranked list of directed pairs, or the grid of
 * p-values with the series along the top and down the side. Every layout ends with the
 * screen's chance sentence, because a screen of many pairs finds some by luck alone and the
 * reader must see how many next to the pairs themselves. Nothing here computes a statistic:
 * each number is the engine's, unchanged.
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

/** A last row holding the chance sentence in its first cell, blank across the rest of the width. */
function sentenceRow(sentence: string, width: number): string[] {
  return [sentence, ...new Array<string>(width - 1).fill('')];
}

/** One row per ranked directed pair (strongest evidence first), under the header, then the chance sentence. */
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
  rows.push(sentenceRow(result.chanceSentence, SCREEN_LIST_HEADER.length));
  return rows;
}

/**
 * The N x N grid of raw (or adjusted) p-values: row = the series on the left of the relation
 * (y), column = the series it is regressed on (x); the diagonal and any untested pair blank.
 * The corner cell says which way the grid reads.
 */
export function screenGrid(result: ScreenResult, adjusted: boolean): (number | string)[][] {
  const grid = adjusted ? result.adjustedMatrix : result.matrix;
  const what = adjusted ? 'adjusted p-value' : 'p-value';
  const rows: (number | string)[][] = [[`${what}: y (row) on x (column)`, ...result.names]];
  result.names.forEach((y, i) => {
    rows.push([y, ...grid[i].map((v, j) => spillCell(v, `The ${what} for ${y} on ${result.names[j]}`))]);
  });
  rows.push(sentenceRow(result.chanceSentence, result.names.length + 1));
  return rows;
}
