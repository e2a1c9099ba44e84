import { describe, expect, it } from 'vitest';
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

  it('closes with the cautions and the screening count of this report', () => {
    expect(text).toContain('statistical evidence, not advice to trade');
    expect(text).toMatch(/This report tested 15 pairs and 30 lead-lag\s+directions/);
  });
});
