/**
 * Loads the reference fixtures written by tests/reference/make_fixtures.py (statsmodels
 * 0.13.5, Debian python3-statsmodels) and types their contents. The field meanings and
 * the statsmodels calls behind each file are in tests/reference/README.md.
 *
 * JSON has no NaN or infinity: where statsmodels produced one, the file holds null.
 */
import { readFileSync } from 'node:fs';

/** Reads tests/reference/fixtures/<name>.json (name without extension) and parses it. */
export function loadFixture<T>(name: string): T {
  const url = new URL(`./fixtures/${name}.json`, import.meta.url);
  return JSON.parse(readFileSync(url, 'utf8')) as T;
}

/** The input series `id` of a fixture file; throws if the file does not hold it. */
export function fixtureSeries(file: FixtureFile<unknown>, id: string): number[] {
  const values = file.series[id];
  if (!values) throw new Error(`fixture series '${id}' not found (have: ${Object.keys(file.series).join(', ')})`);
  return values;
}

/** Header shared by every fixture file, then the inputs and the cases. */
export interface FixtureFile<C> {
  generatedBy: 'tests/reference/make_fixtures.py';
  library: 'statsmodels 0.13.5, Debian python3-statsmodels';
  statsmodelsVersion: string;
  numpy: string;
  scipy: string;
  /** Seed of each simulated family (absent in ols-longley). */
  seeds?: Record<string, number>;
  /** Every series the cases use, by id, exactly as statsmodels received it. */
  series: Record<string, number[]>;
  cases: C[];
}

/** Critical values keyed by test size, as in the unit-root and Engle-Granger tests. */
export interface Critical3 {
  '1%': number;
  '5%': number;
  '10%': number;
}

export type LagRule = 'aic' | 'bic' | 'tstat';

export interface AdfCase {
  series: string;
  deterministic: 'none' | 'const' | 'trend';
  /** A lag-search rule, or a fixed number of lagged differences. */
  lags: LagRule | number;
  /** The maxlag passed to statsmodels; null = its default rule (or a fixed-lag case). */
  maxLags: number | null;
  /** The ceiling the search actually used (default rule worked out); null for fixed lags. */
  maxLagsSearched: number | null;
  statistic: number;
  pValue: number;
  usedLags: number;
  /** Rows in the final test regression. */
  nobs: number;
  critical: Critical3;
  /** Best criterion value (AIC/BIC) or |t| of the deciding lag (tstat); lag searches only. */
  icBest?: number;
}

export interface KpssCase {
  series: string;
  deterministic: 'const' | 'trend';
  lags: 'auto' | 'legacy' | number;
  statistic: number;
  /** Interpolated in the KPSS table and clamped to [0.01, 0.10]. */
  pValue: number;
  /** True when the statistic lies outside the table's 10%..1% range (p-value clamped). */
  pValueBeyondTable: boolean;
  /** Bartlett truncation lag actually used. */
  bandwidth: number;
  nobs: number;
  critical: { '10%': number; '5%': number; '2.5%': number; '1%': number };
}

export interface OlsCase {
  y: string;
  x: string[];
  /** Parameter order: 'const' first, then the regressors in order. */
  regressors: string[];
  params: number[];
  bse: number[];
  tvalues: number[];
  pvalues: number[];
  ssr: number;
  /** sigma^2 = ssr / dfResid. */
  scale: number;
  llf: number;
  aic: number;
  bic: number;
  rsquared: number;
  rsquaredAdj: number;
  fStatistic: number;
  fPValue: number;
  nobs: number;
  dfResid: number;
  dfModel: number;
  covParams: number[][];
  conditionNumber: number;
}

export interface CointCase {
  /** Dependent series of the step-1 regression. */
  y: string;
  x: string[];
  deterministic: 'const' | 'trend' | 'none';
  lags: LagRule | number;
  maxLags: number | null;
  statistic: number;
  pValue: number;
  /** null entries for 'none' (statsmodels has no table for it). */
  critical: { '1%': number | null; '5%': number | null; '10%': number | null };
  /** Lags and rows of the residual ADF regression. */
  usedLags: number;
  nobs: number;
  /** Step-1 slopes on x, in order. */
  beta: number[];
  intercept: number | null;
  trendCoefficient: number | null;
  residualSsr: number;
}

export interface JohansenLevels {
  '10%': number;
  '5%': number;
  '1%': number;
}

export interface JohansenCase {
  series: string[];
  deterministic: 'none' | 'constant';
  /** Lagged differences in the error-correction form (k_ar_diff). */
  lagDiffs: number;
  /** T - lagDiffs - 1. */
  nobs: number;
  /** Descending. */
  eigenvalues: number[];
  /** trace[r]: H0 rank <= r. */
  trace: number[];
  maxEigen: number[];
  traceCritical: JohansenLevels[];
  maxEigenCritical: JohansenLevels[];
  /** beta[j]: j-th eigenvector divided by its first element (first variable's weight 1). */
  beta: number[][];
  /** eigenvectors[j]: as statsmodels returns them (v' S11 v = 1, signs set by v[0][0]). */
  eigenvectors: number[][];
  /** The same test with the level lagged one period; differs from the above when lagDiffs = 0. */
  levelLagOne: { eigenvalues: number[]; trace: number[]; maxEigen: number[]; nobs: number };
  sameAsLevelLagOne: boolean;
}

export interface ChiSquareResult {
  statistic: number;
  pValue: number;
  df: number;
}

export interface GrangerLag {
  lag: number;
  /** Rows used at this lag order: T - lag. */
  nobs: number;
  fStatistic: number;
  pValue: number;
  dfNum: number;
  dfDenom: number;
  chi2: ChiSquareResult;
  lr: ChiSquareResult;
  ssrRestricted: number;
  ssrUnrestricted: number;
}

export interface GrangerCase {
  cause: string;
  effect: string;
  lags: GrangerLag[];
}

/** A Granger case on series read from a CSV file of tests/reference/data, with the columns they came from. */
export interface GrangerLevelsCase extends GrangerCase {
  /** The file, from the repository root: "tests/reference/data/macrodata.csv". */
  file: string;
  /** The file's columns of the cause and the effect, as given (no logs, no differences). */
  columns: { cause: string; effect: string };
}

export interface VarSelectCase {
  series: string[];
  maxLags: number;
  trend: 'const';
  /** Common sample size for every order: T - maxLags. */
  nobs: number;
  selected: { aic: number; bic: number; hq: number; fpe: number };
  /** Criterion values for p = 0, 1, ..., maxLags. */
  ics: { aic: number[]; bic: number[]; hqic: number[]; fpe: number[] };
}

export interface VarWaldCase {
  /** Column order of the VAR. */
  series: string[];
  cause: string;
  effect: string;
  p: number;
  dmax: number;
  lagsFitted: number;
  trend: 'const';
  nobs: number;
  restriction: {
    equation: string;
    variable: string;
    lags: number[];
    /** Rows of params (constant row 0, then lag 1 of each variable, lag 2, ...). */
    paramsRows: number[];
    /** Positions in vec(B), i.e. row * K + equation, as in cov_params(). */
    vecIndex: number[];
  };
  coefficients: number[];
  statistic: number;
  df: number;
  pValue: number;
  allLagsCheck: { lagsFitted: number; nobs: number; statistic: number; pValue: number; df: number };
}

export interface ZivotAndrewsCase {
  series: string;
  breakIn: 'level' | 'slope' | 'both';
  trim: number;
  lags: 'aic' | number;
  maxLags: number | null;
  statistic: number;
  pValue: number;
  critical: Critical3;
  usedLags: number;
  /** 0-based; see the README for what it points at in each model. */
  breakIndex: number;
}

/** The wandering line y_t = a_t + b_t x_t + e_t (makers/state_space.py): a fixed-variance pass or the library's maximum. */
export interface KalmanCase {
  y: string;
  x: string;
  kind: 'fixed' | 'estimated';
  stateVar: number;
  obsVar: number;
  logLikelihood: number;
  /** Fixed cases only: rows of the diffuse period and the states, standard deviations and one-step errors, one per row. */
  nobsDiffuse?: number;
  filteredIntercept?: number[];
  filteredSlope?: number[];
  filteredInterceptStd?: number[];
  filteredSlopeStd?: number[];
  smoothedIntercept?: number[];
  smoothedSlope?: number[];
  smoothedInterceptStd?: number[];
  smoothedSlopeStd?: number[];
  forecastError?: number[];
  forecastErrorVar?: number[];
}

/** A VECM forecast (makers/forecast.py): statsmodels' VECM(...).fit().predict(steps, alpha=0.05). */
export interface VecmForecastCase {
  series: string[];
  case: 'none' | 'restricted-constant' | 'constant' | 'restricted-trend' | 'trend';
  statsmodelsDeterministic: string;
  lags: number;
  rank: number;
  horizon: number;
  /** forecast[h][i]: series i, h + 1 steps ahead; lower and upper the 95% interval. */
  forecast: number[][];
  lower: number[][];
  upper: number[][];
  sigmaU: number[][];
  alpha: number[][];
  beta: number[][];
  gamma: number[][];
  llf: number;
}

/** Each fixture file's name and contents, for `loadFixture<Fixtures['adf']>('adf')`. */
export interface Fixtures {
  adf: FixtureFile<AdfCase>;
  kpss: FixtureFile<KpssCase>;
  'ols-longley': FixtureFile<OlsCase>;
  coint: FixtureFile<CointCase>;
  johansen: FixtureFile<JohansenCase>;
  granger: FixtureFile<GrangerCase>;
  'granger-levels': FixtureFile<GrangerLevelsCase>;
  'var-select': FixtureFile<VarSelectCase>;
  'var-wald': FixtureFile<VarWaldCase>;
  'zivot-andrews': FixtureFile<ZivotAndrewsCase>;
  kalman: FixtureFile<KalmanCase>;
  'vecm-forecast': FixtureFile<VecmForecastCase>;
}

export type FixtureName = keyof Fixtures;
