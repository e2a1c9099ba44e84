import { describe, expect, it } from 'vitest';
import { leadLag } from '../../addin/causality/lead-lag';
import { LEAD_LAG_CAUTION } from '../../addin/causality/causality-wording';
import { generateDemo } from '../../addin/demo/scenario';
import { DEMO_TRUTH } from '../../addin/demo/truth';
import { MooringInputError } from '../../addin/errors';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

/**
 * leadLag end to end. The demo data (addin/demo, seed 91, 780 weekdays) were built with a known
 * structure: GateGasoil leads DockDiesel through an error-correction equation and ignores it
 * (DEMO_TRUTH.leadLag); BargeFreight (I(1)) and TankPremium (I(0)) are independent of everything.
 */
const demo = generateDemo();
const log = (name: string): number[] => demo.columns[name].map(Math.log);
const gasoil = log('GateGasoil');
const diesel = log('DockDiesel');
const names = ['GateGasoil', 'DockDiesel'] as const;
// The designed orders (DEMO_TRUTH.series[].integrationOrder): both I(1).
const designed = [1, 1] as const;

describe('leadLag on the demo market (designed truth in addin/demo/truth.ts)', () => {
  it(`cointegrated leader and follower: error-correction chosen; ${DEMO_TRUTH.leadLag.grangerCausality}`, () => {
    const r = leadLag(gasoil, diesel, { cointegrated: true, lags: 2, orders: designed }, names);
    expect(r.orders).toEqual({ a: 1, b: 1, source: 'given' });
    expect(r.method).toBe('error-correction');
    expect(r.why).toMatch(/^Both series are I\(1\) and cointegrated, so the error-correction form is valid/);
    expect(r.aLeadsB.leads).toBe(true);
    expect(r.bLeadsA.leads).toBe(false);
    expect(r.aLeadsB.longRun).not.toBeNull();
    expect(r.verdict).toMatch(/^GateGasoil leads DockDiesel \(short run p [<=] [0-9.]+, long run p [<=] [0-9.]+, each at 2\.5%\); no evidence that DockDiesel leads GateGasoil \(/);
    expect(r.cautions[0]).toBe(LEAD_LAG_CAUTION);
    expect(r.alsoValid).toEqual(['toda-yamamoto']);
  });

  it('the Toda-Yamamoto companion, run on request, tells the same story', () => {
    const r = leadLag(gasoil, diesel, { cointegrated: true, lags: 2, orders: designed, withCompanions: true }, names);
    expect(r.companions.map((c) => `${c.method}: ${c.cause} -> ${c.effect}`)).toEqual([
      'toda-yamamoto: GateGasoil -> DockDiesel',
      'toda-yamamoto: DockDiesel -> GateGasoil',
    ]);
    expect(r.companions[0].leads).toBe(true);
    expect(r.companions[1].leads).toBe(false);
  });

  it('cointegration not stated: both I(1), so Toda-Yamamoto with dmax 1, same verdict; plain sentence with p-values', () => {
    const r = leadLag(gasoil, diesel, { lags: 2, orders: designed }, names);
    expect(r.method).toBe('toda-yamamoto');
    expect(r.aLeadsB.test.details.find((d) => d.key === 'extraLags')?.value).toBe(1);
    expect(r.verdict).toMatch(/^GateGasoil leads DockDiesel \(p [<=] [0-9.]+\); no evidence that DockDiesel leads GateGasoil \(p = [0-9.]+\)\. \(Toda-Yamamoto test, 5% level\.\)$/);
    expect(r.aLeadsB.test.nullHypothesis).toMatch(/^GateGasoil's past values carry no information about DockDiesel's next value beyond DockDiesel's own past/);
    expect(r.bLeadsA.test.nullHypothesis).toMatch(/^DockDiesel's past values carry no information about GateGasoil's next value/);
  });

  it('orders tested here: KPSS doubts that GateGasoil\'s changes are stationary (p = 0.042), so its order is uncertain -> Toda-Yamamoto with dmax 2, same verdict', () => {
    const r = leadLag(gasoil, diesel, { cointegrated: true, lags: 2 }, names);
    expect(r.orders).toEqual({ a: 'uncertain', b: 1, source: 'tested' });
    expect(r.method).toBe('toda-yamamoto');
    expect(r.aLeadsB.test.details.find((d) => d.key === 'extraLags')?.value).toBe(2);
    expect(r.aLeadsB.leads).toBe(true);
    expect(r.bLeadsA.leads).toBe(false);
  });

  it('unrelated diesel and storage premium (I(1) and I(0)): mixed orders -> Toda-Yamamoto, no lead either way', () => {
    const r = leadLag(diesel, log('TankPremium'), { lags: 2 }, ['DockDiesel', 'TankPremium']);
    expect(r.orders).toEqual({ a: 1, b: 0, source: 'tested' });
    expect(r.method).toBe('toda-yamamoto');
    expect(r.why).toMatch(/different orders of integration \(I\(1\) and I\(0\)\)/);
    expect(r.aLeadsB.leads).toBe(false);
    expect(r.bLeadsA.leads).toBe(false);
    expect(r.verdict).toMatch(/^No evidence that DockDiesel leads TankPremium \(p = [0-9.]+\); no evidence that TankPremium leads DockDiesel/);
  });

  it("method 'f' on two I(1) series runs on the changes, and warns when the pair is cointegrated", () => {
    const r = leadLag(gasoil, diesel, { method: 'f', cointegrated: true, lags: 2, orders: designed }, names);
    expect(r.method).toBe('f-differences');
    expect(r.aLeadsB.test.nullHypothesis).toMatch(/past changes/);
    expect(r.cautions.join(' ')).toMatch(/can miss a long-run lead/);
  });

  it("method 'f' on orders given as mixed runs on the values with a validity caution", () => {
    const r = leadLag(gasoil, diesel, { method: 'f', orders: [0, 1], lags: 2 }, names);
    expect(r.method).toBe('f-levels');
    expect(r.orders.source).toBe('given');
    expect(r.cautions.join(' ')).toMatch(/valid only for stationary series/);
  });

  it("method 'ecm' without cointegration evidence carries a caution", () => {
    const r = leadLag(gasoil, diesel, { method: 'ecm', lags: 2 }, names);
    expect(r.method).toBe('error-correction');
    expect(r.cautions.join(' ')).toMatch(/assumes the pair is cointegrated/);
  });

  it('given orders skip the unit-root tests; an uncertain order makes dmax 2', () => {
    const r = leadLag(gasoil, diesel, { orders: ['uncertain', 1], lags: 2 }, names);
    expect(r.method).toBe('toda-yamamoto');
    expect(r.aLeadsB.test.details.find((d) => d.key === 'extraLags')?.value).toBe(2);
  });
});

describe('leadLag: stationary pair and refusals', () => {
  const granger = loadFixture<Fixtures['granger']>('granger');
  const x = fixtureSeries(granger, 'var2_x');
  const y = fixtureSeries(granger, 'var2_y');

  it('stationary VAR(2) pair (x leads y by construction, tests/reference/README.md), orders given as I(0): F on the values, x leads y only', () => {
    const r = leadLag(x, y, { orders: [0, 0] }, ['X', 'Y']);
    expect(r.method).toBe('f-levels');
    expect(r.aLeadsB.test.lagRule).toBe('aic');
    expect(r.verdict).toMatch(/^X leads Y \(p < 0\.0001\); no evidence that Y leads X \(p = [0-9.]+\)\. \(F test on the values, 5% level\.\)$/);
  });

  it('the same pair with orders tested: KPSS rejects level stationarity of x at 3%, so x is uncertain and Toda-Yamamoto (dmax 1) is used; x still leads y only', () => {
    const r = leadLag(x, y, {}, ['X', 'Y']);
    expect(r.orders).toEqual({ a: 'uncertain', b: 0, source: 'tested' });
    expect(r.method).toBe('toda-yamamoto');
    expect(r.aLeadsB.test.details.find((d) => d.key === 'extraLags')?.value).toBe(1);
    expect(r.aLeadsB.leads).toBe(true);
    expect(r.bLeadsA.leads).toBe(false);
  });

  it('refuses a bad level, method, orders and equal names', () => {
    expect(() => leadLag(x, y, { alpha: 0.7 })).toThrow(MooringInputError);
    expect(() => leadLag(x, y, { method: 'granger' as never })).toThrow(/use one of auto, f, ty, ecm/);
    expect(() => leadLag(x, y, { orders: [1] as never })).toThrow(/two orders/);
    expect(() => leadLag(x, y, { orders: ['above 2', 1] })).toThrow(/above 2/);
    expect(() => leadLag(x, y, {}, ['Same', 'Same'])).toThrow(/different names/);
  });
});

describe('leadLag verdict wording', () => {
  it('keeps a lower-case series name as spelled at the start of the verdict', () => {
    const demoLogs = generateDemo();
    const g = demoLogs.columns.GateGasoil.map(Math.log);
    const d = demoLogs.columns.DockDiesel.map(Math.log);
    const r = leadLag(g, d, { orders: [1, 1], lags: 2 }, ['ln(GateGasoil)', 'ln(DockDiesel)']);
    expect(r.verdict.startsWith('ln(GateGasoil) leads ln(DockDiesel)')).toBe(true);
    const back = leadLag(d, g, { orders: [1, 1], lags: 2 }, ['ln(DockDiesel)', 'ln(GateGasoil)']);
    expect(back.verdict.startsWith('No evidence that ln(DockDiesel) leads ln(GateGasoil)')).toBe(true);
  });
});
