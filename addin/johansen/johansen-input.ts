/**
 * Checks of the Johansen test's input, each refusal a MooringInputError a spreadsheet user
 * can act on: how many series, equal lengths, numbers only, no constant series, a usable
 * lag count and level, and enough rows for the lags.
 */
import { MooringInputError } from '../errors';
import { requireJohansenCase, type JohansenCase } from './deterministic-case';
import { termInRelation, unrestrictedTermCount } from './johansen-design';

/** Fewest series in one system. */
export const MIN_SERIES = 2;
/** Most series in one system (the tables cover n - r up to 12). */
export const MAX_SERIES = 12;

/** The options after checking, with defaults filled in. */
export interface CheckedJohansenInput {
  block: ArrayLike<number>[];
  names: string[];
  caseName: JohansenCase;
  lags: number;
  alpha: number;
  smallSampleCorrection: boolean;
}

/**
 * Validates the block, options and names, and fills in the defaults ('constant', K = 1,
 * alpha = 0.05, no correction, names "series 1", "series 2", ...).
 */
export function checkJohansenInput(
  block: unknown,
  options: { case?: unknown; lags?: unknown; alpha?: unknown; smallSampleCorrection?: unknown },
  names: unknown,
): CheckedJohansenInput {
  if (!Array.isArray(block)) {
    throw new MooringInputError('The Johansen test needs a list of series (one column per series).');
  }
  const m = block.length;
  if (m < MIN_SERIES || m > MAX_SERIES) {
    throw new MooringInputError(`The Johansen test needs ${MIN_SERIES} to ${MAX_SERIES} series; got ${m}.${m < MIN_SERIES ? ' For one series use a unit-root test.' : ' Split the series into smaller systems.'}`);
  }
  const labels = checkNames(names, m);
  const caseName = options.case ?? 'constant';
  requireJohansenCase(caseName);
  const lags = options.lags ?? 1;
  if (typeof lags !== 'number' || !Number.isInteger(lags) || lags < 0) {
    throw new MooringInputError(`The number of lagged changes must be a whole number of 0 or more; got ${String(lags)}.`);
  }
  const alpha = options.alpha ?? 0.05;
  if (typeof alpha !== 'number' || !(alpha > 0 && alpha < 1)) {
    throw new MooringInputError(`The significance level must be a number between 0 and 1 (e.g. 0.05); got ${String(alpha)}.`);
  }
  const correction = options.smallSampleCorrection ?? false;
  if (typeof correction !== 'boolean') {
    throw new MooringInputError(`The small-sample correction option must be true or false; got ${String(correction)}.`);
  }

  const series = block.map((s, i) => checkSeries(s, labels[i]));
  const T = series[0].length;
  series.forEach((s, i) => {
    if (s.length !== T) {
      throw new MooringInputError(`The series differ in length: '${labels[0]}' has ${T} rows but '${labels[i]}' has ${s.length}. Align them on common dates first.`, `series '${labels[i]}'`);
    }
  });
  const needed = rowsNeeded(m, lags, caseName);
  if (T < needed) {
    throw new MooringInputError(
      `With ${m} series, ${lags} lagged change${lags === 1 ? '' : 's'} and the '${caseName}' case the test needs at least ${needed} rows; got ${T}. Add rows or use fewer lags.`,
    );
  }
  return { block: series, names: labels, caseName, lags, alpha, smallSampleCorrection: correction };
}

/**
 * Fewest rows T for which the regression is estimable with every eigenvalue below 1:
 * n = T - K - 1 observations must exceed the short-run terms (mK plus the unrestricted
 * deterministic terms) plus the levels block plus the m equations.
 */
export function rowsNeeded(m: number, lags: number, caseName: JohansenCase): number {
  const shortRun = m * lags + unrestrictedTermCount(caseName);
  const levels = m + (termInRelation(caseName) === null ? 0 : 1);
  return lags + 1 + shortRun + levels + m + 1;
}

function checkNames(names: unknown, m: number): string[] {
  if (names === undefined) return Array.from({ length: m }, (_, i) => `series ${i + 1}`);
  if (!Array.isArray(names) || names.length !== m) {
    throw new MooringInputError(`Give one name per series: ${m} series but ${Array.isArray(names) ? names.length : 'no list of'} names.`);
  }
  return names.map((n, i) => (typeof n === 'string' && n.trim() !== '' ? n : `series ${i + 1}`));
}

function checkSeries(s: unknown, name: string): ArrayLike<number> {
  if (s === null || typeof s !== 'object' || typeof (s as ArrayLike<number>).length !== 'number') {
    throw new MooringInputError(`'${name}' is not a list of numbers.`, `series '${name}'`);
  }
  const x = s as ArrayLike<number>;
  for (let i = 0; i < x.length; i++) {
    const v = x[i];
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new MooringInputError(`Row ${i + 1} of '${name}' is not a finite number (${String(v)}): clean the series or drop the row from every series.`, `series '${name}', row ${i + 1}`);
    }
  }
  let moves = false;
  for (let i = 1; i < x.length && !moves; i++) moves = x[i] !== x[0];
  if (!moves && x.length > 0) {
    throw new MooringInputError(`'${name}' never changes: a constant series has no place in a cointegration test.`, `series '${name}'`);
  }
  return x;
}
