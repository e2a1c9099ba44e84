/**
 * KPSS reuses one store for its residuals from call to call (kpss.ts, residualRoom): a call after
 * a longer or shorter series, or after a refusal, must give the same answer as the first call.
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom, randomWalk } from '../../addin/random';
import { kpssTest } from '../../addin/unitroot/kpss';

describe('KPSS residual store reused between calls', () => {
  it('gives the same statistic, bandwidth and long-run variance whatever ran before', () => {
    const long = randomWalk(new SeededRandom(5), 3000, { start: 50 });
    const short = randomWalk(new SeededRandom(6), 120, { start: 20 });
    const first = { long: kpssTest(long), short: kpssTest(short) };
    expect(() => kpssTest([1, 2])).toThrow(/too few/);
    for (const order of [[short, long, short], [long, long, short]]) {
      for (const s of order) {
        const again = kpssTest(s);
        const was = s === long ? first.long : first.short;
        expect(again.statistic).toBe(was.statistic);
        expect(again.bandwidth).toBe(was.bandwidth);
        expect(again.details).toEqual(was.details);
      }
    }
    // The first short call ran with a store already sized for 3,000: its answer equals a fresh
    // computation on a copy of its values.
    expect(kpssTest(Float64Array.from(short)).statistic).toBe(first.short.statistic);
  });
});
