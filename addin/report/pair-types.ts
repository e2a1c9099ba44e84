/**
 * The shape of one pair in the pairwise diagnostic: cointegration evidence, the long-run
 * relation, how fast the spread closes, where it stands now, and which series leads. Plain
 * data only (see report-types.ts). A part the data cannot support (a copied column leaves no
 * spread to model) is null, and `unavailable` says why in the engine's own words.
 */
import type { CausalityMethod } from '../causality/choose-causality-test';
import type { JohansenSummary } from './report-types';
import type { TestSummary } from './test-summary';
import type { HalfLifeInterval } from '../spread/half-life-interval';

/** How strong the residual-based evidence of a long-run relation is. */
export type CointegrationEvidence = 'both-directions' | 'one-direction' | 'none';

/** Engle-Granger in one normalisation, with its step-1 line. */
export interface EngleGrangerSummary extends TestSummary {
  dependent: string;
  regressor: string;
  beta: number;
  intercept: number | null;
}

/** Cointegration tests of the pair. */
export interface PairCointegration {
  /** Both series I(1): the condition the tests assume. */
  bothIntegrated: boolean;
  engleGranger: { aOnB: EngleGrangerSummary; bOnA: EngleGrangerSummary; agree: boolean };
  /** Phillips-Ouliaris Z-t of the relation's dependent on its regressor. */
  phillipsOuliaris: TestSummary | null;
  johansen: JohansenSummary | null;
  evidence: CointegrationEvidence;
  /** The report's decision: both I(1) and Engle-Granger rejects in at least one direction. */
  cointegrated: boolean;
  verdict: string;
  /**
   * Where one price is I(0) and the other I(1), the residual tests and Johansen do not apply and
   * the bounds test (Pesaran, Shin & Smith 2001; addin/ardl) answers instead: first on second,
   * case 3, orders by AIC. Absent otherwise.
   */
  bounds?: BoundsSummary | null;
  /** Johansen's restriction tests (weights 1 and -1; who adjusts), where Johansen ran. */
  restrictions?: PairRestrictions | null;
}

/** The bounds test's answer for a pair of mixed orders. */
export interface BoundsSummary {
  dependent: string;
  regressor: string;
  statistic: number;
  tStatistic: number;
  critical5: { lower: number; upper: number };
  pValue: { lower: number; upper: number } | null;
  criticalSource: string;
  outcome: 'relation' | 'no-relation' | 'inconclusive';
  verdict: string;
}

/** A hedge ratio estimate: y = intercept + beta x. */
export interface LineEstimate {
  beta: number;
  intercept: number;
}

/** The long-run relation of the pair, dependent on regressor. */
export interface LongRunRelation {
  dependent: string;
  regressor: string;
  /** One sentence: why this series is the dependent one. */
  normalisationReason: string;
  /** 'elasticity' when the series are logs (the slope is then not a quantity to hold), else 'units'. */
  slopeMeaning: 'units' | 'elasticity';
  /** The last row's prices (exp of the logs when logged), at which hedgeUnits are sized. */
  latestPrices: { y: number; x: number };
  /** The dynamic-OLS slope and the units to hold, in words (hedge-units.ts). */
  hedgeText: string;
  /** The least-squares line (the one the spread is built on); hedgeUnits = units of the regressor per unit of the dependent at the latest prices. */
  ols: LineEstimate & { hedgeUnits: number };
  /** Dynamic OLS: the estimate of the relation. Its standard error is the engine's one estimator (dynamic-ols.ts), described in standardErrorMethod. */
  dynamicOls: LineEstimate & { hedgeUnits: number; standardError: number; standardErrorMethod: string; leadsLags: number; bandwidth: number; observations: number };
  /** The relation in words: "DockDiesel = 0.4123 + 1.148 GateGasoil" (logs marked). */
  text: string;
  /** The dynamic-OLS beta on each half of the sample; null when the halves are too short. */
  halves: {
    first: { beta: number; standardError: number; from: string; to: string };
    second: { beta: number; standardError: number; from: string; to: string };
    /** |difference| divided by the standard error of the difference. */
    differenceInStandardErrors: number;
    stable: boolean;
  } | null;
  halvesNote: string | null;
}

/** One side of the error-correction model. */
export interface AdjustmentSide {
  series: string;
  /** Coefficient on yesterday's gap in this series' change equation. */
  speed: number;
  standardError: number;
  pValue: number;
  /** Whether this series moves back toward the relation, significantly at the report's level. */
  corrects: boolean;
}

/** How the gap closes: error-correction model and the spread's own AR(1). */
export interface AdjustmentReport {
  ecm: {
    lags: number;
    observations: number;
    dependent: AdjustmentSide;
    regressor: AdjustmentSide;
    /** Speed of the gap with both sides adjusting. */
    combinedSpeed: number;
    /** Half-life implied by the error-correction model, both prices adjusting: not THE half-life (that is spreadAr1.halfLife). */
    ecmHalfLife: number | null;
    ecmHalfLifeNote: string | null;
  };
  spreadAr1: {
    /** AR(1) coefficient of the spread. */
    phi: number;
    speed: number;
    /** THE half-life of the pair, the same number every surface shows (spread/pair-spread.ts). */
    halfLife: number | null;
    halfLifeNote: string | null;
    /** How the half-life is found, in words. */
    definition: string;
    /** The half-life's 95% interval, with its method in words (spread/half-life-interval.ts). */
    halfLifeInterval: HalfLifeInterval & { method: string };
  };
  verdict: string;
}

/** The spread (on the least-squares line of dependent on regressor) and where it stands now. */
export interface SpreadReport {
  /** What the spread is, in words. */
  definition: string;
  /** The line the spread is built on: the least-squares line (not the dynamic-OLS estimate). */
  line: LineEstimate & { method: 'least-squares' };
  mean: number;
  standardDeviation: number;
  /** mean + 2 standard deviations and mean - 2 standard deviations: the chart's bands. */
  bandUpper: number;
  bandLower: number;
  latest: number;
  latestRow: string;
  latestDate: string | null;
  /** z-score of the latest value over the whole sample. */
  latestZ: number;
  /** z-score of the latest value over the trailing window. */
  latestRollingZ: number | null;
  rollingWindow: number;
  /** Every value, for the chart with bands at mean +/- 2 standard deviations. */
  values: number[];
  /** Trailing-window z-score of every row (null before the window fills). */
  rollingZ: (number | null)[];
  verdict: string;
}

/** One direction of the lead-lag question, "does cause lead effect?". */
export interface LeadLagDirectionSummary {
  cause: string;
  effect: string;
  /** The headline test (for the error-correction form, its short-run test). */
  test: TestSummary;
  /** The error-correction form's long-run test; null for the other tests. */
  longRun: TestSummary | null;
  /** Whether this direction shows a lead at the report's level (for the error-correction form: either test at half the level). */
  leads: boolean;
  /** The level each test's `rejects` is judged at: the report's, or half of it for the error-correction form's two tests. */
  level: number;
}

/** Lead-lag evidence between the two series, both directions, from the causality module's decision function. */
export interface LeadLagReport {
  /** The valid test for these data: 'f-levels', 'f-differences', 'error-correction' or 'toda-yamamoto'. */
  method: CausalityMethod;
  /** One sentence: why this test is the valid one here. */
  why: string;
  /** Does a lead b? */
  aLeadsB: LeadLagDirectionSummary;
  /** Does b lead a? */
  bLeadsA: LeadLagDirectionSummary;
  /** The leader, when exactly one direction shows a lead; null otherwise. */
  leader: string | null;
  pattern: 'one-way' | 'both-ways' | 'neither';
  verdict: string;
  /** The lead-lag cautions (it is evidence, not cause and effect) and the tests' own warnings. */
  cautions: string[];
}

/** A part of the pair's diagnosis the data could not support. */
export interface UnavailablePart {
  part: string;
  reason: string;
}

/** What a pair warning is about, so a surface can group or mark it. */
export type PairWarningKind =
  | 'inputs-not-integrated'
  | 'directions-disagree'
  | 'residual-tests-disagree'
  | 'johansen-disagrees'
  | 'near-unit-root'
  | 'relation-moved'
  | 'part-unavailable';

/** One warning of a pair. */
export interface PairWarning {
  kind: PairWarningKind;
  text: string;
}

/** The full diagnosis of one pair. */
/** The hedge ratio through time by the Kalman filter (report/pair-moving-hedge.ts), one value per row. */
export interface MovingHedgeReport {
  dependent: string;
  regressor: string;
  stateVar: number;
  obsVar: number;
  logLikelihood: number;
  diffuseRows: number;
  /** Filtered (from the rows up to each one), null in the set-up rows. */
  beta: (number | null)[];
  betaStd: (number | null)[];
  /** Smoothed (from every row) with its 95% band. */
  betaSmoothed: number[];
  betaSmoothedLow: number[];
  betaSmoothedHigh: number[];
  /** The one-step-ahead spread over its standard deviation, null in the set-up rows. */
  spreadStandardised: (number | null)[];
  latest: { beta: number; betaStd: number; low: number; high: number; text: string };
  fixedBeta: number;
  shareOutsideBand: number;
  driftText: string;
  assumptions: string;
  driftMeaning: string;
  warnings: string[];
}

/** Where a related pair is heading if the relation holds (report/pair-forecast.ts). */
export interface PairForecastReport {
  /** [dependent, regressor]. */
  series: string[];
  case: string;
  lags: number;
  rank: number;
  horizon: number;
  /** The dates after the last row in the data's spacing, or null without calendar dates. */
  dates: string[] | null;
  /** forecast[h][i]: series i, h + 1 rows ahead; lower and upper its 95% interval. */
  forecast: number[][];
  lower: number[][];
  upper: number[][];
  /** The Johansen relation normalised on the dependent: its recent values (from row recentFrom), equilibrium, path and band. */
  spread: { text: string; mean: number; recentFrom: number; recent: number[]; path: number[]; lower: number[]; upper: number[] };
  bandNote: string;
  warnings: string[];
}

/** Johansen's restriction tests of a pair (one relation): weights 1 and -1, and who adjusts. */
export interface PairRestrictions {
  /** The relation is the first series minus the second, up to scale (chi-square LR test). */
  oneToOne: { statistic: number; df: number; pValue: number };
  /** For each series: the test that its adjustment is zero (a small p-value: it moves to close the gap). */
  adjusts: { series: string; statistic: number; df: number; pValue: number }[];
}

export interface PairReport {
  a: string;
  b: string;
  cointegration: PairCointegration;
  leadLag: LeadLagReport | null;
  relation: LongRunRelation | null;
  adjustment: AdjustmentReport | null;
  spread: SpreadReport | null;
  /** The hedge ratio through time (Kalman filter); null when it could not be estimated. */
  movingHedge: MovingHedgeReport | null;
  /** The error-correction forecast, for related pairs; null otherwise. */
  forecast: PairForecastReport | null;
  unavailable: UnavailablePart[];
  /** Plain-language verdicts at the report's level, in reading order. */
  verdicts: string[];
  warnings: PairWarning[];
}
