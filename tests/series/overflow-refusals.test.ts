import { describe, expect, it } from 'vitest';
import { MOORING_COMMANDS } from '../../addin/cli/commands';
import { MooringInputError } from '../../addin/errors';
import { bartlettLongRunVariance, neweyWestBandwidth } from '../../addin/regression/long-run-variance';
import { persistentBandwidth } from '../../addin/regression/persistent-bandwidth';
import { cleanSeries } from '../../addin/series/clean-series';
import { MAGNITUDE_RANGE, magnitudeOutlier } from '../../addin/series/magnitude-range';
import { spreadSeries } from '../../addin/spread/spread-series';
import * as MOOR from '../../functions/functions';
import { expectOneLineRefusal, pricesCsv, runWith } from '../cli/cli-harness';
import { HUGE_VALUES, hostileCases, pricePair, type CellPair } from './hostile-cells';

/**
 * Overflow is refused where it starts, naming the row and the value (issue 13, item 6): a
 * number that dwarfs the rest of its series (magnitude-range.ts), a spread past the largest
 * double, and sums of squares that overflow in the long-run variance or the orthogonal line.
 * Never a NaN in a message, never "a fault in Mooring".
 */
const NOT_A_NUMBER = /NaN|Infinity|not a number|fault in Mooring/i;

function refusal(work: () => unknown): string {
  try {
    work();
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error('expected a refusal');
}

describe('the cleaner refuses a value that dwarfs the rest of its series', () => {
  const prices = pricePair(1, 80).y.map((r) => r[0]);

  it('names the row, the value and what would work, for 1e308 and for -1e308', () => {
    for (const v of [1e308, -1e308, Number.MAX_VALUE]) {
      const cells = prices.slice();
      cells[41] = v;
      const e = (() => { try { cleanSeries(cells, { name: 'Gasoil' }); } catch (err) { return err; } })();
      expect(e).toBeInstanceOf(MooringInputError);
      const message = (e as MooringInputError).message;
      expect(message).toMatch(/^Gasoil row 42 is -?1(\.797693135)?e\+308, about 10\^30[0-9] times the series' typical size/);
      expect(message).toContain('Correct that cell');
      expect(message).not.toMatch(NOT_A_NUMBER);
      expect((e as MooringInputError).where).toBe('row 42');
    }
  });

  it('counts the further rows as far out', () => {
    const cells = prices.slice();
    cells[10] = 1e200;
    cells[60] = -1e250;
    expect(refusal(() => cleanSeries(cells))).toMatch(/^Row 11 is 1e\+200.*\(1 more row is as far out\)/);
  });

  it('draws the line at MAGNITUDE_RANGE times the median magnitude, not at any absolute size', () => {
    const typical = magnitudeOutlier([...prices.slice(0, 79), 1e300])!.typical;
    const under = prices.slice();
    under[5] = 0.5 * MAGNITUDE_RANGE * typical;
    expect(magnitudeOutlier(under)).toBeNull();
    const over = prices.slice();
    over[5] = 2 * MAGNITUDE_RANGE * typical;
    expect(magnitudeOutlier(over)?.position).toBe(5);
    // the whole series in other units: nothing is out of range, whatever the scale
    for (const scale of [1e300, 1e-300, 1e-6]) expect(() => cleanSeries(prices.map((p) => p * scale))).not.toThrow();
  });

  it('keeps an outlier that is only absurd, not uncomputable (1e12 among prices near 80)', () => {
    const cells = prices.slice();
    cells[30] = 1e12;
    expect(cleanSeries(cells).values[30]).toBe(1e12);
  });

  it('takes the typical size from the non-zero values when most values are zero', () => {
    const cells = prices.map((p, i) => (i % 4 === 0 ? p : 0));
    cells[9] = 1e120;
    expect(refusal(() => cleanSeries(cells))).toMatch(/^Row 10 is 1e\+120/);
  });

  it('under logs, checks the logs (which cannot be that far apart) and so accepts a price of 1e308', () => {
    const cells = prices.slice();
    cells[20] = 1e308;
    expect(cleanSeries(cells, { log: true }).values[20]).toBeCloseTo(Math.log(1e308), 10);
  });
});

describe('a spread past the largest double is refused with the row, the terms and the scale that fits', () => {
  const { y, x } = pricePair(2, 60);
  const yv = y.map((r) => r[0]);
  const xv = x.map((r) => r[0]);

  it('spreadSeries with a hedge ratio of 1e308', () => {
    const message = refusal(() => spreadSeries(yv, xv, 1e308, 0, { y: 'Diesel', x: 'Gasoil' }));
    expect(message).toMatch(/^The spread Diesel - beta × Gasoil at position 1 is [0-9.]+ - 1e\+308 × [0-9.]+, beyond the largest number a double holds/);
    expect(message).toContain('the hedge ratio 1e+308 is far out of scale with the prices');
    expect(message).not.toMatch(NOT_A_NUMBER);
  });

  it('writes a negative hedge ratio or intercept as an addition, not as "- -"', () => {
    const message = refusal(() => spreadSeries(yv, xv, -1e308, -2, { y: 'Diesel', x: 'Gasoil' }));
    expect(message).toMatch(/at position 1 is [0-9.]+ \+ 2 \+ 1e\+308 × [0-9.]+, beyond/);
    expect(message).toContain('the hedge ratio -1e+308');
  });

  it('MOOR.SPREAD(y, x, 1E308) says which row, not "a fault in Mooring"', () => {
    const message = refusal(() => MOOR.spread(y, x, 1e308));
    expect(message).toMatch(/at row 1 of its range is/);
    expect(message).not.toMatch(NOT_A_NUMBER);
  });

  it('the spread command with --beta 1e308', () => {
    const line = expectOneLineRefusal(runWith(MOORING_COMMANDS, ['spread', 'p.csv', '--y', 'Walk', '--x', 'Drift', '--beta', '1e308'], { 'p.csv': pricesCsv(80, 4) }));
    expect(line).toContain('the hedge ratio 1e+308 is far out of scale');
    expect(line).not.toMatch(NOT_A_NUMBER);
  });
});

describe('sums of squares that overflow are named where they happen', () => {
  const huge = Float64Array.from(pricePair(3, 90).y, (r) => r[0] * 1e200);

  it('the long-run variance and both bandwidth rules give a finite answer or say the squares overflow, never NaN', () => {
    // Either is right: a rule that rescales first answers; one that squares 1e200 must refuse.
    const works: [string, () => number][] = [
      ['Bartlett long-run variance', () => bartlettLongRunVariance(huge, 3)],
      ['Newey-West bandwidth', () => neweyWestBandwidth(huge)],
      ['AR(1) plug-in bandwidth', () => persistentBandwidth(huge).bandwidth],
    ];
    for (const [name, work] of works) {
      let value: number | null = null;
      try {
        value = work();
      } catch (e) {
        expect(e, name).toBeInstanceOf(MooringInputError);
        expect((e as Error).message, name).toMatch(/^The long-run variance overflows: .*Divide the prices by a power of ten/);
      }
      if (value !== null) expect(Number.isFinite(value), `${name} gave ${value}`).toBe(true);
    }
  });
});

/** Every formula on a pair (a block of the two columns where the formula takes a block), with the columns it reads. */
function everyFormula(pair: CellPair): [string, () => unknown, 'y' | 'both'][] {
  const { y, x } = pair;
  const block = y.map((r, i) => [r[0], x[i][0]]);
  return [
    ['ADF', () => MOOR.adf(y), 'y'], ['KPSS', () => MOOR.kpss(y), 'y'], ['PHILLIPSPERRON', () => MOOR.phillipsperron(y), 'y'], ['ORDER', () => MOOR.order(y), 'y'],
    ['ENGLEGRANGER', () => MOOR.englegranger(y, x), 'both'], ['PHILLIPSOULIARIS', () => MOOR.phillipsouliaris(y, x), 'both'],
    ['JOHANSEN', () => MOOR.johansen(block), 'both'], ['RANK', () => MOOR.rank(block), 'both'],
    ['HEDGE ols', () => MOOR.hedge(y, x), 'both'], ['HEDGE dols', () => MOOR.hedge(y, x, 'dols'), 'both'], ['HEDGE tls', () => MOOR.hedge(y, x, 'tls'), 'both'],
    ['SPREAD', () => MOOR.spread(y, x), 'both'], ['HALFLIFE', () => MOOR.halflife(y, x), 'both'], ['ZSCORE', () => MOOR.zscore(y, x, 30), 'both'],
    ['ECM', () => MOOR.ecm(y, x), 'both'], ['GRANGER', () => MOOR.granger(y, x), 'both'], ['VARLAGS', () => MOOR.varlags(block), 'both'],
    ['SCREEN', () => MOOR.screen(block), 'both'], ['ROLLING', () => MOOR.rolling(y, x, 40), 'both'],
  ];
}

/** Every number in a result (nested arrays of cells), for the finiteness check. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  return [];
}

describe('hostile numbers through every formula (seeded generator, tests/series/hostile-cells.ts)', () => {
  // Seed 13, 24 cases of 120 rows: one huge (1e154 to the largest double) or tiny (1e-160 to
  // 5e-324, -0) value of seeded sign planted at a seeded row of y or x.
  const cases = hostileCases(13, 24);

  it('covers huge and tiny values in both columns', () => {
    expect(cases.some((c) => HUGE_VALUES.includes(Math.abs(c.planted.value)))).toBe(true);
    expect(cases.some((c) => Math.abs(c.planted.value) < 1)).toBe(true);
    expect(new Set(cases.map((c) => c.planted.column)).size).toBe(2);
  });

  it.each(cases.map((c, k) => [k, c] as const))('case %i: a finite answer or a refusal naming the row, never NaN or a fault', (_, { pair, planted }) => {
    for (const [name, work, reads] of everyFormula(pair)) {
      const huge = Math.abs(planted.value) >= 1e154 && (reads === 'both' || planted.column === 'y');
      let message: string | null = null;
      let result: unknown;
      try {
        result = work();
      } catch (e) {
        message = (e as Error).message;
      }
      if (message === null) {
        expect(huge, `${name} accepted ${planted.value}`).toBe(false);
        for (const v of numbersIn(result)) expect(Number.isFinite(v), `${name} gave ${v}`).toBe(true);
      } else {
        expect(message, name).not.toMatch(NOT_A_NUMBER);
        if (huge) expect(message, name).toMatch(new RegExp(`row ${planted.index + 1} of its range is -?1(\\.\\d+)?e\\+3?[0-9]{2,3}, about 10\\^`));
      }
    }
  });
});

describe('the command line with one cell of 1e308', () => {
  const csv = pricesCsv(140, 6, (row, i) => {
    if (i === 70) row[1] = '1e308';
  });
  const run = (...argv: string[]) => runWith(MOORING_COMMANDS, argv, { 'p.csv': csv });

  it.each([
    ['kpss', '--series', 'Walk'], ['adf', '--series', 'Walk'], ['hedge', '--y', 'Walk', '--x', 'Drift'],
    ['rolling', '--y', 'Walk', '--x', 'Drift', '--window', '60'], ['report', '--series', 'Walk,Drift'], ['screen'],
  ])('%s refuses on one line naming line 72 and the value', (command, ...rest) => {
    const line = expectOneLineRefusal(run(command, 'p.csv', ...rest));
    expect(line).toMatch(/Walk line 72 \(2020-03-11\) is 1e\+308, about 10\^30[0-9] times the series' typical size/);
    expect(line).not.toMatch(NOT_A_NUMBER);
  });
});
