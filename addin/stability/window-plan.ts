/**
 * Which windows a rolling or expanding analysis looks at. Windows end on the last row and
 * every `step` rows before it, back to the first end that leaves a full window, so the most
 * recent window, the one a desk acts on, is always there, whatever the step. A rolling
 * window holds the `window` rows up to its end; an expanding one starts at the first row and
 * holds at least `window` rows.
 */
import { MooringInputError } from '../errors';

/** Windows, oldest first: rows start[k] .. end[k] inclusive (0-based). */
export interface WindowPlan {
  start: number[];
  end: number[];
}

/**
 * Fewest rows in a window: 21, the fewest for which the Engle-Granger test with its default
 * largest lag gives a p-value. Its residual ADF searches up to min(ceil(12 (T/100)^(1/4)),
 * T/2 - 1) lagged changes on T - 1 - pmax rows; at T = 20 that is 9 lags plus the level (10
 * columns) on 10 rows, which leaves no degree of freedom, so no window of 20 could be tested;
 * at 21 the regression has 11 rows for 10 columns.
 */
export const SMALLEST_WINDOW = 21;

/** The windows for T rows (see the file comment). Refuses a window or step that cannot work, saying what would. */
export function windowPlan(T: number, window: number, step: number, expanding: boolean): WindowPlan {
  if (!Number.isInteger(window) || window < SMALLEST_WINDOW) {
    throw new MooringInputError(`The window must be a whole number of at least ${SMALLEST_WINDOW} rows; got ${String(window)}.`);
  }
  if (window > T) throw new MooringInputError(`A window of ${window} rows is longer than the series (${T} rows): use at most ${T}.`);
  if (!Number.isInteger(step) || step < 1) throw new MooringInputError(`The step must be a whole number of at least 1 row; got ${String(step)}.`);
  const start: number[] = [];
  const end: number[] = [];
  for (let e = T - 1; e >= window - 1; e -= step) {
    end.push(e);
    start.push(expanding ? 0 : e - window + 1);
  }
  return { start: start.reverse(), end: end.reverse() };
}
