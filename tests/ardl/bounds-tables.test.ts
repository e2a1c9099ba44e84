/**
 * The bounds test's tables: the typed copy of Pesaran, Shin & Smith (2001) Tables CI and CII
 * checked against printed values (named beside each), its shape, and Mooring's seeded simulation
 * (addin/tables/ardl-bounds-simulated.json): reproducible from its seed, close to the paper's
 * asymptotic bounds at its largest size, and above them in short samples.
 */
import { describe, expect, it } from 'vitest';
import { BOUNDS_CASES } from '../../addin/ardl/bounds-case';
import { simulateBoundsDraws } from '../../addin/ardl/bounds-simulation';
import { BOUNDS_LEVELS, boundsPValue, criticalBounds, paperBounds, simulatedBounds } from '../../addin/ardl/bounds-tables';
import { BOUNDS_PROBABILITIES, BOUNDS_SIZES } from '../../addin/ardl/bounds-table-layout';
import simulated from '../../addin/tables/ardl-bounds-simulated.json';

describe('Pesaran, Shin & Smith (2001) printed bounds', () => {
  // [statistic, case, k, level, lower, upper], each read off the printed table named
  const printed: [('F' | 't'), 1 | 2 | 3 | 4 | 5, number, (typeof BOUNDS_LEVELS)[number], number, number][] = [
    ['F', 3, 1, '5%', 4.94, 5.73], // Table CI(iii), k = 1
    ['F', 3, 1, '10%', 4.04, 4.78], // Table CI(iii), k = 1
    ['F', 3, 2, '5%', 3.79, 4.85], // Table CI(iii), k = 2
    ['F', 3, 4, '1%', 3.74, 5.06], // Table CI(iii), k = 4
    ['F', 1, 1, '5%', 3.15, 4.11], // Table CI(i), k = 1
    ['F', 2, 1, '1%', 4.94, 5.58], // Table CI(ii), k = 1
    ['F', 4, 4, '5%', 3.05, 3.97], // Table CI(iv), k = 4
    ['F', 5, 4, '1%', 4.4, 5.72], // Table CI(v), k = 4
    ['F', 5, 1, '5%', 6.56, 7.3], // Table CI(v), k = 1
    ['t', 3, 1, '5%', -2.86, -3.22], // Table CII(iii), k = 1
    ['t', 3, 2, '1%', -3.43, -4.1], // Table CII(iii), k = 2
    ['t', 3, 3, '1%', -3.43, -4.37], // Table CII(iii), k = 3
    ['t', 1, 1, '5%', -1.95, -2.6], // Table CII(i), k = 1
    ['t', 5, 1, '5%', -3.41, -3.69], // Table CII(v), k = 1
  ];
  for (const [stat, c, k, level, lower, upper] of printed) {
    it(`${stat}, case ${c}, k = ${k}, ${level}: ${lower} / ${upper}`, () => {
      expect(paperBounds(stat, c, k)!.critical[level]).toEqual({ lower, upper });
    });
  }

  it('shape: for every case and k, lower <= upper (F) or lower >= upper (t), and the bounds widen toward 1%', () => {
    for (const c of BOUNDS_CASES) {
      for (let k = 0; k <= 10; k++) {
        const f = paperBounds('F', c, k)!.critical;
        BOUNDS_LEVELS.forEach((l, i) => {
          expect(f[l].lower).toBeLessThanOrEqual(f[l].upper);
          if (i > 0) expect(f[l].upper).toBeGreaterThan(f[BOUNDS_LEVELS[i - 1]].upper);
        });
        if (k === 0) BOUNDS_LEVELS.forEach((l) => expect(f[l].lower).toBe(f[l].upper));
        const t = paperBounds('t', c, k);
        if (c === 2 || c === 4) expect(t).toBeNull();
        else BOUNDS_LEVELS.forEach((l) => expect(t!.critical[l].lower).toBeGreaterThanOrEqual(t!.critical[l].upper));
      }
    }
  });
});

describe("Mooring's simulated bounds", () => {
  it('are reproduced from their seed (k = 1, 20 rows, I(0) and I(1), every case)', () => {
    const reps = simulated.provenance.replications;
    const lower = simulateBoundsDraws(20, 1, false, reps, 20_010_000 + 100 * 1 + 0);
    const upper = simulateBoundsDraws(20, 1, true, reps, 20_010_000 + 100 * 1 + 1);
    const q = (draws: Float64Array, p: number) => {
      const s = Float64Array.from(draws).sort();
      const h = (s.length - 1) * p;
      const lo = Math.floor(h);
      return Number((s[lo] + (h - lo) * (s[Math.min(lo + 1, s.length - 1)] - s[lo])).toFixed(4));
    };
    const cells = simulated.cases as unknown as Record<string, Record<string, Record<string, { F: { i0: number[]; i1: number[] } }>>>;
    for (const c of BOUNDS_CASES) {
      const cell = cells[c]['1']['20'];
      expect(BOUNDS_PROBABILITIES.map((p) => q(lower[c].f, p))).toEqual(cell.F.i0);
      expect(BOUNDS_PROBABILITIES.map((p) => q(upper[c].f, p))).toEqual(cell.F.i1);
    }
  });

  it('at the largest simulated size they lie within 6% of the paper\'s asymptotic F bounds (10% to 1%, every case, k = 1..4)', () => {
    const largest = BOUNDS_SIZES[BOUNDS_SIZES.length - 1];
    let worst = 0;
    for (const c of BOUNDS_CASES) {
      for (let k = 1; k <= 4; k++) {
        const sim = simulatedBounds('F', c, k, largest)!.critical;
        const paper = paperBounds('F', c, k)!.critical;
        for (const l of BOUNDS_LEVELS) {
          worst = Math.max(worst, Math.abs(sim[l].lower / paper[l].lower - 1), Math.abs(sim[l].upper / paper[l].upper - 1));
        }
      }
    }
    expect(worst).toBeLessThan(0.06);
  });

  it('in short samples the bounds are higher than the asymptotic ones (case 3, k = 1, 5%), and fall toward them as n grows', () => {
    const paper = paperBounds('F', 3, 1)!.critical['5%'];
    const uppers = [30, 40, 60, 100].map((n) => simulatedBounds('F', 3, 1, n)!.critical['5%'].upper);
    expect(uppers[0]).toBeGreaterThan(paper.upper);
    for (let i = 1; i < uppers.length; i++) expect(uppers[i]).toBeLessThan(uppers[i - 1] + 0.05);
  });

  it('the critical values say which table: the simulation at 40 rows, the paper at 300', () => {
    expect(criticalBounds('F', 3, 1, 40)!.source).toMatch(/Mooring's simulation for 40 rows/);
    expect(criticalBounds('F', 3, 1, 300)!.source).toMatch(/Table CI\(iii\)/);
    expect(criticalBounds('t', 2, 1, 300)).toBeNull();
  });

  it('p-values: at the 5% bounds they are about 0.05; beyond the table they are bounded', () => {
    const b = simulatedBounds('F', 3, 1, 60)!.critical['5%'];
    expect(boundsPValue('F', 3, 1, 60, b.upper)!.upper).toBeCloseTo(0.05, 6);
    expect(boundsPValue('F', 3, 1, 60, b.lower)!.lower).toBeCloseTo(0.05, 6);
    const far = boundsPValue('F', 3, 1, 60, 1000)!;
    expect(far.upperBound).toBe('below');
    expect(far.upper).toBeCloseTo(0.001, 9);
  });
});
