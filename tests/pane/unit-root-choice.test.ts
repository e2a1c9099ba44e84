/**
 * Which unit-root test decides each series' order of integration: the pane's choice travels in
 * the one analysis value (DiagnosticOptions.unitRootTest) to the engine, is recorded in the
 * report's settings and in the block's note, and the block's MOOR.ORDER formulas take it. The
 * expected values come from the engine's own tests called directly on the same values
 * (integrationOrder, dfglsTest, adfTest), and from the published DF-GLS critical value.
 */
import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import { SeededRandom } from '../../addin/random';
import { adfTest } from '../../addin/unitroot/adf';
import { dfglsTest } from '../../addin/unitroot/dfgls';
import { integrationOrder } from '../../addin/unitroot/integration-order';
import { decodeBlockNote, encodeBlockNote } from '../../taskpane/block/block-note';
import { choiceViews, choicesOf, DEFAULT_CHOICES } from '../../taskpane/ui/views/choices';
import { seriesStepView } from '../../taskpane/ui/views/series-view';

/** Two slowly reverting series (AR(1) with phi = 0.95, seeded), the case DF-GLS is built for. */
function slowReverters(seed: number, n = 300): Float64Array[] {
  const rng = new SeededRandom(seed);
  return [0, 1].map(() => {
    const x = new Float64Array(n);
    for (let i = 1; i < n; i++) x[i] = 0.95 * x[i - 1] + rng.normal();
    return x.map((v) => v + 50);
  });
}

const input = (values: Float64Array[]) => ({ series: values.map((v, j) => ({ name: `S${j + 1}`, values: Array.from(v) })) });

describe('the test that decides the order of integration', () => {
  it('is ADF unless chosen, and the choice is offered beside the level terms with a why in plain words', () => {
    expect(DEFAULT_CHOICES.unitRootTest).toBe('adf');
    const [c] = choiceViews(['unitRootTest'], { deterministic: 'const', lagRule: 'aic', johansenCase: 'auto', unitRootTest: 'dfgls' });
    expect(c.options.map((o) => o.value)).toEqual(['adf', 'dfgls']);
    expect(c.currentWhy).toMatch(/slow return to a mean is caught more often/);
  });

  for (const test of ['adf', 'dfgls'] as const) {
    it(`with ${test} deciding: the report's orders are the engine's, its settings record the choice, and DF-GLS stands beside ADF`, () => {
      for (const seed of [11, 12, 13]) {
        const values = slowReverters(seed);
        const report = diagnose(input(values), { unitRootTest: test });
        expect(report.settings.unitRootTest).toBe(test);
        expect(choicesOf(report.settings).unitRootTest).toBe(test);
        report.series.forEach((s, j) => {
          expect(s.decidedBy).toBe(test);
          expect(s.order).toBe(integrationOrder(values[j], { unitRootTest: test }, s.name).order === 'above 2' ? 3 : integrationOrder(values[j], { unitRootTest: test }, s.name).order);
          const levels = s.steps.find((st) => st.differences === 0);
          if (!levels) return;
          expect(levels.adf.statistic).toBe(adfTest(values[j], { deterministic: 'const' }, s.name).statistic);
          expect(levels.gls?.statistic).toBe(dfglsTest(values[j], { deterministic: 'const' }, s.name).statistic);
          // The decider's rejection at 5% decides between I(0) and I(1).
          const decider = test === 'dfgls' ? levels.gls! : levels.adf;
          expect(s.order).toBe(decider.rejects ? 0 : 1);
          // Elliott, Rothenberg & Stock (1996), Table 1 (constant only: the Dickey-Fuller
          // no-constant points), 5% about -1.95 (from memory); the engine's simulated table at
          // 300 rows must lie near it.
          expect(levels.gls!.critical['5%']).toBeGreaterThan(-2.05);
          expect(levels.gls!.critical['5%']).toBeLessThan(-1.85);
        });
        const view = seriesStepView(report);
        expect(view.choices.map((c) => c.key)).toEqual(['deterministic', 'unitRootTest']);
        expect(view.items[0].tests[0].gls?.label).toContain('DF-GLS');
        expect(view.items[0].tests[0][test === 'dfgls' ? 'gls' : 'adf']?.label).toMatch(/decides$/);
      }
    });
  }

  it('on slow reverters DF-GLS calls I(0) more often than ADF on the same draws (seeded, 20 pairs)', () => {
    let adfZero = 0;
    let glsZero = 0;
    for (let seed = 100; seed < 120; seed++) {
      const values = slowReverters(seed);
      glsZero += diagnose(input(values), { unitRootTest: 'dfgls' }).series.filter((s) => s.order === 0).length;
      adfZero += diagnose(input(values), { unitRootTest: 'adf' }).series.filter((s) => s.order === 0).length;
    }
    expect(glsZero).toBeGreaterThan(adfZero);
  });

  it('is refused in words when unknown', () => {
    expect(() => diagnose(input(slowReverters(1)), { unitRootTest: 'pp' as never })).toThrow(/must be 'adf' or 'dfgls'; got 'pp'/);
  });

  it('travels in the block note, and notes written before it read as ADF', () => {
    const note = { sheet: 'Prices', address: 'A1:C781', table: null, a: 'A', b: 'B', reserved: [], analysis: { preparation: 'log', alpha: 0.05, deterministic: 'const', lagRule: 'aic', johansenCase: 'auto', unitRootTest: 'dfgls' } };
    expect(decodeBlockNote(encodeBlockNote(note))?.analysis?.unitRootTest).toBe('dfgls');
    const old = '{"k":"mooring-block-1","s":"Prices","r":"A1:C781","t":null,"a":"A","b":"B","x":[],"p":"log","o":[0.05,"const","aic","auto"]}';
    expect(decodeBlockNote(old)?.analysis?.unitRootTest).toBe('adf');
  });
});
