/**
 * A quoted header with a line break in it names its series on one line: the break becomes a
 * space, so a name can never split or forge a line of a report. Expected values: our own rule.
 */
import { describe, expect, it } from 'vitest';
import { readCsv } from '../../addin/csv/read-csv';

describe('a header with a line break', () => {
  it('is read as one name with a space where the break was', () => {
    const rows = Array.from({ length: 25 }, (_, i) => `2024-01-${String(i + 1).padStart(2, '0')},${100 + i},${50 + (i % 7)}`);
    const table = readCsv(`Date,"Gate\nGasoil","Dock\r\nDiesel"\n${rows.join('\n')}\n`);
    expect(table.header).toEqual(['Date', 'Gate Gasoil', 'Dock Diesel']);
  });
});
