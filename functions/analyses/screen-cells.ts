/**
 * MOOR.SCREEN: every pair of the series in a block (one per column, read like JOHANSEN's and
 * VARLAGS's block), each series' order of integration decided first, then every pair whose two
 * series wander with the same order tested for cointegration both ways round with the
 * single-pair defaults of MOOR.ENGLEGRANGER, the p-values adjusted for the number of pairs tested
 * (Benjamini-Hochberg), and the pairs ranked; the other pairs are listed apart with the reason.
 * `show` picks the ranked list or the grid of raw or adjusted p-values; each ends with the
 * sentence on how many pairs would pass by chance alone.
 *
 * Names: when the block's first row holds text and no number (a header row, or a table
 * reference with its headers, Table[#All]), its cells name the series; a blank header cell, or
 * a block without a header row, gives "series 1", "series 2", ... after the column. The header
 * row is read as a blank row rather than cut off, so every row keeps its position in the range
 * handed over and a message still names the cell where the user sees it.
 */
import { screenPairs } from '../../addin/screen/screen-pairs';
import { cellKind } from '../../addin/series/cell-kinds';
import { readBlock } from '../cells/range-input';
import { levelValue, optionWord, prepValue } from '../options/option-values';
import { SCREEN_SHOW_WORDS } from '../options/option-words';
import { screenGrid, screenList } from '../render/screen-table';

/** A block with its header row, if any, taken out: the names it gives (null where a column has none) and the block with that row blank. */
export function blockHeader(block: unknown): { names: (string | null)[] | null; body: unknown } {
  if (!Array.isArray(block) || block.length < 2 || !Array.isArray(block[0])) return { names: null, body: block };
  const first = block[0] as unknown[];
  const kinds = first.map(cellKind);
  if (kinds.some((k) => k !== 'text' && k !== 'blank') || !kinds.includes('text')) return { names: null, body: block };
  const names = first.map((cell, j) => (kinds[j] === 'text' ? String(cell).trim() : null));
  return { names, body: [first.map(() => null), ...block.slice(1)] };
}

export function screenCell(block: unknown, alpha: unknown, show: unknown, prep?: unknown): (number | string)[][] {
  const level = levelValue('alpha', alpha, 0.05);
  const choice = optionWord('show', show, SCREEN_SHOW_WORDS, 'list');
  const { names, body } = blockHeader(block);
  const series = readBlock(body, 'the block', prepValue(prep));
  const result = screenPairs(series.map((s, j) => ({ name: names?.[j] ?? s.name, values: s.values })), { alpha: level });
  return choice === 'list' ? screenList(result) : screenGrid(result, choice === 'adjusted');
}
