import { describe, expect, it } from 'vitest';
import { errorCorrectionCausality } from '../../addin/causality/error-correction-causality';
import { SeededRandom } from '../../addin/random';

/**
 * The error-correction tests on a simulated cointegrated pair with a known structure:
 * x a random walk; d y_t = -0.3 (y_{t-1} - 2 x_{t-1}) + e_t, e and the steps of x independent
 * N(0, 1). So y corrects toward 2x (x leads y in the long run only), no lagged change of x
 * enters d y (short-run null true), and x ignores y (both nulls true for y -> x).
 * Rates are rejections at the 5% level; T = 200, 1 lagged change.
 */
function cointegratedPair(rng: SeededRandom, n: number): { x: Float64Array; y: Float64Array; u: Float64Array } {
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let t = 1; t < n; t++) {
    x[t] = x[t - 1] + rng.normal();
    y[t] = y[t - 1] - 0.3 * (y[t - 1] - 2 * x[t - 1]) + rng.normal();
  }
  return { x, y, u: y.map((v, i) => v - 2 * x[i]) };
}

const rate = (hits: number, reps: number): number => hits / reps;

describe('Monte Carlo: error-correction lead-lag tests', () => {
  // Observed with this seed: x -> y short-run size 5.3%, long-run power 100%;
  // y -> x short-run size 5.6%, long-run size 3.4%.
  it('true equilibrium error given (seed 19870301, 1,000 reps): short-run sizes 5% +/- 2 points, long-run power above 95% where y corrects, long-run size 5% +/- 2.5 points where x does not', () => {
    const rng = new SeededRandom(19870301);
    const reps = 1000;
    const hits = { shortXY: 0, longXY: 0, shortYX: 0, longYX: 0 };
    for (let r = 0; r < reps; r++) {
      const { x, y, u } = cointegratedPair(rng, 200);
      const xy = errorCorrectionCausality(x, y, { lags: 1, equilibriumError: u });
      const yx = errorCorrectionCausality(y, x, { lags: 1, equilibriumError: u });
      if ((xy.shortRun.pValue as number) < 0.05) hits.shortXY++;
      if ((xy.longRun.pValue as number) < 0.05) hits.longXY++;
      if ((yx.shortRun.pValue as number) < 0.05) hits.shortYX++;
      if ((yx.longRun.pValue as number) < 0.05) hits.longYX++;
    }
    expect(Math.abs(rate(hits.shortXY, reps) - 0.05)).toBeLessThanOrEqual(0.02);
    expect(rate(hits.longXY, reps)).toBeGreaterThan(0.95);
    expect(Math.abs(rate(hits.shortYX, reps) - 0.05)).toBeLessThanOrEqual(0.02);
    expect(Math.abs(rate(hits.longYX, reps) - 0.05)).toBeLessThanOrEqual(0.025);
  });

  // Observed with this seed: short-run size 8.6% (7.9% with seed 19870301, and 5.8% at T = 800
  // in side runs), long-run power 100%. The static first-step regression carries a finite-sample bias when the
  // equilibrium error's shocks move with the cause's steps (Stock 1987, from memory), and the
  // lagged change of the cause picks it up; the result carries a warning saying so.
  it('equilibrium error estimated by the static regression (seed 19870302, 1,000 reps): short-run size inflated but at most 10%, long-run power above 95%', () => {
    const rng = new SeededRandom(19870302);
    const reps = 1000;
    let shortHits = 0;
    let longHits = 0;
    let warned = 0;
    for (let r = 0; r < reps; r++) {
      const { x, y } = cointegratedPair(rng, 200);
      const xy = errorCorrectionCausality(x, y, { lags: 1 });
      if ((xy.shortRun.pValue as number) < 0.05) shortHits++;
      if ((xy.longRun.pValue as number) < 0.05) longHits++;
      if (xy.shortRun.warnings.some((w) => /estimated from the same data/.test(w))) warned++;
    }
    expect(rate(shortHits, reps)).toBeLessThanOrEqual(0.1);
    expect(rate(longHits, reps)).toBeGreaterThan(0.95);
    expect(warned).toBe(reps);
  });
});
