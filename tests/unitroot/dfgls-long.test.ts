import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { adfRegression } from '../../addin/unitroot/adf-regression';
import { adfTauByGram } from '../../addin/unitroot/adf-tau-gram';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { glsDetrend } from '../../addin/unitroot/gls-detrend';

/**
 * DF-GLS on long series with many lags takes tau and gamma from the regression's cross products
 * (adf-tau-gram.ts, the ADF test's long-series route) instead of QR. Checked here against the QR
 * fit of the same regression on the same detrended series (our own QR, itself checked on NIST's
 * Longley problem in tests/regression/longley.test.ts): equal to 1e-10. Invented, seeded data;
 * 20,000 rows with 60 fixed lags put rows x columns^2 past the route's threshold.
 */
describe('DF-GLS on a long series equals the QR fit of its regression', () => {
  const T = 20_000;
  const lags = 60;
  const series = [
    { name: 'a random walk near 100', values: randomWalk(new SeededRandom(91), T, { start: 100 }) },
    { name: 'a persistent AR(1) around 50', values: autoregressive1(new SeededRandom(92), T, 0.98, 1).map((v) => v + 50) },
  ];
  for (const s of series) {
    for (const deterministic of ['const', 'trend'] as const) {
      it(`gives QR's tau and gamma within 1e-10 (${s.name}, ${deterministic})`, () => {
        const detrended = glsDetrend(s.values, deterministic).values;
        expect(adfTauByGram(detrended, lags, 'none')).not.toBeNull();
        const qr = adfRegression(detrended, lags, 'none');
        const result = dfglsTest(s.values, { deterministic, lags });
        const gamma = result.details?.find((d) => d.key === 'gamma')?.value as number;
        expect(Math.abs(result.statistic - qr.tau) / Math.abs(qr.tau)).toBeLessThan(1e-10);
        expect(Math.abs(gamma - qr.gamma) / Math.abs(qr.gamma)).toBeLessThan(1e-10);
        expect(result.nobs).toBe(qr.nobs);
      });
    }
  }
});
