/**
 * The words each option accepts, shared by every function so one idea has one spelling. They
 * are the command line's words (addin/cli): deterministic terms none|const|trend, lag rules
 * aic|bic|tstat, bandwidth auto, the five Johansen cases, the hedge estimators.
 */
import { JOHANSEN_CASES, type JohansenCase } from '../../addin/johansen/deterministic-case';
import { DETERMINISTIC_WORDS, type Deterministic } from '../../addin/result';

export { DETERMINISTIC_WORDS, JOHANSEN_CASES };
export type { Deterministic, JohansenCase };

/** KPSS tests stationarity around a constant or a trend; it has no "none". */
export const KPSS_DETERMINISTIC_WORDS: readonly ('const' | 'trend')[] = ['const', 'trend'];

/** Rules that choose the lags of an augmented Dickey-Fuller regression. */
export const ADF_LAG_RULES = ['aic', 'bic', 'tstat'] as const;

/** Rules that choose the lags of a VAR-based test (lead-lag) or model (error correction uses aic only). */
export const VAR_LAG_RULES = ['aic', 'bic'] as const;

/** The bandwidth rule of the long-run variance (Newey-West automatic). */
export const BANDWIDTH_RULES = ['auto'] as const;

/** What a test cell shows: the headline number, the statistic, a labelled table, or a card. */
export const SHOW_WORDS = ['headline', 'stat', 'all', 'card'] as const;
export type Show = (typeof SHOW_WORDS)[number];

/** Hedge-ratio estimators (the command line's --hedge words). */
export const HEDGE_WORDS = ['ols', 'reverse-ols', 'tls', 'dols'] as const;
export type HedgeWord = (typeof HEDGE_WORDS)[number];

/** What MOOR.HEDGE returns: the slope (an elasticity when the prices are in logs) or the units of x to hold per unit of y at the latest prices. */
export const HEDGE_SHOW_WORDS = ['slope', 'units'] as const;

/** Which lead-lag test: auto (the one valid for the data), f, ty (Toda-Yamamoto) or ecm (error correction). */
export const LEAD_LAG_METHODS = ['auto', 'f', 'ty', 'ecm'] as const;

/** Information criteria for the VAR lag order. */
export const VAR_CRITERIA = ['aic', 'bic', 'hq', 'fpe'] as const;
export type VarCriterion = (typeof VAR_CRITERIA)[number];

/** What MOOR.SCREEN spills: the ranked pairs, or the grid of raw or adjusted p-values. */
export const SCREEN_SHOW_WORDS = ['list', 'matrix', 'adjusted'] as const;
export type ScreenShow = (typeof SCREEN_SHOW_WORDS)[number];

/** What MOOR.ROLLING spills: every statistic, or one of them. */
/** What MOOR.HALFLIFE returns: the half-life, an end of its 95% interval, or the labelled table. */
export const HALF_LIFE_SHOW_WORDS = ['value', 'low', 'high', 'all'] as const;

/** What MOOR.MOVINGHEDGE spills: one column, or all six. */
export const MOVING_HEDGE_SHOW_WORDS = ['ratio', 'smoothed', 'spread', 'zscore', 'all', 'latest'] as const;

/** What MOOR.AHEAD returns: the forecasts, a bound, the spread's path, or all. */
export const AHEAD_SHOW_WORDS = ['forecast', 'lower', 'upper', 'spread', 'all'] as const;

export const ROLLING_SHOW_WORDS = ['all', 'pvalue', 'beta', 'halflife'] as const;
export type RollingShow = (typeof ROLLING_SHOW_WORDS)[number];
