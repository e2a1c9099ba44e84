/**
 * Critical values of the Gregory & Hansen (1996) ADF* statistic (cointegration with one
 * regime shift at an unknown date), Journal of Econometrics 70(1), Table 1: asymptotic
 * 1%, 2.5%, 5% and 10% points for m = 1..4 regressors and the three shift models.
 *
 * The 1%, 5% and 10% points for m = 1..3 in every model, and for m = 4 in the level model,
 * were compared value by value with an independent typed copy of the printed table and
 * agree to its two decimals; the 2.5% column and m = 4 in the other two models are still
 * quoted from memory (gregory-hansen-critical.json, comparedWithPrintedTable; README.md).
 * No p-value surface was published, so none is offered: a result reads its decision off
 * these points.
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
 * Gregory & Hansen (1996), Table 1 (which values were compared with the printed table:
 * gregoryHansenComparedLevels).
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

/** The levels of the table, in its order. */
const TABLE_LEVELS = ['1%', '2.5%', '5%', '10%'] as const;

/** Which of a row's points have been compared with the printed table, and which are still from memory. */
export interface GregoryHansenRowStatus {
  /** Levels compared with an independent typed copy of Gregory & Hansen (1996), Table 1. */
  compared: string[];
  /** Levels quoted from memory, not yet compared with the printed table. */
  fromMemory: string[];
}

/**
 * For the row of `model` with `regressors` (m = 1..4), which points were compared with the
 * printed Table 1 and which are still from memory; null beyond the table. Read from the
 * table file's comparedWithPrintedTable field, so the wording follows the data.
 */
export function gregoryHansenComparedLevels(model: GregoryHansenModel, regressors: number): GregoryHansenRowStatus | null {
  if (gregoryHansenCritical(model, regressors) === null) return null;
  const checked = gregoryHansenTable.comparedWithPrintedTable;
  const rowCompared = (checked.regressors[model] as readonly number[]).includes(regressors);
  const compared = rowCompared ? TABLE_LEVELS.filter((level) => checked.levels.includes(level)) : [];
  return { compared, fromMemory: TABLE_LEVELS.filter((level) => !compared.includes(level)) };
}
