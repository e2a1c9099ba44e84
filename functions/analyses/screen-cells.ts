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
import { screenUniverseInWorkers, type ScreenPort } from '../../addin/screen/screen-in-workers';
import { resolveScreenOptions } from '../../addin/screen/screen-options';
import { screenPairs, type NamedSeries, type ScreenResult } from '../../addin/screen/screen-pairs';
import { screenUniverse, unorderedPairCount } from '../../addin/screen/screen-universe';
import { threadsWorth } from '../../addin/screen/thread-work';
import { cellKind } from '../../addin/series/cell-kinds';
import { answerLater } from '../cells/answer';
import { readBlock } from '../cells/range-input';
import { levelValue, optionWord, prepValue } from '../options/option-values';
import { SCREEN_SHOW_WORDS } from '../options/option-words';
import { screenGrid, screenList } from '../render/screen-table';
import { availableCores, closeScreenWorkers, screenWorkers, workersAvailable } from '../workers/screen-worker-pool';

/** A block with its header row, if any, taken out: the names it gives (null where a column has none) and the block with that row blank. */
export function blockHeader(block: unknown): { names: (string | null)[] | null; body: unknown } {
  if (!Array.isArray(block) || block.length < 2 || !Array.isArray(block[0])) return { names: null, body: block };
  const first = block[0] as unknown[];
  const kinds = first.map(cellKind);
  if (kinds.some((k) => k !== 'text' && k !== 'blank') || !kinds.includes('text')) return { names: null, body: block };
  const names = first.map((cell, j) => (kinds[j] === 'text' ? String(cell).trim() : null));
  return { names, body: [first.map(() => null), ...block.slice(1)] };
}

/** The screen's input read from the cells: its series, level and choice of view (refusals thrown here, naming the cell). */
function screenInput(block: unknown, alpha: unknown, show: unknown, prep?: unknown): { series: NamedSeries[]; level: number; choice: string } {
  const level = levelValue('alpha', alpha, 0.05);
  const choice = optionWord('show', show, SCREEN_SHOW_WORDS, 'list');
  const { names, body } = blockHeader(block);
  const series = readBlock(body, 'the block', prepValue(prep));
  return { series: series.map((s, j) => ({ name: names?.[j] ?? s.name, values: s.values })), level, choice };
}

function screenCells(result: ScreenResult, choice: string): (number | string)[][] {
  return choice === 'list' ? screenList(result) : screenGrid(result, choice === 'adjusted');
}

/** MOOR.SCREEN on this thread. */
export function screenCell(block: unknown, alpha: unknown, show: unknown, prep?: unknown): (number | string)[][] {
  const { series, level, choice } = screenInput(block, alpha, show, prep);
  return screenCells(screenPairs(series, { alpha: level }), choice);
}

/** Where MOOR.SCREEN finds workers: how many cores, how to start `count` of them, how to end them after a failure. */
export interface ScreenWorkerSource {
  cores(): number;
  start(count: number): ScreenPort[];
  close(): void;
}

/** The runtime's Web Workers (screen-worker-pool.ts), or null where it has none (the JavaScript-only runtime, Node). */
export function webWorkerSource(): ScreenWorkerSource | null {
  return workersAvailable() ? { cores: availableCores, start: screenWorkers, close: closeScreenWorkers } : null;
}

/**
 * MOOR.SCREEN as Excel calls it. Where the runtime has workers and the screen earns two or more
 * (thread-work.ts: the work that pays for a thread), the orders and the pairs run on them
 * (addin/screen/screen-in-workers.ts) and the answer is a Promise of the cells, which Excel
 * awaits; otherwise, or if a worker fails, the screen runs on this thread as screenCell does.
 * The cells are the same either way. A refusal of the input is thrown at once, before any worker
 * starts, so it names the cell exactly as on one thread.
 */
export function screenCellOrLater(
  block: unknown, alpha: unknown, show: unknown, prep?: unknown, workers: ScreenWorkerSource | null = webWorkerSource(),
): (number | string)[][] | Promise<(number | string)[][]> {
  const { series, level, choice } = screenInput(block, alpha, show, prep);
  const settings = resolveScreenOptions({ alpha: level });
  const universe = screenUniverse(series);
  const count = workers ? threadsWorth(unorderedPairCount(universe.names.length), universe.rows, workers.cores()) : 1;
  if (!workers || count < 2) return screenCells(screenPairs(series, { alpha: level }), choice);
  let ports: ScreenPort[];
  try {
    ports = workers.start(count);
  } catch {
    workers.close();
    return screenCells(screenPairs(series, { alpha: level }), choice);
  }
  return screenUniverseInWorkers(universe, settings, ports).then(
    (result) => screenCells(result, choice),
    () => {
      workers.close();
      return screenCells(screenPairs(series, { alpha: level }), choice);
    },
  );
}

/**
 * MOOR.SCREEN's body: screenCellOrLater with a late refusal mapped to the cell error answer()
 * gives. On Web Workers the answer is a Promise of the cells, which Excel awaits; the declared
 * type stays the cells' so the metadata keeps the result a matrix.
 */
export function screenLaterCell(block: unknown, alpha: unknown, show: unknown, prep?: unknown): (number | string)[][] {
  return answerLater(screenCellOrLater(block, alpha, show, prep)) as (number | string)[][];
}
