/**
 * The Ng-Perron tests (unitroot/ng-perron.ts) as the report carries them beside DF-GLS on each
 * series' levels. MZt heads the row: it is the t-ratio form, read on the same scale as the
 * DF-GLS t-ratio beside it; MZa, MSB and MPT follow, each with its statistic, p-value, critical
 * values and decision at the report's level. They keep their size where the changes are
 * autocorrelated (a negative moving-average part makes ADF and DF-GLS reject too often), which
 * is what they add. They never decide the order of integration (ADF or DF-GLS does).
 */
import { rejects } from '../result';
import { NG_PERRON_TABLE_SOURCE } from '../tables/gls-unitroot-table';
import { boundNote } from '../unitroot/dfgls';
import { M_STATISTIC_NAMES, type MStatisticName } from '../unitroot/m-statistics';
import type { NgPerronResult } from '../unitroot/ng-perron';
import { finiteOrNull, summariseTest, type TestSummary } from './test-summary';

/** One M statistic with its decision. */
export interface MStatisticSummary {
  name: MStatisticName;
  statistic: number | null;
  pValue: number | null;
  pValueBound: 'below' | 'above' | null;
  critical: Record<string, number>;
  /** Ng & Perron (2001), Table 1 (recalled from memory), beside the critical values that decide. */
  publishedCritical: Record<string, number>;
  rejects: boolean | null;
}

/** Ng-Perron on the levels: a TestSummary headed by MZt, all four statistics, and where the critical values come from. */
export interface NgPerronSummary extends TestSummary {
  statistics: MStatisticSummary[];
  /** The source of publishedCritical as the table states it (Ng & Perron 2001, Table 1; its values recalled, not read). */
  criticalSource: string;
  /** Always false: shown for comparison; ADF or DF-GLS decides the order. */
  decides: false;
}

/** The one statistic of an Ng-Perron result as a TestResult of its own (same rows, lags, terms and hypotheses). */
function asHeadline(result: NgPerronResult, name: MStatisticName): NgPerronResult {
  const s = result.statistics[name];
  return {
    ...result,
    statisticName: name,
    statistic: s.statistic,
    pValue: s.pValue,
    pValueBound: s.pValueBound ?? undefined,
    pValueNote: s.pValueBound ? boundNote(s.pValueBound) : undefined,
    critical: { ...s.critical },
  };
}

/** Summarises an Ng-Perron result at alpha, headed by MZt. */
export function summariseNgPerron(result: NgPerronResult, alpha: number): NgPerronSummary {
  const statistics = M_STATISTIC_NAMES.map((name): MStatisticSummary => {
    const one = asHeadline(result, name);
    const critical: Record<string, number> = {};
    for (const [level, v] of Object.entries(one.critical)) if (Number.isFinite(v)) critical[level] = v;
    return {
      name, statistic: finiteOrNull(one.statistic), pValue: finiteOrNull(one.pValue), pValueBound: one.pValueBound ?? null,
      critical, publishedCritical: { ...result.statistics[name].publishedCritical }, rejects: rejects(one, alpha),
    };
  });
  return { ...summariseTest(asHeadline(result, 'MZt'), alpha), statistics, criticalSource: NG_PERRON_TABLE_SOURCE, decides: false };
}
