/**
 * What each in-pane chart draws, taken from the report: the series rebased to 100, the
 * spread with its bands at the mean plus and minus two standard deviations, and the rolling
 * z-score with guides at plus and minus two. Every plotted number is the engine's; this only
 * pairs it with the x axis (dates when every row has one, else row positions) and says in
 * words what the chart shows, for readers who cannot see it.
 */
import type { MovingHedgeReport, PairForecastReport, SpreadReport } from '../../../addin/report/pair-types';
import type { DataSection, SeriesReport } from '../../../addin/report/report-types';
import { isoToUnixSeconds } from '../data/excel-date';
import { showNumber } from './numbers';

/** How a line is drawn. */
export type LineRole = 'series' | 'band' | 'centre' | 'guide';

/** One line of a chart. */
export interface ChartLine {
  label: string;
  values: (number | null)[];
  role: LineRole;
}

/** A chart as the renderer draws it. */
export interface ChartModel {
  /** Stable name, for tests and the renderer's element id. */
  id: string;
  title: string;
  /** x values: Unix seconds when `time`, else 1-based row positions. */
  x: number[];
  time: boolean;
  lines: ChartLine[];
  /** What the chart shows, in words (its text alternative). */
  description: string;
}

/** The x axis of the report's rows. */
export function chartAxis(data: Pick<DataSection, 'dates' | 'observations'>): { x: number[]; time: boolean } {
  const seconds = data.dates?.map((d) => isoToUnixSeconds(d)) ?? null;
  if (seconds && seconds.every((s): s is number => s !== null)) return { x: seconds, time: true };
  return { x: Array.from({ length: data.observations }, (_, i) => i + 1), time: false };
}

/** The chosen series rebased to 100 at the first row (or standardised, as the engine made them). */
export function seriesChart(data: DataSection, series: readonly SeriesReport[]): ChartModel {
  const axis = chartAxis(data);
  const rebased = series.every((s) => s.chart.kind === 'rebased');
  const start = data.first.date ?? data.first.label;
  return {
    id: 'series',
    title: rebased ? `Prices rebased to 100 at ${start}` : 'Prices, standardised',
    ...axis,
    lines: series.map((s) => ({ label: s.name, values: s.chart.values, role: 'series' as const })),
    description: rebased
      ? `${series.map((s) => `${s.name} ends at ${showNumber(s.chart.values[s.chart.values.length - 1], 1)}`).join('; ')} (100 = ${start}).`
      : `${series.map((s) => s.name).join(', ')} in standard deviations from their means (some values are not positive, so they cannot be rebased).`,
  };
}

/** The spread with bands at mean +/- 2 standard deviations. */
export function spreadChart(data: DataSection, spread: SpreadReport): ChartModel {
  const axis = chartAxis(data);
  const flat = (v: number): number[] => spread.values.map(() => v);
  return {
    id: 'spread',
    title: 'The spread on the plain least-squares line, with bands at 2 standard deviations',
    ...axis,
    lines: [
      { label: 'Spread', values: spread.values, role: 'series' },
      { label: 'Mean', values: flat(spread.mean), role: 'centre' },
      { label: '+2 sd', values: flat(spread.bandUpper), role: 'band' },
      { label: '-2 sd', values: flat(spread.bandLower), role: 'band' },
    ],
    description: `The spread (${spread.definition}) around its mean ${showNumber(spread.mean, 4)}, bands at ${showNumber(spread.bandLower, 4)} and ${showNumber(spread.bandUpper, 4)}; last value ${showNumber(spread.latest, 4)}.`,
  };
}

/** The rolling z-score with guides at +/- 2. */
export function rollingZChart(data: DataSection, spread: SpreadReport): ChartModel {
  const axis = chartAxis(data);
  const flat = (v: number): number[] => spread.rollingZ.map(() => v);
  return {
    id: 'rolling-z',
    title: `Where the spread (plain least-squares line) stands against the last ${spread.rollingWindow} rows`,
    ...axis,
    lines: [
      { label: 'Rolling z-score', values: spread.rollingZ, role: 'series' },
      { label: '+2', values: flat(2), role: 'guide' },
      { label: '-2', values: flat(-2), role: 'guide' },
    ],
    description: `The spread in standard deviations from its mean over the trailing ${spread.rollingWindow} rows; latest ${showNumber(spread.latestRollingZ, 2)}.`,
  };
}

/** The moving hedge ratio (Kalman filter, smoothed) with its 95% band, against the fixed least-squares ratio. */
export function movingHedgeChart(data: DataSection, hedge: MovingHedgeReport): ChartModel {
  const axis = chartAxis(data);
  return {
    id: 'moving-hedge',
    title: 'The hedge ratio allowed to move (smoothed, with its 95% band) against the fixed least-squares ratio',
    ...axis,
    lines: [
      { label: 'Moving ratio', values: hedge.betaSmoothed, role: 'series' },
      { label: 'Band, high', values: hedge.betaSmoothedHigh, role: 'band' },
      { label: 'Band, low', values: hedge.betaSmoothedLow, role: 'band' },
      { label: 'Fixed ratio', values: hedge.betaSmoothed.map(() => hedge.fixedBeta), role: 'centre' },
    ],
    description: `The ratio of ${hedge.dependent} on ${hedge.regressor} from every row (Kalman smoother) with its 95% band, against the fixed ratio ${showNumber(hedge.fixedBeta, 4)}; ${hedge.driftText}`,
  };
}

/** The Johansen relation's recent values, then its forecast path back towards equilibrium with the 95% band. */
export function forecastChart(data: DataSection, forecast: PairForecastReport): ChartModel {
  const s = forecast.spread;
  const recentDates = data.dates ? data.dates.slice(s.recentFrom) : null;
  const futureDates = forecast.dates;
  const seconds = recentDates && futureDates ? [...recentDates, ...futureDates].map((d) => isoToUnixSeconds(d)) : null;
  const n = s.recent.length + s.path.length;
  const time = seconds !== null && seconds.every((v): v is number => v !== null);
  const x = time ? (seconds as number[]) : Array.from({ length: n }, (_, i) => s.recentFrom + i + 1);
  const gap = (k: number): null[] => Array.from({ length: k }, () => null);
  const last = s.recent[s.recent.length - 1];
  // The path starts from the last value, so the line runs on without a break.
  const ahead = (values: number[]): (number | null)[] => [...gap(s.recent.length - 1), last, ...values];
  return {
    id: 'forecast',
    title: `Where the relation is heading if it holds: ${forecast.horizon} rows ahead, with the 95% band`,
    x,
    time,
    lines: [
      { label: 'Relation, recent', values: [...s.recent, ...gap(s.path.length)], role: 'series' },
      { label: 'Forecast', values: ahead(s.path), role: 'series' },
      { label: 'Band, high', values: ahead(s.upper), role: 'band' },
      { label: 'Band, low', values: ahead(s.lower), role: 'band' },
      { label: 'Equilibrium', values: Array.from({ length: n }, () => s.mean), role: 'centre' },
    ],
    description: `The Johansen relation ${s.text}: its last ${s.recent.length} values, then the forecast ${showNumber(s.path[s.path.length - 1], 4)} after ${forecast.horizon} rows (likely ${showNumber(s.lower[s.lower.length - 1], 4)} to ${showNumber(s.upper[s.upper.length - 1], 4)}); equilibrium ${showNumber(s.mean, 4)}. ${forecast.bandNote}`,
  };
}
