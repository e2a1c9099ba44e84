/**
 * Zivot & Andrews (1992) unit-root test with one break at an unknown date.
 * Null: a unit root (Zivot & Andrews 1992, sec. 2: the break is excluded under the null).
 * Alternative: stationary around a trend whose level, slope or both shift once.
 * For every candidate date TB the regression of zivot-andrews-design.ts is fitted and the
 * t-ratio of the lagged level taken; the statistic is the smallest of them (the paper's
 * inf over lambda of t(lambda)), and TB at the minimum is the estimated break.
 *
 * Conventions of the reference library, so results compare exactly:
 * - With a lag rule, the lag count comes from one ADF with constant and trend and no break
 *   (searched up to maxLags, default as for ADF), and that count is used at every date; the
 *   paper chose the lag at each date instead. A fixed number is used as given.
 * - Candidate dates and the reported break index: zivot-andrews-design.ts.
 * p-value and critical values: addin/tables/zivot-andrews-table.ts (simulated quantiles;
 * the p-value is held at 0.00001 or 0.999 beyond the table, with a note).
 */
import { MooringInputError } from '../errors';
import { pValueBoundNote } from '../p-value-bound';
import type { ResultDetail, TestResult } from '../result';
import { leastSquares } from '../regression/least-squares';
import { zivotAndrewsCritical, zivotAndrewsPValue, type ZivotAndrewsModel } from '../tables/zivot-andrews-table';
import { chooseAdfLags, LAG_RULES, type LagChoice, type LagRule } from '../unitroot/adf-lag-search';
import type { LagOption } from '../unitroot/adf-core';
import { resolveMaxLag } from '../unitroot/max-lag';
import { DEFAULT_TRIM, breakLocation, edgeOfSearchWarning, requireFiniteSeries, requireTrim, trimmedCount, type BreakLocation, type RowLabel } from './break-location';
import { breakColumn, scanBreakTValues } from './break-t-scan';
import { BREAKS_AGAIN_CAUTION, aroundText, capitalise, formatBreakPValue, formatNumber } from './break-wording';
import { BREAK_COLUMNS, ZIVOT_ANDREWS_BREAKS, candidateBreaks, firstBreakRow, zivotAndrewsDesign, type ZivotAndrewsBreak } from './zivot-andrews-design';

export interface ZivotAndrewsOptions {
  /** What may break: 'level' (model A), 'slope' (model B) or 'both' (model C). */
  model: ZivotAndrewsBreak;
  /** Share of the sample at each end where no break is sought; default 0.15. */
  trim?: number;
  /** Lagged changes: a whole number, or the rule that chooses it (default 'aic'). */
  lags?: LagOption;
  /** Largest lag a rule searches (default 12 (T/100)^(1/4) rounded up, capped at T/2 - 3). */
  maxLags?: number;
  /** Label of an observation by its index in the series (e.g. its date); default "row <index + 1>". */
  rowLabel?: RowLabel;
}

/** A break test's result: the one result shape, plus where the break sits and the verdict in words. */
export interface BreakTestResult extends TestResult {
  breakAt: BreakLocation;
  /** One or two sentences at the 5% level, with the caution that relations break. */
  verdict: string;
}

const TABLE_MODEL: Record<ZivotAndrewsBreak, ZivotAndrewsModel> = { level: 'c', slope: 't', both: 'ct' };
const PAPER_MODEL: Record<ZivotAndrewsBreak, string> = { level: 'A', slope: 'B', both: 'C' };
const SHIFT_WORDS: Record<ZivotAndrewsBreak, string> = {
  level: 'shift in level',
  slope: 'change in trend slope',
  both: 'shift in level and trend slope',
};

/** Zivot-Andrews minimum-t test of a unit root against stationarity with one break (see the file comment). */
export function zivotAndrewsTest(series: ArrayLike<number>, options: ZivotAndrewsOptions, name = 'the series'): BreakTestResult {
  const x = requireFiniteSeries(series, name);
  const model = options?.model;
  if (!ZIVOT_ANDREWS_BREAKS.includes(model)) {
    throw new MooringInputError(`Unknown break model '${String(model)}': use one of ${ZIVOT_ANDREWS_BREAKS.join(', ')}.`);
  }
  const trim = requireTrim(options.trim ?? DEFAULT_TRIM);
  const T = x.length;
  const { lags, lagRule, choice } = resolveLags(x, options);

  const h = trimmedCount(T, trim);
  const range = candidateBreaks(model, T, h);
  const design = zivotAndrewsDesign(x, lags);
  const firstRow = firstBreakRow(range.first, lags);
  const lastRow = firstBreakRow(range.last, lags);
  const columns = BREAK_COLUMNS[model];
  if (firstRow < 2 || design.n - lastRow < 2 || lastRow < firstRow) {
    throw new MooringInputError(
      `${T} observations with trim ${trim} leave ${h} observations at each end, too few beside ${lags} lagged change${lags === 1 ? '' : 's'} ` +
        `to place a break: use a longer series, a larger trim, or fewer lags${range.first - 2 >= 0 ? ` (at most ${range.first - 2})` : ''}.`,
    );
  }
  const scan = scanBreakTValues(design.response, design.laggedLevel, design.fixed, columns, firstRow, lastRow, design.fixedNames);

  // Report the chosen date's regression refitted by QR.
  const bestRow = scan.bestRow;
  const breakCols = columns.map((kind) => breakColumn(kind, bestRow, design.n));
  const names = ['lagged level', ...design.fixedNames, ...columns.map((k) => (k === 'step' ? 'level-shift dummy' : 'slope-shift dummy'))];
  const fit = leastSquares(design.response, [design.laggedLevel, ...design.fixed, ...breakCols], { names });
  const statistic = fit.tValues[0];
  if (!Number.isFinite(statistic)) {
    throw new MooringInputError(`${name} fits its own past exactly (no noise left): a unit-root test has nothing to measure.`);
  }
  const lastBefore = bestRow + lags;
  const location = breakLocation(lastBefore, T, options.rowLabel);

  const tableModel = TABLE_MODEL[model];
  const table = zivotAndrewsPValue(statistic, tableModel);
  const critical = zivotAndrewsCritical(tableModel);
  const warnings: string[] = [];
  let pValueNote: string | undefined;
  if (table.beyondTable) {
    pValueNote = pValueBoundNote(table.pValue, table.beyondTable);
    warnings.push(`The statistic lies beyond the simulated table: the true p-value is ${table.beyondTable} the ${table.pValue} reported.`);
  }
  if (model === 'slope' && table.pValue < 0.005) {
    warnings.push('For a slope break the table\'s far left tail (below 0.5%) rests on few simulated draws: read the p-value as "very small", not as its digits.');
  }
  if (choice && choice.lags === choice.maxLags && choice.maxLags > 0) {
    warnings.push(`The lag rule chose the largest lag searched (${choice.maxLags}); a larger maximum may fit better.`);
  }
  if (design.n < 50) warnings.push(`Only ${design.n} observations in the test regression: break tests have little power in short samples.`);
  const edge = edgeOfSearchWarning(location, range.first, range.last);
  if (edge) warnings.push(edge);
  warnings.push(BREAKS_AGAIN_CAUTION);

  const reject = statistic < critical['5%'];
  const stat = `min t = ${formatNumber(statistic)}, ${formatBreakPValue(table.pValue, table.beyondTable)}, 5% critical value ${formatNumber(critical['5%'])}`;
  const verdict = capitalise(reject
    ? `${name} looks stationary around a trend with one ${SHIFT_WORDS[model]} (${stat}); the break appears ${aroundText(location)}. ` +
      'Prices before that date follow a different path: judge levels by the later regime.'
    : `No evidence at the 5% level that ${name} is stationary, even allowing one ${SHIFT_WORDS[model]} (${stat}): treat it as having a unit root. ` +
      `The best-fitting date, ${location.label}, is not evidence that a break happened.`);

  const k = fit.k;
  const details: ResultDetail[] = [
    { key: 'verdict', label: 'Verdict at 5%', value: verdict },
    { key: 'model', label: `Break allowed in (Zivot & Andrews model ${PAPER_MODEL[model]})`, value: model },
    { key: 'breakLabel', label: 'First observation after the break', value: location.label },
    { key: 'breakLastBeforeLabel', label: 'Last observation before the break', value: location.lastBeforeLabel },
    { key: 'breakFraction', label: 'Share of the sample before the break', value: location.fraction },
    { key: 'trim', label: 'Share trimmed at each end', value: trim },
    { key: 'candidates', label: 'Candidate break dates searched', value: range.last - range.first + 1 },
    { key: 'maxLags', label: 'Largest lag searched', value: choice ? choice.maxLags : null },
    { key: 'lagMethod', label: 'How lags were set', value: choice ? 'once, by an ADF with constant and trend and no break, then used at every date' : 'fixed' },
    { key: 'gamma', label: 'Coefficient on the lagged level (rho - 1)', value: fit.coefficients[0] },
  ];
  columns.forEach((kind, i) => {
    const b = fit.coefficients[k - columns.length + i];
    details.push(
      kind === 'step'
        ? { key: 'levelShift', label: 'Coefficient on the level-shift dummy (regression of changes)', value: b }
        : { key: 'slopeShift', label: 'Coefficient on the slope-shift term t - TB (regression of changes)', value: b / design.n },
    );
  });

  return {
    test: 'Zivot-Andrews',
    title: `Unit-root test with one break (Zivot-Andrews) on ${name}`,
    statisticName: 'min t',
    statistic,
    pValue: table.pValue,
    ...(pValueNote ? { pValueNote, pValueBound: table.beyondTable } : {}),
    critical: { ...critical },
    rejectTail: 'lower',
    lags,
    lagRule,
    nobs: design.n,
    deterministic: 'trend',
    nullHypothesis: `${name} has a unit root: shocks to it never fade`,
    alternative: `${name} is stationary around a trend with one ${SHIFT_WORDS[model]} at an unknown date`,
    warnings,
    details,
    breakAt: location,
    verdict,
  };
}

/** The lag count: fixed as given, or chosen once by a trend ADF without a break (the reference library's shortcut). */
function resolveLags(x: ArrayLike<number>, options: ZivotAndrewsOptions): { lags: number; lagRule: 'fixed' | LagRule; choice: LagChoice | null } {
  const requested = options.lags ?? 'aic';
  const T = x.length;
  if (typeof requested === 'number') {
    return { lags: resolveMaxLag(T, 'trend', requested, 'number of lags'), lagRule: 'fixed', choice: null };
  }
  if (!LAG_RULES.includes(requested)) {
    throw new MooringInputError(`Unknown lag rule '${String(requested)}': use a whole number or one of ${LAG_RULES.join(', ')}.`);
  }
  const maxLags = resolveMaxLag(T, 'trend', options.maxLags);
  const choice = chooseAdfLags(x, 'trend', maxLags, requested);
  return { lags: choice.lags, lagRule: requested, choice };
}
