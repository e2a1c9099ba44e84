import { describe, expect, it } from 'vitest';
import { johansenTest } from '../../addin/johansen/johansen';
import { sequentialRank, rankVerdict } from '../../addin/johansen/rank-verdict';
import { driftingSeries } from '../../addin/johansen/johansen-warnings';
import { leastSquares } from '../../addin/regression/least-squares';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { fixtureSeries, loadFixture, type FixtureFile, type JohansenCase as FixtureCase } from '../reference/fixtures';

/** Three series, T = 300, one tie y1 = 2 + 0.8 y2 - 0.4 y3 + AR(1) noise; y2, y3 drift by drift, drift/3. */
function tiedTriple(seed: number, drift = 0, phi = 0.5): Float64Array[] {
  const rng = new SeededRandom(seed);
  const y2 = randomWalk(rng, 300, { start: 40, drift });
  const y3 = randomWalk(rng, 300, { start: 20, drift: drift / 3 });
  const u = autoregressive1(rng, 300, phi);
  return [y2.map((v, t) => 2 + 0.8 * v - 0.4 * y3[t] + u[t]), y2, y3];
}

describe('Johansen result shape and consistency', () => {
  const names = ['Crude', 'Diesel', 'Freight'];
  const r = johansenTest(tiedTriple(7101, 0.3), { case: 'constant', lags: 1 }, names);

  it('one trace and one max-eigen result per r, hypotheses in words, upper tail, statistics decreasing in r', () => {
    expect(r.trace).toHaveLength(3);
    expect(r.maxEigen).toHaveLength(3);
    expect(r.trace[0].nullHypothesis).toBe('no long-run relation among Crude, Diesel and Freight');
    expect(r.trace[1].nullHypothesis).toBe('at most 1 long-run relation among Crude, Diesel and Freight');
    expect(r.trace[1].alternative).toBe('more than 1 long-run relation among Crude, Diesel and Freight');
    expect(r.trace[0].alternative).toBe('at least 1 long-run relation among Crude, Diesel and Freight');
    expect(r.maxEigen[0].alternative).toBe('exactly 1 long-run relation among Crude, Diesel and Freight');
    expect(r.trace[0].title).toBe('Johansen trace test of no long-run relation among Crude, Diesel and Freight');
    expect(r.maxEigen[1].alternative).toBe('exactly 2 long-run relations among Crude, Diesel and Freight');
    for (let i = 0; i < 2; i++) expect(r.trace[i].statistic).toBeGreaterThan(r.trace[i + 1].statistic);
    expect(r.trace[2].statistic).toBeCloseTo(r.maxEigen[2].statistic, 12);
    for (const t of [...r.trace, ...r.maxEigen]) {
      expect(t.rejectTail).toBe('upper');
      expect(t.nobs).toBe(300 - 1 - 1);
      expect(t.pValue).not.toBeNull();
      expect(Object.keys(t.critical).sort()).toEqual(['10%', '1%', '5%'].sort());
    }
  });

  it('finds the one relation and says so in plain words', () => {
    expect(r.rank).toEqual({ trace: 1, maxEigen: 1 });
    expect(r.verdict).toMatch(/^At 5%, Crude, Diesel and Freight share 1 long-run relation \(trace test\)\./);
    // One sample of 298 rows: the estimate is close, not exact (the fixture's sys3 sample,
    // same design, gives -0.89 and 0.48 in the reference library too).
    expect(Math.abs(r.beta[1][0] - -0.8)).toBeLessThan(0.15);
    expect(Math.abs(r.beta[2][0] - 0.4)).toBeLessThan(0.15);
    expect(r.beta[0]).toEqual([1, 1, 1]);
  });

  it('at full rank, alpha beta\' equals the unrestricted least-squares coefficient of the levels (Johansen 1995, ch. 6)', () => {
    // Each equation: Δy_i on the three lagged levels, the three lagged changes and a constant.
    const block = tiedTriple(7101, 0.3);
    const n = 298;
    const lagged = (x: Float64Array, k: number) => Float64Array.from({ length: n }, (_, i) => x[i + 2 - k]);
    const change = (x: Float64Array, k: number) => Float64Array.from({ length: n }, (_, i) => x[i + 2 - k] - x[i + 1 - k]);
    const columns = [...block.map((x) => lagged(x, 1)), ...block.map((x) => change(x, 1)), new Float64Array(n).fill(1)];
    for (let i = 0; i < 3; i++) {
      const fit = leastSquares(change(block[i], 0), columns);
      for (let k = 0; k < 3; k++) {
        let pi = 0;
        for (let j = 0; j < 3; j++) pi += r.alpha[i][j] * r.beta[k][j];
        expect(Math.abs(pi - fit.coefficients[k])).toBeLessThan(1e-9 * Math.max(1, Math.abs(fit.coefficients[k])));
      }
    }
  });

  it('the small-sample correction scales every statistic by (n - m(K+1))/n, with n = T - K - 1', () => {
    const block = tiedTriple(7101, 0.3);
    const plain = johansenTest(block, { lags: 2 });
    const corrected = johansenTest(block, { lags: 2, smallSampleCorrection: true });
    const n = 300 - 2 - 1;
    const factor = (n - 3 * 3) / n;
    expect(corrected.smallSampleFactor).toBeCloseTo(factor, 15);
    corrected.trace.forEach((t, i) => expect(t.statistic).toBeCloseTo(factor * plain.trace[i].statistic, 10));
    corrected.maxEigen.forEach((t, i) => expect(t.statistic).toBeCloseTo(factor * plain.maxEigen[i].statistic, 10));
    expect(corrected.warnings.some((w) => w.includes('Reinsel & Ahn'))).toBe(true);
    expect(corrected.eigenvalues).toEqual(plain.eigenvalues);
  });
});

describe('Johansen warnings', () => {
  it("'constant' on driftless data warns and suggests 'restricted-constant'; drifting data do not warn", () => {
    const driftless = johansenTest(tiedTriple(7102, 0), { case: 'constant' });
    expect(driftless.warnings.some((w) => w.includes('rejects too often') && w.includes("'restricted-constant'"))).toBe(true);
    const drifting = johansenTest(tiedTriple(7102, 0.3), { case: 'constant' });
    expect(drifting.warnings.some((w) => w.includes('rejects too often'))).toBe(false);
  });

  it("'trend' on merely drifting data warns and suggests 'restricted-trend'; trending changes (quadratic levels) do not warn", () => {
    const drifting = johansenTest(tiedTriple(7107, 0.3), { case: 'trend' });
    expect(drifting.warnings.some((w) => w.includes('quadratic trends') && w.includes("'restricted-trend'"))).toBe(true);
    const bent = tiedTriple(7107, 0.3).map((x) => x.map((v, t) => v + 0.002 * t * t));
    expect(johansenTest(bent, { case: 'trend' }).warnings.some((w) => w.includes('quadratic trends'))).toBe(false);
  });

  it("'none' on drifting data warns that the case assumes no drift", () => {
    const res = johansenTest(tiedTriple(7103, 0.3), { case: 'none' }, ['A', 'B', 'C']);
    expect(res.warnings.some((w) => w.includes("the 'none' case assumes no drift"))).toBe(true);
  });

  it('the drift check flags a walk with drift 0.3 and not a driftless one (seed 7104, T = 300)', () => {
    const rng = new SeededRandom(7104);
    expect(driftingSeries([randomWalk(rng, 300, { drift: 0.3 }), randomWalk(rng, 300)])).toEqual([true, false]);
  });

  it('short samples: the Danish data (Johansen & Juselius 1990), 4 series, n = 53 (K = 1) and n = 49 (K = 5)', () => {
    const fixture = loadFixture<FixtureFile<FixtureCase>>('johansen');
    const block = ['dk_lrm', 'dk_lry', 'dk_lpy', 'dk_ibo'].map((id) => fixtureSeries(fixture, id));
    const names = ['lrm', 'lry', 'lpy', 'ibo'];
    const k1 = johansenTest(block, { case: 'restricted-constant', lags: 1 }, names);
    expect(k1.nobs).toBe(53);
    expect(k1.warnings.some((w) => w.startsWith('53 observations for 9 coefficients per equation'))).toBe(true);
    const k5 = johansenTest(block, { case: 'restricted-constant', lags: 5 }, names);
    expect(k5.nobs).toBe(49);
    expect(k5.warnings.some((w) => w.startsWith('Only 49 observations') && w.includes('Reinsel & Ahn'))).toBe(true);
  });

  it('an eigenvalue near 1 (a tie whose gap flips sign every row, AR(1) phi = -0.95, K = 0, seed 7105) is flagged', () => {
    const res = johansenTest(tiedTriple(7105, 0.3, -0.95), { case: 'constant', lags: 0 });
    expect(res.eigenvalues[0]).toBeGreaterThan(0.95);
    expect(res.warnings.some((w) => w.includes('close to 1'))).toBe(true);
  });

  it("restricted cases say their p-values rest on Mooring's simulation alone; published cases do not", () => {
    const block = tiedTriple(7106, 0.3);
    expect(johansenTest(block, { case: 'restricted-trend' }).warnings.some((w) => w.includes("Mooring's own simulation"))).toBe(true);
    expect(johansenTest(block, { case: 'trend' }).warnings.some((w) => w.includes("Mooring's own simulation"))).toBe(false);
  });
});

describe('Johansen rank choice and verdict', () => {
  it('sequential rule: the first r not rejected, or n when all are', () => {
    expect(sequentialRank([0.6, 0.2], 0.05)).toBe(0);
    expect(sequentialRank([0.001, 0.3, 0.01], 0.05)).toBe(1);
    expect(sequentialRank([0.001, 0.04], 0.05)).toBe(2);
    expect(sequentialRank([0.001, 0.04], 0.01)).toBe(1);
  });

  it('verdicts for no relation, full rank, and a disagreement between the two tests', () => {
    expect(rankVerdict(['A', 'B'], { trace: 0, maxEigen: 0 }, 0.05)).toMatch(/^At 5%, A and B share no long-run relation \(trace test\)/);
    expect(rankVerdict(['A', 'B'], { trace: 2, maxEigen: 2 }, 0.1)).toMatch(/^At 10%, the trace test rejects every rank below 2: .*stationary.*unit-root test/);
    expect(rankVerdict(['A', 'B', 'C'], { trace: 2, maxEigen: 1 }, 0.05)).toMatch(/share 2 long-run relations \(trace test\).*maximum-eigenvalue test points to 1 instead/);
  });
});
