/**
 * Benchmarks of the break tests: Zivot-Andrews (AIC lag search, then the scan over every
 * candidate date) on 1,000 and 2,500 points for each break model, and Gregory-Hansen on a
 * pair of 600 points. Speed is measured here, never asserted in a test.
 */
import { gregoryHansenTest } from '../breaks/gregory-hansen';
import { zivotAndrewsTest } from '../breaks/zivot-andrews';
import { SeededRandom, randomWalk } from '../random';
import { timeIt, type Timing } from './timing';

export function benchBreaks(): Timing[] {
  const rng = new SeededRandom(12);
  const walk1000 = randomWalk(rng, 1000, { start: 100 });
  const walk2500 = randomWalk(rng, 2500, { start: 100 });
  const x = randomWalk(rng, 600, { start: 50 });
  const y = x.map((v, t) => (t < 300 ? 1 : 3) + 2 * v + rng.normal());
  const out: Timing[] = [];
  for (const model of ['level', 'slope', 'both'] as const) {
    out.push(timeIt(`Zivot-Andrews (${model}), AIC lags, n = 1,000 (700 dates)`, () => zivotAndrewsTest(walk1000, { model })));
    out.push(timeIt(`Zivot-Andrews (${model}), AIC lags, n = 2,500 (1,750 dates)`, () => zivotAndrewsTest(walk2500, { model }), { targetMs: 50 }));
  }
  out.push(timeIt('Zivot-Andrews (both), 8 fixed lags, n = 2,500', () => zivotAndrewsTest(walk2500, { model: 'both', lags: 8 })));
  for (const model of ['level', 'level-trend', 'regime'] as const) {
    out.push(timeIt(`Gregory-Hansen (${model}), AIC lags once, n = 600 (421 dates)`, () => gregoryHansenTest(y, [x], { model }), { runs: 10, warmup: 2 }));
  }
  out.push(timeIt('Gregory-Hansen (level), AIC lags at each date, n = 600', () => gregoryHansenTest(y, [x], { model: 'level', lagTiming: 'each-date' }), { runs: 10, warmup: 2 }));
  return out;
}

/** The 2,500-point walk the Zivot-Andrews timings use (same seed and draws as benchBreaks). */
export function breaksBenchWalk(): Float64Array {
  const rng = new SeededRandom(12);
  randomWalk(rng, 1000, { start: 100 });
  return randomWalk(rng, 2500, { start: 100 });
}
