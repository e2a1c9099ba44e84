/**
 * The charts of a report in one place, so each step asks for the one it shows: the series
 * chart of the whole report and, per pair, the spread and rolling z-score charts (null when
 * the engine had no spread for the pair).
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import type { PairReport } from '../../../addin/report/pair-types';
import { forecastChart, movingHedgeChart, rollingZChart, seriesChart, spreadChart, type ChartModel } from './chart-models';

/** The series chart of the report. */
export function chartModelsOf(report: DiagnosticReport): { series: ChartModel } {
  return { series: seriesChart(report.data, report.series) };
}

/** The spread and rolling z-score charts of a pair, or null without a spread. */
export function pairCharts(report: DiagnosticReport, pair: PairReport): { spread: ChartModel; rollingZ: ChartModel } | null {
  if (!pair.spread) return null;
  return { spread: spreadChart(report.data, pair.spread), rollingZ: rollingZChart(report.data, pair.spread) };
}

/** The moving hedge ratio and the forecast fan of a pair, each null where the report has none. */
export function pathCharts(report: DiagnosticReport, pair: PairReport): { movingHedge: ChartModel | null; forecast: ChartModel | null } {
  return {
    movingHedge: pair.movingHedge ? movingHedgeChart(report.data, pair.movingHedge) : null,
    forecast: pair.forecast ? forecastChart(report.data, pair.forecast) : null,
  };
}
