import { describe, expect, it } from 'vitest';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { generatedUniverse, trulyRelated } from './generated-universe';

/**
 * Monte Carlo check on universes with known structure. Seeds 1000..1019 (20 universes, the
 * replications); each holds 4 clusters of 3 series sharing one random-walk trend (the 24
 * directed pairs inside clusters are truly cointegrated) and 8 independent walks, T = 500:
 * 380 directed pairs, 356 of them unrelated.
 *
 * Benjamini & Hochberg (1995, Theorem 1) bound the false-discovery rate by q m0 / m =
 * 0.05 x 356 / 380 = 4.7% for independent tests; the directed pairs here are dependent (both
 * directions share data, and every pair across two clusters rests on the same two trends),
 * and the AIC residual test's true size is about 6% (engle-granger-monte-carlo.test.ts), so
 * the mean proportion lands near, not exactly at, 5%. Measured on these seeds: 4.3% (the raw 5%
 * rule: 40%); over seeds 1000..1039, 5.7% with a standard deviation of 9.2 points per universe,
 * so the standard error of a 20-universe mean is about 2.1 points. Tolerance: the mean lies in
 * [1%, 11%] (about 3 standard errors either side of 5%-6%).
 */
const SEEDS = Array.from({ length: 20 }, (_, i) => 1000 + i);
const runs = SEEDS.map((seed) => {
  const universe = generatedUniverse(seed, { clusters: 4, perCluster: 3, walks: 8, T: 500 });
  return { universe, result: screenPairs(universe.series) };
});

describe('screen of 20 seeded universes with known clusters (4 x 3 related series + 8 walks, T = 500)', () => {
  it('tests all 380 directed pairs of each universe, 24 of them truly related', () => {
    for (const { universe, result } of runs) {
      expect(result.family.size).toBe(380);
      expect(result.pairs.filter((p) => trulyRelated(universe, p.y, p.x))).toHaveLength(24);
    }
  });

  it('ranks the 24 truly related pairs above every unrelated one in each universe (measured: all 20)', () => {
    const topTrue = runs.map(({ universe, result }) => result.pairs.slice(0, 24).filter((p) => trulyRelated(universe, p.y, p.x)).length);
    expect(topTrue).toEqual(SEEDS.map(() => 24));
  });

  it('keeps the mean false-discovery proportion among Benjamini-Hochberg discoveries at 5% within [1%, 11%]', () => {
    const proportions = runs.map(({ universe, result }) => {
      const found = result.pairs.filter((p) => p.discovery);
      return found.length === 0 ? 0 : found.filter((p) => !trulyRelated(universe, p.y, p.x)).length / found.length;
    });
    const mean = proportions.reduce((a, b) => a + b, 0) / proportions.length;
    expect(mean).toBeGreaterThan(0.01);
    expect(mean).toBeLessThan(0.11);
  });

  it('finds on average at least 23 of the 24 related pairs after the adjustment', () => {
    const found = runs.map(({ universe, result }) => result.pairs.filter((p) => p.discovery && trulyRelated(universe, p.y, p.x)).length);
    expect(found.reduce((a, b) => a + b, 0) / found.length).toBeGreaterThanOrEqual(23);
  });

  it('without the adjustment, the raw 5% rule lets far more unrelated pairs through: its false proportion is above 25%', () => {
    const proportions = runs.map(({ universe, result }) => {
      const pass = result.pairs.filter((p) => p.pValue <= 0.05);
      return pass.filter((p) => !trulyRelated(universe, p.y, p.x)).length / pass.length;
    });
    expect(proportions.reduce((a, b) => a + b, 0) / proportions.length).toBeGreaterThan(0.25);
  });

  it('says in its chance sentence that about 19 of the 380 would pass by chance alone', () => {
    for (const { result } of runs) {
      expect(result.expectedByChance).toBe(19);
      expect(result.chanceSentence).toMatch(/^Of 380 directed pairs tested at 5%, \d+ pass on their own p-value, but about 19 would pass by chance alone even if no pair were related; \d+ pass(es)? after false-discovery-rate adjustment/);
    }
  });
});
