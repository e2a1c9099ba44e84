/**
 * The pane's Ng-Perron row in "How each series moves": it shows the report's numbers (MZt, its
 * p-value, its 5% critical value and decision; MZa, MSB and MPT in its note), says it is shown
 * for comparison and what it adds, and never claims to decide. Expected values are the report's
 * own, which tests/report/ng-perron-row.test.ts checks against ngPerronTest; the critical value
 * is the one the decision uses (the p-value's simulated distribution), not Table 1's recalled
 * value. Seeded series.
 */
import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { SeededRandom } from '../../addin/random';
import { showNumber, showPValue } from '../../taskpane/ui/views/numbers';
import { seriesStepView } from '../../taskpane/ui/views/series-view';

function walks(seed: number, n = 300): Float64Array[] {
  const rng = new SeededRandom(seed);
  return [0, 1].map(() => {
    const x = new Float64Array(n);
    x[0] = 80;
    for (let i = 1; i < n; i++) x[i] = x[i - 1] + rng.normal();
    return x;
  });
}

describe("the pane's Ng-Perron row", () => {
  for (const unitRootTest of ['adf', 'dfgls'] as const) {
    it(`shows the report's MZt, p-value, critical value and decision, and the other three forms (${unitRootTest} deciding)`, () => {
      const values = walks(31);
      const report = diagnose({ series: values.map((v, j) => ({ name: `S${j + 1}`, values: Array.from(v) })) }, { unitRootTest });
      const view = seriesStepView(report);
      report.series.forEach((s, j) => {
        const np = s.steps[0].ngPerron!;
        const row = view.items[j].tests[0].ngPerron!;
        expect(row.label).toContain('Ng-Perron MZt');
        expect(row.label).toContain('shown for comparison');
        expect(row.label).not.toMatch(/decides/);
        expect(row.statistic).toBe(showNumber(np.statistic));
        expect(row.pValue).toBe(showPValue(np.pValue, np.pValueBound));
        expect(row.decision).toBe(np.rejects ? 'rejects' : 'does not reject');
        // The value the decision uses (the p-value's own distribution), not Table 1's recalled -1.98.
        expect(row.note).toContain(`Rejects below ${showNumber(np.critical['5%'])} at 5%`);
        expect(np.critical['5%']).not.toBe(np.statistics.find((m) => m.name === 'MZt')!.publishedCritical['5%']);
        expect(row.note).toMatch(/autocorrelated/);
        expect(row.note).toMatch(/does not decide the order/);
        for (const m of np.statistics.filter((x) => x.name !== 'MZt')) {
          expect(row.note).toContain(`${m.name} ${showNumber(m.statistic)} (rejects below ${showNumber(m.critical['5%'])} at 5%): ${m.rejects ? 'rejects' : 'does not reject'}`);
        }
        // Only the levels carry it.
        for (const t of view.items[j].tests.slice(1)) expect(t.ngPerron).toBeNull();
      });
    });
  }
});
