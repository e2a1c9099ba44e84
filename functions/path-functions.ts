// Custom functions for a relation through time and where it is heading. Scanned by the build's
// metadata plugin like functions.ts (FUNCTION_SOURCES in webpack.config.js) and re-exported
// from functions.ts, so the in-memory workbook and the tests see every function in one module.
// Each wrapper is thin: one call inside answer(), its work in ./analyses.

/// <reference types="custom-functions-runtime" />

import { answer } from './cells/answer';
import { movingHedgeCell } from './analyses/moving-hedge-cells';

/**
 * Moving hedge ratio: the slope of y on x row by row by the Kalman filter, intercept and slope taking random steps.
 * @customfunction MOVINGHEDGE
 * @helpurl https://localhost:3000/docs/functions.md#movinghedge
 * @param y Prices of the series you hold: one column or one row.
 * @param x Prices of the hedge: one column (or row), on the same rows as y.
 * @param [show] ratio (from the rows up to each), smoothed (from every row), spread, zscore, or all (six columns). Default ratio.
 * @param [statevar] Variance of each step of the intercept and slope; give it with obsvar. Default: both estimated.
 * @param [obsvar] Variance of y around the line; give it with statevar. Default: both estimated.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns One value per row beside the prices (empty in the first two, which set the filter up); all: ratio, its std, smoothed, its std, spread, z-score.
 */
export function movinghedge(y: any[][], x: any[][], show?: any, statevar?: any, obsvar?: any, prep?: any): any[][] {
  return answer(() => movingHedgeCell(y, x, show, statevar, obsvar, prep));
}
