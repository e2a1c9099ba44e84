import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { type Fixtures, fixtureSeries, loadFixture } from '../reference/fixtures';

/**
 * The diagnostic carries the reference library's numbers for the same inputs: the committed
 * fixtures of tests/reference (their README names the library, its version and each call).
 * Statistics to 1e-8 relative, p-values to 1e-6 absolute, as in the tests of each module;
 * the report adds no arithmetic of its own to them.
 */
const coint = loadFixture<Fixtures['coint']>('coint');
const johansen = loadFixture<Fixtures['johansen']>('johansen');
const granger = loadFixture<Fixtures['granger']>('granger');
const adf = loadFixture<Fixtures['adf']>('adf');
const kpss = loadFixture<Fixtures['kpss']>('kpss');

function relative(a: number | null, b: number): number {
  if (a === null) return Infinity;
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}

describe('Engle-Granger both ways on the seeded cointegrated pair (reference Engle-Granger cases, constant, AIC, default maximum lag)', () => {
  const report = diagnose({ series: [{ name: 'pair_y', values: fixtureSeries(coint, 'pair_y') }, { name: 'pair_x', values: fixtureSeries(coint, 'pair_x') }] });
  const eg = report.pairs[0].cointegration.engleGranger;
  for (const [label, summary, y, x] of [['pair_y on pair_x', eg.aOnB, 'pair_y', 'pair_x'], ['pair_x on pair_y', eg.bOnA, 'pair_x', 'pair_y']] as const) {
    it(label, () => {
      const c = coint.cases.find((k) => k.y === y && k.x[0] === x && k.deterministic === 'const' && k.lags === 'aic' && k.maxLags === null);
      expect(c).toBeDefined();
      expect(relative(summary.statistic, c!.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((summary.pValue as number) - c!.pValue)).toBeLessThan(1e-6);
      expect(summary.lags).toBe(c!.usedLags);
      expect(relative(summary.beta, c!.beta[0])).toBeLessThan(1e-8);
    });
  }
  it('and reads the pair as cointegrated both ways', () => {
    expect(report.pairs[0].cointegration.evidence).toBe('both-directions');
  });
});

describe('the independent walks indep_a and indep_b (reference Engle-Granger and Johansen cases)', () => {
  const report = diagnose(
    { series: [{ name: 'indep_a', values: fixtureSeries(coint, 'indep_a') }, { name: 'indep_b', values: fixtureSeries(coint, 'indep_b') }] },
    { johansenCase: 'constant' },
  );
  const pair = report.pairs[0];

  it('Engle-Granger indep_a on indep_b matches, and no relation is read', () => {
    const c = coint.cases.find((k) => k.y === 'indep_a' && k.deterministic === 'const' && k.lags === 'aic' && k.maxLags === null)!;
    expect(relative(pair.cointegration.engleGranger.aOnB.statistic, c.statistic)).toBeLessThan(1e-8);
    expect(pair.cointegration.evidence).toBe('none');
  });

  it('the Johansen trace statistics of the pair match the reference at the lags the report chose', () => {
    const j = pair.cointegration.johansen!;
    const c = johansen.cases.find((k) => k.series.join() === 'indep_a,indep_b' && k.deterministic === 'constant' && k.lagDiffs === j.lags);
    expect(c, `a fixture case with ${j.lags} lagged differences`).toBeDefined();
    // With no lagged differences the reference library uses another lag of the levels; Mooring matches its levelLagOne form (tests/reference/README.md).
    const expected = j.lags === 0 ? c!.levelLagOne : c!;
    expect(j.observations).toBe(expected.nobs);
    j.trace.forEach((t, r) => expect(relative(t.statistic, expected.trace[r])).toBeLessThan(1e-8));
  });
});

describe('the three-series system sys3 with rank 1 by construction (reference Johansen cases, constant case)', () => {
  const names = ['sys3_y1', 'sys3_y2', 'sys3_y3'];
  const report = diagnose({ series: names.map((n) => ({ name: n, values: fixtureSeries(johansen, n) })) }, { johansenCase: 'constant' });
  const j = report.system!.johansen!;

  it('matches the trace and maximum-eigenvalue statistics at the lags the report chose', () => {
    const c = johansen.cases.find((k) => k.series.join() === names.join() && k.deterministic === 'constant' && k.lagDiffs === j.lags);
    expect(c, `a fixture case with ${j.lags} lagged differences`).toBeDefined();
    const expected = j.lags === 0 ? c!.levelLagOne : c!;
    j.trace.forEach((t, r) => expect(relative(t.statistic, expected.trace[r])).toBeLessThan(1e-8));
    j.maxEigen.forEach((t, r) => expect(relative(t.statistic, expected.maxEigen[r])).toBeLessThan(1e-8));
    j.eigenvalues.forEach((l, r) => expect(relative(l, expected.eigenvalues[r])).toBeLessThan(1e-8));
  });

  it('reads one long-run relation', () => {
    expect(j.rank.trace).toBe(1);
  });
});

describe('US real GDP and consumption growth (reference F-test cases on macro_dlog_realgdp and macro_dlog_realcons)', () => {
  const report = diagnose({ series: [{ name: 'macro_dlog_realgdp', values: fixtureSeries(granger, 'macro_dlog_realgdp') }, { name: 'macro_dlog_realcons', values: fixtureSeries(granger, 'macro_dlog_realcons') }] });
  const ll = report.pairs[0].leadLag!;

  it('chooses the F test on the values, since both growth rates are I(0) with ADF and KPSS agreeing', () => {
    expect(report.series.map((s) => [s.order, s.agree])).toEqual([[0, true], [0, true]]);
    expect(ll.method).toBe('f-levels');
  });

  it('matches the reference F statistic and p-value in both directions at the lags the report chose', () => {
    for (const d of [ll.aLeadsB, ll.bLeadsA]) {
      const c = granger.cases.find((k) => k.cause === d.cause && k.effect === d.effect)!;
      const lag = c.lags.find((l) => l.lag === d.test.lags);
      expect(lag, `a fixture row at ${d.test.lags} lags`).toBeDefined();
      expect(relative(d.test.statistic, lag!.fStatistic)).toBeLessThan(1e-8);
      expect(Math.abs((d.test.pValue as number) - lag!.pValue)).toBeLessThan(1e-6);
    }
  });
});

describe('the VAR(2) pair var2_x -> var2_y, built so that x leads y and not the reverse', () => {
  it('names var2_x the leader', () => {
    const report = diagnose({ series: [{ name: 'var2_x', values: fixtureSeries(granger, 'var2_x') }, { name: 'var2_y', values: fixtureSeries(granger, 'var2_y') }] });
    expect(report.pairs[0].leadLag?.leader).toBe('var2_x');
  });
});

describe('the order-of-integration steps on two AR(1) series (reference ADF and KPSS cases, constant)', () => {
  const names = ['ar1_phi050_250', 'ar1_phi090_250'];
  const report = diagnose({ series: names.map((n) => ({ name: n, values: fixtureSeries(adf, n) })) });
  for (const [i, name] of names.entries()) {
    it(`${name}: ADF (AIC, default maximum lag) and KPSS (automatic bandwidth) on the levels`, () => {
      const levels = report.series[i].steps.find((s) => s.differences === 0)!;
      const a = adf.cases.find((k) => k.series === name && k.deterministic === 'const' && k.lags === 'aic' && k.maxLags === null)!;
      const k = kpss.cases.find((c) => c.series === name && c.deterministic === 'const' && c.lags === 'auto')!;
      expect(relative(levels.adf.statistic, a.statistic)).toBeLessThan(1e-8);
      expect(Math.abs((levels.adf.pValue as number) - a.pValue)).toBeLessThan(1e-6);
      expect(relative(levels.kpss.statistic, k.statistic)).toBeLessThan(1e-8);
    });
  }
});
