/**
 * MOOR.ROLLING: how a pair's long-run relation moves through time. Over rolling windows of
 * `window` rows, ending on the last row and every `step` rows before it, the engine refits the
 * Engle-Granger test, the hedge ratio and the half-life of each window's spread; each window's
 * numbers are those of MOOR.ENGLEGRANGER, MOOR.HEDGE and MOOR.HALFLIFE on that window's rows.
 */
import { MooringInputError } from '../../addin/errors';
import { rollingRelation } from '../../addin/stability/rolling-relation';
import { readPair } from '../cells/range-input';
import { isOmitted, optionWord, prepValue, wholeNumber } from '../options/option-values';
import { ROLLING_SHOW_WORDS } from '../options/option-words';
import { rollingColumns } from '../render/rolling-columns';

export function rollingCell(y: unknown, x: unknown, window: unknown, step: unknown, show: unknown, prep?: unknown): (number | string)[][] {
  if (isOmitted(window)) throw new MooringInputError('window is empty: give the number of rows in each window, such as 250.');
  const rows = wholeNumber('window', window, 0, 'rows in each window', 1);
  const every = wholeNumber('step', step, 1, 'rows between window ends', 1);
  const choice = optionWord('show', show, ROLLING_SHOW_WORDS, 'all');
  const pair = readPair(y, x, { y: 'y', x: 'x' }, 'a rolling relation', prepValue(prep));
  const result = rollingRelation(pair.y.values, pair.x.values, { window: rows, step: every }, { y: 'y', x: 'x' });
  return rollingColumns(result, choice, pair.orientation, (index) => pair.y.rows[index] + 1);
}
