/**
 * From records to the ranked list: decode each tested directed pair, attach its
 * Benjamini-Hochberg adjusted p-value, apply the half-life range, and order by evidence.
 * Ranking only orders and filters: every number is the record's, unchanged.
 *
 * Order: smallest p-value first; then the more negative tau (a p-value can tie at its floor
 * or at 0 for an exact fit); then the order of the series as given, so the order is stable.
 */
import { FIELD, PAIR_STATUS, RECORD_SIZE, fieldOrNull } from './pair-record';
import type { ScreenSettings } from './screen-options';
import type { SeriesOrder } from './series-orders';

/** One directed pair in the screen's answer: y regressed on x. */
export interface ScreenPair {
  y: string;
  x: string;
  /** Order of integration of y and of x (equal, at least 1: the screen ranks no other pair; 3 stands for "above 2"). */
  orderY: number;
  orderX: number;
  /** Engle-Granger tau of the residual ADF; null for an exact fit (tau is minus infinity). */
  statistic: number | null;
  /** MacKinnon (1994) p-value, as the single-pair test gives it. */
  pValue: number;
  /** Benjamini-Hochberg adjusted p-value over every directed pair tested (the ranked family: set-aside pairs are not in it). */
  adjustedPValue: number;
  /** True when the adjusted p-value is at or below the level. */
  discovery: boolean;
  /** Hedge ratio: units of x per unit of y. */
  beta: number;
  intercept: number;
  /** Rows for half a gap in the spread to close; null when the spread does not revert. */
  halfLife: number | null;
  /** The spread's z-score on the last shared row. */
  zscore: number | null;
  /** Lagged changes in the residual ADF; null for an exact fit. */
  lags: number | null;
  /** Shared rows the pair was tested on. */
  nobs: number;
  /** Index (0-based) of the last shared row, where the z-score is read. */
  lastRow: number;
  rSquared: number;
  /** Johansen trace rank at 5% (when asked for). */
  johansenRank?: number | null;
  note?: string;
}

/** Directed record r of `records` (series yi on xi) as a ScreenPair with its adjusted p-value; hedge ratio and intercept back in the prices' units. */
export function decodePair(
  names: readonly string[], records: Float64Array, r: number, yi: number, xi: number, adjusted: number, settings: ScreenSettings,
  orders: readonly SeriesOrder[], scales?: ArrayLike<number>,
): ScreenPair {
  // The records are in the universe's units (each series times a power of two, screen-universe.ts).
  const scale = (i: number) => scales?.[i] ?? 1;
  const at = (field: number) => records[r * RECORD_SIZE + field];
  const exact = at(FIELD.status) === PAIR_STATUS.exactFit;
  const pair: ScreenPair = {
    y: names[yi],
    x: names[xi],
    orderY: orders[yi].order as number,
    orderX: orders[xi].order as number,
    statistic: fieldOrNull(records, r, FIELD.tau),
    pValue: at(FIELD.pValue),
    adjustedPValue: adjusted,
    discovery: adjusted <= settings.alpha,
    beta: (at(FIELD.beta) * scale(xi)) / scale(yi),
    intercept: at(FIELD.intercept) / scale(yi),
    halfLife: fieldOrNull(records, r, FIELD.halfLife),
    zscore: fieldOrNull(records, r, FIELD.zscore),
    lags: fieldOrNull(records, r, FIELD.lags),
    nobs: at(FIELD.nobs),
    lastRow: at(FIELD.lastRow),
    rSquared: at(FIELD.rSquared),
  };
  if (settings.johansen) pair.johansenRank = fieldOrNull(records, r, FIELD.johansenRank);
  if (exact) pair.note = `${pair.y} is an exact multiple of ${pair.x} plus a constant on the shared rows: one column is probably copied or computed from the other`;
  return pair;
}

/** True when the pair's half-life lies in the settings' range (a pair without one fails any bound). */
export function withinHalfLifeRange(pair: ScreenPair, settings: ScreenSettings): boolean {
  if (settings.minHalfLife === null && settings.maxHalfLife === null) return true;
  if (pair.halfLife === null) return false;
  if (settings.minHalfLife !== null && pair.halfLife < settings.minHalfLife) return false;
  return settings.maxHalfLife === null || pair.halfLife <= settings.maxHalfLife;
}

/** Orders pairs by evidence (see the file comment); `position` gives each series' place in the input. */
export function rankByEvidence(pairs: ScreenPair[], position: ReadonlyMap<string, number>): ScreenPair[] {
  const tau = (p: ScreenPair) => (p.statistic === null ? Number.NEGATIVE_INFINITY : p.statistic);
  return pairs.sort(
    (a, b) =>
      a.pValue - b.pValue ||
      (tau(a) === tau(b) ? 0 : tau(a) < tau(b) ? -1 : 1) ||
      (position.get(a.y) as number) - (position.get(b.y) as number) ||
      (position.get(a.x) as number) - (position.get(b.x) as number),
  );
}
