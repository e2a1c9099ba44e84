import { beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosticReport } from '../../addin/report/report-types';
import { progressSentence } from '../../taskpane/ui/progress-panel';
import { refreshNotice } from '../../taskpane/ui/views/refresh-notice';
import { initialWriteState, occupiedLine, writeStepView } from '../../taskpane/ui/views/write-view';
import { parsePlace, placementFor, planPairWrite, rewriteBlock, tableOfRegion, writePlan } from '../../taskpane/ui/write-actions';
import { handleRunRequest } from '../../taskpane/worker/diagnose-worker';
import { inlineRunner } from '../../taskpane/worker/diagnosis-runner';
import type { WorkerReply } from '../../taskpane/worker/messages';
import { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import { prepareData } from '../../taskpane/ui/data/prepare-data';
import { choiceOf, COLUMN, demoRegion, demoReport } from './demo-reports';

let report: DiagnosticReport;
beforeAll(async () => {
  report = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
});

describe('the diagnosis worker', () => {
  it('says it started with the size of the job, then sends the report', async () => {
    const { region } = await demoRegion();
    const prepared = prepareData(region, choiceOf([1, 2, 3]));
    const replies: WorkerReply[] = [];
    handleRunRequest({ type: 'run', id: 7, input: prepared.input, options: { log: true } }, (r) => replies.push(r));
    expect(replies[0]).toEqual({ type: 'started', id: 7, series: 3, pairs: 3, rows: 780 });
    expect(replies[1].type).toBe('done');
    const done = replies[1] as Extract<WorkerReply, { type: 'done' }>;
    expect(done.report.pairs).toHaveLength(3);
    // The report crosses the worker boundary by structured cloning: it must survive it unchanged.
    expect(structuredClone(done.report)).toEqual(done.report);
  });

  it('sends the engine refusal as an input error', () => {
    const replies: WorkerReply[] = [];
    handleRunRequest({ type: 'run', id: 1, input: { series: [{ name: 'A', values: [1, 2, 3] }] }, options: {} }, (r) => replies.push(r));
    expect(replies[1]).toMatchObject({ type: 'failed', id: 1, inputError: true, message: expect.stringMatching(/at least two/) });
  });
});

describe('the inline runner (no workers)', () => {
  it('runs the diagnosis after one turn, and a cancel before it starts stops it', async () => {
    const { region } = await demoRegion();
    const prepared = prepareData(region, choiceOf([1, 2]));
    const runner = inlineRunner();
    expect(runner.offThread).toBe(false);
    const cancelled = runner.run(prepared.input, { log: true });
    cancelled.cancel();
    expect(await cancelled.outcome).toEqual({ kind: 'cancelled' });
    const done = await runner.run(prepared.input, { log: true }).outcome;
    expect(done.kind).toBe('done');
  });
});

describe('sentences of the pane', () => {
  it('says how many rows arrived and what happened to the block', () => {
    expect(refreshNotice(780, 792, null)).toBe('12 new rows since the last run: results updated.');
    expect(refreshNotice(780, 781, { refreshed: 1, total: 1 })).toBe('1 new row since the last run: results updated. The block in the sheet was refreshed too.');
    expect(refreshNotice(780, 790, { refreshed: 0, total: 1 })).toMatch(/could not be refreshed: write it again/);
    expect(refreshNotice(780, 790, { refreshed: 2, total: 2 })).toBe('10 new rows since the last run: results updated. Both blocks in the sheet were refreshed too.');
    expect(refreshNotice(780, 790, { refreshed: 2, total: 3 })).toBe('10 new rows since the last run: results updated. 2 of 3 blocks in the sheet were refreshed; the other one could not be: write it again from the last step.');
  });

  it('says what the worker is doing, with the seconds so far', () => {
    expect(progressSentence({ series: 6, pairs: 15, rows: 780 }, 3)).toBe('Testing 6 series (15 pairs) over 780 rows… 3 s so far.');
    expect(progressSentence(null, 0)).toBe('Starting the diagnosis… 0 s so far.');
  });
});

describe('placing the block', () => {
  it('reads a cell, or a sheet and a cell, and refuses anything else with an example', () => {
    expect(parsePlace('j2', 'Prices')).toEqual({ sheet: 'Prices', anchor: 'J2' });
    expect(parsePlace('Results!$B$3', 'Prices')).toEqual({ sheet: 'Results', anchor: 'B3' });
    expect(parsePlace("'My sheet'!C4", 'Prices')).toEqual({ sheet: 'My sheet', anchor: 'C4' });
    expect(() => parsePlace('here', 'Prices')).toThrow("'here' is not a cell: type a cell such as J2, or a sheet and cell such as Results!B3.");
  });
});

describe('writing the block through the port', () => {
  it('lists the cells a write would replace, and writes them only after a yes', async () => {
    const { workbook, region } = await demoRegion();
    workbook.setValues('Prices', 'J3', [['keep me']]);
    const placement = await placementFor(workbook, region, 'cell', 'J2');
    const plan = await planPairWrite(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, placement);
    expect(plan.safe).toBe(false);
    expect(plan.occupied).toEqual([{ address: 'J3', value: 'keep me' }]);
    const asking = writeStepView(region, { a: 'GateGasoil', b: 'DockDiesel' }, { ...initialWriteState(), plan });
    expect(asking.confirm?.question).toBe('Writing here would replace 1 filled cell on Prices. Replace it?');
    expect(asking.confirm?.cells).toEqual(["J3 holds 'keep me'"]);
    expect(workbook.shownValue('Prices', 'J3')).toBe('keep me');

    const refused = await writePlan(workbook, plan, false);
    expect(refused.ok).toBe(false);
    expect(workbook.shownValue('Prices', 'J3')).toBe('keep me');
    const outcome = await writePlan(workbook, plan, true);
    expect(outcome.ok).toBe(true);
    expect(workbook.shownValue('Prices', 'J3')).not.toBe('keep me');
    const done = writeStepView(region, { a: 'GateGasoil', b: 'DockDiesel' }, { ...initialWriteState(), plan, outcome });
    expect(done.confirm).toBeNull();
    expect(done.result?.ok).toBe(true);
    const rows = plan.block.cells.length;
    const cols = plan.block.cells[0].length;
    // The block starts at J2, so it ends at column J + cols - 1 and row 2 + rows - 1.
    const corner = `${String.fromCharCode('J'.charCodeAt(0) + cols - 1)}${2 + rows - 1}`;
    expect(done.result?.lines[0]).toBe(`Wrote ${outcome.written.length} cells to Prices!J2:${corner} (${rows} rows by ${cols} columns), named ${plan.block.name}.`);
  });

  it('says exactly which cells a failed write changed, and that the old contents were put back', async () => {
    const { workbook, region } = await demoRegion();
    const plan = await planPairWrite(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, { sheet: 'Prices', anchor: 'J2' });
    workbook.failNextWrite({ afterCells: 3 });
    const outcome = await writePlan(workbook, plan, false);
    const view = writeStepView(region, { a: 'GateGasoil', b: 'DockDiesel' }, { ...initialWriteState(), plan, outcome });
    expect(view.result?.ok).toBe(false);
    expect(view.result?.lines[0]).toMatch(/failed after 3 of \d+ cells: .*The previous contents were put back\.$/);
    expect(view.result?.lines[1]).toBe(`Cells changed before the failure: ${outcome.written.join(', ')}.`);
    expect(outcome.written).toHaveLength(3);
    expect(workbook.shownValue('Prices', 'J2')).toBeNull();
  });

  it('puts the block on a new sheet of its own when asked', async () => {
    const { workbook, region } = await demoRegion();
    const placement = await placementFor(workbook, region, 'new-sheet', '');
    expect(placement.anchor).toBe('A1');
    expect(placement.sheet).toMatch(/^Mooring/);
    expect(workbook.cells.sheets.has(placement.sheet)).toBe(true);
    const plan = await planPairWrite(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, placement);
    expect(plan.safe).toBe(true);
    expect((await writePlan(workbook, plan, false)).ok).toBe(true);
    expect(workbook.shownValue(placement.sheet, 'A1')).toBe('GateGasoil and DockDiesel: 780 rows, 2022-01-03 to 2024-12-27');
  });

  it('turns a plain range into a table, and offers to only while it is not one', async () => {
    const plain = new MemoryWorkbook(['Data']);
    const { region } = await demoRegion();
    plain.setValues('Data', 'A1', [region.headers, ...region.rows]);
    plain.select('Data', 'C5');
    const found = await plain.regionAroundSelection();
    expect(found?.tableName).toBeNull();
    expect(writeStepView(found!, { a: 'GateGasoil', b: 'DockDiesel' }, initialWriteState()).tableOffer).toBe('Turn Data!A1:G781 into a table, so rows you paste below it are included when the pane refreshes.');
    const made = await tableOfRegion(plain, found!);
    expect(made.region.tableName).not.toBeNull();
    expect(writeStepView(made.region, { a: 'GateGasoil', b: 'DockDiesel' }, initialWriteState()).tableOffer).toBeNull();
  });

  it('writes the block again over its own cells without asking, but not over new data', async () => {
    const { workbook, region } = await demoRegion();
    const placement = { sheet: 'Prices', anchor: 'J2' };
    const plan = await planPairWrite(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, placement);
    expect((await writePlan(workbook, plan, false)).ok).toBe(true);
    expect(await rewriteBlock(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, placement, plan.block.name)).toBe(true);
    // Over the data themselves the rewrite refuses and leaves every cell as it was.
    const before = workbook.shownValue('Prices', 'B5');
    expect(await rewriteBlock(workbook, report, { a: 'GateGasoil', b: 'DockDiesel' }, region, { sheet: 'Prices', anchor: 'A1' }, plan.block.name)).toBe(false);
    expect(workbook.shownValue('Prices', 'B5')).toBe(before);
    expect(occupiedLine({ address: 'K9', value: 2, formula: '=1+1' })).toBe('K9 holds the formula =1+1');
  });
});
