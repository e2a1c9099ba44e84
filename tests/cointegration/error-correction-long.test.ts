import { describe, expect, it } from 'vitest';
import { chooseEcmLagsByGram, errorCorrectionFitByGram } from '../../addin/cointegration/error-correction-long';
import { cointegratingRegression } from '../../addin/cointegration/cointegrating-regression';
import { HouseholderQr } from '../../addin/linalg/householder-qr';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { leastSquares } from '../../addin/regression/least-squares';

/**
 * The error-correction model's lag choice from cross products (used on long series) against
 * the QR route it replaces there: the same p for every maximum tried. The reference is our own
 * QR (addin/linalg/householder-qr.ts, checked on NIST's Longley problem in
 * tests/regression/longley.test.ts) with the system AIC of error-correction.ts written out.
 * Invented, seeded data.
 */

function qrChoice(y: Float64Array, x: Float64Array, u: Float64Array, pmax: number): number {
  const T = y.length;
  const from = pmax + 1;
  const n = T - from;
  const columns = [Float64Array.from({ length: n }, (_, r) => u[from + r - 1]), new Float64Array(n).fill(1)];
  for (let i = 1; i <= pmax; i++) {
    columns.push(Float64Array.from({ length: n }, (_, r) => y[from + r - i] - y[from + r - i - 1]));
    columns.push(Float64Array.from({ length: n }, (_, r) => x[from + r - i] - x[from + r - i - 1]));
  }
  const qr = new HouseholderQr(columns, n);
  const zy = qr.qtY(Float64Array.from({ length: n }, (_, r) => y[from + r] - y[from + r - 1]));
  const zx = qr.qtY(Float64Array.from({ length: n }, (_, r) => x[from + r] - x[from + r - 1]));
  let best = 0;
  let bestAic = Infinity;
  for (let p = 0; p <= pmax; p++) {
    const size = 2 + 2 * p;
    let syy = 0;
    let sxx = 0;
    let sxy = 0;
    for (let i = size; i < n; i++) {
      syy += zy[i] * zy[i];
      sxx += zx[i] * zx[i];
      sxy += zy[i] * zx[i];
    }
    const aic = n * Math.log((syy * sxx - sxy * sxy) / (n * n)) + 4 * size;
    if (aic < bestAic) {
      bestAic = aic;
      best = p;
    }
  }
  return best;
}

/** y adjusts to x with speed alpha and leans on `depth` lags of both changes (weights halving each lag). */
function pair(seed: number, T: number, alpha: number, depth: number, level: number): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const dxs = autoregressive1(rng, T, 0.4, 1);
  const x = new Float64Array(T);
  x[0] = level;
  for (let t = 1; t < T; t++) x[t] = x[t - 1] + dxs[t];
  const y = new Float64Array(T);
  for (let t = 0; t <= depth + 1; t++) y[t] = 0.7 * x[t] + 3;
  for (let t = depth + 2; t < T; t++) {
    let lagTerms = 0;
    for (let i = 1; i <= depth; i++) lagTerms += 0.5 ** i * (0.6 * (y[t - i] - y[t - i - 1]) - 0.4 * (x[t - i] - x[t - i - 1]));
    y[t] = y[t - 1] + alpha * (y[t - 1] - 0.7 * x[t - 1] - 3) + lagTerms + rng.normal();
  }
  return { y, x };
}

describe('error-correction lag choice from cross products equals the QR route', () => {
  const cases = [
    { name: 'no lag terms, prices near 5,000', ...pair(81, 4000, -0.05, 0, 5000) },
    { name: 'three lag terms', ...pair(82, 4000, -0.1, 3, 100) },
    { name: 'six lag terms, slow adjustment', ...pair(83, 5000, -0.01, 6, 20) },
    { name: 'a random-walk pair (no adjustment)', y: randomWalk(new SeededRandom(84), 3000, { start: 50 }), x: randomWalk(new SeededRandom(85), 3000, { start: 60 }) },
  ];
  for (const c of cases) {
    for (const pmax of [4, 12, 20]) {
      it(`chooses the same p as QR with pmax = ${pmax} (${c.name})`, () => {
        const u = cointegratingRegression(c.y, [c.x], 'const', { y: 'y', xs: ['x'] }).residuals;
        expect(chooseEcmLagsByGram(c.y, c.x, u, pmax)).toBe(qrChoice(c.y, c.x, u, pmax));
      });
    }
  }

  for (const c of cases) {
    for (const p of [0, 3, 6]) {
      it(`fits both equations as QR does with p = ${p}: coefficients, standard errors, t-values and R² within 1e-10 (${c.name})`, () => {
        const u = cointegratingRegression(c.y, [c.x], 'const', { y: 'y', xs: ['x'] }).residuals;
        const T = c.y.length;
        const from = p + 1;
        const n = T - from;
        const change = (v: Float64Array, lag: number) => Float64Array.from({ length: n }, (_, r) => v[from + r - lag] - v[from + r - lag - 1]);
        const columns = [Float64Array.from({ length: n }, (_, r) => u[from + r - 1]), new Float64Array(n).fill(1)];
        for (let i = 1; i <= p; i++) columns.push(change(c.y, i), change(c.x, i));
        const fit = errorCorrectionFitByGram(c.y, c.x, u, p);
        expect(fit).not.toBeNull();
        if (fit === null) return;
        for (const [mine, response] of [[fit.y, change(c.y, 0)], [fit.x, change(c.x, 0)]] as const) {
          const qr = leastSquares(response, columns);
          expect(mine.nobs).toBe(qr.nobs);
          expect(mine.dfResid).toBe(qr.dfResid);
          for (let j = 0; j < columns.length; j++) {
            expect(Math.abs(mine.coefficients[j] - qr.coefficients[j]) / qr.standardErrors[j]).toBeLessThan(1e-10);
            expect(Math.abs(mine.standardErrors[j] - qr.standardErrors[j]) / qr.standardErrors[j]).toBeLessThan(1e-10);
            expect(Math.abs(mine.tValues[j] - qr.tValues[j])).toBeLessThan(1e-10 * Math.max(1, Math.abs(qr.tValues[j])));
          }
          expect(Math.abs(mine.rSquared - qr.rSquared)).toBeLessThan(1e-10);
        }
      });
    }
  }

  it('declines where a column repeats another (x a straight line: its changes equal the constant), so QR answers', () => {
    const T = 500;
    const x = Float64Array.from({ length: T }, (_, t) => 10 + 0.5 * t);
    const y = x.map((v, t) => 2 * v + Math.sin(t));
    const u = cointegratingRegression(y, [x], 'const', { y: 'y', xs: ['x'] }).residuals;
    expect(chooseEcmLagsByGram(y, x, u, 3)).toBeNull();
  });
});
