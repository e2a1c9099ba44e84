/**
 * Critical values and p-values for the Zivot-Andrews minimum-t statistic (unit root
 * against stationarity with one break at an unknown date).
 *
 * The quantiles are SIMULATED (100,000 replications of 2,000 observations, as stated by
 * the package they were transcribed from), not the critical values printed in Zivot &
 * Andrews (1992), which is cited only for the test itself. Data:
 * zivot-andrews-critical.json; see README.md for the caveats on the far tails.
 */
import { MooringInputError } from '../errors';
import zivotAndrewsTable from './zivot-andrews-critical.json';
import { requireNotNaN } from './table-case';
import { interpolateLinearly, type TablePValue } from './table-interpolation';

/** Break in the intercept ('c', model A), in the trend slope ('t', model B), or both ('ct', model C). */
export type ZivotAndrewsModel = 'c' | 't' | 'ct';

/** Lower-tail critical values at the 1%, 5% and 10% levels. */
export type ZivotAndrewsCriticalValues = {
  '1%': number;
  '5%': number;
  '10%': number;
};

function modelTable(model: ZivotAndrewsModel): { cumulativePercent: number[]; statistic: number[] } {
  if (model !== 'c' && model !== 't' && model !== 'ct') {
    throw new MooringInputError(
      `Unknown Zivot-Andrews model '${model}': use 'c' (intercept break), 't' (trend break) or 'ct' (both).`,
    );
  }
  return zivotAndrewsTable.models[model];
}

/** The simulated quantile at exactly `percent` (a table point). */
function quantileAt(model: ZivotAndrewsModel, percent: number): number {
  const table = modelTable(model);
  const i = table.cumulativePercent.indexOf(percent);
  return table.statistic[i];
}

/**
 * Lower-tail 1%, 5% and 10% critical values of the Zivot-Andrews statistic: the
 * simulated quantiles at those probabilities. Reject the unit root when the statistic is
 * below the value. Simulated values, not the printed table of Zivot & Andrews (1992),
 * Journal of Business & Economic Statistics 10(3).
 */
export function zivotAndrewsCritical(model: ZivotAndrewsModel): ZivotAndrewsCriticalValues {
  return { '1%': quantileAt(model, 1), '5%': quantileAt(model, 5), '10%': quantileAt(model, 10) };
}

/**
 * p-value of a Zivot-Andrews statistic: linear interpolation of the cumulative
 * probability against the 48 simulated quantiles (probability 0.00001 to 0.999). Beyond
 * the table the p-value is held at its end and flagged: below the smallest quantile it is
 * 0.00001 with beyondTable 'below' (the true p-value is smaller), above the largest it is
 * 0.999 with 'above'. For model 't' the table's far left tail (below about 0.005) rests on
 * very few draws and is not to be trusted. Simulated quantiles, not the paper's table.
 */
export function zivotAndrewsPValue(stat: number, model: ZivotAndrewsModel): TablePValue {
  const table = modelTable(model);
  requireNotNaN(stat, 'Zivot-Andrews statistic');
  const { value, end } = interpolateLinearly(stat, table.statistic, table.cumulativePercent);
  return { pValue: value / 100, beyondTable: end === 'left' ? 'below' : end === 'right' ? 'above' : null };
}
