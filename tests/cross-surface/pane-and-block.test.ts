/**
 * One analysis, one set of numbers: the pane's run and the results block it writes give the
 * same number for every quantity both show, under the pane's choices (logs on and off, a
 * date window, a skipped gap, each lag rule), when written and after 12 rows are appended.
 *
 * The pane's side is the engine report made exactly as the pane makes it (prepareData, then
 * diagnose with the pane's options): every number the pane's steps show is read from that
 * report. The block's side is what its live MOOR formulas calculate in the in-memory
 * workbook, through the same implementations Excel calls. Two price histories on two calendars
 * are joined on their dates by the pane and by the block's MOOR.COMMONDATES formula alike. Source of the expected values: the
 * other surface (the check is agreement, 1e-12 relative); the demo data are our own.
 */
import { describe, expect, it } from 'vitest';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { buildPairBlock, type PairBlock } from '../../taskpane/block/pair-block';
import { planBlockWrite, writePlannedBlock } from '../../taskpane/block/plan-block-write';
import { prepareData, type DataChoice } from '../../taskpane/ui/data/prepare-data';
import { showNumber } from '../../taskpane/ui/views/numbers';
import { relationStepView } from '../../taskpane/ui/views/relation-view';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import type { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import type { CellContent, DataRegion } from '../../taskpane/workbook/port';
import { DEMO_CSV, PAIR, rowOf } from '../pane-workbook/demo-block';
import { sharedDates, twoCalendarCsv } from '../pane/two-calendars';
import { refreshBlock } from '../../taskpane/block/refresh-block';

interface Combo {
  name: string;
  log: boolean;
  from: string | null;
  to: string | null;
  /** Sheet cells to blank before the run (gaps), when gaps are skipped. */
  gaps: string[];
  lagRule: 'aic' | 'bic';
  /** Extra series selected besides the pair (their gaps drop rows of the pair too). */
  extra: string[];
  /** The table runs newest row first (a common vendor export). */
  newestFirst?: boolean;
}

const COMBOS: Combo[] = [
  { name: 'logs on, every row, AIC (the pane\'s defaults)', log: true, from: null, to: null, gaps: [], lagRule: 'aic', extra: [] },
  { name: 'logs off, BIC', log: false, from: null, to: null, gaps: [], lagRule: 'bic', extra: [] },
  { name: 'logs on, from a date', log: true, from: '2024-01-02', to: null, gaps: [], lagRule: 'aic', extra: [] },
  { name: 'logs on, a skipped gap in each series', log: true, from: null, to: null, gaps: ['B120', 'C300'], lagRule: 'aic', extra: [] },
  { name: 'logs on, from a date, a skipped gap inside the window, BIC', log: true, from: '2023-06-01', to: null, gaps: ['C700'], lagRule: 'bic', extra: [] },
  { name: 'logs off, a closed window, a skipped gap', log: false, from: '2022-06-01', to: '2024-06-28', gaps: ['B400'], lagRule: 'aic', extra: [] },
  { name: 'logs on, a third series whose gap drops a row of the pair', log: true, from: null, to: null, gaps: ['D200'], lagRule: 'aic', extra: ['HeavyFuel'] },
  { name: 'newest row first, logs on, a window and a skipped gap', log: true, from: '2023-01-02', to: '2024-06-28', gaps: ['C100'], lagRule: 'aic', extra: [], newestFirst: true },
];

/** The demo CSV with its rows newest first. */
function newestFirstCsv(): string {
  const [head, ...rows] = DEMO_CSV.trimEnd().split('\n');
  return `${[head, ...rows.reverse()].join('\n')}\n`;
}

/** Twelve business days after the demo's last day, near the pair's line. */
function twelveRows(region: DataRegion): CellContent[][] {
  const last = region.rows[region.rows.length - 1];
  const out: CellContent[][] = [];
  for (let k = 0; k < 12; k++) {
    const day = new Date(Date.UTC(2024, 11, 30) + k * 86_400_000);
    if (day.getUTCDay() === 0 || day.getUTCDay() === 6) continue;
    out.push([day.toISOString().slice(0, 10), ...last.slice(1).map((v, j) => (typeof v === 'number' ? v * (1 + 0.002 * ((k + j) % 5)) : v))]);
  }
  while (out.length < 12) {
    const prev = out[out.length - 1];
    const d = new Date(`${prev[0] as string}T00:00:00Z`);
    d.setUTCDate(d.getUTCDate() + (d.getUTCDay() === 5 ? 3 : 1));
    out.push([d.toISOString().slice(0, 10), ...prev.slice(1)]);
  }
  return out;
}

/** The pane's run: its data step, then the engine with the options pane.ts passes. */
function paneReport(region: DataRegion, combo: Combo): DiagnosticReport {
  const names = [PAIR.a, PAIR.b, ...combo.extra];
  const choice: DataChoice = {
    columns: names.map((n) => region.headers.indexOf(n)),
    log: combo.log,
    skipGaps: true,
    from: combo.from,
    to: combo.to,
    alpha: 0.05,
  };
  const prepared = prepareData(region, choice);
  return diagnose(prepared.input, {
    log: choice.log, alpha: choice.alpha, window: prepared.window, preparation: prepared.prepText,
    deterministic: 'const', lagRule: combo.lagRule, johansenCase: 'auto',
  });
}

/** Every number the block and the pane both show, read from the report. */
function paneNumbers(report: DiagnosticReport): Record<string, number | null> {
  const p = report.pairs.find((q) => [q.a, q.b].sort().join() === [PAIR.a, PAIR.b].sort().join());
  if (!p || !p.relation || !p.adjustment || !p.spread) throw new Error('the demo pair should have its relation, adjustment and spread');
  const order = (name: string) => report.series.find((s) => s.name === name)?.order ?? null;
  const eg = p.cointegration.engleGranger;
  const out: Record<string, number | null> = {
    [`Does ${p.a} wander?`]: order(p.a),
    [`Does ${p.b} wander?`]: order(p.b),
    [`Tied? Engle-Granger, ${p.a} on ${p.b}`]: eg.aOnB.pValue,
    [`Tied? Engle-Granger, ${p.b} on ${p.a}`]: eg.bOnA.pValue,
    'Tied? Phillips-Ouliaris': p.cointegration.phillipsOuliaris?.pValue ?? null,
    [`Does ${p.adjustment.ecm.dependent.series} move back?`]: p.adjustment.ecm.dependent.speed,
    'Is that pull significant?': p.adjustment.ecm.dependent.speed / p.adjustment.ecm.dependent.standardError,
    'Does the spread revert? Half-life': p.adjustment.spreadAr1.halfLife,
    'Is the spread stretched now?': p.spread.latestZ,
  };
  if (report.data.logged) {
    out['Elasticity of'] = p.relation.ols.beta;
    out['Hedge at the latest prices'] = p.relation.dynamicOls.hedgeUnits;
    out['Elasticity (dynamic OLS)'] = p.relation.dynamicOls.beta;
  } else {
    out['Hedge ratio: units'] = p.relation.ols.beta;
    out['Hedge ratio (dynamic OLS)'] = p.relation.dynamicOls.beta;
  }
  const j = p.cointegration.johansen;
  if (j) {
    out['Tied? Johansen'] = j.trace[0].pValue;
    out['Long-run relations found by Johansen'] = j.rank.trace;
  }
  const r = p.cointegration.restrictions;
  if (r) {
    out[`Is the relation simply ${p.a} minus ${p.b}?`] = r.oneToOne.pValue;
    for (const t of r.adjusts) out[`Does ${t.series} move to close the gap?`] = t.pValue;
  }
  if (p.movingHedge) out[`${report.data.logged ? 'Elasticity' : 'Hedge ratio'} now, allowed to move`] = p.movingHedge.latest.beta;
  if (p.forecast) out['Where the spread is heading'] = p.forecast.spread.path[p.forecast.horizon - 1];
  out['Half-life, low end'] = p.adjustment.spreadAr1.halfLifeInterval.low;
  out['Half-life, high end'] = p.adjustment.spreadAr1.halfLifeInterval.high;
  if (p.leadLag && (p.leadLag.method === 'f-differences' || p.leadLag.method === 'f-levels')) {
    out[`Does ${p.leadLag.aLeadsB.cause} lead`] = p.leadLag.aLeadsB.test.pValue;
    out[`Does ${p.leadLag.bLeadsA.cause} lead`] = p.leadLag.bLeadsA.test.pValue;
  }
  return out;
}

async function writeBlock(wb: MemoryWorkbook, report: DiagnosticReport, region: DataRegion): Promise<PairBlock> {
  const built = buildPairBlock(report, PAIR, region);
  const outcome = await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart), true);
  expect(outcome.ok).toBe(true);
  return built;
}

function expectSameNumbers(wb: MemoryWorkbook, built: PairBlock, pane: Record<string, number | null>): void {
  const valueColumn = 'J'; // the demo block is anchored at I1, its numbers in the next column
  for (const [label, expected] of Object.entries(pane)) {
    const shown = wb.shownValue('Prices', `${valueColumn}${rowOf(built, label)}`);
    if (expected === null) {
      expect(typeof shown, `${label}: the pane has no number, so neither may the block`).not.toBe('number');
      continue;
    }
    expect(typeof shown, `${label}: the block shows ${String(shown)} (${wb.cellAt('Prices', `${valueColumn}${rowOf(built, label)}`).error ?? ''})`).toBe('number');
    const rel = Math.abs((shown as number) - expected) / Math.max(Math.abs(expected), 1e-300);
    expect(rel, `${label}: block ${String(shown)} vs pane ${expected}`).toBeLessThan(1e-12);
  }
}

describe('the pane and the block it writes show the same numbers', () => {
  for (const combo of COMBOS) {
    it(`${combo.name}: when written and after 12 appended rows`, async () => {
      const wb = loadCsvTable(combo.newestFirst ? newestFirstCsv() : DEMO_CSV);
      for (const cell of combo.gaps) wb.setValues('Prices', cell, [['']]);
      let region = await wb.readTable('QuennelPrices');
      let report = paneReport(region, combo);
      const built = await writeBlock(wb, report, region);
      expectSameNumbers(wb, built, paneNumbers(report));
      // The block names the preparation its formulas read.
      const prepCell = `J${rowOf(built, 'Prices prepared as')}`;
      const prepText = String(wb.shownValue('Prices', prepCell));
      expect(prepText.startsWith(report.settings.preparation)).toBe(true);
      if (combo.extra.length > 0) expect(prepText).toMatch(/skip rows? \d+/);

      // What the pane's step 4 prints is the block's number, rounded as the pane rounds it.
      const pair = report.pairs[0];
      const view = relationStepView(report, pair);
      const fact = (start: string) => view.pullFacts.concat(view.lineFacts).find((f) => f.label.startsWith(start))?.value;
      const cell = (label: string) => wb.shownValue('Prices', `J${rowOf(built, label)}`) as number;
      expect(fact('Half-life of the spread')).toBe(`${showNumber(cell('Does the spread revert? Half-life'), 1)} ${report.data.period}s`);
      expect(fact(report.data.logged ? 'Elasticity, dynamic' : 'Hedge ratio, dynamic')).toBe(showNumber(cell(report.data.logged ? 'Elasticity (dynamic OLS)' : 'Hedge ratio (dynamic OLS)'), 4));
      if (report.data.logged) expect(fact('Units of')).toBe(showNumber(cell('Hedge at the latest prices'), 4));

      if (combo.newestFirst) {
        // The pane read the rows oldest first: its sample starts and ends where the window says.
        expect(report.data.first.date).toBe('2023-01-02');
        expect(report.data.last.date).toBe('2024-06-28');
        expect(report.warnings[0]).toMatch(/run newest first; Mooring reads them oldest first/);
        expect(prepText).toMatch(/newest first/);
        // The same rows oldest first give the same numbers: the order of the sheet is not a statistic.
        const ascending = loadCsvTable(DEMO_CSV);
        ascending.setValues('Prices', `C${DEMO_CSV.trimEnd().split('\n').length + 2 - 100}`, [['']]);
        const same = paneNumbers(paneReport(await ascending.readTable('QuennelPrices'), { ...combo, newestFirst: false }));
        for (const [label, v] of Object.entries(paneNumbers(report))) {
          if (v === null) expect(same[label]).toBeNull();
          else expect(Math.abs((same[label] as number) - v) / Math.max(Math.abs(v), 1e-300), label).toBeLessThan(1e-12);
        }
        return; // new rows of a newest-first table arrive at its top, which a fixed row window does not follow
      }

      // Rows arrive: the pane runs again on the grown table; the live block follows by itself.
      wb.appendRows('QuennelPrices', twelveRows(region));
      region = await wb.readTable('QuennelPrices');
      report = paneReport(region, combo);
      expectSameNumbers(wb, built, paneNumbers(report));
    }, 60_000);
  }
});

describe('two price histories on two calendars: the block joins them as the pane does', () => {
  const CASES = [
    { name: 'logs on, every shared date, ADF decides the orders', log: true, from: null, to: null, unitRootTest: 'adf' as const },
    { name: 'logs off, a window of dates, DF-GLS decides the orders', log: false, from: '2022-06-01', to: '2024-06-28', unitRootTest: 'dfgls' as const },
  ];
  for (const c of CASES) {
    it(`${c.name}: the same numbers when written and after the block is refreshed`, async () => {
      const wb = loadCsvTable(twoCalendarCsv());
      const region = await wb.readTable('QuennelPrices');
      const choice: DataChoice = { columns: [PAIR.a, PAIR.b].map((n) => region.headers.indexOf(n)), log: c.log, skipGaps: true, from: c.from, to: c.to, alpha: 0.05 };
      const prepared = prepareData(region, choice);
      const report = diagnose(prepared.input, {
        log: choice.log, alpha: choice.alpha, window: prepared.window, preparation: prepared.prepText,
        deterministic: 'const', lagRule: 'aic', johansenCase: 'auto', unitRootTest: c.unitRootTest,
      });
      expect(report.warnings[0]).toMatch(/^Joined on dates/);
      expect(report.settings.unitRootTest).toBe(c.unitRootTest);
      const built = buildPairBlock(report, PAIR, region, { sheet: 'Prices', anchor: 'I1' });
      // The block joins the two calendars with one formula and every number reads its spill.
      const formulas = built.block.cells.flat().map((x) => x.formula ?? '').filter((f) => f !== '');
      expect(formulas).toContain('=MOOR.COMMONDATES(QuennelPrices[[Date A]:[GateGasoil]],QuennelPrices[[Date B]:[DockDiesel]])');
      expect(formulas.filter((f) => f.includes('QuennelPrices[') && !f.includes('COMMONDATES'))).toEqual([]);
      expect(formulas.find((f) => f.includes('MOOR.ORDER'))).toContain(`"${c.unitRootTest}"`);
      const outcome = await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart), true);
      expect(outcome.ok).toBe(true);
      expectSameNumbers(wb, built, paneNumbers(report));
      expect(String(wb.shownValue('Prices', `I${rowOf(built, 'Numbers from')}`))).toMatch(/joined on the dates every series shares by the MOOR.COMMONDATES formula/);
      expect(wb.shownValue('Prices', `J${rowOf(built, 'Rows in the data now')}`)).toBe(sharedDates().length);

      // A refresh re-reads the sheet and runs the analysis the block's note recorded: the same numbers.
      const again = await refreshBlock(wb, built.block.name);
      expect(again.ok).toBe(true);
      expectSameNumbers(wb, built, paneNumbers(report));
    }, 60_000);
  }
});
