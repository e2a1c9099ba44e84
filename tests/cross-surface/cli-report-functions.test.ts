/**
 * One analysis, one set of numbers, across the command line's single commands, `report
 * --json` and the MOOR functions called directly on the same cells: for logs on and off, a
 * skipped gap and each lag rule, every quantity the surfaces share is the same number (1e-12
 * relative). With DF-GLS deciding the orders (`report --unit-root dfgls`, the pane's choice, the
 * test argument of MOOR.ORDER), the orders and every unit-root statistic are the same too.
 * Source of the expected values: the other surfaces (the check is agreement); the data are the
 * demo's, made by our own seeded generator (addin/demo).
 */
import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import type { DiagnosticOptions } from '../../addin/report/check-input';
import { diagnose } from '../../addin/report/pairwise-diagnostic';
import * as moor from '../../functions/functions';
import { prepareData } from '../../taskpane/ui/data/prepare-data';
import { DEFAULT_CHOICES } from '../../taskpane/ui/views/choices';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import { runWith } from '../cli/cli-harness';
import { DEMO_CSV } from '../pane-workbook/demo-block';

const A = 'GateGasoil';
const B = 'DockDiesel';
const FILE = 'prices.csv';

interface Combo {
  name: string;
  log: boolean;
  /** 1-based data rows of the CSV whose cell in column A is made blank. */
  gapsInA: number[];
  lagRule: 'aic' | 'bic';
}

const COMBOS: Combo[] = [
  { name: 'logs, AIC', log: true, gapsInA: [], lagRule: 'aic' },
  { name: 'prices, BIC', log: false, gapsInA: [], lagRule: 'bic' },
  { name: 'logs, two skipped gaps, BIC', log: true, gapsInA: [40, 333], lagRule: 'bic' },
];

function csvWithGaps(gaps: number[]): string {
  const lines = DEMO_CSV.trimEnd().split('\n');
  const col = lines[0].split(',').indexOf(A);
  for (const r of gaps) {
    const cells = lines[r].split(',');
    cells[col] = '';
    lines[r] = cells.join(',');
  }
  return `${lines.join('\n')}\n`;
}

/** A column of the CSV as Excel hands a range to a custom function: one cell per row, blanks null. */
function columnCells(csv: string, name: string): (number | null)[][] {
  const lines = csv.trimEnd().split('\n');
  const j = lines[0].split(',').indexOf(name);
  return lines.slice(1).map((line) => {
    const cell = line.split(',')[j];
    return [cell === '' ? null : Number(cell)];
  });
}

function json(csv: string, argv: string[]): Record<string, any> {
  const run = runWith(MOORING_COMMANDS, [...argv, FILE, '--json'], { [FILE]: csv });
  expect(run.stderr, argv.join(' ')).toBe('');
  expect(run.code).toBe(0);
  return JSON.parse(run.stdout);
}

function same(label: string, values: (number | null | undefined)[]): void {
  const [first, ...rest] = values;
  expect(typeof first, `${label}: ${JSON.stringify(values)}`).toBe('number');
  for (const v of rest) {
    expect(typeof v, `${label}: ${JSON.stringify(values)}`).toBe('number');
    expect(Math.abs((v as number) - (first as number)) / Math.max(Math.abs(first as number), 1e-300), `${label}: ${JSON.stringify(values)}`).toBeLessThan(1e-12);
  }
}

/** The headline number of a spilled MOOR answer (a 1 x 1 array or a plain number). */
function headline(v: unknown): number {
  const x = Array.isArray(v) ? v[0][0] : v;
  if (typeof x !== 'number') throw new Error(`expected a number, got ${JSON.stringify(v)}`);
  return x;
}

describe('the command line, the report and the formulas agree on one analysis', () => {
  for (const combo of COMBOS) {
    it(combo.name, () => {
      const csv = csvWithGaps(combo.gapsInA);
      const common = [...(combo.log ? ['--log'] : []), ...(combo.gapsInA.length > 0 ? ['--skip-gaps'] : [])];
      const prep = [combo.log ? 'log' : '', combo.gapsInA.length > 0 ? 'skip gaps' : ''].filter(Boolean).join(', ');
      const report = json(csv, ['report', '--series', `${A},${B}`, '--lag-rule', combo.lagRule, ...common]).report;
      expect(report.settings.preparation).toBe(prep);
      const pair = report.pairs[0];
      const y: string = pair.relation.dependent.replace(/^ln\((.*)\)$/, '$1');
      const x: string = pair.relation.regressor.replace(/^ln\((.*)\)$/, '$1');
      const cells: Record<string, (number | null)[][]> = { [A]: columnCells(csv, A), [B]: columnCells(csv, B) };
      const yc = cells[y];
      const xc = cells[x];

      // Orders of integration.
      for (const s of [A, B]) {
        const fromReport = report.series.find((r: { name: string }) => r.name.replace(/^ln\((.*)\)$/, '$1') === s).order;
        const order = json(csv, ['order', '--series', s, ...common]).order;
        const both = moor.order([...cells[A].map((r, i) => [r[0], cells[B][i][0]])], null, null, null, prep) as unknown as number[][];
        expect([order, both[0][s === A ? 0 : 1]], `order of ${s}`).toEqual([fromReport, fromReport]);
      }

      // Engle-Granger, both ways.
      const eg = pair.cointegration.engleGranger;
      for (const [dep, reg, summary] of [[A, B, eg.aOnB], [B, A, eg.bOnA]] as const) {
        same(`Engle-Granger ${dep} on ${reg}`, [
          summary.pValue,
          json(csv, ['eg', '--y', dep, '--x', reg, '--lags', combo.lagRule, ...common]).pValue,
          headline(moor.englegranger(cells[dep], cells[reg], 'const', combo.lagRule, null, prep)),
        ]);
      }

      // Phillips-Ouliaris on the report's normalisation.
      same('Phillips-Ouliaris', [
        pair.cointegration.phillipsOuliaris.pValue,
        json(csv, ['po', '--y', y, '--x', x, ...common]).pValue,
        headline(moor.phillipsouliaris(yc, xc, 'const', null, null, prep)),
      ]);

      // Johansen with the report's lags and case.
      const j = pair.cointegration.johansen;
      const jc = json(csv, ['johansen', '--series', `${A},${B}`, '--lags', String(j.lags), '--case', j.case, ...common]);
      same('Johansen trace p-value', [
        j.trace[0].pValue,
        jc.tracePValue[0],
        headline(moor.johansen(cells[A].map((r, i) => [r[0], cells[B][i][0]]), j.lags, j.case, null, prep)),
      ]);

      // The long-run line: slopes, dynamic OLS and its standard error, the units to hold.
      const hedge = json(csv, ['hedge', '--y', y, '--x', x, ...common]);
      same('OLS slope', [pair.relation.ols.beta, hedge.ols.beta, moor.hedge(yc, xc, 'ols', 'slope', prep)]);
      same('units to hold (OLS)', [pair.relation.ols.hedgeUnits, hedge.ols.hedgeUnits, moor.hedge(yc, xc, 'ols', 'units', prep)]);
      same('dynamic OLS slope', [pair.relation.dynamicOls.beta, hedge.dynamicOls.beta, moor.hedge(yc, xc, 'dols', 'slope', prep)]);
      same('dynamic OLS standard error', [pair.relation.dynamicOls.standardError, hedge.dynamicOls.standardError]);

      // Error correction and the half-life: one definition everywhere.
      const ecm = json(csv, ['ecm', '--y', y, '--x', x, ...common]);
      const spread = json(csv, ['spread', '--y', y, '--x', x, ...common]);
      same('speed of adjustment', [pair.adjustment.ecm.dependent.speed, ecm.equations.y.alpha, headline(moor.ecm(yc, xc, 'aic', null, prep))]);
      same('half-life', [pair.adjustment.spreadAr1.halfLife, ecm.halfLife, spread.halfLife, moor.halflife(yc, xc, null, prep)[0][0]]);
      same('latest z-score', [
        pair.spread.latestZ,
        spread.zscore[spread.zscore.length - 1],
        (moor.zscore(yc, xc, null, prep) as unknown as number[][]).at(-1)?.[0],
      ]);

      // Which one moves first: the test the report chose, asked for by name on the other surfaces.
      const ll = pair.leadLag;
      const cli = { 'f-levels': ['--method', 'f', '--data', 'levels'], 'f-differences': ['--method', 'f', '--data', 'changes'], 'toda-yamamoto': ['--method', 'ty'], 'error-correction': ['--method', 'ecm'] }[ll.method as string] as string[];
      const word = { 'f-levels': 'levels', 'f-differences': 'changes', 'toda-yamamoto': 'ty', 'error-correction': 'ecm' }[ll.method as string] as string;
      for (const d of [ll.aLeadsB, ll.bLeadsA]) {
        const cause = d.cause.replace(/^ln\((.*)\)$/, '$1');
        const effect = d.effect.replace(/^ln\((.*)\)$/, '$1');
        same(`${cause} leads ${effect} (${ll.method})`, [
          d.test.pValue,
          json(csv, ['granger', '--cause', cause, '--effect', effect, '--lags', String(d.test.lags), ...cli, ...common]).pValue,
          headline(moor.granger(cells[cause], cells[effect], d.test.lags, word, null, prep)),
        ]);
      }
    }, 60_000);
  }
});

describe('DF-GLS deciding the orders: report --unit-root dfgls, the pane and MOOR.ORDER agree', () => {
  it('the same orders and unit-root statistics, and the choice recorded in the settings', async () => {
    const cli = json(DEMO_CSV, ['report', '--series', `${A},${B}`, '--log', '--skip-gaps', '--unit-root', 'dfgls']).report;
    expect(cli.settings.unitRootTest).toBe('dfgls');
    expect(cli.series.map((s: { decidedBy: string }) => s.decidedBy)).toEqual(['dfgls', 'dfgls']);

    // The pane's run: its data step, then the engine with the options pane.ts passes (its stage choices spread in).
    const region = await loadCsvTable(DEMO_CSV).readTable('QuennelPrices');
    const prepared = prepareData(region, { columns: [A, B].map((n) => region.headers.indexOf(n)), log: true, skipGaps: true, from: null, to: null, alpha: 0.05 });
    const options: DiagnosticOptions = { log: true, alpha: 0.05, window: prepared.window, preparation: prepared.prepText, ...DEFAULT_CHOICES, unitRootTest: 'dfgls' };
    const pane = diagnose(prepared.input, options);
    expect(pane.settings.unitRootTest).toBe('dfgls');
    expect(cli.settings.preparation).toBe(pane.settings.preparation);

    const cells: Record<string, (number | null)[][]> = { [A]: columnCells(DEMO_CSV, A), [B]: columnCells(DEMO_CSV, B) };
    const both = moor.order(cells[A].map((r, i) => [r[0], cells[B][i][0]]), null, null, 'dfgls', pane.settings.preparation) as unknown as number[][];

    [A, B].forEach((name, j) => {
      const fromCli = cli.series[j];
      const fromPane = pane.series[j];
      expect([fromCli.name, fromPane.name]).toEqual([name, name]);
      const order = json(DEMO_CSV, ['order', '--series', name, '--log', '--unit-root', 'dfgls']);
      expect([fromPane.order, order.order, both[0][j]], `order of ${name}`).toEqual([fromCli.order, fromCli.order, fromCli.order]);
      expect(fromPane.agree).toBe(fromCli.agree);
      expect(order.agree).toBe(fromCli.agree);
      for (const step of fromCli.steps) {
        const paneStep = fromPane.steps.find((x) => x.differences === step.differences);
        for (const test of ['adf', 'kpss', 'gls'] as const) {
          if (step[test] === null) {
            expect(paneStep?.[test], `${name} ${test} after ${step.differences} differences`).toBeNull();
            continue;
          }
          same(`${name} ${test} statistic after ${step.differences} differences`, [step[test].statistic, paneStep?.[test]?.statistic]);
          same(`${name} ${test} p-value after ${step.differences} differences`, [step[test].pValue, paneStep?.[test]?.pValue]);
        }
        // \`order --unit-root dfgls\` ran the test that decided each step: DF-GLS on the levels, ADF on the changes.
        const ran = order.steps.find((x: { differences: number }) => x.differences === step.differences);
        if (ran === undefined) continue;
        const decider = step.differences === 0 ? step.gls : step.adf;
        expect(ran.adf.test).toBe(decider.test);
        same(`${name} deciding statistic after ${step.differences} differences (order)`, [decider.statistic, ran.adf.statistic]);
        same(`${name} KPSS after ${step.differences} differences (order)`, [step.kpss.statistic, ran.kpss.statistic]);
      }
      expect(fromCli.steps.find((x: { differences: number }) => x.differences === 0).gls.test).toBe('DF-GLS');
    });
  }, 60_000);

  it('--unit-root is refused with the words that would work, as order refuses it', () => {
    for (const command of ['report', 'order']) {
      const run = runWith(MOORING_COMMANDS, [command, FILE, '--series', command === 'report' ? `${A},${B}` : A, '--unit-root', 'pp'], { [FILE]: DEMO_CSV });
      expect(run.code).toBe(2);
      expect(run.stderr).toMatch(/--unit-root must be one of adf, dfgls, not 'pp'/);
    }
  });
});
