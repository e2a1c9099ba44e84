import { describe, expect, it } from 'vitest';
import { errorCorrectionModel, largestEcmLag } from '../../addin/cointegration/error-correction';
import { MooringInputError } from '../../addin/errors';
import { randomWalk, SeededRandom } from '../../addin/random';
import { leastSquares } from '../../addin/regression/least-squares';

/**
 * A pair where only y adjusts: Δy_t = alpha (y - beta x - c)_{t-1} + 0.3 Δx_{t-1} + e_t,
 * x a random walk. With alpha = -0.06 the gap halves in ln 2 / -ln 0.94 = 11.2 periods.
 */
function followerPair(seed: number, T: number, alpha: number): { y: Float64Array; x: Float64Array } {
  const rng = new SeededRandom(seed);
  const x = randomWalk(rng, T, { start: 70 });
  const y = new Float64Array(T);
  y[0] = 2 + x[0];
  y[1] = 2 + x[1];
  for (let t = 2; t < T; t++) {
    const gap = y[t - 1] - x[t - 1] - 2;
    y[t] = y[t - 1] + alpha * gap + 0.3 * (x[t - 1] - x[t - 2]) + rng.normal();
  }
  return { y, x };
}

describe('error-correction model', () => {
  const { y, x } = followerPair(2024, 3000, -0.06);
  const ecm = errorCorrectionModel(y, x, { period: 'day' }, { y: 'Crude', x: 'Brent' });

  it('recovers the speed of adjustment of the side that adjusts (alpha = -0.06 within 3 of its standard errors), and x shows none (|t| < 3)', () => {
    expect(Math.abs(ecm.y.alpha - -0.06)).toBeLessThan(3 * ecm.y.standardError);
    expect(ecm.y.tValue).toBeLessThan(-5);
    expect(ecm.y.pValue).toBeLessThan(1e-6);
    expect(Math.abs(ecm.x.tValue)).toBeLessThan(3);
    expect(ecm.beta).toBeCloseTo(1, 1);
  });

  it('gives the half-life implied by y alone, ln 2 / -ln(1 + alpha) from the estimated alpha, near the true 11.2 days', () => {
    expect(ecm.y.halfLifeAlone).toBeCloseTo(Math.log(2) / -Math.log(1 + ecm.y.alpha), 12);
    expect(Math.abs((ecm.y.halfLifeAlone as number) - 11.2)).toBeLessThan(4);
  });

  it('names its combined half-life ecmHalfLife, ln 2 / -ln(1 + combined speed), and carries no field called halfLife', () => {
    expect(ecm.ecmHalfLife).toBeCloseTo(Math.log(2) / -Math.log(1 + ecm.combinedSpeed), 12);
    expect(ecm).not.toHaveProperty('halfLife');
    expect(ecm.y).not.toHaveProperty('halfLife');
  });

  it('says in plain words which side adjusts and how fast', () => {
    expect(ecm.verdict).toMatch(/^Crude closes about \d(\.\d)?% of a gap to its long-run relation each day \(alone, that would halve the gap in about \d+(\.\d)? days\)\./);
    expect(ecm.verdict).toContain('Brent');
  });

  it('reports both equations with the error term first, a constant and p lags of both changes, on T - 1 - p rows', () => {
    expect(ecm.lagRule).toBe('aic');
    expect(ecm.lags).toBeGreaterThanOrEqual(1);
    for (const eq of [ecm.y, ecm.x]) {
      expect(eq.coefficients.length).toBe(2 + 2 * ecm.lags);
      expect(eq.coefficients[0].name).toBe('equilibrium error (lag 1)');
      expect(eq.coefficients[1].name).toBe('constant');
      expect(eq.coefficients[3].name).toBe('change in Brent, lag 1');
    }
    expect(ecm.nobs).toBe(3000 - 1 - ecm.lags);
    // Δx_{t-1} enters the y equation with 0.3.
    expect(Math.abs(ecm.y.coefficients[3].value - 0.3)).toBeLessThan(4 * ecm.y.coefficients[3].standardError);
  });

  it('matches a direct least-squares fit of Δy on [u(t-1), 1, lagged changes] for fixed p = 2', () => {
    const fixed = errorCorrectionModel(y, x, { lags: 2 });
    const T = y.length;
    const step1 = leastSquares(y, [x, new Float64Array(T).fill(1)]);
    const u = step1.residuals;
    const rows = T - 3;
    const cols = Array.from({ length: 6 }, () => new Float64Array(rows));
    const dy = new Float64Array(rows);
    for (let r = 0; r < rows; r++) {
      const t = r + 3;
      dy[r] = y[t] - y[t - 1];
      cols[0][r] = u[t - 1];
      cols[1][r] = 1;
      cols[2][r] = y[t - 1] - y[t - 2];
      cols[3][r] = x[t - 1] - x[t - 2];
      cols[4][r] = y[t - 2] - y[t - 3];
      cols[5][r] = x[t - 2] - x[t - 3];
    }
    const direct = leastSquares(dy, cols);
    expect(fixed.nobs).toBe(rows);
    fixed.y.coefficients.forEach((c, j) => {
      expect(c.value).toBeCloseTo(direct.coefficients[j], 10);
      expect(c.standardError).toBeCloseTo(direct.standardErrors[j], 10);
    });
  });

  it('chooses p by the system AIC n ln det(Sigma) + 2 (coefficients) exactly as separate fits on the common sample would', () => {
    const short = followerPair(7, 400, -0.1);
    const pmax = 6;
    const chosen = errorCorrectionModel(short.y, short.x, { maxLags: pmax });
    const T = 400;
    const u = leastSquares(short.y, [short.x, new Float64Array(T).fill(1)]).residuals;
    const rows = T - 1 - pmax;
    let best = -1;
    let bestAic = Infinity;
    for (let p = 0; p <= pmax; p++) {
      const cols = Array.from({ length: 2 + 2 * p }, () => new Float64Array(rows));
      const dy = new Float64Array(rows);
      const dx = new Float64Array(rows);
      for (let r = 0; r < rows; r++) {
        const t = r + pmax + 1;
        dy[r] = short.y[t] - short.y[t - 1];
        dx[r] = short.x[t] - short.x[t - 1];
        cols[0][r] = u[t - 1];
        cols[1][r] = 1;
        for (let i = 1; i <= p; i++) {
          cols[2 * i][r] = short.y[t - i] - short.y[t - i - 1];
          cols[2 * i + 1][r] = short.x[t - i] - short.x[t - i - 1];
        }
      }
      const ey = leastSquares(dy, cols).residuals;
      const ex = leastSquares(dx, cols).residuals;
      let syy = 0;
      let sxx = 0;
      let sxy = 0;
      for (let r = 0; r < rows; r++) {
        syy += ey[r] * ey[r];
        sxx += ex[r] * ex[r];
        sxy += ey[r] * ex[r];
      }
      const aic = rows * Math.log((syy * sxx - sxy * sxy) / (rows * rows)) + 2 * 2 * cols.length;
      if (aic < bestAic) {
        bestAic = aic;
        best = p;
      }
    }
    expect(chosen.maxLags).toBe(pmax);
    expect(chosen.lags).toBe(best);
  });
});

describe('error-correction edge cases', () => {
  it('warns when y overshoots (alpha <= -1) and still gives a finite half-life from |1 + alpha|', () => {
    const { y, x } = followerPair(11, 600, -1.4);
    const ecm = errorCorrectionModel(y, x, { lags: 0 });
    expect(ecm.y.alpha).toBeLessThan(-1);
    expect(ecm.warnings.join(' ')).toContain('overshoots');
    expect(ecm.y.halfLifeAloneNote).toContain('overshoots');
    expect(Number.isFinite(ecm.y.halfLifeAlone as number)).toBe(true);
  });

  it('says "no adjustment" (null half-life, never a negative or infinite number) for a side whose coefficient points away from the relation', () => {
    const rng = new SeededRandom(19);
    const T = 500;
    // Independent walks: whatever the sample gives, a side with gapSpeed >= 0 has no half-life.
    const ecm = errorCorrectionModel(randomWalk(rng, T), randomWalk(rng, T), { lags: 1 }, { y: 'A', x: 'B' });
    for (const eq of [ecm.y, ecm.x]) {
      if (eq.gapSpeed >= 0) {
        expect(eq.halfLifeAlone).toBeNull();
        expect(eq.halfLifeAloneNote).toContain('no mean reversion');
        expect(ecm.verdict).toContain(`${eq.series} does not move back toward the relation`);
      } else {
        expect(eq.halfLifeAlone as number).toBeGreaterThan(0);
      }
    }
  });

  it('refuses an exact combination, too many lags and an unknown lag rule with MooringInputError', () => {
    const x = randomWalk(new SeededRandom(3), 200);
    expect(() => errorCorrectionModel(x.map((v) => 2 * v), x)).toThrow(/exact combination/);
    const { y, x: x2 } = followerPair(4, 100, -0.2);
    expect(largestEcmLag(100)).toBe(29);
    expect(() => errorCorrectionModel(y, x2, { lags: 30 })).toThrow(/largest allowed is 29/);
    expect(() => errorCorrectionModel(y, x2, { lags: 'bic' as never })).toThrow(MooringInputError);
  });
});
