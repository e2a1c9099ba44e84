/**
 * The five deterministic cases of the bounds test (Pesaran, Shin & Smith 2001, section 4),
 * in Mooring's words. "Inside the relation" terms are tested with the levels; "free" terms
 * stay in the model under both hypotheses.
 *
 * | case | deterministic terms                                       |
 * |------|-----------------------------------------------------------|
 * | 1    | none                                                      |
 * | 2    | a constant inside the long-run relation only              |
 * | 3    | a free constant (the series may drift)                    |
 * | 4    | a free constant and a trend inside the long-run relation  |
 * | 5    | a free constant and a free trend                          |
 */
import { MooringInputError } from '../errors';
import type { Deterministic } from '../result';

export type BoundsCase = 1 | 2 | 3 | 4 | 5;

export const BOUNDS_CASES: readonly BoundsCase[] = [1, 2, 3, 4, 5];

export interface BoundsCaseTerms {
  /** Terms that stay in the model under the null (not tested). */
  unrestricted: ('constant' | 'trend')[];
  /** The term tested with the levels (inside the long-run relation), if any. */
  restricted: 'constant' | 'trend' | null;
}

export const BOUNDS_CASE_TERMS: Record<BoundsCase, BoundsCaseTerms> = {
  1: { unrestricted: [], restricted: null },
  2: { unrestricted: [], restricted: 'constant' },
  3: { unrestricted: ['constant'], restricted: null },
  4: { unrestricted: ['constant'], restricted: 'trend' },
  5: { unrestricted: ['constant', 'trend'], restricted: null },
};

/** Plain words for each case. */
export const BOUNDS_CASE_LABEL: Record<BoundsCase, string> = {
  1: 'no constant, no trend',
  2: 'a constant inside the long-run relation, none outside it',
  3: 'a free constant (the series may drift), no trend',
  4: 'a free constant and a trend inside the long-run relation',
  5: 'a free constant and a free trend',
};

/** The three-way deterministic label of the TestResult for each case. */
export const BOUNDS_CASE_DETERMINISTIC: Record<BoundsCase, Deterministic> = { 1: 'none', 2: 'const', 3: 'const', 4: 'trend', 5: 'trend' };

/** Throws a MooringInputError unless the value is a whole number from 1 to 5. */
export function requireBoundsCase(value: unknown): asserts value is BoundsCase {
  if (typeof value !== 'number' || !BOUNDS_CASES.includes(value as BoundsCase)) {
    throw new MooringInputError(
      `The case of the bounds test must be a whole number from 1 to 5 (1 none; 2 a constant inside the relation; 3 a free constant; 4 a free constant and a trend inside the relation; 5 a free constant and trend); got ${String(value)}.`,
    );
  }
}
