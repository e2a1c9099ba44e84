import { describe, expect, it } from 'vitest';
import { johansenTest } from '../../addin/johansen/johansen';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, randomWalk } from '../../addin/random';

/** Bad input is refused with a MooringInputError whose message says what to change. */
function refusal(run: () => unknown): MooringInputError {
  try {
    run();
  } catch (e) {
    expect(e).toBeInstanceOf(MooringInputError);
    return e as MooringInputError;
  }
  throw new Error('expected a MooringInputError, got a result');
}

const rng = new SeededRandom(6101);
const walks = Array.from({ length: 13 }, () => randomWalk(rng, 120, { start: 50 }));

describe('Johansen input refusals', () => {
  it('one series: needs 2 to 12, points to a unit-root test', () => {
    expect(refusal(() => johansenTest([walks[0]])).message).toMatch(/2 to 12 series; got 1.*unit-root/);
  });

  it('13 series: needs 2 to 12, suggests smaller systems', () => {
    expect(refusal(() => johansenTest(walks)).message).toMatch(/2 to 12 series; got 13/);
  });

  it('unequal lengths: names both series and their row counts', () => {
    const e = refusal(() => johansenTest([walks[0], walks[1].subarray(0, 100)], {}, ['Crude', 'Diesel']));
    expect(e.message).toMatch(/'Crude' has 120 rows but 'Diesel' has 100/);
  });

  it('K too large for T: says how many rows the lags need', () => {
    const e = refusal(() => johansenTest([walks[0].subarray(0, 30), walks[1].subarray(0, 30)], { lags: 10 }));
    expect(e.message).toMatch(/needs at least \d+ rows; got 30/);
  });

  it('a series that is an exact combination of two others', () => {
    const combo = walks[0].map((v, t) => v + 2 * walks[1][t]);
    const e = refusal(() => johansenTest([walks[0], walks[1], combo], { case: 'constant', lags: 1 }, ['A', 'B', 'C']));
    expect(e.message).toMatch(/'C'/);
    expect(e.message).toMatch(/copies or mixes others/);
  });

  it('a duplicated series, with no lags and no constant (caught at the levels)', () => {
    const e = refusal(() => johansenTest([walks[0], walks[1], walks[1]], { case: 'none', lags: 0 }, ['A', 'B', 'B2']));
    expect(e.message).toMatch(/the level of 'B2'.*exact combination/);
  });

  it("a series that is another plus a constant, in the 'none' case with no lags (caught at the changes)", () => {
    const e = refusal(() => johansenTest([walks[0], walks[0].map((v) => v + 3)], { case: 'none', lags: 0 }, ['A', 'A+3']));
    expect(e.message).toMatch(/changes of 'A\+3' are explained exactly/);
  });

  it('a constant series', () => {
    const flat = new Float64Array(120).fill(4);
    expect(refusal(() => johansenTest([walks[0], flat], {}, ['A', 'Flat'])).message).toMatch(/'Flat' never changes/);
  });

  it('a gap (NaN) names the row', () => {
    const gap = Float64Array.from(walks[1]);
    gap[36] = Number.NaN;
    expect(refusal(() => johansenTest([walks[0], gap], {}, ['A', 'B'])).message).toMatch(/Row 37 of 'B' is not a finite number/);
  });

  it('unknown case, bad lags, bad alpha, bad correction flag, mismatched names', () => {
    const two = [walks[0], walks[1]];
    expect(refusal(() => johansenTest(two, { case: 'drift' as never })).message).toMatch(/Unknown deterministic case 'drift'/);
    expect(refusal(() => johansenTest(two, { lags: -1 })).message).toMatch(/whole number of 0 or more/);
    expect(refusal(() => johansenTest(two, { lags: 1.5 })).message).toMatch(/whole number of 0 or more/);
    expect(refusal(() => johansenTest(two, { alpha: 5 })).message).toMatch(/between 0 and 1/);
    expect(refusal(() => johansenTest(two, { smallSampleCorrection: 'yes' as never })).message).toMatch(/true or false/);
    expect(refusal(() => johansenTest(two, {}, ['only one'])).message).toMatch(/one name per series: 2 series but 1 names/);
  });

  it('not a list of series', () => {
    expect(refusal(() => johansenTest('A1:B20' as never)).message).toMatch(/list of series/);
  });
});
