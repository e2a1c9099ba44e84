import { describe, expect, it } from 'vitest';
import { demoRowsAfter, demoRowsAfterAsGrid } from '../../addin/demo/continuation';
import { DEMO_TRUTH, generateDemo } from '../../addin/demo/scenario';
import { GASOIL_SIGMA, FREIGHT_SIGMA, HEAVY_TREND_SIGMA } from '../../addin/demo/truth';

// The rows after the demo's end (appended in the preview). Expected values come from the
// designed structure in addin/demo/truth.ts (our own invented scenario) and the calendar.

describe('the demo continued after its last row', () => {
  it('is deterministic and the same rows whether asked for at once or in pieces', () => {
    const all = demoRowsAfter(0, 24);
    expect(demoRowsAfter(0, 24)).toEqual(all);
    const first = demoRowsAfter(0, 12);
    const second = demoRowsAfter(12, 12);
    expect([...first.dates, ...second.dates]).toEqual(all.dates);
    for (const s of DEMO_TRUTH.series) expect([...first.columns[s.name], ...second.columns[s.name]]).toEqual(all.columns[s.name]);
    expect(demoRowsAfter(0, 0).dates).toEqual([]);
    expect(() => demoRowsAfter(-1, 3)).toThrow(RangeError);
  });

  it('starts on the weekday after the demo ends (Friday 2024-12-27, so Monday 2024-12-30) and skips weekends', () => {
    const demo = generateDemo();
    expect(demo.dates[demo.dates.length - 1]).toBe('2024-12-27');
    const next = demoRowsAfter(0, 6).dates;
    expect(next).toEqual(['2024-12-30', '2024-12-31', '2025-01-01', '2025-01-02', '2025-01-03', '2025-01-06']);
  });

  it('carries on from the demo\'s last prices: the first day moves each trending series by under five daily sds', () => {
    const demo = generateDemo();
    const next = demoRowsAfter(0, 1);
    const sigma: Record<string, number> = { GateGasoil: GASOIL_SIGMA, BargeFreight: FREIGHT_SIGMA, HeavyFuel: 2 * HEAVY_TREND_SIGMA, BunkerBlend: 2 * HEAVY_TREND_SIGMA, DockDiesel: 3 * GASOIL_SIGMA };
    for (const [name, sd] of Object.entries(sigma)) {
      const lastPrice = demo.columns[name][demo.columns[name].length - 1];
      expect(Math.abs(Math.log(next.columns[name][0] / lastPrice)), name).toBeLessThan(5 * sd);
    }
  });

  it('keeps the tight pair\'s designed spread: mean near 0 and sd near 0.03 over 3000 continued days', () => {
    // One sample (seed 91's continuation stream), 3000 days: the spread's AR(1) half-life of 12 days
    // leaves about 90 effective observations, so the mean is within 0.015 and the sd within 0.01.
    const { columns } = demoRowsAfter(0, 3000);
    const pair = DEMO_TRUTH.cointegratedPairs[0];
    const z = columns.DockDiesel.map((y, t) => Math.log(y) - pair.intercept - pair.beta * Math.log(columns.GateGasoil[t]));
    const mean = z.reduce((a, b) => a + b, 0) / z.length;
    const sd = Math.sqrt(z.reduce((a, b) => a + (b - mean) ** 2, 0) / (z.length - 1));
    expect(Math.abs(mean)).toBeLessThan(0.015);
    expect(Math.abs(sd - pair.spreadSd)).toBeLessThan(0.01);
  });

  it('gives table rows in the header\'s order, dates first, prices at the demo\'s decimals', () => {
    const grid = demoRowsAfterAsGrid(0, 3);
    expect(grid.length).toBe(3);
    expect(grid[0][0]).toBe('2024-12-30');
    DEMO_TRUTH.series.forEach((s, j) => {
      const v = grid[0][j + 1] as number;
      expect(typeof v).toBe('number');
      expect(Number(v.toFixed(s.decimals))).toBe(v);
    });
  });
});
