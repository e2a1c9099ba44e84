/**
 * The in-memory workbook's formulas and text: structured references with escaped column
 * names, spills and #SPILL!, errors carried with their messages, unknown functions refused;
 * and text from cells (headers such as "<b>x</b>" or "=SUM(A1)") staying text everywhere the
 * block uses it.
 */
import { describe, expect, it } from 'vitest';
import { columnSpecifier } from '../../taskpane/block/series-reference';
import { buildPairBlock } from '../../taskpane/block/pair-block';
import { planBlockWrite, writePlannedBlock } from '../../taskpane/block/plan-block-write';
import { regionReport } from '../../taskpane/block/region-report';
import { FormulaSyntaxError, parseFormula } from '../../taskpane/workbook/formula-parser';
import { loadCsvTable } from '../../taskpane/workbook/demo-workbook';
import { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';
import { DEMO_CSV } from './demo-block';

function tiny(): MemoryWorkbook {
  const wb = new MemoryWorkbook(['S']);
  wb.setValues('S', 'A1', [['Gate gasoil [1]', "Dock's #2", 'plain'], [1, 10, 'x'], [2, 20, null], [3, 30, 5]]);
  wb.addTable('S', 'A1:C4', 'T');
  return wb;
}

describe('formulas of the in-memory workbook', () => {
  it('reads escaped structured references as Excel writes them', () => {
    expect(columnSpecifier('GateGasoil')).toBe('GateGasoil');
    expect(columnSpecifier('Gate gasoil [1]')).toBe("[Gate gasoil '[1']]");
    expect(columnSpecifier("Dock's #2")).toBe("[Dock''s '#2]");
    const wb = tiny();
    wb.setFormula('S', 'E1', `=AVERAGE(T[${columnSpecifier('Gate gasoil [1]')}])`);
    wb.setFormula('S', 'E2', `=ROWS(T[${columnSpecifier("Dock's #2")}])+COUNT(T[[Gate gasoil '[1']]:[Dock''s '#2]])`);
    expect(wb.shownValue('S', 'E1')).toBe(2);
    expect(wb.shownValue('S', 'E2')).toBe(3 + 6);
  });

  it('spills arrays into empty cells and shows #SPILL! when one is filled', () => {
    const wb = tiny();
    wb.setFormula('S', 'G1', '=T[plain]');
    expect(wb.shownValues('S', 'G1:G3')).toEqual([['x'], [null], [5]]);
    wb.setFormula('S', 'H1', '=INDEX(G1#,3)*2');
    expect(wb.shownValue('S', 'H1')).toBe(10);
    wb.setValues('S', 'G2', [['in the way']]);
    expect(wb.shownValue('S', 'G1')).toBe('#SPILL!');
    // Excel's rule: a spill reference (G1#) to a formula that cannot spill is #REF!.
    expect(wb.shownValue('S', 'H1')).toBe('#REF!');
    expect(wb.cellAt('S', 'H1').error).toMatch(/cannot spill/);
  });

  it('carries a MOOR function\'s refusal as its error with the message', () => {
    const wb = tiny();
    wb.setFormula('S', 'E1', '=MOOR.HEDGE(T[plain],T[[Gate gasoil \'[1\']]])');
    expect(wb.shownValue('S', 'E1')).toBe('#VALUE!');
    expect(wb.cellAt('S', 'E1').error).toMatch(/text/i);
  });

  it('refuses what it cannot read, and names unknown functions #NAME?', () => {
    expect(() => parseFormula('=SUM(A1:A3')).toThrow(FormulaSyntaxError);
    expect(() => parseFormula('=T[[a]')).toThrow(/structured reference|never closes/);
    const wb = tiny();
    wb.setFormula('S', 'E1', '=VLOOKUP(1,A1:B3,2)');
    expect(wb.shownValue('S', 'E1')).toBe('#NAME?');
    wb.setFormula('S', 'E2', '=E2+1');
    expect(wb.shownValue('S', 'E2')).toBe('#REF!');
  });
});

describe('text from cells stays text', () => {
  it('keeps headers like <b>x</b> and =SUM(A1) as written, in the region, the labels and the references', async () => {
    const csv = DEMO_CSV.replace('GateGasoil', '<b>x</b>').replace('DockDiesel', '=SUM(A1)');
    const wb = loadCsvTable(csv);
    const region = await wb.readTable('QuennelPrices');
    expect(region.headers.slice(1, 3)).toEqual(['<b>x</b>', '=SUM(A1)']);
    expect(wb.cellAt('Prices', 'C1').stored).toEqual({ value: '=SUM(A1)' });
    const pair = { a: '<b>x</b>', b: '=SUM(A1)' };
    const built = buildPairBlock(regionReport(region, [pair.a, pair.b]), pair, region);
    expect(built.block.name).toBe('Mooring_b_x_b_SUM_A1');
    const out = await writePlannedBlock(wb, await planBlockWrite(wb, built.block, built.chart));
    expect(out.ok).toBe(true);
    expect(wb.shownValue('Prices', 'I1')).toMatch(/^<b>x<\/b> and =SUM\(A1\): 780 rows/);
    expect(wb.cellAt('Prices', 'I1').stored?.formula).toBeUndefined();
    const eg = built.block.cells.find((r) => String(r[0].value).startsWith('Tied? Engle-Granger, <b>x</b> on =SUM(A1)'))!;
    expect(eg[1].formula).toBe('=MOOR.ENGLEGRANGER(QuennelPrices[[<b>x</b>]],QuennelPrices[[=SUM(A1)]],"const","aic","headline",$J$5)');
    const row = built.block.cells.indexOf(eg) + 1;
    expect(typeof wb.shownValue('Prices', `J${row}`)).toBe('number');
    expect(wb.shownValue('Prices', `K${row}`)).toMatch(/^(yes|no): /);
  });
});

describe('MOOR.SCREEN in the in-memory workbook', () => {
  it('spills the cells the one-thread screen gives, even where the page has Web Workers (this evaluator does not wait)', async () => {
    const { screenCell } = await import('../../functions/analyses/screen-cells');
    const wb = loadCsvTable(DEMO_CSV);
    const sheet = [...wb.cells.sheets.keys()][0];
    const started: unknown[] = [];
    const had = (globalThis as { Worker?: unknown }).Worker;
    (globalThis as { Worker?: unknown }).Worker = class {
      constructor(url: unknown) {
        started.push(url);
      }
    };
    try {
      wb.setFormula(sheet, 'Z1', '=MOOR.SCREEN(B1:E781)');
      const block = wb.shownValues(sheet, 'B1:E781');
      const expected = screenCell(block, undefined, undefined);
      expect(expected[0].length).toBe(8);
      const shown = wb.shownValues(sheet, `Z1:AG${expected.length}`);
      expect(shown.map((r) => r.map((c) => c ?? ''))).toEqual(expected.map((r) => [...r, ...Array(8 - r.length).fill('')]));
      expect(started).toEqual([]);
    } finally {
      (globalThis as { Worker?: unknown }).Worker = had;
    }
  });
});
