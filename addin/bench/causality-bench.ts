/**
 * Benchmarks of the lead-lag tests on a 2,500-row pair (about ten years of daily prices):
 * the Granger F test with 4 lags, Toda-Yamamoto with p = 4 and dmax = 1 given, Toda-Yamamoto
 * with dmax found by the unit-root tests, and the VAR lag-order search at its default ceiling
 * (the Gram path, and the Householder QR path it replaced, for comparison).
 */
import { grangerF } from '../causality/granger-f';
import { todaYamamoto } from '../causality/toda-yamamoto';
import { SeededRandom, randomWalk } from '../random';
import { chooseVarLags } from '../var/choose-var-lags';
import { timeIt, type Timing } from './timing';

/** Timings of the lead-lag tests and the VAR order search (median and fastest of repeated runs). */
export function benchCausality(): Timing[] {
  const { leader, follower } = causalityBenchPair();
  return [
    timeIt('Granger F, 4 lags, n = 2,500', () => grangerF(leader, follower, { lags: 4 })),
    timeIt('Granger F at lags 1, 2, 3 and 4 on the values, n = 2,500', () => {
      for (let p = 1; p <= 4; p++) grangerF(leader, follower, { lags: p });
    }),
    timeIt('Toda-Yamamoto, p = 4, dmax = 1 given, n = 2,500', () => todaYamamoto(leader, follower, { lags: 4, extraLags: 1 })),
    timeIt('Toda-Yamamoto, p = 4, dmax from ADF and KPSS, n = 2,500', () => todaYamamoto(leader, follower, { lags: 4 }), { runs: 10, warmup: 2 }),
    timeIt('VAR lag order, 2 series, default ceiling (27), n = 2,500', () => chooseVarLags([leader, follower]), { runs: 100, warmup: 40 }),
    timeIt('VAR lag order by the QR path, 2 series, default ceiling (27), n = 2,500', () => chooseVarLags([leader, follower], { method: 'qr' }), { runs: 30, warmup: 30 }),
  ];
}

/** The seeded 2,500-row pair of the lead-lag benchmarks (a random walk and a noisy follower). */
export function causalityBenchPair(): { leader: Float64Array; follower: Float64Array } {
  const rng = new SeededRandom(17);
  const leader = randomWalk(rng, 2_500, { start: 100 });
  const follower = leader.map((v, i) => (i === 0 ? v : 0.5 * leader[i - 1] + 0.5 * v) + rng.normal());
  return { leader, follower };
}
