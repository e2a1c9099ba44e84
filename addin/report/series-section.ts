/**
 * Each series' part of the diagnostic: its order of integration by the ADF-down, KPSS-check
 * decision (integrationOrder), the tests behind it, and its values for the chart, rebased to
 * 100 at the first row so series in different units share one axis.
 */
import { toUnitScale } from '../linalg/power-of-two-scale';
import type { Deterministic } from '../result';
import { adfTest } from '../unitroot/adf';
import { dfglsTest } from '../unitroot/dfgls';
import { ngPerronTest } from '../unitroot/ng-perron';
import { integrationOrder, type IntegrationOrderResult } from '../unitroot/integration-order';
import type { SeriesReport } from './report-types';
import { summariseNgPerron } from './ng-perron-summary';
import { summariseTest } from './test-summary';

/** Order words for the report: 0, 1, 2, and 3 standing for "above 2". */
export function orderNumber(order: IntegrationOrderResult['order']): number {
  return order === 'above 2' ? 3 : order;
}

/** "I(0)", "I(1)", "I(2)", "above I(2)". */
export function orderText(order: number): string {
  return order > 2 ? 'above I(2)' : `I(${order})`;
}

/**
 * The chart line of a series: 100 x value / first value; for logs 100 x exp(value - first),
 * the same thing in prices. A series with a value at or below zero cannot be rebased and is
 * standardised instead (value minus mean, over the standard deviation).
 */
export function chartLine(values: Float64Array, logged: boolean): SeriesReport['chart'] {
  const first = values[0];
  if (logged) return { kind: 'rebased', values: Array.from(values, (v) => 100 * Math.exp(v - first)) };
  if (values.every((v) => v > 0)) return { kind: 'rebased', values: Array.from(values, (v) => (100 * v) / first) };
  const unit = toUnitScale(values).values; // standardised values are free of units; squares of 1e300 are not
  let mean = 0;
  for (const v of unit) mean += v;
  mean /= unit.length;
  let ss = 0;
  for (const v of unit) ss += (v - mean) ** 2;
  const sd = Math.sqrt(ss / (unit.length - 1));
  return { kind: 'standardised', values: Array.from(unit, (v) => (v - mean) / sd) };
}

/**
 * The series section of one series. `unitRootTest` names the test that decides the levels step
 * (integration-order.ts); the levels row carries both ADF and DF-GLS whichever decided, so a
 * reader sees the two side by side (the one not deciding is run on the same values with the same
 * terms, exactly as it would run if it decided). Ng-Perron joins them on the levels with DF-GLS's
 * detrending terms and lag rule, for comparison only.
 */
export function seriesSection(name: string, values: Float64Array, options: { alpha: number; deterministic: Deterministic; logged: boolean; unitRootTest?: 'adf' | 'dfgls' }): SeriesReport {
  const decidedBy = options.unitRootTest ?? 'adf';
  const result = integrationOrder(values, { alpha: options.alpha, deterministic: options.deterministic, unitRootTest: decidedBy }, name);
  const order = orderNumber(result.order);
  const glsTerms = options.deterministic === 'trend' ? 'trend' : 'const';
  const levels = (s: IntegrationOrderResult['steps'][number]) => {
    if (s.differences !== 0) return { adf: s.adf, gls: null };
    if (decidedBy === 'dfgls') return { adf: adfTest(values, { deterministic: options.deterministic }, name), gls: s.adf };
    return { adf: s.adf, gls: options.deterministic === 'none' ? null : dfglsTest(values, { deterministic: glsTerms }, name) };
  };
  return {
    name,
    order,
    orderText: orderText(order),
    agree: result.agree,
    decidedBy,
    verdict: result.verdict,
    steps: result.steps
      .slice()
      .sort((u, v) => u.differences - v.differences)
      .map((s) => {
        const { adf, gls } = levels(s);
        const ngPerron = gls ? summariseNgPerron(ngPerronTest(values, { deterministic: glsTerms }, name), options.alpha) : null;
        return { differences: s.differences, adf: summariseTest(adf, options.alpha), kpss: summariseTest(s.kpss, options.alpha), gls: gls && summariseTest(gls, options.alpha), ngPerron };
      }),
    warnings: result.warnings.slice(),
    chart: chartLine(values, options.logged),
  };
}
