import { describe, expect, it } from 'vitest';
import { glsroot, mstats } from '../../functions/functions';
import { SeededRandom, randomWalk } from '../../addin/random';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';

/** MOOR.GLSROOT and MOOR.MSTATS return the engine's numbers; the prep argument is read last. */
const prices = Array.from(randomWalk(new SeededRandom(8201), 240, { start: 80 }));
const column = prices.map((v) => [v]);

describe('MOOR.GLSROOT and MOOR.MSTATS', () => {
  it('the headline is the engine\'s p-value; stat is the statistic (DF-GLS tau, MZa)', () => {
    expect(glsroot(column)[0][0]).toBe(dfglsTest(prices).pValue);
    expect(glsroot(column, 'trend', 'aic', 'stat')[0][0]).toBe(dfglsTest(prices, { deterministic: 'trend', lags: 'aic' }).statistic);
    expect(mstats(column)[0][0]).toBe(ngPerronTest(prices).pValue);
    expect(mstats(column, 'const', 2, 'stat')[0][0]).toBe(ngPerronTest(prices, { lags: 2 }).statistic);
  });
  it('prep log takes logs before the test', () => {
    expect(glsroot(column, undefined, undefined, 'stat', 'log')[0][0]).toBe(dfglsTest(prices.map(Math.log)).statistic);
  });
  it('deterministic none is refused with a message naming the words that work', () => {
    expect(() => glsroot(column, 'none')).toThrow(/const, trend/);
  });
});
