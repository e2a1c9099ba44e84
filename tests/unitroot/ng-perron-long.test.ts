import { describe, expect, it } from 'vitest';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';
import { adfRegression } from '../../addin/unitroot/adf-regression';
import { glsDetrend } from '../../addin/unitroot/gls-detrend';
import { mStatistics } from '../../addin/unitroot/m-statistics';
import { spectralInputsByGram } from '../../addin/unitroot/m-statistics-long';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';

/**
 * Ng-Perron on long series with many lags takes the residual sum of squares and the lag sum of
 * its autoregression from the cross products, refined (m-statistics-long.ts), instead of QR.
 * Checked here against the QR fit of the same regression on the same detrended series (our own
 * QR, itself checked on NIST's Longley problem in tests/regression/longley.test.ts): all four
 * statistics equal to 1e-10. Invented, seeded data; 20,000 rows with 60 fixed lags put
 * rows x columns^2 past the route's threshold.
 */
describe('Ng-Perron on a long series equals the QR fit of its regression', () => {
  const T = 20_000;
  const lags = 60;
  const series = [
    { name: 'a random walk near 100', values: randomWalk(new SeededRandom(93), T, { start: 100 }) },
    { name: 'a persistent AR(1) around 50', values: autoregressive1(new SeededRandom(94), T, 0.98, 1).map((v) => v + 50) },
  ];
  for (const s of series) {
    for (const deterministic of ['const', 'trend'] as const) {
      it(`gives QR's MZa, MZt, MSB and MPT within 1e-10 (${s.name}, ${deterministic})`, () => {
        const detrended = glsDetrend(s.values, deterministic);
        expect(spectralInputsByGram(detrended.values, lags)).not.toBeNull();
        const qr = mStatistics(detrended.values, adfRegression(detrended.values, lags, 'none'), deterministic, detrended.cbar);
        const result = ngPerronTest(s.values, { deterministic, lags });
        for (const name of ['MZa', 'MZt', 'MSB', 'MPT'] as const) {
          expect(Math.abs(result.statistics[name].statistic - qr[name]) / Math.abs(qr[name])).toBeLessThan(1e-10);
        }
        expect(result.nobs).toBe(T - 1 - lags);
      });
    }
  }
});
