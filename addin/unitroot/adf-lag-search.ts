/**
 * Chooses the number of lagged changes in an ADF regression (0..pmax) on the common sample
 * that pmax allows (T - 1 - pmax rows), from one Cholesky factorisation of the design's cross
 * products instead of pmax + 1 separate fits.
 *
 * Rules (the reference library's, so choices compare exactly):
 * - aic: minimise -2 llf + 2k; bic: minimise -2 llf + k ln n; k counts every column; ties go
 *   to the smaller lag.
 * - tstat: walk from pmax down to 1 and stop at the first lag whose own |t| >= 1.6449
 *   (the 5% one-sided normal point); if none, 0 lags (Ng & Perron 1995's general-to-specific rule).
 */
import type { Deterministic } from '../result';
import { gaussianLogLikelihood } from '../regression/least-squares';
import { dickeyFullerGram, type DickeyFullerGram } from '../regression/lagged-difference-gram';
import { nestedFitsFromGram } from '../regression/nested-cholesky';
import { deterministicCount } from '../regression/deterministic-terms';

export type LagRule = 'aic' | 'bic' | 'tstat';

export const LAG_RULES: readonly LagRule[] = ['aic', 'bic', 'tstat'];

/** The 5% one-sided standard normal point used by the t-rule. */
export const TSTAT_STOP = 1.6448536269514722;

export interface LagChoice {
  lags: number;
  rule: LagRule;
  maxLags: number;
  /** The criterion at the chosen lag on the common sample: the AIC or BIC value, or the last lag's |t|. */
  criterion: number;
  /** Rows of the common sample. */
  commonNobs: number;
}

/** `gram`, when given, must be dickeyFullerGram(x, deterministic, maxLags) (the caller built it to reuse it). */
export function chooseAdfLags(x: ArrayLike<number>, deterministic: Deterministic, maxLags: number, rule: LagRule, gram: DickeyFullerGram = dickeyFullerGram(x, deterministic, maxLags)): LagChoice {
  const fits = nestedFitsFromGram(gram.xtx, gram.xty, gram.yty, gram.k, gram.n);
  const base = 1 + deterministicCount(deterministic); // columns of the 0-lag model
  const n = gram.n;
  const unit = gram.responseScale * gram.responseScale;
  const usableLags = Math.max(0, Math.min(maxLags, fits.usable - base));

  if (rule === 'tstat') {
    for (let p = usableLags; p >= 1; p--) {
      const t = fits.lastT[base + p];
      if (t >= TSTAT_STOP) return { lags: p, rule, maxLags, criterion: t, commonNobs: n };
    }
    return { lags: 0, rule, maxLags, criterion: fits.lastT[base] ?? Number.NaN, commonNobs: n };
  }
  let best = 0;
  let bestValue = Number.POSITIVE_INFINITY;
  for (let p = 0; p <= usableLags; p++) {
    const k = base + p;
    // In the data's units; from the scaled SSR and the log of the scale where the product would
    // pass the range of doubles (the choice is the same either way: the shift is common to all lags).
    const inUnits = fits.ssr[k] * unit;
    const llf = Number.isFinite(inUnits) && inUnits >= 2 ** -1022
      ? gaussianLogLikelihood(inUnits, n)
      : gaussianLogLikelihood(fits.ssr[k], n) - n * Math.log(gram.responseScale);
    const value = rule === 'aic' ? -2 * llf + 2 * k : -2 * llf + k * Math.log(n);
    if (value < bestValue) {
      bestValue = value;
      best = p;
    }
  }
  return { lags: best, rule, maxLags, criterion: bestValue, commonNobs: n };
}
