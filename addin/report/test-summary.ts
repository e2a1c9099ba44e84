/**
 * A test result as plain data for the diagnostic report: the fields a reader of the report
 * needs (statistic, p-value, critical values, lags, rows, hypotheses, warnings) and the
 * decision at the report's level. Only numbers, strings, booleans and null, so the report
 * passes through JSON, a Web Worker message or the pane unchanged. A statistic that is not a
 * finite number (an exact fit gives minus infinity) becomes null with a note saying why.
 */
import { rejects, type PValueBound, type TestResult } from '../result';

/** One test, summarised for the report. */
export interface TestSummary {
  /** Trade name: "ADF", "KPSS", "Engle-Granger", "Johansen trace", ... */
  test: string;
  title: string;
  statisticName: string;
  /** The statistic, or null when it is not a finite number (see statisticNote). */
  statistic: number | null;
  statisticNote: string | null;
  pValue: number | null;
  pValueNote: string | null;
  /** 'below' or 'above' when pValue is a table's end and only a bound ("< 0.01"); null when exact. */
  pValueBound: PValueBound;
  /** Critical values by level ("1%", "5%", "10%"); non-finite entries are left out. */
  critical: Record<string, number>;
  rejectTail: 'lower' | 'upper';
  /** Whether the null is rejected at the report's level; null when no decision exists. */
  rejects: boolean | null;
  lags: number | null;
  lagRule: string | null;
  bandwidth: number | null;
  observations: number;
  deterministic: string;
  nullHypothesis: string;
  alternative: string;
  warnings: string[];
}

/** A finite number, or null. */
export function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** Summarises a TestResult, with its decision at alpha. */
export function summariseTest(result: TestResult, alpha: number): TestSummary {
  const critical: Record<string, number> = {};
  for (const [level, v] of Object.entries(result.critical)) if (Number.isFinite(v)) critical[level] = v;
  const statistic = finiteOrNull(result.statistic);
  return {
    test: result.test,
    title: result.title,
    statisticName: result.statisticName,
    statistic,
    statisticNote: statistic === null
      ? (result.statistic === -Infinity ? 'minus infinity: the residual is exactly zero' : result.statistic === Infinity ? 'infinity' : 'not available')
      : null,
    pValue: finiteOrNull(result.pValue),
    pValueNote: result.pValueNote ?? null,
    pValueBound: result.pValueBound ?? null,
    critical,
    rejectTail: result.rejectTail,
    rejects: rejects(result, alpha),
    lags: result.lags,
    lagRule: result.lagRule ?? null,
    bandwidth: result.bandwidth ?? null,
    observations: result.nobs,
    deterministic: result.deterministic,
    nullHypothesis: result.nullHypothesis,
    alternative: result.alternative,
    warnings: result.warnings.slice(),
  };
}
