/**
 * Critical values of the Gregory & Hansen (1996) ADF* statistic (cointegration with one
 * regime shift at an unknown date), Journal of Econometrics 70(1), Table 1: asymptotic
 * 1%, 2.5%, 5% and 10% points for m = 1..4 regressors and the three shift models.
 *
 * The numbers in gregory-hansen-critical.json are quoted FROM MEMORY, not read from the
 * printed table (see its transcribedFrom field and README.md). No p-value surface was
 * published, so none is offered: a result reads its decision off these points.
 */
import { MooringInputError } from '../errors';
import gregoryHansenTable from './gregory-hansen-critical.json';

/** Level shift (the paper's C), level shift with trend (C/T), or regime shift in level and slopes (C/S). */
export type GregoryHansenModel = 'level' | 'level-trend' | 'regime';

export const GREGORY_HANSEN_MODELS: readonly GregoryHansenModel[] = ['level', 'level-trend', 'regime'];

/** Lower-tail critical values at the 1%, 2.5%, 5% and 10% levels. */
export type GregoryHansenCriticalValues = {
  '1%': number;
  '2.5%': number;
  '5%': number;
  '10%': number;
};

/** The largest number of regressors the table covers. */
export const GREGORY_HANSEN_MAX_REGRESSORS = 4;

/**
 * Asymptotic critical values of ADF* for `regressors` (m = 1..4) series beside the dependent
 * one; null when m is beyond the table. Reject no-cointegration when ADF* is below the value.
 * Gregory & Hansen (1996), Table 1, quoted from memory.
 */
export function gregoryHansenCritical(model: GregoryHansenModel, regressors: number): GregoryHansenCriticalValues | null {
  if (!GREGORY_HANSEN_MODELS.includes(model)) {
    throw new MooringInputError(`Unknown Gregory-Hansen model '${String(model)}': use one of ${GREGORY_HANSEN_MODELS.join(', ')}.`);
  }
  if (!Number.isInteger(regressors) || regressors < 1) {
    throw new MooringInputError(`The number of regressors must be a whole number of 1 or more; got ${regressors}.`);
  }
  if (regressors > GREGORY_HANSEN_MAX_REGRESSORS) return null;
  const row = gregoryHansenTable.models[model][String(regressors) as '1' | '2' | '3' | '4'];
  return { '1%': row['1%'], '2.5%': row['2.5%'], '5%': row['5%'], '10%': row['10%'] };
}
