/**
 * The report's Ng-Perron row on each series' levels: its numbers are ngPerronTest's, called
 * directly on the same values with the same detrending terms as DF-GLS (to 1e-12), MZt heads it,
 * it never decides the order, and the JSON report carries where the critical values come from
 * (Ng & Perron 2001, Table 1; the table marks its values "from memory"), beside the critical
 * values that decide (the p-value's own simulated distribution). Seeded series.
 */
import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { SeededRandom } from '../../addin/random';
import { glsCriticalValues } from '../../addin/tables/gls-unitroot-table';
import { ngPerronTest } from '../../addin/unitroot/ng-perron';
import { ar1 } from './seeded-series';

/** A random walk whose changes carry a negative moving-average part (e_t - 0.6 e_{t-1}), the case Ng-Perron is sized for. */
function walkWithMovingAverage(rng: SeededRandom, n: number): Float64Array {
  const out = new Float64Array(n);
  let previous = 0;
  let level = 100;
  for (let t = 0; t < n; t++) {
    const e = rng.normal();
    level += e - 0.6 * previous;
    previous = e;
    out[t] = level;
  }
  return out;
}

const close = (a: number | null, b: number) => {
  expect(a).not.toBeNull();
  expect(Math.abs((a as number) - b)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(b)));
};

describe("the report's Ng-Perron row", () => {
  const rng = new SeededRandom(2024);
  const values = [walkWithMovingAverage(rng, 400), ar1(rng, 400, 0.9, 1, 50)];
  const input = { series: values.map((v, j) => ({ name: `S${j + 1}`, values: Array.from(v) })) };

  for (const [deterministic, terms] of [['const', 'const'], ['trend', 'trend']] as const) {
    for (const unitRootTest of ['adf', 'dfgls'] as const) {
      it(`equals ngPerronTest on the same levels (${deterministic}, ${unitRootTest} deciding), headed by MZt, for comparison only`, () => {
        const report = diagnose(input, { deterministic, unitRootTest });
        report.series.forEach((s, j) => {
          const direct = ngPerronTest(values[j], { deterministic: terms }, s.name);
          const levels = s.steps.find((st) => st.differences === 0)!;
          const row = levels.ngPerron!;
          expect(row.statisticName).toBe('MZt');
          close(row.statistic, direct.statistics.MZt.statistic);
          close(row.pValue, direct.statistics.MZt.pValue);
          expect(row.critical).toEqual(direct.statistics.MZt.critical);
          expect(row.lags).toBe(direct.lags);
          expect(row.observations).toBe(direct.nobs);
          for (const m of row.statistics) {
            close(m.statistic, direct.statistics[m.name].statistic);
            expect(m.critical).toEqual(direct.statistics[m.name].critical);
            expect(m.publishedCritical).toEqual(direct.statistics[m.name].publishedCritical);
            // The decision rule of every other test (result.ts rejects): the p-value at 5%; and the
            // critical value shown tells the same story, being from the p-value's own distribution.
            expect(m.rejects).toBe(direct.statistics[m.name].pValue < 0.05);
            if (m.statistic !== null && m.pValueBound === null) {
              // Every M statistic rejects in its lower tail.
              expect(m.statistic < m.critical['5%'], m.name).toBe(m.rejects);
            }
          }
          expect(row.statistics.map((m) => m.name)).toEqual(['MZa', 'MZt', 'MSB', 'MPT']);
          expect(row.decides).toBe(false);
          // Ng & Perron (2001), Table 1, MZt 5%: -1.98 (constant), -2.91 (trend), from memory.
          const mzt = row.statistics.find((m) => m.name === 'MZt')!;
          expect(mzt.publishedCritical['5%']).toBe(deterministic === 'const' ? -1.98 : -2.91);
          // The deciding value is the simulated limit's (tables/gls-unitroot-simulated.json).
          expect(row.critical).toEqual({ ...glsCriticalValues('MZt', deterministic === 'const' ? 'const' : 'trend', null) });
          // Only the levels carry it.
          for (const st of s.steps) if (st.differences > 0) expect(st.ngPerron).toBeNull();
        });
      });
    }
  }

  it('carries the source of its critical values into the JSON report, marked as recalled', () => {
    const json = JSON.parse(JSON.stringify(diagnose(input)));
    const source: string = json.series[0].steps[0].ngPerron.criticalSource;
    expect(source).toMatch(/Ng, S\. & Perron, P\. \(2001\)/);
    expect(source).toMatch(/Table 1/);
    expect(source).toMatch(/from memory/);
  });
});
