import { beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { PairReport } from '../../addin/report/pair-types';
import { cautionsView } from '../../taskpane/ui/views/cautions-view';
import { choiceViews } from '../../taskpane/ui/views/choices';
import { leaderStepView } from '../../taskpane/ui/views/leader-view';
import { chosenPair, pairOptions } from '../../taskpane/ui/views/pair-choice';
import { relationStepView } from '../../taskpane/ui/views/relation-view';
import { seriesStepView } from '../../taskpane/ui/views/series-view';
import { showNumber } from '../../taskpane/ui/views/numbers';
import { tiedStepView } from '../../taskpane/ui/views/tied-view';
import { COLUMN, demoReport } from './demo-reports';

let two: DiagnosticReport;
let five: DiagnosticReport;
let short: DiagnosticReport;
const pairOf = (r: DiagnosticReport, a: string, b: string): PairReport => {
  const p = r.pairs.find((q) => q.a === a && q.b === b);
  if (!p) throw new Error(`no pair ${a} ${b}`);
  return p;
};

beforeAll(async () => {
  two = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
  five = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel, COLUMN.HeavyFuel, COLUMN.BunkerBlend, COLUMN.TankPremium]);
  // The last 45 weekdays of the demo data: a short sample.
  short = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel], { from: '2024-10-28' });
});

describe('How each series moves', () => {
  it('says every price wanders when all are I(1), with a mark in words and the rebased chart', () => {
    const v = seriesStepView(two);
    expect(v.headline).toBe('Both prices wander: they can be tested for a tie.');
    expect(v.items.map((i) => [i.name, i.mark.word, i.orderText])).toEqual([['GateGasoil', 'Wanders', 'I(1)'], ['DockDiesel', 'Wanders', 'I(1)']]);
    expect(v.items[1].verdict).toBe(two.series[1].verdict);
    expect(v.chart.time).toBe(true);
    expect(v.chart.lines[0].values[0]).toBe(100);
    expect(v.chart.x).toHaveLength(780);
  });

  it('flags a series whose two tests disagree and carries the engine warning with it, not twice', () => {
    const v = seriesStepView(two);
    const gasoil = v.items[0];
    expect(gasoil.testsAgree).toBe(false);
    expect(gasoil.warnings.some((w) => /ADF and KPSS disagree for GateGasoil/.test(w))).toBe(true);
    expect(v.warnings.some((w) => /disagree for GateGasoil/.test(w))).toBe(false);
    expect(gasoil.tests.map((t) => t.stage)).toEqual(['Price levels', 'Changes from day to day', 'Changes of those changes']);
    expect(gasoil.tests[0].adf).toMatchObject({ label: 'Unit root (ADF), decides', decision: 'does not reject' });
    // DF-GLS beside ADF and KPSS on the levels, each with the engine's critical value at the report's level.
    const levels = two.series[0].steps[0];
    expect(gasoil.tests[0].gls?.label).toBe('Unit root, more power against a slow return (DF-GLS)');
    expect(gasoil.tests[0].gls?.note).toContain(`Rejects below ${showNumber(levels.gls!.critical['5%'])} at 5%`);
    expect(gasoil.tests[0].adf.note).toContain(`Rejects below ${showNumber(levels.adf.critical['5%'])} at 5%`);
    expect(gasoil.tests[1].gls).toBeNull();
    expect(gasoil.decidedBy).toMatch(/^Decided by ADF/);
  });

  it('marks a stationary series apart and says not every price wanders', () => {
    const v = seriesStepView(five);
    expect(v.headline).toBe('4 of 5 prices wander; pairs with the other are not read as long-run ties.');
    expect(v.items.find((i) => i.name === 'TankPremium')?.mark).toEqual({ word: 'Returns to a level', tone: 'unsure' });
  });

  it('shows the short-sample warning of a short sample', () => {
    expect(short.data.observations).toBe(45);
    expect(seriesStepView(short).warnings.some((w) => w.startsWith('Only 45 observations'))).toBe(true);
    expect(seriesStepView(two).warnings.some((w) => w.startsWith('Only'))).toBe(false);
  });

  it('offers the level terms with the value the report used and its why', () => {
    const [c] = seriesStepView(two).choices;
    expect(c).toMatchObject({ key: 'deterministic', value: 'const', currentWhy: 'For prices with no steady climb or fall over the sample.' });
    expect(choiceViews(['deterministic'], { ...two.settings, deterministic: 'trend' })[0].currentWhy).toBe('For prices that climb or fall steadily over the whole sample.');
  });
});

describe('Tied together?', () => {
  it('marks the tight pair tied, with both residual tests, Phillips-Ouliaris and the Johansen reasons', () => {
    const v = tiedStepView(two, two.pairs[0]);
    expect(v.mark).toEqual({ word: 'Tied', tone: 'yes' });
    expect(v.verdict).toBe(`${two.pairs[0].cointegration.verdict} Johansen's rank test agrees.`);
    expect(v.tests.map((t) => t.label)).toEqual(['Engle-Granger, GateGasoil on DockDiesel', 'Engle-Granger, DockDiesel on GateGasoil', 'Phillips-Ouliaris']);
    expect(v.tests.every((t) => t.decision === 'rejects')).toBe(true);
    expect(v.johansen?.rows.map((r) => r.label)).toEqual(['Johansen: no relation', 'Johansen: at most 1']);
    expect(v.johansen?.caseReason).toBe(two.pairs[0].cointegration.johansen?.caseReason);
    expect(v.system).toBeNull();
    expect(v.choices.map((c) => c.key)).toEqual(['lagRule', 'johansenCase']);
  });

  it('carries the warning when Johansen disagrees with Engle-Granger on the loose pair', () => {
    const v = tiedStepView(five, pairOf(five, 'HeavyFuel', 'BunkerBlend'));
    expect(v.warnings.some((w) => /Johansen's trace test/.test(w))).toBe(true);
    expect(v.system?.verdict).toBe(five.system?.verdict);
  });

  it('marks a pair with a stationary series as not two wandering prices, and no tie for unrelated prices', () => {
    expect(tiedStepView(five, pairOf(five, 'GateGasoil', 'TankPremium')).mark).toEqual({ word: 'Not two wandering prices', tone: 'unsure' });
    expect(tiedStepView(five, pairOf(five, 'GateGasoil', 'HeavyFuel')).mark).toEqual({ word: 'No tie found', tone: 'no' });
  });

  it('puts the tied pairs first in the picker and shows the first of them by default', () => {
    const options = pairOptions(five);
    expect(options.slice(0, 2).map((o) => o.label)).toEqual(['GateGasoil and DockDiesel (tied)', 'HeavyFuel and BunkerBlend (mixed evidence)']);
    expect(options).toHaveLength(10);
    expect(chosenPair(five, null)?.pair.b).toBe('DockDiesel');
    expect(chosenPair(five, 9)?.index).toBe(9);
    expect(chosenPair(five, 99)?.index).toBe(options[0].index);
    expect(chosenPair({ ...five, pairs: [] }, null)).toBeNull();
  });
});

describe('The relation and its pull', () => {
  it('puts the half-life sentence beside the numbers and the line in words', () => {
    const v = relationStepView(two, two.pairs[0]);
    expect(v.pullVerdict).toMatch(/^The spread closes half its gap in about 12 days/);
    expect(v.relationText).toBe('ln DockDiesel = 0.399 + 1.122 ln GateGasoil');
    expect(v.untiedNote).toBeNull();
    expect(v.pullFacts.find((f) => f.label === 'Half-life of the spread (AR(1) of the spread on the plain least-squares line)')?.value).toBe('11.9 days');
    expect(v.lineFacts.find((f) => f.label === 'Held steady across the halves?')?.value).toBe('Yes');
    // In the demo market DockDiesel closes the gap and its leader GateGasoil does not.
    expect(v.pullFacts.find((f) => f.label === 'DockDiesel moves to close the gap?')?.value).toBe('Yes');
    expect(v.pullFacts.find((f) => f.label === 'GateGasoil moves to close the gap?')?.value).toBe('No');
  });

  it('draws the spread with bands at the engine mean +/- 2 sd, and the rolling z-score with guides at +/- 2', () => {
    const v = relationStepView(two, two.pairs[0]);
    const spread = two.pairs[0].spread!;
    const lines = v.charts!.spread.lines;
    expect(lines.map((l) => l.role)).toEqual(['series', 'centre', 'band', 'band']);
    expect(lines[0].values).toBe(spread.values);
    expect(lines[2].values.every((x) => x === spread.bandUpper)).toBe(true);
    expect(lines[3].values.every((x) => x === spread.bandLower)).toBe(true);
    const z = v.charts!.rollingZ;
    expect(z.lines[0].values).toBe(spread.rollingZ);
    expect(z.lines[1].values[0]).toBe(2);
    expect(z.title).toBe('Where the spread (plain least-squares line) stands against the last 60 rows');
  });

  it('says first that an untied pair has no reason to close its gap', () => {
    expect(relationStepView(five, pairOf(five, 'GateGasoil', 'HeavyFuel')).untiedNote).toMatch(/^The tests found no long-run tie/);
  });
});

describe('Who moves first', () => {
  it('names the leader of the tight pair in words, with both directions and the test used', () => {
    const v = leaderStepView(two, two.pairs[0]);
    expect(v.mark).toEqual({ word: 'GateGasoil moves first', tone: 'yes' });
    expect(v.verdict).toBe(two.pairs[0].leadLag?.verdict);
    expect(v.directions.map((d) => [d.question, d.answer])).toEqual([
      ['Does GateGasoil move before DockDiesel?', 'Yes'],
      ['Does DockDiesel move before GateGasoil?', 'No evidence'],
    ]);
    expect(v.method).toBe('Toda-Yamamoto test');
    expect(v.directions[0].rows.map((r) => [r.label, r.decision])).toEqual([['Toda-Yamamoto', 'rejects']]);
    expect(v.cautions.items).toEqual(expect.arrayContaining(two.pairs[0].leadLag!.cautions));
  });

  it('says neither moves first for the loose pair', () => {
    expect(leaderStepView(five, pairOf(five, 'HeavyFuel', 'BunkerBlend')).mark).toEqual({ word: 'Neither moves first', tone: 'no' });
  });
});

describe('cautions beside every verdict', () => {
  it('every stage carries the standing cautions, with the screening count of this report', () => {
    const pair = pairOf(five, 'HeavyFuel', 'BunkerBlend');
    const stages = [seriesStepView(five).cautions, tiedStepView(five, pair).cautions, relationStepView(five, pair).cautions, leaderStepView(five, pair).cautions];
    for (const c of stages) {
      expect(c.items.slice(0, 4)).toEqual(five.cautions);
      expect(c.items.join(' ')).toMatch(/not advice/);
      expect(c.items.join(' ')).toMatch(/This report tested 10 pairs/);
    }
    expect(cautionsView(two, [two.cautions[0]]).items).toHaveLength(4);
  });
});
