import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { leadLag } from '../../addin/causality/lead-lag';
import { grangerF } from '../../addin/causality/granger-f';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { differences } from '../../addin/var/var-design';
import { grangerCell } from '../../functions/analyses/lead-lag-cells';
import { expectOneLineRefusal, runWith } from '../cli/cli-harness';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { relative } from '../reference/compare';

/**
 * The plain F test on the values as given (--method f --data levels, MOOR.GRANGER(..., "levels")).
 * Reference: statsmodels 0.13.5 (Debian python3-statsmodels) grangercausalitytests(maxlag=4) on
 * the US real GDP and real consumption levels of macrodata.csv as the file gives them (no logs,
 * no differences), both directions; fixture granger-levels.json made by
 * tests/reference/make_fixtures.py. Lags 1..4: F to 1e-9 relative, degrees of freedom exactly,
 * and the p-value to 1e-7 relative: jstat's incomplete beta (addin/distributions.ts) stops its
 * continued fraction at a 3e-7 step, which leaves up to 6e-8 relative on these cases, so 1e-9 on
 * p would test jstat's stopping rule rather than our F test. The p-values run down to 7e-12 and
 * keep their relative accuracy there (the upper tail is read directly, not as 1 - cdf). These levels wander, so without the data choice the F test would run on the
 * changes instead; the checks below show that it does not.
 */
const fixture = loadFixture<Fixtures['granger-levels']>('granger-levels');
const P_TOLERANCE = 1e-7;
const csv = readFileSync(new URL(`../../${fixture.cases[0].file}`, import.meta.url), 'utf8');
const column = (values: readonly number[]) => values.map((v) => [v]);

function cliJson(...argv: string[]): Record<string, any> {
  const r = runWith(MOORING_COMMANDS, ['granger', 'macro.csv', ...argv, '--json'], { 'macro.csv': csv });
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as Record<string, any>;
}

describe('Granger F on the values as given, against grangercausalitytests on the macro levels', () => {
  it('has both directions with lags 1..4, from the file macrodata.csv', () => {
    expect(fixture.cases.map((c) => c.columns)).toEqual([{ cause: 'realgdp', effect: 'realcons' }, { cause: 'realcons', effect: 'realgdp' }]);
    for (const c of fixture.cases) expect(c.lags.map((l) => l.lag)).toEqual([1, 2, 3, 4]);
  });

  for (const c of fixture.cases) {
    const cause = fixtureSeries(fixture, c.cause);
    const effect = fixtureSeries(fixture, c.effect);
    for (const ref of c.lags) {
      const name = `${c.columns.cause} -> ${c.columns.effect}, ${ref.lag} lags: F = ${ref.fStatistic.toPrecision(6)}, p = ${ref.pValue.toPrecision(3)}`;

      it(`engine, method f with data levels: ${name}`, () => {
        // Orders given as I(1), I(1): with data auto the F test would take the changes.
        const r = leadLag(cause, effect, { method: 'f', data: 'levels', lags: ref.lag, orders: [1, 1] }, [c.cause, c.effect]);
        expect(r.method).toBe('f-levels');
        expect(r.data).toBe('levels');
        const t = r.aLeadsB.test;
        expect(t.nobs).toBe(ref.nobs);
        expect(t.details.find((d) => d.key === 'dfDenominator')?.value).toBe(ref.dfDenom);
        expect(t.lags).toBe(ref.dfNum);
        expect(relative(t.statistic, ref.fStatistic)).toBeLessThan(1e-9);
        expect(relative(t.pValue as number, ref.pValue)).toBeLessThan(P_TOLERANCE);
        // The caution says why the values of wandering series are a risky choice.
        expect(r.cautions.join(' ')).toMatch(/valid only for stationary series/);
      });

      it(`command line, granger --method f --data levels --json: ${name}`, () => {
        const o = cliJson('--cause', c.columns.cause, '--effect', c.columns.effect, '--method', 'f', '--data', 'levels', '--lags', String(ref.lag));
        expect(o).toMatchObject({ method: 'f-levels', data: 'levels', dataRequested: 'levels', lags: ref.lag, df: [ref.dfNum, ref.dfDenom], nobs: ref.nobs });
        expect(relative(o.fStatistic, ref.fStatistic)).toBeLessThan(1e-9);
        expect(relative(o.pValue, ref.pValue)).toBeLessThan(P_TOLERANCE);
      });

      it(`MOOR.GRANGER(cause, effect, lags, "levels"): ${name}`, () => {
        const [[p]] = grangerCell(column(cause), column(effect), ref.lag, 'levels', 'headline');
        expect(relative(p as number, ref.pValue)).toBeLessThan(P_TOLERANCE);
      });
    }
  }
});

describe('granger --data: which data the F test uses', () => {
  const c = fixture.cases[0];
  const cause = fixtureSeries(fixture, c.cause);
  const effect = fixtureSeries(fixture, c.effect);
  const onChanges = grangerF(differences(Float64Array.from(cause)), differences(Float64Array.from(effect)), { lags: 2 });

  it('changes forces first differences: the F test on the differenced series, by the command line and by MOOR.GRANGER(..., "changes")', () => {
    const o = cliJson('--cause', 'realgdp', '--effect', 'realcons', '--method', 'f', '--data', 'changes', '--lags', '2');
    expect(o).toMatchObject({ method: 'f-differences', data: 'changes' });
    expect(relative(o.fStatistic, onChanges.statistic)).toBeLessThan(1e-12);
    const [[p]] = grangerCell(column(cause), column(effect), 2, 'changes', 'headline');
    expect(relative(p as number, onChanges.pValue as number)).toBeLessThan(1e-12);
    // and it differs from the test on the values, so the choice is not a no-op
    expect(relative(o.fStatistic, c.lags[1].fStatistic)).toBeGreaterThan(1e-3);
  });

  it('auto (the default) keeps the choice by the orders: I(1) levels go to the changes, and --data auto says so', () => {
    const auto = leadLag(cause, effect, { method: 'f', lags: 2, orders: [1, 1] }, ['gdp', 'cons']);
    expect(auto.method).toBe('f-differences');
    expect(auto.data).toBe('changes');
    expect(relative(auto.aLeadsB.test.statistic, onChanges.statistic)).toBeLessThan(1e-12);
    const both = leadLag(cause, effect, { method: 'f', data: 'auto', lags: 2, orders: [0, 0] }, ['gdp', 'cons']);
    expect(both.data).toBe('levels');
  });

  it('levels or changes with Toda-Yamamoto or the error-correction form is refused: the data choice is the F test\'s', () => {
    for (const method of ['ty', 'ecm']) {
      const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['granger', 'macro.csv', '--cause', 'realgdp', '--effect', 'realcons', '--method', method, '--data', 'levels'], { 'macro.csv': csv }));
      expect(line).toMatch(/data choice 'levels' is for the F test/);
    }
    expect(() => grangerCell(column(cause), column(effect), 2, 'sideways', 'headline')).toThrow(/auto, f, levels, changes, ty, ecm/);
  });

  it('an unknown --data word is refused on one line naming the choices', () => {
    const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['granger', 'macro.csv', '--cause', 'realgdp', '--effect', 'realcons', '--data', 'logs'], { 'macro.csv': csv }));
    expect(line).toMatch(/--data must be one of auto, levels, changes/);
  });
});
