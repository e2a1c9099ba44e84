import { describe, expect, it } from 'vitest';
import { MemoryWorkbook } from '../../taskpane/workbook/memory-workbook';

// The in-memory workbook's whole-workbook change hook (the preview's sheet redraws on it).
// Invariants: one call per burst of changes, none without a change, none after stopping.

const tick = () => new Promise<void>((done) => queueMicrotask(done));

describe('MemoryWorkbook.onAnyChange', () => {
  it('calls back once after a burst of changes, not for a selection, and not after it is stopped', async () => {
    const wb = new MemoryWorkbook(['Prices']);
    let calls = 0;
    const stop = wb.onAnyChange(() => { calls += 1; });
    wb.setValues('Prices', 'A1', [['Date', 'X'], ['2024-01-02', 1]]);
    wb.setFormula('Prices', 'C1', '=1+1');
    wb.addTable('Prices', 'A1:B2', 'T');
    await tick();
    await tick();
    expect(calls).toBe(1);
    wb.select('Prices', 'B2');
    await tick();
    await tick();
    expect(calls).toBe(1);
    wb.appendRows('T', [['2024-01-03', 2]]);
    await tick();
    await tick();
    expect(calls).toBe(2);
    await wb.writeBlock({ sheet: 'Prices', anchor: 'E1', cells: [[{ value: 'title' }]], name: 'B1' });
    await tick();
    expect(calls).toBe(3);
    await wb.addChart({ sheet: 'Prices', title: 't', categories: 'A2:A3', series: [{ name: 'X', values: 'B2:B3' }], anchor: 'G1', name: 'B1' });
    await tick();
    expect(calls).toBe(4);
    await wb.addSheet('More');
    await tick();
    expect(calls).toBe(5);
    stop();
    wb.setValues('Prices', 'A5', [['late']]);
    await tick();
    await tick();
    expect(calls).toBe(5);
    expect(wb.selected()).toEqual({ sheet: 'Prices', address: 'B2' });
  });
});
