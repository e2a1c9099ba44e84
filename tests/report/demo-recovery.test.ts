import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_TRUTH } from '../../addin/demo/truth';
import type { PairReport } from '../../addin/report/pair-types';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { DEMO_CSV, runMooring } from './report-run';

// The demo's known structure (DEMO_TRUTH, from its generator) recovered by `mooring report`
// on the committed demo file, every series in logs, as the demo runs it. Invented data: this
// checks the demo tells its story, not the statistics (those are checked against the
// reference library elsewhere). Each tolerance is stated beside its check.

let report: DiagnosticReport;
let terminal: string;

beforeAll(() => {
  const json = runMooring(['report', DEMO_CSV, '--log', '--json']);
  expect(json.code, json.stderr).toBe(0);
  report = (JSON.parse(json.stdout) as { report: DiagnosticReport }).report;
  const text = runMooring(['report', DEMO_CSV, '--log']);
  expect(text.code, text.stderr).toBe(0);
  terminal = text.stdout;
});

function pairOf(u: string, v: string): PairReport {
  const p = report.pairs.find((q) => (q.a === u && q.b === v) || (q.a === v && q.b === u));
  if (!p) throw new Error(`no pair ${u} / ${v}`);
  return p;
}

const [tight, loose] = DEMO_TRUTH.cointegratedPairs;

describe('the series', () => {
  it('takes every series of the file, in logs, with one row a day', () => {
    expect(report.series.map((s) => s.name)).toEqual(DEMO_TRUTH.series.map((s) => s.name));
    expect(report.data.observations).toBe(DEMO_TRUTH.rows);
    expect(report.data.logged).toBe(true);
    expect(report.data.period).toBe('day');
    expect(report.data.first.date).toBe(DEMO_TRUTH.startDate);
  });

  it('finds each series\' designed order of integration (TankPremium I(0), the rest I(1))', () => {
    for (const s of DEMO_TRUTH.series) expect(report.series.find((r) => r.name === s.name)?.order, s.name).toBe(s.integrationOrder);
  });
});

describe(`the tight pair ${tight.dependent} = ${tight.intercept} + ${tight.beta} ${tight.regressor} (logs), half-life ${tight.halfLifeDays} days`, () => {
  it('is cointegrated, Engle-Granger rejecting in both directions', () => {
    const p = pairOf(tight.dependent, tight.regressor);
    expect(p.cointegration.cointegrated).toBe(true);
    expect(p.cointegration.evidence).toBe('both-directions');
  });

  it(`is written ${tight.dependent} on ${tight.regressor}, with beta within 0.1 of ${tight.beta} (about two dynamic-OLS standard errors) and the OLS line within 0.06 (as the demo's own check)`, () => {
    const r = pairOf(tight.dependent, tight.regressor).relation!;
    expect([r.dependent, r.regressor]).toEqual([tight.dependent, tight.regressor]);
    expect(Math.abs(r.dynamicOls.beta - tight.beta)).toBeLessThan(0.1);
    expect(Math.abs(r.ols.beta - tight.beta)).toBeLessThan(0.06);
  });

  it(`has a spread AR(1) coefficient within two standard errors of ${tight.phi.toFixed(4)} (se = sqrt((1 - phi^2) / 780) = 0.012), a half-life of 8 to 21 days`, () => {
    const adj = pairOf(tight.dependent, tight.regressor).adjustment!;
    const se = Math.sqrt((1 - tight.phi ** 2) / DEMO_TRUTH.rows);
    expect(Math.abs(adj.spreadAr1.phi - tight.phi)).toBeLessThan(2 * se);
    expect(adj.spreadAr1.halfLife).toBeGreaterThan(8);
    expect(adj.spreadAr1.halfLife).toBeLessThan(21);
    const said = /The spread closes half its gap in about (\d+(\.\d)?) days/.exec(adj.verdict);
    expect(said).not.toBeNull();
    expect(Math.abs(Number(said![1]) - tight.halfLifeDays)).toBeLessThanOrEqual(3);
  });

  it(`names ${DEMO_TRUTH.leadLag.leader} the leader, and ${tight.dependent} the one that closes the gap`, () => {
    const p = pairOf(tight.dependent, tight.regressor);
    expect(p.leadLag?.leader).toBe(DEMO_TRUTH.leadLag.leader);
    expect(p.leadLag?.pattern).toBe('one-way');
    expect(p.adjustment?.ecm.dependent.series).toBe(tight.dependent);
    expect(p.adjustment?.ecm.dependent.corrects).toBe(true);
    expect(p.adjustment?.ecm.regressor.corrects).toBe(false);
  });

  it('says so in plain words in the terminal report', () => {
    expect(terminal).toContain(`${tight.dependent} and ${tight.regressor} share a long-run relation`);
    expect(terminal).toMatch(/The spread closes half its gap in about 1[0-4] days/);
    expect(terminal).toContain(`${DEMO_TRUTH.leadLag.leader} leads ${DEMO_TRUTH.leadLag.follower}`);
  });
});

describe(`the loose pair ${loose.dependent} / ${loose.regressor}`, () => {
  it('is cointegrated (the demo notes it is found at 5%, not at 1%)', () => {
    const p = pairOf(loose.dependent, loose.regressor);
    expect(p.cointegration.cointegrated).toBe(true);
    const ps = [p.cointegration.engleGranger.aOnB.pValue, p.cointegration.engleGranger.bOnA.pValue] as number[];
    expect(Math.max(...ps)).toBeLessThan(0.05);
    expect(Math.min(...ps)).toBeGreaterThan(0.01);
  });
});

describe('what the file must not show', () => {
  it(`${DEMO_TRUTH.unrelated.join(', ')} is cointegrated with nothing`, () => {
    for (const name of DEMO_TRUTH.unrelated) {
      for (const p of report.pairs.filter((q) => q.a === name || q.b === name)) expect(p.cointegration.cointegrated, `${p.a} / ${p.b}`).toBe(false);
    }
  });

  it('no series of one pair is cointegrated with a series of the other', () => {
    for (const u of [tight.dependent, tight.regressor]) for (const v of [loose.dependent, loose.regressor]) expect(pairOf(u, v).cointegration.cointegrated, `${u} / ${v}`).toBe(false);
  });

  it(`pairs with ${DEMO_TRUTH.stationary.join(', ')} are reported, with the verdict that the residual tests assume two wandering prices and the bounds test's answer`, () => {
    for (const name of DEMO_TRUTH.stationary) {
      const pairs = report.pairs.filter((q) => q.a === name || q.b === name);
      expect(pairs).toHaveLength(DEMO_TRUTH.series.length - 1);
      for (const p of pairs) {
        expect(p.cointegration.verdict).toContain('assume two wandering prices');
        expect(p.cointegration.verdict).toContain(p.cointegration.bounds!.verdict);
      }
    }
  });

  it('exactly the two designed pairs are cointegrated', () => {
    const found = report.pairs.filter((p) => p.cointegration.cointegrated).map((p) => [p.a, p.b].sort().join('/')).sort();
    expect(found).toEqual([[tight.dependent, tight.regressor].sort().join('/'), [loose.dependent, loose.regressor].sort().join('/')].sort());
  });
});
