import { describe, expect, it } from 'vitest';
import { adfSearchTau } from '../../addin/breaks/adf-search-tau';
import { gregoryHansenColumns } from '../../addin/breaks/gregory-hansen-design';
import { ShiftResiduals } from '../../addin/breaks/shift-residuals';
import { leastSquares } from '../../addin/regression/least-squares';
import { SeededRandom, randomWalk } from '../../addin/random';
import { adfCore } from '../../addin/unitroot/adf-core';
import type { GregoryHansenModel } from '../../addin/tables/gregory-hansen-table';

/**
 * The two fast parts of the Gregory-Hansen date search against the direct computations they
 * stand in for: the shifted-regression residuals against a QR fit of the full design at each
 * date, and the cross-product ADF t against the QR-fitted ADF regression. Seeded series
 * (seed stated); tolerance 1e-9 relative.
 */
function centre(v: Float64Array): Float64Array {
  const mean = v.reduce((a, b) => a + b, 0) / v.length;
  return v.map((x) => x - mean);
}

describe('fast shift residuals equal a full QR fit at every date', () => {
  const rng = new SeededRandom(61);
  const T = 120;
  const x1 = centre(randomWalk(rng, T, { start: 40 }));
  const x2 = centre(randomWalk(rng, T, { start: -10 }));
  const y = new Float64Array(T);
  for (let t = 0; t < T; t++) y[t] = 2 + 0.7 * x1[t] - 0.3 * x2[t] + (t >= 70 ? 1.5 : 0) + rng.normal();
  for (const model of ['level', 'level-trend', 'regime'] as GregoryHansenModel[]) {
    it(`${model} model, two regressors, T = 120, seed 61: residuals within 1e-9 of the residual norm at s = 18..102`, () => {
      const xs = [x1, x2];
      const fixedCount = model === 'level-trend' ? 4 : 3;
      const fixed = gregoryHansenColumns(xs, model, T).slice(0, fixedCount);
      const shifter = new ShiftResiduals(y, fixed, model === 'regime' ? xs : []);
      const e = new Float64Array(T);
      let worst = 0;
      for (let s = 18; s <= 102; s++) {
        const ssr = shifter.residualsAt(s, e);
        const direct = leastSquares(y, gregoryHansenColumns(xs, model, s));
        expect(Math.abs(ssr - direct.ssr) / direct.ssr).toBeLessThan(1e-9);
        const norm = Math.sqrt(direct.ssr);
        for (let t = 0; t < T; t++) worst = Math.max(worst, Math.abs(e[t] - direct.residuals[t]) / norm);
      }
      expect(worst).toBeLessThan(1e-9);
    });
  }
});

describe('cross-product ADF t equals the QR-fitted ADF regression', () => {
  const rng = new SeededRandom(62);
  const series = [randomWalk(rng, 200), rng.normals(150), randomWalk(rng, 90, { start: 1000 })];
  for (const [i, x] of series.entries()) {
    for (const lags of [0, 1, 4, 9]) {
      it(`series ${i + 1} (seed 62), ${lags} lags: tau within 1e-9 relative`, () => {
        const direct = adfCore(x, { deterministic: 'none', lags }).regression.tau;
        expect(Math.abs(adfSearchTau(x, lags) - direct) / Math.abs(direct)).toBeLessThan(1e-9);
      });
    }
  }
});
