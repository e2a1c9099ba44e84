/**
 * Which deterministic terms a MacKinnon surface was fitted for, and the checks every
 * table lookup makes on its arguments before touching the data.
 */
import { MooringInputError } from '../errors';
import type { Deterministic } from '../result';

/**
 * Deterministic terms in the test regression, as MacKinnon's tables are indexed:
 * 'n' none, 'c' constant, 'ct' constant and linear trend, 'ctt' constant, linear and
 * quadratic trend (MacKinnon 1994, 2010).
 */
export type TableCase = 'n' | 'c' | 'ct' | 'ctt';

const TABLE_CASES: readonly TableCase[] = ['n', 'c', 'ct', 'ctt'];

/** Plain words for each table case, for messages. */
export const TABLE_CASE_LABEL: Record<TableCase, string> = {
  n: 'no constant, no trend',
  c: 'constant',
  ct: 'constant and linear trend',
  ctt: 'constant, linear and quadratic trend',
};

/**
 * The table case for one of the engine's deterministic choices: none → 'n',
 * const → 'c', trend → 'ct'. (The quadratic-trend case 'ctt' has no engine word yet.)
 */
export function tableCaseOf(d: Deterministic): TableCase {
  switch (d) {
    case 'none':
      return 'n';
    case 'const':
      return 'c';
    case 'trend':
      return 'ct';
    default:
      throw new MooringInputError(
        `Unknown deterministic terms '${String(d)}': use 'none', 'const' or 'trend'.`,
      );
  }
}

/** Throws unless `regression` is one of 'n', 'c', 'ct', 'ctt'. */
export function requireTableCase(regression: string): asserts regression is TableCase {
  if (!(TABLE_CASES as readonly string[]).includes(regression)) {
    throw new MooringInputError(
      `Unknown regression case '${regression}': the tables cover 'n' (none), 'c' (constant), ` +
        `'ct' (constant and trend) and 'ctt' (constant, linear and quadratic trend).`,
    );
  }
}

/** Throws unless `n` is a whole number of at least 1 (a count of series or of trends). */
export function requireCount(n: number, what: string): void {
  if (!Number.isInteger(n) || n < 1) {
    const given = typeof n !== 'number' ? `'${String(n)}'` : Number.isNaN(n) ? 'no number' : String(n);
    throw new MooringInputError(`The ${what} must be a whole number of at least 1, such as 1 or 2; got ${given}.`);
  }
}

/**
 * Throws when a statistic handed to a table is not a number (it would only travel on as a
 * result). The cleaner has already refused gaps and non-finite prices by then, so what is left
 * is a series that does not move, prices so large that sums of their squares overflow, or too
 * few rows for the regression: the message says how to mend each.
 */
export function requireNotNaN(stat: number, what: string): void {
  if (Number.isNaN(stat)) {
    throw new MooringInputError(
      `The ${what} could not be computed from these data, so no p-value can be read from the table. ` +
        'What would work: series that move (not the same value on every row), prices within about 1e150 in size ' +
        '(rescale larger ones, for example to thousands), and more rows than the test\'s lags and terms (at least 20).',
    );
  }
}
