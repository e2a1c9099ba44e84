/**
 * Johansen's test for the number of long-run (cointegrating) relations among 2 to 12
 * series (Johansen 1988, 1991, 1995), in any of the five deterministic cases.
 *
 * From the reduced-rank regression's eigenvalues λ_1 >= ... >= λ_m (n observations):
 *   trace_r    = -n Σ_{j>r} ln(1 - λ_j)    H0: at most r relations, H1: more than r
 *   maxEigen_r = -n ln(1 - λ_{r+1})        H0: at most r relations, H1: exactly r + 1
 * for r = 0..m-1; large values reject. The rank is chosen sequentially at alpha.
 *
 * Conventions (the reference library's, so 'none' and 'constant' compare exactly):
 * n = T - K - 1 observations, S = R'R / n, eigenvalues in descending order.
 */
import { powerOfTwoScale, scaled } from '../linalg/power-of-two-scale';
import type { Deterministic, ResultDetail, TestResult } from '../result';
import { JOHANSEN_CASE_LABEL, type JohansenCase, type JohansenStatisticKind } from './deterministic-case';
import { johansenDesign } from './johansen-design';
import { checkJohansenInput } from './johansen-input';
import { normalisedRelations } from './johansen-relations';
import { driftWarnings, eigenvalueWarnings, listNames, sampleWarnings, simulatedTableWarning } from './johansen-warnings';
import { rankCriticalValues, rankPValue } from './rank-test-tables';
import { rankVerdict, sequentialRank } from './rank-verdict';
import { reducedRankRegression } from './reduced-rank-regression';

export type { JohansenCase } from './deterministic-case';

/** Options of johansenTest; every field has a default. */
export interface JohansenOptions {
  /** Deterministic case (default 'constant'); see deterministic-case.ts. */
  case?: JohansenCase;
  /** K, the number of lagged changes in the error-correction model (default 1). */
  lags?: number;
  /** Level for the sequential rank choice (default 0.05). */
  alpha?: number;
  /** Scale the statistics by (n - m(K+1)) / n (Reinsel & Ahn 1992); default false. */
  smallSampleCorrection?: boolean;
}

/** Everything the Johansen test reports: both statistic sequences, the rank choices, the relations and the verdict. */
export interface JohansenResult {
  case: JohansenCase;
  lags: number;
  /** n = T - K - 1 observations in the regression. */
  nobs: number;
  /** λ_1 >= ... >= λ_m, the squared canonical correlations. */
  eigenvalues: number[];
  /** trace[r] tests "at most r relations" against "more than r", r = 0..m-1. */
  trace: TestResult[];
  /** maxEigen[r] tests "at most r relations" against "exactly r + 1". */
  maxEigen: TestResult[];
  /** The sequential choices at alpha. */
  rank: { trace: number; maxEigen: number };
  /** beta[i][j]: weight of series i in relation j (column j, ordered by eigenvalue); beta[0][j] = 1. */
  beta: number[][];
  /** alpha[i][j]: how fast series i's changes respond to relation j's deviation (consistent with beta). */
  alpha: number[][];
  /** Restricted cases: the constant or trend coefficient of each relation (with beta's scaling). */
  deterministicInRelation?: number[];
  /** (n - m(K+1)) / n when the small-sample correction is on, else 1. */
  smallSampleFactor: number;
  verdict: string;
  warnings: string[];
}

/** The TestResult's three-way deterministic label for each of the five cases. */
const DETERMINISTIC_OF_CASE: Record<JohansenCase, Deterministic> = {
  none: 'none',
  'restricted-constant': 'const',
  constant: 'const',
  'restricted-trend': 'trend',
  trend: 'trend',
};

/**
 * Runs the Johansen trace and maximum-eigenvalue tests on the block of series (equal
 * lengths, oldest row first). Throws a MooringInputError on unusable input.
 */
export function johansenTest(block: ArrayLike<number>[], options: JohansenOptions = {}, names?: string[]): JohansenResult {
  const input = checkJohansenInput(block, options, names);
  const { caseName, lags, alpha } = input;
  const m = input.block.length;
  // Eigenvalues and statistics are free of units; the moment matrices are not (they overflow
  // for prices of 1e300 and vanish for 1e-300). Each series is brought to a size near one by a
  // power of two, and the relations and loadings are converted back (johansen-relations.ts).
  const scales = input.block.map((s) => powerOfTwoScale(s));
  const unitBlock = input.block.map((s, i) => scaled(s, scales[i]));
  const design = johansenDesign(unitBlock, lags, caseName, input.names);
  const fit = reducedRankRegression(design);
  const n = fit.nobs;
  const eigenvalues = fit.eigenvalues.slice(0, m);
  // Reinsel & Ahn (1992): replace n by n - m p, with n = T - K - 1 the observations used and
  // p = K + 1 the order of the VAR in levels (the form of the factor is recalled from memory).
  const factor = input.smallSampleCorrection ? (n - m * (lags + 1)) / n : 1;
  const logs = eigenvalues.map((l) => Math.log1p(-l));

  const perEquation = design.shortRun.length + design.levels.length;
  const warnings = [
    ...simulatedTableWarning(caseName),
    ...driftWarnings(caseName, unitBlock, input.names),
    ...sampleWarnings(n, perEquation, input.smallSampleCorrection),
    ...eigenvalueWarnings(eigenvalues),
  ];
  if (input.smallSampleCorrection) {
    warnings.push(
      `Statistics scaled by (n - m(K+1))/n = (${n} - ${m}x${lags + 1})/${n} = ${factor.toFixed(4)} (Reinsel & Ahn 1992); the critical values and p-values are still the asymptotic ones.`,
    );
  }

  const who = listNames(input.names);
  const build = (kind: JohansenStatisticKind, r: number): TestResult => {
    const raw = kind === 'trace' ? -n * logs.slice(r).reduce((a, b) => a + b, 0) : -n * logs[r];
    const statistic = factor * raw;
    const { critical, source } = rankCriticalValues(kind, caseName, m - r);
    const { pValue, bound, note } = rankPValue(statistic, kind, caseName, m - r);
    const details: ResultDetail[] = [
      { key: 'case', label: 'Deterministic case', value: `${caseName} (${JOHANSEN_CASE_LABEL[caseName]})` },
      { key: 'eigenvalue', label: `Eigenvalue ${r + 1}`, value: eigenvalues[r] },
      { key: 'commonTrends', label: 'Common stochastic trends under the null (n - r)', value: m - r },
      { key: 'criticalSource', label: 'Critical values from', value: source === 'published' ? 'MacKinnon, Haug & Michelis (1999)' : "Mooring's simulation" },
    ];
    if (input.smallSampleCorrection) {
      details.push({ key: 'uncorrectedStatistic', label: 'Statistic before the small-sample correction', value: raw });
      details.push({ key: 'smallSampleFactor', label: 'Small-sample factor (n - m(K+1))/n', value: factor });
    }
    return {
      test: kind === 'trace' ? 'Johansen trace' : 'Johansen maximum eigenvalue',
      title: `Johansen ${kind === 'trace' ? 'trace' : 'maximum-eigenvalue'} test of ${atMost(r)} among ${who}`,
      statisticName: kind === 'trace' ? 'trace' : 'lambda-max',
      statistic,
      pValue,
      ...(note === undefined ? {} : { pValueNote: note, pValueBound: bound }),
      critical,
      rejectTail: 'upper',
      lags,
      lagRule: 'fixed',
      nobs: n,
      deterministic: DETERMINISTIC_OF_CASE[caseName],
      nullHypothesis: `${atMost(r)} among ${who}`,
      alternative: kind === 'trace'
        ? `${r === 0 ? 'at least 1 long-run relation' : `more than ${relationCount(r)}`} among ${who}`
        : `exactly ${relationCount(r + 1)} among ${who}`,
      warnings: [...warnings],
      details,
    };
  };
  const trace = eigenvalues.map((_, r) => build('trace', r));
  const maxEigen = eigenvalues.map((_, r) => build('maxEigen', r));
  const rank = {
    trace: sequentialRank(trace.map((t) => t.pValue as number), alpha),
    maxEigen: sequentialRank(maxEigen.map((t) => t.pValue as number), alpha),
  };
  const relations = normalisedRelations(fit, m, input.names, scales);
  warnings.push(...relations.warnings);

  const result: JohansenResult = {
    case: caseName,
    lags,
    nobs: n,
    eigenvalues,
    trace,
    maxEigen,
    rank,
    beta: relations.beta,
    alpha: relations.alpha,
    smallSampleFactor: factor,
    verdict: rankVerdict(input.names, rank, alpha),
    warnings,
  };
  if (design.inRelation !== null) result.deterministicInRelation = relations.deterministic;
  return result;
}

/** "1 long-run relation", "2 long-run relations". */
function relationCount(count: number): string {
  return `${count} long-run relation${count === 1 ? '' : 's'}`;
}

/** The null hypothesis' count in words: "no long-run relation", "at most 2 long-run relations". */
function atMost(r: number): string {
  return r === 0 ? 'no long-run relation' : `at most ${relationCount(r)}`;
}
