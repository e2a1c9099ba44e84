import { describe, expect, it } from 'vitest';
import { errorCorrectionCausality } from '../../addin/causality/error-correction-causality';
import { leastSquares } from '../../addin/regression/least-squares';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';

/**
 * Identities of the error-correction tests on the seeded cointegrated pair (pair_y = 1 + 2 pair_x
 * + AR(1) noise, tests/reference/README.md).
 */
const wald = loadFixture<Fixtures['var-wald']>('var-wald');
const x = fixtureSeries(wald, 'pair_x');
const y = fixtureSeries(wald, 'pair_y');
const names = { cause: 'GateGasoil', effect: 'DockDiesel' };
const detail = (details: { key: string; value: unknown }[], key: string): number => details.find((d) => d.key === key)?.value as number;

describe('errorCorrectionCausality', () => {
  it('the fitted long-run relation recovers the designed one (slope 2 to 0.05, intercept 1 to 0.5) and y corrects (negative coefficient, p < 0.05)', () => {
    const r = errorCorrectionCausality(x, y, { lags: 2 }, names);
    expect(r.equilibrium?.slope).toBeCloseTo(2, 1);
    expect(Math.abs((r.equilibrium?.intercept as number) - 1)).toBeLessThan(0.5);
    expect(r.adjustment).toBeLessThan(0);
    expect(r.longRun.pValue as number).toBeLessThan(0.05);
  });

  it('Wald chi-square on the lagged changes equals p times the F statistic (same OLS covariance)', () => {
    for (const lags of [1, 2, 4]) {
      const r = errorCorrectionCausality(x, y, { lags }, names);
      expect(detail(r.shortRun.details, 'waldChiSquare')).toBeCloseTo(lags * r.shortRun.statistic, 9);
    }
  });

  it('passing the static-regression residual as the equilibrium error gives the same tests', () => {
    const T = x.length;
    const u = leastSquares(y, [new Float64Array(T).fill(1), Float64Array.from(x)]).residuals;
    const own = errorCorrectionCausality(x, y, { lags: 2 }, names);
    const given = errorCorrectionCausality(x, y, { lags: 2, equilibriumError: u }, names);
    expect(given.shortRun.statistic).toBeCloseTo(own.shortRun.statistic, 10);
    expect(given.longRun.statistic).toBeCloseTo(own.longRun.statistic, 10);
    expect(given.equilibrium).toBeNull();
  });

  it('rows: T - p - 1; degrees of freedom n - 2p - 2; names in the hypotheses', () => {
    const r = errorCorrectionCausality(x, y, { lags: 3 }, names);
    expect(r.shortRun.nobs).toBe(300 - 3 - 1);
    expect(detail(r.shortRun.details, 'dfDenominator')).toBe(296 - 8);
    expect(r.shortRun.nullHypothesis).toMatch(/^GateGasoil's past changes carry no information about DockDiesel's next change/);
    expect(r.longRun.nullHypothesis).toMatch(/^DockDiesel does not move to close the gap from its long-run relation with GateGasoil/);
  });

  it("lags by AIC: the levels VAR order less one, at least 1", () => {
    const r = errorCorrectionCausality(x, y, { lags: 'aic' }, names);
    expect(r.shortRun.lagRule).toBe('aic');
    expect(r.shortRun.lags).toBeGreaterThanOrEqual(1);
  });

  it('warns when the effect moves away from the relation (reversed roles: x does not correct, so the sign is a coin toss)', () => {
    const r = errorCorrectionCausality(y, x, { lags: 1 }, { cause: 'DockDiesel', effect: 'GateGasoil' });
    if (r.adjustment > 0) expect(r.longRun.warnings.join(' ')).toMatch(/moves away from the long-run relation/);
    else expect(r.longRun.warnings.join(' ')).not.toMatch(/moves away/);
  });

  it('refuses an equilibrium error of the wrong length or with gaps', () => {
    expect(() => errorCorrectionCausality(x, y, { lags: 1, equilibriumError: [1, 2, 3] })).toThrow(/has 3 values but the series have 300/);
    const gap = new Array(300).fill(0.1);
    gap[4] = Number.NaN;
    expect(() => errorCorrectionCausality(x, y, { lags: 1, equilibriumError: gap })).toThrow(/row 5, is not a finite number/);
    expect(() => errorCorrectionCausality(x.slice(0, 8), y.slice(0, 8), { lags: 2 })).toThrow(/needs at least 11 rows/);
  });
});
