/**
 * Tests on the Johansen relation (addin/johansen/restrictions.ts): the LR test that the relation
 * is a given vector, and the LR test that a series never adjusts (weak exogeneity).
 *
 * Checks:
 * - a hand-derived 2-series case: with one relation and a fully given vector the restricted
 *   eigenproblem has one eigenvalue, λ* = b'S10 S00^{-1} S01 b / b'S11 b, and the free one is the
 *   larger root of a 2 x 2 quadratic (Johansen 1995, ch. 7); with the change of one series
 *   conditioned on, the restricted eigenvalue is S_a1.b S11.b^{-1} S_1a.b / S_aa.b (ch. 8);
 *   the product moments are formed in the test by normal equations, not by the engine's QR;
 * - the restricted problems solved independently: the concentrated likelihood of the VECM
 *   maximised over the relation's weight by a grid and golden-section search, with plain
 *   least squares for each trial weight (no eigenproblem at all);
 * - size: seeded Monte Carlo (SeededRandom 2024, 2,000 replications of 400 rows) rejects a
 *   true null at 5% within ±1.5 points.
 */
import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { betaRestrictionTest, exogeneityTests } from '../../addin/johansen/restrictions';
import { SeededRandom } from '../../addin/random';

/** A cointegrated pair: x2 a random walk, x1 adjusting to x1 = 1 + 0.9 x2 at speed a1; x2 at speed a2. */
function pair(rng: SeededRandom, n: number, a1: number, a2: number, weight = 0.9): [Float64Array, Float64Array] {
  const x1 = new Float64Array(n);
  const x2 = new Float64Array(n);
  x1[0] = 1;
  for (let t = 1; t < n; t++) {
    const gap = x1[t - 1] - 1 - weight * x2[t - 1];
    x2[t] = x2[t - 1] + a2 * gap + rng.normal();
    x1[t] = x1[t - 1] + a1 * gap + 0.5 * rng.normal();
  }
  return [x1, x2];
}

/** Residuals of each column of Y on the columns of Z (normal equations through ml-matrix). */
function residualsOn(Y: Matrix, Z: Matrix): Matrix {
  const coef = solve(Z.transpose().mmul(Z), Z.transpose().mmul(Y));
  return Y.clone().sub(Z.mmul(coef));
}

/** K = 1, case 'constant': Δx_t, x_{t-1} and the short-run block [Δx_{t-1}, 1] over t = 2..T-1. */
function blocks(x1: Float64Array, x2: Float64Array) {
  const T = x1.length;
  const rows = T - 2;
  const dY = new Matrix(rows, 2);
  const lev = new Matrix(rows, 2);
  const Z = new Matrix(rows, 3);
  for (let i = 0; i < rows; i++) {
    const t = i + 2;
    dY.setRow(i, [x1[t] - x1[t - 1], x2[t] - x2[t - 1]]);
    lev.setRow(i, [x1[t - 1], x2[t - 1]]);
    Z.setRow(i, [x1[t - 1] - x1[t - 2], x2[t - 1] - x2[t - 2], 1]);
  }
  return { rows, dY, lev, Z };
}

describe('hand-derived two-series case (one relation)', () => {
  const [x1, x2] = pair(new SeededRandom(7), 300, -0.25, 0.1);
  const { rows: n, dY, lev, Z } = blocks(x1, x2);
  const R0 = residualsOn(dY, Z);
  const R1 = residualsOn(lev, Z);
  const S00 = R0.transpose().mmul(R0).div(n);
  const S01 = R0.transpose().mmul(R1).div(n);
  const S11 = R1.transpose().mmul(R1).div(n);
  // free eigenvalues: roots of det(λ S11 - S10 S00^{-1} S01) = 0, a quadratic in λ
  const M = S01.transpose().mmul(solve(S00, S01));
  const det2 = (A: Matrix) => A.get(0, 0) * A.get(1, 1) - A.get(0, 1) * A.get(1, 0);
  const qa = det2(S11);
  const qb = -(S11.get(0, 0) * M.get(1, 1) + S11.get(1, 1) * M.get(0, 0) - S11.get(0, 1) * M.get(1, 0) - S11.get(1, 0) * M.get(0, 1));
  const qc = det2(M);
  const lambda1 = (-qb + Math.sqrt(qb * qb - 4 * qa * qc)) / (2 * qa);

  it('the relation test equals n ln[(1 - λ*)/(1 - λ1)] with λ* = b\'S10 S00^-1 S01 b / b\'S11 b', () => {
    for (const b of [[1, -1], [1, -0.9], [2, -1.7]]) {
      const bv = Matrix.columnVector(b);
      const lambdaStar = bv.transpose().mmul(M).mmul(bv).get(0, 0) / bv.transpose().mmul(S11).mmul(bv).get(0, 0);
      const expected = n * Math.log((1 - lambdaStar) / (1 - lambda1));
      const test = betaRestrictionTest([x1, x2], b, { case: 'constant', lags: 1 });
      expect(test.df).toBe(1);
      expect(test.statistic).toBeCloseTo(expected, 8);
    }
  });

  it('the adjustment test of each series equals the conditional one-eigenvalue formula', () => {
    const tests = exogeneityTests([x1, x2], { case: 'constant', lags: 1 }, ['A', 'B']);
    [0, 1].forEach((bIdx) => {
      const aIdx = 1 - bIdx;
      const sbb = S00.get(bIdx, bIdx);
      const saa = S00.get(aIdx, aIdx) - (S00.get(aIdx, bIdx) ** 2) / sbb;
      const sa1 = Matrix.rowVector([0, 1].map((c) => S01.get(aIdx, c) - (S00.get(aIdx, bIdx) * S01.get(bIdx, c)) / sbb));
      const s11b = S11.clone().sub(Matrix.columnVector([0, 1].map((c) => S01.get(bIdx, c))).mmul(Matrix.rowVector([0, 1].map((c) => S01.get(bIdx, c)))).div(sbb));
      const lambdaStar = sa1.mmul(solve(s11b, sa1.transpose())).get(0, 0) / saa;
      expect(tests[bIdx].series).toBe(['A', 'B'][bIdx]);
      expect(tests[bIdx].df).toBe(1);
      expect(tests[bIdx].statistic).toBeCloseTo(n * Math.log((1 - lambdaStar) / (1 - lambda1)), 8);
    });
  });
});

describe('the restricted problems solved independently (concentrated likelihood, no eigenproblem)', () => {
  const [x1, x2] = pair(new SeededRandom(11), 250, -0.3, 0.15);
  const { rows: n, dY, lev, Z } = blocks(x1, x2);
  const logDet = (S: Matrix) => Math.log(S.get(0, 0) * S.get(1, 1) - S.get(0, 1) * S.get(1, 0));
  /** log det of the residual covariance with the relation x1 + w x2 (both series adjusting). */
  const free = (w: number) => {
    const gap = lev.getColumnVector(0).add(lev.getColumnVector(1).mul(w));
    const E = residualsOn(dY, Matrix.columnVector(gap.to1DArray()).addColumn(Z.getColumn(0)).addColumn(Z.getColumn(1)).addColumn(Z.getColumn(2)));
    return logDet(E.transpose().mmul(E).div(n));
  };
  /** The same with series `fixed` never adjusting: its change on the short run alone, the other's on it and the gap. */
  const noAdjust = (fixed: number) => (w: number) => {
    const other = 1 - fixed;
    const gap = lev.getColumnVector(0).add(lev.getColumnVector(1).mul(w)).to1DArray();
    const eb = residualsOn(dY.getColumnVector(fixed), Z);
    const Za = Matrix.columnVector(gap).addColumn(dY.getColumn(fixed)).addColumn(Z.getColumn(0)).addColumn(Z.getColumn(1)).addColumn(Z.getColumn(2));
    const ea = residualsOn(dY.getColumnVector(other), Za);
    const vb = eb.transpose().mmul(eb).get(0, 0) / n;
    const va = ea.transpose().mmul(ea).get(0, 0) / n;
    return Math.log(vb) + Math.log(va);
  };
  const minimise = (f: (w: number) => number) => {
    let best = -0.9;
    for (let w = -3; w <= 1; w += 0.001) if (f(w) < f(best)) best = w;
    let lo = best - 0.002;
    let hi = best + 0.002;
    const g = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 80; i++) {
      const a = hi - g * (hi - lo);
      const b = lo + g * (hi - lo);
      if (f(a) < f(b)) hi = b;
      else lo = a;
    }
    return f((lo + hi) / 2);
  };
  const unrestricted = minimise(free);

  it('the relation test is n (log det at the given vector - log det at the best one)', () => {
    for (const b of [[1, -1], [1, -0.8]]) {
      const expected = n * (free(b[1] / b[0]) - unrestricted);
      expect(betaRestrictionTest([x1, x2], b, { case: 'constant', lags: 1 }).statistic).toBeCloseTo(expected, 5);
    }
  });

  it('the adjustment test is n (best log det with the series held still - best log det)', () => {
    const tests = exogeneityTests([x1, x2], { case: 'constant', lags: 1 });
    for (const fixed of [0, 1]) {
      expect(tests[fixed].statistic).toBeCloseTo(n * (minimise(noAdjust(fixed)) - unrestricted), 5);
    }
  });
});

describe('size by seeded Monte Carlo (SeededRandom 2024, 2,000 replications of 400 rows, 5% level, ±1.5 points)', () => {
  const reps = 2000;
  const rng = new SeededRandom(2024);
  let betaRejections = 0;
  let exoRejections = 0;
  for (let rep = 0; rep < reps; rep++) {
    // x2 never adjusts (a2 = 0) and the relation is x1 - 0.9 x2: both nulls are true
    const [x1, x2] = pair(rng, 400, -0.2, 0);
    if (betaRestrictionTest([x1, x2], [1, -0.9], { case: 'constant', lags: 1 }).pValue < 0.05) betaRejections++;
    if (exogeneityTests([x1, x2], { case: 'constant', lags: 1 })[1].pValue < 0.05) exoRejections++;
  }
  it('the relation test rejects a true vector about 5% of the time', () => {
    expect(Math.abs((100 * betaRejections) / reps - 5)).toBeLessThanOrEqual(1.5);
  });
  it('the adjustment test rejects a series that never adjusts about 5% of the time', () => {
    expect(Math.abs((100 * exoRejections) / reps - 5)).toBeLessThanOrEqual(1.5);
  });
  it('and the tests have power: a wrong vector and an adjusting series are rejected', () => {
    const [x1, x2] = pair(new SeededRandom(5), 400, -0.2, 0.2);
    expect(betaRestrictionTest([x1, x2], [1, -1.2], { case: 'constant', lags: 1 }).pValue).toBeLessThan(0.01);
    expect(exogeneityTests([x1, x2], { case: 'constant', lags: 1 })[1].pValue).toBeLessThan(0.01);
  });
});

describe('refusals', () => {
  const [x1, x2] = pair(new SeededRandom(3), 120, -0.3, 0);
  it('a vector of the wrong length or all zeros is refused in words', () => {
    expect(() => betaRestrictionTest([x1, x2], [1, -1, 0])).toThrow(/one weight per series/);
    expect(() => betaRestrictionTest([x1, x2], [0, 0])).toThrow(/not all zero/);
  });
  it('with a constant inside the relation the constant stays free (still m - 1 degrees of freedom)', () => {
    expect(betaRestrictionTest([x1, x2], [1, -0.9], { case: 'restricted-constant' }).df).toBe(1);
  });
});
