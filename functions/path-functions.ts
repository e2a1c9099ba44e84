// Custom functions for a relation through time and where it is heading. Scanned by the build's
// metadata plugin like functions.ts (FUNCTION_SOURCES in webpack.config.js) and re-exported
// from functions.ts, so the in-memory workbook and the tests see every function in one module.
// Each wrapper is thin: one call inside answer(), its work in ./analyses.

/// <reference types="custom-functions-runtime" />

import { answer } from './cells/answer';
import { aheadCell } from './analyses/forecast-cells';
import { movingHedgeCell } from './analyses/moving-hedge-cells';

/**
 * Moving hedge ratio: the slope of y on x row by row by the Kalman filter, intercept and slope taking random steps.
 * @customfunction MOVINGHEDGE
 * @helpurl https://localhost:3000/docs/functions.md#movinghedge
 * @param y Prices of the series you hold: one column or one row.
 * @param x Prices of the hedge: one column (or row), on the same rows as y.
 * @param [show] ratio (from the rows up to each), smoothed, spread, zscore, all (six columns) or latest. Default ratio.
 * @param [statevar] Variance of each step of the intercept and slope; give it with obsvar. Default: both estimated.
 * @param [obsvar] Variance of y around the line; give it with statevar. Default: both estimated.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns One value per row beside the prices (empty in the first two, which set the filter up); all: ratio, its std, smoothed, its std, spread, z-score.
 */
export function movinghedge(y: any[][], x: any[][], show?: any, statevar?: any, obsvar?: any, prep?: any): any[][] {
  return answer(() => movingHedgeCell(y, x, show, statevar, obsvar, prep));
}

/**
 * Where the series are heading if their long-run relations hold: the error-correction model's forecast, one row per step ahead.
 * @customfunction AHEAD
 * @helpurl https://localhost:3000/docs/functions.md#ahead
 * @param block Prices of 2 to 12 series side by side: one column each, the same rows.
 * @param horizon Steps (rows) ahead to forecast: a whole number of 1 or more.
 * @param [rank] Long-run relations in the model. Default: the Johansen trace test's choice at 5%.
 * @param [lags] Lagged changes in the model. Default 1.
 * @param [deterministic] none, restricted-constant, constant, restricted-trend or trend. Default constant.
 * @param [show] forecast, lower or upper (95% bounds, estimates taken as known), spread (path, low, high) or all. Default forecast.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns One row per step ahead: a column per series (all: forecast, low, high for each; spread: the first relation's path, low, high).
 */
export function ahead(block: any[][], horizon: any, rank?: any, lags?: any, deterministic?: any, show?: any, prep?: any): any[][] {
  return answer(() => aheadCell(block, horizon, rank, lags, deterministic, show, prep));
}
