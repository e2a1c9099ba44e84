/**
 * Every registered function that reads ranges, called with cell-shaped inputs: numbers, blanks
 * as '' and as null (Excel on the web passes null; "" is what a formula returning empty text
 * gives), whole-column references of 1,048,576 cells, text, logical values and error values.
 * Blanks at the ends are skipped; a blank, text, logical or error cell inside a series is
 * refused with a #VALUE! whose message names the cell and what it holds.
 */
import { describe, expect, it } from 'vitest';
import * as moor from '../../functions/functions';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { block, cellErrorOf, column, wholeColumn } from './cell-shapes';

const coint = loadFixture<Fixtures['coint']>('coint');
const Y = fixtureSeries(coint, 'pair_y');
const X = fixtureSeries(coint, 'pair_x');

type Range = unknown[][];
/** How each function is called: with a y-like range and an x-like range (blocks put both side by side). */
const CALLS: Record<string, (y: Range, x: Range) => unknown> = {
  ADF: (y) => moor.adf(y, null, null, 'all'),
  GLSROOT: (y) => moor.glsroot(y, null, null, 'all'),
  MSTATS: (y) => moor.mstats(y, null, null, 'all'),
  KPSS: (y) => moor.kpss(y, null, null, 'all'),
  PHILLIPSPERRON: (y) => moor.phillipsperron(y, null, null, 'all'),
  ORDER: (y) => moor.order(y),
  ENGLEGRANGER: (y, x) => moor.englegranger(y, x, null, null, 'all'),
  PHILLIPSOULIARIS: (y, x) => moor.phillipsouliaris(y, x, null, null, 'all'),
  JOHANSEN: (y, x) => moor.johansen(sideBySide(y, x), null, null, 'all'),
  RANK: (y, x) => moor.rank(sideBySide(y, x)),
  HEDGE: (y, x) => moor.hedge(y, x, 'dols'),
  SPREAD: (y, x) => moor.spread(y, x),
  HALFLIFE: (y, x) => moor.halflife(y, x),
  ZSCORE: (y, x) => moor.zscore(y, x, 30),
  ECM: (y, x) => moor.ecm(y, x, null, 'all'),
  GRANGER: (y, x) => moor.granger(x, y, 2, null, 'all'),
  VARLAGS: (y, x) => moor.varlags(sideBySide(y, x), 'bic', 4),
  SCREEN: (y, x) => moor.screen(sideBySide(y, x), null, 'list'),
  ROLLING: (y, x) => moor.rolling(y, x, 100, 20),
  MOVINGHEDGE: (y, x) => moor.movinghedge(y, x),
  LEVELBOUNDS: (y, x) => moor.levelbounds(y, x, null, 1, 1, 'all'),
  RELATIONIS: (y, x) => moor.relationis(sideBySide(y, x), [[1], [-2]], null, null, 'all'),
  ADJUSTS: (y, x) => moor.adjusts(sideBySide(y, x), 1, null, null, 'all'),
  AHEAD: (y, x) => moor.ahead(sideBySide(y, x), 5, 1),
};

/** ROLLING's first column is where each window ends in the range, so two blanks above the prices move it down by two rows. */
function shiftedByTwoRows(answer: unknown[][]): unknown[][] {
  return answer.map((r, i) => (i === 0 ? r : [(r[0] as number) + 2, ...r.slice(1)]));
}

function sideBySide(y: Range, x: Range): Range {
  return y.map((r, i) => [r[0], x[i]?.[0] ?? null]);
}

function withCell(values: readonly number[], index: number, cell: unknown): unknown[] {
  const out: unknown[] = values.slice();
  out[index] = cell;
  return out;
}

it('covers every registered function that reads a range', () => {
  // COMMONDATES reads dated ranges (a date column first) and has its own tests (tests/functions/common-dates.test.ts).
  const registered = Object.keys(moor).map((k) => k.toUpperCase()).filter((k) => !['VERSION', 'CRIT', 'COMMONDATES'].includes(k));
  expect(Object.keys(CALLS).sort()).toEqual(registered.sort());
});

for (const [name, call] of Object.entries(CALLS)) {
  describe(`MOOR.${name}`, () => {
    const used = call(column(Y), column(X));

    it('gives the same answer for the used range, blanks around it as null or as "", and whole columns', () => {
      expect(used).toBeDefined();
      expect(call(column([null, null, ...Y, null]), column([null, null, ...X, '']))).toEqual(
        name === 'SPREAD' || name === 'ZSCORE' || name === 'MOVINGHEDGE' ? [[''], [''], ...(used as unknown[][])] : name === 'ROLLING' ? shiftedByTwoRows(used as unknown[][]) : used,
      );
      expect(call(wholeColumn(Y), wholeColumn(X))).toEqual(used);
      expect(call(wholeColumn(Y, ''), wholeColumn(X, ''))).toEqual(used);
    });

    if (!['ORDER', 'RANK', 'VARLAGS'].includes(name)) {
      it('reads 0 as a zero, not a blank: a last value of 0 changes the answer, a blank last cell drops the row', () => {
        const zeroed = call(column(withCell(Y, Y.length - 1, 0)), column(X));
        expect(zeroed).not.toEqual(used);
        expect(zeroed).not.toEqual(call(column(Y.slice(0, -1)), column(X.slice(0, -1))));
      });
    }

    const inside = 36;
    const where = name === 'GRANGER' ? 'effect row 37 of its range' : ['JOHANSEN', 'RANK', 'VARLAGS', 'SCREEN', 'AHEAD', 'RELATIONIS', 'ADJUSTS'].includes(name) ? 'series 1 row 37 of its range' : /^(ADF|KPSS|PHILLIPSPERRON|ORDER|GLSROOT|MSTATS)$/.test(name) ? 'the series row 37 of its range' : 'y row 37 of its range';
    const cases: [string, unknown, RegExp][] = [
      ['text', 'n/a', /is text 'n\/a'/],
      ['a blank as ""', '', /is blank/],
      ['a blank as null', null, /is blank/],
      ['a logical value', true, /is the logical value TRUE/],
      ['an error value (runtime object)', { code: '#N/A', message: '' }, /is the error #N\/A/],
      ['an error value (text)', '#DIV/0!', /is the error #DIV\/0!/],
      ['a number stored as text', '12.5', /stored as text/],
    ];
    for (const [what, cell, message] of cases) {
      it(`refuses ${what} inside the series, naming the cell`, () => {
        const text = cellErrorOf(() => call(column(withCell(Y, inside, cell)), column(X)), '#VALUE!');
        expect(text).toContain(where);
        expect(text).toMatch(message);
      });
    }

    it('refuses a whole column whose blanks arrived as zeros', () => {
      expect(cellErrorOf(() => call(wholeColumn(Y, 0), wholeColumn(X, 0)), '#VALUE!')).toMatch(/exactly 0\. If they are empty, this version of Excel passes empty cells as 0/);
    });
  });
}

describe('blanks and zeros', () => {
  it('a 0 is an observation and a trailing blank is not: the observation counts differ by one', () => {
    const observations = (cells: unknown[]) => (moor.adf(column(cells), null, 0, 'all') as unknown[][]).find((r) => r[0] === 'Observations in the test')![1];
    const n = observations(Y) as number;
    expect(observations([...Y, 0])).toBe(n + 1);
    expect(observations([...Y, ''])).toBe(n);
    expect(observations([...Y, null])).toBe(n);
  });
});

describe('two-series functions line ranges up by row', () => {
  it('unequal lengths after trimming are refused, naming the longer series and by how much', () => {
    const message = cellErrorOf(() => moor.englegranger(column(Y), column(X.slice(0, 290))), '#VALUE!');
    expect(message).toMatch(/y has 300 values and x has 290: y is longer than x by 10/);
  });
  it('equal lengths starting on different rows are refused', () => {
    const message = cellErrorOf(() => moor.hedge(column(['', ...Y.slice(0, 299)]), column([...X.slice(0, 299), ''])), '#VALUE!');
    expect(message).toMatch(/y starts at row 2 of its range but x at row 1 of its range/);
  });
  it('a pair function refuses several x columns', () => {
    const message = cellErrorOf(() => moor.spread(column(Y), block([X, X.map((v) => v * 2)])), '#VALUE!');
    expect(message).toMatch(/x holds 2 series: a hedge ratio pairs y with one series/);
  });
});
