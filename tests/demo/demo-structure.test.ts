import { describe, expect, it } from 'vitest';
import { DEMO_TRUTH, generateDemo } from '../../addin/demo/scenario';
import { phiFromHalfLife } from '../../addin/demo/truth';
import {
  correlation,
  dickeyFullerTau,
  differences,
  engleGrangerTau,
  grangerF,
  lag1Autocorrelation,
  plainOls,
  variance,
} from './plain-stats';

// Coarse checks that the sample in the demo file (seed DEMO_TRUTH.seed, 780 rows) shows the
// structure the generator was built to have. Each tolerance is stated beside its check.
// These test the demo data, not the engine; the engine is never checked against invented data.

const data = generateDemo();
const log = (name: string): number[] => data.columns[name].map(Math.log);
const [dieselPair, bunkerPair] = DEMO_TRUTH.cointegratedPairs;
const T = DEMO_TRUTH.rows;

// Asymptotic critical values, MacKinnon (2010), Queen's Economics Department Working Paper 1227,
// regression with a constant: N = 1 (unit root) and N = 2 (Engle-Granger). The finite-sample
// terms move them by under 0.02 at 780 rows, far inside the margins used here.
const UNIT_ROOT_1PCT = -3.43035;
const UNIT_ROOT_10PCT = -2.56677;
const ENGLE_GRANGER_5PCT = -3.33613;
const ENGLE_GRANGER_10PCT = -3.04445;

function trueSpread(pair: typeof dieselPair): number[] {
  const y = log(pair.dependent);
  const x = log(pair.regressor);
  return y.map((v, t) => v - pair.intercept - pair.beta * x[t]);
}

describe('cointegrated pairs', () => {
  for (const pair of DEMO_TRUTH.cointegratedPairs) {
    const label = `${pair.dependent} on ${pair.regressor}`;

    it(`${label}: the spread at the true beta has lag-1 autocorrelation within 3 standard errors of phi = ${pair.phi.toFixed(4)}`, () => {
      // standard error of an AR(1) estimate: sqrt((1 - phi^2) / T)
      const se = Math.sqrt((1 - pair.phi ** 2) / T);
      expect(Math.abs(lag1Autocorrelation(trueSpread(pair)) - pair.phi)).toBeLessThan(3 * se);
    });

    it(`${label}: the spread at the true beta has mean near 0 and standard deviation within 35% of ${pair.spreadSd}`, () => {
      const z = trueSpread(pair);
      const sd = Math.sqrt(variance(z));
      expect(Math.abs(z.reduce((a, b) => a + b, 0) / T)).toBeLessThan(pair.spreadSd);
      expect(Math.abs(sd / pair.spreadSd - 1)).toBeLessThan(0.35);
    });

    it(`${label}: Engle-Granger tau is below the 5% critical value and the estimated beta is within 0.06 of ${pair.beta}`, () => {
      const eg = engleGrangerTau(log(pair.dependent), log(pair.regressor));
      expect(eg.tau).toBeLessThan(ENGLE_GRANGER_5PCT);
      expect(Math.abs(eg.beta - pair.beta)).toBeLessThan(0.06);
    });
  }

  it('no series of one pair is cointegrated with a series of the other (Engle-Granger tau above the 10% value, both directions)', () => {
    for (const a of [dieselPair.dependent, dieselPair.regressor]) {
      for (const b of [bunkerPair.dependent, bunkerPair.regressor]) {
        expect(engleGrangerTau(log(a), log(b)).tau, `${a} on ${b}`).toBeGreaterThan(ENGLE_GRANGER_10PCT);
        expect(engleGrangerTau(log(b), log(a)).tau, `${b} on ${a}`).toBeGreaterThan(ENGLE_GRANGER_10PCT);
      }
    }
  });
});

describe('leader and follower', () => {
  const { leader, follower } = DEMO_TRUTH.leadLag;
  const x = log(leader);
  const y = log(follower);
  const z = trueSpread(dieselPair);
  const dx = differences(x);
  const dy = differences(y);
  // rows t = 2..T-1 of the error-correction equations, indexed into the differences
  const rows = Array.from({ length: T - 2 }, (_, i) => i + 1);
  const ones = rows.map(() => 1);
  const zLag = rows.map((i) => z[i]);
  const dxNow = rows.map((i) => dx[i]);
  const dxLag = rows.map((i) => dx[i - 1]);
  const dyLag = rows.map((i) => dy[i - 1]);

  it('the follower error-corrects and passes on the lagged leader change: estimates within 3 standard errors of the truth', () => {
    const fit = plainOls(rows.map((i) => dy[i]), [ones, zLag, dxLag, dxNow]);
    const expected = [dieselPair.adjustment[follower], DEMO_TRUTH.leadLag.followerOnLaggedLeaderChange, DEMO_TRUTH.leadLag.sameDayPassThrough];
    for (let j = 0; j < 3; j++) expect(Math.abs(fit.coef[j + 1] - expected[j])).toBeLessThan(3 * fit.se[j + 1]);
    expect(fit.coef[1] / fit.se[1]).toBeLessThan(-3); // the pull back to equilibrium is visible
  });

  it('the leader ignores the follower: its loading on the spread and on the lagged follower change have |t| < 2.5', () => {
    const fit = plainOls(rows.map((i) => dx[i]), [ones, zLag, dyLag, dxLag]);
    expect(Math.abs(fit.coef[1] / fit.se[1])).toBeLessThan(2.5);
    expect(Math.abs(fit.coef[2] / fit.se[2])).toBeLessThan(2.5);
  });

  it('Granger causality runs one way (levels, 2 lags): F above 10 into the follower, below the 5% value 3.01 into the leader', () => {
    // F(2, 773) upper 5% point is 3.007 (any F table)
    expect(grangerF(y, x, 2).f).toBeGreaterThan(10);
    expect(grangerF(x, y, 2).f).toBeLessThan(3.01);
  });
});

describe('integration orders', () => {
  const i1 = DEMO_TRUTH.series.filter((s) => s.integrationOrder === 1).map((s) => s.name);

  it('each I(1) series keeps its unit root: Dickey-Fuller tau above the 10% critical value', () => {
    for (const name of i1) expect(dickeyFullerTau(log(name)), name).toBeGreaterThan(UNIT_ROOT_10PCT);
  });

  it('the I(0) series rejects a unit root at 1%, and its variance does not grow with the window', () => {
    for (const name of DEMO_TRUTH.stationary) {
      const p = log(name);
      expect(dickeyFullerTau(p), name).toBeLessThan(UNIT_ROOT_1PCT);
      // a random walk's sample variance grows about in proportion to the window; a stationary
      // series' stays put: quarter, half and whole windows agree within a factor of 1.5
      const whole = variance(p);
      for (const part of [p.slice(0, T / 4), p.slice(0, T / 2), p.slice(T / 2)]) {
        const ratio = variance(part) / whole;
        expect(ratio).toBeGreaterThan(1 / 1.5);
        expect(ratio).toBeLessThan(1.5);
      }
    }
  });

  it('the I(0) series reverts at its designed speed: lag-1 autocorrelation within 3 standard errors of its phi', () => {
    for (const s of DEMO_TRUTH.series.filter((entry) => entry.meanReversion)) {
      const phi = phiFromHalfLife(s.meanReversion!.halfLifeDays);
      const se = Math.sqrt((1 - phi ** 2) / T);
      expect(Math.abs(lag1Autocorrelation(log(s.name)) - phi), s.name).toBeLessThan(3 * se);
    }
  });
});

describe('the unrelated series', () => {
  for (const name of DEMO_TRUTH.unrelated) {
    it(`${name}: its log changes correlate with no other series' by more than 0.1 (about 2.8 standard errors)`, () => {
      const mine = differences(log(name));
      for (const other of DEMO_TRUTH.series.filter((s) => s.name !== name)) {
        expect(Math.abs(correlation(mine, differences(log(other.name)))), other.name).toBeLessThan(0.1);
      }
    });

    it(`${name}: not cointegrated with any other I(1) series (Engle-Granger tau above the 10% value, both directions)`, () => {
      const others = DEMO_TRUTH.series.filter((s) => s.name !== name && s.integrationOrder === 1);
      for (const other of others) {
        expect(engleGrangerTau(log(name), log(other.name)).tau, other.name).toBeGreaterThan(ENGLE_GRANGER_10PCT);
        expect(engleGrangerTau(log(other.name), log(name)).tau, other.name).toBeGreaterThan(ENGLE_GRANGER_10PCT);
      }
    });
  }
});
