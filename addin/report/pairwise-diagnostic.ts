/**
 * The full pairwise diagnostic as one engine call. Every surface (the pane, the command
 * line, the sheet block) renders the DiagnosticReport this returns and computes nothing of
 * its own.
 *
 * For two or more cleaned, aligned series: the data used, each series' order of
 * integration, every pair's cointegration evidence, long-run relation, adjustment, spread
 * and lead-lag, the system's Johansen rank when there are more than two, the findings in
 * plain words, the warnings and the cautions. Bad input is refused with a
 * MooringInputError naming the series, row or option (check-input.ts).
 */
import type { DiagnosticInput } from './prepare-input';
import { checkDiagnosticInput, checkDiagnosticOptions, type DiagnosticOptions } from './check-input';
import { diagnosePair, type PairContext } from './pair-diagnostic';
import type { PairReport } from './pair-types';
import { reportCautions, screeningCount } from './report-cautions';
import { reportFindings, reportWarnings } from './report-findings';
import { DIAGNOSTIC_REPORT_VERSION, type DataSection, type DiagnosticReport } from './report-types';
import { rowPeriod } from './row-period';
import { seriesSection } from './series-section';
import { systemSection } from './system-section';
import { MooringInputError } from '../errors';

export type { DiagnosticOptions } from './check-input';
export type { DiagnosticInput } from './prepare-input';

/** Default rows of the rolling z-score's trailing window (about a quarter of business days). */
export const DEFAULT_ROLLING_WINDOW = 60;

/** The rolling window: as given (checked), else 60 rows or a third of the sample when that is shorter. */
function rollingWindowOf(given: number | undefined, n: number): number {
  if (given === undefined) return Math.max(3, Math.min(DEFAULT_ROLLING_WINDOW, Math.floor(n / 3)));
  if (!Number.isInteger(given) || given < 3 || given > n) {
    throw new MooringInputError(`The rolling window must be a whole number of rows from 3 to ${n}; got ${String(given)}.`);
  }
  return given;
}

/** Runs the whole diagnostic on two or more series. */
export function diagnose(input: DiagnosticInput, options: DiagnosticOptions = {}): DiagnosticReport {
  const settings = checkDiagnosticOptions(options);
  const checked = checkDiagnosticInput(input, options);
  const n = checked.values[0].length;
  const rollingWindow = rollingWindowOf(options.rollingWindow, n);
  const period = rowPeriod(checked.dates, options.period);
  const point = (position: number) => ({ position, label: checked.rowLabels[position], date: checked.dates?.[position] || null });
  const data: DataSection = {
    source: checked.source,
    observations: n,
    first: point(0),
    last: point(n - 1),
    logged: checked.logged,
    window: checked.window,
    period: period.period,
    periodSource: period.source,
    halfLifeUnit: period.unit,
    spacing: period.spacing,
    dropped: checked.dropped,
    rowLabels: checked.rowLabels,
    dates: checked.dates,
  };

  const series = checked.names.map((name, j) =>
    seriesSection(name, checked.values[j], { alpha: settings.alpha, deterministic: settings.deterministic, logged: checked.logged, unitRootTest: settings.unitRootTest }));
  const orders: PairContext['orders'] = {};
  for (const s of series) orders[s.name] = { order: s.order, agree: s.agree };
  const context: PairContext = {
    ...settings,
    period: period.period,
    rollingWindow,
    logged: checked.logged,
    rowLabels: checked.rowLabels,
    dates: checked.dates,
    orders,
  };

  const pairs: PairReport[] = [];
  const m = checked.names.length;
  for (let i = 0; i < m; i++) {
    for (let j = i + 1; j < m; j++) {
      pairs.push(diagnosePair(checked.values[i], checked.values[j], { a: checked.names[i], b: checked.names[j] }, context));
    }
  }
  const orderNumbers = Object.fromEntries(series.map((s) => [s.name, s.order]));
  const system = m > 2 ? systemSection(checked.values, checked.names, orderNumbers, settings) : null;

  return {
    kind: 'mooring-pairwise-diagnostic',
    version: DIAGNOSTIC_REPORT_VERSION,
    settings: { ...settings, rollingWindow },
    data,
    series,
    pairs,
    system,
    findings: reportFindings(series, pairs, system),
    warnings: [...(input.notices ?? []), ...reportWarnings(data, series)],
    cautions: reportCautions(pairs.length, settings.alpha),
    screening: screeningCount(pairs.length, settings.alpha),
  };
}
