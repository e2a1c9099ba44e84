// Custom functions for the unit-root tests on GLS-detrended data. Scanned by the build's metadata
// plugin like functions.ts (FUNCTION_SOURCES in webpack.config.js) and re-exported from
// functions.ts, so the in-memory workbook and the tests see every function in one module.
// Each wrapper is thin: one call inside answer(), its work in ./analyses.

/// <reference types="custom-functions-runtime" />

import { answer } from './cells/answer';
import { glsRootCell, mStatsCell } from './analyses/gls-unit-root-cells';

/**
 * DF-GLS test: a unit-root test with more power, run after the level (or trend) is removed by GLS. A small p-value says it reverts.
 * @customfunction GLSROOT
 * @helpurl https://localhost:3000/docs/functions.md#glsroot
 * @param series Prices: one column or one row.
 * @param [deterministic] const (remove a level) or trend (a level and a linear trend). Default const.
 * @param [lags] A whole number of lagged changes, or maic, aic or bic to choose them. Default maic (modified AIC).
 * @param [show] headline (p-value), stat, all (labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, or what show asks for.
 */
export function glsroot(series: any[][], deterministic?: any, lags?: any, show?: any, prep?: any): any[][] {
  return answer(() => glsRootCell(series, deterministic, lags, show, prep));
}

/**
 * Ng-Perron tests: four unit-root statistics on GLS-detrended prices that keep their size; headline MZa's p-value.
 * @customfunction MSTATS
 * @helpurl https://localhost:3000/docs/functions.md#mstats
 * @param series Prices: one column or one row.
 * @param [deterministic] const (remove a level) or trend (a level and a linear trend). Default const.
 * @param [lags] A whole number of lagged changes, or maic, aic or bic to choose them. Default maic (modified AIC).
 * @param [show] headline (MZa p-value), stat (MZa), all (MZa, MZt, MSB, MPT and p-values) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value of MZa, or what show asks for.
 */
export function mstats(series: any[][], deterministic?: any, lags?: any, show?: any, prep?: any): any[][] {
  return answer(() => mStatsCell(series, deterministic, lags, show, prep));
}
