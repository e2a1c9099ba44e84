import { describe, expect, it } from 'vitest';
import { breakColumn, scanBreakTValues } from '../../addin/breaks/break-t-scan';
import { BREAK_COLUMNS, ZIVOT_ANDREWS_BREAKS, zivotAndrewsDesign } from '../../addin/breaks/zivot-andrews-design';
import { leastSquares } from '../../addin/regression/least-squares';
import { SeededRandom, autoregressive1, randomWalk } from '../../addin/random';

/**
 * The fast scan (one fit of the break-free columns, then running sums) must give, at every
 * candidate date, the t-ratio that a full QR regression with the break columns gives.
 * Series: seeded (seeds stated per case); tolerance 1e-9 relative at every date.
 */
function directTValues(x: Float64Array, lags: number, model: (typeof ZIVOT_ANDREWS_BREAKS)[number], first: number, last: number): number[] {
  const d = zivotAndrewsDesign(x, lags);
  const out: number[] = [];
  for (let c = first; c <= last; c++) {
    const cols = BREAK_COLUMNS[model].map((k) => breakColumn(k, c, d.n));
    out.push(leastSquares(d.response, [d.laggedLevel, ...d.fixed, ...cols]).tValues[0]);
  }
  return out;
}

const cases: { label: string; series: Float64Array; lags: number }[] = [
  { label: 'random walk, T = 200, seed 41, 3 lags', series: randomWalk(new SeededRandom(41), 200), lags: 3 },
  { label: 'AR(1) 0.5, T = 160, seed 42, 0 lags', series: autoregressive1(new SeededRandom(42), 160, 0.5), lags: 0 },
  { label: 'walk at 1e6 with steps of 0.01, T = 180, seed 43, 2 lags', series: randomWalk(new SeededRandom(43), 180, { start: 1e6, sigma: 0.01 }), lags: 2 },
];

describe('break scan agrees with a full regression at every candidate date', () => {
  for (const c of cases) {
    for (const model of ZIVOT_ANDREWS_BREAKS) {
      it(`${c.label}, ${model} break: every date within 1e-9 relative`, () => {
        const d = zivotAndrewsDesign(c.series, c.lags);
        const first = 5;
        const last = d.n - 5;
        const scan = scanBreakTValues(d.response, d.laggedLevel, d.fixed, BREAK_COLUMNS[model], first, last);
        const direct = directTValues(c.series, c.lags, model, first, last);
        expect(scan.tValues.length).toBe(direct.length);
        let worst = 0;
        direct.forEach((t, i) => {
          worst = Math.max(worst, Math.abs(scan.tValues[i] - t) / Math.abs(t));
        });
        expect(worst).toBeLessThan(1e-9);
        const argmin = direct.indexOf(Math.min(...direct));
        expect(scan.bestRow).toBe(first + argmin);
      });
    }
  }
});
