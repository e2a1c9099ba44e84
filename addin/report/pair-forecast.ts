/**
 * The report's forecast of a related pair: the error-correction model (addin/forecast/vecm-forecast.ts)
 * of the dependent and the regressor, with the report's Johansen case and lags and one long-run
 * relation (the report found one), run REPORT_HORIZON rows ahead on the dates after the last. The
 * spread is the Johansen relation normalised on the dependent, which differs a little from the
 * least-squares spread; its recent history (the last RECENT_ROWS rows) goes with it for the chart.
 */
import { futureDates } from '../forecast/future-dates';
import { vecmForecast } from '../forecast/vecm-forecast';
import type { JohansenCase } from '../johansen/johansen';
import type { PairForecastReport } from './pair-types';

/** Rows ahead the report forecasts (about a month of trading days in daily data). */
export const REPORT_HORIZON = 20;
/** Rows of history the report keeps beside the forecast, for its chart. */
export const RECENT_ROWS = 120;

export function forecastSection(
  y: ArrayLike<number>,
  x: ArrayLike<number>,
  names: { y: string; x: string },
  model: { case: JohansenCase; lags: number },
  dates: readonly (string | null)[] | null,
): PairForecastReport {
  const f = vecmForecast([y, x], [names.y, names.x], { case: model.case, lags: model.lags, rank: 1, horizon: REPORT_HORIZON });
  const s = f.spread!;
  const from = Math.max(0, s.history.length - RECENT_ROWS);
  return {
    series: [names.y, names.x],
    case: f.case,
    lags: f.lags,
    rank: f.rank,
    horizon: f.horizon,
    dates: futureDates(dates, REPORT_HORIZON),
    forecast: f.forecast,
    lower: f.lower,
    upper: f.upper,
    spread: { text: s.text, mean: s.mean, recentFrom: from, recent: s.history.slice(from), path: s.path, lower: s.lower, upper: s.upper },
    bandNote: f.bandNote,
    warnings: f.warnings,
  };
}
