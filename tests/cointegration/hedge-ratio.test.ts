import { describe, expect, it } from 'vitest';
import { defaultMaxLeadsLags, dynamicOls, largestLeadsLags } from '../../addin/cointegration/dynamic-ols';
import {
  hedgeRatios,
  olsHedgeRatio,
  reverseOlsHedgeRatio,
  totalLeastSquaresHedgeRatio,
} from '../../addin/cointegration/hedge-ratio';
import { MooringInputError } from '../../addin/errors';
import { gaussianLogLikelihood, leastSquares } from '../../addin/regression/least-squares';
import { autoregressive1, randomWalk, SeededRandom } from '../../addin/random';

function pair(seed: number, T: number): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 60 });
  const u = autoregressive1(rng, T, 0.6);
  return { y: x.map((v, i) => 4 + 1.3 * v + u[i]), x };
}

/** y = 1 + 2 x + u with u correlated with the current and last change in x (an endogenous regressor). */
function endogenousPair(rng: SeededRandom, T: number, phi: number): { y: Float64Array; x: Float64Array } {
  const e = rng.normals(T);
  const v = rng.normals(T);
  const x = new Float64Array(T);
  const y = new Float64Array(T);
  let level = 0;
  let u = 0;
  for (let t = 0; t < T; t++) {
    level += v[t];
    x[t] = level;
    u = phi * u + e[t] + 0.8 * v[t] + (t > 0 ? 0.5 * v[t - 1] : 0);
    y[t] = 1 + 2 * level + u;
  }
  return { y, x };
}

describe('static hedge ratios', () => {
  const { y, x } = pair(3, 400);

  it('OLS of y on x is the least-squares line with a constant', () => {
    const fit = leastSquares(y, [x, new Float64Array(400).fill(1)]);
    const h = olsHedgeRatio(y, x);
    expect(h.beta).toBeCloseTo(fit.coefficients[0], 12);
    expect(h.intercept).toBeCloseTo(fit.coefficients[1], 12);
    expect(h.standardError).toBeNull();
    expect(h.note).toContain('use dynamic OLS for inference');
  });

  it('the reverse regression turned round is the reciprocal of OLS of x on y, so the two OLS lines swap under exchanging the series', () => {
    const reverse = reverseOlsHedgeRatio(y, x);
    const xOnY = olsHedgeRatio(x, y);
    expect(reverse.beta).toBeCloseTo(1 / xOnY.beta, 12);
    expect(reverse.intercept).toBeCloseTo(-xOnY.intercept / xOnY.beta, 10);
  });

  it('total least squares matches the closed form (syy - sxx + sqrt((syy - sxx)^2 + 4 sxy^2)) / (2 sxy), is symmetric in the pair, and lies between the two OLS lines', () => {
    const n = x.length;
    const mx = x.reduce((a, b) => a + b, 0) / n;
    const my = y.reduce((a, b) => a + b, 0) / n;
    let sxx = 0;
    let syy = 0;
    let sxy = 0;
    for (let i = 0; i < n; i++) {
      sxx += (x[i] - mx) ** 2;
      syy += (y[i] - my) ** 2;
      sxy += (x[i] - mx) * (y[i] - my);
    }
    const closedForm = (syy - sxx + Math.sqrt((syy - sxx) ** 2 + 4 * sxy * sxy)) / (2 * sxy);
    const tls = totalLeastSquaresHedgeRatio(y, x);
    expect(tls.beta).toBeCloseTo(closedForm, 10);
    expect(tls.intercept).toBeCloseTo(my - closedForm * mx, 8);
    expect(totalLeastSquaresHedgeRatio(x, y).beta).toBeCloseTo(1 / tls.beta, 10);
    expect(tls.beta).toBeGreaterThan(olsHedgeRatio(y, x).beta);
    expect(tls.beta).toBeLessThan(reverseOlsHedgeRatio(y, x).beta);
  });

  it('refuses a pair of different lengths, a constant y for the reverse line and a constant x for the orthogonal one; a constant y hedges with 0', () => {
    expect(() => olsHedgeRatio(y, x.subarray(2))).toThrow(MooringInputError);
    const flat = new Float64Array(400).fill(5);
    expect(() => reverseOlsHedgeRatio(flat, x)).toThrow(MooringInputError);
    expect(() => totalLeastSquaresHedgeRatio(y, flat)).toThrow(/vertical/);
    expect(totalLeastSquaresHedgeRatio(flat, x).beta).toBe(0);
  });
});

describe('dynamic OLS (Stock & Watson 1993)', () => {
  it('recovers a relation with leads and lags exactly: y = 1 + 2x + 0.7 Δx(t+1) - 0.3 Δx(t-2) leaves no residual with k = 2 and some with k = 1', () => {
    const x = randomWalk(new SeededRandom(9), 200);
    const y = new Float64Array(200);
    for (let t = 3; t < 199; t++) y[t] = 1 + 2 * x[t] + 0.7 * (x[t + 1] - x[t]) - 0.3 * (x[t - 2] - x[t - 3]);
    // Rows 3..197 are those k = 2 uses; fill the ends so they do not matter.
    const two = dynamicOls(y, x, { leadsLags: 2, bandwidth: 0 });
    expect(two.nobs).toBe(200 - 1 - 4);
    expect(two.beta).toBeCloseTo(2, 10);
    expect(two.intercept).toBeCloseTo(1, 9);
    expect(Math.max(...two.residuals.map(Math.abs))).toBeLessThan(1e-9);
    const one = dynamicOls(y.subarray(1, 199), x.subarray(1, 199), { leadsLags: 1, bandwidth: 0 });
    expect(Math.max(...one.residuals.map(Math.abs))).toBeGreaterThan(0.01);
  });

  it('with bandwidth 0 the HAC standard error is the OLS one times sqrt((n - k) / n), since lambda^2 = SSR/n and s^2 = SSR/(n - k)', () => {
    const { y, x } = pair(5, 300);
    const fit = dynamicOls(y, x, { leadsLags: 3, bandwidth: 0 });
    const n = fit.nobs;
    const k = 3 + 2 * 3;
    expect(fit.standardError).toBeCloseTo(fit.olsStandardError * Math.sqrt((n - k) / n), 14);
    expect(fit.tValue).toBeCloseTo(fit.beta / fit.standardError, 10);
  });

  it('chooses k by AIC exactly as separate fits on the common sample would (0..kmax, kmax = floor(T^(1/3)))', () => {
    const rng = new SeededRandom(77);
    const { y, x } = endogenousPair(rng, 400, 0.3);
    const kmax = defaultMaxLeadsLags(400);
    expect(kmax).toBe(7);
    const from = kmax + 1;
    const to = 400 - 1 - kmax;
    let best = -1;
    let bestAic = Infinity;
    for (let k = 0; k <= kmax; k++) {
      const rows = to - from + 1;
      const cols: Float64Array[] = [new Float64Array(rows), new Float64Array(rows).fill(1)];
      const shifts = [0];
      for (let j = 1; j <= k; j++) shifts.push(j, -j);
      for (const _ of shifts) cols.push(new Float64Array(rows));
      const response = new Float64Array(rows);
      for (let r = 0; r < rows; r++) {
        const t = from + r;
        response[r] = y[t];
        cols[0][r] = x[t];
        shifts.forEach((s, c) => (cols[2 + c][r] = x[t - s] - x[t - s - 1]));
      }
      const fit = leastSquares(response, cols);
      const aic = -2 * gaussianLogLikelihood(fit.ssr, rows) + 2 * cols.length;
      if (aic < bestAic) {
        bestAic = aic;
        best = k;
      }
    }
    const chosen = dynamicOls(y, x);
    expect(chosen.leadsLagsRule).toBe('aic');
    expect(chosen.maxLeadsLags).toBe(kmax);
    expect(chosen.leadsLags).toBe(best);
    expect(chosen.leadsLags).toBeGreaterThanOrEqual(1);
    expect(chosen.nobs).toBe(400 - 1 - 2 * best);
  });

  it('HAC t-ratio for the true beta: 1,000 seeded endogenous pairs (seed 5, T = 250, spread e + 0.8 v + 0.5 v(-1)) reject at 5% between 3% and 9% (measured 6.6% with the AR(1) plug-in bandwidth of Andrews 1991; binomial s.e. 0.7 points; DOLS t-tests over-reject a little in samples this short)', () => {
    const rng = new SeededRandom(5);
    let rejections = 0;
    for (let r = 0; r < 1000; r++) {
      const { y, x } = endogenousPair(rng, 250, 0);
      const fit = dynamicOls(y, x);
      if (Math.abs((fit.beta - 2) / fit.standardError) > 1.959963984540054) rejections++;
    }
    expect(rejections / 1000).toBeGreaterThan(0.03);
    expect(rejections / 1000).toBeLessThan(0.09);
  });

  it('the long-run variance matters: with a serially correlated spread (AR 0.5) the HAC t-test rejects a true beta far less often than one built on the OLS standard error (500 pairs, seed 6, T = 250; measured 10% against 29%)', () => {
    const rng = new SeededRandom(6);
    let hac = 0;
    let ols = 0;
    for (let r = 0; r < 500; r++) {
      const { y, x } = endogenousPair(rng, 250, 0.5);
      const fit = dynamicOls(y, x);
      if (Math.abs((fit.beta - 2) / fit.standardError) > 1.96) hac++;
      if (Math.abs((fit.beta - 2) / fit.olsStandardError) > 1.96) ols++;
    }
    expect(hac / 500).toBeLessThan(0.16);
    expect(ols / 500).toBeGreaterThan(0.2);
  });

  it('refuses too many leads and lags, naming the largest allowed', () => {
    const { y, x } = pair(8, 100);
    expect(largestLeadsLags(100)).toBe(21);
    expect(() => dynamicOls(y, x, { leadsLags: 30 })).toThrow(/largest allowed is 21/);
    expect(() => dynamicOls(y, x, { maxLeadsLags: 22 })).toThrow(/largest allowed is 21/);
    expect(() => dynamicOls(y, x, { leadsLags: 'bic' as never })).toThrow(MooringInputError);
    expect(() => dynamicOls(y.subarray(0, 12), x.subarray(0, 12))).toThrow(/too few/);
  });
});

describe('hedgeRatios', () => {
  it('gives all four lines near the true 1.3 and a sentence that leads with dynamic OLS', () => {
    const { y, x } = pair(21, 500);
    const h = hedgeRatios(y, x, {}, { y: 'Diesel', x: 'Gasoil' });
    for (const r of [h.ols, h.reverseOls, h.totalLeastSquares, h.dynamicOls]) expect(Math.abs(r.beta - 1.3)).toBeLessThan(0.05);
    expect(h.dynamicOls.standardError).toBeGreaterThan(0);
    expect(h.dynamicOls.pValue).toBeLessThan(1e-6);
    expect(h.verdict).toMatch(/^Hedge about 1\.\d+ units of Gasoil per unit of Diesel \(dynamic OLS, standard error /);
  });
});
