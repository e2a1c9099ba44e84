/**
 * The stages of the results block, one section each, in the order the evidence builds:
 * each series on its own (order of integration), whether the pair is tied (Engle-Granger
 * both ways, Phillips-Ouliaris, Johansen), the long-run line and how the gap closes (hedge
 * ratios, speed of adjustment, half-life, latest z-score), and which series moves first
 * (lead-lag both ways). Every number is a MOOR formula over the source columns, with the
 * settings the report used, so it matches the report when written and follows the data after.
 * The one exception is a lead-lag test that has no cell function (error-correction form,
 * Toda-Yamamoto): its p-value is written as a fixed number, marked so, and refreshed with
 * the block.
 */
import { normalQuantile } from '../../addin/distributions';
import { parsePreparation } from '../../addin/series/preparation';
import type { PairReport } from '../../addin/report/pair-types';
import type { DiagnosticReport } from '../../addin/report/report-types';
import type { BlockCell } from '../workbook/port';
import { COL, type BlockGrid } from './block-grid';
import { FILL, NUMBER_FORMAT, STYLE, periodsFormat } from './block-style';
import { textLiteral, type PriceReferences } from './series-reference';
import { FORECAST_BAND_NOTE } from '../../addin/forecast/vecm-forecast';
import { REPORT_HORIZON } from '../../addin/report/pair-forecast';
import { halfLifeReading, orderReading, pValueReading, pullReading, rankReading, speedReading, stretchReading } from './verdict-formulas';

/** What every section needs. */
export interface StageContext {
  report: DiagnosticReport;
  pair: PairReport;
  refs: PriceReferences;
  /** The relation's dependent and regressor (the report's normalisation). */
  y: string;
  x: string;
  /** Address of the cell whose z-scores spill (for the latest z-score). */
  zSpill: string;
  /** Absolute address of the cell holding the preparation every formula reads (logs, gaps, window). */
  prep: string;
}

/** A number row: label, the number (formula or fixed value), its reading, and how it was made. */
function numberRow(
  g: BlockGrid,
  label: string,
  number: { formula: string } | { fixed: number | null },
  format: string,
  reading: ((cell: string) => string) | null,
  how: string,
): void {
  const row = g.next;
  const cell = g.address(row, COL.value);
  const value: BlockCell = 'formula' in number
    ? { formula: number.formula, format: { numberFormat: format } }
    : { value: number.fixed, format: { numberFormat: format, fill: FILL.fixed } };
  g.add({
    [COL.label]: { value: label, format: STYLE.label },
    [COL.value]: value,
    [COL.reading]: reading ? { formula: reading(cell), format: STYLE.verdict } : {},
    [COL.how]: { value: how, format: STYLE.note },
  });
}

function section(g: BlockGrid, title: string): void {
  g.blank();
  g.add({ [COL.label]: { value: title, format: STYLE.section } });
}

/** Each series on its own: the order of integration. */
export function seriesStage(g: BlockGrid, c: StageContext): void {
  const { alpha, deterministic } = c.report.settings;
  const test = c.report.settings.unitRootTest ?? 'adf';
  section(g, 'Each series on its own');
  const both = `HSTACK(${c.refs.column(c.pair.a)},${c.refs.column(c.pair.b)})`;
  const how = test === 'dfgls'
    ? 'DF-GLS on the levels (more power against a slow return to a mean), ADF on the changes, checked by KPSS: 0 settles, 1 wanders, 2 wanders in its changes too'
    : 'ADF down from the levels, checked by KPSS: 0 settles, 1 wanders, 2 wanders in its changes too';
  for (const [k, name] of [c.pair.a, c.pair.b].entries()) {
    // Both columns go in so the order is found on the rows the pair shares, as in the pane.
    numberRow(g, `Does ${name} wander? Order of integration`, { formula: `=INDEX(MOOR.ORDER(${both},${alpha},${textLiteral(deterministic)},${textLiteral(test)},${c.prep}),1,${k + 1})` },
      NUMBER_FORMAT.count, orderReading, how);
  }
}

/** Whether the pair is tied: residual tests both ways and Johansen. */
export function tieStage(g: BlockGrid, c: StageContext): void {
  const { alpha, deterministic, lagRule } = c.report.settings;
  const { a, b } = c.pair;
  section(g, 'Are they tied together in the long run?');
  const eg = (y: string, x: string) => `=MOOR.ENGLEGRANGER(${c.refs.column(y)},${c.refs.column(x)},${textLiteral(deterministic)},${textLiteral(lagRule)},"headline",${c.prep})`;
  const tie = (cell: string) => pValueReading(cell, alpha, 'tied', 'no evidence of a tie');
  numberRow(g, `Tied? Engle-Granger, ${a} on ${b} (p-value)`, { formula: eg(a, b) }, NUMBER_FORMAT.pValue, tie,
    `the gap left by the least-squares line of ${a} on ${b} is tested for a pull back; lags by ${lagRule.toUpperCase()}`);
  numberRow(g, `Tied? Engle-Granger, ${b} on ${a} (p-value)`, { formula: eg(b, a) }, NUMBER_FORMAT.pValue, tie,
    'the same test with the roles swapped; the two can disagree in short samples');
  numberRow(g, `Tied? Phillips-Ouliaris, ${c.y} on ${c.x} (p-value)`,
    { formula: `=MOOR.PHILLIPSOULIARIS(${c.refs.column(c.y)},${c.refs.column(c.x)},${textLiteral(deterministic)},"auto","headline",${c.prep})` }, NUMBER_FORMAT.pValue, tie,
    'the same question, correcting for autocorrelation with a long-run variance instead of lags');
  const j = c.pair.cointegration.johansen;
  if (j) {
    const args = `${c.refs.pair(a, b)},${j.lags},${textLiteral(j.case)}`;
    numberRow(g, 'Tied? Johansen trace test of no relation (p-value)', { formula: `=MOOR.JOHANSEN(${args},"headline",${c.prep})` }, NUMBER_FORMAT.pValue,
      (cell) => pValueReading(cell, alpha, 'at least one long-run relation', 'no evidence of a relation'),
      `both series in one model, ${j.lags} lagged change${j.lags === 1 ? '' : 's'}; ${j.caseReason}`);
    numberRow(g, 'Long-run relations found by Johansen', { formula: `=MOOR.RANK(${args},${alpha},${c.prep})` }, NUMBER_FORMAT.count, rankReading,
      'the trace test taken step by step at the level above');
    numberRow(g, `Is the relation simply ${a} minus ${b}? Weights 1 and -1 (p-value)`,
      { formula: `=MOOR.RELATIONIS(HSTACK(${c.refs.column(a)},${c.refs.column(b)}),HSTACK(1,-1),${j.lags},${textLiteral(j.case)},"headline",${c.prep})` }, NUMBER_FORMAT.pValue,
      (cell) => pValueReading(cell, alpha, 'the weights differ from 1 and -1', 'no evidence against 1 and -1'),
      'Johansen likelihood-ratio test that the one relation is these weights up to scale (chi-square, 1 degree of freedom)');
    [a, b].forEach((name, i) => numberRow(g, `Does ${name} move to close the gap? (p-value)`,
      { formula: `=MOOR.ADJUSTS(HSTACK(${c.refs.column(a)},${c.refs.column(b)}),${i + 1},${j.lags},${textLiteral(j.case)},"headline",${c.prep})` }, NUMBER_FORMAT.pValue,
      (cell) => pValueReading(cell, alpha, `${name} moves back toward the relation`, `no sign that ${name} adjusts`),
      `Johansen likelihood-ratio test that ${name}'s adjustment is zero (weak exogeneity), with the trace test's number of relations (at least 1)`));
  }
}

/** The long-run line and the gap: hedge ratios, speed of adjustment, half-life, latest z-score. */
export function lineStage(g: BlockGrid, c: StageContext): void {
  const { alpha } = c.report.settings;
  const period = c.report.data.period;
  const y = c.refs.column(c.y);
  const x = c.refs.column(c.x);
  section(g, `The long-run line of ${c.y} on ${c.x}, and how its gap closes`);
  if (c.report.data.logged) {
    // In logs the slope is an elasticity; the quantity to hold is sized at the latest prices.
    numberRow(g, `Elasticity of ${c.y} to ${c.x} (least squares, in logs)`, { formula: `=MOOR.HEDGE(${y},${x},"ols","slope",${c.prep})` }, NUMBER_FORMAT.ratio, null,
      `ln ${c.y} = intercept + slope x ln ${c.x}: a 1% move in ${c.x} goes with about this many % in ${c.y}; the spread beside is what this line leaves over`);
    numberRow(g, 'Elasticity (dynamic OLS)', { formula: `=MOOR.HEDGE(${y},${x},"dols","slope",${c.prep})` }, NUMBER_FORMAT.ratio, null,
      'with leads and lags of the changes, chosen by AIC: the estimate with sound standard errors for wandering prices');
    numberRow(g, `Hedge at the latest prices: units of ${c.x} per unit of ${c.y} (dynamic OLS)`, { formula: `=MOOR.HEDGE(${y},${x},"dols","units",${c.prep})` }, NUMBER_FORMAT.ratio, null,
      `the dynamic-OLS elasticity times the last price of ${c.y} over the last price of ${c.x}; it drifts as the prices move`);
  } else {
    numberRow(g, `Hedge ratio: units of ${c.x} per unit of ${c.y} (least squares)`, { formula: `=MOOR.HEDGE(${y},${x},"ols","slope",${c.prep})` }, NUMBER_FORMAT.ratio, null,
      `${c.y} = intercept + ratio x ${c.x}; the spread beside is what this line leaves over`);
    numberRow(g, 'Hedge ratio (dynamic OLS)', { formula: `=MOOR.HEDGE(${y},${x},"dols","slope",${c.prep})` }, NUMBER_FORMAT.ratio, null,
      'with leads and lags of the changes, chosen by AIC: the estimate with sound standard errors for wandering prices');
  }
  numberRow(g, `${c.report.data.logged ? 'Elasticity' : 'Hedge ratio'} now, allowed to move (Kalman filter)`, { formula: `=MOOR.MOVINGHEDGE(${y},${x},"latest",,,${c.prep})` }, NUMBER_FORMAT.ratio, null,
    'the slope on the last row, from the rows up to it, with intercept and slope taking random steps (variances by maximum likelihood); a ratio that drifts says the fixed line is unstable');
  numberRow(g, `Does ${c.y} move back? Speed of adjustment`, { formula: `=MOOR.ECM(${y},${x},"aic","headline",${c.prep})` }, NUMBER_FORMAT.ratio,
    (cell) => speedReading(cell, c.y), `error-correction model: the share of yesterday's gap ${c.y} closes per ${period}; lags by AIC`);
  const critical = normalQuantile(1 - alpha / 2);
  numberRow(g, 'Is that pull significant? t-value of the speed', { formula: `=MOOR.ECM(${y},${x},"aic","stat",${c.prep})` }, NUMBER_FORMAT.statistic,
    (cell) => pullReading(cell, critical, alpha), `significant when at or below -${critical.toFixed(2)} (two-sided, normal approximation)`);
  numberRow(g, 'Does the spread revert? Half-life', { formula: `=MOOR.HALFLIFE(${y},${x},"value",${c.prep})` }, periodsFormat(period),
    (cell) => halfLifeReading(cell, period), `${period}s for a gap in the spread to halve, from its AR(1) coefficient`);
  numberRow(g, 'Half-life, low end of its 95% interval', { formula: `=MOOR.HALFLIFE(${y},${x},"low",${c.prep})` }, periodsFormat(period), null,
    'the shortest half-life the data allow: the speed\'s 95% interval, corrected for its small-sample bias, carried through the half-life');
  numberRow(g, 'Half-life, high end of its 95% interval', { formula: `=MOOR.HALFLIFE(${y},${x},"high",${c.prep})` }, periodsFormat(period), null,
    'the longest; #N/A when the interval reaches no reversion (no upper bound): the message on the cell says so');
  // The latest row is the spill's last cell, or its first filled one when the rows run newest first.
  const latest = parsePreparation(c.report.settings.preparation ?? '').newestFirst
    ? `=INDEX(${c.zSpill}#,MATCH(TRUE,ISNUMBER(${c.zSpill}#),0))`
    : `=INDEX(${c.zSpill}#,ROWS(${c.zSpill}#))`;
  // Written whenever Johansen ran (not only when the tests found a tie), so the block's rows stay put when a refresh changes the verdict.
  const j = c.pair.cointegration.johansen;
  if (j) {
    const f = c.pair.forecast;
    numberRow(g, `Where the spread is heading: in ${REPORT_HORIZON} ${period}s (error-correction forecast)`,
      { formula: `=INDEX(MOOR.AHEAD(HSTACK(${y},${x}),${REPORT_HORIZON},1,${j.lags},${textLiteral(j.case)},"spread",${c.prep}),${REPORT_HORIZON},1)` }, NUMBER_FORMAT.ratio, null,
      `${f ? `the Johansen relation ${f.spread.text} (its equilibrium ${f.spread.mean.toPrecision(4)} when written)` : 'the Johansen relation, normalised on ' + c.y}, one relation assumed; ${FORECAST_BAND_NOTE}`);
  }
  numberRow(g, 'Is the spread stretched now? Latest z-score', { formula: latest }, NUMBER_FORMAT.statistic,
    stretchReading, 'standard deviations from its mean on the last row, over the whole sample');
}

/** Which series moves first: lead-lag in both directions by the test the report found valid. */
export function leadStage(g: BlockGrid, c: StageContext): void {
  const ll = c.pair.leadLag;
  if (!ll) return;
  const { alpha } = c.report.settings;
  section(g, 'Which one moves first?');
  const cellForm = ll.method === 'f-differences' ? 'changes' : ll.method === 'f-levels' ? 'levels' : null;
  for (const d of [ll.aLeadsB, ll.bLeadsA]) {
    const lags = d.test.lags ?? 1;
    const number = cellForm
      ? { formula: `=MOOR.GRANGER(${c.refs.column(d.cause)},${c.refs.column(d.effect)},${lags},${textLiteral(cellForm)},"headline",${c.prep})` }
      : { fixed: d.test.pValue };
    const how = cellForm
      ? `F test on the ${cellForm === 'changes' ? 'changes' : 'values'} with ${lags} lag${lags === 1 ? '' : 's'}`
      : `${d.test.test} with ${lags} lag${lags === 1 ? '' : 's'}: no cell function computes it, so this number is fixed as written; refresh the block to update it`;
    numberRow(g, `Does ${d.cause} lead ${d.effect}? (p-value)`, number, NUMBER_FORMAT.pValue,
      (cell) => pValueReading(cell, alpha, `${d.cause} leads`, 'no evidence of a lead'), how);
  }
  g.add({ [COL.label]: { value: 'Why this test', format: STYLE.label }, [COL.how]: { value: ll.why, format: STYLE.note } });
}

/** The warnings that apply (data, series and pair), then the standing cautions, last. */
export function closingStage(g: BlockGrid, c: StageContext): void {
  const warnings = [...c.report.warnings, ...c.pair.warnings.map((w) => w.text), ...c.pair.unavailable.map((u) => `${u.part}: ${u.reason}`)];
  if (warnings.length > 0) {
    section(g, 'Worth knowing about these data');
    for (const w of warnings) g.add({ [COL.label]: { value: w, format: STYLE.note } });
  }
  section(g, 'Before you rely on any of this');
  for (const caution of c.report.cautions) g.add({ [COL.label]: { value: caution, format: STYLE.caution } });
}
