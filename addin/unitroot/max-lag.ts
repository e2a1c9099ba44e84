/**
 * The largest lag an augmented Dickey-Fuller regression may use, and the default.
 *
 * Default: 12 (T/100)^(1/4) rounded up (Schwert 1989), capped at T/2 - d - 1 where d is the
 * number of deterministic columns (the reference library's cap, so chosen lags compare exactly).
 * A larger explicit request is refused with the largest allowed value.
 */
import { MooringInputError } from '../errors';
import type { Deterministic } from '../result';
import { deterministicCount } from '../regression/deterministic-terms';

/** Schwert's (1989) rule of thumb 12 (T/100)^(1/4), rounded up. */
export function schwertMaxLag(nobs: number): number {
  return Math.ceil(12 * Math.pow(nobs / 100, 0.25));
}

/** floor(T/2) - (deterministic columns) - 1. */
export function largestAllowedLag(nobs: number, deterministic: Deterministic): number {
  return Math.floor(nobs / 2) - deterministicCount(deterministic) - 1;
}

/** Resolves a requested maximum (or the default) against the cap, with a clear error. */
export function resolveMaxLag(nobs: number, deterministic: Deterministic, requested?: number, what = 'maximum lag'): number {
  const cap = largestAllowedLag(nobs, deterministic);
  if (cap < 0) {
    throw new MooringInputError(`${nobs} observations are too few for this test: it needs at least ${2 * (deterministicCount(deterministic) + 1)}.`);
  }
  if (requested === undefined) return Math.min(schwertMaxLag(nobs), cap);
  if (!Number.isInteger(requested) || requested < 0) {
    throw new MooringInputError(`The ${what} must be a whole number of 0 or more; got ${requested}.`);
  }
  if (requested > cap) {
    throw new MooringInputError(`A ${what} of ${requested} is too large for ${nobs} observations: the largest allowed is ${cap}.`);
  }
  return requested;
}
