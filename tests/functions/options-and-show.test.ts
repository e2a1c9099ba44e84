/**
 * The shared option parser (one spelling per idea, case-insensitive, a wrong word refused with
 * the allowed ones) and the `show` argument: headline, stat, the labelled "all" table through
 * the one renderer, and the card as an entity value where the host supports
 * CustomFunctionsRuntime 1.4 ("Custom Functions requirement sets"), the table elsewhere.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import * as moor from '../../functions/functions';
import { countOrWord, decimalValue, levelValue, optionWord, wholeNumber } from '../../functions/options/option-values';
import { CAUTION, resultRows } from '../../functions/render/result-rows';
import { resultTable } from '../../functions/render/result-table';
import { adfTest } from '../../addin/unitroot/adf';
import { SeededRandom, randomWalk } from '../../addin/random';
import { fixtureSeries, loadFixture, type Fixtures } from '../reference/fixtures';
import { block, cellErrorOf, column, only, tableValue } from './cell-shapes';

const coint = loadFixture<Fixtures['coint']>('coint');
const Y = column(fixtureSeries(coint, 'pair_y'));
const X = column(fixtureSeries(coint, 'pair_x'));

afterEach(() => vi.unstubAllGlobals());

describe('the option parser', () => {
  it('matches words in any case and falls back when the argument is left out (null) or blank', () => {
    expect(optionWord('deterministic', 'TREND', ['none', 'const', 'trend'], 'const')).toBe('trend');
    expect(optionWord('deterministic', null, ['none', 'const', 'trend'], 'const')).toBe('const');
    expect(optionWord('deterministic', undefined, ['none', 'const', 'trend'], 'const')).toBe('const');
    expect(optionWord('deterministic', ' ', ['none', 'const', 'trend'], 'const')).toBe('const');
  });
  it('takes counts as numbers or digits, and rule words', () => {
    expect(countOrWord('lags', 4, ['aic'], 'aic', 'lags')).toBe(4);
    expect(countOrWord('lags', '4', ['aic'], 'aic', 'lags')).toBe(4);
    expect(countOrWord('lags', 'AIC', ['aic'], 0, 'lags')).toBe('aic');
    expect(wholeNumber('window', '60', undefined, 'rows', 3)).toBe(60);
    expect(levelValue('alpha', '2.5%', 0.05)).toBe(0.025);
    expect(levelValue('alpha', 0.1, 0.05)).toBe(0.1);
    expect(decimalValue('beta', '-1.25e0', 'a ratio')).toBe(-1.25);
  });
  it('refuses what is not allowed, saying what is', () => {
    expect(() => countOrWord('lags', 2.5, ['aic', 'bic'], 'aic', 'lagged changes')).toThrow("lags must be a whole number of lagged changes (0 or more) or one of aic, bic; got the number 2.5.");
    expect(() => countOrWord('lags', -1, ['aic'], 'aic', 'lags')).toThrow(/0 or more/);
    expect(() => optionWord('show', true, ['headline', 'stat'], 'headline')).toThrow('show must be one of headline, stat; got the logical value TRUE.');
    expect(() => optionWord('method', { code: '#N/A' }, ['ols'], 'ols')).toThrow('method must be one of ols; got the error #N/A.');
    expect(() => levelValue('alpha', 0.5, 0.05)).toThrow(/between 0 and 0.5/);
    expect(() => wholeNumber('window', 2, undefined, 'rows', 3)).toThrow(/3 or more; got the number 2/);
    expect(() => decimalValue('beta', 'two', 'a ratio')).toThrow(/must be a number/);
  });
});

describe('wrong option words through every function list the allowed ones', () => {
  const cases: [string, () => unknown, RegExp][] = [
    ['ADF deterministic', () => moor.adf(Y, 'quadratic'), /deterministic must be one of none, const, trend; got 'quadratic'/],
    ['ADF lags', () => moor.adf(Y, null, 'hq'), /lags must be a whole number of lagged changes \(0 or more\) or one of aic, bic, tstat; got 'hq'/],
    ['KPSS deterministic', () => moor.kpss(Y, 'none'), /deterministic must be one of const, trend; got 'none'/],
    ['PHILLIPSPERRON bandwidth', () => moor.phillipsperron(Y, null, 'nw'), /bandwidth must be a whole number of kernel lags \(0 or more\) or one of auto/],
    ['ORDER alpha', () => moor.order(Y, 5), /alpha must be a level between 0 and 0.5/],
    ['ENGLEGRANGER show', () => moor.englegranger(Y, X, null, null, 'everything'), /show must be one of headline, stat, all, card; got 'everything'/],
    ['JOHANSEN case', () => moor.johansen(block([Y.map((r) => r[0]), X.map((r) => r[0])]), 1, 'const'), /deterministic must be one of none, restricted-constant, constant, restricted-trend, trend; got 'const'/],
    ['HEDGE method', () => moor.hedge(Y, X, 'ols-reverse'), /method must be one of ols, reverse-ols, tls, dols; got 'ols-reverse'/],
    ['SPREAD beta', () => moor.spread(Y, X, 'one'), /beta must be a number/],
    ['ZSCORE window', () => moor.zscore(Y, X, 1), /window must be a whole number of rows in the trailing window, 3 or more/],
    ['ECM lags', () => moor.ecm(Y, X, 'bic'), /lags must be a whole number of lagged changes \(0 or more\) or one of aic; got 'bic'/],
    ['GRANGER method', () => moor.granger(X, Y, null, 'toda'), /method must be one of auto, f, levels, changes, ty, ecm; got 'toda'/],
    ['GRANGER lags', () => moor.granger(X, Y, 0), /lags must be a whole number of lags \(1 or more\) or one of aic, bic; got the number 0/],
    ['VARLAGS criterion', () => moor.varlags(block([Y.map((r) => r[0]), X.map((r) => r[0])]), 'sic'), /criterion must be one of aic, bic, hq, fpe; got 'sic'/],
  ];
  for (const [what, call, message] of cases) {
    it(what, () => expect(cellErrorOf(call, '#VALUE!')).toMatch(message));
  }
  it('an engine limit reaches the cell in the engine\'s words', () => {
    expect(cellErrorOf(() => moor.adf(Y, null, 500), '#VALUE!')).toMatch(/A number of lags of 500 is too large for 300 observations: the largest allowed is 148/);
  });
});

describe('show', () => {
  it('headline is the p-value, stat the statistic, both 1 x 1', () => {
    const table = moor.englegranger(Y, X, null, null, 'all');
    expect(only(moor.englegranger(Y, X))).toBe(tableValue(table, 'p-value'));
    expect(only(moor.englegranger(Y, X, null, null, 'STAT'))).toBe(tableValue(table, 'Statistic (tau)'));
  });

  it('"all" is a two-column table of labels and values, in plain words, ending with the caution', () => {
    const table = moor.adf(Y, 'const', 'aic', 'all') as unknown[][];
    expect(table.every((r) => r.length === 2 && typeof r[0] === 'string')).toBe(true);
    expect(table.map((r) => r[0]).slice(0, 5)).toEqual(['Test', 'Null hypothesis', 'Alternative', 'Statistic (tau)', 'p-value']);
    expect(table.at(-1)).toEqual(['Caution', CAUTION]);
    expect(CAUTION).toBe('Evidence, not advice: relations break.');
    expect(tableValue(table, 'At the 5% level')).toMatch(/reject/);
    expect(tableValue(table, 'Deterministic terms')).toBe('constant');
  });

  it('every test function\'s "all" table goes through the one renderer (the same rows as resultTable)', () => {
    const values = fixtureSeries(coint, 'pair_y');
    expect(moor.adf(column(values), 'trend', 2, 'all')).toEqual(resultTable(adfTest(values, { deterministic: 'trend', lags: 2 }, 'the series')));
    for (const table of [moor.kpss(Y, null, null, 'all'), moor.phillipsperron(Y, null, null, 'all'), moor.phillipsouliaris(Y, X, null, null, 'all'), moor.ecm(Y, X, null, 'all'), moor.granger(X, Y, 2, null, 'all')]) {
      expect((table as unknown[][]).at(-1)).toEqual(['Caution', CAUTION]);
      expect((table as unknown[][])[0][0]).toBe('Test');
    }
  });

  it('row keys are unique, so every field of the card can be read by name', () => {
    const rows = resultRows(adfTest(fixtureSeries(coint, 'pair_y'), {}, 'the series'), { verdict: 'v' });
    expect(new Set(rows.map((r) => r.key)).size).toBe(rows.length);
    const johansenTable = moor.johansen(block([Y.map((r) => r[0]), X.map((r) => r[0])]), 1, null, 'all') as unknown[][];
    expect(johansenTable.length).toBeGreaterThan(20);
  });

  it('an infinite statistic is written in words in the table and gives #N/A as a single number', () => {
    const x = fixtureSeries(coint, 'pair_x');
    const copy = column(x.map((v) => 3 * v + 1));
    expect(tableValue(moor.englegranger(copy, column(x), null, null, 'all'), 'Statistic (tau)')).toBe('minus infinity');
    expect(cellErrorOf(() => moor.englegranger(copy, column(x), null, null, 'stat'), '#N/A')).toMatch(/minus infinity.*exact combination/);
  });

  it('a p-value with no published table gives #N/A with the reason', () => {
    // Seven random walks (seed 7): y plus seven xs is N = 8, beyond MacKinnon's (1994) six.
    const rng = new SeededRandom(7);
    const xs = block(Array.from({ length: 7 }, () => Array.from(randomWalk(rng, 300))));
    expect(cellErrorOf(() => moor.englegranger(Y, xs), '#N/A')).toMatch(/no published p-value surface above 6 variables/);
  });
});

describe('show = card', () => {
  const office = (supported: boolean) => ({ context: { requirements: { isSetSupported: (name: string, version: string) => supported && name === 'CustomFunctionsRuntime' && version === '1.4' } } });

  it('returns an entity whose properties are the table\'s rows, read by key, where the host supports 1.4', () => {
    vi.stubGlobal('Office', office(true));
    const card = only(moor.adf(Y, null, null, 'card')) as Excel.EntityCellValue;
    const table = moor.adf(Y, null, null, 'all');
    expect(card.type).toBe('Entity');
    expect(card.text).toMatch(/^ADF: p-value \d/);
    expect(card.properties!.pValue).toEqual({ type: 'Double', basicValue: tableValue(table, 'p-value') });
    expect(card.properties!.statistic).toEqual({ type: 'Double', basicValue: tableValue(table, 'Statistic (tau)') });
    expect(card.properties!.caution).toEqual({ type: 'String', basicValue: CAUTION });
    expect(Object.keys(card.properties!).length).toBe((table as unknown[][]).length);
    const listed = card.layouts!.card!.sections!.flatMap((s) => s.properties);
    expect(new Set(listed)).toEqual(new Set(Object.keys(card.properties!).filter((k) => k !== 'title')));
    expect(card.layouts!.card!.title).toEqual({ property: 'title' });
  });

  it('falls back to the labelled table where the host lacks 1.4, or outside Office', () => {
    vi.stubGlobal('Office', office(false));
    expect(moor.adf(Y, null, null, 'card')).toEqual(moor.adf(Y, null, null, 'all'));
    vi.unstubAllGlobals();
    expect(moor.ecm(Y, X, null, 'card')).toEqual(moor.ecm(Y, X, null, 'all'));
  });
});
