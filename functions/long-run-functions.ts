// Custom functions for long-run relations beyond the rank test: the bounds test when the orders
// are mixed, and the tests on a Johansen relation. Scanned by the build's metadata plugin like
// functions.ts (FUNCTION_SOURCES in webpack.config.js) and re-exported from functions.ts.
// Each wrapper is thin: one call inside answer(), its work in ./analyses.

/// <reference types="custom-functions-runtime" />

import { answer } from './cells/answer';
import { adjustsCell, levelBoundsCell, relationIsCell } from './analyses/long-run-cells';

/**
 * Bounds test: does y keep a long-run relation with x, whether x is stationary, wandering or unknown? A small p-value says yes.
 * @customfunction LEVELBOUNDS
 * @helpurl https://localhost:3000/docs/functions.md#levelbounds
 * @param y Prices of the series that adjusts: one column or one row.
 * @param x Prices of one or more series on the same rows, laid out like y.
 * @param [boundscase] 1 none, 2 constant in the relation, 3 free constant, 4 plus a trend in the relation, 5 free constant and trend. Default 3.
 * @param [lags] Order of y in levels (1 or more), or aic or bic. Default aic.
 * @param [order] Order of each x in levels (1 or more), or aic or bic. Default aic.
 * @param [show] What to return: headline (the p-value with every x wandering), stat (F), all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the F statistic, a labelled table or a card.
 */
export function levelbounds(y: any[][], x: any[][], boundscase?: any, lags?: any, order?: any, show?: any, prep?: any): any[][] {
  return answer(() => levelBoundsCell(y, x, boundscase, lags, order, show, prep));
}

/**
 * Is the Johansen long-run relation of the block the given weights (such as 1 and -1: the spread A - B)? A small p-value says no.
 * @customfunction RELATIONIS
 * @helpurl https://localhost:3000/docs/functions.md#relationis
 * @param block Prices of 2 to 12 series, one column each, on the same rows.
 * @param weights One weight per series, in a row or a column, such as 1 and -1.
 * @param [lags] Lagged changes in the model: a whole number. Default 1.
 * @param [deterministic] none, restricted-constant, constant, restricted-trend or trend. Default constant.
 * @param [show] What to return: headline (the p-value), stat (the likelihood ratio), all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function relationis(block: any[][], weights: any[][], lags?: any, deterministic?: any, show?: any, prep?: any): any[][] {
  return answer(() => relationIsCell(block, weights, lags, deterministic, show, prep));
}

/**
 * Does this series of the block move to close the gap to the Johansen relation? A small p-value says it does; a large one, it leaves the work to the others.
 * @customfunction ADJUSTS
 * @helpurl https://localhost:3000/docs/functions.md#adjusts
 * @param block Prices of 2 to 12 series, one column each, on the same rows.
 * @param [series] Which column of the block to test: 1, 2, ... Default 1.
 * @param [lags] Lagged changes in the model: a whole number. Default 1.
 * @param [deterministic] none, restricted-constant, constant, restricted-trend or trend. Default constant.
 * @param [show] What to return: headline (the p-value), stat (the likelihood ratio), all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function adjusts(block: any[][], series?: any, lags?: any, deterministic?: any, show?: any, prep?: any): any[][] {
  return answer(() => adjustsCell(block, series, lags, deterministic, show, prep));
}
