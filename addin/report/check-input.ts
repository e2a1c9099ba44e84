/**
 * Checks of the diagnostic's input and options, each refusal a MooringInputError that names
 * the series, the row or the option and says what would work; and the window cut, so every
 * later step sees only the observations the report covers.
 */
import { MooringInputError } from '../errors';
import { requireJohansenCase, type JohansenCase } from '../johansen/deterministic-case';
import type { Deterministic } from '../result';
import { describePreparation, parsePreparation } from '../series/preparation';
import type { DiagnosticInput } from './prepare-input';
import type { DroppedRow } from './report-types';

/** Options of the diagnostic; every field has a default. */
export interface DiagnosticOptions {
  /** Whether the values are natural logs (informational; shown in the report). */
  log?: boolean;
  /** Observations to use, 0-based, end exclusive; default all. */
  window?: { start: number; end: number };
  /** Level of every decision; default 0.05. */
  alpha?: number;
  /** Deterministic terms of the unit-root levels tests and the residual-based tests: 'const' (default) or 'trend'. */
  deterministic?: Deterministic;
  /** Rule for the lag orders of the residual tests, the VAR and the lead-lag tests: 'aic' (default) or 'bic'. */
  lagRule?: 'aic' | 'bic';
  /** Johansen deterministic case; default chosen from the data (see johansen-choice.ts). */
  johansenCase?: JohansenCase | 'auto';
  /** What one row is, for sentences ("day", "week"); default found from the dates, else "row". */
  period?: string;
  /** Rows in the trailing window of the rolling z-score; default 60, or a third of the sample when shorter. */
  rollingWindow?: number;
  /**
   * How the surface prepared the prices, in the words of addin/series/preparation.ts ("log, skip
   * gaps, from row 521"): recorded in the report's settings so every rendering of the report
   * (the results block above all) runs its formulas on the same rows; the preparation itself is
   * done before the diagnostic, by the surface.
   */
  preparation?: string;
  /**
   * The unit-root test that decides whether each series' levels wander: 'adf' (default) or
   * 'dfgls' (more power against slow mean reversion; the differences keep ADF). See
   * addin/unitroot/integration-order.ts.
   */
  unitRootTest?: 'adf' | 'dfgls';
}

/** Fewest observations the diagnostic works with: enough for the unit-root steps, the halves and the lag searches. */
export const DIAGNOSTIC_MIN_OBSERVATIONS = 30;

/** Most series in one diagnostic: the Johansen tables cover up to 12 (66 pairs). */
export const DIAGNOSTIC_MAX_SERIES = 12;

/** The input after checking: equal-length Float64Arrays cut to the window, with labels. */
export interface CheckedInput {
  names: string[];
  values: Float64Array[];
  rowLabels: string[];
  dates: string[] | null;
  dropped: DroppedRow[];
  source: string | null;
  logged: boolean;
  window: { start: number; end: number } | null;
}

/** Checks the input against the options and cuts it to the window. */
export function checkDiagnosticInput(input: DiagnosticInput, options: DiagnosticOptions): CheckedInput {
  if (input === null || typeof input !== 'object' || !Array.isArray(input.series)) {
    throw new MooringInputError('The diagnostic needs a list of series, each with a name and its values.');
  }
  const m = input.series.length;
  if (m < 2) throw new MooringInputError(`The diagnostic compares series in pairs, so it needs at least two; got ${m}. For one series use the order-of-integration test.`);
  if (m > DIAGNOSTIC_MAX_SERIES) {
    throw new MooringInputError(`The diagnostic takes at most ${DIAGNOSTIC_MAX_SERIES} series (${(DIAGNOSTIC_MAX_SERIES * (DIAGNOSTIC_MAX_SERIES - 1)) / 2} pairs); got ${m}. Split them into smaller groups.`);
  }
  const names = input.series.map((s, i) => {
    const name = typeof s?.name === 'string' ? s.name.trim() : '';
    if (name === '') throw new MooringInputError(`Series ${i + 1} has no name: give every series a name (its column header).`);
    return name;
  });
  const lower = names.map((n) => n.toLowerCase());
  const repeated = names.find((_, i) => lower.indexOf(lower[i]) !== i);
  if (repeated !== undefined) throw new MooringInputError(`Two series are named '${repeated}': give each series its own name.`);

  const n = lengthOf(input, names);
  const rowLabels = input.rowLabels ?? Array.from({ length: n }, (_, i) => `row ${i + 1}`);
  if (rowLabels.length !== n) throw new MooringInputError(`${rowLabels.length} row labels were given for ${n} observations: give one label per observation.`);
  const dates = input.dates ?? null;
  if (dates !== null && dates.length !== n) throw new MooringInputError(`${dates.length} dates were given for ${n} observations: give one date per observation.`);
  input.series.forEach((s, j) => {
    for (let i = 0; i < n; i++) {
      const v = s.values[i];
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        throw new MooringInputError(`${names[j]} ${rowLabels[i]} is ${describe(v)}, not a number: clean the series (or allow gaps) before the diagnostic.`, rowLabels[i]);
      }
    }
  });

  const window = checkWindow(options.window, n);
  const start = window?.start ?? 0;
  const end = window?.end ?? n;
  const used = end - start;
  if (used < DIAGNOSTIC_MIN_OBSERVATIONS) {
    const what = window ? `The window ${rowLabels[start]} to ${rowLabels[end - 1]} holds` : 'The series hold';
    throw new MooringInputError(`${what} ${used} observations; the diagnostic needs at least ${DIAGNOSTIC_MIN_OBSERVATIONS}: select a longer history.`);
  }
  const values = input.series.map((s) => Float64Array.from({ length: used }, (_, i) => s.values[start + i] as number));
  values.forEach((v, j) => {
    if (v.every((x) => x === v[0])) {
      throw new MooringInputError(`${names[j]} never changes between ${rowLabels[start]} and ${rowLabels[end - 1]}: a constant series cannot be tested; check that the range holds prices.`);
    }
  });
  return {
    names,
    values,
    rowLabels: rowLabels.slice(start, end),
    dates: dates === null ? null : dates.slice(start, end).map((d) => (typeof d === 'string' ? d : '')),
    dropped: (input.dropped ?? []).map((d) => ({ ...d })),
    source: input.source ?? null,
    logged: options.log ?? input.logged ?? false,
    window,
  };
}

/** Reads and checks the level, the deterministic terms, the lag rule and the Johansen case. */
export function checkDiagnosticOptions(options: DiagnosticOptions): { alpha: number; deterministic: Deterministic; lagRule: 'aic' | 'bic'; johansenCase: JohansenCase | 'auto'; preparation: string; unitRootTest: 'adf' | 'dfgls' } {
  const alpha = options.alpha ?? 0.05;
  if (typeof alpha !== 'number' || !(alpha > 0 && alpha < 0.5)) {
    throw new MooringInputError(`The significance level must lie between 0 and 0.5, such as 0.05; got ${String(alpha)}.`);
  }
  const deterministic = options.deterministic ?? 'const';
  if (deterministic !== 'const' && deterministic !== 'trend') {
    throw new MooringInputError(`The deterministic terms of the diagnostic must be 'const' or 'trend'; got '${String(deterministic)}'.`);
  }
  const lagRule = options.lagRule ?? 'aic';
  if (lagRule !== 'aic' && lagRule !== 'bic') throw new MooringInputError(`The lag rule must be 'aic' or 'bic'; got '${String(lagRule)}'.`);
  const johansenCase = options.johansenCase ?? 'auto';
  if (johansenCase !== 'auto') requireJohansenCase(johansenCase);
  const preparation = describePreparation(parsePreparation(options.preparation ?? null, 'The preparation of the prices'));
  const unitRootTest = options.unitRootTest ?? 'adf';
  if (unitRootTest !== 'adf' && unitRootTest !== 'dfgls') throw new MooringInputError(`The unit-root test that decides the order must be 'adf' or 'dfgls'; got '${String(unitRootTest)}'.`);
  return { alpha, deterministic, lagRule, johansenCase, preparation, unitRootTest };
}

function lengthOf(input: DiagnosticInput, names: string[]): number {
  const lengths = input.series.map((s, j) => {
    const v = s?.values as ArrayLike<number> | undefined;
    if (v === null || typeof v !== 'object' || typeof v.length !== 'number') {
      throw new MooringInputError(`${names[j]} has no values: pass a list of numbers for every series.`);
    }
    return v.length;
  });
  const n = lengths[0];
  lengths.forEach((len, j) => {
    if (len !== n) {
      throw new MooringInputError(`${names[j]} has ${len} values but ${names[0]} has ${n}: the series must cover the same rows (clean them together as one block).`);
    }
  });
  return n;
}

function checkWindow(window: DiagnosticOptions['window'], n: number): { start: number; end: number } | null {
  if (window === undefined) return null;
  const { start, end } = window ?? ({} as { start?: unknown; end?: unknown });
  if (!Number.isInteger(start) || !Number.isInteger(end) || (start as number) < 0 || (end as number) > n || (start as number) >= (end as number)) {
    throw new MooringInputError(`The window must run from a start to an end row with 0 <= start < end <= ${n} (whole numbers, end not included); got ${String(start)} to ${String(end)}.`);
  }
  return start === 0 && end === n ? null : { start: start as number, end: end as number };
}

function describe(v: unknown): string {
  if (typeof v === 'number') return Number.isNaN(v) ? 'not a number (NaN)' : v > 0 ? 'infinite' : 'minus infinity';
  if (v === null || v === undefined) return 'empty';
  if (typeof v === 'string') return `the text '${v}'`;
  return `a ${typeof v}`;
}
