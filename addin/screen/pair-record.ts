/**
 * The fixed layout in which the chunk function writes one directed pair's answer: a run of
 * RECORD_SIZE numbers in a Float64Array, so a worker thread can hand back thousands of pairs
 * as one buffer. Directed pair 2k is the first series of unordered pair k on the second;
 * 2k + 1 the other way round. NaN in a field means "none" and becomes null when decoded.
 */

/** What happened to a directed pair. */
export const PAIR_STATUS = {
  /** Tested. */
  tested: 0,
  /** Tested: y is an exact multiple of x plus a constant on the shared rows (tau = -Infinity, p = 0). */
  exactFit: 1,
  /** Not tested: fewer shared rows than the minimum. */
  tooFewRows: 2,
  /** Not tested: one of the series does not move on the shared rows. */
  constant: 3,
  /** Not tested: the residual ADF design is singular at every lag (a residual that repeats itself). */
  singular: 4,
  /** Not tested: the two series do not share an order of integration of 1 or more (series-orders.ts). */
  setAside: 5,
} as const;

/** One of the PAIR_STATUS codes. */
export type PairStatus = (typeof PAIR_STATUS)[keyof typeof PAIR_STATUS];

/** Offsets of the fields in a record. */
export const FIELD = {
  status: 0,
  /** Shared rows T. */
  nobs: 1,
  tau: 2,
  pValue: 3,
  lags: 4,
  /** Hedge ratio: the slope of y on x. */
  beta: 5,
  intercept: 6,
  /** Half-life of the spread in rows (NaN: no mean reversion). */
  halfLife: 7,
  /** Speed of adjustment lambda of the spread's AR(1). */
  speed: 8,
  /** z-score of the spread on the last shared row. */
  zscore: 9,
  /** Index of the last shared row. */
  lastRow: 10,
  /** Johansen trace rank of the pair at 5% (NaN when not asked for). */
  johansenRank: 11,
  rSquared: 12,
} as const;

/** Numbers per directed pair. */
export const RECORD_SIZE = 13;

/** True when the status is one of the tested ones (the pair belongs to the multiple-testing family). */
export function isTested(status: number): boolean {
  return status === PAIR_STATUS.tested || status === PAIR_STATUS.exactFit;
}

/** Why a pair was not tested, in words. */
export function untestedReason(status: number, nobs: number, minObservations: number): string {
  if (status === PAIR_STATUS.tooFewRows) return `only ${nobs} shared rows (the minimum is ${minObservations})`;
  if (status === PAIR_STATUS.constant) return 'one of the series does not move on the shared rows';
  return 'the spread repeats itself exactly, so its unit-root regression cannot be fitted';
}

/** A field as a number or null (NaN and infinities become null, so results never carry NaN). */
export function fieldOrNull(records: Float64Array, pair: number, field: number): number | null {
  const v = records[pair * RECORD_SIZE + field];
  return Number.isFinite(v) ? v : null;
}
