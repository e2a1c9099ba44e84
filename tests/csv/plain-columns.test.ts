/**
 * The CSV reader's direct route for plain files (no quotes, every line full; read-csv.ts
 * plainColumns) against the full record parser: the same table for the same text, and the
 * full parser's refusals and messages for every file the direct route leaves to it. The full
 * parser's answer is obtained by adding a quoted header field, which sends a file to it (a
 * quoted header reads as the same name). Files: our own seeded text (invented for this check).
 */
import { describe, expect, it } from 'vitest';
import { readCsv } from '../../addin/csv/read-csv';
import { SeededRandom } from '../../addin/random';

/** The same file with its first header name quoted, which the direct route never reads. */
function quotedHeader(text: string): string {
  const bom = text.charCodeAt(0) === 0xfeff ? '\ufeff' : '';
  const body = bom ? text.slice(1) : text;
  const sep = body.search(/[,;\t\r\n]/);
  const first = sep < 0 ? body : body.slice(0, sep);
  return `${bom}"${first.trim()}"${sep < 0 ? '' : body.slice(sep)}`;
}

function answer(text: string, choice = {}): unknown {
  try {
    return readCsv(text, choice);
  } catch (e) {
    return { refused: (e as Error).message };
  }
}

describe('plain CSV files read straight into columns', () => {
  it('give the table the full parser gives, for plain, dated, European and odd files', () => {
    const rng = new SeededRandom(1313);
    const rows = (n: number, sep: string, dec: string) =>
      Array.from({ length: n }, (_, i) => `${(100 + rng.normal()).toFixed(4).replace('.', dec)}${sep}${(50 + i).toString()}${sep} ${(rng.normal() * 1e-3).toExponential(3)}`);
    const files: [string, object][] = [
      [`A,B,C\n${rows(50, ',', '.').join('\n')}\n`, {}],
      [`A,B,C\r\n${rows(50, ',', '.').join('\r\n')}`, {}],
      [`\ufeffA,B,C\r${rows(20, ',', '.').join('\r')}\r`, {}],
      [`A;B;C\n${rows(30, ';', ',').join('\n')}\n`, {}],
      [`A\tB\tC\n${rows(30, '\t', '.').join('\n')}\n`, {}],
      [`date,P,Q\n2024-01-02,1.5,2\n2024-01-03,1.6,2.1\n2024-01-04,,2.2\n`, {}],
      [`date,P,Q\n2024-01-04,1.5,2\n2024-01-03,1.6,2.1\n2024-01-02,1.7,2.2\n`, {}],
      [`,P,\n1,2,3\n4,5,6\n`, {}],
      [`A,B\n1,2\n3,4\n\n`, {}],
      [`A,B\n1,2\n\n3,4\n`, {}],
      [`A,B\n1,2\n3\n5,6,7\n`, {}],
      [`A,B\n1,2\n3,4,5\n`, {}],
      [`A,B\n1,2,5\n`, {}],
      [`A,B\n`, {}],
      [`A,B`, {}],
      [`A,B\n1,5\n2,5\n`, { decimal: ',' }],
      [`A,B\n1,2\n3,NaN\n`, {}],
      [`A,B\n1,2\n3,n/a\n`, {}],
      [`A,B\u2028C,D\n1,2,3\n`, {}],
    ];
    for (const [text, choice] of files) {
      const direct = answer(text, choice);
      const full = answer(quotedHeader(text), choice);
      expect(direct, JSON.stringify(text.slice(0, 40))).toEqual(full);
    }
  });
});
