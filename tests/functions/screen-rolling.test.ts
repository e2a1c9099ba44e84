/**
 * MOOR.SCREEN and MOOR.ROLLING called with cell ranges. The evidence is agreement with the
 * engine and with the single-pair functions: every screened p-value equals screenPairs' and
 * MOOR.ENGLEGRANGER's on the same two columns (1e-10 absolute), and each rolling window equals
 * MOOR.ENGLEGRANGER, MOOR.HEDGE and MOOR.HALFLIFE run on that window's rows (p-value 1e-10 absolute,
 * hedge ratio 1e-10 and half-life 1e-9 relative, the engine's own tolerances).
 *
 * Universe: seed 20240611, 250 rows, 5 series; series 1 and 2 share one random-walk trend
 * (each is a + b trend + a stationary AR(1) with coefficient 0.7), series 3 to 5 are
 * independent random walks (tests/screen/generated-universe.ts, which draws from SeededRandom).
 */
import { describe, expect, it } from 'vitest';
import { screenPairs } from '../../addin/screen/screen-pairs';
import { englegranger, halflife, hedge, rolling, screen } from '../../functions/functions';
import { SCREEN_LIST_HEADER } from '../../functions/render/screen-table';
import { generatedUniverse } from '../screen/generated-universe';
import { block, cellErrorOf, column, only, row } from './cell-shapes';

const T = 250;
const universe = generatedUniverse(20240611, { clusters: 1, perCluster: 2, walks: 3, T });
const columns = universe.series.map((s) => Array.from(s.values));
const range = block(columns);
const names = columns.map((_, j) => `series ${j + 1}`);
const engine = screenPairs(columns.map((values, j) => ({ name: names[j], values })), { alpha: 0.05 });
const egP = (yi: number, xi: number) => only(englegranger(column(columns[yi]), column(columns[xi]))) as number;
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Every cell is a finite number or text: a spill never holds NaN, an infinity or a missing value. */
function expectCellsOnly(table: unknown[][]) {
  for (const r of table) for (const c of r) expect(typeof c === 'string' || (typeof c === 'number' && Number.isFinite(c)), String(c)).toBe(true);
}

describe('MOOR.SCREEN, list (the default)', () => {
  const list = screen(range) as (number | string)[][];

  it('spills a header of plain labels, one row per directed pair (5 x 4 = 20), and the chance sentence last', () => {
    expect(list[0]).toEqual([...SCREEN_LIST_HEADER]);
    expect(list[0]).toEqual(['y', 'x', 'p-value', 'adjusted p-value', 'hedge ratio', 'half-life', 'latest z-score', 'passes after adjustment']);
    expect(list.length).toBe(1 + 20 + 1);
    for (const r of list) expect(r.length).toBe(8);
    const last = list[list.length - 1];
    expect(last[0]).toBe(engine.chanceSentence);
    expect(String(last[0])).toMatch(/would pass by chance alone/);
    expect(last.slice(1)).toEqual(new Array(7).fill(''));
    expectCellsOnly(list);
  });

  it('each row is the engine\'s ranked pair, and its p-value is MOOR.ENGLEGRANGER\'s on the same two columns (1e-10)', () => {
    const body = list.slice(1, -1);
    body.forEach((r, k) => {
      const p = engine.pairs[k];
      expect(r.slice(0, 2)).toEqual([p.y, p.x]);
      expect(Math.abs((r[2] as number) - p.pValue)).toBeLessThan(1e-10);
      expect(Math.abs((r[3] as number) - p.adjustedPValue)).toBeLessThan(1e-10);
      expect(r[4]).toBe(p.beta);
      expect(r[5]).toBe(p.halfLife ?? '');
      expect(r[6]).toBe(p.zscore ?? '');
      expect(r[7]).toBe(p.discovery ? 'yes' : 'no');
      const yi = names.indexOf(String(r[0]));
      const xi = names.indexOf(String(r[1]));
      expect(Math.abs((r[2] as number) - egP(yi, xi))).toBeLessThan(1e-10);
      expect(relative(r[4] as number, hedge(column(columns[yi]), column(columns[xi])))).toBeLessThan(1e-10);
    });
  });

  it('ranks the two cointegrated series first, both ways round, passing after adjustment; no independent pair passes', () => {
    const top = list.slice(1, 3).map((r) => [r[0], r[1]].sort().join(' & '));
    expect(top).toEqual(['series 1 & series 2', 'series 1 & series 2']);
    expect(list[1][7]).toBe('yes');
    expect(list[2][7]).toBe('yes');
    for (const r of list.slice(3, -1)) expect(r[7]).toBe('no');
  });

  it('alpha moves the adjusted verdicts and the sentence, not the p-values; 5% reads as 0.05', () => {
    expect(screen(range, '5%')).toEqual(list);
    const strict = screen(range, 0.001) as (number | string)[][];
    expect(strict.slice(1, -1).map((r) => r[2])).toEqual(list.slice(1, -1).map((r) => r[2]));
    expect(String(strict[strict.length - 1][0])).toMatch(/at 0\.1%/);
    const adjusted = list.slice(1, -1).map((r) => r[3] as number);
    expect(strict.slice(1, -1).map((r) => r[7])).toEqual(adjusted.map((a) => (a <= 0.001 ? 'yes' : 'no')));
  });
});

describe('MOOR.SCREEN, matrix and adjusted', () => {
  const raw = screen(range, null, 'matrix') as (number | string)[][];
  const adjusted = screen(range, null, 'ADJUSTED') as (number | string)[][];

  it('spill the 5 x 5 grid with the series names along the top and down the side, then the chance sentence', () => {
    for (const grid of [raw, adjusted]) {
      expect(grid.length).toBe(1 + 5 + 1);
      for (const r of grid) expect(r.length).toBe(6);
      expect(grid[0].slice(1)).toEqual(names);
      expect(grid.slice(1, 6).map((r) => r[0])).toEqual(names);
      expect(grid[6][0]).toBe(engine.chanceSentence);
      expectCellsOnly(grid);
    }
    expect(String(raw[0][0])).toMatch(/^p-value: y \(row\) on x \(column\)$/);
    expect(String(adjusted[0][0])).toMatch(/^adjusted p-value/);
  });

  it('the diagonal is blank; cell (y, x) is MOOR.ENGLEGRANGER of y on x (1e-10) and the engine\'s adjusted p-value, never below the raw one', () => {
    for (let i = 0; i < 5; i++) {
      for (let j = 0; j < 5; j++) {
        const p = raw[i + 1][j + 1];
        const a = adjusted[i + 1][j + 1];
        if (i === j) {
          expect(p).toBe('');
          expect(a).toBe('');
          continue;
        }
        expect(Math.abs((p as number) - egP(i, j))).toBeLessThan(1e-10);
        expect(Math.abs((p as number) - (engine.matrix[i][j] as number))).toBeLessThan(1e-10);
        expect(a).toBe(engine.adjustedMatrix[i][j]);
        expect(a as number).toBeGreaterThanOrEqual(p as number);
      }
    }
  });

  it('is not symmetric: y on x and x on y are two tests', () => {
    expect(raw[1][2]).not.toBe(raw[2][1]);
  });
});

describe('MOOR.SCREEN refuses what it cannot screen, with a #VALUE! that says why', () => {
  it('one column', () => {
    expect(cellErrorOf(() => screen(column(columns[0])), '#VALUE!')).toMatch(/at least two series; got 1/);
  });
  it('a text cell inside a series, naming the series and its row', () => {
    const withText = columns.map((c) => c.slice() as unknown[]);
    withText[2][36] = 'n/a';
    const message = cellErrorOf(() => screen(block(withText)), '#VALUE!');
    expect(message).toContain('series 3 row 37 of its range');
    expect(message).toMatch(/is text 'n\/a'/);
  });
  it('alpha outside (0, 0.5), or not a level', () => {
    for (const bad of [0, 0.5, 0.7, -0.05, 'five']) {
      expect(cellErrorOf(() => screen(range, bad), '#VALUE!')).toMatch(/alpha must be a level between 0 and 0\.5/);
    }
  });
  it('a show word it does not know, listing the ones it does', () => {
    expect(cellErrorOf(() => screen(range, null, 'grid'), '#VALUE!')).toMatch(/show must be one of list, matrix, adjusted; got 'grid'/);
  });
});

describe('MOOR.ROLLING', () => {
  const y = columns[0];
  const x = columns[1];
  const window = 100;
  const step = 10;
  const table = rolling(column(y), column(x), window, step) as (number | string)[][];
  const rowsOf = (values: number[], end: number) => column(values.slice(end - window, end));

  it('spills the documented header, then one row per window, oldest first, the last ending on the last row', () => {
    expect(table[0]).toEqual(['window ends at row', 'p-value (Engle-Granger)', 'hedge ratio', 'half-life']);
    // Ends at rows 250, 240, ..., 100 of the range: every `step` rows back to the first full window.
    const ends = table.slice(1).map((r) => r[0]);
    expect(ends).toEqual(Array.from({ length: 16 }, (_, k) => 100 + 10 * k));
    expectCellsOnly(table);
  });

  it('the last window equals MOOR.ENGLEGRANGER, MOOR.HEDGE and MOOR.HALFLIFE on the last `window` rows', () => {
    const last = table[table.length - 1];
    expect(Math.abs((last[1] as number) - (only(englegranger(rowsOf(y, T), rowsOf(x, T))) as number))).toBeLessThan(1e-10);
    expect(relative(last[2] as number, hedge(rowsOf(y, T), rowsOf(x, T)))).toBeLessThan(1e-10);
    expect(relative(last[3] as number, halflife(rowsOf(y, T), rowsOf(x, T))[0][0] as number)).toBeLessThan(1e-9);
  });

  it('every other window equals MOOR.ENGLEGRANGER on its own rows too (1e-10)', () => {
    for (const r of table.slice(1)) {
      const end = r[0] as number;
      expect(Math.abs((r[1] as number) - (only(englegranger(rowsOf(y, end), rowsOf(x, end))) as number)), `window ending at row ${end}`).toBeLessThan(1e-10);
    }
  });

  it('one statistic alone is that column of the full table under its own header', () => {
    const column2 = (k: number) => table.map((r) => [r[k]]);
    expect(rolling(column(y), column(x), window, step, 'pvalue')).toEqual([['p-value (Engle-Granger)'], ...column2(1).slice(1)]);
    expect(rolling(column(y), column(x), window, step, 'Beta')).toEqual([['hedge ratio'], ...column2(2).slice(1)]);
    expect(rolling(column(y), column(x), window, step, 'halflife')).toEqual([['half-life'], ...column2(3).slice(1)]);
  });

  it('step defaults to 1: a window ending on every row from the 100th, the shared windows agreeing with the thinned run (1e-10)', () => {
    const every = rolling(column(y), column(x), window) as (number | string)[][];
    expect(every.length).toBe(1 + T - window + 1);
    expect(every.slice(1).map((r) => r[0])).toEqual(Array.from({ length: T - window + 1 }, (_, k) => window + k));
    // The running moments are updated row by row in one run and in jumps of 10 in the other, so they agree to rounding.
    for (const r of table.slice(1)) {
      const same = every.find((e) => e[0] === r[0])!;
      expect(Math.abs((same[1] as number) - (r[1] as number))).toBeLessThan(1e-10);
      expect(relative(same[2] as number, r[2] as number)).toBeLessThan(1e-10);
      expect(relative(same[3] as number, r[3] as number)).toBeLessThan(1e-9);
    }
  });

  it('row input gives the same numbers, the window ends counted in columns', () => {
    const across = rolling(row(y), row(x), window, step) as (number | string)[][];
    expect(across[0][0]).toBe('window ends at column');
    expect(across.slice(1)).toEqual(table.slice(1));
  });

  it('a window end is a row of the range: blanks above the prices move it down', () => {
    const lower = rolling(column([null, null, ...y]), column(['', '', ...x]), window, step) as (number | string)[][];
    expect(lower.slice(1).map((r) => r[0])).toEqual(table.slice(1).map((r) => (r[0] as number) + 2));
    expect(lower.slice(1).map((r) => r.slice(1))).toEqual(table.slice(1).map((r) => r.slice(1)));
  });
});

describe('MOOR.ROLLING refuses what it cannot roll, with a #VALUE! that says why', () => {
  const y = column(columns[0]);
  const x = column(columns[1]);
  it('a window longer than the series', () => {
    expect(cellErrorOf(() => rolling(y, x, 400), '#VALUE!')).toMatch(/A window of 400 rows is longer than the series \(250 rows\): use at most 250/);
  });
  it('a window under 21 rows, one that is not a whole number, or none', () => {
    expect(cellErrorOf(() => rolling(y, x, 10), '#VALUE!')).toMatch(/window must be a whole number of at least 21 rows/);
    expect(cellErrorOf(() => rolling(y, x, 50.5), '#VALUE!')).toMatch(/window must be a whole number of rows in each window/);
    expect(cellErrorOf(() => rolling(y, x, null), '#VALUE!')).toMatch(/window is empty/);
  });
  it('a step of 0, or a show word it does not know', () => {
    expect(cellErrorOf(() => rolling(y, x, 100, 0), '#VALUE!')).toMatch(/step must be a whole number of rows between window ends, 1 or more; got the number 0/);
    expect(cellErrorOf(() => rolling(y, x, 100, 1, 'tau'), '#VALUE!')).toMatch(/show must be one of all, pvalue, beta, halflife; got 'tau'/);
  });
  it('a text cell inside y, or two columns for x', () => {
    const withText: unknown[] = columns[0].slice();
    withText[36] = 'n/a';
    expect(cellErrorOf(() => rolling(column(withText), x, 100), '#VALUE!')).toContain('y row 37 of its range');
    expect(cellErrorOf(() => rolling(y, block([columns[1], columns[2]]), 100), '#VALUE!')).toMatch(/x holds 2 series: a rolling relation pairs y with one series/);
  });
});
