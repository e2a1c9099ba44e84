import { describe, expect, it } from 'vitest';
import { grangerF } from '../../addin/causality/granger-f';
import { MooringInputError } from '../../addin/errors';
import { SeededRandom, autoregressive1 } from '../../addin/random';
import { chooseVarLags } from '../../addin/var/choose-var-lags';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

const fixture = loadFixture<Fixtures['granger']>('granger');
const x = fixtureSeries(fixture, 'var2_x');
const y = fixtureSeries(fixture, 'var2_y');
const names = { cause: 'GateGasoil', effect: 'DockDiesel' };

describe('Granger F: lag choice, wording and refusals', () => {
  it("lags 'aic' and 'bic' use the order chooseVarLags picks for the pair, and equal the fixed-lag test at that order", () => {
    const sel = chooseVarLags([x, y]);
    for (const rule of ['aic', 'bic'] as const) {
      const r = grangerF(x, y, { lags: rule }, names);
      expect(r.lagRule).toBe(rule);
      expect(r.lags).toBe(Math.max(1, sel[rule]));
      const fixed = grangerF(x, y, { lags: r.lags as number }, names);
      expect(r.statistic).toBe(fixed.statistic);
    }
    // The pair was simulated as a VAR(2) (tests/reference/README.md): both criteria should find 2.
    expect(grangerF(x, y, { lags: 'bic' }).lags).toBe(2);
  });

  it('a criterion that prefers no lags is lifted to 1, with a warning', () => {
    // Two independent white-noise series: seed 7, T = 300; BIC prefers 0 here.
    const rng = new SeededRandom(7);
    const a = rng.normals(300);
    const b = rng.normals(300);
    expect(chooseVarLags([a, b]).bic).toBe(0);
    const r = grangerF(a, b, { lags: 'bic' });
    expect(r.lags).toBe(1);
    expect(r.warnings.join(' ')).toMatch(/preferred no lags/);
  });

  it('states its null hypothesis in words, with the names in the right places', () => {
    const r = grangerF(x, y, { lags: 2 }, names);
    expect(r.nullHypothesis).toBe("GateGasoil's past values carry no information about DockDiesel's next value beyond DockDiesel's own past");
    const onChanges = grangerF(x, y, { lags: 2, form: 'changes' }, names);
    expect(onChanges.nullHypothesis).toBe("GateGasoil's past changes carry no information about DockDiesel's next change beyond DockDiesel's own past");
    expect(r.rejectTail).toBe('upper');
    expect(r.deterministic).toBe('const');
  });

  it('the seeded pair leads one way only: x -> y rejects, y -> x does not (construction in tests/reference/README.md)', () => {
    expect(grangerF(x, y, { lags: 2 }).pValue as number).toBeLessThan(1e-10);
    expect(grangerF(y, x, { lags: 2 }).pValue as number).toBeGreaterThan(0.05);
  });

  it('refuses too many lags for the rows (T must exceed 3P + 1), naming the most it can use', () => {
    const short = Array.from(autoregressive1(new SeededRandom(3), 13, 0.5));
    const other = Array.from(autoregressive1(new SeededRandom(4), 13, 0.5));
    expect(() => grangerF(short, other, { lags: 4 })).toThrow(MooringInputError);
    expect(() => grangerF(short, other, { lags: 4 })).toThrow(/needs more than 13 rows; the series have 13\. Use at most 3 lags/);
    expect(() => grangerF(short, other, { lags: 3 })).not.toThrow();
  });

  it('refuses bad lags, gaps, unequal lengths, a constant series and a perfect fit', () => {
    expect(() => grangerF(x, y, { lags: 0 })).toThrow(/at least 1/);
    expect(() => grangerF(x, y, { lags: 1.5 })).toThrow(/whole number/);
    const gap = x.slice();
    gap[9] = Number.NaN;
    expect(() => grangerF(gap, y, { lags: 2 }, names)).toThrow(/GateGasoil, row 10, is not a finite number/);
    expect(() => grangerF(x.slice(1), y, { lags: 2 }, names)).toThrow(/same rows/);
    const flat = new Array(y.length).fill(5);
    expect(() => grangerF(flat, y, { lags: 2 })).toThrow(MooringInputError);
    // The effect is 1 + 2 (the cause one row earlier): the cause's lag 1 predicts it exactly.
    const follower = [0, ...x.slice(0, -1).map((v) => 1 + 2 * v)];
    expect(() => grangerF(x, follower, { lags: 1 })).toThrow(/predicted exactly/);
  });
});
