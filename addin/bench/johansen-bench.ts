/**
 * Benchmark of the Johansen rank test: 6 series x 2,500 rows with K = 2 lagged changes
 * (a seeded system with two long-run relations), median of repeated runs after a warm-up.
 * Target: 5 ms for the 'constant' case. The restricted-trend case (one more column in the
 * levels block, one more in the short-run block) is timed beside it for comparison.
 */
import { johansenTest } from '../johansen/johansen';
import { betaRestrictionTest, exogeneityTests } from '../johansen/restrictions';
import { benchPair } from './cointegration-bench';
import { SeededRandom, autoregressive1, randomWalk } from '../random';
import { timeIt, type Timing } from './timing';

/** Six prices over 2,500 rows: four independent walks and two series tied to them. */
export function benchBlock(): Float64Array[] {
  const rng = new SeededRandom(2500);
  const walks = [0, 1, 2, 3].map(() => randomWalk(rng, 2500, { start: 100, drift: 0.02 }));
  const tied = (a: Float64Array, b: Float64Array, k: number) => {
    const noise = autoregressive1(rng, 2500, 0.6);
    return a.map((v, t) => 0.7 * v + 0.3 * b[t] + k + noise[t]);
  };
  return [...walks, tied(walks[0], walks[1], 5), tied(walks[2], walks[3], -3)];
}

/** Timings (median ms, also as `ms`) of johansenTest on 6 x 2,500 with K = 2. */
export function benchJohansen(): (Timing & { ms: number })[] {
  const block = benchBlock();
  const runs = [
    timeIt("Johansen, 6 series x 2,500 rows, K = 2, 'constant'", () => johansenTest(block, { case: 'constant', lags: 2 }), { runs: 41, warmup: 10, targetMs: 5 }),
    timeIt("Johansen, 6 series x 2,500 rows, K = 2, 'restricted-trend'", () => johansenTest(block, { case: 'restricted-trend', lags: 2 }), { runs: 41, warmup: 10 }),
  ];
  return runs.map((t) => ({ ...t, ms: t.medianMs }));
}

/**
 * Timings of the tests on the Johansen relation (`mooring johansen --beta-test`, `--exogeneity`)
 * on the 2,500-row pair of the cointegration benchmark with K = 2, 'constant': the relation is
 * 1 : -1.2 up to scale, and each series' adjustment is zero (one relation). Target 5 ms each;
 * the reference library has neither test, so there is no ratio.
 */
export function benchJohansenRestrictions(): (Timing & { ms: number })[] {
  const { y, x } = benchPair();
  const block = [y, x];
  const options = { case: 'constant' as const, lags: 2 };
  const runs = [
    timeIt("Johansen relation restriction (--beta-test 1,-1.2), 2 series x 2,500 rows, K = 2, 'constant'", () => betaRestrictionTest(block, [1, -1.2], options), { runs: 101, warmup: 20, targetMs: 5 }),
    timeIt("Johansen adjustment tests (--exogeneity, one relation), 2 series x 2,500 rows, K = 2, 'constant'", () => exogeneityTests(block, { ...options, rank: 1 }), { runs: 101, warmup: 20, targetMs: 5 }),
  ];
  return runs.map((t) => ({ ...t, ms: t.medianMs }));
}
