/**
 * Benchmarks of the foundation: ADF with AIC search on 10,000 points (default maximum lag),
 * KPSS on 10,000 points, and ADF with a fixed lag for comparison.
 */
import { SeededRandom, randomWalk } from '../random';
import { adfTest } from '../unitroot/adf';
import { kpssTest } from '../unitroot/kpss';
import { phillipsPerronTest } from '../unitroot/phillips-perron';
import { timeIt, type Timing } from './timing';

export function benchUnitRoot(): Timing[] {
  const walk = randomWalk(new SeededRandom(11), 10_000, { start: 100 });
  return [
    timeIt('ADF, AIC search to the default maximum lag (38), n = 10,000', () => adfTest(walk), { targetMs: 10 }),
    timeIt('ADF, fixed 4 lags, n = 10,000', () => adfTest(walk, { lags: 4 })),
    timeIt('KPSS, automatic bandwidth, n = 10,000', () => kpssTest(walk), { targetMs: 2 }),
    timeIt('Phillips-Perron, automatic bandwidth, n = 10,000', () => phillipsPerronTest(walk)),
  ];
}
