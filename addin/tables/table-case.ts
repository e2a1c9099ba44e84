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
    throw new MooringInputError(`The ${what} must be a whole number of at least 1; got ${n}.`);
  }
}

/** Throws when a statistic handed to a table is NaN (a NaN would only travel on as a result). */
export function requireNotNaN(stat: number, what: string): void {
  if (Number.isNaN(stat)) {
    throw new MooringInputError(
      `The ${what} is not a number (NaN), so no p-value can be read from the table; ` +
        'check the data for gaps or a constant series.',
    );
  }
}
