import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { csvBlock, csvSeries, findColumn, seriesNames } from '../../addin/csv/csv-series';
import { readCsv } from '../../addin/csv/read-csv';
import { MooringInputError } from '../../addin/errors';

function refusal(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(MooringInputError);
    return (e as Error).message;
  }
  throw new Error('expected a MooringInputError, but the input was accepted');
}

/** A CSV of n rows: date, Crude, Brent, with LF line breaks. */
function pricesCsv(n: number, edit?: (row: string[], i: number) => void): string {
  const lines = ['Date,Crude,Brent'];
  for (let i = 0; i < n; i++) {
    const day = new Date(Date.UTC(2024, 0, 1 + i)).toISOString().slice(0, 10);
    const row = [day, (70 + Math.sin(i) + i * 0.1).toFixed(2), (75 + Math.cos(i) + i * 0.1).toFixed(2)];
    edit?.(row, i);
    lines.push(row.join(','));
  }
  return lines.join('\n') + '\n';
}

describe('readCsv: grammar', () => {
  it('reads quoted fields with commas, doubled quotes and line breaks (RFC 4180)', () => {
    const t = readCsv('name,note\r\n"Smith, J","said ""hi"""\r\n"two\r\nlines",x\r\n');
    expect(t.header).toEqual(['name', 'note']);
    expect(t.columns).toEqual([['Smith, J', 'two\r\nlines'], ['said "hi"', 'x']]);
    expect(t.lines).toEqual([2, 3]); // the record with the embedded break starts on line 3
  });

  it('reads LF, CRLF and lone CR line breaks alike', () => {
    for (const br of ['\n', '\r\n', '\r']) {
      const t = readCsv(['a,b', '1,2', '3,4'].join(br));
      expect(t.columns).toEqual([['1', '3'], ['2', '4']]);
      expect(t.lines).toEqual([2, 3]);
    }
  });

  it('strips a UTF-8 byte-order mark from the header', () => {
    const t = readCsv('\ufeffperiod,lrm\n1974Q1,11.6\n');
    expect(t.header).toEqual(['period', 'lrm']);
    expect(t.dateColumn).toBe('period');
  });

  it('ignores blank lines at the end', () => {
    const t = readCsv('a,b\n1,2\n\n\r\n   \n');
    expect(t.columns).toEqual([['1'], ['2']]);
  });

  it('names empty header cells by position', () => {
    expect(readCsv('a,,c\n1,2,3\n').header).toEqual(['a', 'column 2', 'c']);
  });
});

describe('readCsv: refusals name the line', () => {
  it('a ragged row', () => {
    expect(refusal(() => readCsv('a,b,c\n1,2,3\n4,5\n6,7,8,9\n'))).toBe(
      'Line 3 has 2 fields but the header has 3 (1 more line also differs): look for a missing or extra comma (text that contains commas must be in double quotes).');
  });

  it('a ragged row after a quoted line break counts lines, not records', () => {
    expect(refusal(() => readCsv('a,b\n"x\ny",1\n2\n'))).toMatch(/^Line 4 has 1 field but the header has 2/);
  });

  it('an interior empty line', () => {
    expect(refusal(() => readCsv('a,b\n1,2\n\n3,4\n'))).toBe(
      'Line 3 is empty but lies between data lines: delete it, or write the commas of a row left blank on purpose.');
  });

  it('a quote that never closes', () => {
    expect(refusal(() => readCsv('a,b\n1,"2\n3,4\n'))).toBe('Line 2 opens a quoted field that never closes: add the closing double quote.');
  });

  it('text after a closing quote', () => {
    expect(refusal(() => readCsv('a,b\n1,"2"x\n'))).toBe('Line 2 has text after the closing quote of field 2: put the whole field inside the quotes.');
  });

  it('an empty file, a header alone, a semicolon file forced to commas', () => {
    expect(refusal(() => readCsv(''))).toMatch(/^The file is empty/);
    expect(refusal(() => readCsv('\ufeff\n\n'))).toMatch(/^The file is empty/);
    expect(refusal(() => readCsv('a,b\n'))).toMatch(/^The file has a header but no data lines/);
    expect(refusal(() => readCsv('a;b\n1;2\n', { delimiter: ',' }))).toBe('Line 1 is separated by semicolons, not commas: give --delimiter semicolon, or leave --delimiter out to have it found.');
  });
});

describe('readCsv: the date column', () => {
  it('is found by its header word or by ISO dates, and only one is taken', () => {
    expect(readCsv('Date,x\n2024-01-02,1\n').dateColumn).toBe('Date');
    expect(readCsv('when,x,also\n2024-01-02,1,2024-01-03\n').dateColumn).toBe('when');
    expect(readCsv('when,x\n2024-01-02T16:00:00Z,1\n').dateColumn).toBe('when');
  });

  it('year and quarter numbers are not dates', () => {
    const t = readCsv('year,quarter,gdp\n1959,1,2710.3\n');
    expect(t.dateColumn).toBeNull();
    expect(t.dateIndex).toBe(-1);
  });
});

describe('csvSeries', () => {
  it('reads numbers exactly as written and labels rows by line and date', () => {
    const t = readCsv(pricesCsv(30));
    const s = csvSeries(t, 'Crude');
    expect(s.name).toBe('Crude');
    expect(s.values[0]).toBe(70); // "70.00"
    expect(s.values[1]).toBe(Number((70 + Math.sin(1) + 0.1).toFixed(2)));
    expect(s.rowLabel(s.rows[0])).toBe('line 2 (2024-01-01)');
  });

  it('matches names without regard to case when the match is unique', () => {
    expect(csvSeries(readCsv(pricesCsv(30)), 'crude').name).toBe('Crude');
  });

  it('an unknown name lists the available series (not the date column)', () => {
    const t = readCsv(pricesCsv(30));
    expect(seriesNames(t)).toEqual(['Crude', 'Brent']);
    expect(refusal(() => csvSeries(t, 'WTI'))).toBe("No column is named 'WTI'; the series are: Crude, Brent.");
    expect(refusal(() => csvSeries(t, 'date'))).toBe("'Date' is the date column, not a series; the series are: Crude, Brent.");
  });

  it('duplicate names are refused', () => {
    expect(refusal(() => findColumn(readCsv('x,x\n1,2\n'), 'x'))).toBe("2 columns are named 'x' (columns 1 and 2): rename them so each is unique.");
  });

  it('interior text names the CSV line and the date', () => {
    const t = readCsv(pricesCsv(40, (row, i) => { if (i === 35) row[1] = 'n/a'; }));
    expect(refusal(() => csvSeries(t, 'Crude'))).toBe("Crude line 37 (2024-02-05) is text 'n/a': clean it or give --skip-gaps.");
  });

  it('quoted numbers are numbers, blanks are gaps, error codes are errors', () => {
    const t = readCsv(pricesCsv(40, (row, i) => {
      if (i === 0) row[1] = '"70.00"';
      if (i === 3) row[1] = '';
      if (i === 4) row[1] = '#N/A';
    }));
    expect(refusal(() => csvSeries(t, 'Crude'))).toBe('Crude line 5 (2024-01-04) is blank: clean it or give --skip-gaps.');
    const s = csvSeries(t, 'Crude', { skipGaps: true });
    expect(s.values[0]).toBe(70);
    expect(s.dropped.map((d) => [d.row, d.reason])).toEqual([
      ['line 5 (2024-01-04)', 'blank'],
      ['line 6 (2024-01-05)', 'the error #N/A'],
    ]);
  });

  it('csvBlock aligns several series by line', () => {
    const t = readCsv(pricesCsv(40, (row, i) => { if (i === 10) row[2] = 'NA'; }));
    const [a, b] = csvBlock(t, ['Crude', 'Brent'], { skipGaps: true });
    expect(a.values.length).toBe(39);
    expect(b.values.length).toBe(39);
    expect(a.dropped[0].reason).toBe('Brent has no value in this row');
  });

  it('reads the shared example files, including the one with a byte-order mark', () => {
    const danish = readCsv(readFileSync(new URL('../reference/data/danish-money-demand.csv', import.meta.url), 'utf8'));
    expect(danish.header).toEqual(['period', 'lrm', 'lry', 'lpy', 'ibo', 'ide']);
    expect(danish.dateColumn).toBe('period');
    const lrm = csvSeries(danish, 'lrm');
    expect(lrm.values.length).toBe(55);
    expect(lrm.values[0]).toBe(11.63255023);
    const macro = readCsv(readFileSync(new URL('../reference/data/macrodata.csv', import.meta.url), 'utf8'));
    expect(macro.header[2]).toBe('realgdp');
    expect(csvSeries(macro, 'realgdp', { log: true }).values.length).toBe(203);
  });
});
