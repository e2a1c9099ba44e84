/**
 * The JSON object for any TestResult. Field names are a contract with scripts that read
 * them: statistic, pValue (with pValueNote and pValueBound, 'below' or 'above' when the p-value is
 * only a bound read off a table's end), lags, nobs, critical, bandwidth, test, nullHypothesis,
 * deterministic, warnings, details (an object by key). Fields may be added, never renamed.
 * Numbers that are not finite become null, so the object always parses.
 */
import { rejects, type TestResult } from '../../result';
import { READING_LEVEL } from './test-terminal';

/** A finite number, or null. */
export function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

/** The JSON fields of one test result. */
export function testResultJson(result: TestResult): Record<string, unknown> {
  const critical: Record<string, number | null> = {};
  for (const [level, v] of Object.entries(result.critical)) critical[level] = finiteOrNull(v);
  const details: Record<string, number | string | boolean | null> = {};
  for (const d of result.details) details[d.key] = typeof d.value === 'number' ? finiteOrNull(d.value) : d.value;
  return {
    test: result.test,
    title: result.title,
    statisticName: result.statisticName,
    statistic: finiteOrNull(result.statistic),
    pValue: finiteOrNull(result.pValue),
    pValueNote: result.pValueNote ?? null,
    pValueBound: result.pValueBound ?? null,
    critical,
    rejectTail: result.rejectTail,
    rejectsAt5: rejects(result, READING_LEVEL),
    lags: result.lags,
    lagRule: result.lagRule ?? null,
    bandwidth: result.bandwidth ?? null,
    nobs: result.nobs,
    deterministic: result.deterministic,
    nullHypothesis: result.nullHypothesis,
    alternative: result.alternative,
    warnings: result.warnings.slice(),
    details,
  };
}
