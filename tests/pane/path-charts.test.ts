/**
 * Step 4 draws the hedge ratio through time and the forecast fan from the report's own numbers:
 * every plotted value is the engine's (the report's movingHedge and forecast parts), placed on
 * the report's dates, with the future dates after them. Source: the report itself (the check
 * is that the chart adds and drops nothing); the demo data are our own.
 */
import { describe, expect, it } from 'vitest';
import { relationStepView } from '../../taskpane/ui/views/relation-view';
import { COLUMN, demoReport } from './demo-reports';

describe('the path charts of step 4', () => {
  it('plot the smoothed moving ratio with its band against the fixed ratio, on the report\'s dates', async () => {
    const report = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
    const pair = report.pairs[0];
    const chart = relationStepView(report, pair).pathCharts.movingHedge;
    expect(pair.movingHedge).not.toBeNull();
    expect(chart).not.toBeNull();
    const line = (label: string) => chart!.lines.find((l) => l.label === label)!.values;
    expect(line('Moving ratio')).toEqual(pair.movingHedge!.betaSmoothed);
    expect(line('Band, high')).toEqual(pair.movingHedge!.betaSmoothedHigh);
    expect(new Set(line('Fixed ratio'))).toEqual(new Set([pair.movingHedge!.fixedBeta]));
    expect(chart!.time).toBe(true);
    expect(chart!.x).toHaveLength(report.data.observations);
  });

  it('continue the relation\'s recent values with its forecast and band, the future dates after the last row', async () => {
    const report = await demoReport([COLUMN.GateGasoil, COLUMN.DockDiesel]);
    const pair = report.pairs[0];
    const f = pair.forecast!;
    const chart = relationStepView(report, pair).pathCharts.forecast!;
    const n = f.spread.recent.length;
    const line = (label: string) => chart.lines.find((l) => l.label === label)!.values;
    expect(line('Relation, recent').slice(0, n)).toEqual(f.spread.recent);
    expect(line('Forecast').slice(n)).toEqual(f.spread.path);
    expect(line('Forecast')[n - 1]).toBe(f.spread.recent[n - 1]);
    expect(line('Band, low').slice(n)).toEqual(f.spread.lower);
    expect(chart.x).toHaveLength(n + f.horizon);
    // Future dates lie after the last row's date, in order.
    expect(chart.x[n]).toBeGreaterThan(chart.x[n - 1]);
    expect(chart.x.every((v, i) => i === 0 || v > chart.x[i - 1])).toBe(true);
    expect(chart.description).toMatch(/ignor|parameter|uncertain/i);
  });
});
