/**
 * The Office.js adapter against a mock Excel built on office-addin-mock (excel-mock.ts):
 * the calls it makes, its batching (one Excel.run per call, one sync per phase), its
 * requirement-set fallbacks, and the failure path of a block write.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { OfficeWorkbook } from '../../taskpane/workbook/office-adapter';
import type { BlockToWrite } from '../../taskpane/workbook/port';
import { demoBlock } from './demo-block';
import { MockExcel } from './excel-mock';

let excel: MockExcel;
let uninstall: () => void;
const port = new OfficeWorkbook();

/** The demo prices as constants in the mock, with a table over them. */
function withPrices(rows = 5): void {
  excel.store.put('Prices', 'A1', [
    ['Date', 'GateGasoil', 'DockDiesel'],
    ...Array.from({ length: rows }, (_, i) => [45000 + i, 1.4 + i / 100, 2.2 + i / 50]),
  ]);
  for (let i = 0; i < rows; i++) excel.store.edit('Prices', i + 1, 0, (c) => (c.numberFormat = 'yyyy-mm-dd'));
}

const small: BlockToWrite = {
  sheet: 'Prices',
  anchor: 'F1',
  name: 'Mooring_small',
  note: '{"k":"mooring-block-1"}',
  cells: [
    [{ value: '<b>x</b>', format: { bold: true, heading: 1 } }, { value: '=SUM(A1)' }],
    [{ formula: '=MOOR.HEDGE(B2:B6,C2:C6)', format: { numberFormat: '0.000' } }, { formula: '=IF(F2<0,"yes: a","no: b")', format: { textFills: [{ startsWith: 'yes', fill: '#00ff00' }] } }],
  ],
  columnWidths: [120, 90],
  reserved: ['F3:F4'],
};

beforeEach(() => {
  excel = new MockExcel(['Prices']);
  uninstall = excel.install();
});
afterEach(() => uninstall());

describe('reading data', () => {
  it('reads the table around the selection in one run of two syncs, dates as ISO text', async () => {
    withPrices();
    excel.store.tables.push({ name: 'Quennel', sheet: 'Prices', address: 'A1:C6' });
    excel.store.selection = { sheet: 'Prices', address: 'B3' };
    const region = await port.regionAroundSelection();
    expect(excel.syncsPerRun).toEqual([2]);
    expect(region).toMatchObject({ sheet: 'Prices', address: 'A1:C6', tableName: 'Quennel', headers: ['Date', 'GateGasoil', 'DockDiesel'], dateColumn: 0, firstDataRow: 2 });
    expect(region!.rows[0]).toEqual(['2023-03-15', 1.4, 2.2]);
  });

  it('uses the surrounding region when there is no table, and the selection itself below ExcelApi 1.7', async () => {
    withPrices();
    excel.store.selection = { sheet: 'Prices', address: 'B3' };
    expect((await port.regionAroundSelection())!.address).toBe('A1:C6');
    expect(excel.store.calls).toEqual([]);
    excel.apiVersion = 1.6;
    excel.store.selection = { sheet: 'Prices', address: 'A1:B3' };
    const own = await port.regionAroundSelection();
    expect(own!.address).toBe('A1:B3');
    expect(own!.tableName).toBeNull();
  });

  it('returns null for an empty selection', async () => {
    excel.store.selection = { sheet: 'Prices', address: 'K9' };
    expect(await port.regionAroundSelection()).toBeNull();
  });

  it('refuses plainly outside Excel', async () => {
    uninstall();
    await expect(port.regionAroundSelection()).rejects.toThrow(/Excel is not available here/);
    uninstall = excel.install();
  });
});

describe('making a table', () => {
  it('adds it with headers under a unique name', async () => {
    withPrices();
    excel.store.tables.push({ name: 'Quennel_prices', sheet: 'Prices', address: 'K1:K2' });
    const name = await port.makeTable('Prices', 'A1:C6', 'Quennel prices');
    expect(name).toBe('Quennel_prices_2');
    expect(excel.store.calls).toEqual(['tables.add(Prices!A1:C6,true)']);
    expect(excel.store.tables.at(-1)).toEqual({ name: 'Quennel_prices_2', sheet: 'Prices', address: 'A1:C6' });
    expect(excel.syncsPerRun).toEqual([2]);
  });
});

describe('writing a block', () => {
  it('reads once and writes once: text as text, formulas, formats, conditional fills, widths, the name', async () => {
    excel.store.put('Prices', 'F3', [['in the way']]);
    const out = await port.writeBlock(small);
    expect(out).toEqual({ ok: true, written: ['F1', 'G1', 'F2', 'G2'] });
    expect(excel.syncsPerRun).toEqual([2]);
    const cell = (a: string) => excel.store.sheet('Prices').get(a)!;
    expect(cell('F1')).toMatchObject({ formula: '<b>x</b>', numberFormat: '@', bold: true, size: 14 });
    expect(cell('G1')).toMatchObject({ formula: '=SUM(A1)', numberFormat: '@' });
    expect(cell('F2')).toMatchObject({ formula: '=MOOR.HEDGE(B2:B6,C2:C6)', numberFormat: '0.000' });
    expect(cell('G2').textFills).toEqual([{ startsWith: 'yes', fill: '#00ff00' }]);
    expect(cell('F3').formula).toBe('');
    expect(excel.store.columnWidths.get('F')).toBe(120);
    expect(excel.store.columnWidths.get('G')).toBe(90);
    expect(excel.store.names).toEqual([{ name: 'Mooring_small', sheet: 'Prices', address: 'F1:G2', comment: '{"k":"mooring-block-1"}' }]);
  });

  it('lists the occupied cells in one sync, with their formulas', async () => {
    excel.store.put('Prices', 'G2', [['old']]);
    excel.store.setFormula('Prices', 3, 5, '=A1');
    const occupied = await port.occupiedCells(small);
    expect(occupied).toEqual([{ address: 'G2', value: 'old' }, { address: 'F4', value: 0, formula: '=A1' }]);
    expect(excel.syncsPerRun).toEqual([1]);
  });

  it('replaces a name left by an earlier block', async () => {
    excel.store.names.push({ name: 'Mooring_small', sheet: 'Prices', address: 'A1', comment: '' });
    await port.writeBlock(small);
    expect(excel.store.calls.filter((c) => c.startsWith('names.'))).toEqual(['names.delete(Mooring_small)', 'names.add(Mooring_small,F1:G2)']);
    expect(excel.store.names).toHaveLength(1);
  });

  it('on a failed write, puts the previous contents back and lists the cells it had changed', async () => {
    excel.store.put('Prices', 'F1', [['keep me', 7]]);
    excel.store.edit('Prices', 0, 0, (c) => (c.bold = true));
    const before = excel.store.snapshot();
    excel.failures.set('1:2', 2);
    const out = await port.writeBlock(small);
    expect(out.ok).toBe(false);
    expect(out.restored).toBe(true);
    expect(out.written).toEqual(['F1', 'G1', 'F2', 'G2']);
    expect(out.error).toMatch(/^Writing the block to Prices!F1:G2 failed \(InvalidArgument.*4 cells were changed before the failure; the previous contents were put back\.$/);
    expect(excel.syncsPerRun).toEqual([5]);
    expect(excel.store.snapshot()).toBe(before);
    expect(excel.store.names).toEqual([]);
  });

  it('says exactly what was left changed when putting it back fails too', async () => {
    // Only the number formats reach the sheet before the failure: G2 keeps General, so it is not listed.
    excel.failures.set('1:2', 1);
    excel.failures.set('1:4', 0);
    const out = await port.writeBlock(small);
    expect(out.ok).toBe(false);
    expect(out.restored).toBe(false);
    expect(out.written).toEqual(['F1', 'G1', 'F2']);
    expect(excel.store.sheet('Prices').get('F2')!.numberFormat).toBe('0.000');
    expect(excel.store.sheet('Prices').get('F2')!.formula).toBe('');
    expect(out.error).toMatch(/putting the previous contents back failed too/);
  });
});

describe('the chart, names and watching', () => {
  it('adds a line chart over the spill columns in two syncs, replacing one of the same name', async () => {
    const { built } = await demoBlock();
    excel.store.charts.push({ sheet: 'Prices', name: built.chart.name, type: 'Line', source: 'A1', seriesBy: 'Columns', title: 'old', series: [], position: null });
    await port.addChart(built.chart);
    expect(excel.syncsPerRun).toEqual([2]);
    expect(excel.store.calls).toEqual([`charts.delete(${built.chart.name})`, 'charts.add(Line,O3:O782,Columns)']);
    expect(excel.store.charts).toEqual([{
      sheet: 'Prices', name: 'Mooring_GateGasoil_DockDiesel', type: 'Line', source: 'O3:O782', seriesBy: 'Columns',
      title: 'Spread of DockDiesel on GateGasoil, with bands at 2 standard deviations',
      series: [
        { name: 'Spread', values: 'O3:O782', x: 'N3:N782' },
        { name: 'Upper band (+2 sd)', values: 'P3:P782', x: 'N3:N782' },
        { name: 'Lower band (-2 sd)', values: 'Q3:Q782', x: 'N3:N782' },
      ],
      position: 'T2',
    }]);
  });

  it('finds and removes a block by its name, with its chart', async () => {
    await port.writeBlock(small);
    excel.store.charts.push({ sheet: 'Prices', name: 'Mooring_small', type: 'Line', source: 'F3', seriesBy: 'Columns', title: '', series: [], position: null });
    expect(await port.findBlock('Mooring_small')).toEqual({ sheet: 'Prices', address: 'F1:G2', note: '{"k":"mooring-block-1"}' });
    expect(await port.findBlock('Mooring_none')).toBeNull();
    await port.removeBlock('Mooring_small');
    expect(excel.store.names).toEqual([]);
    expect(excel.store.charts).toEqual([]);
    expect(excel.store.sheet('Prices').get('F2')!.formula).toBe('');
  });

  it('watches a table through onChanged, reports its new size, and stops', async () => {
    withPrices();
    excel.store.tables.push({ name: 'Quennel', sheet: 'Prices', address: 'A1:C6' });
    const heard: unknown[] = [];
    const stop = await port.watch('Prices', 'A1:C6', (c) => heard.push(c));
    expect(excel.store.calls).toEqual(['table.onChanged.add(Quennel)']);
    excel.store.tables[0].address = 'A1:C8';
    await excel.fire('table', 'Quennel', { address: 'A7:C8' });
    expect(heard).toEqual([{ sheet: 'Prices', address: 'A1:C8', rowCount: 7 }]);
    stop();
    await new Promise((r) => setTimeout(r, 0));
    await excel.fire('table', 'Quennel', { address: 'A9:C9' });
    expect(heard).toHaveLength(1);
  });

  it('watches a plain region through the sheet, ignoring changes elsewhere', async () => {
    withPrices();
    const heard: unknown[] = [];
    await port.watch('Prices', 'A1:C6', (c) => heard.push(c));
    expect(excel.store.calls).toEqual(['sheet.onChanged.add(Prices)']);
    await excel.fire('sheet', 'Prices', { address: 'K40' });
    expect(heard).toEqual([]);
    excel.store.put('Prices', 'A7', [[45010, 1.5, 2.4]]);
    await excel.fire('sheet', 'Prices', { address: 'A7:C7' });
    expect(heard).toEqual([{ sheet: 'Prices', address: 'A1:C7', rowCount: 6 }]);
  });
});
