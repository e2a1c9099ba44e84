/**
 * Benchmarks of the foundation: ADF with AIC search on 10,000 points (default maximum lag),
 * KPSS on 10,000 points, and ADF with a fixed lag for comparison; DF-GLS and Ng-Perron (modified
 * AIC search) on 2,500 points, with ADF on the same 2,500 for scale.
 */
import { SeededRandom, randomWalk } from '../random';
import { adfTest } from '../unitroot/adf';
import { dfglsTest } from '../unitroot/dfgls';
import { ngPerronTest } from '../unitroot/ng-perron';
import { kpssTest } from '../unitroot/kpss';
import { phillipsPerronTest } from '../unitroot/phillips-perron';
import { timeIt, type Timing } from './timing';

export function benchUnitRoot(): Timing[] {
  const walk = randomWalk(new SeededRandom(11), 10_000, { start: 100 });
  const shorter = walk.slice(0, 2500);
  return [
    timeIt('ADF, AIC search to the default maximum lag (38), n = 10,000', () => adfTest(walk), { targetMs: 10 }),
    timeIt('ADF, fixed 4 lags, n = 10,000', () => adfTest(walk, { lags: 4 })),
    timeIt('KPSS, automatic bandwidth, n = 10,000', () => kpssTest(walk), { targetMs: 2 }),
    timeIt('Phillips-Perron, automatic bandwidth, n = 10,000', () => phillipsPerronTest(walk)),
    timeIt('ADF, AIC search to the default maximum lag (27), n = 2,500', () => adfTest(shorter)),
    timeIt('DF-GLS, constant, modified AIC search to the default maximum lag (27), n = 2,500', () => dfglsTest(shorter), { targetMs: 5 }),
    timeIt('DF-GLS, trend, modified AIC search, n = 2,500', () => dfglsTest(shorter, { deterministic: 'trend' }), { targetMs: 5 }),
    timeIt('Ng-Perron MZa/MZt/MSB/MPT, constant, modified AIC search, n = 2,500', () => ngPerronTest(shorter), { targetMs: 5 }),
  ];
}
