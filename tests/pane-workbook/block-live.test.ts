/**
 * The block follows its data: rows appended to the table change the calculated numbers
 * (the structured references grow with the table), watchers hear of the new rows once per
 * change on a microtask, and a block over a plain range points at fixed absolute ranges until
 * the range is made a table.
 */
import { describe, expect, it } from 'vitest';
import { buildPairBlock } from '../../taskpane/block/pair-block';
import { planBlockWrite, writePlannedBlock } from '../../taskpane/block/plan-block-write';
import { refreshBlock } from '../../taskpane/block/refresh-block';
import { regionReport } from '../../taskpane/block/region-report';
import { olsHedgeRatio } from '../../addin/cointegration/hedge-ratio';
import { spreadSeries } from '../../addin/spread/spread-series';
import { zScore } from '../../addin/spread/z-score';
import { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import type { CellContent, RegionChange } from '../../taskpane/workbook/port';
import { DEMO_CSV, PAIR, demoBlock, rowOf } from './demo-block';

/** Ten business days of new rows after the demo's last day, with DockDiesel pulled away from its line. */
function newRows(): CellContent[][] {
  const rows: CellContent[][] = [];
  for (let k = 0; k < 10; k++) rows.push([`2024-12-${String(30 + (k % 2)).padStart(2, '0')}`, 1.5, 3.2 + 0.01 * k, 500, 600, 40, 7]);
  return rows;
}

async function written() {
  const demo = await demoBlock();
  const out = await writePlannedBlock(demo.wb, await planBlockWrite(demo.wb, demo.built.block, demo.built.chart));
  expect(out.ok).toBe(true);
  return demo;
}

describe('appending rows to the table', () => {
  it('changes the block\'s numbers and its row count, and the latest z-score moves past 2', async () => {
    const { wb, built } = await written();
    const eg = `J${rowOf(built, 'Tied? Engle-Granger, DockDiesel on GateGasoil')}`;
    const z = `J${rowOf(built, 'Is the spread stretched now?')}`;
    const zReading = `K${rowOf(built, 'Is the spread stretched now?')}`;
    const hedge = `J${rowOf(built, 'Hedge ratio: units')}`;
    const before = { eg: wb.shownValue('Prices', eg), z: wb.shownValue('Prices', z), hedge: wb.shownValue('Prices', hedge) };
    expect(wb.shownValue('Prices', zReading)).toMatch(/^no: within/);

    wb.appendRows('QuennelPrices', newRows());

    expect(wb.shownValue('Prices', 'J3')).toBe(790);
    expect(wb.shownValue('Prices', eg)).not.toBe(before.eg);
    expect(wb.shownValue('Prices', hedge)).not.toBe(before.hedge);
    expect(wb.shownValue('Prices', z) as number).toBeGreaterThan(2);
    expect(wb.shownValue('Prices', zReading)).toMatch(/^yes: beyond 2 standard deviations/);
    // The spill grew by the ten rows.
    expect(typeof wb.shownValue('Prices', 'O792')).toBe('number');
    expect(wb.shownValue('Prices', 'O793')).toBeNull();
  });

  it('matches a report run afresh on the longer table', async () => {
    const { wb, built } = await written();
    wb.appendRows('QuennelPrices', newRows());
    const fresh = regionReport(await wb.readTable('QuennelPrices'), [PAIR.a, PAIR.b]);
    const p = fresh.pairs[0];
    const v = (label: string) => wb.shownValue('Prices', `J${rowOf(built, label)}`) as number;
    expect(v('Tied? Engle-Granger, GateGasoil on DockDiesel')).toBeCloseTo(p.cointegration.engleGranger.aOnB.pValue!, 12);
    // The block keeps the relation it was written with, DockDiesel on GateGasoil: Engle-Granger's step-1 line of that direction.
    expect(v('Hedge ratio: units')).toBeCloseTo(p.cointegration.engleGranger.bOnA.beta, 12);
    const table = await wb.readTable('QuennelPrices');
    const col = (name: string) => Float64Array.from(table.rows.map((r) => r[table.headers.indexOf(name)] as number));
    const line = olsHedgeRatio(col('DockDiesel'), col('GateGasoil'));
    const z = zScore(spreadSeries(col('DockDiesel'), col('GateGasoil'), line.beta, line.intercept, { y: 'DockDiesel', x: 'GateGasoil' })).values;
    expect(v('Is the spread stretched now?')).toBeCloseTo(z[z.length - 1], 10);
  });

  it('tells a table watcher once, after the change, with the new row count', async () => {
    const { wb } = await written();
    const heard: RegionChange[] = [];
    const stop = await wb.watch('Prices', 'A1:G781', (c) => heard.push(c));
    wb.appendRows('QuennelPrices', newRows().slice(0, 3));
    wb.appendRows('QuennelPrices', newRows().slice(0, 2));
    expect(heard).toHaveLength(0);
    await Promise.resolve();
    expect(heard).toEqual([{ sheet: 'Prices', address: 'A1:G786', rowCount: 785 }]);
    stop();
    wb.appendRows('QuennelPrices', newRows().slice(0, 1));
    await Promise.resolve();
    expect(heard).toHaveLength(1);
  });

  it('refreshes the block in place: the fixed lead-lag numbers and the chart follow the longer table', async () => {
    const { wb, built, report } = await written();
    const lead = `J${rowOf(built, 'Does GateGasoil lead DockDiesel?')}`;
    expect(wb.shownValue('Prices', lead)).toBe(report.pairs[0].leadLag!.aLeadsB.test.pValue);
    wb.appendRows('QuennelPrices', newRows());
    const out = await refreshBlock(wb, 'Mooring_GateGasoil_DockDiesel');
    expect(out.error).toBeUndefined();
    expect(out.ok).toBe(true);
    const fresh = regionReport(await wb.readTable('QuennelPrices'), [PAIR.a, PAIR.b]);
    expect(wb.shownValue('Prices', lead)).toBe(fresh.pairs[0].leadLag!.aLeadsB.test.pValue);
    expect(wb.charts).toHaveLength(1);
    expect(wb.charts[0].categories).toBe('N3:N792');
    expect(wb.shownValue('Prices', 'I1')).toMatch(/^GateGasoil and DockDiesel: 790 rows/);
  });
});

describe('a block over a plain range', () => {
  async function plain() {
    const wb = new MemoryWorkbook(['Prices']);
    const lines = DEMO_CSV.trim().split(/\r?\n/).map((l) => l.split(','));
    wb.setValues('Prices', 'B2', lines.map((l, i) => l.map((f) => (i === 0 || f.includes('-') ? f : Number(f)))));
    wb.select('Prices', 'D10');
    const region = (await wb.regionAroundSelection())!;
    return { wb, region };
  }

  it('finds the current region around the selection and points at fixed absolute ranges', async () => {
    const { region } = await plain();
    expect(region.address).toBe('B2:H782');
    expect(region.tableName).toBeNull();
    expect(region.dateColumn).toBe(0);
    const report = regionReport(region, [PAIR.a, PAIR.b]);
    const { block } = buildPairBlock(report, PAIR, region);
    const eg = block.cells.find((r) => String(r[0]?.value).startsWith('Tied? Engle-Granger, DockDiesel'))!;
    expect(eg[1].formula).toBe('=MOOR.ENGLEGRANGER(Prices!$D$3:$D$782,Prices!$C$3:$C$782,"const","aic","headline",$K$6)');
    expect(block.cells[1][0].value).toMatch(/fixed range/);
  });

  it('uses structured references once the pane has made the range a table', async () => {
    const { wb, region } = await plain();
    const name = await wb.makeTable('Prices', region.address, 'Quennel prices');
    expect(name).toBe('Quennel_prices');
    wb.select('Prices', 'C5');
    const asTable = (await wb.regionAroundSelection())!;
    expect(asTable.tableName).toBe('Quennel_prices');
    const { block } = buildPairBlock(regionReport(asTable, [PAIR.a, PAIR.b]), PAIR, asTable);
    expect(block.cells[2][1].formula).toBe('=ROWS(Quennel_prices[DockDiesel])');
    expect(await wb.makeTable('Prices', 'K2:L5', 'Quennel prices')).toBe('Quennel_prices_2');
    await expect(wb.makeTable('Prices', 'C10:D12', 'Other')).rejects.toThrow(/overlaps table Quennel_prices/);
  });

  it('returns no region for an empty selection', async () => {
    const wb = new MemoryWorkbook(['Prices']);
    wb.select('Prices', 'C3');
    expect(await wb.regionAroundSelection()).toBeNull();
  });
});
