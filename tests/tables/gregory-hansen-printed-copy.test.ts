import { describe, expect, it } from 'vitest';
import { gregoryHansenTest } from '../../addin/breaks/gregory-hansen';
import { criticalValueSourceText } from '../../addin/breaks/gregory-hansen-wording';
import { SeededRandom, randomWalk } from '../../addin/random';
import table from '../../addin/tables/gregory-hansen-critical.json';
import { GREGORY_HANSEN_MODELS, gregoryHansenComparedLevels, gregoryHansenCritical, type GregoryHansenModel } from '../../addin/tables/gregory-hansen-table';
import typedCopy from './fixtures/gregory-hansen-1996-table1.json';

/**
 * Our Gregory-Hansen critical values against an independent typed copy of the printed
 * table: Gregory, A. W. & Hansen, B. E. (1996), Journal of Econometrics 70(1), 99-126,
 * Table 1 (tests/tables/fixtures/gregory-hansen-1996-table1.json, copied with its provenance
 * from the project's shared reference tables). Every value the typed copy holds is checked
 * one by one; the values it does not hold must be the ones our table and wording call "from memory".
 */

type Row = Record<string, number>;
const printed = typedCopy.models as Record<GregoryHansenModel, Record<string, Row>>;
const ALL_LEVELS = ['1%', '2.5%', '5%', '10%'];

describe('value by value against Gregory & Hansen (1996), Table 1, as transcribed', () => {
  for (const model of GREGORY_HANSEN_MODELS) {
    for (const [m, row] of Object.entries(printed[model])) {
      for (const [level, value] of Object.entries(row)) {
        it(`${model}, m = ${m}, ${level}: ${value} (Gregory & Hansen 1996, Table 1, typed copy)`, () => {
          expect(gregoryHansenCritical(model, Number(m))?.[level as '1%']).toBe(value);
        });
      }
    }
  }

  it('the typed copy holds 30 values: 1/5/10% for m = 1..3 in all three models and m = 4 in the level model', () => {
    const count = GREGORY_HANSEN_MODELS.reduce((n, model) => n + Object.values(printed[model]).reduce((k, row) => k + Object.keys(row).length, 0), 0);
    expect(count).toBe(30);
    expect(typedCopy.source).toMatch(/Gregory, A\. W\. & Hansen, B\. E\. \(1996\).*Table 1/);
  });
});

describe('what the table calls compared is exactly what the typed copy holds', () => {
  it('comparedWithPrintedTable lists the same models, rows and levels as the typed copy', () => {
    const checked = table.comparedWithPrintedTable;
    expect(checked.levels).toEqual(typedCopy.levels);
    for (const model of GREGORY_HANSEN_MODELS) {
      expect((checked.regressors as Record<string, number[]>)[model]).toEqual(Object.keys(printed[model]).map(Number));
    }
  });

  it('every row: compared levels are the transcribed ones, the rest are from memory', () => {
    for (const model of GREGORY_HANSEN_MODELS) {
      for (let m = 1; m <= 4; m++) {
        const status = gregoryHansenComparedLevels(model, m);
        const transcribed = printed[model][String(m)];
        const expected = transcribed ? ALL_LEVELS.filter((l) => l in transcribed) : [];
        expect(status?.compared).toEqual(expected);
        expect(status?.fromMemory).toEqual(ALL_LEVELS.filter((l) => !expected.includes(l)));
      }
    }
    expect(gregoryHansenComparedLevels('level', 5)).toBeNull();
  });

  it('the 2.5% column and m = 4 in C/T and C/S are the values still from memory', () => {
    expect(gregoryHansenComparedLevels('level', 4)?.fromMemory).toEqual(['2.5%']);
    expect(gregoryHansenComparedLevels('level-trend', 4)?.fromMemory).toEqual(ALL_LEVELS);
    expect(gregoryHansenComparedLevels('regime', 4)?.fromMemory).toEqual(ALL_LEVELS);
    expect(table.transcribedFrom).toMatch(/2\.5% column, and m = 4 in the level-trend and regime models\) are still from memory/);
  });
});

describe('the wording each result carries', () => {
  it('a compared row cites Table 1, says which points were compared, and keeps "from memory" for 2.5% only', () => {
    const text = criticalValueSourceText('regime', 2) as string;
    expect(text).toContain('Gregory & Hansen (1996), Table 1 (model C/S with 2 regressors)');
    expect(text).toContain('The 1%, 5% and 10% points were compared with an independent typed copy of the printed table and agree to its two decimals');
    expect(text).toContain('the 2.5% point is quoted from memory');
    expect(text).not.toMatch(/not checked against/);
  });

  it('a row not yet compared (m = 4, C/T) says it is from memory', () => {
    const text = criticalValueSourceText('level-trend', 4) as string;
    expect(text).toContain('(model C/T with 4 regressors)');
    expect(text).toContain('This row is quoted from memory');
    expect(text).not.toContain('compared with an independent typed copy');
  });

  it('the engine attaches it: one regressor, level model (seed 61, T = 160) and four regressors, regime model (seed 62)', () => {
    const rng = new SeededRandom(61);
    const one = gregoryHansenTest(randomWalk(rng, 160), [randomWalk(rng, 160)], { model: 'level', lags: 1 });
    expect(one.warnings).toContain(criticalValueSourceText('level', 1));
    expect(one.warnings.join(' ')).not.toMatch(/not checked against the printed table/);

    const rng4 = new SeededRandom(62);
    const xs = Array.from({ length: 4 }, () => randomWalk(rng4, 160));
    const four = gregoryHansenTest(randomWalk(rng4, 160), xs, { model: 'regime', lags: 1 });
    expect(four.warnings).toContain(criticalValueSourceText('regime', 4));
    expect(four.warnings.join(' ')).toContain('This row is quoted from memory');
  });
});
