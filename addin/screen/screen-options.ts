/**
 * The options of a pair screen, their defaults and their checks. The defaults are those of a
 * single Engle-Granger test (a constant in the step-1 regression, lags chosen by AIC up to
 * Schwert's maximum capped at T/2 - 1), so a screened pair reads exactly as the same pair
 * tested alone.
 */
import { MooringInputError } from '../errors';
import { LAG_RULES, type LagRule } from '../unitroot/adf-lag-search';
import type { LagOption } from '../unitroot/adf-core';

/** Fewest shared observations a pair needs by default (the cleaner's default: about 20 for cointegration work). */
export const DEFAULT_MIN_OBSERVATIONS = 20;

/** Fewest shared observations any pair may be tested on (the half-life needs 10). */
export const SMALLEST_MIN_OBSERVATIONS = 10;

/** What a caller may set; every field has a default. */
export interface ScreenOptions {
  /** Level of the chance sentence and of the discoveries (default 0.05). */
  alpha?: number;
  /** Lagged changes in each residual ADF: a whole number or a rule (default 'aic'). */
  lags?: LagOption;
  /** Largest lag a rule searches (default Schwert's rule for each pair, capped at T/2 - 1). */
  maxLags?: number;
  /** Pairs with fewer shared rows are not tested (default 20, at least 10). */
  minObservations?: number;
  /** Keep only pairs whose spread half-life is at least this many rows. */
  minHalfLife?: number;
  /** Keep only pairs whose spread half-life is at most this many rows. */
  maxHalfLife?: number;
  /** Also run Johansen's trace test on each pair (constant case, one lagged change) and report its rank. */
  johansen?: boolean;
}

/** The options with defaults filled in and checked; what the chunk function and the ranking read. */
export interface ScreenSettings {
  alpha: number;
  /** A fixed count, or -1 when a rule chooses. */
  fixedLags: number;
  lagRule: LagRule | 'fixed';
  /** The requested maximum, or -1 for the default of each pair. */
  maxLags: number;
  minObservations: number;
  minHalfLife: number | null;
  maxHalfLife: number | null;
  johansen: boolean;
}

function requireCount(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 0) {
    throw new MooringInputError(`The ${what} must be a whole number of 0 or more; got ${String(value)}.`);
  }
  return value;
}

function requireRows(value: unknown, what: string): number | null {
  if (value === undefined || value === null) return null;
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new MooringInputError(`The ${what} must be a number of rows of 0 or more; got ${String(value)}.`);
  }
  return value;
}

/** Fills in the defaults and refuses any option a screen cannot honour, with what would work. */
export function resolveScreenOptions(options: ScreenOptions = {}): ScreenSettings {
  const alpha = options.alpha ?? 0.05;
  if (typeof alpha !== 'number' || !(alpha > 0 && alpha < 0.5)) {
    throw new MooringInputError(`The significance level must lie between 0 and 0.5, such as 0.05; got ${String(alpha)}.`);
  }
  const minObservations = options.minObservations ?? DEFAULT_MIN_OBSERVATIONS;
  requireCount(minObservations, 'minimum number of observations');
  if (minObservations < SMALLEST_MIN_OBSERVATIONS) {
    throw new MooringInputError(`The minimum number of observations must be at least ${SMALLEST_MIN_OBSERVATIONS}; got ${minObservations}.`);
  }
  // Every tested pair has at least minObservations rows, whose lag cap is floor(T/2) - 1.
  const cap = Math.floor(minObservations / 2) - 1;
  const tooLarge = (lag: number, what: string): never => {
    throw new MooringInputError(
      `A ${what} of ${lag} needs at least ${2 * (lag + 1)} shared observations in every pair; ` +
        `raise the minimum number of observations to ${2 * (lag + 1)} or ask for at most ${cap}.`,
    );
  };
  const lags = options.lags ?? 'aic';
  let fixedLags = -1;
  let lagRule: LagRule | 'fixed';
  if (typeof lags === 'number') {
    fixedLags = requireCount(lags, 'number of lags');
    if (fixedLags > cap) tooLarge(fixedLags, 'number of lags');
    if (options.maxLags !== undefined) throw new MooringInputError('A maximum lag applies only when a rule chooses the lags; with a fixed number leave it out.');
    lagRule = 'fixed';
  } else if (LAG_RULES.includes(lags)) {
    lagRule = lags;
  } else {
    throw new MooringInputError(`Unknown lag rule '${String(lags)}': use a whole number or one of ${LAG_RULES.join(', ')}.`);
  }
  let maxLags = -1;
  if (options.maxLags !== undefined) {
    maxLags = requireCount(options.maxLags, 'maximum lag');
    if (maxLags > cap) tooLarge(maxLags, 'maximum lag');
  }
  const minHalfLife = requireRows(options.minHalfLife, 'minimum half-life');
  const maxHalfLife = requireRows(options.maxHalfLife, 'maximum half-life');
  if (minHalfLife !== null && maxHalfLife !== null && minHalfLife > maxHalfLife) {
    throw new MooringInputError(`The minimum half-life (${minHalfLife}) is above the maximum (${maxHalfLife}): no pair could pass.`);
  }
  if (options.johansen !== undefined && typeof options.johansen !== 'boolean') {
    throw new MooringInputError(`The Johansen option is a yes/no choice; got ${String(options.johansen)}.`);
  }
  return { alpha, fixedLags, lagRule, maxLags, minObservations, minHalfLife, maxHalfLife, johansen: options.johansen === true };
}
