import { describe, expect, it } from 'vitest';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { zivotAndrewsTest } from '../../addin/breaks/zivot-andrews';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, randomWalk } from '../../addin/random';

/** Bad input is refused with a MooringInputError whose message says what is wrong and what would work. */
function refusal(run: () => unknown): MooringInputError {
  try {
    run();
  } catch (e) {
    if (e instanceof MooringInputError) return e;
    throw new Error(`expected a MooringInputError, got ${String(e)}`);
  }
  throw new Error('expected a MooringInputError, but the call succeeded');
}

const rng = new SeededRandom(81);
const walk = randomWalk(rng, 200, { start: 100 });
const other = randomWalk(rng, 200, { start: 50 });

describe('Zivot-Andrews refuses bad input clearly', () => {
  for (const trim of [0, 0.5, -0.1, 0.7, Number.NaN]) {
    it(`trim ${trim} (outside (0, 0.5))`, () => {
      expect(refusal(() => zivotAndrewsTest(walk, { model: 'level', trim })).message).toMatch(/trim must be a share of the sample strictly between 0 and 0\.5/);
    });
  }
  it('a series too short for the trim and lags', () => {
    const m = refusal(() => zivotAndrewsTest(walk.slice(0, 30), { model: 'slope', lags: 3 })).message;
    expect(m).toMatch(/30 observations with trim 0.15 leave 4 observations at each end/);
    expect(m).toMatch(/fewer lags/);
  });
  it('a series of 5 values', () => {
    expect(refusal(() => zivotAndrewsTest(walk.slice(0, 5), { model: 'level' })).message).toMatch(/too few/);
  });
  it('an unknown model', () => {
    expect(refusal(() => zivotAndrewsTest(walk, { model: 'C' as never })).message).toMatch(/Unknown break model 'C': use one of level, slope, both/);
  });
  it('an unknown lag rule and a negative lag count', () => {
    expect(refusal(() => zivotAndrewsTest(walk, { model: 'level', lags: 'hq' as never })).message).toMatch(/Unknown lag rule 'hq'/);
    expect(refusal(() => zivotAndrewsTest(walk, { model: 'level', lags: -1 })).message).toMatch(/whole number of 0 or more/);
  });
  it('a gap (NaN) in the series, by position', () => {
    const gappy = Float64Array.from(walk);
    gappy[41] = Number.NaN;
    expect(refusal(() => zivotAndrewsTest(gappy, { model: 'both' }, 'Crude')).message).toMatch(/Crude has no number at position 42/);
  });
  it('a constant series', () => {
    expect(() => zivotAndrewsTest(new Float64Array(100).fill(7), { model: 'level', lags: 0 })).toThrow(MooringInputError);
  });
  it('a straight line (no noise left)', () => {
    expect(() => zivotAndrewsTest(Float64Array.from({ length: 100 }, (_, t) => 3 + 0.5 * t), { model: 'level', lags: 0 })).toThrow(MooringInputError);
  });
});

describe('Gregory-Hansen refuses bad input clearly', () => {
  it('series of unequal lengths, naming both', () => {
    const m = refusal(() => gregoryHansenTest(walk, [other.slice(0, 150)], { model: 'level' }, { y: 'Brent', xs: ['WTI'] })).message;
    expect(m).toMatch(/'WTI' has 150 values but 'Brent' has 200/);
  });
  for (const trim of [0, 0.5, 1]) {
    it(`trim ${trim} (outside (0, 0.5))`, () => {
      expect(refusal(() => gregoryHansenTest(walk, [other], { model: 'regime', trim })).message).toMatch(/strictly between 0 and 0\.5/);
    });
  }
  it('a sample too short', () => {
    expect(refusal(() => gregoryHansenTest(walk.slice(0, 15), [other.slice(0, 15)], { model: 'level' })).message).toMatch(/15 observations .* too few/);
  });
  it('a regime shift with too few rows per regime for its coefficients', () => {
    const xs = [0, 1, 2, 3].map((k) => randomWalk(new SeededRandom(90 + k), 30));
    expect(refusal(() => gregoryHansenTest(walk.slice(0, 30), xs, { model: 'regime' })).message).toMatch(/5 coefficients in each regime/);
  });
  it('no regressors', () => {
    expect(refusal(() => gregoryHansenTest(walk, [], { model: 'level' })).message).toMatch(/at least one regressor/);
  });
  it('an unknown model', () => {
    expect(refusal(() => gregoryHansenTest(walk, [other], { model: 'C/S' as never })).message).toMatch(/Unknown shift model 'C\/S': use one of level, level-trend, regime/);
  });
  it('y an exact combination of x at every date', () => {
    const y = other.map((v) => 1 + 2 * v);
    expect(refusal(() => gregoryHansenTest(y, [other], { model: 'level', lags: 1 })).message).toMatch(/exact combination/);
  });
  it('a non-finite value in a regressor', () => {
    const bad = Float64Array.from(other);
    bad[9] = Number.POSITIVE_INFINITY;
    expect(refusal(() => gregoryHansenTest(walk, [bad], { model: 'level' }, { xs: ['Gas'] })).message).toMatch(/Gas has no number at position 10/);
  });
});
