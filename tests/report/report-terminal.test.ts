import { describe, expect, it } from 'vitest';
import { formatPValue } from '../../addin/cli/render/format';
import { DEMO_CSV, runMooring } from './report-run';

describe('the readable terminal report of the demo', () => {
  const run = runMooring(['report', DEMO_CSV, '--log']);
  const text = run.stdout;

  it('runs, and puts the findings first, then the orders, the related pairs, the others, the system and the cautions', () => {
    expect(run.code, run.stderr).toBe(0);
    const order = ['Findings at the 5% level', 'Order of integration', 'Pairs with a long-run relation (2)', 'Pairs without a long-run relation', 'The system of all 6 series', 'Screening', 'Keep in mind'];
    const at = order.map((h) => text.indexOf(h));
    expect(at.every((i) => i >= 0), JSON.stringify(at)).toBe(true);
    expect([...at].sort((u, v) => u - v)).toEqual(at);
  });

  it('shows no NaN, undefined or object text', () => {
    expect(text).not.toMatch(/NaN|undefined|\[object/);
  });

  it('tells the reader which test was used for lead-lag and why, beside the numbers', () => {
    expect(text).toMatch(/Why this test\s+The order of integration of at least one series is\s+uncertain/);
    expect(text).toMatch(/Toda-Yamamoto\s+does GateGasoil lead DockDiesel\?\s+[0-9.]+\s+< 0\.0001\s+rejects/);
  });

  it('says that ADF decided the orders when nothing else was asked', () => {
    expect(text).toMatch(/Orders decided by\s+ADF\n/);
    expect(text).toMatch(/ADF and KPSS\n/);
    expect(text).not.toContain('DF-GLS p, levels');
  });

  it('closes with the cautions and the screening count of this report', () => {
    expect(text).toContain('statistical evidence, not advice to trade');
    expect(text).toMatch(/This report tested 15 pairs and 30 lead-lag\s+directions/);
  });
});

describe('the terminal report with DF-GLS deciding the orders (--unit-root dfgls)', () => {
  const run = runMooring(['report', DEMO_CSV, '--series', 'GateGasoil,DockDiesel', '--log', '--unit-root', 'dfgls']);
  const json = JSON.parse(runMooring(['report', DEMO_CSV, '--series', 'GateGasoil,DockDiesel', '--log', '--unit-root', 'dfgls', '--json']).stdout).report;

  it('names the test that decided and shows its p-value on the levels beside ADF and KPSS', () => {
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toMatch(/Orders decided by\s+DF-GLS on the levels, ADF on the changes/);
    expect(run.stdout).toMatch(/series\s+order\s+DF-GLS p, levels\s+Ng-Perron MZt p, levels \(comparison\)\s+ADF p, levels\s+ADF p, changes\s+KPSS p, levels\s+KPSS p, changes\s+DF-GLS and KPSS/);
    // Each series' row carries the DF-GLS p-value of its levels step, as the JSON report holds it.
    for (const s of json.series) {
      const gls = s.steps.find((x: { differences: number }) => x.differences === 0).gls;
      expect(gls.test).toBe('DF-GLS');
      const row = run.stdout.split('\n').find((l) => l.trim().startsWith(`${s.name} `) && l.includes(s.orderText));
      expect(row, s.name).toBeDefined();
      expect(row?.trim().split(/\s{2,}/)[2]).toBe(formatPValue(gls.pValue, gls.pValueBound));
      // Ng-Perron's MZt beside it, for comparison, as the JSON report holds it.
      const mzt = s.steps.find((x: { differences: number }) => x.differences === 0).ngPerron;
      expect(mzt.statisticName).toBe('MZt');
      expect(row?.trim().split(/\s{2,}/)[3]).toBe(formatPValue(mzt.pValue, mzt.pValueBound));
    }
  });
});
