/**
 * The view of "The relation and its pull": the long-run line between the pair in words
 * (which price is written on which, and why), the hedge ratio by plain and dynamic least
 * squares, whether it held across the halves of the sample, how fast a gap closes (the
 * engine's "closes half its gap in about N days" sentence beside the numbers) and which side
 * does the closing, where the spread stands now, and the spread and rolling z-score charts.
 *
 * The headline is the dynamic-OLS line (the estimate with sound standard errors); the spread,
 * its z-scores and its half-life are built on the least-squares line, and every label here
 * says so, so the headline and the charts do not seem to disagree. With logs the slope is an
 * elasticity, and the units to hold at the latest prices stand beside it.
 */
import type { DiagnosticReport } from '../../../addin/report/report-types';
import type { PairReport } from '../../../addin/report/pair-types';
import { cautionsView, type CautionsView } from './cautions-view';
import { pairCharts, pathCharts } from './chart-list';
import type { ChartModel } from './chart-models';
import { showNumber, showPValue } from './numbers';

/** A labelled number of the step. */
export interface FactView {
  label: string;
  value: string;
}

/** The step's view of one pair. */
export interface RelationStepView {
  pairLabel: string;
  /** Said first when the tests found no tie: the numbers then describe a gap that need not close. */
  untiedNote: string | null;
  relationText: string | null;
  /** The slope as a hedge: an elasticity and the units to hold at the latest prices (logs), or the units to hold (prices). */
  hedgeText: string | null;
  /** Which line the spread, its z-scores and its half-life are built on. */
  spreadLineNote: string | null;
  normalisationReason: string | null;
  lineFacts: FactView[];
  halvesNote: string | null;
  pullVerdict: string | null;
  pullFacts: FactView[];
  spreadVerdict: string | null;
  charts: { spread: ChartModel; rollingZ: ChartModel } | null;
  /** The hedge ratio through time (Kalman) against the fixed one, and the forecast fan; null where the report has none. */
  pathCharts: { movingHedge: ChartModel | null; forecast: ChartModel | null };
  /** Parts the engine could not estimate, with its reasons. */
  unavailable: string[];
  warnings: string[];
  cautions: CautionsView;
}

/** A half-life in words for a table cell. */
function halfLifeText(halfLife: number | null, note: string | null, period: string): string {
  if (halfLife === null) return note ?? 'none';
  return `${showNumber(halfLife, 1)} ${period}s`;
}

/** The step's view of a pair of the report. */
export function relationStepView(report: DiagnosticReport, pair: PairReport): RelationStepView {
  const period = report.data.period;
  const r = pair.relation;
  const a = pair.adjustment;
  const s = pair.spread;
  const slopeWord = r?.slopeMeaning === 'elasticity' ? 'Elasticity' : 'Hedge ratio';
  const lineFacts: FactView[] = r
    ? [
        { label: `${slopeWord}, dynamic least squares (the estimate)`, value: showNumber(r.dynamicOls.beta, 4) },
        { label: 'Its standard error (from the long-run variance of the residual)', value: showNumber(r.dynamicOls.standardError, 4) },
        { label: 'Intercept, dynamic least squares', value: showNumber(r.dynamicOls.intercept, 4) },
        {
          label: r.slopeMeaning === 'elasticity'
            ? `Units of ${r.regressor} to hold per unit of ${r.dependent}, at the latest prices`
            : `Units of ${r.regressor} to hold per unit of ${r.dependent}`,
          value: showNumber(r.dynamicOls.hedgeUnits, 4),
        },
        { label: `${slopeWord}, plain least squares (the line the spread is built on)`, value: showNumber(r.ols.beta, 4) },
      ]
    : [];
  if (r?.halves) {
    lineFacts.push(
      { label: `${slopeWord}, ${r.halves.first.from} to ${r.halves.first.to}`, value: showNumber(r.halves.first.beta, 4) },
      { label: `${slopeWord}, ${r.halves.second.from} to ${r.halves.second.to}`, value: showNumber(r.halves.second.beta, 4) },
      { label: 'Held steady across the halves?', value: r.halves.stable ? 'Yes' : 'No: it moved' },
    );
  }
  const m = pair.movingHedge;
  if (m) {
    lineFacts.push(
      { label: `${slopeWord} now, allowed to move (Kalman filter, from the rows up to the last)`, value: `${showNumber(m.latest.beta, 4)} (likely ${showNumber(m.latest.low, 4)} to ${showNumber(m.latest.high, 4)})` },
      { label: 'How it moved', value: `${m.driftText} ${m.driftMeaning}` },
    );
  }
  const pullFacts: FactView[] = a
    ? [
        { label: "Half-life of the spread (AR(1) of the spread on the plain least-squares line)", value: halfLifeText(a.spreadAr1.halfLife, a.spreadAr1.halfLifeNote, period) },
        { label: 'How sure (95% interval of the half-life)', value: a.spreadAr1.halfLifeInterval.text },
        { label: 'Half-life implied by the error-correction model, both prices adjusting', value: halfLifeText(a.ecm.ecmHalfLife, a.ecm.ecmHalfLifeNote, period) },
        ...[a.ecm.dependent, a.ecm.regressor].flatMap((side) => [
          { label: `${side.series} moves to close the gap?`, value: side.corrects ? 'Yes' : 'No' },
          { label: `${side.series}: speed (p-value)`, value: `${showNumber(side.speed, 4)} (${showPValue(side.pValue)})` },
        ]),
      ]
    : [];
  const restrictions = pair.cointegration.restrictions;
  if (restrictions) {
    // Who closes the gap, by Johansen's test that a series' adjustment is zero (a small p-value: it moves).
    for (const t of restrictions.adjusts) {
      pullFacts.push({ label: `Does ${t.series} move to close the gap? Johansen test of no adjustment (p-value)`, value: showPValue(t.pValue) });
    }
    pullFacts.push({ label: `Is the relation simply ${pair.a} minus ${pair.b}? Johansen test of weights 1 and -1 (p-value)`, value: showPValue(restrictions.oneToOne.pValue) });
  }
  if (s) {
    pullFacts.push(
      { label: `Spread (plain least-squares line) on ${s.latestDate ?? s.latestRow}, in standard deviations`, value: showNumber(s.latestZ, 2) },
      { label: `Against the last ${s.rollingWindow} rows`, value: showNumber(s.latestRollingZ, 2) },
    );
  }
  const f = pair.forecast;
  if (f) {
    const last = f.horizon - 1;
    pullFacts.push(
      {
        label: `Where the spread (Johansen relation ${f.spread.text}) is heading: ${f.horizon} ${period}s ahead${f.dates ? `, ${f.dates[last]}` : ''}`,
        value: `${showNumber(f.spread.path[last], 4)} (likely ${showNumber(f.spread.lower[last], 4)} to ${showNumber(f.spread.upper[last], 4)}; now ${showNumber(f.spread.recent[f.spread.recent.length - 1], 4)}, equilibrium ${showNumber(f.spread.mean, 4)})`,
      },
      { label: 'How sure the forecast is', value: f.bandNote },
    );
  }
  return {
    pairLabel: `${pair.a} and ${pair.b}`,
    untiedNote: pair.cointegration.cointegrated
      ? null
      : 'The tests found no long-run tie for this pair, so the line below is only a fit to the past: the gap has no reason to close.',
    relationText: r?.text ?? null,
    hedgeText: r ? `${r.hedgeText.charAt(0).toUpperCase()}${r.hedgeText.slice(1)}.` : null,
    spreadLineNote: s
      ? `The spread, its z-scores and its half-life are built on the plain least-squares line with a constant (slope ${showNumber(s.line.beta, 4)}); ` +
        'the line above is the dynamic least-squares estimate, whose standard error is sound.'
      : null,
    normalisationReason: r?.normalisationReason ?? null,
    lineFacts,
    halvesNote: r?.halvesNote ?? null,
    pullVerdict: a?.verdict ?? null,
    pullFacts,
    spreadVerdict: s?.verdict ?? null,
    charts: pairCharts(report, pair),
    pathCharts: pathCharts(report, pair),
    unavailable: pair.unavailable.map((u) => `No ${u.part}: ${u.reason}`),
    warnings: pair.warnings.filter((w) => w.kind === 'near-unit-root' || w.kind === 'relation-moved').map((w) => w.text),
    cautions: cautionsView(report),
  };
}
