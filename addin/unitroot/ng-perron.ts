/**
 * Ng-Perron unit-root tests (Ng & Perron 2001): MZa, MZt, MSB and MPT (m-statistics.ts) on the
 * GLS-detrended series, with the autoregressive spectral estimate from the lag the modified AIC
 * chooses (by default). Null: a unit root; small values of each reject.
 *
 * The headline is MZa, the statistic Ng & Perron put first and whose size with the modified AIC
 * they found closest to nominal; MZt, MSB and MPT follow as details, each with its p-value and
 * critical values. p-values and the critical values that decide: the asymptotic end of
 * Mooring's simulated surfaces (tables/gls-unitroot-table.ts), one distribution for both, so a
 * p-value below 5% and a statistic beyond the 5% value always tell the same story. Ng & Perron's
 * (2001) Table 1 (asymptotic, recalled from memory) rides beside them as `publishedCritical`:
 * five of its recalled values sit off our simulated limits, and a row that showed them while its
 * p-value came from the simulation could contradict itself.
 */
import type { ResultDetail, TestResult } from '../result';
import { glsCriticalValues, glsPValue, ngPerronTableCritical, type CriticalLevels } from '../tables/gls-unitroot-table';
import { boundNote, GLS_DEFAULT_LAG_RULE, glsWarnings } from './dfgls';
import { glsCore, type GlsTestOptions } from './gls-core';
import { unitRootHypotheses } from './hypotheses';
import { adfRegression } from './adf-regression';
import { ADF_GRAM_WORK } from './adf-tau-gram';
import { M_STATISTIC_NAMES, mStatistics, mStatisticsFrom, type MStatisticName } from './m-statistics';
import { spectralInputsByGram } from './m-statistics-long';
import { schwertMaxLag } from './max-lag';

export interface MStatisticAnswer {
  statistic: number;
  pValue: number;
  pValueBound: 'below' | 'above' | null;
  /** From the same simulated distribution as the p-value. */
  critical: CriticalLevels;
  /** Ng & Perron (2001), Table 1, asymptotic; recalled from memory (tables/README.md). */
  publishedCritical: CriticalLevels;
}

export interface NgPerronResult extends TestResult {
  /** All four statistics with their p-values, critical values and Table 1's. */
  statistics: Record<MStatisticName, MStatisticAnswer>;
}

const LABELS: Record<MStatisticName, string> = {
  MZa: 'MZa (modified normalised bias)',
  MZt: 'MZt (modified t-ratio)',
  MSB: 'MSB (modified Sargan-Bhargava)',
  MPT: 'MPT (modified point-optimal)',
};

/**
 * The M statistics of the chosen regression. Where its design would be large (rows x columns^2
 * past ADF_GRAM_WORK, DF-GLS's threshold) they come from its cross products with refinement
 * (m-statistics-long.ts), else, or where that declines, from the QR fit.
 */
function chosenMStatistics(series: ArrayLike<number>, options: GlsTestOptions) {
  const T = series.length;
  const widest = typeof options.lags === 'number' ? options.lags : options.maxLags ?? schwertMaxLag(T);
  if (T * (widest + 1) * (widest + 1) <= ADF_GRAM_WORK) {
    const core = glsCore(series, options, GLS_DEFAULT_LAG_RULE);
    return { core, m: mStatistics(core.detrended.values, core.regression, core.deterministic, core.detrended.cbar) };
  }
  const core = glsCore(series, options, GLS_DEFAULT_LAG_RULE, 'tau');
  const { lags, nobs } = core.regression;
  const fast = nobs * (lags + 1) * (lags + 1) > ADF_GRAM_WORK ? spectralInputsByGram(core.detrended.values, lags) : null;
  const m = fast
    ? mStatisticsFrom(core.detrended.values, fast, core.deterministic, core.detrended.cbar)
    : mStatistics(core.detrended.values, adfRegression(core.detrended.values, lags, 'none'), core.deterministic, core.detrended.cbar);
  return { core, m };
}

export function ngPerronTest(series: ArrayLike<number>, options: GlsTestOptions = {}, name = 'the series'): NgPerronResult {
  const { core, m } = chosenMStatistics(series, options);
  const { deterministic, regression, choice } = core;
  const statistics = Object.fromEntries(M_STATISTIC_NAMES.map((s) => {
    const p = glsPValue(s, deterministic, m[s], null);
    return [s, { statistic: m[s], pValue: p.pValue, pValueBound: p.bound, critical: glsCriticalValues(s, deterministic, null), publishedCritical: ngPerronTableCritical(s, deterministic) }];
  })) as Record<MStatisticName, MStatisticAnswer>;
  const head = statistics.MZa;
  const { nullHypothesis, alternative } = unitRootHypotheses(name, deterministic);
  const details: ResultDetail[] = [];
  for (const s of M_STATISTIC_NAMES.slice(1)) {
    details.push({ key: s, label: LABELS[s], value: statistics[s].statistic });
    details.push({ key: `${s}PValue`, label: `p-value of ${s}`, value: statistics[s].pValue });
  }
  details.push(
    { key: 'spectralVariance', label: 'Autoregressive long-run variance of the detrended changes (unit scale)', value: m.s2AR },
    { key: 'cbar', label: 'GLS non-centrality c (a = 1 + c/T)', value: core.detrended.cbar },
    { key: 'maxLags', label: 'Largest lag searched', value: choice ? core.maxLags : null },
    { key: 'criterion', label: `Lag criterion at the choice (${core.lagRule})`, value: choice ? choice.criterion : null },
  );
  return {
    test: 'Ng-Perron',
    title: `Unit-root tests (Ng-Perron) on ${name}`,
    statisticName: 'MZa',
    statistic: head.statistic,
    pValue: head.pValue,
    ...(head.pValueBound ? { pValueBound: head.pValueBound, pValueNote: boundNote(head.pValueBound) } : {}),
    critical: { ...head.critical },
    rejectTail: 'lower',
    lags: regression.lags,
    lagRule: core.lagRule,
    nobs: regression.nobs,
    deterministic,
    nullHypothesis,
    alternative,
    warnings: glsWarnings(core.maxLags, choice?.lags ?? null, series.length, regression.nobs),
    details,
    statistics,
  };
}
