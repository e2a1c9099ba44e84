/**
 * The bounds test against the reference library: statsmodels 0.13.5's UECM and bounds_test on
 * generated series for every case (fixture tests/reference/fixtures/ardl-bounds.json, made by
 * tests/reference/makers/ardl.py): F and t statistics to 1e-6, coefficients, long-run
 * coefficients and their delta-method standard errors, the sample size.
 *
 * The library's own bounds are looked up one regressor too high in 0.13.5 (it passes the number
 * of level variables including y); the fixture keeps both its reported bounds and its table at
 * the right key, and the last block checks that Mooring reads the row for the real number of
 * regressors.
 */
import { describe, expect, it } from 'vitest';
import { ardlBoundsTest } from '../../addin/ardl/bounds-test';
import { paperBounds } from '../../addin/ardl/bounds-tables';
import type { BoundsCase } from '../../addin/ardl/bounds-case';
import { loadFixture } from '../reference/fixtures';

interface ArdlCase {
  y: string;
  x: string[];
  case: BoundsCase;
  lags: number;
  order: number[];
  nobs: number;
  names: string[];
  params: number[];
  bse: number[];
  fStatistic: number;
  tStatistic: number;
  speed: number;
  speedSe: number;
  ciParams: number[];
  ciBse: number[];
  libraryKey: number;
  libraryCriticalPercentiles: number[];
  libraryReportedLower: number[];
  libraryReportedUpper: number[];
  libraryRightKeyLower: number[];
  libraryRightKeyUpper: number[];
}

const fixture = loadFixture<{ series: Record<string, number[]>; cases: ArdlCase[] }>('ardl-bounds');

const relClose = (actual: number, expected: number, tol: number) => expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol * Math.max(1, Math.abs(expected)));

describe('statsmodels 0.13.5 UECM bounds test (fixture ardl-bounds.json)', () => {
  it('covers every case and more than one input', () => {
    expect(new Set(fixture.cases.map((c) => c.case))).toEqual(new Set([1, 2, 3, 4, 5]));
    expect(new Set(fixture.cases.map((c) => c.y)).size).toBeGreaterThanOrEqual(3);
  });

  for (const c of fixture.cases) {
    it(`${c.y} on ${c.x.join(', ')}, case ${c.case}, ARDL(${c.lags}, ${c.order.join(', ')}): F, t, coefficients and long run`, () => {
      const result = ardlBoundsTest(
        fixture.series[c.y],
        c.x.map((x) => fixture.series[x]),
        { case: c.case, lags: { fixed: c.lags }, order: c.order.map((q) => ({ fixed: q })) },
        { y: c.y, x: c.x },
      );
      expect(result.nobs).toBe(c.nobs);
      relClose(result.fTest.statistic, c.fStatistic, 1e-6);
      relClose(result.tTest.statistic, c.tStatistic, 1e-6);
      relClose(result.speed.coefficient, c.speed, 1e-7);
      relClose(result.speed.standardError, c.speedSe, 1e-7);
      // ci_params are the levels over π_y: for each x, minus Mooring's long-run coefficient
      const ndet = c.names.indexOf(`${c.y}.L1`);
      const restricted = c.case === 2 || c.case === 4 ? 1 : 0;
      const xs = result.longRun.slice(restricted);
      xs.forEach((term, j) => {
        relClose(term.coefficient, -c.ciParams[ndet + 1 + j], 1e-7);
        relClose(term.standardError, c.ciBse[ndet + 1 + j], 1e-6);
      });
      if (restricted) {
        // the constant (case 2) or trend (case 4) inside the relation: the column just before y's level
        relClose(result.longRun[0].coefficient, -c.ciParams[ndet - 1], 1e-7);
        relClose(result.longRun[0].standardError, c.ciBse[ndet - 1], 1e-6);
      }
    });
  }
});

describe('the bounds are read for the real number of regressors (the library reports k + 1)', () => {
  const percentile95 = (c: ArdlCase) => c.libraryCriticalPercentiles.indexOf(95);
  it('the library looked its bounds up at k + 1: its reported bounds equal its own table one row down', () => {
    for (const c of fixture.cases) {
      expect(c.libraryKey).toBe(c.x.length + 1);
    }
  });

  it('case 3, one regressor, 5%: Mooring gives the paper\'s 4.94 / 5.73, near the library\'s table at k = 1 (4.92 / 5.72), not its reported 3.80 / 4.81', () => {
    const c = fixture.cases.find((f) => f.case === 3 && f.x.length === 1 && f.y === 'pair_y') as ArdlCase;
    const i = percentile95(c);
    // Pesaran, Shin & Smith (2001), Table CI(iii), k = 1, 5%: 4.94 and 5.73
    const mooring = paperBounds('F', 3, 1)!.critical['5%'];
    expect(mooring).toEqual({ lower: 4.94, upper: 5.73 });
    expect(Math.abs(mooring.lower - c.libraryRightKeyLower[i])).toBeLessThan(0.05);
    expect(Math.abs(mooring.upper - c.libraryRightKeyUpper[i])).toBeLessThan(0.05);
    expect(c.libraryReportedLower[i]).toBeCloseTo(3.80, 2);
    expect(c.libraryReportedUpper[i]).toBeCloseTo(4.81, 2);
    expect(Math.abs(mooring.lower - c.libraryReportedLower[i])).toBeGreaterThan(1);
  });

  it('every case and input: the large-sample bounds Mooring reports agree with the library\'s table at k (within 2%), not at k + 1', () => {
    for (const c of fixture.cases.filter((f) => f.nobs > 100)) {
      const i = percentile95(c);
      const result = ardlBoundsTest(
        fixture.series[c.y],
        c.x.map((x) => fixture.series[x]),
        { case: c.case, lags: { fixed: c.lags }, order: c.order.map((q) => ({ fixed: q })) },
      );
      expect(result.criticalSource).toMatch(/Pesaran, Shin & Smith \(2001\), Table CI/);
      const m = result.critical['5%'];
      expect(Math.abs(m.lower / c.libraryRightKeyLower[i] - 1)).toBeLessThan(0.02);
      expect(Math.abs(m.upper / c.libraryRightKeyUpper[i] - 1)).toBeLessThan(0.02);
      expect(Math.abs(m.upper / c.libraryReportedUpper[i] - 1)).toBeGreaterThan(0.04);
    }
  });

  it('a 45-row sample reads Mooring\'s small-sample simulation, says so, and its bounds are above the asymptotic ones', () => {
    const c = fixture.cases.find((f) => f.y === 'ardl_short_y' && f.case === 3) as ArdlCase;
    const result = ardlBoundsTest(fixture.series[c.y], [fixture.series[c.x[0]]], { case: 3, lags: { fixed: c.lags }, order: [{ fixed: c.order[0] }] });
    expect(result.nobs).toBe(c.nobs);
    expect(result.criticalSource).toMatch(/Mooring's simulation for 43 rows/);
    const asymptotic = paperBounds('F', 3, 1)!.critical;
    expect(result.critical['5%'].lower).toBeGreaterThan(asymptotic['5%'].lower);
    expect(result.critical['5%'].upper).toBeGreaterThan(asymptotic['5%'].upper);
  });
});
