/**
 * Writing over cells that hold data: the plan lists them and nothing is written until the
 * user confirms; a cell typed after the plan stops the write; a write that fails part-way
 * leaves the sheet as it was, or says exactly which cells it changed when it cannot put
 * them back; removing a block takes its cells, chart and name.
 */
import { describe, expect, it } from 'vitest';
import { planBlockWrite, writePlannedBlock } from '../../taskpane/block/plan-block-write';
import { removeBlock } from '../../taskpane/block/refresh-block';
import { buildPairBlock } from '../../taskpane/block/pair-block';
import { regionReport } from '../../taskpane/block/region-report';
import { cellsOf, parseRange } from '../../taskpane/workbook/a1-address';
import { demoBlock } from './demo-block';

/** Every stored cell of a sheet, as text, to compare whole sheets. */
function sheetState(wb: Awaited<ReturnType<typeof demoBlock>>['wb'], sheet = 'Prices'): string {
  return JSON.stringify([...wb.cells.sheet(sheet).entries()].sort((p, q) => p[0] - q[0]));
}

describe('writing over occupied cells', () => {
  it('lists the cells in the way, block and spill alike, and writes nothing without a yes', async () => {
    const { wb, built } = await demoBlock();
    wb.setValues('Prices', 'J12', [['my note']]);
    wb.setFormula('Prices', 'K20', '=1+1');
    wb.setValues('Prices', 'P700', [[42]]);
    const before = sheetState(wb);
    const plan = await planBlockWrite(wb, built.block, built.chart);
    expect(plan.safe).toBe(false);
    expect(plan.occupied).toEqual([
      { address: 'J12', value: 'my note' },
      { address: 'K20', value: 2, formula: '=1+1' },
      { address: 'P700', value: 42 },
    ]);
    expect(sheetState(wb)).toBe(before);
    const refused = await writePlannedBlock(wb, plan);
    expect(refused.ok).toBe(false);
    expect(refused.written).toEqual([]);
    expect(refused.error).toMatch(/^Nothing was written: 3 cells in the way \(J12, K20, P700\)/);
    expect(sheetState(wb)).toBe(before);
    expect(wb.charts).toHaveLength(0);
    expect(await wb.findBlock(built.block.name)).toBeNull();
  });

  it('writes once confirmed, clearing the reserved spill so the spill shows', async () => {
    const { wb, built } = await demoBlock();
    wb.setValues('Prices', 'P700', [[42]]);
    const plan = await planBlockWrite(wb, built.block, built.chart);
    const out = await writePlannedBlock(wb, plan, true);
    expect(out.ok).toBe(true);
    expect(wb.cellAt('Prices', 'P700').stored).toBeUndefined();
    expect(typeof wb.shownValue('Prices', 'P700')).toBe('number');
  });

  it('refuses a cell typed after the plan was confirmed', async () => {
    const { wb, built } = await demoBlock();
    wb.setValues('Prices', 'J12', [['my note']]);
    const plan = await planBlockWrite(wb, built.block, built.chart);
    wb.setValues('Prices', 'L30', [['typed later']]);
    const out = await writePlannedBlock(wb, plan, true);
    expect(out.ok).toBe(false);
    expect(out.unconfirmed).toEqual([{ address: 'L30', value: 'typed later' }]);
    expect(wb.shownValue('Prices', 'J12')).toBe('my note');
  });

  it('replaces its own earlier block without asking', async () => {
    const { wb, built } = await demoBlock();
    await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart));
    const again = await planBlockWrite(wb, built.block, built.chart);
    expect(again.replacesEarlierBlock).toBe(true);
    expect(again.safe).toBe(true);
  });
});

describe('replacing an earlier block', () => {
  it('clears the rows of a longer earlier block in the same write', async () => {
    const { wb, built } = await demoBlock();
    await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart));
    const shorter = { ...built.block, cells: built.block.cells.slice(0, 10), reserved: [] };
    const plan = await planBlockWrite(wb, shorter);
    expect(plan.safe).toBe(true);
    expect(plan.block.cells).toHaveLength(built.block.cells.length);
    expect((await writePlannedBlock(wb, plan)).ok).toBe(true);
    expect(wb.shownValues('Prices', `I11:L${built.block.cells.length}`).flat().every((v) => v === null)).toBe(true);
    expect(wb.shownValue('Prices', 'I7')).toBe(built.block.cells[6][0].value);
  });
});

describe('bad input', () => {
  it('names the sheet row of a text cell in the prices and what would work', async () => {
    const { wb } = await demoBlock();
    wb.setValues('Prices', 'B37', [['n/a']]);
    const region = await wb.readTable('QuennelPrices');
    expect(() => regionReport(region, ['GateGasoil', 'DockDiesel'])).toThrow(/Prices row 37/);
  });

  it('refuses a column the data do not have, a date column and a bad anchor with plain messages', async () => {
    const { wb, region, report } = await demoBlock();
    expect(() => regionReport(region, ['GateGasoil', 'Crude'])).toThrow(/no column headed 'Crude'.*pick one of Date, GateGasoil/);
    expect(() => regionReport(region, ['Date', 'GateGasoil'])).toThrow(/'Date' is the date column/);
    expect(() => buildPairBlock(report, { a: 'GateGasoil', b: 'HeavyFuel' }, region)).toThrow(/holds no pair of GateGasoil and HeavyFuel/);
    await expect(wb.writeBlock({ sheet: 'Prices', anchor: 'not a cell', cells: [[{ value: 1 }]], name: 'x' })).rejects.toThrow(/'not a cell' is not a cell address such as J2/);
    await expect(wb.writeBlock({ sheet: 'Nowhere', anchor: 'A1', cells: [[{ value: 1 }]], name: 'x' })).rejects.toThrow(/no sheet named 'Nowhere': pick one of Prices/);
  });
});

describe('a write that fails part-way', () => {
  it('puts back what was there and says how far it got', async () => {
    const { wb, built } = await demoBlock();
    wb.setValues('Prices', 'J12', [['my note']]);
    const before = sheetState(wb);
    const plan = await planBlockWrite(wb, built.block, built.chart);
    wb.failNextWrite({ afterCells: 57 });
    const out = await writePlannedBlock(wb, plan, true);
    expect(out.ok).toBe(false);
    expect(out.restored).toBe(true);
    expect(out.written).toHaveLength(57);
    expect(out.error).toMatch(/failed after 57 of \d+ cells.*put back/);
    expect(sheetState(wb)).toBe(before);
    expect(await wb.findBlock(built.block.name)).toBeNull();
    expect(wb.charts).toHaveLength(0);
  });

  it('lists exactly the cells it changed when putting them back fails too', async () => {
    const { wb, built } = await demoBlock();
    const plan = await planBlockWrite(wb, built.block, built.chart);
    wb.failNextWrite({ afterCells: 23, restoreFails: true });
    const out = await writePlannedBlock(wb, plan, true);
    expect(out.ok).toBe(false);
    expect(out.restored).toBe(false);
    const area = parseRange(`I1:R${built.block.cells.length}`);
    expect(out.written).toEqual(cellsOf(area).slice(0, 23));
    const changed = cellsOf(area).filter((a) => wb.cellAt('Prices', a).stored !== undefined);
    expect(out.written).toEqual(expect.arrayContaining(changed));
  });
});

describe('removing a block', () => {
  it('takes its cells, its spill, its chart and its name, and leaves the table alone', async () => {
    const { wb, built } = await demoBlock();
    const table = JSON.stringify(wb.shownValues('Prices', 'A1:G781'));
    await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart));
    expect(await removeBlock(wb, built.block.name)).toBe(true);
    expect(wb.shownValues('Prices', 'I1:R800').flat().every((v) => v === null)).toBe(true);
    expect(wb.charts).toHaveLength(0);
    expect(wb.nameList()).toEqual([]);
    expect(JSON.stringify(wb.shownValues('Prices', 'A1:G781'))).toBe(table);
    expect(await removeBlock(wb, built.block.name)).toBe(false);
  });
});
