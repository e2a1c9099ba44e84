/**
 * The one result shape. Every hypothesis test in the engine answers with a TestResult;
 * every surface (cell arrays, the pane, the sheet block, the terminal, JSON, HTML)
 * renders this shape and nothing else.
 */

/** Deterministic terms in a regression: none, a constant, or a constant and a linear trend. */
import type { PValueBound } from './p-value-bound';

export type { PValueBound } from './p-value-bound';

export type Deterministic = 'none' | 'const' | 'trend';

export const DETERMINISTIC_WORDS: readonly Deterministic[] = ['none', 'const', 'trend'];

/** Plain words for each deterministic choice. */
export const DETERMINISTIC_LABEL: Record<Deterministic, string> = {
  none: 'no constant, no trend',
  const: 'constant',
  trend: 'constant and linear trend',
};

/** A number the result carries beside the headline statistic, with a plain label. */
export interface ResultDetail {
  /** Machine name, used as a JSON field (camelCase). */
  key: string;
  /** Plain words for people. */
  label: string;
  value: number | string | boolean | null;
}

export interface TestResult {
  /** Short trade name of the test: "ADF", "KPSS", "PP", "Engle-Granger", "Johansen trace", ... */
  test: string;
  /** What was tested, in plain words, e.g. "Unit-root test (ADF) on Crude". */
  title: string;
  /** Name of the statistic ("tau", "eta", "Z-tau", "F"). */
  statisticName: string;
  statistic: number;
  /** p-value, or null when no valid p-value exists (then pValueNote says why). */
  pValue: number | null;
  /** Set when the p-value is bounded rather than exact (e.g. "below 0.01: the statistic lies beyond the table's last column") or missing. */
  pValueNote?: string;
  /**
   * Set by a test that reads its p-value off a table when the statistic lies beyond the
   * table's ends: pValue is then the table's end probability and the truth lies 'below' or
   * 'above' it. Absent or null when the p-value is exact. Renderers print it as "< 0.01"
   * through formatBoundedPValue (addin/p-value-bound.ts).
   */
  pValueBound?: PValueBound;
  /** Critical values by level, keys like "1%", "5%", "10%". */
  critical: Record<string, number>;
  /** Which tail rejects: "lower" (statistic below the critical value) or "upper". */
  rejectTail: 'lower' | 'upper';
  /** Lagged differences in the test regression, or null where the test has no lags. */
  lags: number | null;
  /** How the lags were chosen: "fixed", "aic", "bic", "tstat". */
  lagRule?: string;
  /** Kernel bandwidth (lags in the Bartlett window), where the test uses a long-run variance. */
  bandwidth?: number;
  /** Observations in the test regression. */
  nobs: number;
  deterministic: Deterministic;
  /** The null hypothesis in words. */
  nullHypothesis: string;
  /** The alternative in words. */
  alternative: string;
  /** Anything the user should know before relying on the number. Empty when nothing. */
  warnings: string[];
  /** Further labelled values (e.g. Z-alpha beside Z-tau). Rendered after the standard fields. */
  details: ResultDetail[];
}

/**
 * True when the result rejects its null at the given level (by the p-value where there is one).
 * A p-value bounded from below at exactly alpha (KPSS "below 0.01" at the 1% level) rejects:
 * the true p-value is smaller.
 */
export function rejects(result: TestResult, alpha: number): boolean | null {
  if (result.pValue !== null) return result.pValue < alpha || (result.pValueBound === 'below' && result.pValue <= alpha);
  const key = `${Math.round(alpha * 1000) / 10}%`;
  const cv = result.critical[key];
  if (cv === undefined) return null;
  return result.rejectTail === 'lower' ? result.statistic < cv : result.statistic > cv;
}
