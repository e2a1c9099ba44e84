import { describe, expect, it } from 'vitest';
import { chooseCausalityTest } from '../../addin/causality/choose-causality-test';
import { MooringInputError } from '../../addin/errors';

/**
 * The decision table (Granger 1969; Granger 1988; Toda & Yamamoto 1995; the F test on the
 * values fails for unit-root data, Toda & Phillips 1993): every branch and its reason.
 */
describe('chooseCausalityTest', () => {
  it('both I(0): F on the values, Toda-Yamamoto also valid', () => {
    const c = chooseCausalityTest({ orderCause: 0, orderEffect: 0 });
    expect(c.method).toBe('f-levels');
    expect(c.alsoValid).toEqual(['toda-yamamoto']);
    expect(c.why).toMatch(/^Both series are stationary/);
  });

  it('both I(1) and cointegrated: error-correction, Toda-Yamamoto as the companion', () => {
    const c = chooseCausalityTest({ orderCause: 1, orderEffect: 1, cointegrated: true });
    expect(c.method).toBe('error-correction');
    expect(c.alsoValid).toEqual(['toda-yamamoto']);
    expect(c.why).toMatch(/^Both series are I\(1\) and cointegrated, so the error-correction form is valid: /);
  });

  it('both I(1), not cointegrated: F on the changes', () => {
    const c = chooseCausalityTest({ orderCause: 1, orderEffect: 1, cointegrated: false });
    expect(c.method).toBe('f-differences');
    expect(c.why).toMatch(/not cointegrated/);
  });

  it('both I(1) with cointegration untested, mixed orders, uncertain orders, I(2): Toda-Yamamoto', () => {
    const cases = [
      { orderCause: 1, orderEffect: 1 },
      { orderCause: 0, orderEffect: 1 },
      { orderCause: 1, orderEffect: 0, cointegrated: true },
      { orderCause: 'uncertain', orderEffect: 1, cointegrated: false },
      { orderCause: 2, orderEffect: 2 },
    ] as const;
    for (const s of cases) {
      const c = chooseCausalityTest(s);
      expect(c.method).toBe('toda-yamamoto');
      expect(c.why).toMatch(/Toda-Yamamoto test is used: it stays valid whatever the orders/);
    }
    expect(chooseCausalityTest(cases[0]).why).toMatch(/not established/);
    expect(chooseCausalityTest(cases[1]).why).toMatch(/different orders of integration \(I\(0\) and I\(1\)\)/);
    expect(chooseCausalityTest(cases[3]).why).toMatch(/uncertain/);
  });

  it('never picks the F test on values when either series is not stationary', () => {
    for (const a of [0, 1, 2, 'uncertain'] as const) {
      for (const b of [0, 1, 2, 'uncertain'] as const) {
        for (const cointegrated of [true, false, undefined]) {
          const c = chooseCausalityTest({ orderCause: a, orderEffect: b, cointegrated });
          if (!(a === 0 && b === 0)) expect(c.method).not.toBe('f-levels');
        }
      }
    }
  });

  it('refuses an order above 2 and unknown words', () => {
    expect(() => chooseCausalityTest({ orderCause: 'above 2', orderEffect: 1 })).toThrow(MooringInputError);
    expect(() => chooseCausalityTest({ orderCause: 3 as never, orderEffect: 1 })).toThrow(/Unknown order/);
    expect(() => chooseCausalityTest({ orderCause: 1, orderEffect: 1, cointegrated: 'yes' as never })).toThrow(/true, false/);
  });
});
