/**
 * Runs one custom function and maps whatever it throws to a cell error, once, here:
 *
 * - MooringInputError (the engine's and the cleaner's refusals) -> #VALUE! with its message;
 * - NoValue (a finding without a number)                      -> #N/A with its message;
 * - an error already shaped for a cell                         -> unchanged;
 * - anything else is a fault in Mooring, not in the data       -> #VALUE! saying so, so the
 *   cell never shows a bare #VALUE! that looks like the user's mistake.
 */
import { isMooringInputError } from '../../addin/errors';
import { cellError, isCellError } from './cell-error';
import { NoValue } from './no-value';

/** The cell error for anything a function threw. */
export function toCellError(e: unknown): unknown {
  if (isCellError(e)) return e;
  if (isMooringInputError(e)) return cellError('invalidValue', e.message);
  if (e instanceof NoValue) return cellError('notAvailable', e.message);
  const detail = e instanceof Error ? e.message : String(e);
  return cellError('invalidValue', `Mooring could not finish this calculation (${detail}). This is a fault in Mooring, not in your data: please report it with the inputs.`);
}

/** Runs a custom function's work, mapping its errors to cell errors. */
export function answer<T>(work: () => T): T {
  try {
    return work();
  } catch (e) {
    throw toCellError(e);
  }
}

/**
 * As answer, for work that may answer later: a value is returned as it is, and a Promise's
 * refusal becomes the same cell error answer() would give (Excel awaits a Promise a custom
 * function returns). Refusals thrown before the Promise exists are answer()'s to map.
 */
export function answerLater<T>(value: T | Promise<T>): T | Promise<T> {
  return value instanceof Promise ? value.catch((e: unknown) => { throw toCellError(e); }) : value;
}
