import { beforeAll, describe, expect, it } from 'vitest';
import { defaultPick, describeColumns } from '../../taskpane/ui/data/columns';
import { dateCellText, excelSerialToIso, isoToUnixSeconds } from '../../taskpane/ui/data/excel-date';
import { prepareData } from '../../taskpane/ui/data/prepare-data';
import { dataStepView } from '../../taskpane/ui/views/data-view';
import type { DataRegion } from '../../taskpane/workbook/port';
import { choiceOf, COLUMN, demoRegion } from './demo-reports';

let region: DataRegion;
beforeAll(async () => {
  ({ region } = await demoRegion());
});

describe('the columns of the detected region', () => {
  it('offers the six price columns and names the date column as the row labels', () => {
    const columns = describeColumns(region);
    expect(columns.map((c) => c.header)).toEqual(['Date', 'GateGasoil', 'DockDiesel', 'HeavyFuel', 'BunkerBlend', 'BargeFreight', 'TankPremium']);
    expect(columns[0]).toMatchObject({ usable: false, note: 'the date column: it labels the rows' });
    expect(columns.slice(1).every((c) => c.usable && c.filled === 780 && c.numbers === 780)).toBe(true);
    expect(defaultPick(columns)).toEqual([COLUMN.GateGasoil, COLUMN.DockDiesel]);
  });

  it('leaves out a column of mostly text, saying how many cells were numbers', () => {
    const rows = region.rows.map((r, i) => [...r, i < 10 ? 1 : 'n/a']);
    const columns = describeColumns({ ...region, headers: [...region.headers, 'Notes'], rows });
    expect(columns[7]).toMatchObject({ usable: false, note: 'mostly not numbers (10 of 780 cells)' });
  });
});

describe('preparing the chosen columns', () => {
  it('uses all 780 rows of the demo table, labelled by sheet row and date', () => {
    const p = prepareData(region, choiceOf([1, 2]));
    expect(p).toMatchObject({ regionRows: 780, cleanRows: 780, usedRows: 780, outsideWindow: 0, names: ['GateGasoil', 'DockDiesel'], window: undefined });
    expect(p.firstUsed).toBe('row 2 (2022-01-03)');
    expect(p.lastUsed).toBe('row 781 (2024-12-27)');
    expect(p.input.dates?.[0]).toBe('2022-01-03');
    expect(p.input.logged).toBe(true);
    expect(p.input.series[0].values[0]).toBeCloseTo(Math.log(1.4008), 12);
  });

  it('turns typed first and last dates into a window among the cleaned rows', () => {
    const p = prepareData(region, choiceOf([1, 2], { from: '2023-01-02', to: '2023-12-29' }));
    expect(p.window).toEqual({ start: 260, end: 520 });
    expect(p.usedRows).toBe(260);
    expect(p.outsideWindow).toBe(520);
    expect(p.firstUsed).toBe('row 262 (2023-01-02)');
  });

  it('refuses a window that holds no rows, and a first date that is not a date', () => {
    expect(() => prepareData(region, choiceOf([1, 2], { from: '2030-01-01' }))).toThrow(/No rows lie between 2030-01-01 and the end/);
    expect(() => prepareData(region, choiceOf([1, 2], { from: 'March' }))).toThrow(/The first date 'March' is not a date/);
  });

  it('lists a blank cell inside a series as dropped, with its row and why', () => {
    const rows = region.rows.map((r) => r.slice());
    rows[35][COLUMN.DockDiesel] = null;
    const p = prepareData({ ...region, rows }, choiceOf([1, 2]));
    expect(p.cleanRows).toBe(779);
    // The blank drops the row for both series: DockDiesel's own cell, and GateGasoil's to keep them aligned.
    expect(p.dropped).toEqual([
      { series: 'GateGasoil', row: 'row 37 (2022-02-21)', date: '2022-02-21', reason: 'DockDiesel has no value in this row' },
      { series: 'DockDiesel', row: 'row 37 (2022-02-21)', date: '2022-02-21', reason: 'blank' },
    ]);
    const view = dataStepView(region, describeColumns(region), [1, 2], p, null);
    expect(view.rowsSentence).toBe('779 of 780 rows used, row 2 (2022-01-03) to row 781 (2024-12-27). 1 row left out (a gap in a series, or blank at the ends). 2 cells dropped (listed below).');
    expect(view.dropped).toEqual(['GateGasoil, row 37 (2022-02-21): DockDiesel has no value in this row', 'DockDiesel, row 37 (2022-02-21): blank']);
  });

  it('refuses the blank cell, naming its row, when gaps are not to be skipped', () => {
    const rows = region.rows.map((r) => r.slice());
    rows[35][COLUMN.DockDiesel] = null;
    expect(() => prepareData({ ...region, rows }, choiceOf([1, 2], { skipGaps: false }))).toThrow(/row 37/);
  });

  it('refuses one series: the diagnosis compares prices in pairs', () => {
    expect(() => prepareData(region, choiceOf([1]))).toThrow('Choose at least two series: the diagnosis compares prices in pairs.');
  });

  it('refuses an empty region, and the step then cannot run', () => {
    const empty: DataRegion = { ...region, rows: [] };
    const columns = describeColumns(empty);
    expect(columns.every((c) => !c.usable)).toBe(true);
    let problem: string | null = null;
    try {
      prepareData(empty, choiceOf([1, 2]));
    } catch (e) {
      problem = (e as Error).message;
    }
    expect(problem).not.toBeNull();
    const view = dataStepView(empty, columns, [1, 2], null, problem);
    expect(view).toMatchObject({ ready: false, rowsSentence: null, problem });
  });

  it('describes where the data were found and that the dates label the rows', () => {
    const view = dataStepView(region, describeColumns(region), [1, 2], prepareData(region, choiceOf([1, 2])), null);
    expect(view.found).toBe("Found the table 'QuennelPrices' on Prices, A1:G781.");
    expect(view.dateColumn).toBe("Dates from the column 'Date'.");
    expect(view.ready).toBe(true);
    expect([view.firstKey, view.lastKey]).toEqual(['2022-01-03', '2024-12-27']);
    expect(view.columns.filter((c) => c.picked).map((c) => c.header)).toEqual(['GateGasoil', 'DockDiesel']);
  });
});

describe('date cells', () => {
  it('reads Excel serial numbers in the 1900 system as ISO dates', () => {
    // 45292 is 2024-01-01 and 61 is 1900-03-01 in Excel's 1900 date system.
    expect(excelSerialToIso(45292)).toBe('2024-01-01');
    expect(excelSerialToIso(61)).toBe('1900-03-01');
    expect(excelSerialToIso(45292.5)).toBe('2024-01-01 12:00');
    expect(dateCellText(' 2024-03-15 ')).toBe('2024-03-15');
    expect(dateCellText(null)).toBeNull();
    expect(isoToUnixSeconds('1970-01-02')).toBe(86400);
    expect(isoToUnixSeconds('soon')).toBeNull();
  });
});

describe('a second date column', () => {
  it('is never offered as a series, and says its prices are joined on their dates', async () => {
    const { describeColumns } = await import('../../taskpane/ui/data/columns');
    const region = {
      sheet: 'Prices', address: 'A1:D4', tableName: null, firstDataRow: 2, dateColumn: 0,
      headers: ['Date', 'Gasoil', 'Settle Date', 'Diesel'],
      rows: [['2024-01-02', 1.5, 45293, 2.1], ['2024-01-03', 1.6, 45294, 2.2], ['2024-01-04', 1.7, 45295, 2.3]],
    };
    const columns = describeColumns(region as never);
    expect(columns.map((c) => c.usable)).toEqual([false, true, false, true]);
    expect(columns[2].note).toMatch(/another date column: prices to its right are joined with the others on the dates they share/);
  });
});
