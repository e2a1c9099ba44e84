// Every custom function the add-in registers: the build's metadata plugin turns each `@customfunction`
// JSDoc below into an entry of functions.json (types from the signature) and appends the associate calls.
// Each wrapper is thin, its work in ./analyses or ./version.ts. Ranges are `any[][]` and options `any`, so
// blanks, text and errors reach the shared cleaner untouched (cells/range-input.ts); answer() maps refusals.
/// <reference types="custom-functions-runtime" />

import { answer } from './cells/answer';
import { egCell, poCell } from './analyses/cointegration-cells';
import { critCell } from './analyses/critical-value-cells';
import { commonDatesCell } from './analyses/dates-cells';
import { ecmCell } from './analyses/ecm-cells';
import { johansenCell, rankCell } from './analyses/johansen-cells';
import { grangerCell, varLagsCell } from './analyses/lead-lag-cells';
import { rollingCell } from './analyses/rolling-cells';
import { screenLaterCell } from './analyses/screen-cells';
import { halfLifeCell, hedgeCell, spreadCell, zScoreCell } from './analyses/spread-cells';
import { adfCell, kpssCell, orderCell, ppCell } from './analyses/unit-root-cells';
import { addinVersion } from './version';

/**
 * Returns the version of the Mooring add-in that is running.
 * @customfunction VERSION
 * @helpurl https://localhost:3000/docs/functions.md#version
 * @returns The add-in version, such as 0.1.0.
 */
export function version(): string {
  return addinVersion();
}
/**
 * Augmented Dickey-Fuller test: does the series wander with no pull back (a unit root)? A small p-value says it reverts.
 * @customfunction ADF
 * @helpurl https://localhost:3000/docs/functions.md#adf
 * @param series Prices: one column or one row. Blank cells at the ends are skipped.
 * @param [deterministic] Terms in the test regression: none, const or trend. Default const.
 * @param [lags] Lagged changes: a whole number, or aic, bic or tstat to choose them. Default aic.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function adf(series: any[][], deterministic?: any, lags?: any, show?: any, prep?: any): any[][] {
  return answer(() => adfCell(series, deterministic, lags, show, prep));
}
/**
 * KPSS test: is the series stationary around a level or a trend? A small p-value says it wanders.
 * @customfunction KPSS
 * @helpurl https://localhost:3000/docs/functions.md#kpss
 * @param series Prices: one column or one row. Blank cells at the ends are skipped.
 * @param [deterministic] Stationary around: const (a level) or trend. Default const.
 * @param [bandwidth] Kernel lags of the long-run variance: a whole number, or auto (Newey-West). Default auto.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function kpss(series: any[][], deterministic?: any, bandwidth?: any, show?: any, prep?: any): any[][] {
  return answer(() => kpssCell(series, deterministic, bandwidth, show, prep));
}
/**
 * Phillips-Perron test: a unit-root test that corrects for autocorrelation with a long-run variance instead of lags.
 * @customfunction PHILLIPSPERRON
 * @helpurl https://localhost:3000/docs/functions.md#phillipsperron
 * @param series Prices: one column or one row. Blank cells at the ends are skipped.
 * @param [deterministic] Terms in the test regression: none, const or trend. Default const.
 * @param [bandwidth] Kernel lags of the long-run variance: a whole number, or auto (Newey-West). Default auto.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function phillipsperron(series: any[][], deterministic?: any, bandwidth?: any, show?: any, prep?: any): any[][] {
  return answer(() => ppCell(series, deterministic, bandwidth, show, prep));
}
/**
 * Order of integration: 0 if the series is stationary, 1 if its changes are, 2 if its changes of changes are.
 * @customfunction ORDER
 * @helpurl https://localhost:3000/docs/functions.md#order
 * @param series Prices: one column or one row; or several columns, one series each, for one order per column on the rows they share.
 * @param [alpha] Significance level of each step, such as 0.05 or 5%. Default 0.05.
 * @param [deterministic] Terms in the level tests: none, const or trend. Default const.
 * @param [test] Test that decides if the levels wander: adf, or dfgls (more power; const or trend). Changes use adf. Default adf.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns 0, 1 or 2, or the text "above 2"; a row of them for several columns.
 */
export function order(series: any[][], alpha?: any, deterministic?: any, test?: any, prep?: any): any[][] {
  return answer(() => orderCell(series, alpha, deterministic, test, prep));
}
/**
 * Engle-Granger test: is y tied to x in the long run (cointegrated)? A small p-value says the gap between them reverts.
 * @customfunction ENGLEGRANGER
 * @helpurl https://localhost:3000/docs/functions.md#englegranger
 * @param y Prices of the series on the left of the relation: one column or one row.
 * @param x Prices of the other series: one or more columns (rows for a row y), on the same rows as y.
 * @param [deterministic] Terms in the relation: none, const or trend. Default const.
 * @param [lags] Lagged changes in the residual test: a whole number, or aic, bic or tstat. Default aic.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function englegranger(y: any[][], x: any[][], deterministic?: any, lags?: any, show?: any, prep?: any): any[][] {
  return answer(() => egCell(y, x, deterministic, lags, show, prep));
}
/**
 * Phillips-Ouliaris test: cointegration of y with x, correcting the residual test with a long-run variance.
 * @customfunction PHILLIPSOULIARIS
 * @helpurl https://localhost:3000/docs/functions.md#phillipsouliaris
 * @param y Prices of the series on the left of the relation: one column or one row.
 * @param x Prices of the other series: one or more columns (rows for a row y), on the same rows as y.
 * @param [deterministic] Terms in the relation: none, const or trend. Default const.
 * @param [bandwidth] Kernel lags of the long-run variance: a whole number, or auto (Newey-West). Default auto.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function phillipsouliaris(y: any[][], x: any[][], deterministic?: any, bandwidth?: any, show?: any, prep?: any): any[][] {
  return answer(() => poCell(y, x, deterministic, bandwidth, show, prep));
}
/**
 * Johansen test: do the series share any long-run relation? The headline is the p-value of the trace test of none.
 * @customfunction JOHANSEN
 * @helpurl https://localhost:3000/docs/functions.md#johansen
 * @param block Prices of 2 to 12 series, one column each, on the same rows.
 * @param [lags] Lagged changes in the model: a whole number. Default 1.
 * @param [deterministic] none, restricted-constant, constant, restricted-trend or trend. Default constant.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function johansen(block: any[][], lags?: any, deterministic?: any, show?: any, prep?: any): any[][] {
  return answer(() => johansenCell(block, lags, deterministic, show, prep));
}
/**
 * Number of long-run relations among the series, by Johansen's trace test taken step by step.
 * @customfunction RANK
 * @helpurl https://localhost:3000/docs/functions.md#rank
 * @param block Prices of 2 to 12 series, one column each, on the same rows.
 * @param [lags] Lagged changes in the model: a whole number. Default 1.
 * @param [deterministic] none, restricted-constant, constant, restricted-trend or trend. Default constant.
 * @param [alpha] Significance level of each step, such as 0.05 or 5%. Default 0.05.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The number of long-run relations, from 0 to the number of series.
 */
export function rank(block: any[][], lags?: any, deterministic?: any, alpha?: any, prep?: any): number {
  return answer(() => rankCell(block, lags, deterministic, alpha, prep));
}
/**
 * Hedge ratio: units of x that offset one unit of y in the long-run line y = intercept + beta x.
 * @customfunction HEDGE
 * @helpurl https://localhost:3000/docs/functions.md#hedge
 * @param y Prices of the series you hold: one column or one row.
 * @param x Prices of the hedge: one column (or row), on the same rows as y.
 * @param [method] ols (y on x), reverse-ols (x on y, turned round), tls (orthogonal) or dols (dynamic OLS). Default ols.
 * @param [show] slope (an elasticity with logs) or units (units of x to hold per unit of y at latest prices). Default slope.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The hedge ratio beta (with show units, the units of x to hold).
 */
export function hedge(y: any[][], x: any[][], method?: any, show?: any, prep?: any): number {
  return answer(() => hedgeCell(y, x, method, show, prep));
}
/**
 * Spread of a pair, row by row: y - beta x for a given beta, or the least-squares gap y - intercept - beta x.
 * @customfunction SPREAD
 * @helpurl https://localhost:3000/docs/functions.md#spread
 * @param y Prices of the series you hold: one column or one row.
 * @param x Prices of the hedge: one column (or row), on the same rows as y.
 * @param [beta] Hedge ratio to use, with no intercept. Default: estimated with its intercept by least squares.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The spread, one value per row of y, spilled beside the prices.
 */
export function spread(y: any[][], x: any[][], beta?: any, prep?: any): any[][] {
  return answer(() => spreadCell(y, x, beta, prep));
}
/**
 * Half-life: periods for a gap in the spread to halve. One argument: that spread. Two: the Engle-Granger spread of y on x.
 * @customfunction HALFLIFE
 * @helpurl https://localhost:3000/docs/functions.md#halflife
 * @param y A spread, or the prices of the series on the left of the relation: one column or one row.
 * @param [x] Prices of the other series, on the same rows as y. Default: none, when y is already a spread.
 * @param [show] value (the half-life), low or high (an end of its 95% interval) or all (a labelled table). Default value.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The half-life in rows (days for daily prices), an end of its 95% interval, or the table.
 */
export function halflife(y: any[][], x?: any[][], show?: any, prep?: any): any[][] {
  return answer(() => halfLifeCell(y, x, show, prep));
}
/**
 * Z-score of the spread, row by row: how many standard deviations it stands from its mean.
 * @customfunction ZSCORE
 * @helpurl https://localhost:3000/docs/functions.md#zscore
 * @param y A spread, or the prices of the series on the left of the relation: one column or one row.
 * @param [x] Prices of the other series, on the same rows as y. Default: none, when y is already a spread.
 * @param [window] Rows in a trailing window (3 or more). Default: the whole sample.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The z-scores, one per row of y, spilled beside the prices.
 */
export function zscore(y: any[][], x?: any[][], window?: any, prep?: any): any[][] {
  return answer(() => zScoreCell(y, x, window, prep));
}
/**
 * Error-correction model: how fast y moves back toward its long-run relation with x. The headline is y's speed.
 * @customfunction ECM
 * @helpurl https://localhost:3000/docs/functions.md#ecm
 * @param y Prices of the series on the left of the relation: one column or one row.
 * @param x Prices of the other series: one column (or row), on the same rows as y.
 * @param [lags] Lagged changes of both series: a whole number, or aic to choose. Default aic.
 * @param [show] What to return: headline (y's speed), stat (its t-value), all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The speed of adjustment, its t-value, a labelled table or a card.
 */
export function ecm(y: any[][], x: any[][], lags?: any, show?: any, prep?: any): any[][] {
  return answer(() => ecmCell(y, x, lags, show, prep));
}
/**
 * Granger lead-lag test: does the past of one series help predict the other? A small p-value says it leads.
 * @customfunction GRANGER
 * @helpurl https://localhost:3000/docs/functions.md#granger
 * @param cause The series that may lead: one column or one row.
 * @param effect The series that may follow, on the same rows as cause.
 * @param [lags] Lags of both series: a whole number of 1 or more, or aic or bic to choose. Default aic.
 * @param [method] auto (the valid test), f, levels (F on the values as given), changes (F on their changes), ty or ecm. Default auto.
 * @param [show] What to return: headline (the p-value), stat, all (a labelled table) or card. Default headline.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The p-value, the statistic, a labelled table or a card.
 */
export function granger(cause: any[][], effect: any[][], lags?: any, method?: any, show?: any, prep?: any): any[][] {
  return answer(() => grangerCell(cause, effect, lags, method, show, prep));
}
/**
 * Lag order of a vector autoregression of the series, chosen by an information criterion.
 * @customfunction VARLAGS
 * @helpurl https://localhost:3000/docs/functions.md#varlags
 * @param block Series, one column each, on the same rows.
 * @param [criterion] aic, bic, hq or fpe. Default aic.
 * @param [maxlags] Largest order tried: a whole number of 1 or more. Default round(12 (T/100)^(1/4)), capped.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The number of lags.
 */
export function varlags(block: any[][], criterion?: any, maxlags?: any, prep?: any): number {
  return answer(() => varLagsCell(block, criterion, maxlags, prep));
}
/**
 * Pair screen: every pair of series wandering with the same order, tested both ways, p-values adjusted for the number tested, ranked.
 * @customfunction SCREEN
 * @helpurl https://localhost:3000/docs/functions.md#screen
 * @param block Prices, one column per series. A first row of text names them: select the header too, or use Table1[#All].
 * @param [alpha] Level for the adjusted p-values and the chance count, such as 0.05 or 5%. Default 0.05.
 * @param [show] list (ranked pairs), matrix (the p-values, y by row, x by column) or adjusted (the same, adjusted). Default list.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns The ranked pairs (then those set aside, with why), ending with how many would pass by chance alone.
 */
export function screen(block: any[][], alpha?: any, show?: any, prep?: any): any[][] {
  return answer(() => screenLaterCell(block, alpha, show, prep));
}
/**
 * Rolling relation: the Engle-Granger p-value, hedge ratio and half-life of y on x in each window of rows.
 * @customfunction ROLLING
 * @helpurl https://localhost:3000/docs/functions.md#rolling
 * @param y Prices of the series on the left of the relation: one column or one row.
 * @param x Prices of the other series: one column (or row), on the same rows as y.
 * @param window Rows in each window: a whole number of 21 or more (the fewest the test can use), at most the length of the series.
 * @param [step] Rows between window ends; the last window always ends on the last row. Default 1.
 * @param [show] all (window end, p-value, hedge ratio, half-life), pvalue, beta or halflife. Default all.
 * @param [prep] How to prepare the prices: log, skip gaps, from row N, to row N, last N, separated by commas. Default: as they are, every row.
 * @returns One row per window, oldest first, under a header row.
 */
export function rolling(y: any[][], x: any[][], window: any, step?: any, show?: any, prep?: any): any[][] {
  return answer(() => rollingCell(y, x, window, step, show, prep));
}
/**
 * Critical value from the published tables: reject when a statistic is beyond it.
 * @customfunction CRIT
 * @helpurl https://localhost:3000/docs/functions.md#crit
 * @param test adf, pp, eg, po, po-alpha, kpss, johansen-trace or johansen-max.
 * @param [observations] Sample size of the table (adf, pp, eg, po). Default: the asymptotic value.
 * @param [variables] Series in the relation (eg, po), or series minus relations (johansen). Default 1, or 2 for eg and po.
 * @param [deterministic] none, const or trend; for johansen one of the five cases. Default const (constant).
 * @param [level] Significance level, such as 0.05 or 5%. Default 0.05.
 * @returns The critical value.
 */
export function crit(test: any, observations?: any, variables?: any, deterministic?: any, level?: any): number {
  return answer(() => critCell(test, observations, variables, deterministic, level));
}
/**
 * Joins two ranges kept on different calendars on the dates they share and spills one block: the dates, then the prices.
 * @customfunction COMMONDATES
 * @helpurl https://localhost:3000/docs/functions.md#commondates
 * @param first A range: dates in its first column (oldest or newest first), prices in the columns beside them.
 * @param second Another such range, on its own calendar. Nest COMMONDATES to join a third.
 * @param [fillforward] Carry a price over at most this many missing dates of its own range. Default 0: only the dates both have.
 * @returns The shared dates, oldest first, and the prices on them, for the other functions to read.
 */
export function commondates(first: any[][], second: any[][], fillforward?: any): any[][] {
  return answer(() => commonDatesCell(first, second, fillforward));
}

// The functions of the relation through time, scanned from their own file (FUNCTION_SOURCES).
export * from './path-functions';
// The unit-root tests on GLS-detrended data (DF-GLS, Ng-Perron), scanned from their own file too.
export * from './gls-functions';
// The bounds test and the tests on a Johansen relation, scanned from their own file too.
export * from './long-run-functions';
