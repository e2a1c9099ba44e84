/**
 * The view of "Through time", a section of the relation step: whether the pair's relation
 * held across the sample, from the worker's PairStability (the engine's rolling Engle-Granger
 * p-value, hedge ratio and half-life, and the one-break tests). Charts of the three rolling
 * numbers against each window's last row, the engine's sentences, and a table of the break
 * tests with the date each found. Formatting only: every number is the engine's.
 */
import type { PairStability } from '../../worker/stability-job';
import { isoToUnixSeconds } from '../data/excel-date';
import type { ChartModel } from './chart-models';
import { showLevel, showNumber, showPValue } from './numbers';
import { testRow, type TestRowView } from './test-row';

/** One break test of the section. */
export interface BreakRowView {
  row: TestRowView;
  breakAt: string;
  verdict: string;
}

/** The section's view. */
export interface StabilityView {
  /** What was looked at, in one sentence. */
  intro: string;
  /** The engine's sentences about the rolling windows. */
  summary: string[];
  charts: ChartModel[];
  /** The one-break tests: the relation (Gregory-Hansen), then each price (Zivot-Andrews). */
  breaks: BreakRowView[];
  /** Parts the engine refused, with its reasons. */
  problems: string[];
}

/** The x axis of the windows: their last rows' dates when every one has a date, else the window's number. */
function windowAxis(endDate: (string | null)[]): { x: number[]; time: boolean } {
  const seconds = endDate.map((d) => isoToUnixSeconds(d));
  if (seconds.length > 0 && seconds.every((s): s is number => s !== null)) return { x: seconds, time: true };
  return { x: endDate.map((_, i) => i + 1), time: false };
}

/** The section's view of a pair's stability at the report's level. */
export function stabilityView(st: PairStability, alpha: number, period: string): StabilityView {
  const { y, x } = st.pair;
  const problems: string[] = [];
  const charts: ChartModel[] = [];
  const r = st.rolling;
  if (r) {
    const axis = windowAxis(r.endDate);
    const last = r.endLabel.length - 1;
    const flat = (v: number): number[] => r.pValue.map(() => v);
    charts.push(
      {
        id: 'rolling-p',
        title: `Engle-Granger p-value of ${y} on ${x}, each window of ${r.window} rows`,
        ...axis,
        lines: [
          { label: 'p-value', values: r.pValue, role: 'series' },
          { label: `level ${showLevel(alpha)}`, values: flat(alpha), role: 'guide' },
        ],
        description: `The p-value in ${r.endLabel.length} windows ending ${r.endLabel[0]} to ${r.endLabel[last]}; latest ${showPValue(r.pValue[last])}. Below the level line the window shows a tie.`,
      },
      {
        id: 'rolling-beta',
        title: `Hedge ratio (plain least squares) in each window`,
        ...axis,
        lines: [{ label: 'Hedge ratio', values: r.beta, role: 'series' }],
        description: `The slope of ${y} on ${x} in each window; latest ${showNumber(r.beta[last], 4)}.`,
      },
      {
        id: 'rolling-half-life',
        title: `Half-life of the spread in each window, in ${period}s`,
        ...axis,
        lines: [{ label: 'Half-life', values: r.halfLife, role: 'series' }],
        description: `How many ${period}s the window's spread takes to close half a gap; latest ${r.halfLife[last] === null ? 'none (it does not revert)' : showNumber(r.halfLife[last], 1)}. Gaps in the line are windows where the spread does not revert.`,
      },
    );
  } else if (st.rollingProblem) {
    problems.push(`No rolling windows: ${st.rollingProblem}`);
  }
  if (st.shiftProblem) problems.push(`No test of a shifted relation: ${st.shiftProblem}`);
  const breaks: BreakRowView[] = st.shifts.map((b) => ({ row: testRow(b.what, b.test), breakAt: b.breakAt, verdict: b.verdict }));
  for (const s of st.seriesBreaks) {
    if (s.reading) breaks.push({ row: testRow(s.reading.what, s.reading.test), breakAt: s.reading.breakAt, verdict: s.reading.verdict });
    else if (s.problem) problems.push(`No break test of ${s.name}: ${s.problem}`);
  }
  const windows = r ? `rolling windows of ${r.window} rows (one every ${r.step} row${r.step === 1 ? '' : 's'})` : 'rolling windows';
  return {
    intro: `${y} on ${x} over the ${st.rows} rows of the run: the Engle-Granger test, hedge ratio and half-life in ${windows}, then tests that allow one break at a date they find.`,
    summary: r ? r.summary.slice() : [],
    charts,
    breaks,
    problems,
  };
}
