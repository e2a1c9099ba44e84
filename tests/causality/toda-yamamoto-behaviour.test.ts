import { describe, expect, it } from 'vitest';
import { todaYamamoto } from '../../addin/causality/toda-yamamoto';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, randomWalk } from '../../addin/random';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const wald = loadFixture<Fixtures['var-wald']>('var-wald');
const detail = (r: ReturnType<typeof todaYamamoto>, key: string): unknown => r.details.find((d) => d.key === key)?.value;

describe('Toda-Yamamoto: extra lags from the orders, wording, refusals', () => {
  it('two independent walks (indep_a, indep_b; both I(1) by construction): dmax = 1 from the unit-root tests, and the same statistic as dmax = 1 given', () => {
    const a = fixtureSeries(wald, 'indep_a');
    const b = fixtureSeries(wald, 'indep_b');
    const auto = todaYamamoto(a, b, { lags: 2 }, { cause: 'A', effect: 'B' });
    expect(detail(auto, 'extraLags')).toBe(1);
    expect(detail(auto, 'orderCause')).toBe(1);
    expect(detail(auto, 'orderEffect')).toBe(1);
    expect(String(detail(auto, 'extraLagsRule'))).toMatch(/^highest order of integration \(A: 1, B: 1/);
    expect(auto.statistic).toBe(todaYamamoto(a, b, { lags: 2, extraLags: 1 }).statistic);
  });

  it('a twice-summed walk (I(2), seed 12, T = 300) beside a walk: dmax = 2', () => {
    const rng = new SeededRandom(12);
    const walk = randomWalk(rng, 300);
    let level = 0;
    const i2 = randomWalk(rng, 300).map((v) => (level += v));
    const r = todaYamamoto(walk, i2, { lags: 1 });
    expect(detail(r, 'extraLags')).toBe(2);
    expect(detail(r, 'lagsFitted')).toBe(3);
  });

  it('a thrice-summed walk (order above 2) is refused with a reason', () => {
    const rng = new SeededRandom(13);
    let l1 = 0;
    let l2 = 0;
    const i3 = randomWalk(rng, 300).map((v) => (l2 += l1 += v));
    expect(() => todaYamamoto(randomWalk(rng, 300), i3, { lags: 1 }, { cause: 'A', effect: 'Spiral' })).toThrow(/Spiral still has a unit root after two differences/);
  });

  it('states which lags are tested in its null hypothesis', () => {
    const r = todaYamamoto(fixtureSeries(wald, 'pair_x'), fixtureSeries(wald, 'pair_y'), { lags: 2, extraLags: 1 }, { cause: 'GateGasoil', effect: 'DockDiesel' });
    expect(r.nullHypothesis).toBe(
      "GateGasoil's past values carry no information about DockDiesel's next value beyond DockDiesel's own past (first 2 of 3 lags in a VAR in levels)",
    );
    expect(r.statisticName).toBe('Wald chi-square');
    expect(r.test).toBe('Toda-Yamamoto');
  });

  it('refuses negative or fractional extra lags and too short a history', () => {
    const a = fixtureSeries(wald, 'dk_lrm');
    const b = fixtureSeries(wald, 'dk_lry');
    expect(() => todaYamamoto(a, b, { lags: 1, extraLags: -1 })).toThrow(/dmax/);
    expect(() => todaYamamoto(a, b, { lags: 1, extraLags: 0.5 })).toThrow(MooringInputError);
    expect(() => todaYamamoto(a.slice(0, 12), b.slice(0, 12), { lags: 3, extraLags: 1 })).toThrow(/needs at least 14 rows; the series have 12/);
  });
});
