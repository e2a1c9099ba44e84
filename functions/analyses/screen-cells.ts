/**
 * MOOR.SCREEN: every pair of the series in a block (one per column, read like JOHANSEN's and
 * VARLAGS's block, so the series are named "series 1", "series 2", ... after their column),
 * tested for cointegration both ways round with the single-pair defaults of MOOR.EGTEST, the
 * p-values adjusted for the number of pairs tested (Benjamini-Hochberg), and the pairs ranked.
 * `show` picks the ranked list or the grid of raw or adjusted p-values; each ends with the
 * sentence on how many pairs would pass by chance alone.
 */
import { screenPairs } from '../../addin/screen/screen-pairs';
import { readBlock } from '../cells/range-input';
import { levelValue, optionWord } from '../options/option-values';
import { SCREEN_SHOW_WORDS } from '../options/option-words';
import { screenGrid, screenList } from '../render/screen-table';

export function screenCell(block: unknown, alpha: unknown, show: unknown): (number | string)[][] {
  const level = levelValue('alpha', alpha, 0.05);
  const choice = optionWord('show', show, SCREEN_SHOW_WORDS, 'list');
  const series = readBlock(block);
  const result = screenPairs(series.map((s) => ({ name: s.name, values: s.values })), { alpha: level });
  return choice === 'list' ? screenList(result) : screenGrid(result, choice === 'adjusted');
}
