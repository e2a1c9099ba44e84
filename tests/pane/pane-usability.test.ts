/**
 * The pane as a person reads it: plural words that agree, a tie's mark and sentence from one
 * decision (never the colour of a tie when Johansen's rank test disagrees), the overview of
 * all pairs and its sorting, year labels on long time axes, several blocks of one pair that
 * keep their own names, and the check through time run on the report's own rows.
 *
 * Expected values come from the engine's own functions run directly on the same rows (the
 * pane only arranges them), from the report itself, or from the calendar.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { checkDiagnosticInput } from '../../addin/report/check-input';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { rollingRelation } from '../../addin/stability/rolling-relation';
import { refreshBlock } from '../../taskpane/block/refresh-block';
import { timeTickLabels } from '../../taskpane/ui/charts/time-ticks';
import { prepareData } from '../../taskpane/ui/data/prepare-data';
import { showPValue } from '../../taskpane/ui/views/numbers';
import { pairOverview } from '../../taskpane/ui/views/pair-overview';
import { seriesHeadline } from '../../taskpane/ui/views/series-view';
import { stabilityView } from '../../taskpane/ui/views/stability-view';
import { tieReading, tiedStepView } from '../../taskpane/ui/views/tied-view';
import { initialWriteState, writeStepView } from '../../taskpane/ui/views/write-view';
import { blockNameAt, planPairWrite, writePlan } from '../../taskpane/ui/write-actions';
import { handleStabilityRequest } from '../../taskpane/worker/diagnose-worker';
import type { WorkerReply } from '../../taskpane/worker/messages';
import { pairStability, stabilityStep, stabilityWindow } from '../../taskpane/worker/stability-job';
import { choiceOf, COLUMN, demoRegion, demoReport } from './demo-reports';

let six: DiagnosticReport;
let two: DiagnosticReport;

beforeAll(async () => {
  six = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel, COLUMN.HeavyFuel, COLUMN.BunkerBlend, COLUMN.BargeFreight, COLUMN.TankPremium]);
  two = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
});

describe('words that agree with their numbers', () => {
  it('says "both" for two prices and matches the verb to the count', () => {
    expect(seriesHeadline(2, 2)).toBe('Both prices wander: they can be tested for a tie.');
    expect(seriesHeadline(6, 6)).toBe('All 6 prices wander: each can be tested for a tie with the others.');
    expect(seriesHeadline(1, 2)).toBe('1 of 2 prices wanders; pairs with the other are not read as long-run ties.');
    expect(seriesHeadline(5, 6)).toBe('5 of 6 prices wander; pairs with the other are not read as long-run ties.');
    expect(seriesHeadline(1, 3)).toBe('1 of 3 prices wanders; pairs with the others are not read as long-run ties.');
    expect(seriesHeadline(0, 2)).toMatch(/^Neither price wanders/);
  });
});

describe("a pair's mark and sentence come from one decision", () => {
  it('never gives the colour of a tie when Johansen finds no relation', () => {
    for (const p of six.pairs) {
      const r = tieReading(p);
      const rank = p.cointegration.johansen?.rank.trace ?? null;
      if (r.mark.tone === 'yes') {
        expect(p.cointegration.evidence).toBe('both-directions');
        expect(rank === null || rank >= 1).toBe(true);
      }
    }
  });

  it('marks the pair Engle-Granger ties both ways but Johansen does not as mixed evidence, and says why', () => {
    const p = six.pairs.find((q) => q.a === 'HeavyFuel' && q.b === 'BunkerBlend')!;
    // The report's own facts: both residual tests reject, Johansen's trace rank is 0.
    expect(p.cointegration.evidence).toBe('both-directions');
    expect(p.cointegration.johansen?.rank.trace).toBe(0);
    const v = tiedStepView(six, p);
    expect(v.mark).toEqual({ word: 'Mixed evidence', tone: 'unsure' });
    expect(v.verdict).toBe(`${p.cointegration.verdict} Johansen's rank test, however, finds no relation: treat the tie as uncertain.`);
  });

  it('does not let a stationary price pass for a tie: the mark, the sentence and the note on Johansen agree', () => {
    const p = six.pairs.find((q) => q.a === 'GateGasoil' && q.b === 'TankPremium')!;
    expect(p.cointegration.bothIntegrated).toBe(false);
    expect(p.cointegration.johansen?.rank.trace).toBe(1);
    const v = tiedStepView(six, p);
    expect(v.mark).toEqual({ word: 'Not two wandering prices', tone: 'unsure' });
    expect(v.verdict.startsWith(p.cointegration.verdict)).toBe(true);
    expect(v.johansenNote).toMatch(/not a tie between the two/);
    expect(v.verdict).toContain(v.johansenNote!);
  });

  it('keeps "Tied" for the pair every test ties', () => {
    expect(tiedStepView(two, two.pairs[0]).mark).toEqual({ word: 'Tied', tone: 'yes' });
  });
});

describe('the overview of all pairs', () => {
  it('has one row per pair, with the mark of its own step and the report p-values', () => {
    const o = pairOverview(six);
    expect(o.rows).toHaveLength(15);
    expect(new Set(o.rows.map((r) => r.index)).size).toBe(15);
    for (const r of o.rows) {
      const p = six.pairs[r.index];
      expect(r.mark).toEqual(tiedStepView(six, p).mark);
      const { aOnB, bOnA } = p.cointegration.engleGranger;
      expect(r.pValues).toEqual([showPValue(aOnB.pValue, aOnB.pValueBound), showPValue(bOnA.pValue, bOnA.pValueBound)]);
      expect(r.halfLife === 'none').toBe(p.adjustment?.spreadAr1.halfLife == null);
    }
    // The default order puts the pair tied by every test first.
    expect(o.rows[0].label).toBe('GateGasoil and DockDiesel');
    expect(o.columns.find((c) => c.key === 'reading')?.sort).toBe('ascending');
  });

  it('sorts by p-value either way, and by name', () => {
    const up = pairOverview(six, { key: 'p', descending: false }).rows.map((r) => r.worstP!);
    const down = pairOverview(six, { key: 'p', descending: true }).rows.map((r) => r.worstP!);
    for (let i = 1; i < up.length; i++) expect(up[i]).toBeGreaterThanOrEqual(up[i - 1]);
    expect(down).toEqual([...up].reverse());
    const names = pairOverview(six, { key: 'pair', descending: false }).rows.map((r) => r.label);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    const byHalfLife = pairOverview(six, { key: 'halfLife', descending: false });
    const known = byHalfLife.rows.filter((r) => r.halfLifeValue !== null).map((r) => r.halfLifeValue!);
    for (let i = 1; i < known.length; i++) expect(known[i]).toBeGreaterThanOrEqual(known[i - 1]);
    expect(byHalfLife.columns.find((c) => c.key === 'halfLife')?.sort).toBe('ascending');
  });
});

describe('year labels on time axes', () => {
  const at = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / 1000;
  const DAY = 86_400;
  it('labels month ticks with their year, and year ticks with the year alone', () => {
    expect(timeTickLabels([at('2022-07-01'), at('2023-01-01'), at('2023-07-01')], 182 * DAY)).toEqual(['Jul 2022', 'Jan 2023', 'Jul 2023']);
    expect(timeTickLabels([at('2022-01-01'), at('2023-01-01')], 365 * DAY)).toEqual(['2022', '2023']);
  });
  it('puts the year on the first day tick and where the year turns', () => {
    expect(timeTickLabels([at('2023-12-18'), at('2023-12-25'), at('2024-01-01'), at('2024-01-08')], 7 * DAY)).toEqual(['18 Dec 2023', '25 Dec', '1 Jan 2024', '8 Jan']);
  });
});

describe('several blocks coexist by name', () => {
  it('gives a second block of the same pair elsewhere its own name and chart, and refresh finds each', async () => {
    const { workbook, region } = await demoRegion();
    const pair = { a: 'GateGasoil', b: 'DockDiesel' };
    const here = { sheet: 'Prices', anchor: 'J2' };
    const first = await planPairWrite(workbook, two, pair, region, here);
    expect(first.block.name).toBe('Mooring_GateGasoil_DockDiesel');
    expect((await writePlan(workbook, first, false)).ok).toBe(true);
    const sheet = await workbook.addSheet('Mooring results');
    const there = { sheet, anchor: 'B3' };
    const second = await planPairWrite(workbook, two, pair, region, there);
    expect(second.block.name).toBe('Mooring_GateGasoil_DockDiesel_2');
    expect(second.replacesEarlierBlock).toBe(false);
    const outcome = await writePlan(workbook, second, false);
    expect(outcome.ok).toBe(true);
    // The pane says so, rather than moving the first block's name in silence.
    expect(writeStepView(region, pair, { ...initialWriteState(), plan: second, outcome }).result?.lines).toContain(
      'The block of this pair written elsewhere keeps its own name (Mooring_GateGasoil_DockDiesel) and chart; both are refreshed when rows are pasted into the table.');
    // The first block still has its name where it was written, and each its chart.
    expect(await workbook.findBlock('Mooring_GateGasoil_DockDiesel')).toMatchObject({ sheet: 'Prices' });
    expect(await workbook.findBlock('Mooring_GateGasoil_DockDiesel_2')).toMatchObject({ sheet });
    expect(workbook.charts.map((c) => [c.name, c.sheet])).toEqual([['Mooring_GateGasoil_DockDiesel', 'Prices'], ['Mooring_GateGasoil_DockDiesel_2', sheet]]);
    // Writing again at either place keeps that place's name.
    expect(await blockNameAt(workbook, pair, here)).toBe('Mooring_GateGasoil_DockDiesel');
    expect(await blockNameAt(workbook, pair, there)).toBe('Mooring_GateGasoil_DockDiesel_2');
    // A refresh by either name rewrites that block in its own place, under its own name.
    for (const [name, where] of [['Mooring_GateGasoil_DockDiesel', 'Prices'], ['Mooring_GateGasoil_DockDiesel_2', sheet]] as const) {
      expect((await refreshBlock(workbook, name)).ok).toBe(true);
      expect((await workbook.findBlock(name))?.sheet).toBe(where);
    }
    expect(workbook.charts).toHaveLength(2);
  });
});

describe('the check through time', () => {
  it('runs the engine on the rows of the run, window and all', async () => {
    const { region } = await demoRegion();
    const prepared = prepareData(region, choiceOf([COLUMN.GateGasoil, COLUMN.DockDiesel], { from: '2023-01-02' }));
    const options = { window: prepared.window, alpha: 0.05 };
    const report = diagnose(prepared.input, options);
    const pair = { y: report.pairs[0].relation!.dependent, x: report.pairs[0].relation!.regressor };
    const st = pairStability(prepared.input, options, pair);
    expect(st.rows).toBe(report.data.observations);
    const checked = checkDiagnosticInput(prepared.input, options);
    const y = checked.values[checked.names.indexOf(pair.y)];
    const x = checked.values[checked.names.indexOf(pair.x)];
    const window = stabilityWindow(st.rows);
    const direct = rollingRelation(y, x, { window, step: stabilityStep(st.rows, window) });
    expect(st.rolling?.pValue).toEqual(direct.pValue);
    expect(st.rolling?.beta).toEqual(direct.beta);
    expect(st.rolling?.endLabel.at(-1)).toBe(report.data.last.date);
    const gh = gregoryHansenTest(y, [x], { model: 'regime' });
    expect(st.shifts[1].test.statistic).toBe(gh.statistic);
    expect(st.seriesBreaks.map((b) => b.name)).toEqual([pair.y, pair.x]);

    const v = stabilityView(st, 0.05, report.data.period);
    expect(v.charts.map((c) => c.id)).toEqual(['rolling-p', 'rolling-beta', 'rolling-half-life']);
    expect(v.charts[0].time).toBe(true);
    expect(v.charts[0].lines[1].values.every((p) => p === 0.05)).toBe(true);
    expect(v.breaks).toHaveLength(4);
    expect(v.summary).toEqual(st.rolling?.summary);
  });

  it('windows of about a year on long histories, half the sample on short ones, thinned to about 150', () => {
    expect(stabilityWindow(780)).toBe(250);
    expect(stabilityWindow(300)).toBe(150);
    expect(stabilityWindow(30)).toBe(21);
    expect(stabilityStep(780, 250)).toBe(4);
    expect(Math.ceil((780 - 250 + 1) / stabilityStep(780, 250))).toBeLessThanOrEqual(150);
  });

  it('answers from the worker, and refuses a series the run does not hold', async () => {
    const { region } = await demoRegion();
    const prepared = prepareData(region, choiceOf([COLUMN.GateGasoil, COLUMN.DockDiesel]));
    const replies: WorkerReply[] = [];
    handleStabilityRequest({ type: 'stability', id: 7, input: prepared.input, options: {}, pair: { y: 'DockDiesel', x: 'GateGasoil' } }, (r) => replies.push(r));
    expect(replies.map((r) => [r.type, r.id])).toEqual([['stability-done', 7]]);
    handleStabilityRequest({ type: 'stability', id: 8, input: prepared.input, options: {}, pair: { y: 'DockDiesel', x: 'HeavyFuel' } }, (r) => replies.push(r));
    expect(replies[1]).toMatchObject({ type: 'failed', id: 8 });
  });
});
