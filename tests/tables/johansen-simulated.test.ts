import { describe, expect, it } from 'vitest';
import { chiSquareUpperP } from '../../addin/distributions';
import { MooringInputError } from '../../addin/errors';
import { JOHANSEN_CASES, type JohansenCase, type JohansenStatisticKind } from '../../addin/johansen/deterministic-case';
import { johansenCriticalValues, johansenPValue, johansenTableProbabilities } from '../../addin/johansen/johansen-pvalue';
import { simulateJohansenDistribution, simulateJohansenDistributions } from '../../addin/johansen/simulate-distribution';
import simulated from '../../addin/tables/johansen-simulated.json';
import { publishedJohansenCritical } from '../../addin/tables/johansen-published';

const KINDS: JohansenStatisticKind[] = ['trace', 'maxEigen'];
const PUBLISHED_CASES = ['none', 'constant', 'trend'] as const;
const LEVELS = ['10%', '5%', '1%'] as const;
const TRENDS = Array.from({ length: 12 }, (_, i) => i + 1);
const P = johansenTableProbabilities();

interface Row {
  nMinusR: number;
  replications: number;
  quantiles: number[];
  monteCarloStandardError: Record<string, number>;
}
const rows = simulated.cases as unknown as Record<JohansenCase, Record<JohansenStatisticKind, Row[]>>;

// Source of every published value below: MacKinnon, J. G., Haug, A. A. & Michelis, L. (1999),
// Journal of Applied Econometrics 14, 563-577, as transcribed in addin/tables/johansen-critical.json.
describe('simulated Johansen quantiles against MacKinnon, Haug & Michelis (1999)', () => {
  for (const caseName of PUBLISHED_CASES) {
    for (const kind of KINDS) {
      it(`${caseName}, ${kind}: 90/95/99% quantiles within 1.5% of the published values for every n - r = 1..12`, () => {
        const misses: string[] = [];
        for (const m of TRENDS) {
          const published = publishedJohansenCritical(kind, caseName, m);
          const ours = johansenCriticalValues(kind, caseName, m);
          for (const level of LEVELS) {
            const relative = ours[level] / published[level] - 1;
            if (!(Math.abs(relative) < 0.015)) misses.push(`n - r = ${m} ${level}: ${ours[level]} vs ${published[level]} (${(100 * relative).toFixed(2)}%)`);
          }
        }
        expect(misses).toEqual([]);
      });
    }
  }
});

// chi-square(1) upper 10/5/1% points 2.70554 / 3.84146 / 6.63490 (Abramowitz & Stegun 1964,
// Table 26.8; from memory, and confirmed against jstat in the first test). With an unrestricted constant or trend and n - r = 1 both limits are exactly
// chi-square(1) (Johansen 1995, ch. 11), at any number of steps of the simulation.
describe('n - r = 1 with an unrestricted constant or trend is chi-square(1)', () => {
  const chiSquare1 = { '10%': 2.70554, '5%': 3.84146, '1%': 6.6349 };
  it('the chi-square(1) points themselves: upper tails 0.10 / 0.05 / 0.01 by jstat', () => {
    expect(chiSquareUpperP(chiSquare1['10%'], 1)).toBeCloseTo(0.1, 5);
    expect(chiSquareUpperP(chiSquare1['5%'], 1)).toBeCloseTo(0.05, 5);
    expect(chiSquareUpperP(chiSquare1['1%'], 1)).toBeCloseTo(0.01, 5);
  });
  for (const caseName of ['constant', 'trend'] as const) {
    it(`${caseName}: tabulated 10/5/1% points within 3 Monte Carlo standard errors of 2.70554 / 3.84146 / 6.63490`, () => {
      const row = rows[caseName].trace[0];
      const cv = johansenCriticalValues('trace', caseName, 1);
      for (const level of LEVELS) {
        expect(Math.abs(cv[level] - chiSquare1[level])).toBeLessThan(3 * row.monteCarloStandardError[level]);
      }
    });
    it(`${caseName}: chi-square(1) probability of every tabulated quantile within 4 binomial standard errors of its grid probability`, () => {
      const row = rows[caseName].trace[0];
      row.quantiles.forEach((q, i) => {
        const se = Math.sqrt((P[i] * (1 - P[i])) / row.replications);
        // factor 1.2: the extrapolation in the number of steps adds a little noise (see the table's provenance)
        expect(Math.abs(1 - chiSquareUpperP(q, 1) - P[i])).toBeLessThan(4 * 1.2 * se);
      });
    });
  }
  it('the interpolated p-value at statistics between grid quantiles is within 5% (relative) of the exact chi-square(1) tail', () => {
    // statistics chosen off the grid; the expected value is the exact law's tail from jstat
    for (const x of [1.0742, 1.6424, 3.0649, 4.7093, 5.9165, 7.2744, 8.8075]) {
      const exact = chiSquareUpperP(x, 1);
      const { pValue, beyondTable } = johansenPValue(x, 'trace', 'constant', 1);
      expect(beyondTable).toBeNull();
      expect(Math.abs(pValue - exact) / exact).toBeLessThan(0.05);
    }
  });
});

describe('the simulated table itself', () => {
  it('covers all five cases, both statistics, n - r = 1..12, with strictly increasing quantiles on the grid', () => {
    for (const caseName of JOHANSEN_CASES) {
      for (const kind of KINDS) {
        expect(rows[caseName][kind].map((r) => r.nMinusR)).toEqual(TRENDS);
        for (const row of rows[caseName][kind]) {
          expect(row.quantiles.length).toBe(P.length);
          for (let i = 1; i < row.quantiles.length; i++) expect(row.quantiles[i]).toBeGreaterThan(row.quantiles[i - 1]);
          expect(row.quantiles[0]).toBeGreaterThan(0);
        }
      }
    }
  });
  it('Monte Carlo standard error of every 95% and 99% quantile is under 0.5% of the quantile', () => {
    for (const caseName of JOHANSEN_CASES) {
      for (const kind of KINDS) {
        for (const row of rows[caseName][kind]) {
          for (const level of ['5%', '1%']) {
            const se = row.monteCarloStandardError[level];
            const q = row.quantiles[P.indexOf(level === '5%' ? 0.95 : 0.99)];
            expect(se).toBeGreaterThan(0);
            expect(se / q).toBeLessThan(0.005);
          }
        }
      }
    }
  });
  it('records its provenance: method, steps, replications, seed, date, generator and command', () => {
    const p = simulated.provenance;
    expect(p.steps).toBe(1000);
    expect(p.replications['1']).toBeGreaterThanOrEqual(100_000);
    expect(p.replications['12']).toBeGreaterThanOrEqual(40_000);
    expect(p.seed).toMatch(/SeededRandom/);
    expect(p.date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(p.generator).toBe('tests/tables/simulate-johansen.ts');
    expect(p.command).toMatch(/simulate-johansen/);
    expect(simulated.source).toMatch(/restricted-constant and restricted-trend cases rest on this simulation alone/);
  });
  it('trace and maximum eigenvalue coincide at n - r = 1 and trace is larger above it (5% point), every case', () => {
    for (const caseName of JOHANSEN_CASES) {
      expect(johansenCriticalValues('trace', caseName, 1)).toEqual(johansenCriticalValues('maxEigen', caseName, 1));
      for (const m of TRENDS.slice(1)) {
        expect(johansenCriticalValues('trace', caseName, m)['5%']).toBeGreaterThan(johansenCriticalValues('maxEigen', caseName, m)['5%']);
      }
    }
  });
  it('a restricted term raises the critical values above the case without it (5% trace, every n - r)', () => {
    // restricted constant adds a regressor to F compared with none; restricted trend adds one compared with constant
    for (const m of TRENDS) {
      expect(johansenCriticalValues('trace', 'restricted-constant', m)['5%']).toBeGreaterThan(johansenCriticalValues('trace', 'none', m)['5%']);
      expect(johansenCriticalValues('trace', 'restricted-trend', m)['5%']).toBeGreaterThan(johansenCriticalValues('trace', 'constant', m)['5%']);
    }
  });
});

describe('johansenPValue', () => {
  it('at every tabulated quantile equals its upper-tail probability, in every row', () => {
    for (const caseName of JOHANSEN_CASES) {
      for (const kind of KINDS) {
        for (const row of rows[caseName][kind]) {
          row.quantiles.forEach((q, i) => {
            const { pValue, beyondTable } = johansenPValue(q, kind, caseName, row.nMinusR);
            expect(beyondTable).toBeNull();
            expect(pValue).toBeCloseTo(1 - P[i], 12);
          });
        }
      }
    }
  });
  it('the critical values have p-values 0.10 / 0.05 / 0.01', () => {
    const cv = johansenCriticalValues('maxEigen', 'restricted-trend', 4);
    expect(johansenPValue(cv['10%'], 'maxEigen', 'restricted-trend', 4).pValue).toBeCloseTo(0.1, 12);
    expect(johansenPValue(cv['5%'], 'maxEigen', 'restricted-trend', 4).pValue).toBeCloseTo(0.05, 12);
    expect(johansenPValue(cv['1%'], 'maxEigen', 'restricted-trend', 4).pValue).toBeCloseTo(0.01, 12);
  });
  it('falls strictly as the statistic rises across the whole table (every case, n - r = 1, 5, 12, both statistics)', () => {
    for (const caseName of JOHANSEN_CASES) {
      for (const kind of KINDS) {
        for (const m of [1, 5, 12]) {
          const q = rows[caseName][kind][m - 1].quantiles;
          const steps = 2000;
          const p = Array.from({ length: steps + 1 }, (_, j) => johansenPValue(q[0] + ((q[q.length - 1] - q[0]) * j) / steps, kind, caseName, m).pValue);
          const rises = p.filter((v, j) => j > 0 && !(v < p[j - 1])).length;
          expect(rises).toBe(0);
          expect(Math.min(...p)).toBeCloseTo(0.001, 12);
          expect(Math.max(...p)).toBeCloseTo(0.999, 12);
        }
      }
    }
  });
  it('beyond the table: held at 0.001 with beyondTable "below" above the largest quantile, at 0.999 with "above" under the smallest', () => {
    const q = rows.trend.trace[2].quantiles;
    expect(johansenPValue(q[q.length - 1] * 1.5, 'trace', 'trend', 3)).toEqual({ pValue: 0.001, beyondTable: 'below' });
    expect(johansenPValue(q[0] / 2, 'trace', 'trend', 3)).toEqual({ pValue: 0.999, beyondTable: 'above' });
    expect(johansenPValue(0, 'maxEigen', 'none', 7)).toEqual({ pValue: 0.999, beyondTable: 'above' });
  });
});

describe('bad input is refused with MooringInputError', () => {
  it('n - r of 0, 13, 2.5 or NaN', () => {
    for (const m of [0, 13, 2.5, Number.NaN]) {
      expect(() => johansenPValue(10, 'trace', 'constant', m)).toThrow(MooringInputError);
      expect(() => johansenCriticalValues('trace', 'constant', m)).toThrow(MooringInputError);
    }
  });
  it('an unknown case or statistic, with the allowed words in the message', () => {
    expect(() => johansenPValue(10, 'trace', 'drift' as JohansenCase, 2)).toThrow(MooringInputError);
    expect(() => johansenPValue(10, 'trace', 'drift' as JohansenCase, 2)).toThrow(/'restricted-constant'/);
    expect(() => johansenCriticalValues('lambda' as JohansenStatisticKind, 'none', 2)).toThrow(/'trace' or 'maxEigen'/);
  });
  it('a statistic that is not a finite number', () => {
    for (const s of [Number.NaN, Infinity, -Infinity]) expect(() => johansenPValue(s, 'trace', 'none', 2)).toThrow(MooringInputError);
  });
  it('simulation options out of range (n - r 13, odd or tiny step counts, zero replications, unknown case)', () => {
    expect(() => simulateJohansenDistribution('none', 13, 100, 10, 1)).toThrow(MooringInputError);
    expect(() => simulateJohansenDistribution('none', 2, 101, 10, 1)).toThrow(MooringInputError);
    expect(() => simulateJohansenDistribution('none', 2, 10, 10, 1)).toThrow(MooringInputError);
    expect(() => simulateJohansenDistribution('none', 2, 100, 0, 1)).toThrow(MooringInputError);
    expect(() => simulateJohansenDistribution('drift' as JohansenCase, 2, 100, 10, 1)).toThrow(MooringInputError);
  });
});

describe('simulateJohansenDistribution (the generator of the table)', () => {
  it('is reproducible: the same seed gives the same sorted draws, the one-case call the same as the five-case one', () => {
    const a = simulateJohansenDistribution('restricted-trend', 3, 60, 40, 11);
    const b = simulateJohansenDistributions({ nMinusR: 3, steps: 60, replications: 40, seed: 11 }).draws['restricted-trend']!;
    expect(Array.from(a.trace)).toEqual(Array.from(b.trace));
    expect(Array.from(a.maxEigen)).toEqual(Array.from(b.maxEigen));
    for (let i = 1; i < a.trace.length; i++) expect(a.trace[i]).toBeGreaterThanOrEqual(a.trace[i - 1]);
  });
  it('constant, n - r = 1 (seed 3, 4,000 replications, 100 steps): trace draws are chi-square(1), distribution function within 4 binomial SE at six points', () => {
    // exact at any step count: the draw is (Σ ũ_t ε_t)^2 / Σ ũ_t^2 with ũ the demeaned trend
    const { trace } = simulateJohansenDistribution('constant', 1, 100, 4000, 3);
    for (const x of [0.0158, 0.1015, 0.455, 1.3233, 2.7055, 3.8415]) {
      // near the chi-square(1) 10/25/50/75/90/95% points; expected probability from jstat
      const expected = 1 - chiSquareUpperP(x, 1);
      const observed = trace.findIndex((v) => v > x) / trace.length;
      expect(Math.abs(observed - expected)).toBeLessThan(4 * Math.sqrt((expected * (1 - expected)) / trace.length));
    }
  });
  it('trace is the sum and maxEigen the largest of non-negative eigenvalues: maxEigen ≤ trace ≤ m·maxEigen (seed 5, n - r = 4)', () => {
    const sims = simulateJohansenDistributions({ nMinusR: 4, steps: 50, replications: 1, seed: 5 });
    for (const caseName of JOHANSEN_CASES) {
      const d = sims.draws[caseName]!;
      expect(d.maxEigen[0]).toBeGreaterThan(0);
      expect(d.trace[0]).toBeGreaterThan(d.maxEigen[0]);
      expect(d.trace[0]).toBeLessThanOrEqual(4 * d.maxEigen[0]);
    }
  });
  it('agrees with the table on a small independent run (none and restricted-constant, n - r = 2, seed 99, 3,000 replications, 200 steps): 95% points within 6%', () => {
    // 6% allows the Monte Carlo error of 3,000 draws (about 2% at the 95% point) plus the
    // O(1/T) bias at 200 steps (about 1% at n - r = 2), which the table extrapolates away
    const sims = simulateJohansenDistributions({ nMinusR: 2, steps: 200, replications: 3000, seed: 99, cases: ['none', 'restricted-constant'] });
    for (const caseName of ['none', 'restricted-constant'] as const) {
      const trace = sims.draws[caseName]!.trace;
      const q95 = trace[Math.ceil(0.95 * trace.length) - 1];
      expect(Math.abs(q95 / johansenCriticalValues('trace', caseName, 2)['5%'] - 1)).toBeLessThan(0.06);
    }
  });
});
